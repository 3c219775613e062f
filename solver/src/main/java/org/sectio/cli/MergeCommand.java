package org.sectio.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.sectio.batch.SweepMerge;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code sectio merge OUT SHARD...}: joins the outputs of {@code sectio sweep --shard i/n} into one
 * file sorted by point index, refusing (with the point named) a point that is missing or repeated.
 * OUT is written whole or not at all.
 */
@Command(name = "merge", mixinStandardHelpOptions = true, versionProvider = SectioMain.Version.class,
        description = {"Joins the shard outputs of a sweep into one file sorted by point, checking that every point"
                + " is there exactly once.",
            "All SHARD files must be of one layout (CSV with the same header, or JSON Lines); OUT gets that layout."},
        footer = {"", "Exit codes: 0 done, 2 the shards do not make one whole sweep or a file cannot be used,"
                + " 1 writing OUT failed."})
final class MergeCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "OUT", description = "merged output file (replaced whole)")
    private Path target;

    @Parameters(index = "1..*", arity = "1..*", paramLabel = "SHARD", description = "shard outputs of one sweep")
    private List<Path> shards;

    @Override
    public Integer call() throws IOException {
        for (Path shard : shards) {
            if (!Files.isRegularFile(shard)) {
                throw usage("shard output '" + shard + "' does not exist or is not a file");
            }
            if (shard.toAbsolutePath().normalize().equals(target.toAbsolutePath().normalize())) {
                throw usage("OUT '" + target + "' is also a shard; write the merge to another file");
            }
        }
        OutputPlaces.checkFile("OUT", target, spec);
        int points;
        try {
            points = SweepMerge.merge(target, shards);
        } catch (IllegalArgumentException e) {
            throw usage(e.getMessage());
        }
        spec.commandLine().getOut().println("merge: " + points + " points from " + shards.size() + " files into "
                + target);
        spec.commandLine().getOut().flush();
        return 0;
    }

    private CommandLine.ParameterException usage(String message) {
        return new CommandLine.ParameterException(spec.commandLine(), message);
    }
}
