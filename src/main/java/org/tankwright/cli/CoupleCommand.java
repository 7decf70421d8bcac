package org.tankwright.cli;

import org.tankwright.coupling.BackingPlate;
import org.tankwright.coupling.CoupledCoils;
import org.tankwright.coupling.CouplingRange;
import org.tankwright.coupling.CouplingResult;
import org.tankwright.coupling.CouplingSweep;
import org.tankwright.coupling.ShieldLoss;
import org.tankwright.magnetics.CoilGeometry;
import org.tankwright.magnetics.CoilModel;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;

/** {@code tankwright couple}: mutual inductance and coupling factor of two coils, with sweeps. */
@Command(name = "couple", mixinStandardHelpOptions = true,
        description = {"Mutual inductance M and coupling factor k of two coils with parallel axes, coil b above coil a.",
                "Each coil takes the options of 'tankwright coil' prefixed --a- or --b-; plates behind the coils",
                "(ferrite or metal) by the image method. M > 0 when both currents run counter-clockwise seen from +z."})
public final class CoupleCommand implements Callable<Integer> {
    private static final String[][] PLATE_OPTIONS = {
            {"plate", "KIND", "plate behind the coil: ferrite, metal or none (default none)"},
            {"plate-mu", "NUMBER", "relative permeability of a ferrite plate (default 2000)"},
            {"plate-thickness", "LENGTH", "plate thickness (default 5 mm)"},
            {"plate-spacing", "LENGTH", "conductor surface to plate surface (default 0)"},
            {"plate-resistivity", "RESISTIVITY", "metal plate resistivity (default aluminium 2.82e-8 Ω·m)"},
            {"plate-coefficient", "NUMBER", "measured image coefficient in [-1, 1], overriding the computed one"},
    };

    private CoilOptionSet coilA;
    private CoilOptionSet coilB;
    private CommandSpec spec;

    @Option(names = "--distance", paramLabel = "LENGTH", description = "axial distance between the two windings' mean planes")
    String distance;

    @Option(names = "--gap", paramLabel = "LENGTH", description = "conductor surface to conductor surface along the axis (covers not included)")
    String gap;

    @Option(names = "--offset", paramLabel = "DX[,DY]", description = "lateral offset of coil b's axis in coil a's frame (default 0)")
    String offset;

    @Option(names = "--gap-sweep", paramLabel = "MIN,MAX[,N]", description = "sweep the gap (N points, default 21)")
    String gapSweep;

    @Option(names = "--offset-sweep", paramLabel = "MIN,MAX[,N]", description = "sweep the offset along x (N points, default 21)")
    String offsetSweep;

    @Option(names = "--null", description = "find the offset along x at which M changes sign")
    boolean findNull;

    @Option(names = "--envelope", paramLabel = "GAPMIN,GAPMAX,OFFSETMAX",
            description = "coupling range over the misalignment envelope (its interior is searched, not only its corners)")
    String envelope;

    @Option(names = "--json", description = "one JSON object with SI values")
    boolean json;

    @Option(names = "--csv", description = "the sweep as CSV (gap_m,offset_m,mutual_H,k,inductance_a_H,inductance_b_H)")
    boolean csv;

    @Spec
    void setSpec(CommandSpec s) {
        spec = s;
        coilA = CoilOptionSet.addTo(s, "a-", "a");
        coilB = CoilOptionSet.addTo(s, "b-", "b");
        for (String c : new String[] {"a", "b"}) {
            for (String[] o : PLATE_OPTIONS) {
                s.addOption(OptionSpec.builder("--" + c + "-" + o[0]).type(String.class).paramLabel(o[1])
                        .description("coil " + c + ": " + o[2]).build());
            }
        }
    }

