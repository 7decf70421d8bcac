package org.tankwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.tankwright.analysis.Analysis;
import org.tankwright.analysis.Presets;
import org.tankwright.design.Design;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;

/** Every bundled preset opens in the workbench and shows its solved result (the sheets are PresetSheetsTest's). */
class PresetsOpenInTheWindowTest {

    @Test
    void everyPresetOpensAndShowsItsTunedC1() throws Exception {
        WindowHarness.assumeDisplay();
        int opened = 0;
        for (String name : Presets.names()) {
            Design d = Presets.load(name);
            // the operating point is enough to fill the key figures; the full solve of each preset is PresetSheetsTest's
            WorkbenchWindow w = WindowHarness.open(d, x -> Analysis.run(x, Analysis.Scope.OPERATING_POINT));
            assertNull(WindowHarness.onEdt(() -> w.workspace().selected().failure()), name + " computes without failure");
            double c1 = WindowHarness.onEdt(() -> w.workspace().selected().result().network().c1());
            String expected = Quantities.format(c1, Dimension.CAPACITANCE, 3);
            WindowHarness.await(name + ": the key figures show the result's C1 " + expected,
                    () -> expected.equals(w.figures().valueOf("C1 (primary)")));
            assertEquals(d.name(), WindowHarness.onEdt(() -> w.workspace().selected().result().design().name()), name);
            opened++;
        }
        assertTrue(opened >= 6, "all bundled presets opened: " + opened);
    }
}
