package org.tankwright.tolerance;

import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * A Monte Carlo tolerance study. Immutable; the {@code with…} methods return changed copies.
 * Each sample draws one temperature (uniform over the range) and, for every parameter, a
 * relative deviation from its spread and a tempco within its own scatter; the model turns the
 * values into outcomes. The generator is Commons Math's Well19937c, seeded, so a study repeats
 * exactly. {@link #run} checks the cancel token before every sample.
 */
public final class ToleranceStudy {
    /** Corner dimensions up to which all 2^k corners are evaluated. */
    public static final int MAX_FACTORIAL_DIMENSIONS = 12;
    static final String[] PERCENTILE_KEYS = {"p0.1", "p1", "p5", "p50", "p95", "p99", "p99.9"};
    static final double[] PERCENTILE_LEVELS = {0.001, 0.01, 0.05, 0.5, 0.95, 0.99, 0.999};

    private final List<Parameter> parameters;
    private final List<String> outcomes;
    private final StudyModel model;
    private final TemperatureRange temperature;
    private final List<Limit> limits;
    private final int samples;
    private final long seed;
    private final int bins;

    private ToleranceStudy(List<Parameter> parameters, List<String> outcomes, StudyModel model,
                           TemperatureRange temperature, List<Limit> limits, int samples, long seed, int bins) {
        this.parameters = List.copyOf(parameters);
        this.outcomes = List.copyOf(outcomes);
        this.model = model;
        this.temperature = temperature;
        this.limits = List.copyOf(limits);
        this.samples = samples;
        this.seed = seed;
        this.bins = bins;
        Set<String> names = new HashSet<>();
        for (Parameter p : this.parameters) {
            if (!names.add(p.name())) {
                throw new IllegalArgumentException("parameter name '" + p.name() + "' is used twice");
            }
        }
        Set<String> out = new HashSet<>(this.outcomes);
        if (out.size() != this.outcomes.size() || this.outcomes.isEmpty()) {
            throw new IllegalArgumentException("outcome names must be unique and at least one: " + this.outcomes);
        }
        for (Limit l : this.limits) {
            if (!out.contains(l.outcome())) {
                throw new IllegalArgumentException("limit on '" + l.outcome() + "': no such outcome; outcomes are " + this.outcomes);
            }
        }
        if (samples < 1 || samples > 10_000_000) {
            throw new IllegalArgumentException("samples = " + samples + ": must lie in 1 … 10,000,000");
        }
        if (bins < 1 || bins > 10_000) {
            throw new IllegalArgumentException("histogram bins = " + bins + ": must lie in 1 … 10,000");
        }
    }

    /** A study of 10,000 samples, seed 1, 40 histogram bins, no drift, no limits. */
    public static ToleranceStudy of(List<Parameter> parameters, List<String> outcomes, StudyModel model) {
        if (model == null) {
            throw new IllegalArgumentException("a study needs a model");
        }
        return new ToleranceStudy(parameters, outcomes, model, TemperatureRange.REFERENCE_ONLY, List.of(), 10_000, 1L, 40);
    }

    /**
     * A study whose model takes and returns named values (convenient for an expensive model such
     * as the whole analysis; it allocates per sample). An outcome the function leaves out counts
     * as non-finite: that sample fails the yield.
     */
    public static ToleranceStudy ofNamed(List<Parameter> parameters, List<String> outcomes,
                                         java.util.function.Function<Map<String, Double>, Map<String, Double>> model) {
        if (model == null) {
            throw new IllegalArgumentException("a study needs a model");
        }
        List<String> names = parameters.stream().map(Parameter::name).toList();
        List<String> outs = List.copyOf(outcomes);
        return of(parameters, outs, (p, o) -> {
            Map<String, Double> in = new LinkedHashMap<>();
            for (int j = 0; j < p.length; j++) {
                in.put(names.get(j), p[j]);
            }
            Map<String, Double> r = model.apply(in);
            for (int j = 0; j < o.length; j++) {
                Double v = r == null ? null : r.get(outs.get(j));
                o[j] = v == null ? Double.NaN : v;
            }
        });
    }

    public ToleranceStudy withSamples(int n) {
        return new ToleranceStudy(parameters, outcomes, model, temperature, limits, n, seed, bins);
    }

    public ToleranceStudy withSeed(long s) {
        return new ToleranceStudy(parameters, outcomes, model, temperature, limits, samples, s, bins);
    }

    public ToleranceStudy withTemperature(TemperatureRange t) {
        return new ToleranceStudy(parameters, outcomes, model, t, limits, samples, seed, bins);
    }

    public ToleranceStudy withLimits(List<Limit> l) {
        return new ToleranceStudy(parameters, outcomes, model, temperature, l, samples, seed, bins);
    }

    public ToleranceStudy withHistogramBins(int b) {
        return new ToleranceStudy(parameters, outcomes, model, temperature, limits, samples, seed, b);
    }

    /** Runs without cancellation or progress. */
    public StudyResult run() {
        return run(new CancelToken(), ProgressListener.NONE);
    }

    /** Runs the study; returns what was done if cancelled. */
    public StudyResult run(CancelToken cancel, ProgressListener progress) {
        int k = parameters.size();
        int q = outcomes.size();
        double[] temps = new double[samples];
        double[] pv = new double[samples * k];
        double[] ov = new double[samples * q];
        double[] p = new double[k];
        double[] o = new double[q];
        Spread[] spreads = new Spread[k];
        double[] tc = new double[k];
        double[] tcs = new double[k];
        for (int j = 0; j < k; j++) {
            spreads[j] = parameters.get(j).spread();
            tc[j] = parameters.get(j).tempcoPerK();
            tcs[j] = parameters.get(j).tempcoSpreadPerK();
        }
        RandomGenerator rng = new Well19937c(seed);
        double tMin = temperature.minC();
        double tSpan = temperature.maxC() - tMin;
        double tRef = temperature.referenceC();
        int step = Math.max(1, samples / 100);
        int done = 0;
        for (int i = 0; i < samples; i++) {
            if (cancel.isCancelled()) {
                break;
            }
            double t = tSpan > 0 ? tMin + tSpan * rng.nextDouble() : tMin;
            double dT = t - tRef;
            for (int j = 0; j < k; j++) {
                double d = spreads[j].draw(rng);
                double c = tcs[j] > 0 ? tc[j] + tcs[j] * (2 * rng.nextDouble() - 1) : tc[j];
                p[j] = parameters.get(j).value(d, c, dT);
            }
            model.evaluate(p, o);
            temps[i] = t;
            System.arraycopy(p, 0, pv, i * k, k);
            System.arraycopy(o, 0, ov, i * q, q);
            done = i + 1;
            if (done % step == 0) {
                progress.progress(done, samples);
            }
        }
        if (done % step != 0 || done == 0) {
            progress.progress(done, samples);
        }
        return summarise(done, cancel.isCancelled() && done < samples, temps, pv, ov);
    }

    private StudyResult summarise(int n, boolean cancelled, double[] temps, double[] pv, double[] ov) {
        int k = parameters.size();
        int q = outcomes.size();
        double[] nominal = nominalOutcomes();
        boolean[] pass = new boolean[n];
        Arrays.fill(pass, true);
        int invalid = 0;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < q; j++) {
                if (!Double.isFinite(ov[i * q + j])) {
                    pass[i] = false;
                    invalid++;
                    break;
                }
            }
        }
        List<OutcomeStats> stats = new ArrayList<>();
        double[] column = new double[n];
        for (int j = 0; j < q; j++) {
            Limit limit = limitOf(outcomes.get(j));
            int m = 0;
            int within = 0;
            int lowest = -1;
            int highest = -1;
            double sum = 0;
            for (int i = 0; i < n; i++) {
                double v = ov[i * q + j];
                if (!Double.isFinite(v)) {
                    continue;
                }
                column[m++] = v;
                sum += v;
                if (lowest < 0 || v < ov[lowest * q + j]) {
                    lowest = i;
                }
                if (highest < 0 || v > ov[highest * q + j]) {
                    highest = i;
                }
                if (limit == null || limit.accepts(v)) {
                    within++;
                } else {
                    pass[i] = false;
                }
            }
            double mean = m == 0 ? 0 : sum / m;
            double ss = 0;
            for (int i = 0; i < m; i++) {
                double d = column[i] - mean;
                ss += d * d;
            }
            Arrays.sort(column, 0, m);
            Map<String, Double> pct = new LinkedHashMap<>();
            for (int l = 0; l < PERCENTILE_KEYS.length; l++) {
                pct.put(PERCENTILE_KEYS[l], percentile(column, m, PERCENTILE_LEVELS[l]));
            }
            stats.add(new OutcomeStats(outcomes.get(j), nominal[j], mean, m > 1 ? Math.sqrt(ss / (m - 1)) : 0,
                    m == 0 ? 0 : column[0], m == 0 ? 0 : column[m - 1], pct, Histogram.of(column, m, bins), limit,
                    n == 0 ? 0 : within / (double) n, sampleAt(lowest, temps, pv, ov, k, q),
                    sampleAt(highest, temps, pv, ov, k, q)));
        }
        int passing = 0;
        for (int i = 0; i < n; i++) {
            passing += pass[i] ? 1 : 0;
        }
        String desc = "Monte Carlo, Well19937c seed " + seed + "; uniform spreads within ±tolerance, normal with"
                + " σ = tolerance/3; temperature uniform " + temperature.minC() + " … " + temperature.maxC()
                + " °C (reference " + temperature.referenceC() + " °C)";
        return new StudyResult(samples, n, cancelled, seed, parameters.stream().map(Parameter::name).toList(), outcomes,
                List.copyOf(stats), n == 0 ? 0 : passing / (double) n, invalid, corners(), desc,
                Arrays.copyOf(temps, n), Arrays.copyOf(pv, n * k), Arrays.copyOf(ov, n * q));
    }

    private Limit limitOf(String outcome) {
        for (Limit l : limits) {
            if (l.outcome().equals(outcome)) {
                return l;
            }
        }
        return null;
    }

    private static Sample sampleAt(int i, double[] temps, double[] pv, double[] ov, int k, int q) {
        if (i < 0) {
            return null;
        }
        return new Sample(i, temps[i], Arrays.copyOfRange(pv, i * k, (i + 1) * k), Arrays.copyOfRange(ov, i * q, (i + 1) * q));
    }

    /** Linear interpolation between order statistics at rank level·(n − 1). */
    static double percentile(double[] sorted, int n, double level) {
        if (n == 0) {
            return 0;
        }
        double r = level * (n - 1);
        int lo = (int) Math.floor(r);
        int hi = Math.min(n - 1, lo + 1);
        return sorted[lo] + (r - lo) * (sorted[hi] - sorted[lo]);
    }

    private double[] nominalOutcomes() {
        double[] p = new double[parameters.size()];
        for (int j = 0; j < p.length; j++) {
            p[j] = parameters.get(j).nominal();
        }
        double[] o = new double[outcomes.size()];
        model.evaluate(p, o);
        return o;
    }

    private Corners corners() {
        List<Integer> varied = new ArrayList<>();
        boolean drift = false;
        for (int j = 0; j < parameters.size(); j++) {
            if (parameters.get(j).spread().tolerance() > 0) {
                varied.add(j);
            }
            drift |= parameters.get(j).tempcoPerK() != 0;
        }
        boolean tempDim = drift && temperature.maxC() > temperature.minC();
        int dims = varied.size() + (tempDim ? 1 : 0);
        int q = outcomes.size();
        double[] lo = new double[q];
        double[] hi = new double[q];
        Arrays.fill(lo, Double.POSITIVE_INFINITY);
        Arrays.fill(hi, Double.NEGATIVE_INFINITY);
        int[] loCode = new int[q];
        int[] hiCode = new int[q];
        boolean factorial = dims <= MAX_FACTORIAL_DIMENSIONS;
        // corner code: bit b set = dimension b at +; in one-at-a-time mode codes are 2·dim + sign, and -1 nominal
        int count = factorial ? 1 << dims : 2 * dims;
        double[] p = new double[parameters.size()];
        double[] o = new double[q];
        for (int c = 0; c < count; c++) {
            double[] dev = deviations(c, factorial, varied, tempDim);
            double dT = dev[parameters.size()];
            for (int j = 0; j < p.length; j++) {
                p[j] = parameters.get(j).value(dev[j], parameters.get(j).tempcoPerK(), dT);
            }
            model.evaluate(p, o);
            for (int j = 0; j < q; j++) {
                if (o[j] < lo[j]) {
                    lo[j] = o[j];
                    loCode[j] = c;
                }
                if (o[j] > hi[j]) {
                    hi[j] = o[j];
                    hiCode[j] = c;
                }
            }
        }
        List<Corners.Extreme> ex = new ArrayList<>();
        double[] nominal = nominalOutcomes();
        for (int j = 0; j < q; j++) {
            if (count == 0) {
                ex.add(new Corners.Extreme(outcomes.get(j), nominal[j], setting(-1, factorial, varied, tempDim),
                        nominal[j], setting(-1, factorial, varied, tempDim)));
            } else {
                ex.add(new Corners.Extreme(outcomes.get(j), finite(lo[j], nominal[j]), setting(loCode[j], factorial, varied, tempDim),
                        finite(hi[j], nominal[j]), setting(hiCode[j], factorial, varied, tempDim)));
            }
        }
        return new Corners(factorial ? "all 2^k corners" : "one at a time", count, List.copyOf(ex));
    }

    private static double finite(double v, double fallback) {
        return Double.isFinite(v) ? v : fallback;
    }

    /** Relative deviation per parameter for corner code c, and (last) the temperature offset. */
    private double[] deviations(int c, boolean factorial, List<Integer> varied, boolean tempDim) {
        double[] dev = new double[parameters.size() + 1];
        int dims = varied.size() + (tempDim ? 1 : 0);
        for (int b = 0; b < dims; b++) {
            int sign;
            if (factorial) {
                sign = ((c >> b) & 1) == 1 ? 1 : -1;
            } else {
                sign = c >= 0 && c / 2 == b ? (c % 2 == 1 ? 1 : -1) : 0;
            }
            if (b < varied.size()) {
                int j = varied.get(b);
                dev[j] = sign * parameters.get(j).spread().tolerance();
            } else if (sign != 0) {
                dev[parameters.size()] = (sign > 0 ? temperature.maxC() : temperature.minC()) - temperature.referenceC();
            }
        }
        return dev;
    }

    private Map<String, Double> setting(int c, boolean factorial, List<Integer> varied, boolean tempDim) {
        double[] dev = deviations(c, factorial, varied, tempDim);
        Map<String, Double> s = new LinkedHashMap<>();
        for (int j = 0; j < parameters.size(); j++) {
            s.put(parameters.get(j).name(), dev[j]);
        }
        s.put("temperature_C", temperature.referenceC() + dev[parameters.size()]);
        return s;
    }
}
