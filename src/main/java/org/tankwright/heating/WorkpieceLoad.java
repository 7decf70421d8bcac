package org.tankwright.heating;

import org.tankwright.provenance.Provenance;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.complex.Complex;
import org.tankwright.units.Constants;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;

import java.util.ArrayList;
import java.util.List;

/**
 * A workpiece in a given surface field, or inside a work coil: µr made consistent with the
 * surface field, then the power and the loaded coil's equivalent R and L.
 *
 * <p>The coil model (ours, stated): a magnetic circuit. The coil's ampere-turns N·I drive one flux
 * Φ through the bore and back around the outside. The bore over the length l_w where the workpiece
 * sits has the complex permeance µ0·[π(b² − a²) + π·a²·µr·F]/l_w (gap plus bar, F the bar's exact
 * flux factor), the rest of the bore µ0·π·b²/(l − l_w), and the outside return path a reluctance
 * R_ext = N²/L0 − l/(µ0·π·b²) fixed by the empty coil (for a Nagaoka L0 this is the short-coil
 * correction; zero for a long coil). Then Z = jω·N²/ΣR, L = Im Z/ω, R_work = Re Z, and the surface
 * field is H0 = Φ/(µ0·A_eff), below N·I/l when the return path or the empty part of the bore takes
 * a share of the ampere-turns. Assumed: the field is uniform along the loaded part of the bore
 * (no end effects of the workpiece), the workpiece outside the coil is not heated, and the coil's
 * current sheet sits at its inner radius b.
 */
public final class WorkpieceLoad {
    private static final double SQRT2 = Math.sqrt(2.0);
    private static final double MU_MAX = 1e6;
    private static final String COIL_MODEL = "bar in a work coil: magnetic circuit with exact bar permeance";
    private static final String COIL_SOURCE = "ours (docs/models.md, work coil and workpiece); bar: "
            + "classical Bessel solution; return path: Nagaoka coefficient or measured L0";

    private WorkpieceLoad() {
    }

    /**
     * The bar in a uniform axial surface field of rms strength {@code surfaceField}; µr taken from
     * the medium at the peak field √2·H0 (no iteration needed: the field is given).
     */
    public static BarResponse inField(double outerRadius, double innerRadius, WorkpieceMedium medium,
                                      double frequency, double surfaceField) {
        HeatingInputs.nonNegative("surface field", surfaceField, "A/m");
        double muR = medium.relativePermeability(SQRT2 * surfaceField);
        return AxialFieldBar.solve(outerRadius, innerRadius, medium.resistivity(), muR, frequency, surfaceField);
    }

    /** The workpiece inside the work coil at a frequency and rms coil current. */
    public static LoadedWorkCoil inCoil(WorkCoil coil, BarGeometry bar, WorkpieceMedium medium, double frequency,
                                       double coilCurrent) {
        HeatingInputs.positive("frequency", frequency, "Hz");
        HeatingInputs.nonNegative("coil current", coilCurrent, "A");
        double a = bar.outerRadius();
        double b = coil.innerRadius();
        if (a >= b) {
            throw new IllegalArgumentException("workpiece diameter " + bar.outerDiameter() + " m must be smaller than the"
                    + " coil's inner diameter " + coil.innerDiameter() + " m");
        }
        double inside = bar.lengthInside(coil.length());
        if (inside <= 0) {
            throw new IllegalArgumentException("workpiece axial offset " + bar.axialOffset() + " m puts it outside the coil"
                    + " (coil length " + coil.length() + " m, workpiece length " + bar.length() + " m)");
        }
        double rho = medium.resistivity();
        Circuit circuit = new Circuit(coil, bar, inside, rho, frequency, coilCurrent);
        double mu;
        int evaluations = 0;
        if (medium.fieldDependent()) {
            // root of h(ln µ) = ln µ − ln µr(√2·|H0(µ)|) on [0, ln MU_MAX]: h(0) ≤ 0 < h(ln MU_MAX); Brent's method
            int[] count = new int[1];
            UnivariateFunction h = lnMu -> {
                count[0]++;
                return lnMu - Math.log(medium.relativePermeability(SQRT2 * circuit.surfaceField(Math.exp(lnMu))));
            };
            double lnMu = new BrentSolver(1e-12, 1e-10).solve(200, h, 0.0, Math.log(MU_MAX));
            mu = Math.exp(lnMu);
            evaluations = count[0];
        } else {
            mu = medium.relativePermeability(SQRT2 * circuit.surfaceField(1.0));
        }
        circuit.evaluate(mu);
        double h0 = circuit.h0;
        BarResponse response = AxialFieldBar.solve(a, bar.innerRadius(), rho, mu, frequency, h0);
        double omega = 2 * Math.PI * frequency;
        double l = circuit.z.getImaginary() / omega;
        return new LoadedWorkCoil(frequency, coilCurrent, coil.emptyInductance(), l, circuit.z.getReal(),
                coil.resistance(), h0, inside, response, evaluations, provenance(coil, bar, medium, inside));
    }

