package org.sectio.geometry.family;

import java.util.List;
import java.util.Map;
import org.sectio.geometry.Dielectric;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.Material;
import org.sectio.geometry.Outline;
import org.sectio.geometry.Region;

/**
 * "slab_on_broad_wall": an air-filled rectangle centred at the origin with a full-width dielectric
 * layer lying on its bottom broad wall (y from −height/2 to −height/2 + slab_thickness).
 */
final class SlabOnBroadWallFamily extends ListedFamily {

    private static final List<FamilyParameter> PARAMETERS = List.of(
            RectangularFamily.WIDTH,
            RectangularFamily.HEIGHT,
            FamilyParameter.length("slab_thickness", "thickness of the layer on the bottom wall, along y", 1.5e-3,
                    "> 0 and ≤ height"),
            DielectricParameters.PERMITTIVITY,
            DielectricParameters.LOSS_TANGENT);

    SlabOnBroadWallFamily() {
        super("slab_on_broad_wall", "rectangular guide with a full-width dielectric layer on its bottom broad wall, centred at the origin", PARAMETERS);
    }

    @Override
    public GuideSection build(Map<String, Double> values) {
        ParameterValues v = ParameterValues.resolve(name(), PARAMETERS, values);
        v.requirePositive("width");
        v.requirePositive("height");
        double width = v.get("width");
        double height = v.get("height");
        double thickness = v.get("slab_thickness");
        v.require("slab_thickness", thickness > 0 && thickness <= height, "> 0 and ≤ height (" + v.shown("height") + ")");
        Material material = DielectricParameters.material(v);
        double hw = width / 2;
        double hh = height / 2;
        double top = -hh + thickness;
        Region slab = Region.of(Outline.startAt(-hw, -hh).lineTo(hw, -hh).lineTo(hw, top).lineTo(-hw, top).close());
        Region interior = Region.of(Outline.startAt(-hw, -hh).lineTo(hw, -hh).lineTo(hw, hh).lineTo(-hw, hh).close());
        return new GuideSection("slab_on_broad_wall " + v.shown("width") + " × " + v.shown("height") + ", layer "
                + v.shown("slab_thickness") + ", εr " + v.shown("permittivity"),
                interior, List.of(new Dielectric("layer on the bottom wall", slab, material)), Material.AIR);
    }
}
