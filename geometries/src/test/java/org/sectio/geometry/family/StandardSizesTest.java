package org.sectio.geometry.family;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.sectio.geometry.GuideSection;

/**
 * The table of EIA RS-261-B rectangular sizes. The table's values are from memory (see
 * {@link StandardSizes}); these tests check them against what can be checked without the standard:
 * WR-90's widely quoted 0.900 × 0.400 in (also from memory), the naming practice (the WR number is
 * about 100 × a in inches), the near 2:1 aspect ratio, and that each recommended band lies in the
 * single-mode range of its guide, above the TE10 cutoff c/2a and below the next cutoffs c/a (TE20)
 * and c/2b (TE01) (Pozar, Microwave Engineering, 4th ed., §3.3).
 */
class StandardSizesTest {

    private static final double C = 299_792_458.0;

    /** Sizes whose a : b is not 2 : 1 (from memory, as the table). */
    private static final Set<String> NOT_TWO_TO_ONE = Set.of("WR-284", "WR-187", "WR-137", "WR-112", "WR-90", "WR-42");

    @Test
    @DisplayName("WR-90 is 0.900 × 0.400 in = 22.86 × 10.16 mm (EIA RS-261-B, value from memory)")
    void wr90IsTheXBandGuide() {
        StandardSize wr90 = StandardSizes.byName("WR-90");
        assertEquals(0.900, wr90.widthInches(), 0.0);
        assertEquals(0.400, wr90.heightInches(), 0.0);
        assertEquals(22.86e-3, wr90.width(), 1e-17);
        assertEquals(10.16e-3, wr90.height(), 1e-17);
        assertEquals(8.2e9, wr90.bandLowHz(), 0.0);
        assertEquals(12.4e9, wr90.bandHighHz(), 0.0);
    }

    @Test
    @DisplayName("A designation is found written as WR-90, wr90, WR90, wr 90 or WR_90")
    void designationSpellingsAreAccepted() {
        StandardSize wr90 = StandardSizes.byName("WR-90");
        for (String spelling : List.of("wr90", "WR90", "wr 90", "WR_90", " Wr-90 ")) {
            assertSame(wr90, StandardSizes.byName(spelling), spelling);
        }
    }

    @Test
    @DisplayName("An unknown WR number is refused with the three nearest designations")
    void unknownNumberListsTheNearest() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> StandardSizes.byName("WR-95"));
        assertEquals("unknown standard rectangular size 'WR-95'; nearest: WR-90, WR-112, WR-75", e.getMessage());
    }

    @Test
    @DisplayName("A name not of the WR form is refused with every designation")
    void otherNamesListEveryDesignation() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> StandardSizes.byName("X-band"));
        assertTrue(e.getMessage().startsWith("unknown standard rectangular size 'X-band'; expected a designation such as WR-90, one of: WR-2300, WR-2100,"),
                e.getMessage());
        assertTrue(e.getMessage().endsWith("WR-12, WR-10"), e.getMessage());
    }

    @Test
    @DisplayName("The table runs from WR-2300 down to WR-10, largest first, each designation once, every a > b > 0")
    void tableIsOrderedAndComplete() {
        List<StandardSize> all = StandardSizes.all();
        assertEquals("WR-2300", all.get(0).designation());
        assertEquals("WR-10", all.get(all.size() - 1).designation());
        assertEquals(29, all.size());
        Set<String> seen = new HashSet<>();
        for (int k = 0; k < all.size(); k++) {
            StandardSize s = all.get(k);
            assertTrue(seen.add(s.designation()), s.designation());
            assertTrue(s.widthInches() > s.heightInches() && s.heightInches() > 0, s.designation());
            if (k > 0) {
                assertTrue(s.widthInches() < all.get(k - 1).widthInches(), s.designation() + " follows a larger size");
            }
        }
    }

    @Test
    @DisplayName("The WR number is 100 × a in inches within 2 % for every size (naming practice; worst WR-22, 0.224 in, 1.8 %)")
    void designationNumberIsAHundredTimesTheWidth() {
        for (StandardSize s : StandardSizes.all()) {
            double number = StandardSizes.wrNumber(s);
            assertEquals(number, 100 * s.widthInches(), 0.02 * number, s.designation());
        }
    }

    @Test
    @DisplayName("Aspect ratios are exactly 2:1 except six sizes, which lie between 2.1 and 2.5 (WR-42 the widest at 2.47)")
    void aspectRatiosAreNearTwoToOne() {
        for (StandardSize s : StandardSizes.all()) {
            double ratio = s.widthInches() / s.heightInches();
            if (NOT_TWO_TO_ONE.contains(s.designation())) {
                assertTrue(ratio > 2.1 && ratio < 2.5, s.designation() + " ratio " + ratio);
            } else {
                assertEquals(2.0, ratio, 1e-12, s.designation());
            }
        }
    }

    @Test
    @DisplayName("Every recommended band starts 1.2 to 1.4 times above the TE10 cutoff c/2a and ends below the TE20 and TE01 cutoffs")
    void bandsLieInTheSingleModeRange() {
        // the table's ratios run from 1.23 (WR-650) to 1.36 (WR-137) for the low end, and at most 0.956 of
        // the next cutoff (WR-19) for the high end
        for (StandardSize s : StandardSizes.all()) {
            double te10 = C / (2 * s.width());
            double next = Math.min(C / s.width(), C / (2 * s.height()));
            assertTrue(s.bandLowHz() > 1.2 * te10 && s.bandLowHz() < 1.4 * te10, s.designation() + " low end");
            assertTrue(s.bandHighHz() < 0.97 * next, s.designation() + " high end");
        }
    }

    @Test
    @DisplayName("A standard size's dimensions build the rectangular family's guide of area a·b")
    void sizeBuildsTheRectangularGuide() {
        StandardSize wr62 = StandardSizes.byName("WR-62");
        GuideSection s = GuideFamilies.byName("rectangular").build(wr62.dimensions());
        assertEquals(wr62.width() * wr62.height(), s.interior().area(), 1e-15 * wr62.width() * wr62.height());
    }
}
