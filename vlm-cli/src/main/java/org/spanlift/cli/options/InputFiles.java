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
 * file brings the files its sections name: coordinate files ({@code camber-file}) and lift-curve files
 * ({@code file} of {@code lift-curve} and of {@code flap-lift-curves}).
 */
public final class InputFiles {

    private InputFiles() {
    }

    /** The wing files and the files their sections name. */
    public static List<Path> wings(List<Path> wingFiles) {
        List<Path> out = new ArrayList<>();
        for (Path w : wingFiles) {
            out.addAll(wing(w));
        }
        return out;
    }

    /**
     * A wing file and the files its sections name. A file that cannot be read or parsed adds
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
            out.addAll(sectionFiles(tree, wingFile));
        } catch (IOException | InputException e) {
            // the wing reader reports what is wrong with the file
        }
        return out;
    }

    /**
     * The files the sections of a wing tree name, resolved against the wing file's folder: each
     * {@code sections.NAME.camber-file}, {@code sections.NAME.lift-curve.file} and
     * {@code sections.NAME.flap-lift-curves[i].file}.
     */
    public static List<Path> sectionFiles(YamlValue tree, Path wingFile) {
        List<Path> out = new ArrayList<>();
        if (!(tree instanceof YamlValue.Mapping root)
                || !(root.get("sections").orElse(null) instanceof YamlValue.Mapping sections)) {
            return out;
        }
        Path folder = wingFile.toAbsolutePath().getParent();
        for (YamlValue.Entry e : sections.entries()) {
            if (!(e.value() instanceof YamlValue.Mapping section)) {
                continue;
            }
            add(out, folder, section.get("camber-file").orElse(null));
            if (section.get("lift-curve").orElse(null) instanceof YamlValue.Mapping curve) {
                add(out, folder, curve.get("file").orElse(null));
            }
            if (section.get("flap-lift-curves").orElse(null) instanceof YamlValue.Sequence flaps) {
                for (YamlValue flap : flaps.items()) {
                    if (flap instanceof YamlValue.Mapping curve) {
                        add(out, folder, curve.get("file").orElse(null));
                    }
                }
            }
        }
        return out;
    }

    private static void add(List<Path> out, Path folder, YamlValue name) {
        if (name instanceof YamlValue.Scalar file && !file.isNull()) {
            try {
                out.add(folder == null ? Path.of(file.text()) : folder.resolve(file.text()));
            } catch (InvalidPathException ignored) {
                // the section reader reports it
            }
        }
    }
}
