package org.sectio.geometry.family;

import java.util.List;
import java.util.Map;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.Outline;

/**
 * "elliptical": an ellipse centred at the origin, major axis along x, traced as four exact quarter
 * arcs of the ellipse (x/a)² + (y/b)² = 1. Equal semi-axes give the circle.
 */
final class EllipticalFamily extends ListedFamily {

    private static final List<FamilyParameter> PARAMETERS = List.of(
            FamilyParameter.length("semi_major", "semi-major axis a, along x", 12.0e-3, "> 0"),
            FamilyParameter.length("semi_minor", "semi-minor axis b, along y", 8.0e-3, "> 0 and ≤ semi_major"));

    EllipticalFamily() {
        super("elliptical", "elliptical guide centred at the origin, major axis along x", PARAMETERS);
    }

    @Override
    public GuideSection build(Map<String, Double> values) {
        ParameterValues v = ParameterValues.resolve(name(), PARAMETERS, values);
        v.requirePositive("semi_major");
        double a = v.get("semi_major");
        double b = v.get("semi_minor");
        v.require("semi_minor", b > 0 && b <= a, "> 0 and ≤ semi_major (" + v.shown("semi_major") + ")");
        return GuideSection.airFilled("elliptical " + v.shown("semi_major") + " × " + v.shown("semi_minor") + " semi-axes",
                Outline.startAt(a, 0)
                        .ellipticalArcTo(0, b, a, b, 0, false, true)
                        .ellipticalArcTo(-a, 0, a, b, 0, false, true)
                        .ellipticalArcTo(0, -b, a, b, 0, false, true)
                        .ellipticalArcTo(a, 0, a, b, 0, false, true)
                        .close());
    }
}
