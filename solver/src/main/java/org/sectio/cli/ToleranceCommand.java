package org.sectio.cli;

import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.sectio.batch.tolerance.ParameterTolerance;
import org.sectio.batch.tolerance.ToleranceReport;
import org.sectio.batch.tolerance.ToleranceStudy;
import org.sectio.geometry.file.GuideTemplate;
import org.sectio.io.AtomicFile;
import org.sectio.physics.AnalysisSettings;
import org.sectio.physics.FrequencySpec;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code sectio tolerance}: sensitivities of a guide's cutoffs (and, at given frequencies, the dominant
 * mode's α_c and impedance) to its parameters, cross-checked by the boundary-perturbation formula, the
 * worst case over ± tolerances and a seeded Monte Carlo run ({@link ToleranceStudy}). Everything about
 * the request is checked before the first solve.
 */
@Command(name = "tolerance", mixinStandardHelpOptions = true, versionProvider = SectioMain.Version.class,
        sortOptions = false,
        description = {"How a guide's cutoffs and band move with its dimensions: sensitivities, worst case over"
                + " ± tolerances and a Monte Carlo spread.",
            "The guide is a geometry FILE (its \"parameters\", in its units) or a built-in family (--shape; lengths"
                + " in mm, angles in degrees)."},
        footer = {"", "Example: sectio tolerance --shape rectangular --tol width=0.05 --tol height=0.05 --require 8.2GHz:12.4GHz",
            "Exit codes: 0 done, 2 the request cannot be carried out as given, 1 a solve or an output failed."})
