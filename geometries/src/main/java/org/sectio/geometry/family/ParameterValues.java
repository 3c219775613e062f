package org.sectio.geometry.family;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.StringJoiner;

/**
 * The values one build of a family works with: the given ones, defaults for the rest, every name
 * known and every value finite. Rule checks throw the house message
 * {@code "<family>: <parameter> must be <rule>, got <value with unit>"}.
 */
final class ParameterValues {

    private final String family;
    private final Map<String, FamilyParameter> parameters = new LinkedHashMap<>();
    private final Map<String, Double> values = new LinkedHashMap<>();

    private ParameterValues(String family, List<FamilyParameter> declared, Map<String, Double> given) {
        this.family = family;
        for (FamilyParameter p : declared) {
            parameters.put(p.name(), p);
            values.put(p.name(), p.defaultValue());
        }
        if (given == null) {
            throw new IllegalArgumentException(family + ": parameter values must be given (an empty map for the defaults)");
        }
        for (Map.Entry<String, Double> entry : given.entrySet()) {
            String name = entry.getKey();
            if (!parameters.containsKey(name)) {
                throw new IllegalArgumentException(family + ": unknown parameter '" + name + "'; known: " + knownNames());
            }
            Double value = entry.getValue();
            if (value == null || !Double.isFinite(value)) {
                throw new IllegalArgumentException(family + ": " + name + " must be a finite number, got " + value);
            }
            values.put(name, value);
        }
    }

    /**
     * @param family the family's name, first word of every message
     * @param declared the family's parameters
     * @param given the values asked for, SI units
     * @throws IllegalArgumentException on an unknown name or a missing or non-finite value
     */
    static ParameterValues resolve(String family, List<FamilyParameter> declared, Map<String, Double> given) {
        return new ParameterValues(family, declared, given);
    }

    /** @return the value of a declared parameter, SI units */
    double get(String name) {
        Double value = values.get(name);
        if (value == null) {
            throw new IllegalStateException(family + " has no parameter " + name);
        }
        return value;
    }

    /** @return the value of a declared parameter with its display unit, e.g. "10.16 mm" */
    String shown(String name) {
        return parameters.get(name).kind().format(get(name));
    }

    /** @return a length in metres shown in millimetres, for bounds computed from several parameters */
    static String mm(double metres) {
        return ParameterKind.LENGTH.format(metres);
    }

    /**
     * @param name the parameter the rule is about
     * @param holds whether its value meets the rule
     * @param rule the rule in words with the bounds' values, e.g. {@code "> 0 and < height (10.16 mm)"}
     * @throws IllegalArgumentException {@code "<family>: <name> must be <rule>, got <value>"} if not
     */
    void require(String name, boolean holds, String rule) {
        if (!holds) {
            throw new IllegalArgumentException(family + ": " + name + " must be " + rule + ", got " + shown(name));
        }
    }

    /** Requires the value to be strictly positive. */
    void requirePositive(String name) {
        require(name, get(name) > 0, "> 0");
    }

    /** Requires a relative permittivity εr ≥ 1. */
    void requirePermittivity(String name) {
        require(name, get(name) >= 1, "≥ 1 (relative permittivity)");
    }

    /** Requires a loss tangent tan δ ≥ 0. */
    void requireLossTangent(String name) {
        require(name, get(name) >= 0, "≥ 0 (loss tangent)");
    }

    private String knownNames() {
        StringJoiner joiner = new StringJoiner(", ");
        parameters.keySet().forEach(joiner::add);
        return joiner.toString();
    }
}
