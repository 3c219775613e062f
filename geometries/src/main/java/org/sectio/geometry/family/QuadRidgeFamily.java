package org.sectio.geometry.family;

import java.util.List;
import java.util.Map;
import org.sectio.geometry.GuideSection;

/**
 * "quad_ridge": a square centred at the origin with a centred ridge on each of its four walls; the
 * two pairs of opposite ridges leave the same gap between their tips. Tip corners may be rounded and
 * the ridges' feet filleted. Ridges narrower than the gap keep neighbouring ridges apart; then every
 * fillet allowed by the depth also fits beside its ridge.
 */
final class QuadRidgeFamily extends ListedFamily {

    private static final List<FamilyParameter> PARAMETERS = List.of(
            FamilyParameter.length("side", "inner side of the square", 20.0e-3, "> 0"),
            FamilyParameter.length("ridge_width", "width of each ridge", 3.0e-3, "> 0 and < gap"),
            FamilyParameter.length("gap", "space between the tips of opposite ridges", 4.0e-3, "> 0 and < side"),
            FamilyParameter.length("ridge_corner_radius", "radius rounding the two tip corners of each ridge", 0,
                    "≥ 0, ≤ ridge_width / 2 and ≤ ridge depth ((side − gap) / 2) − fillet_radius"),
            FamilyParameter.length("fillet_radius", "radius of the concave fillets where a ridge meets its wall", 0,
                    "≥ 0 and ≤ ridge depth ((side − gap) / 2)"));

    QuadRidgeFamily() {
        super("quad_ridge", "quad-ridge guide: a square with a centred ridge on each wall, centred at the origin", PARAMETERS);
    }

    @Override
    public GuideSection build(Map<String, Double> values) {
        ParameterValues v = ParameterValues.resolve(name(), PARAMETERS, values);
        v.requirePositive("side");
        double side = v.get("side");
        double gap = v.get("gap");
        double ridgeWidth = v.get("ridge_width");
        v.require("gap", gap > 0 && gap < side, "> 0 and < side (" + v.shown("side") + ")");
        v.require("ridge_width", ridgeWidth > 0 && ridgeWidth < gap, "> 0 and < gap (" + v.shown("gap") + ")");
        double depth = (side - gap) / 2;
        double fillet = v.get("fillet_radius");
        v.require("fillet_radius", fillet >= 0 && fillet <= depth, "≥ 0 and ≤ ridge depth (" + ParameterValues.mm(depth) + ")");
        double corner = v.get("ridge_corner_radius");
        v.require("ridge_corner_radius", corner >= 0 && corner <= ridgeWidth / 2 && corner <= depth - fillet,
                "≥ 0, ≤ ridge_width / 2 (" + ParameterValues.mm(ridgeWidth / 2) + ") and ≤ ridge depth − fillet_radius ("
                        + ParameterValues.mm(depth - fillet) + ")");
        RidgeNotch ridge = new RidgeNotch(ridgeWidth, depth, corner, fillet);
        return GuideSection.airFilled("quad_ridge " + v.shown("side") + " square, ridge " + v.shown("ridge_width")
                + ", gap " + v.shown("gap"), RidgedRectangle.outline(side, side, ridge, ridge, ridge, ridge));
    }
}
