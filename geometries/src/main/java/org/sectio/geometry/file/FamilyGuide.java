package org.sectio.geometry.file;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.family.FamilyParameter;
import org.sectio.geometry.family.GuideFamilies;
import org.sectio.geometry.family.GuideFamily;
import org.sectio.geometry.family.ParameterKind;

/**
 * {@code "family": {"<family name>": {<parameter>: value, ...}}}: a built-in family (see
 * {@link GuideFamilies}) built from the given values; parameters not given take the family's
 * defaults. Lengths are in the file's units and angles in degrees; ratios, permittivities and loss
 * tangents are plain numbers. The family's own rule checks are reported at the family's object.
 */
final class FamilyGuide {

    private FamilyGuide() {
    }

    /**
     * @param familyNode the value of the {@code "family"} key
     * @return the guide, m
     * @throws SectionFileException for an unknown family or parameter, a bad value or a broken rule
     */
    static GuideSection read(SectionNode familyNode) throws SectionFileException {
        familyNode.requireObject("an object with one family name, e.g. {\"double_ridge\": {...}}");
        List<String> keys = familyNode.keys();
        String[] known = GuideFamilies.all().stream().map(GuideFamily::name).toArray(String[]::new);
        if (keys.size() != 1) {
            throw familyNode.problem("expected exactly one family name (" + SectionNode.quoted(known) + "), got "
                    + keys.size());
        }
        String name = keys.get(0);
        GuideFamily family = GuideFamilies.all().stream().filter(f -> f.name().equals(name)).findFirst()
                .orElse(null);
        if (family == null) {
            familyNode.allowOnly(known); // throws: unknown family, listing the known ones
        }
        SectionNode body = familyNode.get(name)
                .requireObject("an object of the family's parameters (possibly empty)");
        String[] parameterNames = family.parameters().stream().map(FamilyParameter::name).toArray(String[]::new);
        body.allowOnly(parameterNames);
        Map<String, Double> values = new LinkedHashMap<>();
        for (FamilyParameter parameter : family.parameters()) {
            if (body.has(parameter.name())) {
                SectionNode value = body.get(parameter.name());
                values.put(parameter.name(), toSi(value, parameter.kind()));
            }
        }
        try {
            return family.build(values);
        } catch (IllegalArgumentException e) {
            throw body.problem(e.getMessage());
        }
    }

    private static double toSi(SectionNode value, ParameterKind kind) throws SectionFileException {
        return switch (kind) {
            case LENGTH -> value.length();
            case ANGLE -> Math.toRadians(value.number());
            default -> value.number();
        };
    }
}
