package org.tankwright.units;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import java.util.Random;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class QuantitiesTest {

    @ParameterizedTest(name = "{0} as {1} = {2}")
    @CsvSource(delimiter = '|', value = {
            "4.7n      | CAPACITANCE | 4.7e-9",
            "4n7       | CAPACITANCE | 4.7e-9",
            "4.7 nF    | CAPACITANCE | 4.7e-9",
            "4.7nF     | CAPACITANCE | 4.7e-9",
            "4n7F      | CAPACITANCE | 4.7e-9",
            "100k      | FREQUENCY   | 1e5",
            "100 kHz   | FREQUENCY   | 1e5",
            "6.78 MHz  | FREQUENCY   | 6.78e6",
            "6.78meg   | FREQUENCY   | 6.78e6",
            "22 µH     | INDUCTANCE  | 22e-6",
            "22 μH     | INDUCTANCE  | 22e-6",
            "22 uH     | INDUCTANCE  | 22e-6",
            "22u       | INDUCTANCE  | 22e-6",
            "1m        | INDUCTANCE  | 1e-3",
            "0.1 Ω     | RESISTANCE  | 0.1",
            "0.1 Ω     | RESISTANCE  | 0.1",
            "0.1 ohm   | RESISTANCE  | 0.1",
            "4R7       | RESISTANCE  | 4.7",
            "2k2       | RESISTANCE  | 2200",
            "150 mΩ    | RESISTANCE  | 0.15",
            "2.5 mm    | LENGTH      | 2.5e-3",
            "2.5 m     | LENGTH      | 2.5",
            "2.5m      | LENGTH      | 2.5",
            "25 cm     | LENGTH      | 0.25",
            "80 µm     | LENGTH      | 80e-6",
            "1e-6      | CAPACITANCE | 1e-6",
            "12 V      | VOLTAGE     | 12",
            "-3 dB     | DECIBEL     | -3",
            "2%        | FRACTION    | 0.02",
            "0.02      | FRACTION    | 0.02",
            "20 °C     | TEMPERATURE | 20",
            "-40C      | TEMPERATURE | -40",
            "10 deg    | ANGLE       | 10",
            "1.72e-8 ohm·m | RESISTIVITY | 1.72e-8",
            "20 kA/m   | FIELD_STRENGTH | 2e4",
            "27 µT     | FLUX_DENSITY | 27e-6",
            ".5        | DIMENSIONLESS | 0.5",
            "2 L/min   | VOLUME_FLOW | 3.3333333333333335e-5",
    })
    void parsesEngineeringNotation(String text, Dimension dim, double expected) {
        assertEquals(expected, Quantities.parse(text, dim), Math.abs(expected) * 1e-12);
    }

    @Test
    void rejectsAWrongDimensionNamingTheExpectedUnit() {
        QuantityFormatException e = assertThrows(QuantityFormatException.class,
                () -> Quantities.parse("100 kHz", Dimension.INDUCTANCE));
        assertTrue(e.getMessage().contains("inductance in H"), e.getMessage());
        assertTrue(e.getMessage().contains("frequency"), e.getMessage());
        assertTrue(e.getMessage().contains("100 kHz"), e.getMessage());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {"abc|LENGTH", "|LENGTH", "NaN|CAPACITANCE", "Infinity|VOLTAGE",
            "1e999|VOLTAGE", "4.7 KHz|FREQUENCY", "5 furlongs|LENGTH", "1..2|LENGTH", "4n7|TEMPERATURE",
            "2 cF|CAPACITANCE"})
    void rejectsBadTextWithAMessage(String text, Dimension dim) {
        QuantityFormatException e = assertThrows(QuantityFormatException.class, () -> Quantities.parse(text, dim));
        assertTrue(e.getMessage().contains("expected a " + dim.noun()), e.getMessage());
    }

    @Test
    void caseSensitivePrefixesAreExplained() {
        QuantityFormatException e = assertThrows(QuantityFormatException.class,
                () -> Quantities.parse("4.7 KHz", Dimension.FREQUENCY));
        assertTrue(e.getMessage().contains("case-sensitive"), e.getMessage());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
            "4.7e-9  | CAPACITANCE | 3 | 4.70 nF",
            "1e5     | FREQUENCY   | 3 | 100 kHz",
            "999.96e3| FREQUENCY   | 3 | 1.00 MHz",
            "2.5e-3  | LENGTH      | 2 | 2.5 mm",
            "0.1     | RESISTANCE  | 2 | 100 mΩ",
            "0.02    | FRACTION    | 2 | 2.0 %",
            "-3      | DECIBEL     | 2 | -3.0 dB",
            "20      | TEMPERATURE | 3 | 20.0 °C",
            "0       | VOLTAGE     | 3 | 0.00 V",
            "-12.5   | VOLTAGE     | 3 | -12.5 V",
    })
    void formatsWithEngineeringPrefixes(double value, Dimension dim, int sig, String expected) {
        assertEquals(expected, Quantities.format(value, dim, sig));
    }

    /** Property: formatting then parsing returns the value within the rounding of the digits shown. */
    @Test
    void roundTripsEveryDimensionOverManyDecades() {
        Random rnd = new Random(20261202L);
        int checked = 0;
        for (Dimension dim : Dimension.values()) {
            for (int i = 0; i < 400; i++) {
                double mag = Math.pow(10, -14 + 26 * rnd.nextDouble());
                if (!dim.prefixable()) {
                    mag = Math.pow(10, -3 + 8 * rnd.nextDouble());
                }
                double v = (rnd.nextBoolean() ? 1 : -1) * mag;
                int sig = 3 + rnd.nextInt(6);
                String text = Quantities.format(v, dim, sig);
                double back = Quantities.parse(text, dim);
                assertEquals(v, back, Math.abs(v) * 6 * Math.pow(10, -sig), () -> dim + " " + v + " -> " + text);
                checked++;
            }
        }
        assertEquals(Dimension.values().length * 400, checked);
    }
}
