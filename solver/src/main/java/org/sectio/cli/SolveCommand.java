package org.sectio.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.function.Supplier;
import org.sectio.geometry.CrossSection;
import org.sectio.geometry.Shapes;
import org.sectio.io.FieldCsvWriter;
import org.sectio.io.FieldImageLayout;
import org.sectio.io.FieldImageWriter;
import org.sectio.io.FrequencyReport;
import org.sectio.io.FrequencyTableWriter;
import org.sectio.io.ModeTableWriter;
import org.sectio.io.SweepCharts;
import org.sectio.io.TableFormat;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.ModeSet;
import org.sectio.modes.ModeSolver;
import org.sectio.modes.SolveException;
import org.sectio.modes.SolveProgress;
import org.sectio.modes.SolveSettings;
import org.sectio.physics.AnalysisSettings;
import org.sectio.physics.Caution;
import org.sectio.physics.FrequencySpec;
import picocli.CommandLine;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code sectio solve [FILE]}: reads a geometry file (or takes the built-in WR-90 rectangle), solves
 * for its lowest modes and writes the mode table, optionally with per-mode field CSV and PNG files,
 * or exports the assembled matrices instead of solving. With {@code --freq} or {@code --band} every
 * mode is also analysed at those frequencies ({@link FrequencyAnalysis}) and the table carries the
 * propagation, loss, power-handling and impedance figures, the guide summary and the caution;
 * {@code --plots} adds the sweep charts. Everything about the request (options, input, output
 * places) is checked before the solve starts.
 */
@Command(name = "solve", mixinStandardHelpOptions = true, versionProvider = SectioMain.Version.class,
        sortOptions = false,
        description = {"Finds the lowest guided modes of a waveguide cross-section.",
            "FILE is a geometry file (JSON, see docs/geometry-files.md); without it the built-in WR-90 rectangle,"
                + " 22.86 × 10.16 mm (EIA standard inner size), is solved.",
            "With --freq or --band each mode is also analysed at those frequencies: propagation, wall and"
                + " filling loss, peak field, breakdown and rated power, characteristic impedance, and a guide"
                + " summary. Power figures are engineering estimates and come with a caution."},
        footer = {"", "Exit codes: 0 done, 2 the request cannot be carried out as given, 1 the solve or an output failed."})
final class SolveCommand implements Callable<Integer> {

    /** Broad side of the built-in WR-90 guide, m. */
    static final double WR90_WIDTH = 0.02286;
    /** Narrow side of the built-in WR-90 guide, m. */
    static final double WR90_HEIGHT = 0.01016;
    private static final int DEFAULT_CELLS = SolveSettings.DEFAULT_CELLS;

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", arity = "0..1", paramLabel = "FILE", description = "geometry file; default: WR-90")
    private Path file;

    @Option(names = {"-n", "--modes"}, paramLabel = "N", defaultValue = "10",
            description = "how many modes to report, lowest cutoff first (default: ${DEFAULT-VALUE})")
    private int modes;

    @Option(names = "--family", paramLabel = "te|tm|both", defaultValue = "both",
            description = "mode families to solve for: te, tm or both (default: ${DEFAULT-VALUE})")
    private FamilyChoice family;

    @ArgGroup(exclusive = true, multiplicity = "0..1")
    private GridChoice grid;

    @Option(names = "--no-estimate", description = "skip the error estimate (saves the second, coarser solve)")
    private boolean noEstimate;

    @Option(names = "--threads", paramLabel = "N", description = "worker threads (default: all cores)")
    private Integer threads;

