package org.tankwright.cli;

import org.tankwright.magnetics.CoilGeometry;
import org.tankwright.magnetics.FlatSpiral;
import org.tankwright.magnetics.MultilayerSolenoid;
import org.tankwright.magnetics.PolygonSpiral;
import org.tankwright.magnetics.RectangularSpiral;
import org.tankwright.magnetics.SingleLayerSolenoid;
import org.tankwright.magnetics.SingleLoop;
import org.tankwright.materials.Conductor;
import org.tankwright.materials.ConductorMaterial;
import org.tankwright.materials.WireGauge;
import org.tankwright.units.Dimension;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;

import java.util.List;
import java.util.Locale;

/**
 * The options that describe one coil ({@code --shape --turns --diameter ... --wire}), added to any
 * command under a prefix: "" for a command about one coil, "a-" and "b-" for a link
 * ({@code --a-shape loop --b-shape spiral ...}). Options are registered on the command's
 * {@link CommandSpec} so that one list serves every command; {@link #geometry} turns the parsed
 * values into a checked {@link CoilGeometry}. Conventions (which diameter is measured where) are
 * those of the geometry records and of docs/cli.md.
 */
public final class CoilOptionSet {
    /** Option name (without "--" and prefix), parameter label, description. */
    private static final String[][] OPTIONS = {
            {"shape", "KIND", "solenoid, multilayer, spiral, square-spiral, hex-spiral, octagon-spiral, rect-spiral or loop"},
            {"turns", "N", "total number of turns"},
            {"diameter", "LENGTH", "solenoid/loop: mean diameter; multilayer: former diameter; spirals: outer diameter (across flats)"},
            {"inner-diameter", "LENGTH", "spirals: inner diameter at the conductor's edge (across flats)"},
            {"width", "LENGTH", "rect-spiral: outer width (x)"},
            {"height", "LENGTH", "rect-spiral: outer height (y)"},
            {"inner-width", "LENGTH", "rect-spiral: inner width"},
            {"inner-height", "LENGTH", "rect-spiral: inner height"},
            {"length", "LENGTH", "solenoid: current-sheet length (turns × pitch)"},
            {"pitch", "LENGTH", "solenoid/multilayer: axial pitch (default: close-wound)"},
            {"layers", "N", "multilayer: number of layers"},
            {"wire", "SPEC", "bare conductor: a diameter (1mm), AWG18, or litz:400x0.071mm"},
            {"wire-outer", "LENGTH", "insulated or litz bundle diameter"},
            {"material", "METAL", "copper (default) or aluminium"},
            {"frequency", "FREQ", "operating frequency"},
            {"temperature", "TEMP", "winding temperature (default 20 °C)"},
    };

    private final CommandSpec spec;
    private final String prefix;
    private final String label;

    private CoilOptionSet(CommandSpec spec, String prefix, String label) {
        this.spec = spec;
        this.prefix = prefix;
        this.label = label;
    }

    /**
     * Registers the coil options on {@code spec} under {@code prefix} ("" or e.g. "a-");
     * {@code label} names the coil in help texts and messages ("" for a lone coil).
     */
    public static CoilOptionSet addTo(CommandSpec spec, String prefix, String label) {
        for (String[] o : OPTIONS) {
            String desc = label.isEmpty() ? o[2] : "coil " + label + ": " + o[2];
            spec.addOption(OptionSpec.builder("--" + prefix + o[0]).type(String.class).paramLabel(o[1])
                    .description(desc).build());
        }
        return new CoilOptionSet(spec, prefix, label);
    }

    private String name(String option) {
        return "--" + prefix + option;
    }

    /** The raw text of an option, or null when it was not given. */
    public String text(String option) {
        OptionSpec o = spec.findOption(name(option));
        return o == null ? null : o.getValue();
    }

