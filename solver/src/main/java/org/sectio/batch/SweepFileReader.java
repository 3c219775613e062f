package org.sectio.batch;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.sectio.geometry.family.GuideFamilies;
import org.sectio.geometry.file.GuideTemplate;
import org.sectio.geometry.file.LocatedDocument;
import org.sectio.geometry.file.SectionFileException;
import org.sectio.geometry.file.SectionFiles;
import org.sectio.geometry.file.SectionNode;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.SolveSettings;
import org.sectio.physics.AnalysisSettings;
import org.sectio.physics.Conductor;
import org.sectio.physics.ImpedanceDefinition;

/**
 * Reads a sweep file (JSON, docs/sweep-files.md) into a {@link SweepDefinition}. Every fault is a
 * {@link SectionFileException} with one line {@code file:line:column: $.path: problem}, found before
 * anything is solved or written: unknown keys and parameters, empty lists, ranges with reversed or
 * equal bounds, zero counts or steps, logarithmic ranges through zero, unknown record quantities and
 * mode numbers beyond the modes solved. The values of a point are not checked against the shape's
 * rules here: a value the shape refuses makes that point fail with the reason, and the rest go on.
 */
public final class SweepFileReader {

    private static final int MAX_FREQUENCIES = 1000;

    private SweepFileReader() {
    }

    /**
     * @param file a sweep file; a geometry file it names is read relative to the sweep file's folder
     * @return the sweep
     * @throws IOException if the sweep file or its geometry file cannot be read
     * @throws SectionFileException if either is not valid, with the place
     */
    public static SweepDefinition read(Path file) throws IOException, SectionFileException {
        String text = SectionFiles.readText(file);
        Path folder = file.toAbsolutePath().getParent();
        return parse(file.toString(), text, folder);
    }

    /**
     * @param sourceName the name used in messages
     * @param text the sweep document
     * @param folder where geometry file names are resolved
     * @return the sweep
     * @throws IOException if a named geometry file cannot be read
     * @throws SectionFileException if the document or its geometry file is not valid
     */
    public static SweepDefinition parse(String sourceName, String text, Path folder)
            throws IOException, SectionFileException {
        SectionNode root = SectionNode.root(LocatedDocument.parse(sourceName, text)).requireObject("a sweep object");
        root.allowOnly("name", "geometry", "family", "set", "solve", "vary", "record", "reuse", "chain_length");
        if (root.has("name")) {
            root.get("name").text();
        }
        GuideTemplate geometry = geometry(root, folder);
        Map<String, Double> known = geometry.parameters().values();
        Map<String, Double> fixed = new LinkedHashMap<>();
        if (root.has("set")) {
            SectionNode set = root.get("set").requireObject("an object of parameter values");
            for (String name : set.keys()) {
                SectionNode value = set.get(name);
                requireParameter(value, name, known, geometry);
                fixed.put(name, value.number());
            }
        }
        SolveSettings solve = solve(root.get("solve"));
        List<SweepAxis> axes = axes(root.get("vary"), known, geometry, fixed.keySet());
        SectionNode recordNode = root.get("record");
        RecordPlan plan = plan(recordNode, solve);
        AnalysisSettings analysis = analysis(recordNode);
        Reuse reuse = Reuse.ALL;
        if (root.has("reuse")) {
            SectionNode r = root.get("reuse");
            reuse = switch (r.text()) {
                case "all" -> Reuse.ALL;
                case "analysis" -> Reuse.ANALYSIS;
                case "none" -> Reuse.NONE;
                default -> throw r.problem("expected \"all\", \"analysis\" or \"none\", got " + r.described());
            };
        }
        int chain = root.has("chain_length") ? wholeNumber(root.get("chain_length"), 1, SweepDefinition.MAX_CHAIN,
                "a chain length of 1 … " + SweepDefinition.MAX_CHAIN) : SweepDefinition.DEFAULT_CHAIN;
        long points = 1;
        for (SweepAxis a : axes) {
            points *= a.size();
            if (points > SweepDefinition.MAX_POINTS) {
                throw root.get("vary").problem("the grid of these axes has more than " + SweepDefinition.MAX_POINTS
                        + " points; split the sweep");
            }
        }
        return new SweepDefinition(sourceName, geometry, fixed, solve, axes, plan, analysis, reuse, chain);
    }

