package org.tankwright.cli;

import com.google.gson.Gson;
import com.google.gson.GsonBuilder;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;
import org.tankwright.units.QuantityFormatException;

import java.io.PrintStream;

/** Small helpers every command shares: option values through the units parser, JSON output. */
public final class CliSupport {
    private static final Gson GSON = new GsonBuilder().setPrettyPrinting().disableHtmlEscaping().create();

    private CliSupport() {
    }

    /** Parses an option's text as a quantity, or fails with a usage error naming the option. */
    public static double quantity(String option, String text, Dimension dim) {
        try {
            return Quantities.parse(text, dim);
        } catch (QuantityFormatException e) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, option + ": " + e.getMessage());
        }
    }

    /** Like {@link #quantity} but returns {@code fallback} when the option was not given. */
    public static double quantity(String option, String text, Dimension dim, double fallback) {
        return text == null ? fallback : quantity(option, text, dim);
    }

    /** The shared Gson instance: pretty, no HTML escaping; NaN and infinities are refused. */
    public static Gson gson() {
        return GSON;
    }

    /** Prints an object as JSON on standard output. */
    public static void printJson(Object o) {
        printJson(o, System.out);
    }

    /** Prints an object as JSON on the given stream. */
    public static void printJson(Object o, PrintStream out) {
        out.println(GSON.toJson(o));
    }
}
