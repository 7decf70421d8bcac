package org.tankwright.magnetics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.special.elliptic.legendre.LegendreEllipticIntegral;
import org.junit.jupiter.api.Test;
import org.tankwright.materials.Conductor;
import org.tankwright.materials.ConductorMaterial;

class InductanceModelsTest {

    /**
     * Nagaoka's coefficient against the published table (Grover 1946, Table 36; values from memory, 4 decimals;
     * checked against the integrated current sheet in {@link #nagaokaTableAgainstIntegratedCurrentSheet()}).
     */
    @Test
    void nagaokaMatchesPublishedTable() {
        double[][] table = {{0.1, 0.9588}, {0.5, 0.8181}, {1.0, 0.6884}, {2.0, 0.5255}, {5.0, 0.3198}, {10.0, 0.2033}};
        for (double[] row : table) {
            assertEquals(row[1], InductanceFormulas.nagaoka(row[0]), 6e-5, "K_N(D/l = " + row[0] + ") vs Grover 1946");
        }
        assertEquals(1.0, InductanceFormulas.nagaoka(1e-7), 1e-7, "long-coil limit");
    }

    /**
     * Reference for the Nagaoka table above (whose values are from memory): K_N from its definition, the
     * current sheet's self-inductance (N/ℓ)²·2∫₀^ℓ(ℓ − u)M(u)du over the long-coil value µ0πR²N²/ℓ, with
     * Maxwell's coaxial-circle mutual inductance M(u) = µ0R[(2/k − k)K − (2/k)E] (Maxwell 1873; Grover 1946)
     * evaluated with Hipparchus' Legendre elliptic integrals (its close-circle limit below u = 10⁻⁴R) and integrated by Gauss-Legendre (Hipparchus
     * nodes; u = ℓt² removes the logarithmic end singularity). Independent of our closed form and our AGM;
     * it reproduces the remembered table to 1e-4, so those values are checked against a named computation.
     */
    @Test
    void nagaokaTableAgainstIntegratedCurrentSheet() {
        CompositeGauss gauss = new CompositeGauss(10);
        double r = 1.0;
        double[][] table = {{0.1, 0.9588}, {0.5, 0.8181}, {1.0, 0.6884}, {2.0, 0.5255}, {5.0, 0.3198}, {10.0, 0.2033}};
        for (double[] row : table) {
            double len = 2 * r / row[0];
            double integral = gauss.integrate(t -> {
                double u = len * t * t;
                if (u < 1e-4 * r) {
                    // m rounds to 1 here: the close-circle limit M = µ0R(ln(8R/u) − 2) (Grover 1946), error O(u²)
                    return 2 * len * t * (len - u) * r * (Math.log(8 * r / u) - 2);
                }
                double m = 4 * r * r / (4 * r * r + u * u);
                double k = Math.sqrt(m);
                double mutual = r * ((2 / k - k) * LegendreEllipticIntegral.bigK(m) - 2 / k * LegendreEllipticIntegral.bigE(m));
                return 2 * len * t * (len - u) * mutual;
            }, 0, 1, 400);
            double kn = 2 * integral / (Math.PI * r * r * len);
            assertEquals(row[1], kn, 1e-4, "integrated sheet vs remembered table, D/ℓ = " + row[0]);
            assertEquals(kn, InductanceFormulas.nagaoka(row[0]), 2e-6, "closed form vs integrated sheet, D/ℓ = " + row[0]);
        }
    }

    /** Wheeler 1928 states 1 % agreement with the current sheet for length > 0.8 radius. */
    @Test
    void wheelerWithinStatedAccuracyOfCurrentSheet() {
        for (double lr = 0.8; lr <= 200; lr *= 1.25) {
            double ratio = InductanceFormulas.wheelerSingleLayer(0.05, 0.05 * lr, 30)
                    / InductanceFormulas.currentSheet(0.05, 0.05 * lr, 30);
            assertEquals(1.0, ratio, 0.01, "Wheeler vs Nagaoka sheet at length/radius " + lr);
        }
    }

    /**
     * Rosa's B(N) against Rosa's published table (Bull. Bureau of Standards 2, 1907; values from memory; checked
     * against the integrated strip GMD in {@link #rosaBTableAgainstIntegratedStripGmd()}).
     */
    @Test
    void rosaBMatchesPublishedTable() {
        assertEquals(0.1137, InductanceFormulas.rosaB(2), 1e-4);
        assertEquals(0.1663, InductanceFormulas.rosaB(3), 1e-4);
        assertEquals(0.1973, InductanceFormulas.rosaB(4), 1e-4);
        assertEquals(0.2180, InductanceFormulas.rosaB(5), 1e-4);
        assertEquals(0.0, InductanceFormulas.rosaB(1), 0);
        assertEquals(Math.log(2 * Math.PI) - 1.5, InductanceFormulas.rosaB(1_000_000), 1e-5, "limit ln 2π − 3/2");
    }

