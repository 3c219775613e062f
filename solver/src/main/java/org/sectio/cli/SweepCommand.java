package org.sectio.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.sectio.batch.RecordFormat;
import org.sectio.batch.Shard;
import org.sectio.batch.SweepDefinition;
import org.sectio.batch.SweepFileReader;
import org.sectio.batch.SweepRunner;
import org.sectio.geometry.file.SectionFileException;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code sectio sweep FILE}: runs the parameter sweep of a sweep file (docs/sweep-files.md) and
 * appends one record per point to CSV and/or JSON Lines outputs. Running the same command again
 * finishes an interrupted sweep; {@code --shard i/n} runs one deterministic share of the points for
 * an array job, and {@code sectio merge} joins the shares. The sweep file and the outputs are checked
 * before anything is solved or written.
 */
@Command(name = "sweep", mixinStandardHelpOptions = true, versionProvider = SectioMain.Version.class,
        sortOptions = false,
        description = {"Solves a cross-section at every point of a parameter sweep and records cutoffs, error"
                + " estimates, the single-mode band, wall loss or impedance per point.",
            "FILE is a sweep file (JSON, see docs/sweep-files.md). Each finished point is appended at once as one"
                + " record; running the same command again skips the recorded points and finishes the rest."},
        footer = {"", "Exit codes: 0 done (failed points are recorded with their reason), 2 the request cannot be"
                + " carried out as given, 1 the sweep or an output failed."})
final class SweepCommand implements Callable<Integer> {

    /** Output layouts of {@code --format}. */
    enum Layout { CSV, JSONL, BOTH }

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "sweep file")
    private Path file;

    @Option(names = {"-o", "--output"}, paramLabel = "OUT",
            description = "output file, appended to and resumed (default: FILE's name with .csv or .jsonl, and"
                    + " .shard-I-of-N before it with --shard, in the current folder); with --format both its"
                    + " extension is replaced by .csv and .jsonl")
    private Path output;

    @Option(names = "--format", paramLabel = "csv|jsonl|both",
            description = "record layout: csv, jsonl (JSON Lines) or both (default: from OUT's extension, else csv)")
    private Layout format;

    @Option(names = "--threads", paramLabel = "N",
            description = "points solved at once, one solver thread each (default: all cores)")
    private Integer threads;

    @Option(names = "--shard", paramLabel = "I/N",
            description = "run only share I of N (0 ≤ I < N) of the sweep, e.g. --shard $SLURM_ARRAY_TASK_ID/16")
    private String shardText;

    @Override
    public Integer call() throws IOException {
        Shard shard = shard();
        int workers = threads != null ? threads : Runtime.getRuntime().availableProcessors();
        if (workers < 1) {
            throw usage("--threads " + workers + ": must be at least 1");
        }
        SweepDefinition sweep = read();
        List<SweepRunner.Output> outputs = outputs(shard);
        for (SweepRunner.Output o : outputs) {
            OutputPlaces.checkFile("--output", o.file(), spec);
        }
        boolean terminal = System.console() != null;
        SweepProgressLine progress = new SweepProgressLine(spec.commandLine().getErr(), terminal);
        SweepRunner.Summary summary;
        try {
            summary = SweepRunner.run(sweep, outputs, shard, workers, progress);
        } finally {
            progress.finish();
        }
        String where = String.join(" and ", outputs.stream().map(o -> o.file().toString()).toList());
        spec.commandLine().getOut().printf(Locale.ROOT, "sweep: %d points solved now (%d failed), %d recorded before,"
                + " %d in %s: %s%n", summary.solved(), summary.failed(), summary.recordedBefore(), summary.inShard(),
                shard.count() == 1 ? "the sweep" : "shard " + shard, where);
        spec.commandLine().getOut().flush();
        return 0;
    }

    private Shard shard() {
        if (shardText == null) {
            return Shard.ALL;
        }
        try {
            return Shard.parse(shardText);
        } catch (IllegalArgumentException e) {
            throw usage("--shard: " + e.getMessage());
        }
    }

    private SweepDefinition read() throws IOException {
        if (!Files.isRegularFile(file)) {
            throw usage("sweep file '" + file + "' does not exist or is not a file");
        }
        try {
            return SweepFileReader.read(file);
        } catch (SectionFileException e) {
            throw usage(e.getMessage());
        } catch (IOException e) {
            throw usage("cannot read '" + file + "': " + ErrorReporter.describe(e));
        }
    }

    private List<SweepRunner.Output> outputs(Shard shard) {
        Layout layout = format;
        if (layout == null) {
            layout = output != null && RecordFormat.ofFileName(output.toString()) == RecordFormat.JSONL ? Layout.JSONL
                    : Layout.CSV;
        }
        String stem;
        if (output != null) {
            stem = layout == Layout.BOTH ? withoutExtension(output.toString()) : null;
        } else {
            String name = withoutExtension(file.getFileName().toString());
            stem = shard.count() == 1 ? name : name + ".shard-" + shard.index() + "-of-" + shard.count();
        }
        List<SweepRunner.Output> outputs = new ArrayList<>();
        for (RecordFormat f : RecordFormat.values()) {
            if (layout == Layout.BOTH || layout.name().equals(f.name())) {
                Path target = stem == null ? output : Path.of(stem + "." + f.extension());
                outputs.add(new SweepRunner.Output(target, f));
            }
        }
        return outputs;
    }

    private static String withoutExtension(String name) {
        String lower = name.toLowerCase(Locale.ROOT);
        for (String ext : List.of(".jsonl", ".json", ".csv")) {
            if (lower.endsWith(ext)) {
                return name.substring(0, name.length() - ext.length());
            }
        }
        return name;
    }

    private CommandLine.ParameterException usage(String message) {
        return new CommandLine.ParameterException(spec.commandLine(), message);
    }
}
