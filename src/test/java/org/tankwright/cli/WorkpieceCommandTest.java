package org.tankwright.cli;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tankwright.heating.AxialFieldBar;
import org.tankwright.heating.ReferenceDepth;
import org.tankwright.magnetics.MutualKernels;

import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** {@code tankwright workpiece}: the keys issue 8 names, the option combinations, user errors. */
class WorkpieceCommandTest {

    private static JsonObject json(String... args) {
        int[] st = new int[1];
        String[] out = ValidateCommandTest.run(st, args);
        assertEquals(ExitCodes.OK, st[0], out[1]);
        return JsonParser.parseString(out[0]).getAsJsonObject();
    }

    @Test
    void fixedValuesInAGivenFieldGiveTheExactBarPower() {
        JsonObject o = json("workpiece", "--diameter", "20mm", "--length", "50mm", "--resistivity", "1.1e-6",
                "--mu-r", "1", "--frequency", "10k", "--field", "30000", "--json");
        double delta = ReferenceDepth.of(1.1e-6, 1e4, 1);
        double p = AxialFieldBar.solve(0.01, 0, 1.1e-6, 1, 1e4, 3e4).powerPerLength();
        assertEquals(delta, o.get("reference_depth_m").getAsDouble(), 1e-15);
        assertEquals(p, o.get("power_per_length_W_per_m").getAsDouble(), 1e-9 * p);
        assertEquals(p * 0.05, o.get("power_W").getAsDouble(), 1e-9 * p);
        double thin = 2 * Math.PI * 0.01 * 3e4 * 3e4 * 1.1e-6 / delta;
        assertEquals(p / thin, o.get("thin_skin_ratio").getAsDouble(), 1e-12);
        assertEquals(1.0, o.get("mu_r").getAsDouble());
        assertEquals(3e4, o.get("surface_field_A_per_m").getAsDouble());
    }

    @Test
    void materialIteratesMuAndLongCoilUsesNIOverL() {
        JsonObject o = json("workpiece", "--diameter", "20mm", "--material", "carbon-steel", "--frequency", "10k",
                "--coil-turns", "10", "--coil-length", "100mm", "--current", "300", "--json");
        assertEquals(3e4, o.get("surface_field_A_per_m").getAsDouble(), 1e-9);
        double mu = o.get("mu_r").getAsDouble();
        assertTrue(mu > 10 && mu < 100, "µr tens at 3·10⁴ A/m: " + mu);
        assertTrue(o.get("magnetic").getAsBoolean());
        assertFalse(o.has("power_W"), "no length, no power_W");
        JsonObject hot = json("workpiece", "--diameter", "20mm", "--material", "carbon-steel", "--temperature", "900",
                "--frequency", "10k", "--field", "3e4", "--json");
        assertEquals(1.0, hot.get("mu_r").getAsDouble());
        assertFalse(hot.get("magnetic").getAsBoolean());
    }

    @Test
    void finiteCoilReportsTheLoadedInductance() {
        JsonObject o = json("workpiece", "--diameter", "20mm", "--length", "60mm", "--material", "carbon-steel",
                "--temperature", "900", "--frequency", "60k", "--coil-turns", "6", "--coil-length", "48mm",
                "--current", "250", "--coil-diameter", "34mm", "--coil-resistance", "8m", "--json");
        assertTrue(o.get("inductance_change_H").getAsDouble() < 0, "hot steel pushes flux out");
        double rw = o.get("work_resistance_ohm").getAsDouble();
        assertEquals(rw / (rw + 0.008), o.get("coil_efficiency").getAsDouble(), 1e-12);
        assertEquals(rw * 250 * 250, o.get("power_W").getAsDouble(), 1e-9 * rw * 250 * 250);
    }

