package org.spanlift.cli.sweep;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.List;

import org.spanlift.input.InputException;
import org.spanlift.batch.CaseResult;
import org.spanlift.sweep.Sweep;

/**
 * A sweep's output file, written row by row: each complete row is one write of its bytes, straight to the
 * file (no buffer in between), so a killed run leaves whole rows and at most one partial last row. On
 * {@code --resume} the manifest must match, a trailing partial row is cut off, the rows present are checked
 * to be the run's first cases in order, and writing continues after them.
 */
public final class ResultsFile implements AutoCloseable {

    private final OutputStream out;
    private final long next;

    private ResultsFile(OutputStream out, long next) {
        this.out = out;
        this.next = next;
    }

    /** The first case still to run. */
    public long next() {
        return next;
    }

    /**
     * Opens the output: a fresh file (manifest, then header) unless {@code resume} finds an unfinished run of
     * the same sweep and shard, which it continues.
     */
    public static ResultsFile open(Path output, Sweep sweep, Shard shard, RowFormat format, boolean resume) {
        Manifest manifest = Manifest.of(sweep, shard, format);
        List<String> names = RowFormat.columnNames(sweep);
        String header = format.header(names);
        long first = shard.first(sweep.design().count());
        try {
            if (resume && Files.exists(output)) {
                Manifest old = Manifest.read(output);
                if (old == null || !old.sameRun(manifest)) {
                    throw new InputException(output.toString(), 0, "", old == null
                            ? "has no sweep manifest beside it (" + Manifest.pathFor(output).getFileName()
                                    + "); cannot resume it; run without --resume to start over"
                            : "was written by a different sweep, shard or sweep-file version (its manifest differs); "
                                    + "run without --resume to start over");
                }
                long rows = cutPartialRow(output, header);
                long done = check(output, format, header, sweep, first, rows);
                return new ResultsFile(Files.newOutputStream(output, StandardOpenOption.APPEND), first + done);
            }
            manifest.write(output);
            OutputStream o = Files.newOutputStream(output, StandardOpenOption.CREATE,
                    StandardOpenOption.TRUNCATE_EXISTING, StandardOpenOption.WRITE);
            if (header != null) {
                o.write(header.getBytes(StandardCharsets.UTF_8));
            }
            return new ResultsFile(o, first);
        } catch (IOException e) {
            throw new InputException(output.toString(), 0, "", "cannot write the output file ("
                    + e.getClass().getSimpleName() + (e.getMessage() == null ? "" : ": " + e.getMessage()) + ")");
        }
    }

    /** Cuts the file after its last newline; rewrites a missing or partial header. Returns the byte size. */
    private static long cutPartialRow(Path output, String header) throws IOException {
        try (FileChannel ch = FileChannel.open(output, StandardOpenOption.READ, StandardOpenOption.WRITE)) {
            long size = ch.size();
            long keep = 0;
            ByteBuffer buf = ByteBuffer.allocate(8192);
            long pos = size;
            search:
            while (pos > 0) {
                int len = (int) Math.min(buf.capacity(), pos);
                pos -= len;
                buf.clear().limit(len);
                while (buf.hasRemaining()) {
                    if (ch.read(buf, pos + buf.position()) < 0) {
                        break;
                    }
                }
                for (int k = len - 1; k >= 0; k--) {
                    if (buf.get(k) == '\n') {
                        keep = pos + k + 1;
                        break search;
                    }
                }
            }
            if (keep < size) {
                ch.truncate(keep);
            }
            if (keep == 0 && header != null) {
                ch.write(ByteBuffer.wrap(header.getBytes(StandardCharsets.UTF_8)), 0);
            }
            return ch.size();
        }
    }

    /** Checks the complete rows: header, then cases first, first + 1, ... Returns how many rows there are. */
    private static long check(Path output, RowFormat format, String header, Sweep sweep, long first, long bytes)
            throws IOException {
        long rows = 0;
        String last = null;
        try (BufferedReader r = Files.newBufferedReader(output, StandardCharsets.UTF_8)) {
            if (header != null) {
                String h = r.readLine();
                if (h == null || !(h + "\n").equals(header)) {
                    throw new InputException(output.toString(), 1, "", "the header differs from this sweep's columns; "
                            + "run without --resume to start over");
                }
            }
            String line;
            while ((line = r.readLine()) != null) {
                long index;
                try {
                    index = format.caseIndex(line);
                } catch (IllegalArgumentException e) {
                    throw new InputException(output.toString(), (int) Math.min(Integer.MAX_VALUE, rows + 2), "",
                            "not a sweep row; run without --resume to start over");
                }
                if (index != first + rows) {
                    throw new InputException(output.toString(), (int) Math.min(Integer.MAX_VALUE, rows + 2), "",
                            "expected case " + (first + rows) + ", found case " + index
                                    + "; run without --resume to start over");
                }
                rows++;
                last = line;
            }
        }
        if (last != null) {
            long index = first + rows - 1;
            String id = CaseResult.id(sweep.parameters(), sweep.design().values(index));
            if (!last.contains(id)) {
                throw new InputException(output.toString(), 0, "", "case " + index + " has another id than this sweep "
                        + "gives it; run without --resume to start over");
            }
        }
        return rows;
    }

    /** Writes one complete row in a single write. */
    public void write(String row) {
        try {
            out.write(row.getBytes(StandardCharsets.UTF_8));
            out.flush();
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    @Override
    public void close() {
        try {
            out.close();
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }
}
