package org.spanlift.cli.sweep;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.List;

import org.spanlift.cli.options.OutputTarget;
import org.spanlift.input.InputException;
import org.spanlift.sweep.Sweep;

/**
 * A sweep's output file, written row by row: each complete row is one positional write of its bytes,
 * straight to the file (no buffer in between), so a killed run leaves whole rows and at most one partial
 * last row.
 *
 * <p>The file is held under an exclusive lock for the whole run: a second run writing the same output is
 * refused (with its manifest and ranked summary, which only a run holding the output's lock writes). It is
 * read back only through the locked channel, since closing any other handle on it would drop the lock. On
 * {@code --resume} the manifest must match, every complete row is checked ({@link RowCheck}: the case
 * expected, its id, its parameter values), a trailing partial row is cut off, and writing continues after
 * the rows present. A fresh run opens and locks the file before it writes the manifest, so a file that
 * cannot be opened leaves nothing behind.
 */
public final class ResultsFile implements AutoCloseable {

    private final OutputTarget target;
    private final FileChannel channel;
    private final long next;
    private long end;

    private ResultsFile(OutputTarget target, FileChannel channel, long next, long end) {
        this.target = target;
        this.channel = channel;
        this.next = next;
        this.end = end;
    }

    /** The first case still to run. */
    public long next() {
        return next;
    }

    /**
     * Opens the output: a fresh file (manifest, then header) unless {@code resume} finds an unfinished run of
     * the same sweep and shard, which it continues.
     *
     * @param target the checked output (a regular or new file; links followed)
     * @param tally  receives the rows already in the file on resume
     */
    public static ResultsFile open(OutputTarget target, Sweep sweep, Shard shard, RowFormat format, boolean resume,
            Ranker tally) {
        Path file = target.file();
        Manifest manifest = Manifest.of(sweep, shard, format);
        List<String> names = RowFormat.columnNames(sweep);
        String header = format.header(names);
        long first = shard.first(sweep.design().count());
        boolean existed = Files.exists(file, LinkOption.NOFOLLOW_LINKS);
        FileChannel ch;
        try {
            ch = FileChannel.open(file, StandardOpenOption.CREATE, StandardOpenOption.READ, StandardOpenOption.WRITE);
        } catch (IOException e) {
            throw OutputTarget.cannotWrite(target.option(), target.given(), e);
        }
        boolean done = false;
        try {
            if (!OutputTarget.tryLock(ch)) {
                throw OutputTarget.busy(target.option(), target.given());
            }
            ResultsFile opened;
            if (resume && existed) {
                opened = resume(target, ch, manifest, format, names, header, sweep, first, tally);
            } else {
                ch.truncate(0);
                manifest.write(target.base());
                long at = 0;
                if (header != null) {
                    byte[] h = header.getBytes(StandardCharsets.UTF_8);
                    OutputTarget.writeFully(ch, ByteBuffer.wrap(h), 0);
                    at = h.length;
                }
                opened = new ResultsFile(target, ch, first, at);
            }
            done = true;
            return opened;
        } catch (IOException e) {
            throw OutputTarget.cannotWrite(target.option(), target.given(), e);
        } finally {
            if (!done) {
                try {
                    ch.close();
                    if (!existed) {
                        Files.deleteIfExists(file);
                    }
                } catch (IOException e) {
                    // the refusal being thrown says what went wrong
                }
            }
        }
    }

    private static ResultsFile resume(OutputTarget target, FileChannel ch, Manifest manifest, RowFormat format,
            List<String> names, String header, Sweep sweep, long first, Ranker tally) throws IOException {
        Path file = target.base();
        String shown = target.given().toString();
        Manifest old = Manifest.read(file);
        if (old == null || !old.sameRun(manifest)) {
            throw new InputException(shown, 0, "", old == null
                    ? "has no sweep manifest beside it (" + Manifest.pathFor(file).getFileName()
                            + "); cannot resume it; run without --resume to start over"
                    : "was written by a different sweep, shard or sweep-file version (its manifest differs); "
                            + "run without --resume to start over");
        }
        String again = "run without --resume to start over";
        RowReader reader = new RowReader(RowReader.from(ch), format);
        RowCheck check = new RowCheck(shown, format, names, sweep.parameters().size(), sweep, again);
        long rows = 0;
        try {
            if (header != null) {
                String h = reader.next();
                if (h == null) {
                    ch.truncate(0);
                    byte[] bytes = header.getBytes(StandardCharsets.UTF_8);
                    OutputTarget.writeFully(ch, ByteBuffer.wrap(bytes), 0);
                    return new ResultsFile(target, ch, first, bytes.length);
                }
                if (!(h + "\n").equals(header)) {
                    throw new InputException(shown, 1, "", "the header differs from this sweep's columns; " + again);
                }
            }
            String record;
            while ((record = reader.next()) != null) {
                long index = first + rows;
                tally.add(check.check(record, reader.line(), index), record, shown, reader.line());
                rows++;
            }
        } catch (CharacterCodingException e) {
            throw new InputException(shown, reader.line(), "", "the file is not UTF-8 text; " + again);
        }
        long keep = reader.end();
        if (keep < ch.size()) {
            ch.truncate(keep);
        }
        return new ResultsFile(target, ch, first + rows, keep);
    }

    /** Writes one complete row in a single write; a full disk or any failure to write refuses the run. */
    public void write(String row) {
        byte[] bytes = row.getBytes(StandardCharsets.UTF_8);
        try {
            OutputTarget.writeFully(channel, ByteBuffer.wrap(bytes), end);
        } catch (IOException e) {
            throw OutputTarget.cannotWrite(target.option(), target.given(), e);
        }
        end += bytes.length;
    }

    /** Releases the lock and closes the file. */
    @Override
    public void close() {
        try {
            channel.close();
        } catch (IOException e) {
            throw OutputTarget.cannotWrite(target.option(), target.given(), e);
        }
    }
}
