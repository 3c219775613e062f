package org.sectio.geometry.family;

import java.util.List;
import java.util.Map;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.Material;
import org.sectio.geometry.Region;

/**
 * "coaxial": two concentric circles centred at the origin; the inner conductor is a hole in the
 * interior, so the section has two conductors (and one TEM mode). Defaults 3.5 mm and 1.52 mm: an
 * air line of about 50 Ω (60 Ω · ln(R/r)).
 */
final class CoaxialFamily extends ListedFamily {

    private static final List<FamilyParameter> PARAMETERS = List.of(
            FamilyParameter.length("outer_radius", "inner radius of the outer conductor", 3.5e-3, "> 0"),
            FamilyParameter.length("inner_radius", "radius of the centre conductor", 1.52e-3, "> 0 and < outer_radius"));

    CoaxialFamily() {
        super("coaxial", "coaxial line: a centre conductor inside a tube, both centred at the origin", PARAMETERS);
    }

    @Override
    public GuideSection build(Map<String, Double> values) {
        ParameterValues v = ParameterValues.resolve(name(), PARAMETERS, values);
        v.requirePositive("outer_radius");
        double outer = v.get("outer_radius");
        double inner = v.get("inner_radius");
        v.require("inner_radius", inner > 0 && inner < outer, "> 0 and < outer_radius (" + v.shown("outer_radius") + ")");
        Region interior = new Region(List.of(CircleLoop.of(0, 0, outer), CircleLoop.of(0, 0, inner)));
        return new GuideSection("coaxial " + v.shown("outer_radius") + " / " + v.shown("inner_radius"),
                interior, List.of(), Material.AIR);
    }
}
