package org.spanlift.cli.options;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.spanlift.input.InputException;
import org.spanlift.input.YamlParser;
import org.spanlift.input.YamlValue;

/**
 * The files a command reads, for {@link OutputOptions#check}: an output must never be one of them. A wing
 * file brings the coordinate files its sections name ({@code camber-file}).
 */
public final class InputFiles {

    private InputFiles() {
    }

    /** The wing files and the coordinate files their sections name. */
    public static List<Path> wings(List<Path> wingFiles) {
        List<Path> out = new ArrayList<>();
        for (Path w : wingFiles) {
            out.addAll(wing(w));
        }
        return out;
    }

    /**
     * A wing file and the coordinate files its sections name. A file that cannot be read or parsed adds
     * nothing more (its reader reports it); only a regular file is read here, so a FIFO is left to the reader.
     */
    public static List<Path> wing(Path wingFile) {
        List<Path> out = new ArrayList<>();
        if (wingFile == null) {
            return out;
        }
        out.add(wingFile);
        if (!Files.isRegularFile(wingFile)) {
            return out;
        }
        try {
            YamlValue tree = YamlParser.parse(Files.readString(wingFile, StandardCharsets.UTF_8), wingFile.toString());
            out.addAll(coordinateFiles(tree, wingFile));
        } catch (IOException | InputException e) {
            // the wing reader reports what is wrong with the file
        }
        return out;
    }

    /** The {@code sections.NAME.camber-file} paths of a wing tree, resolved against the wing file's folder. */
    public static List<Path> coordinateFiles(YamlValue tree, Path wingFile) {
        List<Path> out = new ArrayList<>();
        if (!(tree instanceof YamlValue.Mapping root)
                || !(root.get("sections").orElse(null) instanceof YamlValue.Mapping sections)) {
            return out;
        }
        Path folder = wingFile.toAbsolutePath().getParent();
        for (YamlValue.Entry e : sections.entries()) {
            if (e.value() instanceof YamlValue.Mapping section
                    && section.get("camber-file").orElse(null) instanceof YamlValue.Scalar file && !file.isNull()) {
                try {
                    out.add(folder == null ? Path.of(file.text()) : folder.resolve(file.text()));
                } catch (InvalidPathException ignored) {
                    // the section reader reports it
                }
            }
        }
        return out;
    }
}
