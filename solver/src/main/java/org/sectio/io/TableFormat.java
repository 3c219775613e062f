package org.sectio.io;

/** The ways a {@link ModeTableWriter} can lay out a mode table. */
public enum TableFormat {
    /** Aligned columns for reading, with a header naming the section and grid and a timing footer. */
    TABLE,
    /** Comma-separated values, one mode per row, SI units named in the header. */
    CSV,
    /** One JSON object with the section, grid, timing and modes. */
    JSON
}
