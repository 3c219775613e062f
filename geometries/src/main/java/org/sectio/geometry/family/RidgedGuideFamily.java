package org.sectio.geometry.family;

import java.util.List;
import java.util.Map;
import org.sectio.geometry.GuideSection;

/**
 * "single_ridge" and "double_ridge": a rectangle centred at the origin, width along x, with one
 * centred ridge hanging from the top broad wall (single) or one on each broad wall (double), leaving
 * the given gap between ridge tip and bottom wall, or between the two tips (centred on y = 0). The tip
 * corners may be rounded (ridge_corner_radius) and the re-entrant corners at the ridge's foot filled
 * with concave fillets (fillet_radius).
 */
final class RidgedGuideFamily extends ListedFamily {

    private final int ridgesAcross;

    /**
     * @param name the family name
     * @param ridgesAcross 1 (ridge on the top wall) or 2 (ridges on both broad walls)
     */
    RidgedGuideFamily(String name, int ridgesAcross) {
        super(name, description(ridgesAcross), parameters(ridgesAcross));
        this.ridgesAcross = ridgesAcross;
    }

    private static String description(int ridgesAcross) {
        if (ridgesAcross != 1 && ridgesAcross != 2) {
            throw new IllegalArgumentException("a ridged rectangle has 1 or 2 ridges across, got " + ridgesAcross);
        }
        return ridgesAcross == 1
                ? "single-ridge guide: a rectangle with a centred ridge on its top broad wall, centred at the origin"
                : "double-ridge guide: a rectangle with facing centred ridges on both broad walls, centred at the origin";
    }

    private static List<FamilyParameter> parameters(int ridgesAcross) {
        String depth = ridgesAcross == 1 ? "ridge depth (height − gap)" : "ridge depth ((height − gap) / 2)";
        return List.of(
                RectangularFamily.WIDTH,
                RectangularFamily.HEIGHT,
                FamilyParameter.length("ridge_width", "width of each ridge, along x", RectangularFamily.WR90_WIDTH / 4,
                        "> 0 and < width"),
                FamilyParameter.length("gap", ridgesAcross == 1 ? "space between the ridge tip and the bottom wall"
                        : "space between the two ridge tips", 3.0e-3, "> 0 and < height"),
                FamilyParameter.length("ridge_corner_radius", "radius rounding the two tip corners of each ridge", 0,
                        "≥ 0, ≤ ridge_width / 2 and ≤ " + depth + " − fillet_radius"),
                FamilyParameter.length("fillet_radius", "radius of the concave fillets where a ridge meets its wall", 0,
                        "≥ 0, ≤ (width − ridge_width) / 2 and ≤ " + depth));
    }

    @Override
    public GuideSection build(Map<String, Double> values) {
        ParameterValues v = ParameterValues.resolve(name(), parameters(), values);
        v.requirePositive("width");
        v.requirePositive("height");
        double width = v.get("width");
        double height = v.get("height");
        double ridgeWidth = v.get("ridge_width");
        double gap = v.get("gap");
        v.require("ridge_width", ridgeWidth > 0 && ridgeWidth < width, "> 0 and < width (" + v.shown("width") + ")");
        v.require("gap", gap > 0 && gap < height, "> 0 and < height (" + v.shown("height") + ")");
        double depth = (height - gap) / ridgesAcross;
        double fillet = v.get("fillet_radius");
        double besideRidge = (width - ridgeWidth) / 2;
        v.require("fillet_radius", fillet >= 0 && fillet <= besideRidge && fillet <= depth,
                "≥ 0, ≤ (width − ridge_width) / 2 (" + ParameterValues.mm(besideRidge) + ") and ≤ ridge depth ("
                        + ParameterValues.mm(depth) + ")");
        double corner = v.get("ridge_corner_radius");
        v.require("ridge_corner_radius", corner >= 0 && corner <= ridgeWidth / 2 && corner <= depth - fillet,
                "≥ 0, ≤ ridge_width / 2 (" + ParameterValues.mm(ridgeWidth / 2) + ") and ≤ ridge depth − fillet_radius ("
                        + ParameterValues.mm(depth - fillet) + ")");
        RidgeNotch ridge = new RidgeNotch(ridgeWidth, depth, corner, fillet);
        String shownName = name() + " " + v.shown("width") + " × " + v.shown("height") + ", ridge " + v.shown("ridge_width")
                + ", gap " + v.shown("gap");
        return GuideSection.airFilled(shownName, RidgedRectangle.outline(width, height,
                ridgesAcross == 2 ? ridge : null, null, ridge, null));
    }
}
