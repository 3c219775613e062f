package org.sectio.io;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.security.SecureRandom;

/**
 * Writes a file so that it appears complete or not at all: the content goes to a temporary file in
 * the target's own folder, which is then moved over the target in one step. A failure leaves any
 * earlier version of the target untouched and removes the temporary file.
 */
public final class AtomicFile {

    /** Produces the bytes of a file. */
    @FunctionalInterface
    public interface Content {
        /**
         * @param out where to write; closed by the caller
         * @throws IOException if the content cannot be produced or written
         */
        void writeTo(OutputStream out) throws IOException;
    }

    private static final SecureRandom RANDOM = new SecureRandom();

    private AtomicFile() {
    }

    /**
     * @param target the file to create or replace; its folder must exist
     * @param content what to write into it
     * @throws IOException if the folder is missing or not writable, or writing fails
     */
    public static void write(Path target, Content content) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path folder = absolute.getParent();
        // not Files.createTempFile: that makes the file owner-only (0600), and the user's result would keep it
        Path temporary = folder.resolve("." + absolute.getFileName() + "." + Long.toUnsignedString(RANDOM.nextLong(), 36)
                + ".part");
        try {
            try (OutputStream out = new BufferedOutputStream(Files.newOutputStream(temporary,
                    StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE))) {
                content.writeTo(out);
            }
            try {
                Files.move(temporary, absolute, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temporary, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(temporary);
        }
    }
}
