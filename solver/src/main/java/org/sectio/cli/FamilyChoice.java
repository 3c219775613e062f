package org.sectio.cli;

import java.util.EnumSet;
import java.util.Set;
import org.sectio.modes.ModeFamily;

/** The values of {@code --family}: which mode families to solve for. */
enum FamilyChoice {
    /** Transverse electric modes only. */
    TE,
    /** Transverse magnetic modes only. */
    TM,
    /** Both families, merged by cutoff. */
    BOTH;

    /** @return the families this choice stands for */
    Set<ModeFamily> families() {
        return switch (this) {
            case TE -> EnumSet.of(ModeFamily.TE);
            case TM -> EnumSet.of(ModeFamily.TM);
            case BOTH -> EnumSet.allOf(ModeFamily.class);
        };
    }
}