    private String required(String option, String kind) {
        String t = text(option);
        if (t == null) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, name(option) + " is required" + (kind == null ? "" : " for shape " + kind));
        }
        return t;
    }

    private double length(String option, String kind) {
        double v = CliSupport.quantity(name(option), required(option, kind), Dimension.LENGTH);
        return v;
    }

    private int count(String option, String kind) {
        String t = required(option, kind);
        try {
            return Integer.parseInt(t.trim());
        } catch (NumberFormatException e) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, name(option) + " = '" + t + "': a whole number is required");
        }
    }

    /** The winding temperature in °C (20 when not given). */
    public double temperature() {
        return CliSupport.quantity(name("temperature"), text("temperature"), Dimension.TEMPERATURE, 20.0);
    }

    /** The operating frequency in Hz, or NaN when not given. */
    public double frequency() {
        return CliSupport.quantity(name("frequency"), text("frequency"), Dimension.FREQUENCY, Double.NaN);
    }

    /** The coil described by the options, checked: a usage error (2) for missing options, 3 for a bad geometry. */
    public CoilGeometry geometry() {
        String kind = required("shape", null).trim().toLowerCase(Locale.ROOT);
        Conductor wire = conductor();
        CoilGeometry g = switch (kind) {
            case "loop" -> new SingleLoop(length("diameter", kind), wire);
            case "solenoid" -> solenoid(kind, wire);
            case "multilayer" -> text("pitch") == null
                    ? MultilayerSolenoid.closeWound(length("diameter", kind), count("turns", kind), count("layers", kind), wire)
                    : new MultilayerSolenoid(length("diameter", kind), count("turns", kind), count("layers", kind), length("pitch", kind), wire);
            case "spiral" -> new FlatSpiral(length("diameter", kind), length("inner-diameter", kind), count("turns", kind), wire);
            case "square-spiral" -> polygon(4, kind, wire);
            case "hex-spiral" -> polygon(6, kind, wire);
            case "octagon-spiral" -> polygon(8, kind, wire);
            case "rect-spiral" -> new RectangularSpiral(length("width", kind), length("height", kind),
                    length("inner-width", kind), length("inner-height", kind), count("turns", kind), wire);
            default -> throw new ExitCodes.UserError(ExitCodes.USAGE, name("shape") + " = '" + kind
                    + "': allowed are solenoid, multilayer, spiral, square-spiral, hex-spiral, octagon-spiral, rect-spiral, loop");
        };
        List<String> problems = g.problems();
        if (!problems.isEmpty()) {
            String who = label.isEmpty() ? "coil" : "coil " + label;
            throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, who + ": " + String.join("; ", problems));
        }
        return g;
    }

    private CoilGeometry solenoid(String kind, Conductor wire) {
        double d = length("diameter", kind);
        int n = count("turns", kind);
        if (text("length") != null) {
            return SingleLayerSolenoid.ofLength(d, n, length("length", kind), wire);
        }
        double pitch = text("pitch") != null ? length("pitch", kind) : wire.footprintWidth();
        return new SingleLayerSolenoid(d, n, pitch, wire);
    }

    private CoilGeometry polygon(int sides, String kind, Conductor wire) {
        return new PolygonSpiral(sides, length("diameter", kind), length("inner-diameter", kind), count("turns", kind), wire);
    }

    /** The conductor from --wire, --wire-outer and --material. */
    public Conductor conductor() {
        String spec = required("wire", null).trim();
        ConductorMaterial material;
        try {
            material = text("material") == null ? ConductorMaterial.COPPER : ConductorMaterial.parse(text("material"));
        } catch (IllegalArgumentException e) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, name("material") + ": " + e.getMessage());
        }
        String outerText = text("wire-outer");
        double outer = outerText == null ? Double.NaN : CliSupport.quantity(name("wire-outer"), outerText, Dimension.LENGTH);
        String lower = spec.toLowerCase(Locale.ROOT);
        if (lower.startsWith("litz:")) {
            String[] parts = spec.substring(5).split("[xX×]");
            if (parts.length != 2) {
                throw new ExitCodes.UserError(ExitCodes.USAGE, name("wire") + " = '" + spec + "': litz is written litz:STRANDSxDIAMETER, e.g. litz:400x0.071mm");
            }
            int strands;
            try {
                strands = Integer.parseInt(parts[0].trim());
            } catch (NumberFormatException e) {
                throw new ExitCodes.UserError(ExitCodes.USAGE, name("wire") + " = '" + spec + "': the strand count must be a whole number");
            }
            double d = CliSupport.quantity(name("wire"), parts[1], Dimension.LENGTH);
            // without a bundle diameter: the densest packing of the strands (a lower bound of the real bundle)
            double bundle = Double.isNaN(outer) ? d * Math.sqrt(Math.max(strands, 0) / Conductor.Litz.MAX_FILL) : outer;
            return new Conductor.Litz(strands, d, bundle, material);
        }
        if (WireGauge.looksLikeAwg(spec)) {
            try {
                return Conductor.RoundWire.awg(WireGauge.parseAwg(spec), outer, material);
            } catch (IllegalArgumentException e) {
                throw new ExitCodes.UserError(ExitCodes.USAGE, name("wire") + ": " + e.getMessage());
            }
        }
        double d = CliSupport.quantity(name("wire"), spec, Dimension.LENGTH);
        return new Conductor.RoundWire(d, Double.isNaN(outer) ? d : outer, material);
    }
}
