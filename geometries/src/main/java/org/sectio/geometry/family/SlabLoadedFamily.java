package org.sectio.geometry.family;

import java.util.List;
import java.util.Map;
import org.sectio.geometry.Dielectric;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.Material;
import org.sectio.geometry.Outline;
import org.sectio.geometry.Region;

/**
 * "slab_loaded": an air-filled rectangle centred at the origin holding a full-height dielectric slab
 * parallel to the narrow walls. The slab's centre is at x = slab_centre (0: the guide's centre line;
 * ± (width − slab_width) / 2: against a narrow wall).
 */
final class SlabLoadedFamily extends ListedFamily {

    private static final List<FamilyParameter> PARAMETERS = List.of(
            RectangularFamily.WIDTH,
            RectangularFamily.HEIGHT,
            FamilyParameter.length("slab_width", "thickness of the slab, along x", 2.0e-3, "> 0 and ≤ width"),
            FamilyParameter.length("slab_centre", "x of the slab's centre, measured from the guide's centre line", 0,
                    "within ± (width − slab_width) / 2"),
            DielectricParameters.PERMITTIVITY,
            DielectricParameters.LOSS_TANGENT);

    SlabLoadedFamily() {
        super("slab_loaded", "rectangular guide with a full-height dielectric slab parallel to the narrow walls, centred at the origin", PARAMETERS);
    }

    @Override
    public GuideSection build(Map<String, Double> values) {
        ParameterValues v = ParameterValues.resolve(name(), PARAMETERS, values);
        v.requirePositive("width");
        v.requirePositive("height");
        double width = v.get("width");
        double height = v.get("height");
        double slabWidth = v.get("slab_width");
        v.require("slab_width", slabWidth > 0 && slabWidth <= width, "> 0 and ≤ width (" + v.shown("width") + ")");
        double centre = v.get("slab_centre");
        double reach = (width - slabWidth) / 2;
        v.require("slab_centre", Math.abs(centre) <= reach,
                "within ± (width − slab_width) / 2 (± " + ParameterValues.mm(reach) + ") so the slab stays inside");
        Material material = DielectricParameters.material(v);
        double hw = width / 2;
        double hh = height / 2;
        // the slab's faces, snapped onto the walls when they touch them
        double left = centre - slabWidth / 2 <= -hw ? -hw : centre - slabWidth / 2;
        double right = centre + slabWidth / 2 >= hw ? hw : centre + slabWidth / 2;
        Region slab = Region.of(Outline.startAt(left, -hh).lineTo(right, -hh).lineTo(right, hh).lineTo(left, hh).close());
        Region interior = Region.of(Outline.startAt(-hw, -hh).lineTo(hw, -hh).lineTo(hw, hh).lineTo(-hw, hh).close());
        return new GuideSection("slab_loaded " + v.shown("width") + " × " + v.shown("height") + ", slab "
                + v.shown("slab_width") + " at x = " + v.shown("slab_centre") + ", εr " + v.shown("permittivity"),
                interior, List.of(new Dielectric("slab", slab, material)), Material.AIR);
    }
}
