package org.sectio.viewer.model;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.GuideSection;
import org.sectio.geometry.family.FamilyParameter;
import org.sectio.geometry.family.GuideFamilies;
import org.sectio.geometry.family.GuideFamily;
import org.sectio.geometry.family.ParameterKind;
import org.sectio.geometry.family.StandardSize;
import org.sectio.geometry.file.LengthUnit;

/**
 * The cross-section being edited in the form, built from a family (or a standard size, which is the
 * rectangular family at that size) and the values typed for its parameters. A geometry file is edited
 * by {@link FileSectionEditor}. Every edit rebuilds the section at once; a value that cannot be read,
 * or that the family refuses, is kept with its message (the family's own, as the command line reports
 * it) and the last good section is dropped, so nothing invalid reaches the solver.
 */
public class SectionEditor {

    private final String title;
    private final GuideFamily family;
    private final String standardName;
    private List<ParameterEntry> entries;
    private String generalError = "";
    private CrossSection section;

    /** For subclasses that keep their own entries. */
    SectionEditor(String title, List<ParameterEntry> entries) {
        this.title = title;
        this.family = null;
        this.standardName = null;
        this.entries = List.copyOf(entries);
    }

    private SectionEditor(GuideFamily family, Map<String, Double> values, String standardName) {
        this.title = standardName != null ? standardName + " (standard rectangular size)" : family.name();
        this.family = family;
        this.standardName = standardName;
        List<ParameterEntry> list = new ArrayList<>();
        for (FamilyParameter p : family.parameters()) {
            double v = values.getOrDefault(p.name(), p.defaultValue());
            list.add(new ParameterEntry(p.name(), p.description() + " (" + p.rule() + ")", unitOf(p.kind()),
                    shown(p.kind(), v), ""));
        }
        this.entries = List.copyOf(list);
        rebuild();
    }

    /**
     * @param family a built-in family
     * @return an editor on its defaults
     */
    public static SectionEditor of(GuideFamily family) {
        return new SectionEditor(family, family.defaults(), null);
    }

    /**
     * @param size a standard rectangular size
     * @return an editor on the rectangular family at that size, named by its designation
     */
    public static SectionEditor of(StandardSize size) {
        return new SectionEditor(GuideFamilies.byName("rectangular"), size.dimensions(), size.designation());
    }

    /** @return the default cross-section of the program: WR-90, as the command line's {@code solve} */
    public static SectionEditor standardDefault() {
        return of(org.sectio.geometry.family.StandardSizes.byName("WR-90"));
    }

    /** @return what is being edited, e.g. "double_ridge" or "WR-90 (standard rectangular size)" */
    public String title() {
        return title;
    }

    /** @return the values of the form, in order */
    public List<ParameterEntry> entries() {
        return entries;
    }

    /** @return a problem not tied to one value (e.g. walls that cross), or "" */
    public String generalError() {
        return generalError;
    }

    /** @return the cross-section of the current values, or null while any value has a problem */
    public CrossSection section() {
        return section;
    }

    /** @return whether every value is fine and the section is built */
    public boolean isValid() {
        return section != null;
    }

    /**
     * Changes one value and rebuilds.
     *
     * @param name a parameter of {@link #entries()}
     * @param text the new text
     * @return whether the section is now valid
     * @throws IllegalArgumentException if there is no parameter of that name
     */
    public boolean edit(String name, String text) {
        List<ParameterEntry> next = new ArrayList<>();
        boolean found = false;
        for (ParameterEntry e : entries) {
            found |= e.name().equals(name);
            next.add(e.name().equals(name) ? e.withText(text == null ? "" : text) : e.withText(e.text()));
        }
        if (!found) {
            throw new IllegalArgumentException("no parameter '" + name + "' in " + title);
        }
        entries = List.copyOf(next);
        rebuild();
        return isValid();
    }

