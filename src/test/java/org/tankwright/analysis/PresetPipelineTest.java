package org.tankwright.analysis;

import com.google.gson.JsonObject;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.tankwright.design.Design;
import org.tankwright.report.ResultJson;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Every preset through the whole pipeline, held to identities of the physics and to the command-line contract. */
class PresetPipelineTest {
    private static final Map<String, AnalysisResult> RESULTS = new LinkedHashMap<>();

    @BeforeAll
    static void solveAll() throws Exception {
        for (String name : Presets.names()) {
            RESULTS.put(name, Analysis.run(Presets.load(name)));
        }
    }

    @Test
    void everyPresetSolvesWithFiniteFigures() {
        assertEquals(Presets.names().size(), RESULTS.size());
        for (Map.Entry<String, AnalysisResult> e : RESULTS.entrySet()) {
            AnalysisResult r = e.getValue();
            NetworkReport n = r.network();
            for (double v : new double[] {n.c1(), n.inputPhaseDeg(), n.powerIn(), n.sourceCurrent(), n.loadedQ()}) {
                assertTrue(Double.isFinite(v), e.getKey() + ": a network figure is not finite");
            }
            assertFalse(r.stresses().isEmpty(), e.getKey());
            assertFalse(r.coils().isEmpty(), e.getKey());
            for (CoilReport c : r.coils()) {
                assertTrue(c.inductance() > 0 && c.resistanceAc() > 0 && c.q() > 0, e.getKey() + " " + c.role());
            }
            assertNotNull(r.findings(), e.getKey());
            if (r.design().isLink()) {
                assertTrue(Math.abs(r.coupling().k()) < 1, e.getKey() + ": |k| < 1");
                assertTrue(n.efficiency() > 0 && n.efficiency() < 1, e.getKey() + ": 0 < efficiency < 1");
            }
        }
    }

    /** Energy balance (conservation of energy, common practice): the source's power is every element's loss plus the load's. */
    @Test
    void sourcePowerEqualsTheSumOfElementPowers() {
        for (Map.Entry<String, AnalysisResult> e : RESULTS.entrySet()) {
            AnalysisResult r = e.getValue();
            double sum = 0;
            for (ElementStress s : r.stresses()) {
                if (Double.isFinite(s.loss())) {
                    sum += s.loss();
                }
            }
            assertEquals(r.network().powerIn(), sum, 1e-6 * r.network().powerIn(), e.getKey());
        }
    }

    /** Wang, Covic & Stielau (2004): the secondary is tuned to C2 = 1/(ω²L2) with the coil's in-place inductance. */
    @Test
    void secondaryIsTunedByTheTextbookFormula() {
        for (AnalysisResult r : RESULTS.values()) {
            if (r.design().isLink()) {
                double w = 2 * Math.PI * r.design().frequency();
                assertEquals(1 / (w * w * r.coupling().l2()), r.network().c2Textbook(), 1e-9 * r.network().c2Textbook());
            }
        }
    }

    /** Ohm's law for a capacitor (common practice): the bank's rms voltage is its rms current over ωC. */
    @Test
    void capacitorVoltageIsCurrentOverOmegaC() {
        AnalysisResult r = RESULTS.get("check-my-capacitor");
        ElementStress c1 = r.stresses().stream().filter(s -> s.id().equals("C1")).findFirst().orElseThrow();
        double w = 2 * Math.PI * r.design().frequency();
        // The bank is a series R-L-C (MODELS.md §4): |V| = I·√(ESR² + (1/(ωC) − ωESL)²).
        double esr = r.banks().isEmpty() ? 0 : r.banks().get(0).esr();
        double esl = r.banks().isEmpty() ? 0 : r.banks().get(0).esl();
        double xc = 1 / (w * r.network().c1()) - w * esl;
        assertEquals(c1.currentRms() * Math.hypot(esr, xc), c1.voltageRms(), 1e-6 * c1.voltageRms());
    }

    /**
     * Steel loses its permeability above the Curie point (iron 770 °C, CRC Handbook), so the loaded work
     * coil's inductance falls from cold to hot; in the current-fed parallel tank, held at zero phase, the
     * frequency then rises.
     */
    @Test
    void heaterHotPointFollowsTheLossOfPermeability() {
        for (String name : List.of("bolt-heater", "small-forge")) {
            HeaterReport h = RESULTS.get(name).heater();
            assertTrue(h.cold().muR() > 5, name + ": cold steel is magnetic, µr " + h.cold().muR());
            assertEquals(1.0, h.hot().muR(), 1e-12, name + ": hot steel above the Curie point");
            assertTrue(h.hot().inductance() < h.cold().inductance(), name + ": the loaded inductance falls");
            assertTrue(h.hot().resistivity() > 4 * h.cold().resistivity(), name + ": hot steel's resistivity rises several times");
            assertTrue(h.frequencyMin() <= Math.min(h.cold().resonantFrequency(), h.hot().resonantFrequency()));
            assertTrue(h.frequencyMax() >= Math.max(h.cold().resonantFrequency(), h.hot().resonantFrequency()));
        }
        HeaterReport bolt = RESULTS.get("bolt-heater").heater();
        assertTrue(bolt.hot().resonantFrequency() > bolt.cold().resonantFrequency(), "zero-phase parallel tank: f rises as L falls");
        // Zero phase of a parallel tank whose coil branch has series resistance R (common practice):
        // ω² = 1/(LC) − (R/L)², with the hot point's loaded L and R and the cold point's capacitor.
        AnalysisResult r = RESULTS.get("bolt-heater");
        double c = r.network().c1();
        double l = bolt.hot().inductance();
        double rt = bolt.hot().workResistance() + r.coils().get(0).resistanceAc();
        double expected = Math.sqrt(1 / (l * c) - (rt / l) * (rt / l)) / (2 * Math.PI);
        assertEquals(expected, bolt.hot().resonantFrequency(), 0.01 * expected, "zero-phase frequency of the hot tank");
    }

