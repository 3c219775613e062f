package org.sectio.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.file.SectionFileException;
import org.sectio.geometry.file.SectionFiles;

/** Reads the cross-section a command works on, turning every problem into a one-line message. */
final class SectionInput {

    private SectionInput() {
    }

    /**
     * @param file a geometry file (JSON, see docs/geometry-files.md)
     * @return its cross-section
     * @throws IllegalArgumentException naming the file and what is wrong with it
     */
    static CrossSection read(Path file) {
        if (Files.isDirectory(file)) {
            throw new IllegalArgumentException("geometry file '" + file + "' is a folder, expected a JSON file");
        }
        try {
            return SectionFiles.read(file);
        } catch (SectionFileException e) {
            throw new IllegalArgumentException(e.getMessage());
        } catch (IOException e) {
            throw new IllegalArgumentException("cannot read geometry file: " + ErrorReporter.describe(e));
        }
    }
}