    /**
     * Reference for Rosa's B(N) table above (values from memory): B(N) = (2/N)Σ(N − k)·ln(k p/g_k) with the
     * strips' geometric mean distance from its definition, ln g_k = (1/p²)∬ ln|x − y + k p| dx dy over two strips
     * of width p (Maxwell's GMD; Rosa &amp; Grover 1912), integrated by Gauss-Legendre with Hipparchus nodes
     * instead of the closed form. It reproduces the remembered values to 1e-4.
     */
    @Test
    void rosaBTableAgainstIntegratedStripGmd() {
        CompositeGauss gauss = new CompositeGauss(10);
        double[] remembered = {0.1137, 0.1663, 0.1973, 0.2180};
        for (int n = 2; n <= 5; n++) {
            double b = 0;
            for (int k = 1; k < n; k++) {
                final int kk = k;
                // strips [0,1] and [k, k+1] (p = 1): for k = 1 they touch and ln|x − y + 1| is singular at one corner
                double lnG = gauss.integrate(x -> gauss.integrate(y -> Math.log(Math.abs(kk + y - x)), 0, 1, kk == 1 ? 200 : 8),
                        0, 1, kk == 1 ? 200 : 8);
                b += (n - k) * (Math.log(k) - lnG);
            }
            b *= 2.0 / n;
            assertEquals(remembered[n - 2], b, 1e-4, "B(" + n + ") from the integrated strip GMD");
        }
    }

    /** Rosa's corrected sheet and the filament sum model the same round-wire coil: they agree closely. */
    @Test
    void rosaCorrectionAgreesWithFilamentSum() {
        Conductor wire = Conductor.RoundWire.bare(1e-3, ConductorMaterial.COPPER);
        for (int n : new int[] {5, 20, 60}) {
            for (double pitch : new double[] {1.2e-3, 2e-3, 4e-3}) {
                SingleLayerSolenoid s = new SingleLayerSolenoid(60e-3, n, pitch, wire);
                CoilModel m = CoilModel.of(s);
                double filament = find(m, "filament");
                double rosa = find(m, "rosa");
                assertEquals(filament, rosa, 2e-3 * filament, "N=" + n + " pitch=" + pitch);
            }
        }
    }

    /**
     * Convergence: as the wire gets thin and the pitch fine (fixed coil length 0.2 m, diameter 0.05 m, wire
     * diameter = pitch/2), the filament sum of a long single-layer coil approaches the Lorenz/Nagaoka current
     * sheet; the gap falls like 1/N (Rosa's correction ∝ N while L ∝ N²).
     */
    @Test
    void filamentSumConvergesToCurrentSheet() {
        double length = 0.2;
        double previous = Double.NaN;
        for (int n = 25; n <= 1600; n *= 2) {
            double pitch = length / n;
            SingleLayerSolenoid s = new SingleLayerSolenoid(0.05, n, pitch,
                    Conductor.RoundWire.bare(0.5 * pitch, ConductorMaterial.COPPER));
            CoilModel m = CoilModel.of(s);
            double gap = Math.abs(find(m, "filament") / find(m, "current-sheet") - 1);
            if (!Double.isNaN(previous)) {
                assertEquals(0.5, gap / previous, 0.05, "gap should halve when N doubles (N=" + n + ")");
            }
            previous = gap;
        }
        assertTrue(previous < 1e-3, "gap at N=1600: " + previous);
    }

    /** The symmetry shortcuts (solenoid, multilayer layer pairs, polygon rotation) equal the general O(N²) sums. */
    @Test
    void solenoidShortcutEqualsGeneralFilamentSum() {
        SingleLayerSolenoid s = new SingleLayerSolenoid(30e-3, 17, 1.5e-3,
                Conductor.RoundWire.bare(1e-3, ConductorMaterial.COPPER));
        assertEquals(FilamentSum.selfInductance(s.filaments()), find(CoilModel.of(s), "filament"), 1e-12 * 1e-5);
        for (int[] c : new int[][] {{100, 5}, {10, 3}, {7, 7}}) {
            MultilayerSolenoid m = MultilayerSolenoid.closeWound(20e-3, c[0], c[1],
                    new Conductor.RoundWire(1e-3, 1.1e-3, ConductorMaterial.COPPER));
            double general = FilamentSum.selfInductance(m.filaments());
            assertEquals(general, FilamentSum.multilayer(m), 1e-12 * general, "multilayer " + c[0] + "/" + c[1]);
            double field = CoilFields.weightedFieldSquared(m.filaments(), m.conductor(), 1);
            assertEquals(field, CoilFields.multilayer(m), 1e-12 * field, "multilayer field " + c[0] + "/" + c[1]);
        }
        PolygonSpiral p = new PolygonSpiral(6, 40e-3, 10e-3, 5,
                Conductor.Trace.ofCopperWeight(1e-3, 1, ConductorMaterial.COPPER));
        double general = FilamentSum.selfInductance(p.filaments());
        assertEquals(general, FilamentSum.selfInductanceRotational(p.filaments(), 6), 1e-10 * general);
    }