    private static GuideTemplate geometry(SectionNode root, Path folder) throws IOException, SectionFileException {
        if (root.has("geometry") == root.has("family")) {
            throw root.problem("name the guide with exactly one of \"geometry\" (a geometry file) or \"family\""
                    + " (a built-in family)");
        }
        if (root.has("family")) {
            SectionNode name = root.get("family");
            try {
                return GuideTemplate.of(GuideFamilies.byName(name.text()));
            } catch (IllegalArgumentException e) {
                throw name.problem(e.getMessage());
            }
        }
        SectionNode name = root.get("geometry");
        Path file = folder.resolve(name.text());
        if (!Files.isRegularFile(file)) {
            throw name.problem("geometry file '" + file + "' does not exist or is not a file");
        }
        return GuideTemplate.of(file);
    }

    private static void requireParameter(SectionNode at, String name, Map<String, Double> known, GuideTemplate geometry)
            throws SectionFileException {
        if (!known.containsKey(name)) {
            throw at.problem("unknown parameter \"" + name + "\" of " + geometry.sourceName() + "; its parameters are "
                    + String.join(", ", known.keySet()));
        }
    }

    private static SolveSettings solve(SectionNode node) throws SectionFileException {
        node.requireObject("an object of solve settings");
        node.allowOnly("modes", "families", "cells", "accuracy", "error_estimate");
        int modes = node.has("modes") ? wholeNumber(node.get("modes"), 1, SolveSettings.MAX_MODES,
                "a number of modes 1 … " + SolveSettings.MAX_MODES) : 6;
        Set<ModeFamily> families = EnumSet.allOf(ModeFamily.class);
        if (node.has("families")) {
            SectionNode f = node.get("families");
            families = switch (f.text().toLowerCase(Locale.ROOT)) {
                case "te" -> EnumSet.of(ModeFamily.TE);
                case "tm" -> EnumSet.of(ModeFamily.TM);
                case "both" -> EnumSet.allOf(ModeFamily.class);
                default -> throw f.problem("expected \"te\", \"tm\" or \"both\", got " + f.described());
            };
        }
        if (node.has("cells") && node.has("accuracy")) {
            throw node.problem("give either \"cells\" or \"accuracy\", not both");
        }
        int cells = node.has("cells") ? wholeNumber(node.get("cells"), SolveSettings.MIN_CELLS, SolveSettings.MAX_CELLS,
                "cells across " + SolveSettings.MIN_CELLS + " … " + SolveSettings.MAX_CELLS) : SolveSettings.DEFAULT_CELLS;
        double accuracy = node.has("accuracy") ? node.get("accuracy").numberIn(1e-7, 0.1, "a relative accuracy 1e-7 … 0.1")
                : Double.NaN;
        boolean estimate = !node.has("error_estimate") || node.get("error_estimate").bool();
        return new SolveSettings(modes, families, cells, accuracy, estimate, 1);
    }

    private static List<SweepAxis> axes(SectionNode vary, Map<String, Double> known, GuideTemplate geometry,
                                        Set<String> fixed) throws SectionFileException {
        List<SectionNode> items = vary.elements("a list of swept parameters");
        if (items.isEmpty()) {
            throw vary.problem("the list of swept parameters is empty; name at least one");
        }
        List<SweepAxis> axes = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        for (SectionNode item : items) {
            item.requireObject("a swept parameter {\"parameter\": …, \"values\": […]} or {\"parameter\": …, \"from\": …,"
                    + " \"to\": …, \"count\": …}");
            item.allowOnly("parameter", "values", "from", "to", "count", "step", "scale");
            SectionNode nameNode = item.get("parameter");
            String name = nameNode.text();
            requireParameter(nameNode, name, known, geometry);
            if (!seen.add(name)) {
                throw nameNode.problem("parameter \"" + name + "\" is swept twice; give it one list or range");
            }
            if (fixed.contains(name)) {
                throw nameNode.problem("parameter \"" + name + "\" is both set and swept; remove it from \"set\"");
            }
            axes.add(new SweepAxis(name, values(item)));
        }
        return axes;
    }

