package org.sectio.geometry.family;

import java.util.List;
import java.util.Map;
import org.sectio.geometry.GuideSection;

/** "circular": a circle centred at the origin. Default radius 11 mm (TE11 cutoff about 7.99 GHz). */
final class CircularFamily extends ListedFamily {

    static final double DEFAULT_RADIUS = 11.0e-3;

    private static final List<FamilyParameter> PARAMETERS = List.of(
            FamilyParameter.length("radius", "inner radius of the tube", DEFAULT_RADIUS, "> 0"));

    CircularFamily() {
        super("circular", "circular guide centred at the origin", PARAMETERS);
    }

    @Override
    public GuideSection build(Map<String, Double> values) {
        ParameterValues v = ParameterValues.resolve(name(), PARAMETERS, values);
        v.requirePositive("radius");
        return GuideSection.airFilled("circular, radius " + v.shown("radius"),
                CircleLoop.of(0, 0, v.get("radius")).pieces());
    }
}
