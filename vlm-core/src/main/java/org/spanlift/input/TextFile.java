package org.spanlift.input;

import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;

/** Reads an input file as UTF-8 text, failing with one line that says what is wrong and what was expected. */
public final class TextFile {

    private TextFile() {
    }

    /**
     * @param path the file
     * @param what what the file should be, for the message: {@code "wing file"}, {@code "sweep file"}
     * @return its whole text
     * @throws InputException naming the file: missing, a folder, unreadable, or not UTF-8
     */
    public static String read(Path path, String what) {
        String file = path.toString();
        if (Files.isDirectory(path)) {
            throw new InputException(file, 0, "", "is a folder; expected the path of a " + what);
        }
        try {
            return Files.readString(path, StandardCharsets.UTF_8);
        } catch (CharacterCodingException e) {
            throw new InputException(file, 0, "", "the file is not UTF-8 text; expected a " + what + " saved as UTF-8");
        } catch (NoSuchFileException e) {
            throw new InputException(file, 0, "", "no such file; expected the path of a " + what);
        } catch (AccessDeniedException e) {
            throw new InputException(file, 0, "", "permission denied; expected a readable " + what);
        } catch (IOException e) {
            throw new InputException(file, 0, "", "cannot read the file" + (e.getMessage() == null ? ""
                    : " (" + e.getMessage() + ")") + "; expected a readable " + what);
        }
    }
}
