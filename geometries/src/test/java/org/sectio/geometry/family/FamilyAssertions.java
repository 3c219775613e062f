package org.sectio.geometry.family;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Map;

/** Shared assertions of the family tests. */
final class FamilyAssertions {

    private FamilyAssertions() {
    }

    /** Asserts that building {@code family} from {@code values} fails with exactly {@code message}. */
    static void assertRefused(String family, Map<String, Double> values, String message) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> GuideFamilies.byName(family).build(values));
        assertEquals(message, e.getMessage());
    }
}