    @Option(names = "--format", paramLabel = "table|csv|json", defaultValue = "table",
            description = "layout of the mode table: table, csv or json (default: ${DEFAULT-VALUE})")
    private TableFormat format;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE",
            description = "write the mode table to FILE, replaced whole (default: standard output)")
    private Path output;

    @Option(names = "--fields", paramLabel = "DIR",
            description = "also write each mode's field as <family>-<index>.csv and .png into DIR (created if missing)")
    private Path fields;

    @Option(names = "--image-width", paramLabel = "PX", defaultValue = "800",
            description = "width of the field pictures in pixels (default: ${DEFAULT-VALUE})")
    private int imageWidth;

    @Option(names = "--pencil", paramLabel = "DIR",
            description = "write the assembled matrices (Matrix Market) into DIR and stop without solving;"
                    + " cannot be combined with --output, --fields, --freq or --band")
    private Path pencil;

    @ArgGroup(exclusive = true, multiplicity = "0..1")
    private FrequencyChoice frequencies;

    @Mixin
    private AnalysisOptions analysis;

    @Option(names = "--voltage-path", paramLabel = "X1,Y1:X2,Y2",
            description = "straight path (mm, in the section's coordinates) along which the voltage of the"
                    + " impedances is taken (default: vertical, wall to wall at the centre line)")
    private String voltagePath;

    @Option(names = "--plots", paramLabel = "DIR",
            description = "with --band: also write " + SweepCharts.DISPERSION_FILE + " (β against f, with the light"
                    + " line) and " + SweepCharts.ATTENUATION_FILE + " (α_c + α_d against f) into DIR (created if"
                    + " missing)")
    private Path plots;

    /** --cells and --accuracy, which both pick the grid. */
    static final class GridChoice {
        @Option(names = "--cells", paramLabel = "N", required = true,
                description = "grid cells across the longer side (default: " + DEFAULT_CELLS + ")")
        Integer cells;

        @Option(names = "--accuracy", paramLabel = "REL", required = true,
                description = "target relative error of every cutoff, which then picks the grid")
        Double accuracy;
    }

    @Override
    public Integer call() throws IOException {
        SolveSettings settings = settings();
        FrequencySpec wanted = frequencySpec();
        AnalysisSettings analysisSettings = wanted == null ? null : analysisSettings();
        CrossSection section = section();
        if (analysisSettings != null && !analysis.conductorGiven()) {
            analysisSettings = SectionMetals.applied(analysisSettings, section, spec.commandLine().getErr());
        }
        if (pencil != null) {
            if (output != null || fields != null) {
                throw usage("--pencil exports the matrices without solving; it cannot be combined with --output or --fields");
            }
            if (wanted != null) {
                throw usage("--pencil exports the matrices without solving; it cannot be combined with --freq or --band");
            }
            OutputPlaces.prepareFolder("--pencil", pencil, spec);
            for (Path written : ModeSolver.exportPencils(section, settings, pencil)) {
                out().println(written);
            }
            out().flush();
            return 0;
        }
        if (output != null) {
            OutputPlaces.checkFile("--output", output, spec);
        }
        if (fields != null) {
            if (imageWidth < FieldImageLayout.MIN_WIDTH || imageWidth > FieldImageLayout.MAX_WIDTH) {
                throw usage("--image-width " + imageWidth + ": must be " + FieldImageLayout.MIN_WIDTH + " … "
                        + FieldImageLayout.MAX_WIDTH + " px");
            }
            OutputPlaces.prepareFolder("--fields", fields, spec);
        }
        if (plots != null) {
            OutputPlaces.prepareFolder("--plots", plots, spec);
        }
        ModeSet result = solve(section, settings);
        if (wanted != null) {
            writeAnalysis(section, result, wanted, analysisSettings);
        } else if (output != null) {
            ModeTableWriter.write(result, format, output);
        } else {
            ModeTableWriter.write(result, format, out());
        }
        if (fields != null) {
            writeFields(section, result);
        }
        return 0;
    }

    private void writeAnalysis(CrossSection section, ModeSet result, FrequencySpec wanted, AnalysisSettings how)
            throws IOException {
        FrequencyReport report = FrequencyAnalysis.analyse(section, result, wanted.values(), how);
        if (output != null) {
            FrequencyTableWriter.write(report, format, output);
        } else {
            FrequencyTableWriter.write(report, format, out());
        }
        if (format == TableFormat.CSV || output != null) {
            spec.commandLine().getErr().println(Caution.TEXT);
            spec.commandLine().getErr().flush();
        }
        if (plots != null && SweepCharts.write(FrequencyAnalysis.sweep(report), plots).size() < 2) {
            spec.commandLine().getErr().println("sectio: " + FrequencyAnalysis.noLossReason(report) + ": "
                    + SweepCharts.ATTENUATION_FILE + " not written");
        }
    }

    /** The frequencies asked for, or null; refuses the options that need them when there are none. */
    private FrequencySpec frequencySpec() {
        if (frequencies == null) {
            String orphan = AnalysisOptions.firstGiven(spec);
            if (orphan == null && voltagePath != null) {
                orphan = "--voltage-path";
            }
            if (orphan == null && plots != null) {
                orphan = "--plots";
            }
            if (orphan != null) {
                throw usage(orphan + " needs --freq F or --band START:STOP:POINTS: it sets how modes are analysed"
                        + " at a frequency");
            }
            return null;
        }
        try {
            FrequencySpec wanted = frequencies.spec();
            if (plots != null && !wanted.isSweep()) {
                throw usage("--plots draws curves over a band: use --band START:STOP:POINTS instead of --freq");
            }
            return wanted;
        } catch (IllegalArgumentException e) {
            throw usage(e.getMessage());
        }
    }

    private AnalysisSettings analysisSettings() {
        try {
            return analysis.settings(voltagePath == null ? null : VoltagePathText.parse(voltagePath));
        } catch (IllegalArgumentException e) {
            throw usage(e.getMessage());
        }
    }

    private ModeSet solve(CrossSection section, SolveSettings settings) {
        TerminalProgress progress = System.console() != null ? new TerminalProgress(spec.commandLine().getErr()) : null;
        try {
            return ModeSolver.solve(section, settings, progress != null ? progress : SolveProgress.SILENT);
        } catch (OutOfMemoryError e) {
            throw new SolveException(String.format(Locale.ROOT, "out of memory solving '%s' on %d cells across;"
                    + " use fewer --cells or a larger SECTIO_HEAP", section.name(), settings.cellsAcross()));
        } finally {
            if (progress != null) {
                progress.finish();
            }
        }
    }

    private void writeFields(CrossSection section, ModeSet result) throws IOException {
        for (Mode mode : result.modes()) {
            String stem = mode.family().name().toLowerCase(Locale.ROOT) + "-" + mode.index();
            FieldCsvWriter.write(mode.field(), fields.resolve(stem + ".csv"));
            FieldImageWriter.write(section, mode, imageWidth, fields.resolve(stem + ".png"));
        }
    }

    /** Builds the settings, naming the option at fault with the settings' own message. */
    private SolveSettings settings() {
        int cores = Runtime.getRuntime().availableProcessors();
        EnumSet<ModeFamily> all = EnumSet.allOf(ModeFamily.class);
        int cells = grid != null && grid.cells != null ? grid.cells : DEFAULT_CELLS;
        double accuracy = grid != null && grid.accuracy != null ? grid.accuracy : Double.NaN;
        int workers = threads != null ? threads : cores;
        checkOption("--modes " + modes, () -> new SolveSettings(modes, all, DEFAULT_CELLS, Double.NaN, true, 1));
        checkOption("--cells " + cells, () -> new SolveSettings(1, all, cells, Double.NaN, true, 1));
        checkOption("--accuracy " + accuracy, () -> new SolveSettings(1, all, DEFAULT_CELLS, accuracy, true, 1));
        checkOption("--threads " + workers, () -> new SolveSettings(1, all, DEFAULT_CELLS, Double.NaN, true, workers));
        if (grid != null && grid.accuracy != null && !Double.isFinite(grid.accuracy)) {
            throw usage("--accuracy " + grid.accuracy + ": expected a number such as 1e-4");
        }
        return new SolveSettings(modes, family.families(), cells, accuracy, !noEstimate, workers);
    }

    private void checkOption(String option, Supplier<SolveSettings> attempt) {
        try {
            attempt.get();
        } catch (IllegalArgumentException e) {
            throw usage(option + ": " + e.getMessage());
        }
    }

    private CrossSection section() {
        if (file == null) {
            return Shapes.rectangle(WR90_WIDTH, WR90_HEIGHT);
        }
        try {
            return SectionInput.read(file);
        } catch (IllegalArgumentException e) {
            throw usage(e.getMessage());
        }
    }

    private PrintWriter out() {
        return spec.commandLine().getOut();
    }

    private CommandLine.ParameterException usage(String message) {
        return new CommandLine.ParameterException(spec.commandLine(), message);
    }
}
