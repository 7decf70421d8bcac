package org.tankwright.coupling;

import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.tankwright.units.Constants;

import java.util.concurrent.ConcurrentHashMap;

/**
 * The spectral (Hankel-transform) form of the link for round coils whose rings are all centred on
 * their axis. Two coaxial rings couple as M = µ0πR1R2 ∫₀^∞ J1(kR1) J1(kR2) e^{−k|z|} dk, a lateral
 * offset d multiplies the integrand by J0(kd) (Smythe, <i>Static and Dynamic Electricity</i> §7.13–7.14;
 * the same transform underlies Grover's and Babic's single integrals). Sums over the rings then
 * factor into one function of k per coil, and the images in two plates sum in closed form: with
 * x = Γ_A Γ_B e^{−2kL},
 * <pre>
 * M = µ0π ∫ J0(kd) [U_a D_b e^{−kΔ} + Γ_A D_a D_b e^{−k(hA_a+hA_b)} + Γ_B U_a U_b e^{−k(hB_a+hB_b)}
 *                   + Γ_A Γ_B D_a U_b e^{−k(hA_a+hB_b+L)}] / (1 − x) dk
 * ΔL_a = µ0π ∫ [Γ_A D_a² e^{−2k hA_a} + Γ_B U_a² e^{−2k hB_a} + 2Γ_AΓ_B D_a U_a e^{−k(hA_a+hB_a+L)}] / (1 − x) dk
 * </pre>
 * where U = Σ R J1(kR) e^{−k(z_top − z)} and D = Σ R J1(kR) e^{−k(z − z_bottom)} over a coil's rings,
 * Δ the height from a's top ring to b's bottom ring, hA/hB the heights of a coil's bottom/top rings
 * above plate A/below plate B, and Γ(k) the plate's exact slab reflection at wavenumber k
 * ({@link BackingPlate}), so thin tiles need no single-wavenumber approximation here.
 * The integral runs to k = 27/(smallest exponent length) in 8-point Gauss–Legendre panels of half
 * the fastest oscillation period; the ring sums are tabulated once per panel width.
 */
final class SpectralLink {
    private static final int ORDER = 8;
    private static final double[] GX = new double[ORDER];
    private static final double[] GW = new double[ORDER];
    private static final double DECAY = 20;
    private static final int MAX_PANELS = 1 << 16;
    /**
     * With plates on both sides, 1/(1 − Γ_AΓ_B e^{−2kL}) has a pole at k ≈ −ln(Γ_AΓ_B)/(2L), close to
     * k = 0 when both plates reflect almost fully, and coils far apart make the integrand decay within
     * the first panel; in both cases the first panel is split geometrically
     * (widths h/2, h/4, … h/2^GRADING) so that every sub-panel sees the pole at least its own width away.
     */
    private static final int GRADING = 24;
    private static final int GRADED_NODES = (GRADING + 1) * ORDER;

    static {
        GaussIntegrator rule = new GaussIntegratorFactory().legendre(ORDER);
        for (int i = 0; i < ORDER; i++) {
            GX[i] = rule.getPoint(i);
            GW[i] = rule.getWeight(i);
        }
    }

    private final FilamentSet a;
    private final FilamentSet b;
    private final BackingPlate plateA;
    private final BackingPlate plateB;
    private final double etaAFixed;
    private final double etaBFixed;
    private final double aTop;
    private final double aBottom;
    private final double bTop;
    private final double bBottom;
    private final double radiusSum;
    private final ConcurrentHashMap<Integer, Table> tables = new ConcurrentHashMap<>();

    /** Coil tables on one node grid: nodes, weights, and U, D of both coils, and Γ of both plates. */
    private record Table(double h, int panels, double[] k, double[] w, double[] ua, double[] da, double[] ub,
                         double[] db, double[] ga, double[] gb) {
    }

