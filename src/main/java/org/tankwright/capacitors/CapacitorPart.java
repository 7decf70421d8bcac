package org.tankwright.capacitors;

import java.util.List;

/**
 * One capacitor part: a series R-L-C with its ratings.
 *
 * <p>Losses are carried as {@code tan δ} quoted at {@code lossFrequency} and moved to another
 * frequency by {@code tan δ(f) = tanDelta·(f/lossFrequency)^lossExponent} (the exponent defaults
 * to the dielectric's); {@code ESR(f) = tan δ(f)/(2πfC)}. A catalogue that gives ESR at a
 * frequency is converted to tan δ there ({@code tan δ = 2πf·C·ESR}).
 *
 * <p>Optional ratings are {@code null} when the part does not state them.
 *
 * @param id                  catalogue identifier
 * @param description         free text
 * @param capacitance         nominal capacitance, F
 * @param tolerance           capacitance tolerance, fraction (0.05 = ±5 %)
 * @param dielectric          dielectric
 * @param tempcoPpmPerK       temperature coefficient of capacitance, ppm/K
 * @param tanDelta            dissipation factor at {@code lossFrequency}
 * @param lossFrequency       frequency tan δ is quoted at, Hz
 * @param lossExponent        α of tan δ ∝ f^α
 * @param esl                 equivalent series inductance, H
 * @param dcRating            rated DC voltage, V (bounds DC + AC peak)
 * @param acRating            rated AC voltage at low frequency, V rms, or null
 * @param acRatingTable       AC rating (V rms) against frequency, ascending; may be empty
 * @param currentRating       rms current rating, A
 * @param dvdtRating          pulse rise-rate rating, V/s, or null
 * @param maxDissipation      power the case may dissipate, W, or null
 * @param maxCaseTemperature  case temperature limit, °C, or null
 * @param price               price per part in the catalogue's currency, or null
 * @param note                where the ratings come from
 */
