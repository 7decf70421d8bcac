package org.tankwright.cli;

import org.tankwright.magnetics.CoilGeometry;
import org.tankwright.materials.ConductorMaterial;
import org.tankwright.units.Dimension;
import picocli.CommandLine;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The options of {@code tankwright coil} added to another command under a prefix ("a-" and "b-" for
 * a link: {@code --a-shape loop --b-shape spiral ...}; "" for a command about one coil). Nothing is
 * restated here: the option names, labels and descriptions are read from {@link CoilCommand}'s own
 * specification, and the values are handed back to a {@link CoilCommand} to be parsed by its code,
 * so every command reads a coil exactly as {@code tankwright coil} does. Messages name the
 * prefixed options.
 */
public final class CoilOptionSet {
    /** Options of the coil command that describe its output, not the coil. */
    private static final Set<String> NOT_COIL = Set.of("--json", "--help", "--version", "--current");

    private final CommandSpec spec;
    private final String prefix;
    private final String label;
    private final List<String> names = new ArrayList<>();
    private CoilCommand parsed;

    private CoilOptionSet(CommandSpec spec, String prefix, String label) {
        this.spec = spec;
        this.prefix = prefix;
        this.label = label;
    }

    /**
     * Registers the coil options on {@code spec} under {@code prefix}; {@code label} names the coil in
     * help texts and messages ("" for a lone coil).
     */
    public static CoilOptionSet addTo(CommandSpec spec, String prefix, String label) {
        CoilOptionSet set = new CoilOptionSet(spec, prefix, label);
        CommandSpec coil = template();
        for (OptionSpec o : coil.options()) {
            String name = o.longestName();
            if (NOT_COIL.contains(name) || !name.startsWith("--")) {
                continue;
            }
            set.names.add(name);
            String[] desc = o.description().clone();
            for (int i = 0; i < desc.length; i++) {
                desc[i] = desc[i].replaceAll("%(?![n%])", "%%"); // a bare % would be read as a format specifier
            }
            if (!label.isEmpty() && desc.length > 0) {
                desc[0] = "coil " + label + ": " + desc[0];
            }
            spec.addOption(OptionSpec.builder("--" + prefix + name.substring(2)).type(String.class)
                    .paramLabel(o.paramLabel()).description(desc).build());
        }
        return set;
    }

    /** The raw text of a coil option (name as in {@code tankwright coil}, e.g. "--frequency"), or null. */
    public String text(String coilOption) {
        OptionSpec o = spec.findOption("--" + prefix + coilOption.substring(2));
        return o == null ? null : o.getValue();
    }

    private static CommandSpec template;

    private static synchronized CommandSpec template() {
        if (template == null) {
            template = new CommandLine(new CoilCommand()).getCommandSpec();
        }
        return template;
    }

    /** A coil command holding the given values, with its own defaults for the rest (parsed once). */
    private CoilCommand command() {
        if (parsed != null) {
            return parsed;
        }
        List<String> args = new ArrayList<>();
        for (String n : names) {
            String v = text(n);
            if (v != null) {
                args.add(n);
                args.add(v);
            }
        }
        CoilCommand c = new CoilCommand();
        try {
            new CommandLine(c).parseArgs(args.toArray(new String[0]));
        } catch (CommandLine.ParameterException e) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, prefixed(e.getMessage()));
        }
        parsed = c;
        return c;
    }

    /** The coil described by the options, checked: usage error (2) for missing or malformed options, 3 for a bad coil. */
    public CoilGeometry geometry() {
        CoilCommand c = command();
        try {
            ConductorMaterial metal;
            try {
                metal = ConductorMaterial.parse(c.material);
            } catch (IllegalArgumentException e) {
                throw new ExitCodes.UserError(ExitCodes.USAGE, "--material: " + e.getMessage());
            }
            CoilGeometry g = c.geometry(c.conductor(metal));
            List<String> problems = g.problems();
            if (!problems.isEmpty()) {
                throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, who() + ": " + String.join("; ", problems));
            }
            return g;
        } catch (ExitCodes.UserError e) {
            throw new ExitCodes.UserError(e.status(), prefixed(e.getMessage()));
        }
    }

    /** Operating frequency in Hz (the coil command's default when not given). */
    public double frequency() {
        return quantity("--frequency", command().frequency, Dimension.FREQUENCY);
    }

    /** Winding temperature in °C (the coil command's default when not given). */
    public double temperature() {
        return quantity("--temperature", command().temperature, Dimension.TEMPERATURE);
    }

    /** True when the option was given on the command line. */
    public boolean given(String coilOption) {
        return text(coilOption) != null;
    }

    private double quantity(String coilOption, String text, Dimension d) {
        return CliSupport.quantity("--" + prefix + coilOption.substring(2), text, d);
    }

    private String who() {
        return label.isEmpty() ? "coil" : "coil " + label;
    }

    /** The message with every coil option name given its prefix (and the coil named once). */
    private String prefixed(String message) {
        if (prefix.isEmpty()) {
            return message;
        }
        Matcher m = Pattern.compile("(?<![\\w-])--([a-z][a-z-]*)").matcher(message);
        StringBuilder sb = new StringBuilder();
        while (m.find()) {
            String name = "--" + m.group(1);
            m.appendReplacement(sb, Matcher.quoteReplacement(names.contains(name) ? "--" + prefix + m.group(1) : name));
        }
        m.appendTail(sb);
        String s = sb.toString();
        return s.startsWith(who()) ? s : who() + ": " + s;
    }
}
