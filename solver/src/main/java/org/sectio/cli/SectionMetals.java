package org.sectio.cli;

import java.io.PrintWriter;
import java.util.LinkedHashSet;
import java.util.Set;
import org.sectio.geometry.CrossSection;
import org.sectio.physics.AnalysisSettings;
import org.sectio.physics.Conductor;

/**
 * Takes the wall metal a cross-section carries (a geometry file's {@code "conductor"} keys) into the
 * analysis when {@code --conductor} was not given. The wall loss takes one metal for every wall, so
 * that of the outer wall (conductor 0) is used; inner conductors of another metal are taken as it,
 * with a one-line note.
 */
final class SectionMetals {

    private SectionMetals() {
    }

    /**
     * @param settings the settings from the command line (their conductor: copper when none was given)
     * @param section the cross-section to analyse
     * @param notes where the note about inner conductors of another metal goes
     * @return the settings with the outer wall's metal, or unchanged when the section gives none
     */
    static AnalysisSettings applied(AnalysisSettings settings, CrossSection section, PrintWriter notes) {
        Conductor outer = section.wallMetal(0).map(Conductor::of).orElse(settings.conductor());
        Set<String> others = new LinkedHashSet<>();
        int count = section.conductors().size();
        for (int c = 1; c < count; c++) {
            section.wallMetal(c).map(Conductor::of).filter(m -> !m.equals(outer)).ifPresent(m -> others.add(m.name()));
        }
        if (!others.isEmpty()) {
            notes.println("note: inner conductors of " + String.join(", ", others) + " taken as the outer wall's "
                    + outer.name() + ": the wall loss uses one metal for every wall");
            notes.flush();
        }
        return settings.withConductor(outer);
    }
}
