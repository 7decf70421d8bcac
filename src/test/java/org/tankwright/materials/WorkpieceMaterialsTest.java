package org.tankwright.materials;

import org.junit.jupiter.api.Test;
import org.tankwright.units.Constants;

import java.io.StringReader;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The workpiece materials table: values against handbook facts, the magnetic model, user additions. */
class WorkpieceMaterialsTest {
    private static final WorkpieceMaterials TABLE = WorkpieceMaterials.builtIn();

    @Test
    void holdsTheRequiredMaterials() {
        for (String n : List.of("carbon-steel", "ferritic-stainless", "austenitic-stainless", "aluminium", "copper",
                "brass", "graphite", "iron")) {
            assertTrue(TABLE.find(n).isPresent(), n);
        }
        // ferritic stainless is magnetic, austenitic is not (common practice)
        assertTrue(TABLE.require("ferritic-stainless").magneticAt(20));
        assertFalse(TABLE.require("austenitic-stainless").magneticAt(20));
        for (String n : List.of("aluminium", "copper", "brass", "graphite")) {
            assertEquals(1.0, TABLE.require(n).relativePermeability(1e4, 20), n);
        }
    }

    @Test
    void curiePointOfIronIsTheHandbookValue() {
        // CRC Handbook of Chemistry and Physics: Curie temperature of iron 1043 K = 770 °C (handbook value)
        assertEquals(1043 - Constants.ZERO_CELSIUS_K, TABLE.require("iron").curiePointC(), 1.0);
        assertEquals(770, TABLE.require("carbon-steel").curiePointC(), 2.0, "A2 line of the iron–carbon diagram");
        assertTrue(TABLE.require("carbon-steel").magneticAt(760));
        assertFalse(TABLE.require("carbon-steel").magneticAt(780));
        assertEquals(1.0, TABLE.require("carbon-steel").relativePermeability(3e4, 800));
    }

    @Test
    void everyValueNamesItsSource() {
        for (WorkpieceMaterial m : TABLE.all()) {
            assertFalse(m.resistivity().source().isBlank(), m.name());
            assertFalse(m.specificHeat().source().isBlank(), m.name());
            assertFalse(m.densitySource().isBlank(), m.name());
            if (m.magnetization() != null) {
                assertFalse(m.magnetization().bh().source().isBlank(), m.name());
                assertFalse(m.magnetization().curieSource().isBlank(), m.name());
            }
        }
    }

    @Test
    void steelResistivityRisesAboutSixfoldTo800AndIsInterpolated() {
        WorkpieceMaterial steel = TABLE.require("carbon-steel");
        double ratio = steel.resistivityAt(800) / steel.resistivityAt(20);
        // steel handbooks: medium-carbon steel resistivity rises ≈ 6× from room temperature to 800 °C (from memory)
        assertEquals(6.0, ratio, 0.7);
        // table, not a linear α: the midpoint of two tabulated points is their mean
        assertEquals(0.5 * (steel.resistivityAt(500) + steel.resistivityAt(600)), steel.resistivityAt(550), 1e-18);
        // copper at 20 °C: annealed-copper standard 1/58 Ω·mm²/m (IEC 60028)
        assertEquals(1.0 / 58 * 1e-6, TABLE.require("copper").resistivityAt(20), 1e-11);
    }

    @Test
    void steelPermeabilityIsTensAtHeatingFields() {
        WorkpieceMaterial steel = TABLE.require("carbon-steel");
        double previous = Double.MAX_VALUE;
        for (double hRms : new double[] {1e4, 2e4, 5e4, 1e5}) {
            double mu = steel.relativePermeability(Math.sqrt(2) * hRms, 20);
            // MODELS.md §5 / issue 8: at heating surface fields of 10⁴–10⁵ A/m µr is tens, not hundreds
            assertTrue(mu >= 10 && mu <= 110, "µr " + mu + " at " + hRms + " A/m rms");
            assertTrue(mu < previous, "µr falls as the field rises");
            previous = mu;
        }
        // far into saturation µr = 1 + J_s/(µ0·H) (definition of saturation polarization)
        WorkpieceMagnetization mag = steel.magnetization();
        double h = 2e6;
        double js = 2.42 - Constants.MU0 * 3.2e5;
        assertEquals(1 + js / (Constants.MU0 * h), mag.relativePermeability(h, 20), 1e-9);
    }

