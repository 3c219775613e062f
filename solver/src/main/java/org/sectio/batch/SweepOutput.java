package org.sectio.batch;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.BitSet;
import java.util.List;

/**
 * One sweep output file, appended to one complete record at a time so that nothing finished is lost.
 *
 * <p>Why this is safe to kill at any moment: every record is one line written by a single
 * {@code write} of its bytes and forced to the device before the next point is reported done. A
 * process killed mid-write leaves at most one last line without its newline; opening the file again
 * finds it, cuts the file back to the last complete line, and the point is solved again. Complete lines
 * are checked against the sweep: the header (CSV) must be the same, and every record's index, total
 * and swept values must be those of the sweep's point of that index, so that a file of another sweep
 * is refused rather than mixed in.
 */
final class SweepOutput implements AutoCloseable {

    private final Path file;
    private final RecordFormat format;
    private final FileChannel channel;
    private final BitSet recorded;

    private SweepOutput(Path file, RecordFormat format, FileChannel channel, BitSet recorded) {
        this.file = file;
        this.format = format;
        this.channel = channel;
        this.recorded = recorded;
    }

    /**
     * Opens (creating if missing) the output of a sweep and reads which points it already holds.
     *
     * @param file the output file
     * @param format its layout
     * @param sweep the sweep it belongs to
     * @return the open output, positioned at its end
     * @throws IOException if the file cannot be read or written
     * @throws IllegalArgumentException if it holds something else than records of this sweep (one line
     *     naming the file, line and what differs), or another process holds its lock (a second run on
     *     the same output)
     */
    static SweepOutput open(Path file, RecordFormat format, SweepDefinition sweep) throws IOException {
        List<String> names = sweep.parameterNames();
        String header = format.header(names, sweep.record().columns());
        BitSet recorded = new BitSet(sweep.pointCount());
        FileChannel channel = FileChannel.open(file, StandardOpenOption.CREATE, StandardOpenOption.READ,
                StandardOpenOption.WRITE);
        try {
            FileLock lock;
            try {
                lock = channel.tryLock();
            } catch (OverlappingFileLockException e) {
                lock = null;
            }
            if (lock == null) {
                throw new IllegalArgumentException("'" + file + "' is being written by another running sweep;"
                        + " give each run (each shard) its own output file");
            }
            byte[] bytes = Files.readAllBytes(file);
            int complete = lastNewline(bytes) + 1;
            String text = new String(bytes, 0, complete, StandardCharsets.UTF_8);
            String[] lines = text.isEmpty() ? new String[0] : text.split("\n", -1);
            int first = 0;
            if (!header.isEmpty() && lines.length > 1) {
                if (!(lines[0] + "\n").equals(header)) {
                    throw new IllegalArgumentException("'" + file + "' has another header than this sweep's records;"
                            + " it is the output of another sweep: choose another output file");
                }
                first = 1;
            }
            for (int k = first; k < lines.length - 1; k++) {
                RecordFormat.Key key;
                try {
                    key = format.key(lines[k], names.size());
                } catch (IllegalArgumentException e) {
                    throw new IllegalArgumentException("'" + file + "' line " + (k + 1) + " " + e.getMessage());
                }
                check(file, k + 1, key, sweep);
                if (recorded.get(key.index())) {
                    throw new IllegalArgumentException("'" + file + "' line " + (k + 1) + ": point " + key.index()
                            + " is recorded twice");
                }
                recorded.set(key.index());
            }
            channel.truncate(complete);
            channel.position(complete);
            if (complete == 0 && !header.isEmpty()) {
                write(channel, header);
            }
            return new SweepOutput(file, format, channel, recorded);
        } catch (IOException | RuntimeException e) {
            channel.close();
            throw e;
        }
    }

    private static void check(Path file, int line, RecordFormat.Key key, SweepDefinition sweep) {
        String where = "'" + file + "' line " + line + ": ";
        if (key.total() != sweep.pointCount() || key.index() < 0 || key.index() >= sweep.pointCount()) {
            throw new IllegalArgumentException(where + "point " + key.index() + " of " + key.total()
                    + " does not belong to this sweep of " + sweep.pointCount() + " points; choose another output file");
        }
        List<String> expected = sweep.point(key.index()).values().values().stream().map(RecordFormat::number).toList();
        if (!expected.equals(key.parameters())) {
            throw new IllegalArgumentException(where + "point " + key.index() + " was recorded with " + sweep.parameterNames()
                    + " = " + key.parameters() + " but this sweep's point " + key.index() + " has " + expected
                    + "; the sweep file changed: choose another output file");
        }
    }

    private static int lastNewline(byte[] bytes) {
        for (int i = bytes.length - 1; i >= 0; i--) {
            if (bytes[i] == '\n') {
                return i;
            }
        }
        return -1;
    }

    private static void write(FileChannel channel, String text) throws IOException {
        ByteBuffer buffer = ByteBuffer.wrap(text.getBytes(StandardCharsets.UTF_8));
        while (buffer.hasRemaining()) {
            channel.write(buffer);
        }
        channel.force(false);
    }

    /** @return whether the point is recorded here */
    synchronized boolean has(int index) {
        return recorded.get(index);
    }

    /** @return how many points are recorded here */
    synchronized int count() {
        return recorded.cardinality();
    }

    /**
     * Appends a record and forces it to the device, unless the point is already recorded.
     *
     * @throws IOException if writing fails
     */
    synchronized void append(PointRecord record, SweepDefinition sweep) throws IOException {
        if (recorded.get(record.index())) {
            return;
        }
        write(channel, format.line(record, sweep.parameterNames(), sweep.record().columns()));
        recorded.set(record.index());
    }

    /** @return the file */
    Path file() {
        return file;
    }

    @Override
    public synchronized void close() throws IOException {
        channel.close();
    }
}
