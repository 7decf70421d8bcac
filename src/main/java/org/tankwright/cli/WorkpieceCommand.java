package org.tankwright.cli;

import org.tankwright.heating.BarGeometry;
import org.tankwright.heating.BarResponse;
import org.tankwright.heating.FlatWorkCoil;
import org.tankwright.heating.FrequencyAdvice;
import org.tankwright.heating.LoadedPlateCoil;
import org.tankwright.heating.PlateGeometry;
import org.tankwright.heating.PlateLoad;
import org.tankwright.heating.LoadedWorkCoil;
import org.tankwright.heating.WorkCoil;
import org.tankwright.heating.WorkpieceLoad;
import org.tankwright.heating.WorkpieceMedium;
import org.tankwright.magnetics.InductanceFormulas;
import org.tankwright.materials.WorkpieceMaterial;
import org.tankwright.materials.WorkpieceMaterials;
import org.tankwright.materials.WorkpieceMaterialsJson;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;

/**
 * {@code tankwright workpiece}: a quick bench calculation of the power a round bar takes from an
 * axial field, by the exact Bessel solution.
 */
@Command(name = "workpiece", mixinStandardHelpOptions = true, versionProvider = VersionInfo.class,
        sortOptions = false,
        description = {"Induction-heating power of a workpiece at one frequency: a round bar in an axial field (reference "
                + "depth, power per metre and in the bar, and its ratio to the thin-skin limit), or a plate below a flat "
                + "spiral (plate mode).",
                "Give the field at the bar's surface (--field), or a coil (--coil-turns, --coil-length, --current; "
                        + "add --coil-diameter for the finite-coil model with the loaded inductance).",
                "Plate mode (--plate-thickness): a round plate of --diameter below a flat spiral (--coil-turns, --coil-diameter,"
                        + " --coil-inner-diameter) at --gap, with --current."})
public final class WorkpieceCommand implements Callable<Integer> {
    private static final double SQRT2 = Math.sqrt(2.0);
    private static final String CAUTION = "Caution: an induction-heated workpiece stays hot enough to burn long after it stops"
            + " glowing; rings, watches and stray metal near the coil heat too; the tank carries high voltage and large "
            + "circulating current; keep people with implanted medical devices away from the coil. "
            + "Follow local electrical codes and licensed practice.";

    @Option(names = "--diameter", required = true, paramLabel = "D", description = "outer diameter of the bar, e.g. 20mm")
    String diameter;
    @Option(names = "--bore", paramLabel = "D", description = "bore of a hollow bar (tube); default solid")
    String bore;
    @Option(names = "--length", paramLabel = "L", description = "length of the bar; gives power_W")
    String length;
    @Option(names = "--material", paramLabel = "NAME", description = "material from the table: ${COMPLETION-CANDIDATES}",
            completionCandidates = MaterialNames.class)
    String material;
    @Option(names = "--materials-file", paramLabel = "FILE", description = "add or replace materials from a JSON file")
    Path materialsFile;
    @Option(names = "--temperature", paramLabel = "T", description = "workpiece temperature with --material (default 20 °C)")
    String temperature;
    @Option(names = "--resistivity", paramLabel = "R", description = "fixed resistivity instead of a material, e.g. 1.1e-6")
    String resistivity;
    @Option(names = "--mu-r", paramLabel = "U", description = "fixed relative permeability with --resistivity (no iteration)")
    String muR;
    @Option(names = "--frequency", required = true, paramLabel = "F", description = "frequency, e.g. 10k")
    String frequency;
    @Option(names = "--field", paramLabel = "H", description = "rms axial field strength at the bar's surface, A/m")
    String field;
    @Option(names = "--coil-turns", paramLabel = "N", description = "work-coil turns")
    String coilTurns;
    @Option(names = "--coil-length", paramLabel = "L", description = "work-coil winding length")
    String coilLength;
    @Option(names = "--current", paramLabel = "I", description = "rms coil current")
    String current;
    @Option(names = "--coil-diameter", paramLabel = "D", description = "work-coil inner diameter: finite-coil model (bar); the flat spiral's outer diameter (plate mode)")
    String coilDiameter;
    @Option(names = "--coil-resistance", paramLabel = "R", description = "work-coil resistance (for the efficiency)")
    String coilResistance;
    @Option(names = "--plate-thickness", paramLabel = "T",
            description = "plate mode: the workpiece is a plate of this thickness and --diameter below a flat spiral")
    String plateThickness;
    @Option(names = "--gap", paramLabel = "G", description = "plate mode: coil conductor face to plate surface")
    String gap;
    @Option(names = "--coil-inner-diameter", paramLabel = "D",
            description = "plate mode: inner diameter of the flat spiral at the conductor's edge (--coil-diameter is its outer)")
    String coilInnerDiameter;
    @Option(names = "--coil-conductor", paramLabel = "W",
            description = "plate mode: conductor width and height (default: the winding close-wound, width/turns)")
    String coilConductor;
    @Option(names = "--json", description = "print one JSON object with SI values")
    boolean json;