    @Test
    void magnetizationFallsTowardTheCuriePoint() {
        WorkpieceMagnetization mag = TABLE.require("iron").magnetization();
        assertEquals(1.0, mag.reducedMagnetization(20), 1e-12);
        double previous = 1.0;
        for (double t : new double[] {200, 400, 600, 700, 760}) {
            double m = mag.reducedMagnetization(t);
            assertTrue(m < previous && m > 0, "m(T) falls toward the Curie point at " + t);
            previous = m;
        }
        // Kuz'min (PRL 94, 107204, 2005) with s = 0.35 for iron, from memory: m ≈ 0.8 at T/Tc ≈ 0.75 (≈ 509 °C)
        assertEquals(0.8, mag.reducedMagnetization(0.75 * 1043.15 - 273.15), 0.05);
        assertEquals(0.0, mag.reducedMagnetization(770));
    }

    @Test
    void userMaterialsFromJsonAndProgrammatically() {
        String text = """
                { "format": "tankwright-workpiece-materials", "version": 1,
                  "materials": [
                    { "name": "spring-steel", "description": "invented example",
                      "density_kg_per_m3": 7850, "density_source": "assumed", "upper_limit_C": 1400,
                      "resistivity_ohm_m": { "source": "assumed", "points": [[20, 2.0e-7], [800, 1.15e-6]] },
                      "specific_heat_J_per_kgK": { "source": "assumed", "points": [[20, 460], [800, 700]] },
                      "magnetic": { "curie_C": 760, "curie_source": "assumed", "saturation_T": 1.9,
                                    "initial_mu_r": 400, "source": "assumed" } },
                    { "name": "bronze", "density_kg_per_m3": 8800, "upper_limit_C": 900,
                      "resistivity_ohm_m": { "points": [[20, 1.3e-7]] },
                      "specific_heat_J_per_kgK": { "points": [[20, 380]] } } ] }
                """;
        List<WorkpieceMaterial> read = WorkpieceMaterialsJson.read(new StringReader(text), "test");
        assertEquals(2, read.size());
        WorkpieceMaterials table = TABLE.withAll(read);
        WorkpieceMaterial spring = table.require("spring-steel");
        assertEquals(0.5 * (2.0e-7 + 1.15e-6), spring.resistivityAt(410), 1e-15);
        assertTrue(spring.magneticAt(700));
        // tanh curve: µr → initial µr at low field, → 1 + J_s/(µ0H) at high field
        assertEquals(400, spring.relativePermeability(5, 20), 2.0);
        assertEquals(1 + 1.9 / (Constants.MU0 * 1e7), spring.relativePermeability(1e7, 20), 1e-6);
        assertEquals(1.0, table.require("bronze").relativePermeability(1e4, 20));
        assertEquals(TABLE.names().size() + 2, table.names().size());
    }

    @Test
    void badUserMaterialIsNamedWithItsField() {
        String text = """
                { "format": "tankwright-workpiece-materials", "version": 1,
                  "materials": [ { "name": "oops", "density_kg_per_m3": 7850, "upper_limit_C": 1400,
                      "resistivity_ohm_m": { "points": [[20, -2.0e-7]] },
                      "specific_heat_J_per_kgK": { "points": [[20, 460]] } } ] }
                """;
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> WorkpieceMaterialsJson.read(new StringReader(text), "mine.json"));
        assertTrue(e.getMessage().contains("mine.json: materials[0] (oops)") && e.getMessage().contains("resistivity"),
                e.getMessage());
        IllegalArgumentException f = assertThrows(IllegalArgumentException.class,
                () -> WorkpieceMaterialsJson.read(new StringReader("{\"format\": \"other\"}"), "x.json"));
        assertTrue(f.getMessage().contains("format"), f.getMessage());
        assertThrows(IllegalArgumentException.class, () -> TABLE.require("unobtainium"));
    }
}
