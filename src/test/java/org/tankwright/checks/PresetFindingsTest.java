package org.tankwright.checks;

import org.junit.jupiter.api.Test;
import org.tankwright.analysis.Analysis;
import org.tankwright.analysis.Presets;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Every bundled preset gets the findings its scenario deserves (issue: presets' findings). */
class PresetFindingsTest {
    private static List<Finding> findings(String preset) throws Exception {
        return Checks.run(Analysis.run(Presets.load(preset)));
    }

    @Test
    void mainsPoweredDesignsAreDangers() throws Exception {
        // IEC 61140: a non-isolated mains-derived bus puts the circuit at mains potential.
        for (String p : List.of("small-forge", "warehouse-robot-pad")) {
            List<Finding> fs = findings(p);
            assertTrue(fs.stream().anyMatch(f -> f.id().equals("TW-V02") && f.severity() == Severity.DANGER),
                    p + ": " + fs.stream().map(Finding::id).toList());
            // IEC 61140: the bus (325 V, 400 V) is above 120 V ripple-free d.c., read from the design when the
            // network has not reported it.
            assertTrue(fs.stream().anyMatch(f -> f.id().equals("TW-V01") && f.element().equals("$.source.vdc_V")), p);
        }
    }

    @Test
    void lowPowerPadHasNothingAboveNotice() throws Exception {
        List<Finding> fs = findings("desk-lamp-pad");
        assertTrue(fs.stream().allMatch(f -> f.severity() == Severity.NOTICE),
                fs.stream().map(f -> f.id() + " " + f.severity() + " " + f.element()).toList().toString());
    }

    @Test
    void everyPresetChecksWithoutFailure() throws Exception {
        for (String p : Presets.names()) {
            assertTrue(findings(p).stream().noneMatch(f -> f.message().contains("could not run")), p);
        }
    }

    @Test
    void measuredTankOffResonanceIsToldWhereResonanceIs() throws Exception {
        // 12 µH with 680 nF resonates at 1/(2π√(LC)) = 55.7 kHz (standard circuit theory); driven at 57 kHz
        // with Q ≈ 140 the input phase is about 81°, so the bridge current is mostly reactive.
        Finding f = findings("check-my-capacitor").stream().filter(x -> x.id().equals("TW-N07")).findFirst().orElseThrow();
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("zero at ([0-9.]+) kHz").matcher(f.message());
        assertTrue(m.find(), f.message());
        double f0 = 1 / (2 * Math.PI * Math.sqrt(12e-6 * 680e-9));
        // the bank's ESL adds to the coil's 12 µH and lowers the zero-phase frequency a little
        assertEquals(f0, Double.parseDouble(m.group(1)) * 1e3, 0.005 * f0, f.message());
        for (String p : List.of("desk-lamp-pad", "small-forge", "bolt-heater")) {
            assertTrue(findings(p).stream().noneMatch(x -> x.id().equals("TW-N07")), p); // near zero phase, or stated
        }
    }
}
