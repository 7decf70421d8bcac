package org.tankwright.magnetics;

import java.util.ArrayList;
import java.util.List;
import org.tankwright.materials.Conductor;
import org.tankwright.units.Constants;

/** Lists every applicable inductance model for a geometry, most accurate first. */
final class InductanceModels {
    private InductanceModels() {
    }

    static List<InductanceEstimate> all(CoilGeometry g, List<Filament> filaments) {
        List<InductanceEstimate> out = new ArrayList<>();
        if (g instanceof SingleLayerSolenoid s) {
            solenoid(s, out);
        } else if (g instanceof MultilayerSolenoid m) {
            out.add(filament(FilamentSum.multilayer(m), "filament", ringSource()));
            double a = m.meanRadius();
            double b = m.windingLength();
            double c = m.windingDepth();
            double lo = Math.min(6 * a, Math.min(9 * b, 10 * c));
            double hi = Math.max(6 * a, Math.max(9 * b, 10 * c));
            out.add(new InductanceEstimate("wheeler", InductanceFormulas.wheelerMultilayer(a, b, c, m.turns()),
                    "Wheeler, Proc. IRE 16(10), 1928 (multilayer)", hi <= 3 * lo,
                    "±1 % when the denominator terms 6a, 9b, 10c are comparable (largest ≤ 3 × smallest here: "
                            + fmt(hi / lo) + ")"));
        } else if (g instanceof FlatSpiral f) {
            out.add(filament(FilamentSum.selfInductance(filaments), "filament", ringSource()));
            double a = 0.25 * (f.outerDiameter() + f.innerDiameter());
            double c = 0.5 * (f.outerDiameter() - f.innerDiameter());
            out.add(mohanSheet(InductanceFormulas.MohanShape.CIRCLE, f.turns(), f.outerDiameter(), f.innerDiameter(),
                    f.pitch(), f.conductor()));
            out.add(new InductanceEstimate("wheeler", InductanceFormulas.wheelerFlatSpiral(a, c, f.turns()),
                    "Wheeler, Proc. IRE 16(10), 1928 (flat spiral)", c > 0.2 * a,
                    "about 5 % for a winding width c > 0.2 × mean radius (here " + fmt(c / a) + ")"));
        } else if (g instanceof PolygonSpiral p) {
            out.add(filament(FilamentSum.selfInductanceRotational(filaments, p.sides()), "filament",
                    segmentSource()));
            InductanceFormulas.MohanShape shape = InductanceFormulas.MohanShape.ofSides(p.sides());
            out.add(mohanWheeler(shape, p.turns(), p.outerAcrossFlats(), p.innerAcrossFlats(), p.pitch(),
                    p.conductor()));
            out.add(mohanSheet(shape, p.turns(), p.outerAcrossFlats(), p.innerAcrossFlats(), p.pitch(),
                    p.conductor()));
        } else if (g instanceof RectangularSpiral) {
            out.add(filament(FilamentSum.selfInductance(filaments), "filament", segmentSource()));
        } else if (g instanceof SingleLoop loop) {
            double r = loop.meanRadius();
            double a = loop.conductor().equivalentRadius();
            boolean ok = r > 5 * a;
            String range = "R ≫ a (R/a = " + fmt(r / a) + "; valid above 5)";
            out.add(new InductanceEstimate("loop", MutualKernels.ringSelf(r, a),
                    "Grover 1946: µ0R(ln(8R/a) − 2 + Y), Y = 1/4 uniform current", ok, range));
            out.add(new InductanceEstimate("loop-hf", Constants.MU0 * r * (Math.log(8 * r / a) - 2),
                    "Grover 1946: µ0R(ln(8R/a) − 2 + Y), Y = 0 full skin effect", ok, range));
        }
        return out;
    }