    @Test
    void plateModeNearlyMirrorsTheCoilInAThickGoodConductor() {
        // one turn (ring radius 49 mm, 1 mm above its face, 4 mm gap) over 10 mm of copper at 10 MHz (δ = 21 µm):
        // ΔL → −M(ring, mirror image 10 mm below) by Maxwell's coaxial-ring formula (image method)
        JsonObject o = json("workpiece", "--plate-thickness", "10mm", "--diameter", "300mm", "--gap", "4mm",
                "--resistivity", "1.7e-8", "--mu-r", "1", "--frequency", "10M", "--coil-turns", "1",
                "--coil-diameter", "100mm", "--coil-inner-diameter", "96mm", "--current", "10", "--json");
        double image = MutualKernels.coaxialRings(0.049, 0.049, 0.010);
        assertEquals(-image, o.get("inductance_change_H").getAsDouble(), 0.02 * image);
        double rw = o.get("work_resistance_ohm").getAsDouble();
        assertTrue(rw > 0);
        assertEquals(rw * 100, o.get("power_W").getAsDouble(), 1e-9 * rw * 100);
        assertTrue(o.get("valid").getAsBoolean());
        assertEquals("above-band", o.getAsJsonObject("frequency_advice").get("verdict").getAsString());
    }

    @Test
    void plateModeRefusesBarOptionsAndNamesWhatIsMissing() {
        int[] st = new int[1];
        String[] out = ValidateCommandTest.run(st, "workpiece", "--plate-thickness", "6mm", "--diameter", "300mm",
                "--material", "carbon-steel", "--frequency", "30k", "--coil-turns", "20", "--coil-diameter", "200mm",
                "--coil-inner-diameter", "50mm", "--current", "40");
        assertEquals(ExitCodes.USAGE, st[0]);
        assertTrue(out[1].contains("--gap"), out[1]);
        out = ValidateCommandTest.run(st, "workpiece", "--plate-thickness", "6mm", "--diameter", "300mm", "--length", "50mm",
                "--gap", "12mm", "--material", "carbon-steel", "--frequency", "30k", "--coil-turns", "20",
                "--coil-diameter", "200mm", "--coil-inner-diameter", "50mm", "--current", "40");
        assertEquals(ExitCodes.USAGE, st[0]);
        assertTrue(out[1].contains("--length"), out[1]);
        out = ValidateCommandTest.run(st, "workpiece", "--plate-thickness", "6mm", "--diameter", "300mm", "--gap", "12mm",
                "--material", "carbon-steel", "--frequency", "30k", "--coil-turns", "20", "--coil-diameter", "200mm",
                "--coil-inner-diameter", "250mm", "--current", "40");
        assertEquals(ExitCodes.INVALID_INPUT, st[0]);
        assertTrue(out[1].contains("--coil-inner-diameter 250mm"), out[1]);
        assertFalse(out[1].contains("Exception"), out[1]);
        out = ValidateCommandTest.run(st, "workpiece", "--plate-thickness", "6mm", "--diameter", "300mm", "--gap", "12mm",
                "--material", "carbon-steel", "--frequency", "30k", "--coil-turns", "20", "--coil-diameter", "200mm",
                "--coil-inner-diameter", "50mm", "--current", "40");
        assertEquals(ExitCodes.OK, st[0], out[1]);
        assertTrue(out[0].contains("Power in plate") && out[0].contains("licensed practice"), out[0]);
    }

    @Test
    void humanOutputCarriesTheHotMetalCaution() {
        int[] st = new int[1];
        String[] out = ValidateCommandTest.run(st, "workpiece", "--diameter", "20mm", "--material", "copper",
                "--frequency", "10k", "--field", "1e4");
        assertEquals(ExitCodes.OK, st[0]);
        assertTrue(out[0].contains("Reference depth") && out[0].contains("Caution")
                && out[0].contains("local electrical codes and licensed practice"), out[0]);
    }

