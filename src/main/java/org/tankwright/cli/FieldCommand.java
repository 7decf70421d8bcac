package org.tankwright.cli;

import org.apache.commons.math3.complex.Complex;
import org.tankwright.coupling.FilamentSet;
import org.tankwright.coupling.PhasorFlux;
import org.tankwright.magnetics.CoilGeometry;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.Callable;

/** {@code tankwright field}: magnetic flux density of one coil at a point (Biot–Savart on its filaments). */
@Command(name = "field", mixinStandardHelpOptions = true,
        description = {"Magnetic flux density of one coil carrying an rms current, at a point given from the coil's",
                "centre with z along its axis (Biot–Savart on the same filaments as the inductance).",
                "Takes the coil options of 'tankwright coil'."})
public final class FieldCommand implements Callable<Integer> {
    static final String CAUTION = "Caution: an exposure check compares this flux density with the limits that apply where the "
            + "equipment is used (e.g. ICNIRP reference levels at the operating frequency); defer to local codes and "
            + "licensed practice. The value is for the coil alone in free space: nearby metal, ferrite and the other coil change it.";

    private CoilOptionSet coil;

    @Option(names = "--current", required = true, paramLabel = "CURRENT", description = "rms coil current, e.g. 10A")
    String current;

    @Option(names = "--at", required = true, paramLabel = "X,Y,Z", description = "field point from the coil's centre, z along its axis")
    String at;

    @Option(names = "--json", description = "one JSON object with SI values")
    boolean json;

    @Spec
    void setSpec(CommandSpec s) {
        coil = CoilOptionSet.addTo(s, "", "");
    }

    @Override
    public Integer call() {
        CoilGeometry g = coil.geometry();
        double i = CliSupport.quantity("--current", current, Dimension.CURRENT);
        if (!Double.isFinite(i)) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, "--current must be finite, got " + current);
        }
        double[] p = CoupleCommand.lengths("--at", at, 3, 3);
        PhasorFlux b;
        try {
            b = PhasorFlux.of(FilamentSet.of(g.filaments()), new Complex(i, 0), p[0], p[1], p[2]);
        } catch (IllegalArgumentException e) {
            throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, "--at " + at + ": " + e.getMessage());
        }
        if (json) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("b_rms_T", b.bRms());
            Map<String, Object> v = new LinkedHashMap<>();
            v.put("x", b.bx().abs());
            v.put("y", b.by().abs());
            v.put("z", b.bz().abs());
            m.put("b_T", v);
            m.put("current_A", i);
            m.put("at_m", p);
            m.put("model", "Biot–Savart on the coil's filaments (closed-form ring and straight-segment fields)");
            m.put("caution", CAUTION);
            CliSupport.printJson(m);
        } else {
            System.out.printf("B rms          %s%n", Quantities.format(b.bRms(), Dimension.FLUX_DENSITY, 4));
            System.out.printf("  |Bx| |By| |Bz| %s  %s  %s%n", Quantities.format(b.bx().abs(), Dimension.FLUX_DENSITY, 4),
                    Quantities.format(b.by().abs(), Dimension.FLUX_DENSITY, 4), Quantities.format(b.bz().abs(), Dimension.FLUX_DENSITY, 4));
            System.out.println(CAUTION);
        }
        return ExitCodes.OK;
    }
}
