package org.tankwright.cli;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.tankwright.magnetics.CoilGeometry;
import org.tankwright.magnetics.CoilModel;
import org.tankwright.magnetics.CoilResult;
import org.tankwright.magnetics.FlatSpiral;
import org.tankwright.magnetics.InductanceEstimate;
import org.tankwright.magnetics.MultilayerSolenoid;
import org.tankwright.magnetics.OperatingPoint;
import org.tankwright.magnetics.PolygonSpiral;
import org.tankwright.magnetics.RectangularSpiral;
import org.tankwright.magnetics.ResistanceEstimate;
import org.tankwright.magnetics.SingleLayerSolenoid;
import org.tankwright.magnetics.SingleLoop;
import org.tankwright.materials.Conductor;
import org.tankwright.materials.ConductorMaterial;
import org.tankwright.materials.WireGauge;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code tankwright coil}: one coil from options: inductance by every model, resistance, Q, self-resonance. */
@Command(name = "coil", mixinStandardHelpOptions = true, versionProvider = VersionInfo.class, sortOptions = false,
        description = {"Compute one coil: inductance by every applicable model side by side, DC and AC resistance,",
                "Q, self-capacitance and self-resonance, wire length and mass. Lengths and frequencies take units",
                "(2.5 mm, 100 kHz). Exit 3 when the geometry is impossible."})
public final class CoilCommand implements Callable<Integer> {
    /** Litz bundle fill assumed when --wire-outer is omitted (common practice estimate). */
    static final double DEFAULT_LITZ_FILL = 0.5;

    @Option(names = "--shape", required = true, paramLabel = "SHAPE",
            description = "solenoid | multilayer | spiral | square-spiral | hex-spiral | octagon-spiral | rect-spiral | loop")
    String shape;
    @Option(names = "--turns", paramLabel = "N", description = "total number of turns (a loop has 1)")
    Integer turns;
    @Option(names = "--diameter", paramLabel = "LENGTH",
            description = "solenoid/loop: mean diameter to the wire's centre; multilayer: former (inner) diameter; "
                    + "spirals: outer diameter at the conductor's edge (polygons across flats)")
    String diameter;
    @Option(names = "--inner-diameter", paramLabel = "LENGTH", description = "spirals: inner diameter at the conductor's edge")
    String innerDiameter;
    @Option(names = "--width", paramLabel = "LENGTH", description = "rect-spiral: outer width (x)")
    String width;
    @Option(names = "--height", paramLabel = "LENGTH", description = "rect-spiral: outer height (y)")
    String height;
    @Option(names = "--inner-width", paramLabel = "LENGTH", description = "rect-spiral: inner width")
    String innerWidth;
    @Option(names = "--inner-height", paramLabel = "LENGTH",
            description = "rect-spiral: inner height (default: outer height − (outer width − inner width))")
    String innerHeight;
    @Option(names = "--length", paramLabel = "LENGTH",
            description = "solenoid: current-sheet length = turns × pitch; multilayer: winding length")
    String length;
    @Option(names = "--pitch", paramLabel = "LENGTH", description = "solenoid/multilayer: axial turn-to-turn pitch")
    String pitch;
    @Option(names = "--layers", paramLabel = "N", defaultValue = "1", description = "multilayer: number of layers")
    int layers;
    @Option(names = "--wire", required = true, paramLabel = "WIRE",
            description = "bare conductor: a diameter (1.2mm), AWG18, litz:400x0.071mm, tube:6mm/1mm (outer/wall), "
                    + "trace:2mm/1oz or trace:2mm/35um (width/copper)")
    String wire;
    @Option(names = "--wire-outer", paramLabel = "LENGTH",
            description = "insulated outer diameter (round) or bundle diameter (litz); default: bare, or a 50 %% fill bundle")
    String wireOuter;
    @Option(names = "--material", defaultValue = "copper", paramLabel = "METAL", description = "copper | aluminium")
    String material;
    @Option(names = "--frequency", defaultValue = "100 kHz", paramLabel = "FREQ", description = "operating frequency (default 100 kHz)")
    String frequency;
    @Option(names = "--temperature", defaultValue = "20", paramLabel = "TEMP", description = "winding temperature in °C (default 20)")
    String temperature;
    @Option(names = "--current", defaultValue = "1 A", paramLabel = "CURRENT", description = "rms current for the current density (default 1 A)")
    String current;
    @Option(names = "--json", description = "print one JSON object with SI values instead of the table")
    boolean json;

