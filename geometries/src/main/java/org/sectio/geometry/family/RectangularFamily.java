package org.sectio.geometry.family;

import java.util.List;
import java.util.Map;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.Outline;

/** "rectangular": a plain rectangle, centred at the origin, width along x. Defaults: WR-90 (22.86 × 10.16 mm). */
final class RectangularFamily extends ListedFamily {

    static final double WR90_WIDTH = 22.86e-3;
    static final double WR90_HEIGHT = 10.16e-3;

    /** The broad side a of every rectangle-based family, WR-90's by default. */
    static final FamilyParameter WIDTH = FamilyParameter.length("width", "inner broad side a, along x", WR90_WIDTH, "> 0");
    /** The narrow side b of every rectangle-based family, WR-90's by default. */
    static final FamilyParameter HEIGHT = FamilyParameter.length("height", "inner narrow side b, along y", WR90_HEIGHT,
            "> 0");

    private static final List<FamilyParameter> PARAMETERS = List.of(
            WIDTH, HEIGHT);

    RectangularFamily() {
        super("rectangular", "rectangular guide width × height, centred at the origin, width along x", PARAMETERS);
    }

    @Override
    public GuideSection build(Map<String, Double> values) {
        ParameterValues v = ParameterValues.resolve(name(), PARAMETERS, values);
        v.requirePositive("width");
        v.requirePositive("height");
        double hw = v.get("width") / 2;
        double hh = v.get("height") / 2;
        return GuideSection.airFilled("rectangular " + v.shown("width") + " × " + v.shown("height"),
                Outline.startAt(-hw, -hh).lineTo(hw, -hh).lineTo(hw, hh).lineTo(-hw, hh).close());
    }
}
