package org.sectio.geometry.family;

import java.util.List;

/**
 * A family whose name, description and parameter list are fixed at construction; subclasses only
 * build the cross-section from the values.
 */
abstract class ListedFamily implements GuideFamily {

    private final String name;
    private final String description;
    private final List<FamilyParameter> parameters;

    ListedFamily(String name, String description, List<FamilyParameter> parameters) {
        this.name = name;
        this.description = description;
        this.parameters = List.copyOf(parameters);
    }

    @Override
    public final String name() {
        return name;
    }

    @Override
    public final String description() {
        return description;
    }

    @Override
    public final List<FamilyParameter> parameters() {
        return parameters;
    }
}
