package org.spanlift.cli.options;

import java.io.FilterOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ThreadLocalRandom;

import org.spanlift.input.InputException;

/**
 * Where one output goes, decided before anything is written, and the writing itself.
 *
 * <ul>
 * <li>A regular file, or a name that does not exist yet in an existing folder: {@link Kind#FILE}. It is
 * written whole or not at all: a temporary file with a short name beside it, then an atomic rename onto it.
 * A file another spanlift run holds locked (a sweep writing its rows) is refused.</li>
 * <li>A character device, a FIFO, or a descriptor the process already has open ({@code /dev/stdout}, any
 * path through {@code /proc}): {@link Kind#STREAM}. The bytes are streamed into it; nothing is ever renamed
 * over it (as root, a rename onto {@code /dev/null} would replace the device with a plain file).</li>
 * <li>A folder is refused, as is a path whose folder does not exist.</li>
 * <li>A symbolic link is followed to the file it names (through any chain of links): that file is the
 * output, replaced atomically, and the link itself is left as it is. Temporary files, and the files a sweep
 * writes beside its results, go beside the file the link names.</li>
 * </ul>
 */
public final class OutputTarget {

    /** How an output is written. */
    public enum Kind {
        /** A regular or new file, replaced atomically. */
        FILE,
        /** A device, a FIFO or an open descriptor, written as a stream. */
        STREAM
    }

    /** Links followed at most (as the system's own limit). */
    private static final int MAX_LINKS = 40;

    /** The longest file name, in bytes, that common file systems take. */
    static final int MAX_NAME_BYTES = 255;

    private final String option;
    private final Path given;
    private final Path file;
    private final Kind kind;

    private OutputTarget(String option, Path given, Path file, Kind kind) {
        this.option = option;
        this.given = given;
        this.file = file;
        this.kind = kind;
    }

    /**
     * Decides where an output goes.
     *
     * @param option the option that names it (for messages), such as {@code --output}
     * @param given  the path as given
     * @throws InputException for a folder, a path in a missing folder, or a loop of links
     */
    public static OutputTarget resolve(String option, Path given) {
        Path at = given.toAbsolutePath();
        requireShortName(option, at);
        for (int hops = 0; ; hops++) {
            if (isDescriptor(at)) {
                return new OutputTarget(option, given, given, Kind.STREAM);
            }
            if (!Files.isSymbolicLink(at)) {
                break;
            }
            if (hops == MAX_LINKS) {
                throw new InputException(option, 0, "", given + " is a chain of more than " + MAX_LINKS
                        + " symbolic links; expected a file");
            }
            try {
                Path to = Files.readSymbolicLink(at);
                at = to.isAbsolute() ? to : at.resolveSibling(to);
                requireShortName(option, at);
            } catch (IOException e) {
                throw new InputException(option, 0, "", "cannot read the symbolic link " + at + " (" + reason(e) + ")");
            }
        }
        BasicFileAttributes attributes;
        try {
            attributes = Files.readAttributes(at, BasicFileAttributes.class, LinkOption.NOFOLLOW_LINKS);
        } catch (NoSuchFileException e) {
            attributes = null;
        } catch (IOException e) {
            throw new InputException(option, 0, "", "cannot examine " + given + " (" + reason(e) + ")");
        }
        if (attributes == null) {
            Path folder = at.getParent();
            if (folder != null && !Files.isDirectory(folder)) {
                throw new InputException(option, 0, "", "the folder " + folder + " of " + given
                        + " does not exist; expected an output path in an existing folder");
            }
            return new OutputTarget(option, given, at, Kind.FILE);
        }
        if (attributes.isDirectory()) {
            throw new InputException(option, 0, "", given + " is a folder; expected a file name");
        }
        return new OutputTarget(option, given, at, attributes.isRegularFile() ? Kind.FILE : Kind.STREAM);
    }

    private static void requireShortName(String option, Path absolute) {
        Path name = absolute.getFileName();
        int bytes = name == null ? 0 : name.toString().getBytes(StandardCharsets.UTF_8).length;
        if (bytes > MAX_NAME_BYTES) {
            throw new InputException(option, 0, "", "the file name " + name + " is " + bytes
                    + " bytes long; expected a "
                    + "name of at most " + MAX_NAME_BYTES + " bytes");
        }
    }