    @Override
    public Integer call() {
        ConductorMaterial metal = parseMaterial();
        Conductor conductor = conductor(metal);
        CoilGeometry geometry = geometry(conductor);
        List<String> problems = geometry.problems();
        if (!problems.isEmpty()) {
            throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, "invalid coil geometry:\n  " + String.join("\n  ", problems));
        }
        OperatingPoint op = new OperatingPoint(CliSupport.quantity("--frequency", frequency, Dimension.FREQUENCY),
                CliSupport.quantity("--temperature", temperature, Dimension.TEMPERATURE),
                CliSupport.quantity("--current", current, Dimension.CURRENT));
        if (!op.problems().isEmpty()) {
            throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, String.join("; ", op.problems()));
        }
        CoilResult r = CoilModel.analyse(geometry, op);
        if (json) {
            CliSupport.printJson(toJson(geometry, r));
        } else {
            printTable(geometry, r);
        }
        return ExitCodes.OK;
    }

    private ConductorMaterial parseMaterial() {
        try {
            return ConductorMaterial.parse(material);
        } catch (IllegalArgumentException e) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, "--material: " + e.getMessage());
        }
    }

    /** Reads --wire and --wire-outer into a conductor. */
    Conductor conductor(ConductorMaterial metal) {
        String w = wire.strip();
        String lower = w.toLowerCase(Locale.ROOT);
        double outer = wireOuter == null ? Double.NaN : len("--wire-outer", wireOuter);
        if (WireGauge.looksLikeAwg(w)) {
            int gauge;
            try {
                gauge = WireGauge.parseAwg(w);
            } catch (IllegalArgumentException e) {
                throw new ExitCodes.UserError(ExitCodes.USAGE, "--wire: " + e.getMessage());
            }
            return Conductor.RoundWire.awg(gauge, outer, metal);
        }
        if (lower.startsWith("litz:")) {
            String[] parts = w.substring(5).split("[xX×*]", 2);
            if (parts.length != 2) {
                throw new ExitCodes.UserError(ExitCodes.USAGE, "--wire: '" + w + "': litz is written litz:STRANDSxDIAMETER, e.g. litz:400x0.071mm");
            }
            int strands;
            try {
                strands = Integer.parseInt(parts[0].strip());
            } catch (NumberFormatException e) {
                throw new ExitCodes.UserError(ExitCodes.USAGE, "--wire: '" + parts[0] + "' is not a whole strand count, e.g. litz:400x0.071mm");
            }
            double ds = len("--wire (strand diameter)", parts[1]);
            if (Double.isNaN(outer)) {
                outer = Math.sqrt(Math.max(strands, 0) / DEFAULT_LITZ_FILL) * ds;
            }
            return new Conductor.Litz(strands, ds, outer, metal);
        }
        if (lower.startsWith("tube:")) {
            String[] parts = twoParts(w.substring(5), "tube:OUTER/WALL, e.g. tube:6mm/1mm");
            return new Conductor.Tube(len("--wire (tube outer diameter)", parts[0]),
                    len("--wire (tube wall)", parts[1]), metal);
        }
        if (lower.startsWith("trace:")) {
            String[] parts = twoParts(w.substring(6), "trace:WIDTH/COPPER, e.g. trace:2mm/1oz or trace:2mm/35um");
            double tw = len("--wire (trace width)", parts[0]);
            String copper = parts[1].strip();
            if (copper.toLowerCase(Locale.ROOT).endsWith("oz")) {
                double oz = CliSupport.quantity("--wire (copper weight)", copper.substring(0, copper.length() - 2),
                        Dimension.DIMENSIONLESS);
                return Conductor.Trace.ofCopperWeight(tw, oz, metal);
            }
            return new Conductor.Trace(tw, len("--wire (copper thickness)", copper), metal);
        }
        double d = len("--wire", w);
        return new Conductor.RoundWire(d, Double.isNaN(outer) ? d : outer, metal);
    }

    private static String[] twoParts(String text, String form) {
        String[] parts = text.split("/", 2);
        if (parts.length != 2) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, "--wire: '" + text + "': write " + form);
        }
        return parts;
    }

    /** Builds the geometry for --shape from the options (conventions in docs/cli.md). */
    CoilGeometry geometry(Conductor c) {
        String s = shape.strip().toLowerCase(Locale.ROOT);
        switch (s) {
            case "solenoid" -> {
                int n = need(turns, "--turns");
                double d = len("--diameter", need(diameter, "--diameter"));
                return new SingleLayerSolenoid(d, n, solenoidPitch(n), c);
            }
            case "multilayer" -> {
                int n = need(turns, "--turns");
                double d = len("--diameter", need(diameter, "--diameter"));
                double p = c.footprintWidth();
                if (pitch != null) {
                    p = len("--pitch", pitch);
                } else if (length != null && layers >= 1 && n >= 1) {
                    p = len("--length", length) / ((n + layers - 1) / layers);
                }
                return new MultilayerSolenoid(d, n, layers, p, c);
            }
            case "spiral" -> {
                return new FlatSpiral(len("--diameter", need(diameter, "--diameter")),
                        len("--inner-diameter", need(innerDiameter, "--inner-diameter")), need(turns, "--turns"), c);
            }
            case "square-spiral", "hex-spiral", "octagon-spiral" -> {
                int sides = s.startsWith("square") ? 4 : s.startsWith("hex") ? 6 : 8;
                return new PolygonSpiral(sides, len("--diameter", need(diameter, "--diameter")),
                        len("--inner-diameter", need(innerDiameter, "--inner-diameter")), need(turns, "--turns"), c);
            }
            case "rect-spiral" -> {
                double w = len("--width", need(width, "--width"));
                double h = len("--height", need(height, "--height"));
                double iw = len("--inner-width", need(innerWidth, "--inner-width"));
                double ih = innerHeight == null ? h - (w - iw) : len("--inner-height", innerHeight);
                return new RectangularSpiral(w, h, iw, ih, need(turns, "--turns"), c);
            }
            case "loop" -> {
                if (turns != null && turns != 1) {
                    throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, "turns = " + turns
                            + ": a loop has exactly 1 turn; use --shape solenoid or spiral for more");
                }
                return new SingleLoop(len("--diameter", need(diameter, "--diameter")), c);
            }
            default -> throw new ExitCodes.UserError(ExitCodes.USAGE, "--shape: '" + shape + "': allowed are solenoid, "
                    + "multilayer, spiral, square-spiral, hex-spiral, octagon-spiral, rect-spiral, loop");
        }
    }

    private double solenoidPitch(int n) {
        if (pitch == null && length == null) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, "--shape solenoid needs --length or --pitch");
        }
        if (pitch != null && length != null) {
            double p = len("--pitch", pitch);
            double l = len("--length", length);
            if (Math.abs(l - n * p) > 1e-3 * Math.abs(l)) {
                throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, "length = " + Quantities.format(l, Dimension.LENGTH, 4)
                        + " disagrees with turns × pitch = " + Quantities.format(n * p, Dimension.LENGTH, 4) + "; give one of them");
            }
            return p;
        }
        return pitch != null ? len("--pitch", pitch) : (n > 0 ? len("--length", length) / n : Double.NaN);
    }

    private String need(String value, String option) {
        if (value == null) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, option + " is required for --shape " + shape);
        }
        return value;
    }

    private int need(Integer value, String option) {
        if (value == null) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, option + " is required for --shape " + shape);
        }
        return value;
    }

    /** A geometry length; a non-number (NaN, infinity) is bad geometry (exit 3), a wrong unit a usage error (2). */
    private static double len(String option, String text) {
        if (text.strip().toLowerCase(Locale.ROOT).matches("[+-]?(nan|inf|infinity)\\s*\\w*")) {
            throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, option + " = '" + text
                    + "': not a finite number; give a length greater than 0, e.g. 2.5 mm");
        }
        return CliSupport.quantity(option, text, Dimension.LENGTH);
    }

    private static Map<String, Object> toJson(CoilGeometry g, CoilResult r) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("shape", g.kind());
        m.put("turns", g.turns());
        m.put("conductor", g.conductor().describe());
        m.put("inductance_H", r.inductance());
        m.put("chosen_model", r.chosenModel());
        List<Map<String, Object>> models = new ArrayList<>();
        for (InductanceEstimate e : r.models()) {
            models.add(modelEntry(e.name(), "inductance_H", e.inductance(), e.source(), e.valid(), e.note()));
        }
        m.put("models", models);
        m.put("model_spread", r.modelSpread());
        m.put("inductance_at_frequency_H", r.inductanceAtFrequency());
        m.put("apparent_inductance_H", r.apparentInductance());
        m.put("resistance_dc_ohm", r.resistanceDc());
        m.put("resistance_ac_ohm", r.resistanceAc());
        m.put("resistance_ac_skin_ohm", r.resistanceAcSkin());
        m.put("resistance_ac_proximity_ohm", r.resistanceAcProximity());
        m.put("resistance_model", r.resistanceModel());
        List<Map<String, Object>> rModels = new ArrayList<>();
        for (ResistanceEstimate e : r.resistanceModels()) {
            rModels.add(modelEntry(e.name(), "resistance_ac_ohm", e.resistanceAc(), e.source(), e.valid(), e.note()));
        }
        m.put("resistance_models", rModels);
        m.put("skin_depth_m", r.skinDepth());
        m.put("q", r.q());
        m.put("self_capacitance_F", r.selfCapacitance());
        m.put("self_resonance_Hz", r.selfResonance());
        m.put("self_resonance_margin", r.resonanceMargin());
        m.put("capacitance_model", r.capacitanceModel());
        m.put("wire_length_m", r.wireLength());
        m.put("conductor_mass_kg", r.conductorMass());
        m.put("current_A", r.current());
        m.put("current_density_A_per_m2", r.currentDensity());
        m.put("current_density_ac_A_per_m2", r.currentDensityAc());
        m.put("frequency_Hz", r.frequency());
        m.put("temperature_degC", r.temperature());
        m.put("outer_radius_m", g.outerRadius());
        m.put("z_min_m", g.zMin());
        m.put("z_max_m", g.zMax());
        List<Map<String, Object>> curve = new ArrayList<>();
        for (CoilResult.QPoint p : r.qCurve()) {
            Map<String, Object> o = new LinkedHashMap<>();
            o.put("frequency_Hz", p.frequency());
            o.put("resistance_ac_ohm", p.resistanceAc());
            o.put("q", p.q());
            o.put("apparent_inductance_H", p.apparentInductance());
            curve.add(o);
        }
        m.put("q_curve", curve);
        m.put("warnings", r.warnings());
        return m;
    }

    /** One model's entry in a JSON list: {name, VALUE_KEY, source, valid, note}. */
    private static Map<String, Object> modelEntry(String name, String valueKey, double value, String source,
            boolean valid, String note) {
        Map<String, Object> o = new LinkedHashMap<>();
        o.put("name", name);
        o.put(valueKey, value);
        o.put("source", source);
        o.put("valid", valid);
        o.put("note", note);
        return o;
    }

    private static void printTable(CoilGeometry g, CoilResult r) {
        System.out.println("Coil: " + g.kind() + ", " + g.turns() + " turn" + (g.turns() == 1 ? "" : "s") + ", "
                + g.conductor().describe() + "; at " + fmt(r.frequency(), Dimension.FREQUENCY) + ", "
                + Quantities.number(r.temperature(), 3) + " °C");
        System.out.println();
        System.out.println("Inductance models (low frequency):");
        System.out.printf(Locale.ROOT, "  %-21s %-12s %-6s %s%n", "model", "inductance", "valid", "source");
        for (InductanceEstimate e : r.models()) {
            System.out.printf(Locale.ROOT, "  %-21s %-12s %-6s %s%n", e.name() + (e.name().equals(r.chosenModel()) ? " *" : ""),
                    fmt(e.inductance(), Dimension.INDUCTANCE), e.valid() ? "yes" : "no", e.source());
            System.out.printf(Locale.ROOT, "  %-21s %-12s %-6s   %s%n", "", "", "", e.note());
        }
        System.out.println("  * chosen (most accurate valid model); spread between valid models "
                + Quantities.number(100 * r.modelSpread(), 2) + " %");
        System.out.println();
        row("inductance (chosen)", fmt(r.inductance(), Dimension.INDUCTANCE));
        row("inductance at frequency", fmt(r.inductanceAtFrequency(), Dimension.INDUCTANCE));
        row("apparent inductance", fmt(r.apparentInductance(), Dimension.INDUCTANCE) + "  (what an LCR meter reads)");
        row("DC resistance", fmt(r.resistanceDc(), Dimension.RESISTANCE));
        row("AC resistance", fmt(r.resistanceAc(), Dimension.RESISTANCE) + "  (skin " + fmt(r.resistanceAcSkin(), Dimension.RESISTANCE)
                + " + proximity " + fmt(r.resistanceAcProximity(), Dimension.RESISTANCE) + ")");
        row("skin depth", fmt(r.skinDepth(), Dimension.LENGTH));
        row("Q", Quantities.number(r.q(), 3));
        row("self-capacitance", fmt(r.selfCapacitance(), Dimension.CAPACITANCE) + "  (estimate)");
        row("self-resonance", fmt(r.selfResonance(), Dimension.FREQUENCY) + "  (estimate; margin "
                + Quantities.number(r.resonanceMargin(), 3) + " x the operating frequency)");
        row("wire length", fmt(r.wireLength(), Dimension.LENGTH));
        row("conductor mass", Quantities.format(r.conductorMass(), Dimension.MASS, 3));
        row("current density", Quantities.number(r.currentDensity() * 1e-6, 3) + " A/mm² at "
                + fmt(r.current(), Dimension.CURRENT) + " rms (AC, skin-weighted: "
                + Quantities.number(r.currentDensityAc() * 1e-6, 3) + " A/mm²)");
        System.out.println();
        System.out.println("AC resistance models (at the frequency):");
        System.out.printf(Locale.ROOT, "  %-21s %-12s %-6s %s%n", "model", "resistance", "valid", "source");
        for (ResistanceEstimate e : r.resistanceModels()) {
            boolean chosen = e == r.resistanceModels().get(0);
            System.out.printf(Locale.ROOT, "  %-21s %-12s %-6s %s%n", e.name() + (chosen ? " *" : ""),
                    fmt(e.resistanceAc(), Dimension.RESISTANCE), e.valid() ? "yes" : "no", e.source());
            System.out.printf(Locale.ROOT, "  %-21s %-12s %-6s   %s%n", "", "", "", e.note());
        }
        System.out.println();
        System.out.println("AC resistance: " + r.resistanceModel());
        System.out.println("Self-capacitance: " + r.capacitanceModel());
        for (String w : r.warnings()) {
            System.out.println("caution: " + w);
        }
    }

    private static void row(String label, String value) {
        System.out.printf(Locale.ROOT, "  %-24s %s%n", label, value);
    }

    private static String fmt(double v, Dimension d) {
        return Quantities.format(v, d, 4);
    }
}
