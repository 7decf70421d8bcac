package org.tankwright.checks;

import org.tankwright.analysis.AnalysisResult;
import org.tankwright.design.Design;
import org.tankwright.units.Dimension;

import java.util.List;

import static org.tankwright.checks.Read.finite;
import static org.tankwright.checks.Read.q;

/** The operating frequency against bands commonly allotted to inductive power transfer and ISM use. */
final class RadioRules {
    private RadioRules() {
    }

    /** TW-R01: the operating range lies outside every band of {@link Limits#BANDS}. */
    static final class FrequencyBand extends BaseRule {
        FrequencyBand() {
            super("TW-R01", "operating frequency against allotted bands",
                    "ITU Radio Regulations Nos. 5.138 and 5.150 (ISM); ITU-R SM.2110, SM.2129, SM.2449; ETSI EN 303 417; "
                            + "CEPT ERC/REC 70-03 Annex 9");
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            double f = Read.frequency(r);
            if (!finite(f)) {
                return;
            }
            double lo = f;
            double hi = f;
            Design d = r.design();
            if (d != null && d.envelope() != null) {
                if (d.envelope().frequencyMin() != null) {
                    lo = Math.min(lo, d.envelope().frequencyMin());
                }
                if (d.envelope().frequencyMax() != null) {
                    hi = Math.max(hi, d.envelope().frequencyMax());
                }
            }
            if (r.heater() != null) {
                lo = Math.min(lo, finiteOr(r.heater().frequencyMin(), lo));
                hi = Math.max(hi, finiteOr(r.heater().frequencyMax(), hi));
            }
            if (Limits.bandFor(lo, hi) != null) {
                return;
            }
            String range = lo == hi ? q(f, Dimension.FREQUENCY) : q(lo, Dimension.FREQUENCY) + " to " + q(hi, Dimension.FREQUENCY);
            boolean heater = r.heater() != null;
            add(out, Severity.NOTICE, f, Double.NaN, "Hz", "$.frequency_Hz",
                    "The operating frequency (" + range + ") lies outside the bands commonly allotted to inductive "
                            + "power transfer and ISM use."
                            + (heater ? " Induction heaters are ISM equipment under CISPR 11 (group 2) and may run "
                            + "outside these bands if they meet its emission limits." : ""),
                    "Check the radio rules where it will be used: they decide which frequencies and field strengths "
                            + "are allowed. Moving into a listed band (see docs/safety.md) usually simplifies approval.");
        }

        private static double finiteOr(double x, double fallback) {
            return finite(x) ? x : fallback;
        }
    }
}