    private static double[] values(SectionNode item) throws SectionFileException {
        if (item.has("values")) {
            for (String other : List.of("from", "to", "count", "step", "scale")) {
                if (item.has(other)) {
                    throw item.get(other).problem("\"" + other + "\" belongs to a range; a list of \"values\" needs none");
                }
            }
            SectionNode list = item.get("values");
            List<SectionNode> elements = list.elements("a list of values");
            if (elements.isEmpty()) {
                throw list.problem("the list of values is empty; give at least one value");
            }
            if (elements.size() > SweepDefinition.MAX_POINTS) {
                throw list.problem("more than " + SweepDefinition.MAX_POINTS + " values");
            }
            double[] v = new double[elements.size()];
            for (int k = 0; k < v.length; k++) {
                v[k] = elements.get(k).number();
            }
            return v;
        }
        double from = item.get("from").number();
        SectionNode toNode = item.get("to");
        double to = toNode.number();
        boolean log = false;
        if (item.has("scale")) {
            SectionNode scale = item.get("scale");
            log = switch (scale.text()) {
                case "linear" -> false;
                case "log" -> true;
                default -> throw scale.problem("expected \"linear\" or \"log\", got " + scale.described());
            };
        }
        if (log && !(from > 0 && to > 0)) {
            throw (from > 0 ? toNode : item.get("from")).problem("a logarithmic range must stay above 0, got "
                    + from + " … " + to);
        }
        if (!(from < to)) {
            throw toNode.problem("\"to\" (" + to + ") must be above \"from\" (" + from + "); to sweep downward or"
                    + " in another order, give a list of \"values\"");
        }
        if (item.has("count") == item.has("step")) {
            throw item.problem("a range needs exactly one of \"count\" (how many values, ends included) or \"step\"");
        }
        if (item.has("step")) {
            SectionNode stepNode = item.get("step");
            if (log) {
                throw stepNode.problem("a logarithmic range takes a \"count\", not a \"step\"");
            }
            double step = stepNode.number();
            if (!(step > 0)) {
                throw stepNode.problem("step must be above 0, got " + step);
            }
            try {
                return SweepAxis.stepped(from, to, step);
            } catch (IllegalArgumentException e) {
                throw stepNode.problem(e.getMessage());
            }
        }
        int count = wholeNumber(item.get("count"), 2, SweepDefinition.MAX_POINTS,
                "a count of at least 2 values (ends included); for one value use \"values\": [x]");
        return log ? SweepAxis.logarithmic(from, to, count) : SweepAxis.linear(from, to, count);
    }

    private static RecordPlan plan(SectionNode node, SolveSettings solve) throws SectionFileException {
        node.requireObject("an object naming what to record");
        node.allowOnly("cutoffs", "error_estimates", "single_mode_band", "attenuation", "impedance", "metal",
                "impedance_definition");
        int cutoffs = node.has("cutoffs") ? wholeNumber(node.get("cutoffs"), 1, solve.modeCount(),
                "a number of cutoffs 1 … the " + solve.modeCount() + " modes solved") : 0;
        boolean errors = node.has("error_estimates") && node.get("error_estimates").bool();
        if (errors && !solve.estimateError()) {
            throw node.get("error_estimates").problem("error estimates need \"error_estimate\": true in \"solve\"");
        }
        if (errors && cutoffs == 0) {
            throw node.get("error_estimates").problem("error estimates are recorded beside \"cutoffs\"; give their number");
        }
        boolean band = node.has("single_mode_band") && node.get("single_mode_band").bool();
        List<Integer> lossModes = List.of();
        List<Double> lossHz = List.of();
        List<Integer> zModes = List.of();
        List<Double> zHz = List.of();
        if (node.has("attenuation")) {
            SectionNode a = node.get("attenuation");
            lossModes = modes(a, solve);
            lossHz = frequencies(a);
        }
        if (node.has("impedance")) {
            SectionNode z = node.get("impedance");
            zModes = modes(z, solve);
            zHz = frequencies(z);
        }
        RecordPlan plan = new RecordPlan(cutoffs, errors, band, lossModes, lossHz, zModes, zHz);
        if (plan.columns().isEmpty()) {
            throw node.problem("nothing to record; give \"cutoffs\", \"single_mode_band\", \"attenuation\" or"
                    + " \"impedance\"");
        }
        return plan;
    }