    /**
     * Mohan et al. 1999 state typical errors of 2–3 % for their expressions (current sheet: spacing ≤ 3 widths).
     * Held to the segment sum over planar spirals like theirs: 3–10 turns, spacing ≤ width, fill ratio
     * 0.2–0.8, inner size ≥ 10 widths, sizes across flats. Measured mean |error| (docs/models.md): square
     * 2.4 % / 1.7 %, hexagon 4.8 % / 2.1 %, octagon 2.6 % / 1.6 % (modified Wheeler / current sheet). The
     * hexagon's modified Wheeler misses the stated figure, so its bound is 5 %; why, see
     * {@link #mohanHexagonMissIsInTheExpression()}.
     */
    @Test
    void mohanStatedErrorsAgainstSegmentSum() {
        for (int sides : new int[] {4, 6, 8}) {
            InductanceFormulas.MohanShape shape = InductanceFormulas.MohanShape.ofSides(sides);
            double sumW = 0;
            double sumS = 0;
            List<double[]> cases = mohanCases(sides);
            for (double[] c : cases) {
                int n = (int) c[0];
                sumW += Math.abs(InductanceFormulas.mohanWheeler(shape, n, c[1], c[2]) / c[3] - 1);
                sumS += Math.abs(InductanceFormulas.mohanCurrentSheet(shape, n, c[1], c[2]) / c[3] - 1);
            }
            int count = cases.size();
            assertTrue(count >= 10, "cases: " + count);
            assertTrue(sumS / count < 0.03, "Mohan current sheet mean error, " + sides + " sides: " + sumS / count);
            double boundW = sides == 6 ? 0.05 : 0.03;
            assertTrue(sumW / count < boundW, "Mohan modified Wheeler mean error, " + sides + " sides: " + sumW / count);
        }
    }

    /**
     * Why the hexagon's modified Wheeler (K1 = 2.33, K2 = 3.82, Mohan 1999 Table 1, quoted from memory) averages 4.8 % here
     * against the 2–3 % the paper states. Not our convention: reading the sizes across corners instead of across
     * flats makes it twice as bad (mean |error| over 8 %), and the across-flats reading that suits the square
     * and octagon suits the hexagon too. Not the segment sum: Mohan's own current-sheet expression for the
     * same hexagons (c1..c4 = 1.09, 2.23, 0, 0.17) agrees with it to about 2 %. The two Mohan expressions
     * disagree with each other for the hexagon by 2.8 % on average (square 0.6 %, octagon 2.0 %), and the
     * modified Wheeler's error grows with the fill ratio (it is low by 5–10 % for ρ above 0.45 here): the
     * fitted expression itself does about 4–5 % on this range. Mohan's own test range is not available to this
     * work; the bound stays 5 %.
     */
    @Test
    void mohanHexagonMissIsInTheExpression() {
        InductanceFormulas.MohanShape hex = InductanceFormulas.MohanShape.HEXAGON;
        double corner = 1 / Math.cos(Math.PI / 6);
        double flats = 0;
        double corners = 0;
        double between = 0;
        double sheet = 0;
        List<double[]> cases = mohanCases(6);
        for (double[] c : cases) {
            int n = (int) c[0];
            double w = InductanceFormulas.mohanWheeler(hex, n, c[1], c[2]);
            flats += Math.abs(w / c[3] - 1);
            corners += Math.abs(InductanceFormulas.mohanWheeler(hex, n, corner * c[1], corner * c[2]) / c[3] - 1);
            double s = InductanceFormulas.mohanCurrentSheet(hex, n, c[1], c[2]);
            sheet += Math.abs(s / c[3] - 1);
            between += w / s - 1;
            if (c[4] > 0.45) {
                assertTrue(w / c[3] - 1 < -0.04, "low at high fill ratio " + c[4]);
            }
        }
        int count = cases.size();
        assertTrue(corners / count > 1.7 * flats / count, "across corners " + corners / count + " vs flats " + flats / count);
        assertTrue(sheet / count < 0.025, "Mohan current sheet " + sheet / count);
        assertEquals(-0.028, between / count, 0.004, "Mohan's modified Wheeler against his current sheet");
        for (int sides : new int[] {4, 8}) {
            InductanceFormulas.MohanShape shape = InductanceFormulas.MohanShape.ofSides(sides);
            double gap = 0;
            List<double[]> other = mohanCases(sides);
            for (double[] c : other) {
                int n = (int) c[0];
                gap += Math.abs(InductanceFormulas.mohanWheeler(shape, n, c[1], c[2])
                        / InductanceFormulas.mohanCurrentSheet(shape, n, c[1], c[2]) - 1);
            }
            assertTrue(gap / other.size() < 0.022, sides + " sides: Mohan's two expressions " + gap);
        }
    }