    /** The names for the help text. */
    static final class MaterialNames extends ArrayList<String> {
        MaterialNames() {
            super(WorkpieceMaterials.builtIn().names());
        }
    }

    @Override
    public Integer call() {
        if (plateThickness != null) {
            return plate();
        }
        if (gap != null || coilInnerDiameter != null || coilConductor != null) {
            throw usage("--gap, --coil-inner-diameter and --coil-conductor belong to plate mode: add --plate-thickness");
        }
        double d = CliSupport.quantity("--diameter", diameter, Dimension.LENGTH);
        double c = CliSupport.quantity("--bore", bore, Dimension.LENGTH, 0.0);
        double f = CliSupport.quantity("--frequency", frequency, Dimension.FREQUENCY);
        Double len = length == null ? null : CliSupport.quantity("--length", length, Dimension.LENGTH);
        Medium m = medium();
        Map<String, Object> out = new LinkedHashMap<>();
        List<String> notes = new ArrayList<>();
        BarResponse r;
        Double heated = len;
        LoadedWorkCoil loaded = null;
        boolean coilMode = coilTurns != null || coilLength != null || current != null;
        if (field != null && coilMode) {
            throw usage("give either --field or the coil (--coil-turns, --coil-length, --current), not both");
        }
        if (field != null) {
            double h = CliSupport.quantity("--field", field, Dimension.FIELD_STRENGTH);
            r = WorkpieceLoad.inField(0.5 * d, 0.5 * c, m.medium, f, h);
            out.put("field_model", "surface field given");
        } else if (coilMode) {
            if (coilTurns == null || coilLength == null || current == null) {
                throw usage("the coil needs all of --coil-turns, --coil-length and --current");
            }
            double n = CliSupport.quantity("--coil-turns", coilTurns, Dimension.DIMENSIONLESS);
            double lc = CliSupport.quantity("--coil-length", coilLength, Dimension.LENGTH);
            double i = CliSupport.quantity("--current", current, Dimension.CURRENT);
            if (coilDiameter == null) {
                if (!(n > 0 && lc > 0)) {
                    throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT,
                            "--coil-turns and --coil-length must be above zero; got " + n + " and " + lc + " m");
                }
                double h = n * i / lc;
                r = WorkpieceLoad.inField(0.5 * d, 0.5 * c, m.medium, f, h);
                heated = len == null ? null : Math.min(len, lc);
                out.put("field_model", "long coil: surface field N·I/l");
                notes.add("long-coil field N·I/l; add --coil-diameter for the finite-coil model and the loaded inductance");
            } else {
                double dc = CliSupport.quantity("--coil-diameter", coilDiameter, Dimension.LENGTH);
                double rc = CliSupport.quantity("--coil-resistance", coilResistance, Dimension.RESISTANCE, 0.0);
                double barLength = len == null ? lc : len;
                if (len == null) {
                    notes.add("no --length: the bar is taken to fill the coil");
                }
                WorkCoil coil = WorkCoil.withNagaokaInductance(n, lc, dc, rc);
                loaded = WorkpieceLoad.inCoil(coil, new BarGeometry(d, c, barLength, 0.0), m.medium, f, i);
                r = loaded.bar();
                heated = loaded.heatedLength();
                out.put("field_model", "finite coil: magnetic circuit, Nagaoka return path");
                notes.addAll(loaded.provenance().notes());
            }
        } else {
            throw usage("give the field (--field H) or the coil (--coil-turns N --coil-length L --current I)");
        }
        FrequencyAdvice advice = FrequencyAdvice.forBar(d, r.resistivity(), r.muR(), f);
        fill(out, m, r, heated, loaded, advice, notes);
        if (json) {
            CliSupport.printJson(out);
        } else {
            print(System.out, m, r, heated, loaded, advice, notes);
        }
        return ExitCodes.OK;
    }

    /** Plate mode: a round plate below a flat spiral of evenly spaced turns (the plate model in docs/models.md). */
    private Integer plate() {
        if (bore != null || length != null || field != null || coilLength != null) {
            throw usage("plate mode (--plate-thickness) takes --diameter (the plate's), --gap, --coil-turns, --coil-diameter,"
                    + " --coil-inner-diameter and --current; --bore, --length, --field and --coil-length are for a bar");
        }
        if (gap == null || coilTurns == null || coilDiameter == null || coilInnerDiameter == null || current == null) {
            throw usage("plate mode needs --gap, --coil-turns, --coil-diameter, --coil-inner-diameter and --current");
        }
        double d = CliSupport.quantity("--diameter", diameter, Dimension.LENGTH);
        double t = CliSupport.quantity("--plate-thickness", plateThickness, Dimension.LENGTH);
        double g = CliSupport.quantity("--gap", gap, Dimension.LENGTH);
        double f = CliSupport.quantity("--frequency", frequency, Dimension.FREQUENCY);
        double nd = CliSupport.quantity("--coil-turns", coilTurns, Dimension.DIMENSIONLESS);
        double outer = CliSupport.quantity("--coil-diameter", coilDiameter, Dimension.LENGTH);
        double inner = CliSupport.quantity("--coil-inner-diameter", coilInnerDiameter, Dimension.LENGTH);
        double i = CliSupport.quantity("--current", current, Dimension.CURRENT);
        double rc = CliSupport.quantity("--coil-resistance", coilResistance, Dimension.RESISTANCE, 0.0);
        if (!(nd >= 1 && nd == Math.rint(nd) && nd <= 10000)) {
            throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, "--coil-turns " + coilTurns + ": a whole number from 1 to 10000");
        }
        int n = (int) nd;
        if (!(inner > 0 && outer > inner)) {
            throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, "--coil-inner-diameter " + coilInnerDiameter
                    + ": must be above zero and below --coil-diameter (" + coilDiameter + ")");
        }
        double width = 0.5 * (outer - inner);
        double w = CliSupport.quantity("--coil-conductor", coilConductor, Dimension.LENGTH, width / n);
        if (!(w > 0 && w * n <= width * (1 + 1e-9))) {
            throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, "--coil-conductor " + coilConductor + ": " + n
                    + " turns of it must fit in the winding's radial width " + Quantities.format(width, Dimension.LENGTH, 3));
        }
        Medium m = medium();
        double pitch = n > 1 ? (width - w) / (n - 1) : 0;
        double[] radii = new double[n];
        double[] lifts = new double[n];
        for (int k = 0; k < n; k++) {
            radii[k] = 0.5 * outer - 0.5 * w - k * pitch;
            lifts[k] = 0.5 * w;
        }
        double l0 = InductanceFormulas.wheelerFlatSpiral(0.25 * (outer + inner), width, n);
        LoadedPlateCoil r;
        try {
            FlatWorkCoil coil = new FlatWorkCoil(radii, lifts, 0.5 * outer, l0, rc);
            r = PlateLoad.onPlate(coil, new PlateGeometry(d, t, g), m.medium, f, i);
        } catch (IllegalArgumentException e) {
            throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, e.getMessage());
        }
        FrequencyAdvice advice = FrequencyAdvice.forPlate(t, r.resistivity(), r.muR(), f);
        Map<String, Object> out = new LinkedHashMap<>();
        out.put("field_model", "plate below a flat spiral: coaxial rings over a conducting layer");
        out.put("reference_depth_m", r.referenceDepth());
        out.put("thickness_over_depth", r.thicknessOverDepth());
        out.put("power_W", r.workPower());
        out.put("frequency_Hz", f);
        out.put("surface_field_A_per_m", r.surfaceField());
        out.put("mu_r", r.muR());
        out.put("resistivity_ohm_m", r.resistivity());
        putMaterial(out, m);
        out.put("empty_inductance_H", r.emptyInductance());
        out.put("loaded_inductance_H", r.loadedInductance());
        out.put("inductance_change_H", r.inductanceChange());
        out.put("work_resistance_ohm", r.workResistance());
        out.put("coil_resistance_ohm", rc);
        out.put("frequency_advice", advice(advice, "thickness_over_depth", "plate thickness " + FrequencyAdvice.PLATE_LOW_RATIO
                + " to " + FrequencyAdvice.PLATE_HIGH_RATIO + " reference depths (ours)"));
        out.put("model", r.provenance().model());
        out.put("source", r.provenance().source());
        out.put("valid", r.provenance().valid());
        List<String> notes = new ArrayList<>(r.provenance().notes());
        notes.add("empty inductance from Wheeler's flat-spiral formula (about 5 %); the rings lie"
                + " " + Quantities.format(0.5 * w, Dimension.LENGTH, 3) + " above the conductor's face");
        out.put("notes", notes);
        if (json) {
            CliSupport.printJson(out);
            return ExitCodes.OK;
        }
        PrintStream o = System.out;
        if (m.material != null) {
            o.println("Workpiece        " + m.material.name() + " plate at " + Quantities.format(m.temperatureC,
                    Dimension.TEMPERATURE, 4) + (m.material.magneticAt(m.temperatureC) ? " (magnetic)" : " (non-magnetic)"));
        }
        o.println("Resistivity      " + Quantities.format(r.resistivity(), Dimension.RESISTIVITY, 3));
        o.println("µr used          " + Quantities.number(r.muR(), 3));
        o.println("Surface field    " + Quantities.format(r.surfaceField(), Dimension.FIELD_STRENGTH, 3)
                + " rms (tangential, under the turn where it peaks)");
        o.println("Reference depth  " + Quantities.format(r.referenceDepth(), Dimension.LENGTH, 3)
                + "   (thickness/δ = " + Quantities.number(r.thicknessOverDepth(), 3) + ")");
        o.println("Power in plate   " + Quantities.format(r.workPower(), Dimension.POWER, 4));
        o.println("Work resistance  " + Quantities.format(r.workResistance(), Dimension.RESISTANCE, 4));
        o.println("Coil L empty     " + Quantities.format(r.emptyInductance(), Dimension.INDUCTANCE, 4) + "  (Wheeler)");
        o.println("Coil L loaded    " + Quantities.format(r.loadedInductance(), Dimension.INDUCTANCE, 4)
                + "  (change " + Quantities.format(r.inductanceChange(), Dimension.INDUCTANCE, 3) + ")");
        o.println("Frequency advice " + Quantities.format(advice.lowFrequency(), Dimension.FREQUENCY, 3) + " … "
                + Quantities.format(advice.highFrequency(), Dimension.FREQUENCY, 3) + " for thickness 2–4 δ; chosen "
                + Quantities.format(f, Dimension.FREQUENCY, 3) + ": "
                + advice.verdict().name().toLowerCase(java.util.Locale.ROOT).replace('_', ' '));
        o.println("Model            " + r.provenance().model() + " (" + r.provenance().verdict() + ")");
        for (String note : notes) {
            o.println("  note: " + note);
        }
        o.println();
        o.println(CAUTION);
        return ExitCodes.OK;
    }

    private record Medium(WorkpieceMedium medium, WorkpieceMaterial material, double temperatureC) {
    }

    private Medium medium() {
        if (material != null && (resistivity != null || muR != null)) {
            throw usage("give either --material or --resistivity with --mu-r, not both");
        }
        if (material != null) {
            double t = CliSupport.quantity("--temperature", temperature, Dimension.TEMPERATURE, 20.0);
            WorkpieceMaterials table = WorkpieceMaterials.builtIn();
            if (materialsFile != null) {
                try {
                    table = table.withAll(WorkpieceMaterialsJson.read(materialsFile));
                } catch (IOException e) {
                    throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT,
                            "--materials-file " + materialsFile + ": cannot be read (" + e.getMessage() + ")");
                }
            }
            WorkpieceMaterial w = table.require(material);
            return new Medium(new WorkpieceMedium.OfMaterial(w, t), w, t);
        }
        if (resistivity == null || muR == null) {
            throw usage("give --material NAME, or both --resistivity and --mu-r");
        }
        if (temperature != null) {
            throw usage("--temperature goes with --material; with --resistivity the values are fixed");
        }
        double rho = CliSupport.quantity("--resistivity", resistivity, Dimension.RESISTIVITY);
        double u = CliSupport.quantity("--mu-r", muR, Dimension.PERMEABILITY);
        return new Medium(new WorkpieceMedium.Fixed(rho, u), null, Double.NaN);
    }

    private static ExitCodes.UserError usage(String message) {
        return new ExitCodes.UserError(ExitCodes.USAGE, message);
    }

    private static void fill(Map<String, Object> out, Medium m, BarResponse r, Double heated, LoadedWorkCoil loaded,
                             FrequencyAdvice advice, List<String> notes) {
        out.put("reference_depth_m", r.referenceDepth());
        out.put("power_per_length_W_per_m", r.powerPerLength());
        if (heated != null) {
            out.put("heated_length_m", heated);
            out.put("power_W", r.powerPerLength() * heated);
        }
        out.put("thin_skin_ratio", r.thinSkinRatio());
        out.put("thin_skin_limit_W_per_m", r.thinSkinLimit());
        out.put("low_frequency_limit_W_per_m", r.lowFrequencyLimit());
        out.put("frequency_Hz", r.frequency());
        out.put("surface_field_A_per_m", r.surfaceField());
        out.put("mu_r", r.muR());
        out.put("resistivity_ohm_m", r.resistivity());
        out.put("radius_over_depth", r.radiusOverDepth());
        putMaterial(out, m);
        if (loaded != null) {
            out.put("empty_inductance_H", loaded.emptyInductance());
            out.put("loaded_inductance_H", loaded.loadedInductance());
            out.put("inductance_change_H", loaded.inductanceChange());
            out.put("work_resistance_ohm", loaded.workResistance());
            out.put("coil_resistance_ohm", loaded.coilResistance());
            out.put("coil_efficiency", loaded.efficiency());
            out.put("coil_voltage_V", loaded.coilVoltage());
        }
        out.put("frequency_advice", advice(advice, "diameter_over_depth", "diameter " + FrequencyAdvice.LOW_RATIO + " to "
                + FrequencyAdvice.HIGH_RATIO + " reference depths (common practice)"));
        out.put("model", r.provenance().model());
        out.put("source", r.provenance().source());
        out.put("valid", loaded == null ? r.provenance().valid() : loaded.provenance().valid());
        List<String> all = new ArrayList<>(r.provenance().notes());
        all.addAll(notes);
        out.put("notes", all);
    }

    /** The material's name, temperature, whether it is magnetic there and its Curie point, when a material is used. */
    private static void putMaterial(Map<String, Object> out, Medium m) {
        if (m.material != null) {
            out.put("material", m.material.name());
            out.put("temperature_degC", m.temperatureC);
            out.put("magnetic", m.material.magneticAt(m.temperatureC));
            if (m.material.magnetization() != null) {
                out.put("curie_point_degC", m.material.curiePointC());
            }
        }
    }

    /** The frequency advice as a JSON object: band edges, size over depth under {@code ratioKey}, verdict, rule. */
    private static Map<String, Object> advice(FrequencyAdvice advice, String ratioKey, String rule) {
        Map<String, Object> adv = new LinkedHashMap<>();
        adv.put("low_frequency_Hz", advice.lowFrequency());
        adv.put("high_frequency_Hz", advice.highFrequency());
        adv.put(ratioKey, advice.diameterOverDepth());
        adv.put("verdict", advice.verdict().name().toLowerCase(java.util.Locale.ROOT).replace('_', '-'));
        adv.put("rule", rule);
        return adv;
    }

    private static void print(PrintStream o, Medium m, BarResponse r, Double heated, LoadedWorkCoil loaded,
                              FrequencyAdvice advice, List<String> notes) {
        if (m.material != null) {
            o.println("Workpiece        " + m.material.name() + " at " + Quantities.format(m.temperatureC,
                    Dimension.TEMPERATURE, 4) + (m.material.magneticAt(m.temperatureC) ? " (magnetic, Curie point "
                    + Quantities.format(m.material.curiePointC(), Dimension.TEMPERATURE, 3) + ")" : " (non-magnetic)"));
        }
        o.println("Resistivity      " + Quantities.format(r.resistivity(), Dimension.RESISTIVITY, 3));
        o.println("µr used          " + Quantities.number(r.muR(), 3)
                + (m.medium.fieldDependent() ? "  (B–H curve at the peak surface field " + Quantities.format(
                SQRT2 * r.surfaceField(), Dimension.FIELD_STRENGTH, 3) + ")" : ""));
        o.println("Surface field    " + Quantities.format(r.surfaceField(), Dimension.FIELD_STRENGTH, 3) + " rms");
        o.println("Reference depth  " + Quantities.format(r.referenceDepth(), Dimension.LENGTH, 3)
                + "   (radius/δ = " + Quantities.number(r.radiusOverDepth(), 3) + ")");
        o.println("Power per metre  " + Quantities.format(r.powerPerLength(), Dimension.POWER, 4) + "/m");
        if (heated != null) {
            o.println("Power in bar     " + Quantities.format(r.powerPerLength() * heated, Dimension.POWER, 4)
                    + "  over " + Quantities.format(heated, Dimension.LENGTH, 3));
        }
        o.println("Thin-skin ratio  " + Quantities.number(r.thinSkinRatio(), 3)
                + "   (power over 2πa·H0²·ρ/δ)");
        if (loaded != null) {
            o.println("Coil L empty     " + Quantities.format(loaded.emptyInductance(), Dimension.INDUCTANCE, 4));
            o.println("Coil L loaded    " + Quantities.format(loaded.loadedInductance(), Dimension.INDUCTANCE, 4)
                    + "  (change " + Quantities.format(loaded.inductanceChange(), Dimension.INDUCTANCE, 3) + ")");
            o.println("Work resistance  " + Quantities.format(loaded.workResistance(), Dimension.RESISTANCE, 4));
            if (loaded.coilResistance() > 0) {
                o.println("Coil efficiency  " + Quantities.format(loaded.efficiency(), Dimension.FRACTION, 3));
            }
            o.println("Coil voltage     " + Quantities.format(loaded.coilVoltage(), Dimension.VOLTAGE, 3) + " rms");
        }
        o.println("Frequency advice " + Quantities.format(advice.lowFrequency(), Dimension.FREQUENCY, 3) + " … "
                + Quantities.format(advice.highFrequency(), Dimension.FREQUENCY, 3)
                + " for diameter 4–8 δ (common practice); chosen "
                + Quantities.format(advice.chosenFrequency(), Dimension.FREQUENCY, 3) + ": "
                + advice.verdict().name().toLowerCase(java.util.Locale.ROOT).replace('_', ' '));
        o.println("Model            " + r.provenance().model() + " ("
                + (loaded == null ? r.provenance() : loaded.provenance()).verdict() + ")");
        for (String n : r.provenance().notes()) {
            o.println("  note: " + n);
        }
        for (String n : notes) {
            o.println("  note: " + n);
        }
        o.println();
        o.println(CAUTION);
    }
}
