package org.sectio.modes;

import java.util.ArrayList;
import java.util.List;
import org.sectio.geometry.Bounds;
import org.sectio.geometry.CrossSection;

/**
 * Names computed modes from their fields, never from their position in the sorted list.
 *
 * <ul>
 *   <li>Mirror parity about the vertical and horizontal lines through the centre of the bounding
 *       box, where the guide has that mirror ({@link SectionShape}, {@link MirrorParity}).</li>
 *   <li>Rectangular guides: TE_mn / TM_mn by projection onto the closed-form patterns
 *       (RectangleIndices; Pozar, Microwave Engineering, 4th ed., §3.3), labelled "TE10".</li>
 *   <li>Circular guides: TE_nm / TM_nm with n from the azimuthal Fourier power and m from the sign
 *       changes of the radial profile (CircleIndices; Pozar §3.4), labelled "TE11 (circular)". Both
 *       members of a degenerate pair get the same label: the analysis does not depend on the pair's
 *       orientation.</li>
 *   <li>Other guides: "TE #k" with k the mode's index in its family, followed by the parities
 *       (vertical line first) when the guide has a mirror, e.g. "TE #2, odd/even".</li>
 *   <li>TEM modes: "TEM", or "TEM #k" when the guide has several.</li>
 * </ul>
 *
 * <p>Where it can fail: modes resolved by fewer than about four samples per half period (the indices
 * tried are capped at a quarter of the samples across); a rectangle or circle with a dielectric
 * region (reported as another guide, since the textbook indices do not apply); a field that is a
 * mixture of two degenerate modes of the same family in a rectangle (a square guide's TE10/TE01
 * pair), where the dominant pattern is reported with a purity near ½; parity of a degenerate member
 * comes out {@link Parity#MIXED} because its orientation is arbitrary.
 */
public final class ModeIdentifier {

    private ModeIdentifier() {
    }

    /**
     * Identifies one mode.
     *
     * @param section the cross-section the mode was solved on
     * @param mode the mode, with its field
     * @return its identity
     * @throws IllegalArgumentException if the mode carries no field
     */
    public static ModeIdentity identify(CrossSection section, Mode mode) {
        return identify(SectionShape.of(section), mode);
    }

    /**
     * Identifies every mode of a solve (the shape is recognized once).
     *
     * @param section the cross-section the set was solved on
     * @param modes the solve
     * @return one identity per mode, in the set's order
     * @throws IllegalArgumentException if a mode carries no field
     */
    public static List<ModeIdentity> identify(CrossSection section, ModeSet modes) {
        SectionShape shape = SectionShape.of(section);
        List<ModeIdentity> out = new ArrayList<>(modes.modes().size());
        long temCount = modes.modes().stream().filter(m -> m.family() == ModeFamily.TEM).count();
        for (Mode m : modes.modes()) {
            ModeIdentity id = identify(shape, m);
            if (m.family() == ModeFamily.TEM && temCount == 1) {
                id = new ModeIdentity(id.family(), id.shape(), -1, -1, Double.NaN, id.aboutVertical(),
                        id.aboutHorizontal(), "TEM");
            }
            out.add(id);
        }
        return List.copyOf(out);
    }

    /**
     * Identifies one mode on a recognized shape.
     *
     * @param shape the cross-section's shape and mirrors
     * @param mode the mode, with its field
     * @return its identity
     * @throws IllegalArgumentException if the mode carries no field
     */
    public static ModeIdentity identify(SectionShape shape, Mode mode) {
        if (mode.field() == null) {
            throw new IllegalArgumentException("mode " + mode.label() + " has no field to identify it from");
        }
        FieldSamples samples = new FieldSamples(mode.field());
        MirrorParity vertical = shape.mirroredAboutVertical()
                ? MirrorParity.fromAgreement(FieldParity.agreement(samples, true, shape.centreX()))
                : MirrorParity.absent();
        MirrorParity horizontal = shape.mirroredAboutHorizontal()
                ? MirrorParity.fromAgreement(FieldParity.agreement(samples, false, shape.centreY()))
                : MirrorParity.absent();
        ModeFamily family = mode.family();
        boolean tm = family == ModeFamily.TM;
        Bounds box = shape.bounds();
        if (family != ModeFamily.TEM && shape.kind() == GuideShape.RECTANGULAR) {
            double[] mn = RectangleIndices.of(samples, box, tm);
            int m = (int) mn[0];
            int n = (int) mn[1];
            return new ModeIdentity(family, shape.kind(), m, n, mn[2], vertical, horizontal, family + indices(m, n));
        }
        if (family != ModeFamily.TEM && shape.kind() == GuideShape.CIRCULAR) {
            double[] nm = CircleIndices.of(samples, shape.centreX(), shape.centreY(), 0.5 * box.width(), tm);
            int n = (int) nm[0];
            int m = (int) nm[1];
            return new ModeIdentity(family, shape.kind(), n, m, nm[2], vertical, horizontal,
                    family + indices(n, m) + " (circular)");
        }
        String label = family == ModeFamily.TEM ? "TEM #" + mode.index() : family + " #" + mode.index();
        if (shape.mirroredAboutVertical() || shape.mirroredAboutHorizontal()) {
            label += ", " + vertical.parity().word() + "/" + horizontal.parity().word();
        }
        return new ModeIdentity(family, shape.kind(), -1, -1, Double.NaN, vertical, horizontal, label);
    }

    /** "10" for (1, 0); "10,2" once an index has two digits, so the digits stay readable. */
    private static String indices(int first, int second) {
        return first < 10 && second < 10 ? "" + first + second : first + "," + second;
    }
}