    /** Mohan-like planar spirals (see above): {turns, outer, inner (across flats), segment-sum L, fill ratio}. */
    private static List<double[]> mohanCases(int sides) {
        List<double[]> out = new ArrayList<>();
        for (int n = 3; n <= 10; n += 2) {
            for (double w : new double[] {0.2e-3, 1e-3}) {
                for (double sw : new double[] {0.25, 1}) {
                    for (double dinW : new double[] {10, 40}) {
                        double din = dinW * w;
                        double dout = din + 2 * (w + (n - 1) * w * (1 + sw));
                        double rho = InductanceFormulas.fillRatio(dout, din);
                        if (rho < 0.2 || rho > 0.8) {
                            continue;
                        }
                        PolygonSpiral p = new PolygonSpiral(sides, dout, din, n,
                                new Conductor.Trace(w, 35e-6, ConductorMaterial.COPPER));
                        out.add(new double[] {n, dout, din, FilamentSum.selfInductanceRotational(p.filaments(), sides), rho});
                    }
                }
            }
        }
        return out;
    }

    /**
     * Wheeler 1928 flat spiral: about 5 % of a current sheet for winding width c > 0.2 mean radius. The
     * sheet reference is the ring sum of the same band wound with 400 flat strips filling the pitch
     * (a discretised sheet), scaled by (N/400)².
     */
    @Test
    void wheelerFlatSpiralWithinStatedAccuracy() {
        int fine = 400;
        for (double[] band : new double[][] {{40e-3, 20e-3}, {100e-3, 60e-3}, {200e-3, 40e-3}}) {
            double outer = band[0];
            double inner = band[1];
            double strip = 0.5 * (outer - inner) / fine;
            FlatSpiral sheet = new FlatSpiral(outer, inner, fine, new Conductor.Trace(strip, strip / 10,
                    ConductorMaterial.COPPER));
            double perTurn2 = FilamentSum.selfInductance(sheet.filaments()) / ((double) fine * fine);
            double a = 0.25 * (outer + inner);
            double c = 0.5 * (outer - inner);
            assertTrue(c > 0.2 * a);
            for (int n : new int[] {5, 20}) {
                double wheeler = InductanceFormulas.wheelerFlatSpiral(a, c, n);
                assertEquals(perTurn2 * n * n, wheeler, 0.05 * wheeler, "outer " + outer + " inner " + inner);
            }
        }
    }

    /** Wheeler 1928 multilayer: 1 % when the three denominator terms are about equal (against the ring sum). */
    @Test
    void wheelerMultilayerWithinStatedAccuracy() {
        Conductor wire = Conductor.RoundWire.bare(0.5e-3, ConductorMaterial.COPPER);
        // a = 10 + 5 = 15 mm mean radius, b = 20 × 0.5 = 10 mm, c = 20 × 0.5 = 10 mm: 6a = 90, 9b = 90, 10c = 100
        MultilayerSolenoid m = MultilayerSolenoid.closeWound(20e-3, 400, 20, wire);
        CoilModel model = CoilModel.of(m);
        assertEquals(find(model, "filament"), find(model, "wheeler"), 0.015 * find(model, "filament"));
        assertTrue(model.models().stream().filter(e -> e.name().equals("wheeler")).findFirst().orElseThrow().valid());
    }

    /** Single loop (Grover 1946): µ0R(ln(8R/a) − 7/4) against the Maxwell kernel at the wire's GMD. */
    @Test
    void loopFormulaMatchesGmdMutual() {
        double r = 0.1;
        double a = 1e-3;
        double gmdMutual = MutualKernels.coaxialRings(r, r, a * Math.exp(-0.25));
        assertEquals(gmdMutual, MutualKernels.ringSelf(r, a), 2e-3 * gmdMutual);
    }

    static double find(CoilModel m, String name) {
        return m.models().stream().filter(e -> e.name().equals(name)).findFirst().orElseThrow().inductance();
    }
}
