package org.spanlift.input;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Locale;

/**
 * Reads an input file as UTF-8 text, failing with one line that says what is wrong and what was expected.
 * At most {@link #MAX_BYTES} bytes are read, through a bounded stream: a larger file, or a device that never
 * ends ({@code /dev/zero}), is refused once the limit is passed, whatever size the file system reports. The
 * text must be UTF-8 (a leading byte-order mark is dropped) without control characters other than tabs and
 * line breaks; a refusal names the line where the fault is.
 */
public final class TextFile {

    /** The largest input file read, in bytes (16 MiB): far beyond any wing, sweep or coordinate file. */
    public static final int MAX_BYTES = 16 * 1024 * 1024;

    private TextFile() {
    }

    /**
     * @param path the file
     * @param what what the file should be, for the message: {@code "wing file"}, {@code "sweep file"}
     * @return its whole text
     * @throws InputException naming the file (and the line, where there is one): missing, a folder, unreadable,
     *         larger than {@link #MAX_BYTES}, not UTF-8, or holding control characters
     */
    public static String read(Path path, String what) {
        String file = path.toString();
        if (Files.isDirectory(path)) {
            throw new InputException(file, 0, "", "is a folder; expected the path of " + a(what));
        }
        byte[] bytes;
        try (InputStream in = Files.newInputStream(path)) {
            bytes = in.readNBytes(MAX_BYTES + 1);
        } catch (NoSuchFileException e) {
            throw new InputException(file, 0, "", "no such file; expected the path of " + a(what));
        } catch (AccessDeniedException e) {
            throw new InputException(file, 0, "", "permission denied; expected a readable " + what);
        } catch (IOException e) {
            throw new InputException(file, 0, "", "cannot read the file" + (e.getMessage() == null ? ""
                    : " (" + e.getMessage() + ")") + "; expected a readable " + what);
        }
        if (bytes.length > MAX_BYTES) {
            throw new InputException(file, lineAt(bytes, MAX_BYTES), "", "the file goes on past "
                    + (MAX_BYTES >> 20) + " MiB (the limit is reached on this line); expected " + a(what)
                    + " of at most " + (MAX_BYTES >> 20) + " MiB");
        }
        return decode(bytes, file, what);
    }

    /**
     * The text of a file's bytes: UTF-8 without control characters other than tab, line feed and carriage
     * return; a leading UTF-8 byte-order mark is dropped.
     *
     * @param file the file name for messages
     * @param what what the file should be, for the message
     * @throws InputException naming the file and the line of the first fault
     */
    public static String decode(byte[] bytes, String file, String what) {
        if (startsWith(bytes, 0xFE, 0xFF) || startsWith(bytes, 0xFF, 0xFE) || startsWith(bytes, 0, 0, 0xFE, 0xFF)) {
            throw new InputException(file, 1, "", "the file starts with a UTF-16 or UTF-32 byte-order mark; expected "
                    + a(what) + " saved as UTF-8");
        }
        int start = startsWith(bytes, 0xEF, 0xBB, 0xBF) ? 3 : 0;
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes, start, bytes.length - start);
        CharBuffer out = CharBuffer.allocate(bytes.length - start);
        CoderResult result = decoder.decode(in, out, true);
        if (!result.isError()) {
            result = decoder.flush(out);
        }
        if (result.isError()) {
            int at = in.position();
            throw new InputException(file, lineAt(bytes, at), "", String.format(Locale.ROOT, "the file is not UTF-8 "
                    + "text (byte 0x%02X on this line is not UTF-8); expected %s saved as UTF-8", bytes[at] & 0xFF,
                    a(what)));
        }
        out.flip();
        String text = out.toString();
        checkControlCharacters(text, file, what);
        return text;
    }

    private static void checkControlCharacters(String text, String file, String what) {
        int line = 1;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\n' || (c == '\r' && (i + 1 == text.length() || text.charAt(i + 1) != '\n'))) {
                line++;
            } else if (c != '\t' && c != '\r' && (c < 0x20 || (c >= 0x7F && c <= 0x9F))) {
                String problem = c == 0
                        ? "a NUL character on this line: the file holds binary data or UTF-16 text without a "
                                + "byte-order mark; expected " + a(what) + " saved as UTF-8"
                        : String.format(Locale.ROOT, "a control character U+%04X on this line; expected %s of "
                                + "plain text (printable characters, tabs and line breaks only)", (int) c, a(what));
                throw new InputException(file, line, "", problem);
            }
        }
    }

    /** The words with their indefinite article: "a wing file", "an envelope file". */
    private static String a(String what) {
        return ("aeiou".indexOf(what.charAt(0)) >= 0 ? "an " : "a ") + what;
    }

    /** The 1-based line of byte {@code at}: one more than the line breaks before it (CR LF counts once). */
    private static int lineAt(byte[] bytes, int at) {
        int line = 1;
        for (int i = 0; i < at && i < bytes.length; i++) {
            if (bytes[i] == '\n' || (bytes[i] == '\r' && (i + 1 >= bytes.length || bytes[i + 1] != '\n'))) {
                line++;
            }
        }
        return line;
    }

    private static boolean startsWith(byte[] bytes, int... prefix) {
        if (bytes.length < prefix.length) {
            return false;
        }
        for (int i = 0; i < prefix.length; i++) {
            if ((bytes[i] & 0xFF) != prefix[i]) {
                return false;
            }
        }
        return true;
    }
}