    SpectralLink(FilamentSet a, FilamentSet b, BackingPlate plateA, BackingPlate plateB) {
        this.a = a;
        this.b = b;
        this.plateA = plateA;
        this.plateB = plateB;
        etaAFixed = plateA == null ? 0 : plateA.measuredCoefficient();
        etaBFixed = plateB == null ? 0 : plateB.measuredCoefficient();
        aTop = maxZ(a);
        aBottom = minZ(a);
        bTop = maxZ(b);
        bBottom = minZ(b);
        // fastest oscillation of the integrands: J1(kR_a)J1(kR_b) for M, J1(kR)² for the self terms
        radiusSum = 2 * Math.max(maxR(a), maxR(b));
    }

    static boolean applicable(FilamentSet s) {
        return s.axisymmetric();
    }

    /** Result of one placement: M, ΔL_a, ΔL_b in henries. */
    record Values(double mutual, double deltaA, double deltaB) {
    }

    /**
     * M and the image changes of L_a, L_b with b's local frame at height {@code distance} and lateral
     * offset {@code d}; plate A's surface at zA, plate B's at zB (ignored when a plate is absent).
     */
    Values solve(double distance, double d, double zA, double zB) {
        boolean hasA = plateA != null;
        boolean hasB = plateB != null;
        double delta = distance + bBottom - aTop;
        double hAa = aBottom - zA;
        double hAb = distance + bBottom - zA;
        double hBa = zB - aTop;
        double hBb = zB - distance - bTop;
        double len = zB - zA;
        double minLen = delta;
        if (hasA) {
            minLen = Math.min(minLen, 2 * hAa);
        }
        if (hasB) {
            minLen = Math.min(minLen, 2 * hBb);
        }
        if (!(minLen > 0)) {
            throw new IllegalArgumentException("coil rings touch or cross a plate or each other");
        }
        double kMax = DECAY / minLen;
        Table t = table(d, kMax);
        double m = 0;
        double la = 0;
        double lb = 0;
        // split the first panel when both plates reflect, or when the integrand decays within one panel
        boolean graded = (hasA && hasB) || minLen * t.h > 1;
        int n = (int) Math.min(t.k.length, GRADED_NODES + (long) Math.ceil(kMax / t.h) * ORDER);
        // graded: the split first panel, then uniform panels from the second; else all uniform panels
        int from = graded ? 0 : GRADED_NODES;
        for (int i = from; i < n; i++) {
            if (graded && i == GRADED_NODES) {
                i += ORDER; // skip the unsplit first panel
                if (i >= n) {
                    break;
                }
            }
            double k = t.k[i];
            double j0 = d == 0 ? 1 : Bessel.j0(k * d);
            double ua = t.ua[i];
            double da = t.da[i];
            double ub = t.ub[i];
            double db = t.db[i];
            double ga = hasA ? t.ga[i] : 0;
            double gb = hasB ? t.gb[i] : 0;
            double direct = ua * db * Math.exp(-k * delta);
            if (!hasA && !hasB) {
                m += t.w[i] * j0 * direct;
                continue;
            }
            double eA = hasA ? Math.exp(-k * hAa) : 0;
            double eAb = hasA ? Math.exp(-k * hAb) : 0;
            double eBa = hasB ? Math.exp(-k * hBa) : 0;
            double eB = hasB ? Math.exp(-k * hBb) : 0;
            double eL = Math.exp(-k * len);
            double gg = ga * gb;
            double inv = 1 / (1 - gg * eL * eL);
            double mm = direct + ga * da * db * eA * eAb + gb * ua * ub * eBa * eB + gg * da * ub * eA * eB * eL;
            double sa = ga * da * da * eA * eA + gb * ua * ua * eBa * eBa + 2 * gg * da * ua * eA * eBa * eL;
            double sb = ga * db * db * eAb * eAb + gb * ub * ub * eB * eB + 2 * gg * db * ub * eAb * eB * eL;
            m += t.w[i] * j0 * mm * inv;
            la += t.w[i] * sa * inv;
            lb += t.w[i] * sb * inv;
        }
        double c = Constants.MU0 * Math.PI;
        return new Values(c * m, c * la, c * lb);
    }