    @Override
    public Integer call() {
        CoupledCoils link = link();
        double[] off = offset == null ? new double[] {0, 0} : lengths("--offset", offset, 1, 2);
        double dx = off[0];
        double dy = off.length > 1 ? off[1] : 0;
        if (distance != null && gap != null) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, "give --distance or --gap, not both");
        }
        double dist;
        if (distance != null) {
            dist = CliSupport.quantity("--distance", distance, Dimension.LENGTH);
        } else if (gap != null) {
            dist = link.distanceForGap(CliSupport.quantity("--gap", gap, Dimension.LENGTH));
        } else if (gapSweep == null && envelope == null) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, "--distance or --gap is required (or a --gap-sweep or --envelope)");
        } else {
            dist = Double.NaN;
        }
        if (!Double.isNaN(dist) && link.gapForDistance(dist) < 0) {
            throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, String.format(Locale.ROOT,
                    "the coils overlap: gap %s; the smallest --distance is %s", fmt(link.gapForDistance(dist)), fmt(link.distanceForGap(0))));
        }
        CouplingResult at = Double.isNaN(dist) ? null : link.at(dist, dx, dy);
        List<CouplingResult> sweep = sweep(link, dist, dx, dy);
        OptionalDouble nul = findNull && at != null ? CouplingSweep.nullOffset(link, at.gap(), 0, 2 * link.radiusSum()) : OptionalDouble.empty();
        CouplingRange range = envelope == null ? null : envelope(link);
        Map<String, ShieldLoss.Result> shields = shields(link);
        if (csv) {
            printCsv(sweep.isEmpty() && at != null ? List.of(at) : sweep);
        } else if (json) {
            Map<String, Object> m = toJson(at, sweep, nul, range);
            shields.forEach((c, r) -> m.put("shield_resistance_" + c + "_ohm", r.resistance()));
            CliSupport.printJson(m);
        } else {
            printText(at, sweep, nul, range);
            shields.forEach((c, r) -> {
                System.out.printf("shield loss %s  %s in series with coil %s (skin depth %s)%n", c,
                        Quantities.format(r.resistance(), Dimension.RESISTANCE, 3), c, fmt(r.skinDepth()));
                r.provenance().notes().forEach(n -> System.out.println("note           " + n));
            });
        }
        return ExitCodes.OK;
    }

    /** The eddy loss of each metal shield at its coil's operating frequency (--a-frequency, --b-frequency). */
    private Map<String, ShieldLoss.Result> shields(CoupledCoils link) {
        Map<String, ShieldLoss.Result> out = new LinkedHashMap<>();
        try {
            link.shieldLoss(true, coilA.frequency()).ifPresent(r -> out.put("a", r));
            link.shieldLoss(false, coilB.frequency()).ifPresent(r -> out.put("b", r));
        } catch (IllegalArgumentException e) {
            throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, "shield loss: " + e.getMessage());
        }
        return out;
    }

    private CoupledCoils link() {
        CoupledCoils.Coil a = coil("a", coilA);
        CoupledCoils.Coil b = coil("b", coilB);
        return new CoupledCoils(a, b);
    }

    private CoupledCoils.Coil coil(String name, CoilOptionSet options) {
        CoilGeometry g = options.geometry();
        // the coil model's chosen self-inductance (the most accurate valid model), as `tankwright coil` reports it
        double l = CoilModel.of(g).inductance();
        return new CoupledCoils.Coil(name, g.filaments(), l, plate(name), -g.zMin(), g.zMax());
    }

    private String plateText(String c, String o) {
        OptionSpec spec1 = spec.findOption("--" + c + "-" + o);
        return spec1 == null ? null : spec1.getValue();
    }

    private BackingPlate plate(String c) {
        String kind = plateText(c, "plate");
        if (kind == null || kind.equalsIgnoreCase("none")) {
            return null;
        }
        String p = "--" + c + "-plate";
        double thickness = CliSupport.quantity(p + "-thickness", plateText(c, "plate-thickness"), Dimension.LENGTH, 0.005);
        double spacing = CliSupport.quantity(p + "-spacing", plateText(c, "plate-spacing"), Dimension.LENGTH, 0);
        BackingPlate plate;
        try {
            if (kind.equalsIgnoreCase("ferrite")) {
                double mu = CliSupport.quantity(p + "-mu", plateText(c, "plate-mu"), Dimension.DIMENSIONLESS, 2000);
                plate = BackingPlate.ferrite(mu, thickness, spacing);
            } else if (kind.equalsIgnoreCase("metal")) {
                double rho = CliSupport.quantity(p + "-resistivity", plateText(c, "plate-resistivity"), Dimension.RESISTIVITY, 2.82e-8);
                plate = BackingPlate.metal(rho, thickness, spacing);
            } else {
                throw new ExitCodes.UserError(ExitCodes.USAGE, p + " = '" + kind + "': allowed are ferrite, metal, none");
            }
            String coef = plateText(c, "plate-coefficient");
            if (coef != null) {
                plate = plate.withMeasuredCoefficient(CliSupport.quantity(p + "-coefficient", coef, Dimension.DIMENSIONLESS));
            }
        } catch (IllegalArgumentException e) {
            throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, p + ": " + e.getMessage());
        }
        return plate;
    }

    private List<CouplingResult> sweep(CoupledCoils link, double dist, double dx, double dy) {
        if (gapSweep == null && offsetSweep == null) {
            return List.of();
        }
        if (gapSweep == null && Double.isNaN(dist)) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, "--offset-sweep needs --gap, --distance or --gap-sweep");
        }
        double[] gaps = gapSweep == null ? new double[] {link.gapForDistance(dist)} : range("--gap-sweep", gapSweep);
        double[] offs = offsetSweep == null ? new double[] {Math.hypot(dx, dy)} : range("--offset-sweep", offsetSweep);
        for (double g : gaps) {
            if (g < 0) {
                throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, "--gap-sweep: gaps must be ≥ 0, got " + fmt(g));
            }
        }
        CouplingResult[][] map = CouplingSweep.map(link, gaps, offs);
        List<CouplingResult> out = new ArrayList<>();
        for (CouplingResult[] row : map) {
            out.addAll(List.of(row));
        }
        return out;
    }

    private CouplingRange envelope(CoupledCoils link) {
        double[] e = lengths("--envelope", envelope, 3, 3);
        if (!(e[0] >= 0 && e[1] >= e[0] && e[2] >= 0)) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, "--envelope: need 0 ≤ GAPMIN ≤ GAPMAX and OFFSETMAX ≥ 0, got " + envelope);
        }
        return CouplingSweep.range(link, e[0], e[1], e[2]);
    }

    private static double[] range(String option, String text) {
        String[] parts = text.split(",");
        if (parts.length < 2 || parts.length > 3) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, option + " = '" + text + "': write MIN,MAX or MIN,MAX,N");
        }
        double lo = CliSupport.quantity(option, parts[0], Dimension.LENGTH);
        double hi = CliSupport.quantity(option, parts[1], Dimension.LENGTH);
        int n = 21;
        if (parts.length == 3) {
            try {
                n = Integer.parseInt(parts[2].trim());
            } catch (NumberFormatException e) {
                n = -1;
            }
            if (n < 1 || n > 10000) {
                throw new ExitCodes.UserError(ExitCodes.USAGE, option + ": N = '" + parts[2] + "' must be a whole number from 1 to 10000");
            }
        }
        if (!(hi >= lo)) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, option + ": MAX must be ≥ MIN, got " + text);
        }
        return CouplingSweep.linspace(lo, hi, n);
    }

    static double[] lengths(String option, String text, int min, int max) {
        String[] parts = text.split(",");
        if (parts.length < min || parts.length > max) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, option + " = '" + text + "': expected " + (min == max ? min : min + " to " + max)
                    + " comma-separated lengths");
        }
        double[] v = new double[parts.length];
        for (int i = 0; i < parts.length; i++) {
            v[i] = CliSupport.quantity(option, parts[i], Dimension.LENGTH);
        }
        return v;
    }

    private static Map<String, Object> point(CouplingResult r) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("gap_m", r.gap());
        m.put("offset_m", r.offset());
        m.put("mutual_H", r.mutual());
        m.put("k", r.k());
        m.put("inductance_a_H", r.inductanceA());
        m.put("inductance_b_H", r.inductanceB());
        return m;
    }

    private static Map<String, Object> toJson(CouplingResult at, List<CouplingResult> sweep, OptionalDouble nul, CouplingRange range) {
        Map<String, Object> m = new LinkedHashMap<>();
        CouplingResult any = at != null ? at : !sweep.isEmpty() ? sweep.get(0) : range.highest();
        if (at != null) {
            m.putAll(point(at));
            m.put("distance_m", at.distance());
            m.put("offset_x_m", at.offsetX());
            m.put("offset_y_m", at.offsetY());
        }
        m.put("model", any.provenance().model());
        m.put("source", any.provenance().source());
        m.put("valid", any.provenance().valid());
        m.put("notes", any.provenance().notes());
        if (!sweep.isEmpty()) {
            List<Map<String, Object>> list = new ArrayList<>();
            for (CouplingResult r : sweep) {
                list.add(point(r));
            }
            m.put("sweep", list);
        }
        if (nul.isPresent()) {
            m.put("null_offset_m", nul.getAsDouble());
        }
        if (range != null) {
            Map<String, Object> r = new LinkedHashMap<>();
            r.put("gap_min_m", range.gapMin());
            r.put("gap_max_m", range.gapMax());
            r.put("offset_max_m", range.offsetMax());
            r.put("k_min", range.lowest().k());
            r.put("k_max", range.highest().k());
            r.put("at_k_min", point(range.lowest()));
            r.put("at_k_max", point(range.highest()));
            r.put("contains_null", range.containsNull());
            m.put("range", r);
        }
        return m;
    }

    private static void printCsv(List<CouplingResult> rows) {
        System.out.println("gap_m,offset_m,mutual_H,k,inductance_a_H,inductance_b_H");
        for (CouplingResult r : rows) {
            System.out.printf(Locale.ROOT, "%.9g,%.9g,%.9g,%.9g,%.9g,%.9g%n", r.gap(), r.offset(), r.mutual(), r.k(), r.inductanceA(), r.inductanceB());
        }
    }

    private static String fmt(double metres) {
        return Quantities.format(metres, Dimension.LENGTH, 4);
    }

    private static void printText(CouplingResult at, List<CouplingResult> sweep, OptionalDouble nul, CouplingRange range) {
        CouplingResult any = at != null ? at : !sweep.isEmpty() ? sweep.get(0) : range.highest();
        if (at != null) {
            System.out.printf("gap            %s (distance between mean planes %s)%n", fmt(at.gap()), fmt(at.distance()));
            System.out.printf("offset         %s, %s%n", fmt(at.offsetX()), fmt(at.offsetY()));
            System.out.printf("mutual M       %s%n", Quantities.format(at.mutual(), Dimension.INDUCTANCE, 5));
            System.out.printf("coupling k     %s%n", Quantities.number(at.k(), 5));
            System.out.printf("L_a in place   %s%n", Quantities.format(at.inductanceA(), Dimension.INDUCTANCE, 5));
            System.out.printf("L_b in place   %s%n", Quantities.format(at.inductanceB(), Dimension.INDUCTANCE, 5));
        }
        if (!sweep.isEmpty()) {
            System.out.printf("%n%-12s %-12s %-14s %-10s %-14s %-14s%n", "gap", "offset", "M", "k", "L_a", "L_b");
            for (CouplingResult r : sweep) {
                System.out.printf("%-12s %-12s %-14s %-10s %-14s %-14s%n", fmt(r.gap()), fmt(r.offset()),
                        Quantities.format(r.mutual(), Dimension.INDUCTANCE, 4), Quantities.number(r.k(), 4),
                        Quantities.format(r.inductanceA(), Dimension.INDUCTANCE, 4), Quantities.format(r.inductanceB(), Dimension.INDUCTANCE, 4));
            }
        }
        if (nul.isPresent()) {
            System.out.printf("%ncoupling null  M changes sign at an offset of %s%n", fmt(nul.getAsDouble()));
        }
        if (range != null) {
            System.out.printf("%nenvelope       gap %s to %s, offset up to %s%n", fmt(range.gapMin()), fmt(range.gapMax()), fmt(range.offsetMax()));
            System.out.printf("k range        %s (gap %s, offset %s) to %s (gap %s, offset %s)%s%n",
                    Quantities.number(range.lowest().k(), 4), fmt(range.lowest().gap()), fmt(range.lowest().offset()),
                    Quantities.number(range.highest().k(), 4), fmt(range.highest().gap()), fmt(range.highest().offset()),
                    range.containsNull() ? "  — a coupling null lies inside the envelope" : "");
        }
        System.out.printf("%nmodel          %s%nsource         %s%nvalid          %s%n", any.provenance().model(), any.provenance().source(),
                any.provenance().valid() ? "yes" : "NO — see notes");
        for (String note : any.provenance().notes()) {
            System.out.println("note           " + note);
        }
    }
}
