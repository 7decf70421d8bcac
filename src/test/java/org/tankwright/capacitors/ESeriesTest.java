package org.tankwright.capacitors;

import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

/** E-series values against the tables of IEC 60063 (typed in here independently of the production code). */
class ESeriesTest {
    // IEC 60063, table of E6, E12, E24
    static final double[] E6 = {1.0, 1.5, 2.2, 3.3, 4.7, 6.8};
    static final double[] E12 = {1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2};
    static final double[] E24 = {1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0,
            3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1};
    // IEC 60063, table of E48, E96, E192 (×100)
    static final int[] E48 = {100, 105, 110, 115, 121, 127, 133, 140, 147, 154, 162, 169, 178, 187, 196, 205, 215, 226,
            237, 249, 261, 274, 287, 301, 316, 332, 348, 365, 383, 402, 422, 442, 464, 487, 511, 536, 562, 590, 619,
            649, 681, 715, 750, 787, 825, 866, 909, 953};
    static final int[] E96 = {100, 102, 105, 107, 110, 113, 115, 118, 121, 124, 127, 130, 133, 137, 140, 143, 147, 150,
            154, 158, 162, 165, 169, 174, 178, 182, 187, 191, 196, 200, 205, 210, 215, 221, 226, 232, 237, 243, 249,
            255, 261, 267, 274, 280, 287, 294, 301, 309, 316, 324, 332, 340, 348, 357, 365, 374, 383, 392, 402, 412,
            422, 432, 442, 453, 464, 475, 487, 499, 511, 523, 536, 549, 562, 576, 590, 604, 619, 634, 649, 665, 681,
            698, 715, 732, 750, 768, 787, 806, 825, 845, 866, 887, 909, 931, 953, 976};
    static final int[] E192 = {100, 101, 102, 104, 105, 106, 107, 109, 110, 111, 113, 114, 115, 117, 118, 120, 121,
            123, 124, 126, 127, 129, 130, 132, 133, 135, 137, 138, 140, 142, 143, 145, 147, 149, 150, 152, 154, 156,
            158, 160, 162, 164, 165, 167, 169, 172, 174, 176, 178, 180, 182, 184, 187, 189, 191, 193, 196, 198, 200,
            203, 205, 208, 210, 213, 215, 218, 221, 223, 226, 229, 232, 234, 237, 240, 243, 246, 249, 252, 255, 258,
            261, 264, 267, 271, 274, 277, 280, 284, 287, 291, 294, 298, 301, 305, 309, 312, 316, 320, 324, 328, 332,
            336, 340, 344, 348, 352, 357, 361, 365, 370, 374, 379, 383, 388, 392, 397, 402, 407, 412, 417, 422, 427,
            432, 437, 442, 448, 453, 459, 464, 470, 475, 481, 487, 493, 499, 505, 511, 517, 523, 530, 536, 542, 549,
            556, 562, 569, 576, 583, 590, 597, 604, 612, 619, 626, 634, 642, 649, 657, 665, 673, 681, 690, 698, 706,
            715, 723, 732, 741, 750, 759, 768, 777, 787, 796, 806, 816, 825, 835, 845, 856, 866, 876, 887, 898, 909,
            920, 931, 942, 953, 965, 976, 988};

    @Test
    void tablesMatchIec60063() {
        assertArrayEquals(E6, ESeries.E6.mantissas(), 0, "IEC 60063 E6");
        assertArrayEquals(E12, ESeries.E12.mantissas(), 0, "IEC 60063 E12");
        assertArrayEquals(E24, ESeries.E24.mantissas(), 0, "IEC 60063 E24");
        assertArrayEquals(scaled(E48), ESeries.E48.mantissas(), 1e-12, "IEC 60063 E48");
        assertArrayEquals(scaled(E96), ESeries.E96.mantissas(), 1e-12, "IEC 60063 E96");
        assertArrayEquals(scaled(E192), ESeries.E192.mantissas(), 1e-12, "IEC 60063 E192");
    }

    @Test
    void coarseSeriesKeepHistoricalValuesNotRoundedPowersOfTen() {
        // IEC 60063: these E24 values differ from 10^(i/24) rounded to two figures
        int[] historical = {10, 11, 12, 13, 14, 15, 16, 22};
        double[] expected = {2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 8.2};
        for (int j = 0; j < historical.length; j++) {
            int i = historical[j];
            double rounded = Math.round(Math.pow(10, i / 24.0) * 10) / 10.0;
            assertEquals(expected[j], ESeries.E24.mantissas()[i], 0, "IEC 60063 E24 index " + i);
            assertNotEquals(rounded, ESeries.E24.mantissas()[i], "E24 index " + i + " is historical, not rounded");
        }
        // IEC 60063: E192 holds 9.20 where 10^(185/192) rounds to 9.19
        assertEquals(9.19, Math.round(Math.pow(10, 185 / 192.0) * 100) / 100.0, 0);
        assertEquals(9.20, ESeries.E192.mantissas()[185], 0);
    }

    @Test
    void valuesBetweenSpanDecadesExactly() {
        List<Double> v = ESeries.E6.valuesBetween(1e-9, 1e-7);
        assertEquals(13, v.size(), "E6 from 1 nF to 100 nF: 6 per decade × 2 + 1");
        assertEquals(4.7e-9, v.get(4), 0, "4.7 nF exactly as a decimal");
        assertEquals(1e-7, v.get(12), 0);
        assertEquals(4.7e-9, ESeries.E12.nearest(4.9e-9), 1e-21);
        assertEquals(ESeries.E96, ESeries.parse("e96"));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ESeries.parse("E20"));
        assertEquals(true, e.getMessage().contains("E20") && e.getMessage().contains("E192"), e.getMessage());
    }

    private static double[] scaled(int[] v) {
        double[] out = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            out[i] = v[i] / 100.0;
        }
        return out;
    }
}
