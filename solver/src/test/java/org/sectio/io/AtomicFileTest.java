package org.sectio.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermission;
import java.util.Set;
import java.util.stream.Stream;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Files a user gets from Sectio: complete or absent, and with the permissions any new file there gets. */
class AtomicFileTest {

    @TempDir
    Path folder;

    @Test
    void aWrittenFileHasTheFolderDefaultPermissionsNotOwnerOnly() throws IOException {
        Assumptions.assumeTrue(folder.getFileSystem().supportedFileAttributeViews().contains("posix"));
        Path plain = Files.createFile(folder.resolve("plain.txt"));
        Path written = folder.resolve("written.txt");
        AtomicFile.write(written, out -> out.write("modes".getBytes(StandardCharsets.UTF_8)));
        Set<PosixFilePermission> expected = Files.getPosixFilePermissions(plain);
        assertEquals(expected, Files.getPosixFilePermissions(written));
        assertEquals("modes", Files.readString(written));
    }

    @Test
    void aFailingWriteLeavesTheOldFileAndNoTemporaryFile() throws IOException {
        Path target = folder.resolve("table.csv");
        Files.writeString(target, "old");
        assertThrows(IOException.class, () -> AtomicFile.write(target, out -> {
            out.write("half".getBytes(StandardCharsets.UTF_8));
            throw new IOException("disk full");
        }));
        assertEquals("old", Files.readString(target));
        try (Stream<Path> left = Files.list(folder)) {
            assertTrue(left.allMatch(target::equals), "only the old file remains");
        }
    }
}
