package org.sectio.cli;

import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.sectio.batch.tolerance.CornerRadiusOutput;
import org.sectio.batch.tolerance.CornerRadiusStudy;
import org.sectio.geometry.family.StandardSize;
import org.sectio.geometry.family.StandardSizes;
import org.sectio.io.AtomicFile;
import org.sectio.io.TableFormat;
import picocli.CommandLine;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code sectio corner-study}: the cutoffs and usable band of a rectangular guide (a standard WR size or
 * width × height) against the radius of its inner corners, 0 to half the short side
 * ({@link CornerRadiusStudy}), as a table or CSV and optionally a PNG chart.
 */
@Command(name = "corner-study", mixinStandardHelpOptions = true, versionProvider = SectioMain.Version.class,
        sortOptions = false,
        description = {"Cutoffs of the first modes and the usable band of a rectangular guide against the radius of"
                + " its four inner corners, from 0 (sharp) to half the shorter side (the stadium)."},
        footer = {"", "Example: sectio corner-study --standard WR-90 --points 11 --plot corners.png",
            "Exit codes: 0 done, 2 the request cannot be carried out as given, 1 a solve or an output failed."})
final class CornerStudyCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @ArgGroup(exclusive = true, multiplicity = "0..1")
    private Size size;

    /** --standard or --size. */
    static final class Size {
        @Option(names = "--standard", paramLabel = "WR-N", required = true, description = "an EIA size, e.g. WR-90")
        String standard;

        @Option(names = "--size", paramLabel = "WxH", required = true, description = "inner width × height, mm, e.g. 22.86x10.16")
        String dimensions;
    }

    @Option(names = "--max-radius", paramLabel = "MM", description = "largest radius, mm (default: half the shorter side)")
    private Double maxRadius;

    @Option(names = "--points", paramLabel = "N", defaultValue = "11",
            description = "radii from 0 to the largest, evenly spaced (default: ${DEFAULT-VALUE})")
    private int points;

    @Option(names = {"-n", "--modes"}, paramLabel = "N", defaultValue = "4",
            description = "modes to follow (default: ${DEFAULT-VALUE})")
    private int modes;

    @Option(names = "--cells", paramLabel = "N", defaultValue = "240",
            description = "grid cells across the longer side (default: ${DEFAULT-VALUE})")
    private int cells;

    @Option(names = "--threads", paramLabel = "N", description = "parallel solves, one solver each (default: all cores)")
    private Integer threads;

    @Option(names = "--format", paramLabel = "table|csv", defaultValue = "table",
            description = "table or csv (default: ${DEFAULT-VALUE})")
    private TableFormat format;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE", description = "write the table to FILE, replaced whole")
    private Path output;

    @Option(names = "--plot", paramLabel = "FILE.png", description = "also draw the cutoffs and band edges against radius")
    private Path plot;

    @Override
    public Integer call() throws Exception {
        double width;
        double height;
        try {
            if (size != null && size.dimensions != null) {
                String[] wh = size.dimensions.toLowerCase(java.util.Locale.ROOT).split("[x×]", -1);
                if (wh.length != 2) {
                    throw new IllegalArgumentException("--size '" + size.dimensions + "': expected WxH in mm, e.g. 22.86x10.16");
                }
                width = TemplateInput.number("--size", wh[0]) * 1e-3;
                height = TemplateInput.number("--size", wh[1]) * 1e-3;
            } else {
                StandardSize s = StandardSizes.byName(size == null ? "WR-90" : size.standard);
                width = s.width();
                height = s.height();
            }
            if (format == TableFormat.JSON) {
                throw new IllegalArgumentException("--format json: corner-study writes table or csv");
            }
            if (cells < 8 || cells > 4000) {
                throw new IllegalArgumentException("--cells " + cells + ": must be 8 … 4000");
            }
            if (threads != null && threads < 1) {
                throw new IllegalArgumentException("--threads " + threads + ": must be at least 1");
            }
            if (points < 2 || points > 1000) {
                throw new IllegalArgumentException("--points " + points + ": must be 2 … 1000");
            }
        } catch (IllegalArgumentException e) {
            throw new CommandLine.ParameterException(spec.commandLine(), e.getMessage());
        }
        double largest = maxRadius != null ? maxRadius * 1e-3 : Math.min(width, height) / 2;
        if (output != null) {
            OutputPlaces.checkFile("--output", output, spec);
        }
        if (plot != null) {
            OutputPlaces.checkFile("--plot", plot, spec);
        }
        CornerRadiusStudy.Result result;
        try {
            result = CornerRadiusStudy.run(width, height, largest, points, modes, cells,
                    threads != null ? threads : Runtime.getRuntime().availableProcessors());
        } catch (IllegalArgumentException e) {
            throw new CommandLine.ParameterException(spec.commandLine(), e.getMessage());
        }
        String text = format == TableFormat.CSV ? CornerRadiusOutput.csv(result) : CornerRadiusOutput.table(result);
        if (output != null) {
            AtomicFile.write(output, out -> out.write(text.getBytes(StandardCharsets.UTF_8)));
        } else {
            PrintWriter out = spec.commandLine().getOut();
            out.print(text);
            out.flush();
        }
        if (plot != null) {
            CornerRadiusOutput.writePlot(result, plot);
        }
        return 0;
    }
}
