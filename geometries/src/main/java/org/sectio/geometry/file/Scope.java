package org.sectio.geometry.file;

import java.util.Map;

/**
 * What every value of a file is read against: the file's length unit and its resolved parameters.
 *
 * @param unit the unit of every length in the file
 * @param parameters the named values, plain numbers (a parameter used as a length is in {@code unit})
 */
record Scope(LengthUnit unit, Map<String, Double> parameters) {

    /** Millimetres and no parameters: what a file without those keys is read against. */
    static final Scope DEFAULT = new Scope(LengthUnit.MILLIMETRE, Map.of());

    Scope {
        parameters = Map.copyOf(parameters);
    }
}