    private static void solenoid(SingleLayerSolenoid s, List<InductanceEstimate> out) {
        double r = s.meanRadius();
        double len = s.length();
        int n = s.turns();
        double a = s.conductor().equivalentRadius();
        // filament sum with translational symmetry: L = N·self + 2 Σ (N − k) M(k p)
        double l = n * MutualKernels.ringSelf(r, a);
        for (int k = 1; k < n; k++) {
            l += 2.0 * (n - k) * MutualKernels.coaxialRings(r, r, k * s.pitch());
        }
        double sheet = InductanceFormulas.currentSheet(r, len, n);
        out.add(filament(l, "filament", ringSource()));
        double wireDiameter = 2 * a; // round wire of the same self-GMD
        double correction = InductanceFormulas.rosaCorrection(r, s.pitch(), wireDiameter, n);
        boolean rosaOk = s.pitch() <= 0.25 * r;
        out.add(new InductanceEstimate("rosa", sheet - correction,
                "Lorenz/Nagaoka current sheet less Rosa's round-wire correction (Rosa, Bull. Bureau of Standards 2, "
                        + "1907; Rosa & Grover 1912)", rosaOk,
                "pitch ≪ radius (pitch/radius = " + fmt(s.pitch() / r) + "; valid up to 0.25)"));
        out.add(new InductanceEstimate("current-sheet", sheet,
                "Lorenz current sheet with Nagaoka's coefficient (Nagaoka 1909; Grover 1946)", true,
                "ideal sheet of length turns × pitch; differs from this round-wire coil by Rosa's correction ("
                        + fmt(100 * correction / sheet) + " %)"));
        out.add(new InductanceEstimate("wheeler", InductanceFormulas.wheelerSingleLayer(r, len, n),
                SRC_WHEELER_SINGLE, len > 0.8 * r,
                "±1 % of the current sheet for length > 0.8 × radius (here " + fmt(len / r) + ")"));
    }

    private static final String SRC_WHEELER_SINGLE = "Wheeler, Proc. IRE 16(10), 1928 (single layer)";

    private static InductanceEstimate mohanWheeler(InductanceFormulas.MohanShape shape, int n, double dout,
            double din, double pitch, Conductor c) {
        double w = c.footprintWidth();
        double s = Math.max(0, pitch - w);
        return new InductanceEstimate("mohan-wheeler", InductanceFormulas.mohanWheeler(shape, n, dout, din),
                "Mohan et al., IEEE JSSC 34(10), 1999: modified Wheeler", n >= 2,
                "typical error 2–3 % stated by Mohan 1999; spacing/width = " + fmt(s / w));
    }

    private static InductanceEstimate mohanSheet(InductanceFormulas.MohanShape shape, int n, double dout, double din,
            double pitch, Conductor c) {
        double w = c.footprintWidth();
        double s = Math.max(0, pitch - w);
        boolean ok = n >= 2 && s <= 3 * w;
        return new InductanceEstimate("mohan-current-sheet", InductanceFormulas.mohanCurrentSheet(shape, n, dout, din),
                "Mohan et al., IEEE JSSC 34(10), 1999: current-sheet approximation", ok,
                "typical error 2–3 %, worse for spacing > 3 × width (Mohan 1999); spacing/width = " + fmt(s / w));
    }

    private static InductanceEstimate filament(double l, String name, String source) {
        return new InductanceEstimate(name, l, source, true,
                "reference: converges to the real coil (turns as coaxial loops or straight segments at the "
                        + "conductor's centre; helix pitch angle and turn-to-turn steps neglected)");
    }

    private static String ringSource() {
        return "filament sum: ring self terms µ0R(ln(8R/a) − 7/4) and Maxwell mutual terms (Grover 1946)";
    }

    private static String segmentSource() {
        return "segment sum: straight-filament self and Neumann mutual terms (Greenhouse, IEEE Trans. PHP 10(2), "
                + "1974; Grover 1946)";
    }

    /** Two decimals (three significant digits below 1), cheaply: notes are built on every recompute. */
    private static String fmt(double v) {
        double scale = Math.abs(v) < 1 ? 1000.0 : 100.0;
        return String.valueOf(Math.round(v * scale) / scale);
    }
}
