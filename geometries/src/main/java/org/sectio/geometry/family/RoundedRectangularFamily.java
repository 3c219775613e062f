package org.sectio.geometry.family;

import java.util.List;
import java.util.Map;
import org.sectio.geometry.GuideSection;

/**
 * "rounded_rectangular": a rectangle whose four inner corners are rounded with one radius, centred at
 * the origin. Radius 0 is the plain rectangle (the same four segments as "rectangular"); radius half
 * the short side is the stadium (obround), built without its vanished straight sides, and a square
 * with radius half its side is a circle of four quarter arcs.
 */
final class RoundedRectangularFamily extends ListedFamily {

    private static final List<FamilyParameter> PARAMETERS = List.of(
            RectangularFamily.WIDTH,
            RectangularFamily.HEIGHT,
            FamilyParameter.length("corner_radius", "radius of the four rounded inner corners", 1.0e-3,
                    "≥ 0 and ≤ half the shorter side"));

    RoundedRectangularFamily() {
        super("rounded_rectangular", "rectangular guide with rounded inner corners, centred at the origin, width along x", PARAMETERS);
    }

    @Override
    public GuideSection build(Map<String, Double> values) {
        ParameterValues v = ParameterValues.resolve(name(), PARAMETERS, values);
        v.requirePositive("width");
        v.requirePositive("height");
        double width = v.get("width");
        double height = v.get("height");
        double r = v.get("corner_radius");
        double limit = Math.min(width, height) / 2;
        v.require("corner_radius", r >= 0 && r <= limit, "≥ 0 and ≤ half the shorter side (" + ParameterValues.mm(limit) + ")");
        double hw = width / 2;
        double hh = height / 2;
        double quarter = Math.PI / 2;
        OutlineTrace t = OutlineTrace.startAt(-hw + r, -hh, Math.max(width, height));
        t.lineTo(hw - r, -hh);
        if (r > 0) {
            t.arcTo(hw, -hh + r, quarter);
        }
        t.lineTo(hw, hh - r);
        if (r > 0) {
            t.arcTo(hw - r, hh, quarter);
        }
        t.lineTo(-hw + r, hh);
        if (r > 0) {
            t.arcTo(-hw, hh - r, quarter);
        }
        t.lineTo(-hw, -hh + r);
        if (r > 0) {
            t.arcTo(-hw + r, -hh, quarter);
        }
        return GuideSection.airFilled("rounded_rectangular " + v.shown("width") + " × " + v.shown("height")
                + ", corner radius " + v.shown("corner_radius"), t.close());
    }
}
