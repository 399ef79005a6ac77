package org.spanlift.cli.options;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class OutputFileTest {

    @TempDir
    Path dir;

    @Test
    void anOutputFileGetsThePermissionsOfAnyNewFileInItsFolder() throws IOException {
        assumeTrue(FileSystems.getDefault().supportedFileAttributeViews().contains("posix"), "POSIX permissions");
        Path plain = Files.createFile(dir.resolve("plain.txt"));
        Path written = dir.resolve("written.txt");
        OutputTarget.resolve("--output", written).write("x".getBytes(StandardCharsets.UTF_8));
        assertEquals(Files.getPosixFilePermissions(plain), Files.getPosixFilePermissions(written));
    }

    @Test
    void replacingAFileLeavesOnlyTheNewContentAndNoTemporaryFile() throws IOException {
        Path out = dir.resolve("out.csv");
        Files.writeString(out, "old");
        OutputTarget.resolve("--output", out).write("new".getBytes(StandardCharsets.UTF_8));
        assertArrayEquals("new".getBytes(StandardCharsets.UTF_8), Files.readAllBytes(out));
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(List.of(out), files.toList());
        }
    }
}
