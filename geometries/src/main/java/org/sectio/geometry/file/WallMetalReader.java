package org.sectio.geometry.file;

import org.sectio.geometry.WallMetal;

/**
 * Reads a wall metal: a built-in name ({@code "copper"}, {@code "silver"}, {@code "gold"},
 * {@code "aluminium"}, {@code "brass"}; see {@link WallMetal#builtIn()}) or an object
 * {@code {"name": .., "conductivity": σ, "permeability": μr}} with σ &gt; 0 in S/m (required), μr &gt; 0
 * (default 1) and an optional name (default "user (σ S/m)"); numbers may be expressions.
 */
final class WallMetalReader {

    private static final String EXPECTED = "a metal name such as \"copper\" or an object with \"conductivity\" (S/m)";

    private WallMetalReader() {
    }

    /**
     * @param value the value of a {@code "conductor"} or {@code "inner_conductor_metal"} key
     * @return the metal
     * @throws SectionFileException for an unknown name (listing the known ones), an unknown key, or a
     *     conductivity or permeability that is not a finite number &gt; 0
     */
    static WallMetal read(SectionNode value) throws SectionFileException {
        if (value.isText()) {
            try {
                return WallMetal.named(value.text());
            } catch (IllegalArgumentException e) {
                throw value.problem(e.getMessage());
            }
        }
        value.requireObject(EXPECTED);
        value.allowOnly("name", "conductivity", "permeability");
        double sigma = value.get("conductivity").numberIn(Double.MIN_VALUE, Double.MAX_VALUE,
                "a conductivity > 0 S/m");
        double mu = value.has("permeability")
                ? value.get("permeability").numberIn(Double.MIN_VALUE, Double.MAX_VALUE, "a relative permeability > 0")
                : 1;
        if (!value.has("name")) {
            return mu == 1 ? WallMetal.user(sigma) : new WallMetal(WallMetal.user(sigma).name(), sigma, mu);
        }
        String name = value.get("name").text().strip();
        if (name.isEmpty()) {
            throw value.get("name").problem("expected a non-empty name, got an empty string");
        }
        return new WallMetal(name, sigma, mu);
    }
}
