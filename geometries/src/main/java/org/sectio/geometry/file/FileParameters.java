package org.sectio.geometry.file;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The named parameters a geometry file defines, as it resolves them: what batch work (sweeps, sizing,
 * tolerance studies) can vary through {@link SectionFiles#parse(String, String, Map)}.
 *
 * @param units the file's length unit, in which every length parameter is written
 * @param values every parameter's value by name, in file order, in the file's units (lengths) or as
 *     written (angles, ratios)
 */
public record FileParameters(LengthUnit units, Map<String, Double> values) {

    public FileParameters {
        values = Collections.unmodifiableMap(new LinkedHashMap<>(values));
    }
}
