package org.tankwright.heating;

import org.junit.jupiter.api.Test;
import org.tankwright.materials.WorkpieceMaterial;
import org.tankwright.materials.WorkpieceMaterials;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

/** Reference depth δ = √(2ρ/(ωµ0µr)) against handbook values. */
class WorkpieceReferenceDepthTest {
    private static final WorkpieceMaterials TABLE = WorkpieceMaterials.builtIn();

    private static double depth(String material, double temperatureC, double f, double muR) {
        WorkpieceMaterial m = TABLE.require(material);
        return ReferenceDepth.of(m.resistivityAt(temperatureC), f, muR);
    }

    @Test
    void copperFollowsTermansSixPointSixTwoOverRootF() {
        // Terman, Radio Engineers' Handbook (1943): depth of penetration in copper 6.62/√f cm (from memory)
        for (double f : new double[] {60, 10e3, 1e6}) {
            double expected = 0.0662 / Math.sqrt(f);
            assertEquals(expected, depth("copper", 20, f, 1), 0.005 * expected, "copper at " + f + " Hz");
        }
        // spot values quoted everywhere: 8.5 mm at 60 Hz, 66 µm at 1 MHz (from memory)
        assertEquals(8.5e-3, depth("copper", 20, 60, 1), 0.1e-3);
        assertEquals(66e-6, depth("copper", 20, 1e6, 1), 1e-6);
    }

    @Test
    void aluminiumNearEightPointTwoOverRootF() {
        // handbook skin-depth tables: aluminium ≈ 8.2/√f cm at room temperature (from memory)
        for (double f : new double[] {50, 10e3, 100e3}) {
            double expected = 0.082 / Math.sqrt(f);
            assertEquals(expected, depth("aluminium", 20, f, 1), 0.02 * expected, "aluminium at " + f + " Hz");
        }
    }

    @Test
    void steelByTheInductionHeatingHandbookForm() {
        // δ = 503·√(ρ/(µr·f)) m, the form used in induction-heating handbooks (e.g. Rudnev et al.,
        // Handbook of Induction Heating; from memory)
        for (double[] c : new double[][] {{1.16e-6, 1, 10e3}, {0.17e-6, 40, 3e3}, {0.6e-6, 15, 200e3}}) {
            double expected = 503.3 * Math.sqrt(c[0] / (c[1] * c[2]));
            assertEquals(expected, ReferenceDepth.of(c[0], c[2], c[1]), 1e-4 * expected);
        }
        // carbon steel above its Curie point at 10 kHz: about 5.4 mm (from memory of handbook tables)
        assertEquals(5.4e-3, depth("carbon-steel", 1000, 10e3, 1), 0.3e-3);
        // cold steel with µr = 40 at 10 kHz: a few tenths of a millimetre (common practice)
        double cold = depth("carbon-steel", 20, 10e3, 40);
        assertEquals(0.33e-3, cold, 0.03e-3);
    }

    @Test
    void frequencyForIsTheInverse() {
        double f = ReferenceDepth.frequencyFor(1.1e-6, 1, 5e-3);
        assertEquals(5e-3, ReferenceDepth.of(1.1e-6, f, 1), 1e-15);
    }

    @Test
    void refusesBadInputNamingTheField() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ReferenceDepth.of(1e-8, -5, 1));
        assertEquals(true, e.getMessage().startsWith("frequency -5.0 Hz"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> ReferenceDepth.of(1e-8, 50, 0.5));
    }
}
