package org.tankwright.analysis;

import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The coil reports carry every AC-resistance model side by side, the chosen one first and used downstream. */
class ResistanceModelsReportTest {
    @Test
    void theWorkCoilShowsItsResistanceModelsWithTheChosenOneFirst() throws Exception {
        CoilReport c = Analysis.run(Presets.load("bolt-heater"), Analysis.Scope.OPERATING_POINT).coils().get(0);
        List<ResistanceValue> models = c.resistanceModels();
        assertTrue(models.size() >= 3, models.toString());
        // the chosen model is the one whose value the network uses (derivation check: same number)
        assertEquals(c.resistanceAc(), models.get(0).resistanceAc(), 0.0);
        assertTrue(models.stream().anyMatch(m -> m.name().equals("medhurst-table") && m.valid()),
                "copper tube, ℓ/D 1.2, d/p 0.75, 60 kHz: inside Medhurst's measured grid (Medhurst 1947)");
        assertTrue(models.stream().allMatch(m -> !m.source().isBlank()), "every model names its source");
    }

    @Test
    void aMeasuredCoilHasNoResistanceModels() throws Exception {
        CoilReport c = Analysis.run(Presets.load("check-my-capacitor"), Analysis.Scope.OPERATING_POINT).coils().get(0);
        assertEquals(List.of(), c.resistanceModels());
        assertEquals(30e-3, c.resistanceAc(), 1e-15);
    }
}