final class ToleranceCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", arity = "0..1", paramLabel = "FILE", description = "geometry file (or use --shape)")
    private Path file;

    @Option(names = "--shape", paramLabel = "NAME", description = "a built-in family instead of a file, e.g. rectangular")
    private String shape;

    @Option(names = "--set", paramLabel = "NAME=VALUE", description = "set a parameter's nominal value (repeatable)")
    private Map<String, String> set;

    @Option(names = "--tol", paramLabel = "NAME=PLUSMINUS[:DIST]",
            description = "a ± tolerance, in the guide's units, with an optional distribution normal (±tol = ±3σ) or"
                    + " uniform; repeatable")
    private List<String> tolerances = new ArrayList<>();

    @Option(names = "--distribution", paramLabel = "normal|uniform", defaultValue = "normal",
            description = "distribution of the tolerances that name none (default: ${DEFAULT-VALUE})")
    private String distribution;

    @Option(names = "--params", paramLabel = "NAME[,NAME...]", split = ",",
            description = "parameters to give sensitivities for (default: every parameter of the guide)")
    private List<String> params;

    @Option(names = {"-n", "--modes"}, paramLabel = "N", defaultValue = "4",
            description = "modes to follow, lowest cutoff first (default: ${DEFAULT-VALUE})")
    private int modes;

    @Option(names = "--freq", paramLabel = "F", description = "also follow the dominant mode's α_c and impedance at F (repeatable)")
    private List<String> frequencies = new ArrayList<>();

    @Option(names = "--impedance", paramLabel = "pv|pi|vi", defaultValue = "pv",
            description = "impedance definition for --freq (default: ${DEFAULT-VALUE}; copper walls)")
    private ImpedanceChoice definition;

    @Option(names = "--parts", paramLabel = "N", defaultValue = "2000",
            description = "Monte Carlo parts, 0 for none (default: ${DEFAULT-VALUE})")
    private int parts;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1", description = "Monte Carlo seed (default: ${DEFAULT-VALUE})")
    private long seed;

    @Option(names = "--full", description = "solve every Monte Carlo part instead of the linear estimate from the sensitivities")
    private boolean full;

    @Option(names = "--require", paramLabel = "F1:F2",
            description = "report the share of parts whose usable band (1.25 fc1 … 0.95 fc2) covers F1 … F2")
    private String require;

    @Option(names = "--cells", paramLabel = "N", description = "grid cells across (default: chosen from --accuracy)")
    private Integer cells;

    @Option(names = "--accuracy", paramLabel = "REL", defaultValue = "1e-4",
            description = "relative accuracy of the cutoffs, which picks the grid (default: ${DEFAULT-VALUE})")
    private double accuracy;

    @Option(names = "--threads", paramLabel = "N", description = "parallel solves, one solver each (default: all cores)")
    private Integer threads;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE", description = "write the report to FILE, replaced whole")
    private Path output;

    @Override
    public Integer call() throws Exception {
        ToleranceStudy.Request request;
        try {
            request = request();
        } catch (IllegalArgumentException e) {
            throw new CommandLine.ParameterException(spec.commandLine(), e.getMessage());
        }
        if (output != null) {
            OutputPlaces.checkFile("--output", output, spec);
        }
        String report = ToleranceReport.text(ToleranceStudy.run(request));
        if (output != null) {
            AtomicFile.write(output, out -> out.write(report.getBytes(StandardCharsets.UTF_8)));
        } else {
            PrintWriter out = spec.commandLine().getOut();
            out.print(report);
            out.flush();
        }
        return 0;
    }

    private ToleranceStudy.Request request() {
        GuideTemplate template = TemplateInput.read(file, shape);
        ParameterTolerance.Distribution fallback = ParameterTolerance.Distribution.parse(distribution);
        List<ParameterTolerance> tols = new ArrayList<>();
        for (String text : tolerances) {
            tols.add(tolerance(text, fallback));
        }
        List<String> sensitivity = params != null ? params
                : new ArrayList<>(template.parameters().values().keySet());
        double[] freqs = new double[frequencies.size()];
        for (int k = 0; k < freqs.length; k++) {
            freqs[k] = frequency("--freq", frequencies.get(k));
        }
        double low = Double.NaN;
        double high = Double.NaN;
        if (require != null) {
            String[] band = require.split(":", -1);
            if (band.length != 2) {
                throw new IllegalArgumentException("--require '" + require + "': expected F1:F2, e.g. 8.2GHz:12.4GHz");
            }
            low = frequency("--require", band[0]);
            high = frequency("--require", band[1]);
            if (!(high > low)) {
                throw new IllegalArgumentException("--require '" + require + "': the band is "
                        + (high == low ? "empty" : "reversed") + "; give F1:F2 with F1 < F2");
            }
        }
        if (cells != null && (cells < 8 || cells > 4000)) {
            throw new IllegalArgumentException("--cells " + cells + ": must be 8 … 4000");
        }
        if (cells == null && !(accuracy >= 1e-7 && accuracy <= 0.1)) {
            throw new IllegalArgumentException("--accuracy " + accuracy + ": must be 1e-7 … 0.1");
        }
        AnalysisSettings how = new AnalysisSettings(AnalysisSettings.defaults().conductor(), 0,
                AnalysisSettings.defaults().breakdown(), definition.definition(), null);
        return new ToleranceStudy.Request(template, TemplateInput.values(template, set), sensitivity, tols, modes, freqs,
                how, cells == null ? 0 : cells, accuracy, parts, seed, full, low, high,
                threads == null ? Runtime.getRuntime().availableProcessors() : threads);
    }

    private static ParameterTolerance tolerance(String text, ParameterTolerance.Distribution fallback) {
        int eq = text.indexOf('=');
        if (eq <= 0) {
            throw new IllegalArgumentException("--tol '" + text + "': expected NAME=PLUSMINUS[:normal|uniform], e.g."
                    + " width=0.05");
        }
        String name = text.substring(0, eq).strip();
        String rest = text.substring(eq + 1);
        int colon = rest.indexOf(':');
        ParameterTolerance.Distribution dist = colon < 0 ? fallback
                : ParameterTolerance.Distribution.parse(rest.substring(colon + 1));
        double plusMinus = TemplateInput.number("--tol " + name, colon < 0 ? rest : rest.substring(0, colon));
        try {
            return new ParameterTolerance(name, plusMinus, dist);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("--tol " + text + ": " + e.getMessage());
        }
    }

    private static double frequency(String option, String text) {
        try {
            return FrequencySpec.parseFrequency(text);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(option + ": " + e.getMessage());
        }
    }
}