    /** A path into {@code /proc} (where {@code /dev/stdout} and {@code /dev/fd/N} lead): an open descriptor. */
    private static boolean isDescriptor(Path absolute) {
        return absolute.startsWith("/proc") || absolute.startsWith("/dev/fd");
    }

    /** The option that names this output. */
    public String option() {
        return option;
    }

    /** The path as given. */
    public Path given() {
        return given;
    }

    /** The file written: with links followed for a {@link Kind#FILE}, the path as given for a stream. */
    public Path file() {
        return file;
    }

    public Kind kind() {
        return kind;
    }

    /**
     * The output's path for naming the files beside it: as given when no link was followed (so messages
     * show it as typed), else the file the link names.
     */
    public Path base() {
        return file.equals(given.toAbsolutePath()) ? given : file;
    }

    /** True when this output is a regular file now (not a new one, not a stream). */
    public boolean exists() {
        return kind == Kind.FILE && Files.isRegularFile(file, LinkOption.NOFOLLOW_LINKS);
    }

    /**
     * True when writing this output would write {@code other}'s file as well: the same existing file (also
     * through hard links), or the same name in the same folder (folders compared by their real paths).
     */
    public boolean sameFileAs(OutputTarget other) {
        Path a = file;
        Path b = other.file;
        if (Files.exists(a) && Files.exists(b)) {
            try {
                return Files.isSameFile(a, b);
            } catch (IOException e) {
                return false;
            }
        }
        return canonical(a).equals(canonical(b));
    }

    /** True when this output is the existing regular file {@code input} (through links or hard links). */
    public boolean isInput(Path input) {
        if (kind != Kind.FILE || !Files.isRegularFile(input) || !Files.exists(file)) {
            return false;
        }
        try {
            return Files.isSameFile(file, input);
        } catch (IOException e) {
            return false;
        }
    }

    private static Path canonical(Path p) {
        Path absolute = p.toAbsolutePath();
        Path folder = absolute.getParent();
        if (folder == null) {
            return absolute;
        }
        try {
            return folder.toRealPath().resolve(absolute.getFileName());
        } catch (IOException e) {
            return absolute.normalize();
        }
    }

    /** Writes the output's bytes into it. */
    public void write(byte[] bytes) {
        write(out -> out.write(bytes));
    }

    /** What writes an output's content. */
    @FunctionalInterface
    public interface Body {
        void writeTo(OutputStream out) throws IOException;
    }

    /**
     * Writes the output: a file whole or not at all, a stream straight. An {@link InputException} the body
     * throws leaves nothing behind (a file's temporary copy is removed).
     */
    public void write(Body body) {
        begin(body).close();
    }

    /**
     * Writes the output and keeps it locked until the returned handle is closed, for writers that put more
     * files beside it (a sweep's manifest and ranked summary) that belong to the same run.
     */
    public Written begin(Body body) {
        OutputTarget now = resolve(option, given);
        if (now.kind == Kind.STREAM) {
            try (OutputStream out = Files.newOutputStream(now.file, StandardOpenOption.WRITE,
                    StandardOpenOption.APPEND)) {
                body.writeTo(out);
            } catch (IOException e) {
                throw cannotWrite(option, given, e);
            }
            return new Written(List.of());
        }
        return replace(now.file, body);
    }

    /** The locks an atomic write holds until it is closed. */
    public static final class Written implements AutoCloseable {

        private final List<FileChannel> held;

        private Written(List<FileChannel> held) {
            this.held = held;
        }

        @Override
        public void close() {
            for (FileChannel c : held) {
                try {
                    c.close();
                } catch (IOException e) {
                    // closing releases the lock; the file itself is already in place
                }
            }
        }
    }

