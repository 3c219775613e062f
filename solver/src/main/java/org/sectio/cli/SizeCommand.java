package org.sectio.cli;

import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.sectio.batch.size.ParameterSizer;
import org.sectio.batch.size.SizeTarget;
import org.sectio.batch.size.SizingReport;
import org.sectio.geometry.file.GuideTemplate;
import org.sectio.io.AtomicFile;
import org.sectio.modes.ModeFamily;
import org.sectio.physics.AnalysisSettings;
import org.sectio.physics.FrequencySpec;
import picocli.CommandLine;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code sectio size}: solves for one parameter of a guide so that a target is met, by a bracketing
 * root finder over full solves ({@link ParameterSizer}). Everything about the request is checked
 * before the first solve; a target the range cannot reach is reported with the values at its ends.
 */
@Command(name = "size", mixinStandardHelpOptions = true, versionProvider = SectioMain.Version.class,
        sortOptions = false,
        description = {"Finds the value of one parameter of a guide that meets a target: a mode's cutoff, a"
                + " single-mode ratio fc2/fc1, the dominant mode's impedance at a frequency, or a usable band"
                + " covering a band.",
            "The guide is a geometry FILE (its \"parameters\", in its units) or a built-in family (--shape; lengths"
                + " in mm, angles in degrees)."},
        footer = {"", "Example: sectio size --shape double_ridge --vary gap --range 0.5:8 --cutoff te1=4.5GHz",
            "Exit codes: 0 done, 2 the request cannot be carried out as given (also: a target the range cannot"
                + " reach), 1 a solve or an output failed."})
final class SizeCommand implements Callable<Integer> {

    private static final Pattern CUTOFF = Pattern.compile("(?i)\\s*(te|tm)?\\s*(\\d+)\\s*=\\s*(.+)");

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", arity = "0..1", paramLabel = "FILE", description = "geometry file (or use --shape)")
    private Path file;

    @Option(names = "--shape", paramLabel = "NAME", description = "a built-in family instead of a file, e.g. rectangular")
    private String shape;

    @Option(names = "--set", paramLabel = "NAME=VALUE", description = "set another parameter for every solve (repeatable)")
    private Map<String, String> set;

    @Option(names = "--vary", paramLabel = "NAME", required = true, description = "the parameter to size")
    private String vary;

    @Option(names = "--range", paramLabel = "LOW:HIGH", required = true,
            description = "the values the parameter may take, in the guide's units (mm for --shape lengths)")
    private String range;

    @ArgGroup(exclusive = true, multiplicity = "1")
    private TargetChoice target;

    /** The four targets, exactly one of which is given. */
    static final class TargetChoice {
        @Option(names = "--cutoff", paramLabel = "MODE=FREQ", required = true,
                description = "cutoff of a mode: te1, tm2 (the n-th of a family) or 1 (the n-th of all), e.g. te1=6.557GHz")
        String cutoff;

        @Option(names = "--ratio", paramLabel = "R", required = true,
                description = "single-mode bandwidth ratio fc2/fc1, > 1")
        Double ratio;

        @Option(names = "--impedance-at", paramLabel = "FREQ=OHMS", required = true,
                description = "the dominant mode's characteristic impedance at a frequency, e.g. 10GHz=200")
        String impedance;

        @Option(names = "--cover", paramLabel = "F1:F2", required = true,
                description = "a usable band (1.25 fc1 … 0.95 fc2, common practice) covering F1 … F2 with equal margins")
        String cover;
    }

    @Option(names = "--impedance", paramLabel = "pv|pi|vi", defaultValue = "pv",
            description = "impedance definition for --impedance-at (default: ${DEFAULT-VALUE})")
    private ImpedanceChoice definition;

    @Option(names = "--accuracy", paramLabel = "REL", defaultValue = "1e-5",
            description = "relative accuracy of the solved quantity, which picks the grid (default: ${DEFAULT-VALUE})")
    private double accuracy;

    @Option(names = "--cells", paramLabel = "N", description = "a fixed grid instead of --accuracy: cells across")
    private Integer cells;

    @Option(names = "--threads", paramLabel = "N", description = "worker threads per solve (default: all cores)")
    private Integer threads;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE", description = "write the report to FILE, replaced whole")
    private Path output;

    @Override
    public Integer call() throws Exception {
        ParameterSizer.Request request;
        try {
            GuideTemplate template = TemplateInput.read(file, shape);
            double[] ends = TemplateInput.range("--range", range);
            request = new ParameterSizer.Request(template, TemplateInput.values(template, set), vary, ends[0], ends[1],
                    target(), accuracy, cells == null ? 0 : cells,
                    threads == null ? Runtime.getRuntime().availableProcessors() : threads);
        } catch (IllegalArgumentException e) {
            throw new CommandLine.ParameterException(spec.commandLine(), e.getMessage());
        }
        if (output != null) {
            OutputPlaces.checkFile("--output", output, spec);
        }
        String report = SizingReport.text(ParameterSizer.size(request));
        if (output != null) {
            AtomicFile.write(output, out -> out.write(report.getBytes(StandardCharsets.UTF_8)));
        } else {
            PrintWriter out = spec.commandLine().getOut();
            out.print(report);
            out.flush();
        }
        return 0;
    }

    private SizeTarget target() {
        if (target.cutoff != null) {
            Matcher m = CUTOFF.matcher(target.cutoff);
            if (!m.matches()) {
                throw new IllegalArgumentException("--cutoff '" + target.cutoff + "': expected MODE=FREQ with MODE te1,"
                        + " tm2 or 1, e.g. te1=6.557GHz");
            }
            ModeFamily family = m.group(1) == null ? null : ModeFamily.valueOf(m.group(1).toUpperCase(Locale.ROOT));
            return new SizeTarget.Cutoff(family, Integer.parseInt(m.group(2)), frequency("--cutoff", m.group(3)));
        }
        if (target.ratio != null) {
            return new SizeTarget.BandRatio(target.ratio);
        }
        if (target.impedance != null) {
            String[] parts = target.impedance.split("=", -1);
            if (parts.length != 2) {
                throw new IllegalArgumentException("--impedance-at '" + target.impedance + "': expected FREQ=OHMS,"
                        + " e.g. 10GHz=200");
            }
            AnalysisSettings how = new AnalysisSettings(AnalysisSettings.defaults().conductor(), 0,
                    AnalysisSettings.defaults().breakdown(), definition.definition(), null);
            return new SizeTarget.Impedance(frequency("--impedance-at", parts[0]),
                    TemplateInput.number("--impedance-at", parts[1]), how);
        }
        String[] band = target.cover.split(":", -1);
        if (band.length != 2) {
            throw new IllegalArgumentException("--cover '" + target.cover + "': expected F1:F2, e.g. 8GHz:12GHz");
        }
        return new SizeTarget.Coverage(frequency("--cover", band[0]), frequency("--cover", band[1]));
    }

    private static double frequency(String option, String text) {
        try {
            return FrequencySpec.parseFrequency(text);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(option + ": " + e.getMessage());
        }
    }
}