    private static Provenance provenance(WorkCoil coil, BarGeometry bar, WorkpieceMedium medium, double inside) {
        List<String> notes = new ArrayList<>();
        boolean valid = true;
        notes.add("field uniform along the loaded bore; workpiece end effects not modelled; µr and ρ uniform in the"
                + " workpiece (surface values)");
        if (coil.turns() * coil.turns() / coil.emptyInductance() < coil.boreReluctance()) {
            notes.add("the given empty inductance exceeds the current-sheet long-coil value µ0·N²·π·b²/l at the coil's"
                    + " inner radius; return-path reluctance taken as zero");
        }
        if (coil.length() < coil.innerDiameter()) {
            notes.add("coil shorter than its diameter: the fixed return-path approximation is rough here");
        }
        if (inside < bar.length()) {
            notes.add("only the " + Quantities.format(inside, Dimension.LENGTH, 3) + " of workpiece inside the coil is"
                    + " counted; the part outside is not heated in this model");
        }
        String range = medium.rangeWarning();
        if (range != null) {
            valid = false;
            notes.add(range);
        }
        if (medium.fieldDependent()) {
            notes.add("µr from the material's B–H curve at the peak surface field; the saturated skin layer is"
                    + " treated with that one µr (linear theory)");
        }
        return new Provenance(COIL_MODEL, COIL_SOURCE, valid, notes);
    }

    /** The coil's magnetic circuit for one µr; mutable scratch kept inside one solve. */
    private static final class Circuit {
        private final double a;
        private final double c;
        private final double gapArea;
        private final double loadedLength;
        private final double restReluctance;
        private final double rho;
        private final double frequency;
        private final double ampereTurns;
        private final double turns;
        private Complex z = Complex.ZERO;
        private double h0;

        Circuit(WorkCoil coil, BarGeometry bar, double inside, double rho, double frequency, double current) {
            double b = coil.innerRadius();
            this.a = bar.outerRadius();
            this.c = bar.innerRadius();
            this.gapArea = Math.PI * (b * b - a * a);
            this.loadedLength = inside;
            this.restReluctance = (coil.length() - inside) / (Constants.MU0 * Math.PI * b * b)
                    + coil.returnReluctance();
            this.rho = rho;
            this.frequency = frequency;
            this.turns = coil.turns();
            this.ampereTurns = coil.turns() * current;
        }

        double surfaceField(double mu) {
            evaluate(mu);
            return h0;
        }

        void evaluate(double mu) {
            double delta = ReferenceDepth.of(rho, frequency, mu);
            Complex f = AxialFieldBar.fluxFactor(a, c, delta, mu);
            Complex area = f.multiply(Math.PI * a * a * mu).add(gapArea);
            Complex loaded = area.multiply(Constants.MU0).reciprocal().multiply(loadedLength);
            Complex total = loaded.add(restReluctance);
            double omega = 2 * Math.PI * frequency;
            z = Complex.I.multiply(omega * turns * turns).divide(total);
            h0 = ampereTurns / (Constants.MU0 * area.multiply(total).abs());
        }
    }
}