    private static List<Integer> modes(SectionNode at, SolveSettings solve) throws SectionFileException {
        at.requireObject("an object {\"modes\": [1], \"frequencies_ghz\": [10.0]}");
        at.allowOnly("modes", "frequencies_ghz");
        SectionNode list = at.get("modes");
        List<SectionNode> items = list.elements("a list of mode numbers (1 = lowest cutoff)");
        if (items.isEmpty()) {
            throw list.problem("the list of modes is empty; give at least one mode number");
        }
        List<Integer> modes = new ArrayList<>();
        for (SectionNode item : items) {
            int m = wholeNumber(item, 1, solve.modeCount(), "a mode number 1 … the " + solve.modeCount() + " modes solved");
            if (modes.contains(m)) {
                throw item.problem("mode " + m + " is listed twice");
            }
            modes.add(m);
        }
        return modes;
    }

    private static List<Double> frequencies(SectionNode at) throws SectionFileException {
        SectionNode list = at.get("frequencies_ghz");
        List<SectionNode> items = list.elements("a list of frequencies in GHz");
        if (items.isEmpty() || items.size() > MAX_FREQUENCIES) {
            throw list.problem("expected 1 … " + MAX_FREQUENCIES + " frequencies, got " + items.size());
        }
        List<Double> hz = new ArrayList<>();
        for (SectionNode item : items) {
            double f = item.number();
            if (!(f > 0)) {
                throw item.problem("a frequency must be above 0 GHz, got " + f);
            }
            if (hz.contains(f * 1e9)) {
                throw item.problem("frequency " + f + " GHz is listed twice");
            }
            hz.add(f * 1e9);
        }
        return hz;
    }

    private static AnalysisSettings analysis(SectionNode node) throws SectionFileException {
        AnalysisSettings settings = AnalysisSettings.defaults();
        if (node.has("metal")) {
            SectionNode metal = node.get("metal");
            try {
                settings = settings.withConductor(Conductor.named(metal.text()));
            } catch (IllegalArgumentException e) {
                throw metal.problem(e.getMessage());
            }
        }
        if (node.has("impedance_definition")) {
            SectionNode d = node.get("impedance_definition");
            ImpedanceDefinition definition = switch (d.text()) {
                case "power_voltage" -> ImpedanceDefinition.POWER_VOLTAGE;
                case "power_current" -> ImpedanceDefinition.POWER_CURRENT;
                case "voltage_current" -> ImpedanceDefinition.VOLTAGE_CURRENT;
                default -> throw d.problem("expected \"power_voltage\", \"power_current\" or \"voltage_current\", got "
                        + d.described());
            };
            settings = new AnalysisSettings(settings.conductor(), settings.rmsRoughnessMetres(), settings.breakdown(),
                    definition, settings.path());
        }
        return settings;
    }

    private static int wholeNumber(SectionNode node, int min, int max, String what) throws SectionFileException {
        if (!node.isNumber()) {
            throw node.problem("expected " + what + ", got " + node.described());
        }
        double v = node.number();
        if (v != Math.rint(v) || v < min || v > max) {
            throw node.problem("expected " + what + ", got " + node.described());
        }
        return (int) v;
    }
}
