package org.spanlift.cli.sweep;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;

/**
 * Reads a results file back record by record, as written: a record ends at a line feed, except inside a
 * quoted CSV cell (RFC 4180), where line breaks belong to the cell. Works on bytes (the quote and the line
 * feed are single bytes in UTF-8 and never part of another character), so it knows where each complete
 * record ends in the file, and the line each one starts on. A final record without its line feed is not
 * returned: a run stopped while writing it, and {@link #partial} says so.
 */
public final class RowReader {

    private final InputStream in;
    private final boolean csv;
    private final ByteArrayOutputStream record = new ByteArrayOutputStream(256);
    private final byte[] buffer = new byte[1 << 16];
    private int size;
    private int at;
    private long offset;
    private long end;
    private int nextLine = 1;
    private int line;
    private boolean partial;

    public RowReader(InputStream in, RowFormat format) {
        this.in = in;
        this.csv = format == RowFormat.CSV;
    }

    /** Reads from a channel from its start, with positional reads (the channel and its lock stay open). */
    static InputStream from(FileChannel ch) {
        return new InputStream() {
            private long position;

            @Override
            public int read() throws IOException {
                byte[] one = new byte[1];
                int n = read(one, 0, 1);
                return n < 0 ? -1 : one[0] & 0xff;
            }

            @Override
            public int read(byte[] b, int off, int len) throws IOException {
                int n = ch.read(ByteBuffer.wrap(b, off, len), position);
                if (n > 0) {
                    position += n;
                }
                return n;
            }
        };
    }

    /**
     * The next complete record without its line end (a CR before the LF is dropped too), or null at the end
     * of the file.
     *
     * @throws CharacterCodingException when a record is not UTF-8
     */
    public String next() throws IOException {
        record.reset();
        boolean quoted = false;
        int lines = 0;
        while (true) {
            if (at == size) {
                size = in.read(buffer);
                at = 0;
                if (size <= 0) {
                    size = 0;
                    partial = record.size() > 0;
                    if (partial) {
                        line = nextLine;
                    }
                    return null;
                }
            }
            byte b = buffer[at++];
            offset++;
            if (b == '\n') {
                lines++;
                if (!quoted) {
                    line = nextLine;
                    nextLine += lines;
                    end = offset;
                    byte[] bytes = record.toByteArray();
                    int length = bytes.length > 0 && bytes[bytes.length - 1] == '\r' ? bytes.length - 1 : bytes.length;
                    return decode(bytes, length);
                }
            } else if (b == '"' && csv) {
                quoted = !quoted;
            }
            record.write(b);
        }
    }

    private static String decode(byte[] bytes, int length) throws CharacterCodingException {
        return StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(bytes, 0, length)).toString();
    }

    /** The line (from 1) the last record returned starts on; after the end, the partial record's. */
    public int line() {
        return line;
    }

    /** The byte offset just after the last complete record. */
    public long end() {
        return end;
    }

    /** After {@link #next} returned null: whether an incomplete record followed the last complete one. */
    public boolean partial() {
        return partial;
    }
}