    @Test
    void userMaterialsFile(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("mine.json");
        Files.writeString(f, """
                { "format": "tankwright-workpiece-materials", "version": 1, "materials": [
                  { "name": "zinc", "density_kg_per_m3": 7140, "upper_limit_C": 419,
                    "resistivity_ohm_m": { "source": "from memory", "points": [[20, 5.9e-8]] },
                    "specific_heat_J_per_kgK": { "source": "from memory", "points": [[20, 388]] } } ] }
                """);
        JsonObject o = json("workpiece", "--diameter", "20mm", "--material", "zinc", "--materials-file", f.toString(),
                "--frequency", "10k", "--field", "1e4", "--json");
        assertEquals(5.9e-8, o.get("resistivity_ohm_m").getAsDouble(), 1e-20);
    }

    @Test
    void userErrorsNameTheOptionAndNeverShowAStackTrace() {
        int[] st = new int[1];
        String[] out = ValidateCommandTest.run(st, "workpiece", "--diameter", "20mm", "--material", "steel",
                "--frequency", "10k", "--field", "1e4");
        assertEquals(ExitCodes.INVALID_INPUT, st[0]);
        assertTrue(out[1].contains("material 'steel'") && out[1].contains("carbon-steel"), out[1]);
        out = ValidateCommandTest.run(st, "workpiece", "--diameter", "20mm", "--material", "copper", "--frequency", "10k");
        assertEquals(ExitCodes.USAGE, st[0]);
        assertTrue(out[1].contains("--field"), out[1]);
        out = ValidateCommandTest.run(st, "workpiece", "--diameter", "20 kHz", "--material", "copper", "--frequency",
                "10k", "--field", "1e4");
        assertEquals(ExitCodes.USAGE, st[0]);
        assertTrue(out[1].contains("--diameter"), out[1]);
        out = ValidateCommandTest.run(st, "workpiece", "--diameter", "20mm", "--resistivity", "1e-6", "--frequency",
                "10k", "--field", "1e4");
        assertEquals(ExitCodes.USAGE, st[0]);
        out = ValidateCommandTest.run(st, "workpiece", "--diameter", "20mm", "--resistivity", "1e-6", "--mu-r", "0.5",
                "--frequency", "10k", "--field", "1e4");
        assertEquals(ExitCodes.INVALID_INPUT, st[0]);
        assertTrue(out[1].contains("relative permeability 0.5"), out[1]);
        assertFalse(out[1].contains("Exception"), out[1]);
    }

    @Test
    void boreMakesATube() {
        // low frequency: P' ∝ a⁴ − c⁴ for µr = 1 (derived closed form, docs/models.md)
        JsonObject solid = json("workpiece", "--diameter", "20mm", "--resistivity", "1e-6", "--mu-r", "1",
                "--frequency", "50", "--field", "1e4", "--json");
        JsonObject tube = json("workpiece", "--diameter", "20mm", "--bore", "10mm", "--resistivity", "1e-6", "--mu-r",
                "1", "--frequency", "50", "--field", "1e4", "--json");
        double ratio = tube.get("power_per_length_W_per_m").getAsDouble()
                / solid.get("power_per_length_W_per_m").getAsDouble();
        assertEquals(1 - Math.pow(0.5, 4), ratio, 1e-4);
        // a wall many δ thick carries the same current as the solid bar
        JsonObject thickSolid = json("workpiece", "--diameter", "20mm", "--resistivity", "1e-6", "--mu-r", "1",
                "--frequency", "10meg", "--field", "1e4", "--json");
        JsonObject thickTube = json("workpiece", "--diameter", "20mm", "--bore", "10mm", "--resistivity", "1e-6",
                "--mu-r", "1", "--frequency", "10meg", "--field", "1e4", "--json");
        assertEquals(thickSolid.get("power_per_length_W_per_m").getAsDouble(),
                thickTube.get("power_per_length_W_per_m").getAsDouble(), 1e-9 * thickSolid.get(
                        "power_per_length_W_per_m").getAsDouble());
    }
}
