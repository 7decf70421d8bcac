package org.tankwright.tolerance;

import org.hipparchus.analysis.integration.IterativeLegendreGaussIntegrator;
import org.hipparchus.distribution.continuous.NormalDistribution;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The study against closed forms. Resonant frequency f = 1/(2π√(LC)) with L and C uniform:
 * E[f] = E[L^-½]·E[C^-½]/(2π) and E[f²] = E[1/L]·E[1/C]/(4π²) by independence, with
 * E[X^-½] = 2(√b − √a)/(b − a) and E[1/X] = ln(b/a)/(b − a) for X uniform on [a, b]
 * (elementary integrals). The yield is checked against the probability integrated numerically
 * by Hipparchus (a general-purpose library), percentiles of a normal against Hipparchus'
 * inverse normal distribution.
 */
class ToleranceStudyTest {
    static final double L0 = 100e-6;
    static final double C0 = 100e-9;
    static final double TL = 0.05;
    static final double TC = 0.10;
    static final StudyModel RESONANCE = (p, o) -> o[0] = 1 / (2 * Math.PI * Math.sqrt(p[0] * p[1]));

    static ToleranceStudy resonance(int n) {
        return ToleranceStudy.of(List.of(Parameter.uniform("L", L0, TL), Parameter.uniform("C", C0, TC)),
                List.of("f0"), RESONANCE).withSamples(n).withSeed(42);
    }

    static double invSqrtMean(double a, double b) {
        return 2 * (Math.sqrt(b) - Math.sqrt(a)) / (b - a);
    }

    static double invMean(double a, double b) {
        return Math.log(b / a) / (b - a);
    }

    @Test
    void resonantFrequencyMeanAndSpreadMatchClosedForm() {
        int n = 100_000;
        OutcomeStats f = resonance(n).run().outcome("f0");
        double l1 = L0 * (1 - TL), l2 = L0 * (1 + TL), c1 = C0 * (1 - TC), c2 = C0 * (1 + TC);
        double mean = invSqrtMean(l1, l2) * invSqrtMean(c1, c2) / (2 * Math.PI);
        double second = invMean(l1, l2) * invMean(c1, c2) / (4 * Math.PI * Math.PI);
        double sigma = Math.sqrt(second - mean * mean);
        assertEquals(mean, f.mean(), 5 * sigma / Math.sqrt(n), "mean within 5 standard errors of the closed form");
        assertEquals(sigma, f.std(), 0.01 * sigma, "std within 1 % of the closed form");
        // bounds: f is extreme at the corners of the box
        assertTrue(f.min() >= 1 / (2 * Math.PI * Math.sqrt(l2 * c2)));
        assertTrue(f.max() <= 1 / (2 * Math.PI * Math.sqrt(l1 * c1)));
        assertEquals(f.min(), f.lowest().outcomes()[0], 0, "the lowest sample carries the minimum");
        int total = 0;
        for (int c : f.histogram().counts()) {
            total += c;
        }
        assertEquals(n, total, "histogram holds every sample");
    }

    @Test
    void yieldMatchesIntegratedProbability() {
        int n = 100_000;
        double fNom = 1 / (2 * Math.PI * Math.sqrt(L0 * C0));
        double fa = fNom * 0.97, fb = fNom * 1.04;
        StudyResult r = resonance(n).withLimits(List.of(new Limit("f0", fa, fb))).run();
        double xHi = 1 / Math.pow(2 * Math.PI * fa, 2);
        double xLo = 1 / Math.pow(2 * Math.PI * fb, 2);
        double p = cdfProduct(xHi) - cdfProduct(xLo);
        double se = Math.sqrt(p * (1 - p) / n);
        assertEquals(p, r.outcome("f0").yield(), 5 * se, "yield vs P(fa ≤ f ≤ fb) integrated by Hipparchus");
        assertEquals(r.outcome("f0").yield(), r.overallYield(), 0, "one limit: overall = per-outcome yield");
    }

    /** P(L·C ≤ x) for independent uniforms: ∫ P(C ≤ x/L) dL/(l2 − l1), split at the kinks, by Gauss-Legendre (in u = L/L0). */
    static double cdfProduct(double x) {
        double u1 = 1 - TL, u2 = 1 + TL, c1 = C0 * (1 - TC), c2 = C0 * (1 + TC);
        IterativeLegendreGaussIntegrator gl = new IterativeLegendreGaussIntegrator(8, 1e-10, 1e-12);
        double xs = x / L0;
        double[] cuts = {u1, Math.min(u2, Math.max(u1, xs / c2)), Math.min(u2, Math.max(u1, xs / c1)), u2};
        double sum = 0;
        for (int i = 0; i < 3; i++) {
            if (cuts[i + 1] > cuts[i]) {
                sum += gl.integrate(100_000, u -> Math.max(0, Math.min(1, (xs / u - c1) / (c2 - c1))), cuts[i], cuts[i + 1]);
            }
        }
        return sum / (u2 - u1);
    }