    private Written replace(Path target, Body body) {
        List<FileChannel> held = new ArrayList<>();
        Path tmp = null;
        boolean done = false;
        try {
            FileChannel old = lockExisting(target);
            if (old != null) {
                held.add(old);
            }
            tmp = temporarySibling(target);
            FileChannel ch = FileChannel.open(tmp, StandardOpenOption.WRITE);
            held.add(ch);
            if (!tryLock(ch)) {
                throw busy(option, given);
            }
            OutputStream out = new FilterOutputStream(Channels.newOutputStream(ch)) {
                @Override
                public void write(byte[] b, int off, int len) throws IOException {
                    out.write(b, off, len);
                }

                @Override
                public void close() throws IOException {
                    flush();
                }
            };
            try (OutputStream buffered = new java.io.BufferedOutputStream(out, 1 << 16)) {
                body.writeTo(buffered);
            }
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            done = true;
            return new Written(held);
        } catch (IOException e) {
            throw cannotWrite(option, given, e);
        } finally {
            if (!done) {
                new Written(held).close();
                if (tmp != null) {
                    try {
                        Files.deleteIfExists(tmp);
                    } catch (IOException e) {
                        // nothing more can be done; the target is untouched
                    }
                }
            }
        }
    }

    /**
     * Locks an existing file before it is replaced, or refuses it when another run holds it. Returns the
     * channel holding the lock, or null when there is no file or it cannot be opened for writing (a
     * read-only file is replaced all the same: the rename needs only its folder to be writable).
     */
    private FileChannel lockExisting(Path target) throws IOException {
        if (!Files.isRegularFile(target, LinkOption.NOFOLLOW_LINKS)) {
            return null;
        }
        FileChannel ch;
        try {
            ch = FileChannel.open(target, StandardOpenOption.WRITE);
        } catch (AccessDeniedException | NoSuchFileException e) {
            return null;
        }
        if (!tryLock(ch)) {
            ch.close();
            throw busy(option, given);
        }
        return ch;
    }

    /** Takes an exclusive lock for this process; false when another run (or this one) holds it. */
    public static boolean tryLock(FileChannel ch) throws IOException {
        try {
            FileLock lock = ch.tryLock();
            return lock != null;
        } catch (OverlappingFileLockException e) {
            return false;
        }
    }

    /** The refusal of an output another run is writing. */
    public static InputException busy(String option, Path given) {
        return new InputException(option, 0, "", given + " is being written by another spanlift run (it holds the "
                + "file locked); wait for that run to finish or choose another output file");
    }

    /** An input/output failure while writing an output (a full disk, a closed pipe): the environment's. */
    public static InputException cannotWrite(String option, Path given, IOException e) {
        return new InputException(option, 0, "", "cannot write " + given + " (" + reason(e) + ")");
    }

    private static String reason(IOException e) {
        if (e instanceof AccessDeniedException) {
            return "permission denied";
        }
        if (e instanceof NoSuchFileException) {
            return "no such file or folder";
        }
        String m = e.getMessage();
        return m == null || m.isBlank() ? e.getClass().getSimpleName() : m;
    }

    /**
     * Creates an empty temporary file beside the target, to be moved onto it when complete. Its name is
     * short whatever the target's (a name near the system's limit of 255 bytes still gets one), and like any
     * new file in that folder it gets the user's usual permissions (the umask), so the output, once moved
     * into place, is as readable as the user expects.
     */
    public static Path temporarySibling(Path target) throws IOException {
        Path absolute = target.toAbsolutePath();
        for (int attempt = 1; ; attempt++) {
            Path tmp = absolute.resolveSibling(".spanlift-" + Long.toHexString(ThreadLocalRandom.current().nextLong()
                    & 0xffffffffffffL) + ".part");
            try {
                return Files.createFile(tmp);
            } catch (FileAlreadyExistsException e) {
                if (attempt == 100) {
                    throw e;
                }
            }
        }
    }

    /** Writes all of a buffer at a position of a channel. */
    public static void writeFully(FileChannel ch, ByteBuffer b, long position) throws IOException {
        long at = position;
        while (b.hasRemaining()) {
            at += ch.write(b, at);
        }
    }

    @Override
    public String toString() {
        return option + " " + given;
    }
}
