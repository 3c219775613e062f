package org.sectio.physics;

/**
 * The caution printed with every figure about power, reflected power or breakdown.
 */
public final class Caution {

    /** One paragraph, plain text, to print beside power-handling and mismatch results. */
    public static final String TEXT = "Caution: high-power RF can injure people; reflected power can destroy"
            + " sources. Breakdown margins depend on pressure, humidity, surface finish, pulse length and"
            + " altitude, and on multipaction in vacuum. These figures are engineering estimates; they do not"
            + " replace local codes, safety standards and licensed practice.";

    private Caution() {
    }
}
