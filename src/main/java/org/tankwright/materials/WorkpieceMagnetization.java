package org.tankwright.materials;

import org.tankwright.units.Constants;

/**
 * The magnetic behaviour of a ferromagnetic workpiece: its normal magnetization curve at 20 °C
 * and its Curie point, giving the relative permeability µr = B/(µ0·H) at a field strength and a
 * temperature.
 *
 * <p>Model (ours, stated): the polarization J = B − µ0·H is read from the tabulated curve by
 * straight-line interpolation of ln J against ln H (exact for J ∝ H at low field); beyond the last point J stays at its last value (saturation), so
 * µr = 1 + J_s/(µ0·H) at heating fields; below the first point µr keeps its first value. With
 * temperature J is scaled by the reduced spontaneous magnetization m(T)/m(20 °C), with
 * m(τ) = [1 − s·τ^{3/2} − (1 − s)·τ^{5/2}]^{1/3}, τ = T/T_C in kelvin (Kuz'min, Phys. Rev.
 * Lett. 94, 107204 (2005); form and s recalled from memory); at and above the Curie point µr = 1.
 * Scaling the whole curve by m(T) is right in saturation (heating fields) and ignores the rise of
 * low-field permeability just below the Curie point.
 *
 * @param bh          normal magnetization curve at 20 °C: field strength H (A/m, peak) → flux density B (T)
 * @param curieC      Curie point in °C
 * @param shapeS      Kuz'min shape parameter s (0.35 for iron, from memory)
 * @param curieSource where the Curie point comes from
 */
public record WorkpieceMagnetization(WorkpieceCurve bh, double curieC, double shapeS, String curieSource) {
    private static final double REFERENCE_C = Constants.REFERENCE_TEMPERATURE_C;

    public WorkpieceMagnetization {
        if (bh == null) {
            throw new IllegalArgumentException("a magnetic material needs a magnetization curve (H → B)");
        }
        double[] h = bh.xs();
        double[] b = bh.ys();
        for (int i = 0; i < h.length; i++) {
            if (h[i] <= 0 || b[i] <= Constants.MU0 * h[i]) {
                throw new IllegalArgumentException("magnetization curve point " + i + " (H = " + h[i] + " A/m, B = "
                        + b[i] + " T) must have H > 0 and B > µ0·H (a ferromagnet)");
            }
        }
        if (!(curieC > REFERENCE_C && curieC < 2000)) {
            throw new IllegalArgumentException("Curie point " + curieC + " °C must lie between 20 °C and 2000 °C");
        }
        if (!(shapeS >= 0 && shapeS < 2.5)) {
            throw new IllegalArgumentException("magnetization shape parameter s = " + shapeS + " must lie in [0, 2.5)");
        }
        curieSource = curieSource == null ? "" : curieSource;
    }

    /**
     * A curve of the shape J = J_s·tanh((µi − 1)·µ0·H/J_s), sampled at log-spaced fields, for a
     * material known only by its saturation polarization and initial relative permeability.
     */
    public static WorkpieceMagnetization fromSaturation(double saturationT, double initialMuR, double curieC,
                                                        double shapeS, String source) {
        if (!(saturationT > 0 && saturationT < 3)) {
            throw new IllegalArgumentException("saturation polarization " + saturationT + " T must lie in (0, 3) T");
        }
        if (!(initialMuR > 1 && initialMuR < 1e6)) {
            throw new IllegalArgumentException("initial relative permeability " + initialMuR + " must lie in (1, 10⁶)");
        }
        int n = 41;
        double[] h = new double[n];
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            h[i] = Math.pow(10.0, 0.5 + 0.15 * i); // 3.2 A/m … 3.2·10⁶ A/m
            double mu0h = Constants.MU0 * h[i];
            b[i] = mu0h + saturationT * Math.tanh((initialMuR - 1) * mu0h / saturationT);
        }
        return new WorkpieceMagnetization(new WorkpieceCurve(h, b, source), curieC, shapeS, source);
    }

    /** Relative permeability B/(µ0·H) at a peak field strength {@code hPeak} (A/m) and temperature (°C). */
    public double relativePermeability(double hPeak, double temperatureC) {
        double m = reducedMagnetization(temperatureC);
        if (m <= 0) {
            return 1.0;
        }
        double[] h = bh.xs();
        double[] b = bh.ys();
        int n = h.length;
        double polarization;
        double hh = Math.max(hPeak, 1e-9);
        if (hh <= h[0]) {
            polarization = (b[0] / (Constants.MU0 * h[0]) - 1.0) * Constants.MU0 * hh; // µr held at its first value
        } else if (hh >= h[n - 1]) {
            polarization = b[n - 1] - Constants.MU0 * h[n - 1];
        } else {
            int hi = 1;
            while (h[hi] < hh) {
                hi++;
            }
            int lo = hi - 1;
            double t = Math.log(hh / h[lo]) / Math.log(h[hi] / h[lo]);
            double jLo = b[lo] - Constants.MU0 * h[lo];
            double jHi = b[hi] - Constants.MU0 * h[hi];
            polarization = jLo * Math.pow(jHi / jLo, t);
        }
        return 1.0 + m * polarization / (Constants.MU0 * hh);
    }

    /** Whether the material is ferromagnetic at this temperature (below its Curie point). */
    public boolean magneticAt(double temperatureC) {
        return temperatureC < curieC;
    }

    /** m(T)/m(20 °C): the spontaneous magnetization relative to room temperature, 0 at and above the Curie point. */
    public double reducedMagnetization(double temperatureC) {
        if (temperatureC >= curieC) {
            return 0.0;
        }
        return kuzmin(Math.max(temperatureC, -273.0)) / kuzmin(REFERENCE_C);
    }

    private double kuzmin(double temperatureC) {
        double tau = (temperatureC + Constants.ZERO_CELSIUS_K) / (curieC + Constants.ZERO_CELSIUS_K);
        double inner = 1.0 - shapeS * Math.pow(tau, 1.5) - (1.0 - shapeS) * Math.pow(tau, 2.5);
        return Math.cbrt(Math.max(inner, 0.0));
    }
}
