package org.sectio.geometry.family;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.sectio.geometry.Dielectric;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.Material;
import org.sectio.geometry.Region;

/**
 * "rod_loaded_circular": a circular guide centred at the origin loaded with a concentric dielectric
 * rod (rod_radius), a dielectric liner on its wall (liner_thickness, an annulus), or both, of one
 * material. For a liner alone set rod_radius to 0; at least one of the two must be present.
 */
final class RodLoadedCircularFamily extends ListedFamily {

    private static final List<FamilyParameter> PARAMETERS = List.of(
            FamilyParameter.length("radius", "inner radius of the tube", CircularFamily.DEFAULT_RADIUS, "> 0"),
            FamilyParameter.length("rod_radius", "radius of the concentric rod; 0 for none", 3.0e-3,
                    "≥ 0 and ≤ radius − liner_thickness; not 0 together with liner_thickness"),
            FamilyParameter.length("liner_thickness", "thickness of the liner on the wall; 0 for none", 0,
                    "≥ 0 and < radius"),
            DielectricParameters.PERMITTIVITY,
            DielectricParameters.LOSS_TANGENT);

    RodLoadedCircularFamily() {
        super("rod_loaded_circular", "circular guide with a concentric dielectric rod and/or a dielectric liner, centred at the origin", PARAMETERS);
    }

    @Override
    public GuideSection build(Map<String, Double> values) {
        ParameterValues v = ParameterValues.resolve(name(), PARAMETERS, values);
        v.requirePositive("radius");
        double radius = v.get("radius");
        double liner = v.get("liner_thickness");
        v.require("liner_thickness", liner >= 0 && liner < radius, "≥ 0 and < radius (" + v.shown("radius") + ")");
        double rod = v.get("rod_radius");
        double linerInside = radius - liner;
        v.require("rod_radius", rod >= 0 && rod <= linerInside,
                "≥ 0 and ≤ radius − liner_thickness (" + ParameterValues.mm(linerInside) + ")");
        v.require("rod_radius", rod > 0 || liner > 0, "> 0 when liner_thickness is 0 (a rod, a liner or both)");
        Material material = DielectricParameters.material(v);
        List<Dielectric> dielectrics = new ArrayList<>();
        if (rod > 0) {
            dielectrics.add(new Dielectric("rod", Region.of(CircleLoop.of(0, 0, rod)), material));
        }
        if (liner > 0) {
            Region annulus = new Region(List.of(CircleLoop.of(0, 0, radius), CircleLoop.of(0, 0, linerInside)));
            dielectrics.add(new Dielectric("liner", annulus, material));
        }
        return new GuideSection("rod_loaded_circular, radius " + v.shown("radius") + ", rod " + v.shown("rod_radius")
                + ", liner " + v.shown("liner_thickness") + ", εr " + v.shown("permittivity"),
                Region.of(CircleLoop.of(0, 0, radius)), dielectrics, Material.AIR);
    }
}