    @Test
    void normalSpreadHasSigmaOfATHirdOfTolerance() {
        int n = 100_000;
        StudyResult r = ToleranceStudy.of(List.of(Parameter.normal("C", 1.0, 0.06)), List.of("C"), (p, o) -> o[0] = p[0])
                .withSamples(n).withSeed(7).run();
        OutcomeStats c = r.outcome("C");
        assertEquals(1.0, c.mean(), 5 * 0.02 / Math.sqrt(n));
        assertEquals(0.02, c.std(), 0.02 * 0.01);
        NormalDistribution ref = new NormalDistribution(1.0, 0.02); // Hipparchus
        assertEquals(ref.inverseCumulativeProbability(0.99), c.percentiles().get("p99"), 0.02 * 0.03);
        assertEquals(ref.inverseCumulativeProbability(0.05), c.percentiles().get("p5"), 0.02 * 0.03);
    }

    @Test
    void temperatureDriftFollowsTempco() {
        // value = 1·(1 + 100 ppm/K·(T − 25 °C)), T uniform on −20 … 80 °C
        StudyResult r = ToleranceStudy.of(List.of(Parameter.fixed("C", 1.0).withTempcoPpm(100, 0)), List.of("C"),
                        (p, o) -> o[0] = p[0]).withTemperature(new TemperatureRange(-20, 80, 25))
                .withSamples(50_000).run();
        OutcomeStats c = r.outcome("C");
        assertEquals(1 + 100e-6 * 5, c.mean(), 5 * (100e-6 * 100 / Math.sqrt(12)) / Math.sqrt(50_000));
        assertTrue(c.min() >= 1 - 100e-6 * 45 && c.max() <= 1 + 100e-6 * 55);
        Corners.Extreme e = r.corners().extremes().get(0);
        assertEquals(1 - 100e-6 * 45, e.low(), 1e-15, "cold corner");
        assertEquals(1 + 100e-6 * 55, e.high(), 1e-15, "hot corner");
        assertEquals(80.0, e.highSetting().get("temperature_C"), 0);
    }

    @Test
    void cornersAreTheToleranceExtremes() {
        StudyResult r = resonance(1000).run();
        Corners.Extreme e = r.corners().extremes().get(0);
        assertEquals("all 2^k corners", r.corners().method());
        assertEquals(4, r.corners().count());
        assertEquals(1 / (2 * Math.PI * Math.sqrt(L0 * (1 + TL) * C0 * (1 + TC))), e.low(), 1e-9);
        assertEquals(1 / (2 * Math.PI * Math.sqrt(L0 * (1 - TL) * C0 * (1 - TC))), e.high(), 1e-9);
        assertEquals(Map.of("L", TL, "C", TC, "temperature_C", 25.0), e.lowSetting());
    }

    @Test
    void seededCancelableWithProgress() {
        assertEquals(resonance(5000).run().outcome("f0").mean(), resonance(5000).run().outcome("f0").mean(), 0, "same seed");
        assertNotEquals(resonance(5000).run().outcome("f0").mean(),
                resonance(5000).withSeed(43).run().outcome("f0").mean(), "another seed");
        CancelToken token = new CancelToken();
        int[] calls = {0};
        StudyResult r = resonance(10_000).run(token, (done, total) -> {
            calls[0]++;
            if (done >= 3000) {
                token.cancel();
            }
        });
        assertTrue(r.cancelled());
        assertEquals(3000, r.completed());
        assertEquals(30, calls[0], "every 1 %, the last at 3000 where it stopped");
        assertFalse(Double.isNaN(r.outcome("f0").mean()));
    }

    @Test
    void nonFiniteOutcomesCountAsFailuresAndNeverReachTheStats() {
        StudyResult r = ToleranceStudy.of(List.of(Parameter.uniform("x", 0, 0).withTempcoPpm(0, 0),
                        Parameter.uniform("y", 1, 0.5)), List.of("r"),
                (p, o) -> o[0] = p[1] > 1.25 ? Double.NaN : p[1]).withSamples(20_000).run();
        OutcomeStats o = r.outcome("r");
        assertTrue(r.invalidSamples() > 0);
        assertTrue(Double.isFinite(o.mean()) && o.max() <= 1.25);
        assertEquals(1 - r.invalidSamples() / 20_000.0, r.overallYield(), 1e-12);
    }

    @Test
    void namedModelMatchesTheArrayModel() {
        ToleranceStudy named = ToleranceStudy.ofNamed(List.of(Parameter.uniform("L", L0, TL), Parameter.uniform("C", C0, TC)),
                List.of("f0"), in -> Map.of("f0", 1 / (2 * Math.PI * Math.sqrt(in.get("L") * in.get("C")))))
                .withSamples(2000).withSeed(42);
        assertEquals(resonance(2000).run().outcome("f0").mean(), named.run().outcome("f0").mean(), 0, "same draws, same model");
        StudyResult missing = ToleranceStudy.ofNamed(List.of(Parameter.uniform("x", 1, 0.1)), List.of("y"), in -> Map.of())
                .withSamples(10).run();
        assertEquals(10, missing.invalidSamples());
        assertEquals(0, missing.overallYield(), 0);
    }
}
