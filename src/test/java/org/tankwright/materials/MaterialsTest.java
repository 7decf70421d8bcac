package org.tankwright.materials;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class MaterialsTest {

    /** ASTM B258 table of standard nominal diameters (inches, 4 decimals) — standard AWG table values. */
    @Test
    void awgDiametersMatchAstmB258() {
        Object[][] table = {
                {-3, 0.4600}, {0, 0.3249}, {4, 0.2043}, {10, 0.1019}, {12, 0.0808}, {14, 0.0641},
                {18, 0.0403}, {20, 0.0320}, {22, 0.0253}, {24, 0.0201}, {30, 0.0100}, {36, 0.0050}, {40, 0.0031},
        };
        for (Object[] row : table) {
            int n = (Integer) row[0];
            double inches = (Double) row[1];
            assertEquals(inches, WireGauge.awgDiameter(n) / 0.0254, 0.00006, "AWG " + n + " vs ASTM B258");
        }
    }

    @Test
    void parsesAwgNames() {
        assertEquals(18, WireGauge.parseAwg("AWG18"));
        assertEquals(18, WireGauge.parseAwg("18awg"));
        assertEquals(-3, WireGauge.parseAwg("AWG4/0"));
        assertEquals(-3, WireGauge.parseAwg("awg0000"));
        assertEquals(-1, WireGauge.parseAwg("AWG00"));
        assertThrows(IllegalArgumentException.class, () -> WireGauge.parseAwg("AWGx"));
        assertThrows(IllegalArgumentException.class, () -> WireGauge.parseAwg("AWG99"));
    }

    /** IEC 60028: ρ20 = 1/58 Ω·mm²/m, α = 0.00393/K → +31.4 % at 100 °C (the "~30 %"). */
    @Test
    void copperResistivityPerIec60028() {
        ConductorMaterial cu = ConductorMaterial.COPPER;
        assertEquals(1.7241e-8, cu.resistivity(20), 1e-12, "IEC 60028 ρ20 = 1/58 Ω·mm²/m");
        assertEquals(1 + 0.00393 * 80, cu.resistivity(100) / cu.resistivity(20), 1e-12, "IEC 60028 α");
        assertEquals(2.8264e-8, ConductorMaterial.ALUMINIUM.resistivity(20), 1e-13, "IEC 60889 ρ20");
        assertThrows(IllegalArgumentException.class, () -> cu.resistivity(Double.NaN));
        assertEquals(ConductorMaterial.ALUMINIUM, ConductorMaterial.parse("Aluminum"));
    }

    /** 1 mm copper wire: R = ρ/A = 21.95 mΩ/m at 20 °C (IEC 60028 resistivity; arithmetic). */
    @Test
    void roundWireResistanceAndMass() {
        Conductor w = Conductor.RoundWire.bare(1e-3, ConductorMaterial.COPPER);
        assertEquals(1.0 / 58e6 / (Math.PI * 0.25e-6), w.resistancePerMetre(20), 1e-12);
        assertEquals(8890 * Math.PI * 0.25e-6, w.massPerMetre(), 1e-9);
        assertEquals(0.5e-3, w.equivalentRadius(), 1e-15, "round wire: equivalent radius is its own radius");
        assertTrue(w.problems().isEmpty());
    }

    /** Annulus GMD (Grover 1946): solid limit r·e^(−1/4), thin-wall limit → outer radius. */
    @Test
    void tubeGmdLimits() {
        Conductor.Tube solid = new Conductor.Tube(10e-3, 5e-3, ConductorMaterial.COPPER);
        assertEquals(5e-3 * Math.exp(-0.25), solid.selfGmd(), 1e-12);
        Conductor.Tube thin = new Conductor.Tube(10e-3, 1e-6, ConductorMaterial.COPPER);
        assertEquals(5e-3, thin.selfGmd(), 1e-6);
        Conductor.Tube mid = new Conductor.Tube(10e-3, 1e-3, ConductorMaterial.COPPER);
        assertTrue(mid.selfGmd() > solid.selfGmd() && mid.selfGmd() < 5e-3);
    }

    @Test
    void traceThicknessFromCopperWeight() {
        Conductor.Trace t = Conductor.Trace.ofCopperWeight(1e-3, 2, ConductorMaterial.COPPER);
        assertEquals(70e-6, t.thickness(), 1e-12, "2 oz = 70 µm (common practice)");
        assertEquals(0.2235 * (1e-3 + 70e-6), t.selfGmd(), 1e-12, "rectangle GMD, Rosa & Grover 1912");
    }

    @Test
    void conductorProblemsNameFieldValueAndLimit() {
        List<String> p = new Conductor.RoundWire(-1e-3, 1e-3, ConductorMaterial.COPPER).problems();
        assertEquals(1, p.size());
        assertTrue(p.get(0).contains("wire diameter = -1.000 mm") && p.get(0).contains("greater than 0"), p.get(0));
        p = new Conductor.RoundWire(1e-3, 0.9e-3, ConductorMaterial.COPPER).problems();
        assertTrue(p.get(0).contains("outer diameter") && p.get(0).contains("at least"), p.get(0));
        p = new Conductor.Litz(400, 0.071e-3, 1.0e-3, ConductorMaterial.COPPER).problems();
        assertTrue(p.get(0).contains("too small"), p.get(0));
        assertTrue(new Conductor.Litz(400, 0.071e-3, 1.9e-3, ConductorMaterial.COPPER).problems().isEmpty());
        p = new Conductor.Tube(6e-3, Double.NaN, ConductorMaterial.COPPER).problems();
        assertTrue(p.get(0).contains("tube wall = NaN"), p.get(0));
        assertFalse(new Conductor.Tube(6e-3, 4e-3, ConductorMaterial.COPPER).problems().isEmpty());
    }
}