    /**
     * The griddle's carbon-steel plate stays below its Curie point (iron 770 °C, CRC Handbook) at 250 °C, so it is
     * magnetic at both points; its resistivity rises with temperature (the materials table). With the plate many
     * reference depths thick the work resistance grows with the surface resistance ρ/δ = √(πfµ0µrρ) (thin-skin limit,
     * Jackson §8.1), and the longer reference depth lets the eddy currents screen less flux, so the loaded inductance
     * rises; both stay below the empty coil's, since a thick conducting plate mostly mirrors the coil with reversed
     * current (image method).
     */
    @Test
    void plateHeaterFollowsTheWarmingPlate() {
        AnalysisResult r = RESULTS.get("griddle-plate-heater");
        HeaterReport h = r.heater();
        double l0 = r.coils().get(0).inductance();
        assertTrue(h.cold().muR() > 5 && h.hot().muR() > 5, "steel below Curie is magnetic: " + h.cold().muR() + ", " + h.hot().muR());
        assertTrue(h.hot().resistivity() > 1.5 * h.cold().resistivity());
        assertTrue(h.hot().referenceDepth() > h.cold().referenceDepth());
        assertTrue(h.hot().workResistance() > h.cold().workResistance(), "R_work rises with ρ/δ");
        assertTrue(h.cold().inductance() < h.hot().inductance() && h.hot().inductance() < l0,
                h.cold().inductance() + " < " + h.hot().inductance() + " < " + l0);
        assertTrue(h.frequencyMin() <= Math.min(h.cold().resonantFrequency(), h.hot().resonantFrequency()));
        assertTrue(h.frequencyMax() >= Math.max(h.cold().resonantFrequency(), h.hot().resonantFrequency()));
        // power into the plate is R_work·I² at each point (definition of the reflected resistance)
        assertEquals(h.cold().workResistance() * h.cold().coilCurrent() * h.cold().coilCurrent(), h.cold().power(),
                1e-9 * h.cold().power());
        // an invented 2 kW griddle: a few hundred W to about 2 kW into the plate
        assertTrue(h.cold().power() > 300 && h.cold().power() < 2500, "cold power " + h.cold().power());
        assertTrue(h.hot().power() > 300 && h.hot().power() < 2500, "hot power " + h.hot().power());
        // mass of the 300 mm × 6 mm disc at steel's density (7850 kg/m³, handbook value, from memory)
        assertEquals(Math.PI * 0.15 * 0.15 * 0.006 * 7850, h.workpieceMass(), 0.02 * h.workpieceMass());
        assertTrue(Double.isFinite(h.heatingTime()) && h.heatingTime() > 0);
    }

    /** The contract of issue 5: `solve --json` carries the operating point under the keys of `tune --json`. */
    @Test
    void solveJsonHasTheTuneKeys() {
        List<String> keys = List.of("c1_F", "c2_F", "c1_textbook_F", "c2_textbook_F", "input_impedance_ohm",
                "input_phase_deg", "p_in_W", "p_out_W", "efficiency", "i_source_A", "i_dc_A", "i_l1_A", "i_l2_A",
                "v_l1_V", "v_l2_V", "v_c1_V", "v_c2_V", "i_c1_A", "i_c2_A", "v_c1_peak_V", "v_c2_peak_V", "load_ac_ohm",
                "zero_phase_frequencies_Hz", "efficiency_max", "load_optimal_ohm");
        JsonObject o = ResultJson.tree(RESULTS.get(Presets.DEMO));
        for (String k : keys) {
            assertTrue(o.has(k), "solve --json lacks " + k);
        }
        assertTrue(o.getAsJsonObject("input_impedance_ohm").has("re"));
        assertTrue(o.has("findings") && o.has("coils") && o.has("stresses"));
    }

    @Test
    void operatingPointScopeAgreesWithTheFullRunWithoutAnEnvelope() throws Exception {
        Design d = Presets.load("check-my-capacitor");
        AnalysisResult quick = Analysis.run(d, Analysis.Scope.OPERATING_POINT);
        AnalysisResult full = RESULTS.get("check-my-capacitor");
        assertEquals(full.network().c1(), quick.network().c1(), 0.0);
        assertEquals(full.network().powerIn(), quick.network().powerIn(), 1e-9 * full.network().powerIn());
        assertTrue(quick.network().sweeps().isEmpty() && !full.network().sweeps().isEmpty());
    }
}
