package org.sectio.batch;

import org.sectio.modes.SolveSession;

/** What consecutive points of one chain share (see {@link SolveSession}). */
public enum Reuse {
    /** The symbolic analysis and the last eigenvectors as the Lanczos start: fastest; records depend on the chain. */
    ALL,
    /** The symbolic analysis only: every record is the same bit for bit as a solve on its own. */
    ANALYSIS,
    /** Nothing: every point is a solve on its own. */
    NONE;

    /** @return a fresh session for one chain, or null for {@link #NONE} */
    SolveSession session() {
        return switch (this) {
            case ALL -> SolveSession.createWarm();
            case ANALYSIS -> SolveSession.create();
            case NONE -> null;
        };
    }
}