    private Table table(double d, double kMax) {
        // panel width: half the fastest oscillation period, on √2 steps so that tables are shared
        int level = Math.max(0, (int) Math.ceil(2 * Math.log((radiusSum + d) / radiusSum) / Math.log(2)));
        double h = 2 * Math.PI / (radiusSum * Math.pow(2, level / 2.0));
        int panels = (int) Math.min(MAX_PANELS, Math.ceil(kMax / h));
        Table t = tables.get(level);
        if (t != null && t.panels >= panels) {
            return t;
        }
        int size = Math.max(panels, t == null ? 0 : 2 * t.panels);
        Table built = build(h, Math.min(size, MAX_PANELS));
        tables.put(level, built);
        return built;
    }

    private Table build(double h, int panels) {
        int n = GRADED_NODES + panels * ORDER;
        double[] k = new double[n];
        double[] w = new double[n];
        double[] ua = new double[n];
        double[] da = new double[n];
        double[] ub = new double[n];
        double[] db = new double[n];
        double[] ga = new double[n];
        double[] gb = new double[n];
        for (int p = -GRADING - 1; p < panels; p++) {
            // p < 0: the graded pieces of the first panel; p ≥ 0: uniform panels [p h, (p+1) h]
            double lo = p >= 0 ? p * h : (p == -GRADING - 1 ? 0 : h * Math.pow(0.5, -p));
            double hi = p >= 0 ? (p + 1) * h : h * Math.pow(0.5, -p - 1);
            for (int i = 0; i < ORDER; i++) {
                int idx = GRADED_NODES + p * ORDER + i;
                double kk = 0.5 * (lo + hi) + 0.5 * (hi - lo) * GX[i];
                k[idx] = kk;
                w[idx] = 0.5 * (hi - lo) * GW[i];
                double[] s = sums(a, kk, aTop, aBottom);
                ua[idx] = s[0];
                da[idx] = s[1];
                s = sums(b, kk, bTop, bBottom);
                ub[idx] = s[0];
                db[idx] = s[1];
                ga[idx] = gamma(plateA, etaAFixed, kk);
                gb[idx] = gamma(plateB, etaBFixed, kk);
            }
        }
        return new Table(h, panels, k, w, ua, da, ub, db, ga, gb);
    }

    private static double gamma(BackingPlate p, double fixed, double k) {
        if (p == null) {
            return 0;
        }
        return Double.isNaN(fixed) ? p.slabCoefficient(k) : fixed;
    }

    private static double[] sums(FilamentSet s, double k, double top, double bottom) {
        double u = 0;
        double dn = 0;
        for (int i = 0; i < s.rr.length; i++) {
            double f = s.rw[i] * s.rr[i] * Bessel.j1(k * s.rr[i]);
            // a ring in the top (bottom) plane has no decay to it: e^0 = 1 without the call (flat coils)
            u += s.rz[i] == top ? f : f * Math.exp(-k * (top - s.rz[i]));
            dn += s.rz[i] == bottom ? f : f * Math.exp(-k * (s.rz[i] - bottom));
        }
        return new double[] {u, dn};
    }

    private static double maxZ(FilamentSet s) {
        double m = Double.NEGATIVE_INFINITY;
        for (double z : s.rz) {
            m = Math.max(m, z);
        }
        return m;
    }

    private static double minZ(FilamentSet s) {
        double m = Double.POSITIVE_INFINITY;
        for (double z : s.rz) {
            m = Math.min(m, z);
        }
        return m;
    }

    private static double maxR(FilamentSet s) {
        double m = 0;
        for (double r : s.rr) {
            m = Math.max(m, r);
        }
        return m;
    }
}
