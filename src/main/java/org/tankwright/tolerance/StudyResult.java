package org.tankwright.tolerance;

import java.io.IOException;
import java.util.List;
import java.util.Locale;

/**
 * What a tolerance study found.
 *
 * @param requested        samples asked for
 * @param completed        samples drawn (fewer when cancelled)
 * @param cancelled        whether the study was cancelled
 * @param seed             generator seed (same seed, same result)
 * @param parameterNames   parameter order
 * @param outcomeNames     outcome order
 * @param outcomes         one distribution per outcome
 * @param overallYield     share of completed samples within every limit at once
 * @param invalidSamples   samples whose model returned a non-finite outcome (they fail the yield)
 * @param corners          tolerance-corner evaluation
 * @param model            how the study sampled (generator, distributions)
 */
public record StudyResult(int requested, int completed, boolean cancelled, long seed, List<String> parameterNames,
                          List<String> outcomeNames, List<OutcomeStats> outcomes, double overallYield,
                          int invalidSamples, Corners corners, String model, double[] temperatures,
                          double[] parameterValues, double[] outcomeValues) {

    /** The stats of one outcome by name. */
    public OutcomeStats outcome(String name) {
        for (OutcomeStats o : outcomes) {
            if (o.name().equals(name)) {
                return o;
            }
        }
        throw new IllegalArgumentException("outcome '" + name + "' is not in this study; it has " + outcomeNames);
    }

    /** Sample i (0 ≤ i < completed). */
    public Sample sample(int i) {
        if (i < 0 || i >= completed) {
            throw new IndexOutOfBoundsException("sample " + i + " of " + completed);
        }
        int k = parameterNames.size();
        int q = outcomeNames.size();
        double[] p = new double[k];
        double[] o = new double[q];
        System.arraycopy(parameterValues, i * k, p, 0, k);
        System.arraycopy(outcomeValues, i * q, o, 0, q);
        return new Sample(i, temperatures[i], p, o);
    }

    /** Every sample as CSV with a header row: index, temperature_C, parameters..., outcomes... */
    public void writeCsv(Appendable out) throws IOException {
        out.append("index,temperature_C");
        for (String n : parameterNames) {
            out.append(',').append(n);
        }
        for (String n : outcomeNames) {
            out.append(',').append(n);
        }
        out.append('\n');
        int k = parameterNames.size();
        int q = outcomeNames.size();
        for (int i = 0; i < completed; i++) {
            out.append(Integer.toString(i)).append(',').append(num(temperatures[i]));
            for (int j = 0; j < k; j++) {
                out.append(',').append(num(parameterValues[i * k + j]));
            }
            for (int j = 0; j < q; j++) {
                out.append(',').append(num(outcomeValues[i * q + j]));
            }
            out.append('\n');
        }
    }

    private static String num(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.9g", v) : "";
    }
}
