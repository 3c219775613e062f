package org.sectio.cli;

import java.io.IOException;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.sectio.geometry.CrossSection;
import org.sectio.io.AtomicFile;
import org.sectio.io.FrequencyReport;
import org.sectio.io.FrequencyTableWriter;
import org.sectio.io.JunctionReport;
import org.sectio.io.JunctionStep;
import org.sectio.io.JunctionWriter;
import org.sectio.io.TableFormat;
import org.sectio.modes.Mode;
import org.sectio.modes.ModeFamily;
import org.sectio.modes.ModeIdentifier;
import org.sectio.modes.ModeSet;
import org.sectio.modes.ModeSolver;
import org.sectio.modes.SolveException;
import org.sectio.modes.SolveProgress;
import org.sectio.modes.SolveSettings;
import org.sectio.physics.AnalysisSettings;
import org.sectio.physics.Caution;
import org.sectio.physics.FrequencySpec;
import org.sectio.physics.ModeAnalysis;
import org.sectio.physics.ModeAtFrequency;
import picocli.CommandLine;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code sectio junction A.json B.json --freq F}: the reflection where guide A meets guide B, from the
 * characteristic impedances of their dominant modes, Γ = (Z_B − Z_A)/(Z_B + Z_A), with return loss,
 * VSWR and reflected power (Pozar, Microwave Engineering, 4th ed., §2.3). This is the impedance-step
 * estimate: the energy stored in the evanescent modes at the step is ignored. Both guides are solved
 * on the same grid rule; the dominant mode of each must propagate at every frequency asked for.
 */
@Command(name = "junction", mixinStandardHelpOptions = true, versionProvider = SectioMain.Version.class,
        sortOptions = false,
        description = {"Estimates the reflection where guide A joins guide B, from the characteristic impedances"
                + " of their dominant modes: Γ = (Z_B − Z_A)/(Z_B + Z_A), return loss, VSWR, reflected power.",
            "This impedance-step estimate ignores the energy stored at the step; treat it as a first figure."},
        footer = {"", "Exit codes: 0 done, 2 the request cannot be carried out as given, 1 the solve or an output failed."})
final class JunctionCommand implements Callable<Integer> {

