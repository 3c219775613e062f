package org.sectio.physics;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** The command-line frequency text: SI prefixes of the hertz (SI Brochure, 9th ed., §3) and linear sweeps. */
class FrequencySpecTest {

    @Test
    @DisplayName("10GHz, 10 GHz, 1e10, 9.5e9Hz, 500MHz, 2.5 kHz and 0.3THz give their values in hertz")
    void singleFrequencies() {
        assertEquals(10e9, FrequencySpec.parseFrequency("10GHz"), 0.0);
        assertEquals(10e9, FrequencySpec.parseFrequency("10 GHz"), 0.0);
        assertEquals(1e10, FrequencySpec.parseFrequency("1e10"), 0.0);
        assertEquals(9.5e9, FrequencySpec.parseFrequency("9.5e9Hz"), 0.0);
        assertEquals(500e6, FrequencySpec.parseFrequency("500MHz"), 0.0);
        assertEquals(2500, FrequencySpec.parseFrequency(" 2.5 kHz "), 0.0);
        assertEquals(0.3e12, FrequencySpec.parseFrequency("0.3THz"), 1e-3);
        assertEquals(12e9, FrequencySpec.parseFrequency("12ghz"), 0.0);
        FrequencySpec one = FrequencySpec.parse("10GHz");
        assertFalse(one.isSweep());
        assertArrayEquals(new double[] {10e9}, one.values(), 0.0);
    }

    @Test
    @DisplayName("8GHz:12GHz:101 is 101 frequencies 40 MHz apart from 8 to 12 GHz, both ends included")
    void linearSweep() {
        // step = (12 − 8) GHz / (101 − 1) = 40 MHz
        FrequencySpec sweep = FrequencySpec.parse("8GHz:12GHz:101");
        assertTrue(sweep.isSweep());
        double[] f = sweep.values();
        assertEquals(101, f.length);
        assertEquals(8e9, f[0], 0.0);
        assertEquals(12e9, f[100], 0.0);
        assertEquals(8.04e9, f[1], 1e-3);
        assertEquals(10e9, f[50], 1e-3);
        assertArrayEquals(new double[] {1e9, 1.5e9, 2e9}, FrequencySpec.parse("1 GHz : 2000MHz : 3").values(), 1e-6);
    }

    @Test
    @DisplayName("Bad text gives one line naming the text and what was expected")
    void badTextIsReported() {
        IllegalArgumentException unit = assertThrows(IllegalArgumentException.class,
                () -> FrequencySpec.parse("10 GZ"));
        assertEquals("bad frequency unit \"GZ\" in \"10 GZ\": expected a number with an optional unit Hz, kHz, MHz,"
                + " GHz or THz, e.g. 10GHz, 500 MHz or 9.5e9", unit.getMessage());
        IllegalArgumentException word = assertThrows(IllegalArgumentException.class,
                () -> FrequencySpec.parse("ten GHz"));
        assertTrue(word.getMessage().startsWith("bad frequency \"ten GHz\": expected"), word.getMessage());
        IllegalArgumentException parts = assertThrows(IllegalArgumentException.class,
                () -> FrequencySpec.parse("8GHz:12GHz"));
        assertTrue(parts.getMessage().contains("START:STOP:POINTS"), parts.getMessage());
        IllegalArgumentException points = assertThrows(IllegalArgumentException.class,
                () -> FrequencySpec.parse("8GHz:12GHz:many"));
        assertTrue(points.getMessage().contains("\"many\""), points.getMessage());
        assertThrows(IllegalArgumentException.class, () -> FrequencySpec.parse("12GHz:8GHz:11"));
        assertThrows(IllegalArgumentException.class, () -> FrequencySpec.parse("8GHz:12GHz:1"));
        assertThrows(IllegalArgumentException.class, () -> FrequencySpec.parse("0GHz"));
        assertThrows(IllegalArgumentException.class, () -> FrequencySpec.parse("-5GHz"));
        assertThrows(IllegalArgumentException.class, () -> FrequencySpec.parse(""));
        for (String bad : new String[] {"0GHz", "8GHz:12GHz:1", ""}) {
            String message = assertThrows(IllegalArgumentException.class, () -> FrequencySpec.parse(bad)).getMessage();
            assertFalse(message.contains("\n"), "one line: " + message);
        }
    }
}