public record CapacitorPart(String id, String description, double capacitance, double tolerance,
                            Dielectric dielectric, double tempcoPpmPerK, double tanDelta,
                            double lossFrequency, double lossExponent, double esl, double dcRating,
                            Double acRating, List<AcRatingPoint> acRatingTable, double currentRating,
                            Double dvdtRating, Double maxDissipation, Double maxCaseTemperature,
                            Double price, String note) {

    public CapacitorPart {
        String who = "part " + id + ": ";
        if (id == null || id.isBlank()) {
            throw new IllegalArgumentException("part id must be a non-empty text");
        }
        positive(who, "capacitance_F", capacitance, "farads");
        if (!(tolerance >= 0 && tolerance < 1)) {
            throw new IllegalArgumentException(who + "tolerance = " + tolerance + ": must be a fraction in [0, 1) (0.05 = 5 %)");
        }
        if (dielectric == null) {
            throw new IllegalArgumentException(who + "dielectric missing");
        }
        finite(who, "tempco_ppm_per_K", tempcoPpmPerK);
        if (!(tanDelta > 0 && tanDelta < 1)) {
            throw new IllegalArgumentException(who + "tan_delta = " + tanDelta + ": must lie in (0, 1)");
        }
        positive(who, "loss_frequency_Hz", lossFrequency, "hertz");
        if (!(lossExponent >= -1 && lossExponent <= 1)) {
            throw new IllegalArgumentException(who + "tan_delta_exponent = " + lossExponent + ": must lie in [-1, 1]");
        }
        if (!(esl >= 0) || !Double.isFinite(esl)) {
            throw new IllegalArgumentException(who + "esl_H = " + esl + ": must be zero or a positive number of henries");
        }
        positive(who, "dc_rating_V", dcRating, "volts");
        if (acRating != null) {
            positive(who, "ac_rating_V", acRating, "volts rms");
        }
        acRatingTable = acRatingTable == null ? List.of() : List.copyOf(acRatingTable);
        for (int i = 1; i < acRatingTable.size(); i++) {
            if (!(acRatingTable.get(i).frequency() > acRatingTable.get(i - 1).frequency())) {
                throw new IllegalArgumentException(who + "ac_rating_table: frequencies must ascend strictly, entry "
                        + (i + 1) + " has " + acRatingTable.get(i).frequency() + " Hz after "
                        + acRatingTable.get(i - 1).frequency() + " Hz");
            }
        }
        positive(who, "current_rating_A", currentRating, "amperes rms");
        if (dvdtRating != null) {
            positive(who, "dvdt_V_per_s", dvdtRating, "volts per second");
        }
        if (maxDissipation != null) {
            positive(who, "max_dissipation_W", maxDissipation, "watts");
        }
        if (maxCaseTemperature != null) {
            finite(who, "max_case_temperature_degC", maxCaseTemperature);
        }
        if (price != null && !(price >= 0 && Double.isFinite(price))) {
            throw new IllegalArgumentException(who + "price = " + price + ": must be zero or positive");
        }
        description = description == null ? "" : description;
        note = note == null ? "" : note;
    }

    private static void positive(String who, String field, double v, String unit) {
        if (!(v > 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(who + field + " = " + v + ": must be a positive number of " + unit);
        }
    }

    private static void finite(String who, String field, double v) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException(who + field + " = " + v + ": must be a finite number");
        }
    }

    /** Self-resonant frequency 1/(2π√(ESL·C)), Hz; infinite when ESL is zero. */
    public double srf() {
        return esl == 0 ? Double.POSITIVE_INFINITY : 1.0 / (2 * Math.PI * Math.sqrt(esl * capacitance));
    }

    /** Dissipation factor at frequency f (Hz), by the part's loss law. */
    public double tanDeltaAt(double f) {
        return lossExponent == 0 ? tanDelta : tanDelta * Math.pow(f / lossFrequency, lossExponent);
    }

    /** Equivalent series resistance at f: tan δ(f)/(2πfC), Ω. */
    public double esrAt(double f) {
        return tanDeltaAt(f) / (2 * Math.PI * f * capacitance);
    }

    /** Whether any AC voltage limit is stated (rating, table, or dissipation limit). */
    public boolean hasAcRating() {
        return acRating != null || !acRatingTable.isEmpty() || maxDissipation != null;
    }

    /**
     * AC voltage rating (V rms) at frequency f: the least of the low-frequency AC rating, the
     * table (log-log interpolation; held flat below its first point and falling as 1/√f past its
     * last, the dissipation-limited slope), the current limit I/(2πfC) and, when the part gives a
     * dissipation limit, √(P/ESR(f))/(2πfC). Infinite when the part states none of them.
     */
    public double acRatingAt(double f) {
        double w = 2 * Math.PI * f;
        double v = acRating == null ? Double.POSITIVE_INFINITY : acRating;
        if (!acRatingTable.isEmpty()) {
            v = Math.min(v, interpolateTable(f));
        }
        if (!hasAcRating()) {
            return Double.POSITIVE_INFINITY;
        }
        v = Math.min(v, currentRating / (w * capacitance));
        if (maxDissipation != null) {
            v = Math.min(v, Math.sqrt(maxDissipation / esrAt(f)) / (w * capacitance));
        }
        return v;
    }

    private double interpolateTable(double f) {
        List<AcRatingPoint> t = acRatingTable;
        AcRatingPoint first = t.get(0);
        AcRatingPoint last = t.get(t.size() - 1);
        if (f <= first.frequency()) {
            return first.voltageRms();
        }
        if (f >= last.frequency()) {
            return last.voltageRms() * Math.sqrt(last.frequency() / f);
        }
        for (int i = 1; i < t.size(); i++) {
            AcRatingPoint b = t.get(i);
            if (f <= b.frequency()) {
                AcRatingPoint a = t.get(i - 1);
                double s = Math.log(f / a.frequency()) / Math.log(b.frequency() / a.frequency());
                return a.voltageRms() * Math.exp(s * Math.log(b.voltageRms() / a.voltageRms()));
            }
        }
        return last.voltageRms();
    }

    /** A builder with the dielectric's defaults; {@code build()} validates. */
    public static Builder builder(String id, double capacitance, Dielectric dielectric) {
        return new Builder(id, capacitance, dielectric);
    }

    /** Builds parts field by field (catalogue reader, templates, tests). */
    public static final class Builder {
        private final String id;
        private final double capacitance;
        private final Dielectric dielectric;
        private String description = "";
        private double tolerance = 0.05;
        private Double tempco;
        private double tanDelta = 2e-4;
        private double lossFrequency = 1e3;
        private Double lossExponent;
        private double esl = 10e-9;
        private double dcRating = 630;
        private Double acRating;
        private List<AcRatingPoint> table = List.of();
        private double currentRating = 1;
        private Double dvdt;
        private Double maxDissipation;
        private Double maxCaseTemperature;
        private Double price;
        private String note = "";

        private Builder(String id, double capacitance, Dielectric dielectric) {
            this.id = id;
            this.capacitance = capacitance;
            this.dielectric = dielectric;
        }

        public Builder description(String v) { description = v; return this; }
        public Builder tolerance(double v) { tolerance = v; return this; }
        public Builder tempcoPpmPerK(double v) { tempco = v; return this; }
        public Builder tanDelta(double tanDelta, double atFrequency) { this.tanDelta = tanDelta; lossFrequency = atFrequency; return this; }
        /** ESR quoted at a frequency, converted to tan δ = 2πf·C·ESR there. */
        public Builder esr(double esr, double atFrequency) { return tanDelta(2 * Math.PI * atFrequency * capacitance * esr, atFrequency); }
        public Builder lossExponent(double v) { lossExponent = v; return this; }
        public Builder esl(double v) { esl = v; return this; }
        public Builder dcRating(double v) { dcRating = v; return this; }
        public Builder acRating(Double v) { acRating = v; return this; }
        public Builder acRatingTable(List<AcRatingPoint> v) { table = v; return this; }
        public Builder currentRating(double v) { currentRating = v; return this; }
        public Builder dvdtRating(Double v) { dvdt = v; return this; }
        public Builder maxDissipation(Double v) { maxDissipation = v; return this; }
        public Builder maxCaseTemperature(Double v) { maxCaseTemperature = v; return this; }
        public Builder price(Double v) { price = v; return this; }
        public Builder note(String v) { note = v; return this; }

        public CapacitorPart build() {
            return new CapacitorPart(id, description, capacitance, tolerance, dielectric,
                    tempco == null ? (dielectric == null ? 0 : dielectric.typicalTempcoPpmPerK()) : tempco,
                    tanDelta, lossFrequency,
                    lossExponent == null ? (dielectric == null ? 0 : dielectric.lossExponent()) : lossExponent,
                    esl, dcRating, acRating, table, currentRating, dvdt, maxDissipation,
                    maxCaseTemperature, price, note);
        }
    }
}
