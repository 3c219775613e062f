package org.sectio.cli;

import org.sectio.physics.FrequencySpec;
import picocli.CommandLine.Option;

/**
 * {@code --freq F} or {@code --band START:STOP:POINTS}: the frequencies at which modes are analysed.
 * Used as an exclusive picocli argument group, so giving both is a usage error.
 */
final class FrequencyChoice {

    @Option(names = "--freq", paramLabel = "F", required = true,
            description = "analyse the modes at one frequency, e.g. 10GHz, 9.5e9 or 500MHz (units Hz … THz; none: Hz)")
    String frequency;

    @Option(names = "--band", paramLabel = "START:STOP:POINTS", required = true,
            description = "analyse the modes at POINTS evenly spaced frequencies from START to STOP, both included,"
                    + " e.g. 8GHz:12GHz:41")
    String band;

    /**
     * @return the frequencies asked for
     * @throws IllegalArgumentException with a one-line message naming the option when the text is wrong
     */
    FrequencySpec spec() {
        try {
            if (frequency != null) {
                if (frequency.contains(":")) {
                    throw new IllegalArgumentException("one frequency expected; use --band START:STOP:POINTS for a sweep");
                }
                return FrequencySpec.parse(frequency);
            }
            if (!band.contains(":")) {
                throw new IllegalArgumentException("expected START:STOP:POINTS, e.g. 8GHz:12GHz:41;"
                        + " use --freq for one frequency");
            }
            return FrequencySpec.parse(band);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException((frequency != null ? "--freq " + frequency : "--band " + band) + ": "
                    + e.getMessage());
        }
    }
}