    private static final int DEFAULT_CELLS = SolveSettings.DEFAULT_CELLS;
    private static final int MODES = 3;

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "A", description = "geometry file of the guide the wave comes from")
    private Path fileA;

    @Parameters(index = "1", paramLabel = "B", description = "geometry file of the guide it goes into")
    private Path fileB;

    @ArgGroup(exclusive = true, multiplicity = "1")
    private FrequencyChoice frequencies;

    @Mixin
    private AnalysisOptions analysis;

    @Option(names = "--cells", paramLabel = "N", defaultValue = "" + DEFAULT_CELLS,
            description = "grid cells across the longer side of each guide (default: ${DEFAULT-VALUE})")
    private int cells;

    @Option(names = "--threads", paramLabel = "N", description = "worker threads (default: all cores)")
    private Integer threads;

    @Option(names = "--format", paramLabel = "table|csv|json", defaultValue = "table",
            description = "layout of the result: table, csv or json (default: ${DEFAULT-VALUE})")
    private TableFormat format;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE",
            description = "write the result to FILE, replaced whole (default: standard output)")
    private Path output;

    @Override
    public Integer call() throws IOException {
        FrequencySpec wanted;
        AnalysisSettings settings;
        SolveSettings solve;
        try {
            wanted = frequencies.spec();
            settings = analysis.settings(null);
            solve = new SolveSettings(MODES, EnumSet.allOf(ModeFamily.class), cells, Double.NaN, false,
                    threads != null ? threads : Runtime.getRuntime().availableProcessors());
        } catch (IllegalArgumentException e) {
            throw usage(e.getMessage());
        }
        CrossSection a = read(fileA);
        CrossSection b = read(fileB);
        if (output != null) {
            OutputPlaces.checkFile("--output", output, spec);
        }
        Side sideA = Side.of("A", fileA, a, solve(a, solve));
        Side sideB = Side.of("B", fileB, b, solve(b, solve));
        List<JunctionStep> steps = new ArrayList<>();
        for (double f : wanted.values()) {
            steps.add(JunctionStep.of(f, sideA.impedance(f, settings), sideB.impedance(f, settings)));
        }
        JunctionReport report = new JunctionReport(a.name(), sideA.label, sideA.mode.cutoffFrequencyHz(), b.name(),
                sideB.label, sideB.mode.cutoffFrequencyHz(), FrequencyTableWriter.definitionKey(settings.definition()),
                steps);
        String text = JunctionWriter.format(report, format);
        if (output != null) {
            AtomicFile.write(output, out -> out.write(text.getBytes(StandardCharsets.UTF_8)));
        } else {
            spec.commandLine().getOut().print(text);
            spec.commandLine().getOut().flush();
        }
        if (format == TableFormat.CSV || output != null) {
            spec.commandLine().getErr().println(Caution.TEXT);
            spec.commandLine().getErr().flush();
        }
        return 0;
    }

    /** One guide of the junction: its dominant mode, named, prepared for evaluation at frequencies. */
    private record Side(String letter, Path file, Mode mode, String label, ModeAnalysis analysis) {

        static Side of(String letter, Path file, CrossSection section, ModeSet result) {
            Mode dominant = FrequencyReport.byCutoff(result).get(0);
            String label = ModeIdentifier.identify(section, dominant).label();
            try {
                return new Side(letter, file, dominant, label, ModeAnalysis.prepare(section, dominant));
            } catch (IllegalStateException e) {
                throw new SolveException(String.format(Locale.ROOT, "cannot analyse %s of guide %s '%s': %s", label,
                        letter, file, e.getMessage()), e);
            }
        }

        double impedance(double frequencyHz, AnalysisSettings settings) {
            ModeAtFrequency at = analysis.at(frequencyHz, settings);
            if (!at.propagating()) {
                throw new IllegalArgumentException(String.format(Locale.ROOT, "at %s GHz the dominant mode %s of"
                        + " guide %s '%s' is cut off (fc %s GHz): choose a frequency above it", ghz(frequencyHz),
                        label, letter, file, ghz(mode.cutoffFrequencyHz())));
            }
            double z = at.chosenImpedance();
            if (!(z > 0) || Double.isInfinite(z)) {
                throw new IllegalArgumentException(String.format(Locale.ROOT, "guide %s '%s': the %s impedance of %s"
                        + " at %s GHz is not available (%s); try another --impedance", letter, file,
                        FrequencyTableWriter.definitionKey(at.chosenDefinition()), label, ghz(frequencyHz),
                        at.limitation().isEmpty() ? "got " + z + " ohm" : at.limitation()));
            }
            return z;
        }
    }

    /** @return f in GHz to six significant digits, without trailing zeros, e.g. "5" or "6.55707" */
    private static String ghz(double hz) {
        return new BigDecimal(String.format(Locale.ROOT, "%.6g", hz * 1e-9)).stripTrailingZeros()
                .toPlainString();
    }

    private CrossSection read(Path file) {
        try {
            return SectionInput.read(file);
        } catch (IllegalArgumentException e) {
            throw usage(e.getMessage());
        }
    }

    private static ModeSet solve(CrossSection section, SolveSettings settings) {
        try {
            return ModeSolver.solve(section, settings, SolveProgress.SILENT);
        } catch (OutOfMemoryError e) {
            throw new SolveException(String.format(Locale.ROOT, "out of memory solving '%s' on %d cells across;"
                    + " use fewer --cells or a larger SECTIO_HEAP", section.name(), settings.cellsAcross()));
        }
    }

    private CommandLine.ParameterException usage(String message) {
        return new CommandLine.ParameterException(spec.commandLine(), message);
    }
}