    /** Builds the section from the entries, setting the messages. */
    void rebuild() {
        generalError = "";
        section = null;
        Map<String, Double> values = new LinkedHashMap<>();
        List<ParameterEntry> checked = new ArrayList<>();
        boolean readable = true;
        for (ParameterEntry e : entries) {
            FamilyParameter p = parameter(e.name());
            try {
                values.put(e.name(), read(p, e.text()));
                checked.add(e.withText(e.text()));
            } catch (IllegalArgumentException bad) {
                checked.add(e.withError(bad.getMessage()));
                readable = false;
            }
        }
        entries = List.copyOf(checked);
        if (!readable) {
            return;
        }
        try {
            GuideSection built = family.build(values);
            section = standardName != null && values.equals(standardValues()) ? built.named(standardName) : built;
        } catch (IllegalArgumentException refused) {
            blame(refused.getMessage());
        }
    }

    /** Puts the family's message on the parameter it names ("family: name must be …"), else under the form. */
    void blame(String message) {
        String target = null;
        for (ParameterEntry e : entries) {
            if (message.contains(": " + e.name() + " ")) {
                target = e.name();
                break;
            }
        }
        if (target == null) {
            generalError = message;
            return;
        }
        List<ParameterEntry> marked = new ArrayList<>();
        for (ParameterEntry e : entries) {
            marked.add(e.name().equals(target) ? e.withError(message) : e);
        }
        entries = List.copyOf(marked);
    }

    void replaceEntries(List<ParameterEntry> list) {
        entries = List.copyOf(list);
    }

    void setResult(CrossSection built, String problem) {
        section = built;
        generalError = problem;
    }

    private Map<String, Double> standardValues() {
        return org.sectio.geometry.family.StandardSizes.byName(standardName).dimensions();
    }

    private FamilyParameter parameter(String name) {
        return family.parameters().stream().filter(p -> p.name().equals(name)).findFirst().orElseThrow();
    }

    private static String unitOf(ParameterKind kind) {
        return switch (kind) {
            case LENGTH -> "mm";
            case ANGLE -> "°";
            default -> "";
        };
    }

    private static String shown(ParameterKind kind, double si) {
        String text = kind.format(si);
        return text.replace(" mm", "").replace("°", "");
    }

    /**
     * Reads a typed value: lengths in mm unless a unit follows (mm, m, in, mil), angles in degrees,
     * the other kinds as plain numbers.
     */
    private double read(FamilyParameter p, String text) {
        String t = text.strip().toLowerCase(Locale.ROOT);
        String what = family.name() + ": " + p.name();
        if (t.isEmpty()) {
            throw new IllegalArgumentException(what + " is empty; expected a number" + unitHint(p.kind()));
        }
        double scale = 1;
        if (p.kind() == ParameterKind.LENGTH) {
            scale = 1e-3;
            for (LengthUnit unit : LengthUnit.values()) {
                if (t.endsWith(unit.keyword()) && number(t.substring(0, t.length() - unit.keyword().length()))) {
                    scale = unit.toMetres(1);
                    t = t.substring(0, t.length() - unit.keyword().length()).strip();
                    break;
                }
            }
        } else if (p.kind() == ParameterKind.ANGLE) {
            t = t.replace("°", "").replace("deg", "").strip();
            scale = Math.PI / 180;
        }
        if (!number(t)) {
            throw new IllegalArgumentException(what + " must be a number" + unitHint(p.kind()) + ", got '"
                    + text.strip() + "'");
        }
        return Double.parseDouble(t) * scale;
    }

    private static String unitHint(ParameterKind kind) {
        return switch (kind) {
            case LENGTH -> " in mm (or with a unit: mm, m, in, mil)";
            case ANGLE -> " in degrees";
            default -> "";
        };
    }

    private static final java.util.regex.Pattern NUMBER =
            java.util.regex.Pattern.compile("[-+]?(\\d+\\.?\\d*|\\.\\d+)([eE][-+]?\\d+)?");

    /** @return whether the text is a plain decimal number (no NaN, no Infinity, no hexadecimal) */
    static boolean number(String t) {
        return NUMBER.matcher(t.strip()).matches();
    }
}
