package org.tankwright.capacitors;

import org.tankwright.provenance.Provenance;
import java.util.ArrayList;
import java.util.List;

/**
 * Evaluates a bank layout against a stress and derating rules.
 *
 * <p>Sharing: parts in a string divide the AC voltage inversely to their capacitance; strings
 * divide the current in proportion to theirs. The worst part is taken at the tolerance edge
 * against all the others ({@link #seriesShare}, {@link #parallelShare}); paralleled strings
 * additionally take the layout/ESL imbalance of the derating rules. DC bias divides like the
 * AC voltage, which assumes balancing resistors matched as well as the capacitors (common
 * practice for DC across series parts). Stress: the bank carries the worse of the given rms
 * voltage and the one the given current implies (and likewise for current), since for a
 * capacitor the two are tied by its impedance.
 *
 * <p>Not thread-safe (it caches each part's ESR and AC rating at the frequency): one per search.
 */
public final class BankEvaluator {
    private static final double FAR_OVER = 1e6;
    private static final Provenance PROVENANCE = Provenance.ranged("series R-L-C part model; capacitive sharing at tolerance edge",
            "ESR = tan δ/(ωC), SRF = 1/(2π√(ESL·C)) (standard circuit theory); derating: common practice",
            "valid below the parts' SRF; voltage sharing ignores leakage (DC) beyond balancing resistors");

    private final BankRequest request;
    private final double omega;
    private final java.util.IdentityHashMap<CapacitorPart, double[]> atFrequency = new java.util.IdentityHashMap<>();

    public BankEvaluator(BankRequest request) {
        this.request = request;
        this.omega = 2 * Math.PI * request.stress().frequency();
    }

    public BankRequest request() {
        return request;
    }

    /**
     * Share of the string voltage on the worst of n series parts with tolerance t: that part at
     * −t, the others at +t: (1+t)/((1+t) + (n−1)(1−t)). Equals 1/n at t = 0.
     */
    public static double seriesShare(int n, double t) {
        return (1 + t) / ((1 + t) + (n - 1) * (1 - t));
    }

    /** Share of the bank current in the worst of m strings, capacitive only: same form as {@link #seriesShare}. */
    public static double parallelShare(int m, double t) {
        return seriesShare(m, t);
    }

    /** Evaluates the layout; never null. {@link CapacitorBank#feasible()} tells whether it passes. */
    public CapacitorBank evaluate(BankLayout layout) {
        return evaluate(layout, true);
    }

    /** ESR and AC rating of a part at the operating frequency, computed once per part. */
    private double[] facts(CapacitorPart p) {
        double[] f = atFrequency.get(p);
        if (f == null) {
            double fr = request.stress().frequency();
            f = new double[]{p.esrAt(fr), p.acRatingAt(fr)};
            atFrequency.put(p, f);
        }
        return f;
    }

    /**
     * The rms AC voltage a part may take at the operating frequency after derating, given the DC
     * across it (the voltage check of {@link PartDuty#voltageRmsLimit()}).
     */
    double voltageLimit(CapacitorPart p, double dcOnPart) {
        DeratingRules r = request.derating();
        double crest = request.stress().crestFactor();
        return Math.max(0, Math.min(r.acVoltageFraction() * facts(p)[1],
                (r.peakVoltageFraction() * p.dcRating() - dcOnPart) / crest));
    }

    /** Evaluates; without {@code withWarnings} the warning list is left empty (the search's fast path). */
    CapacitorBank evaluate(BankLayout layout, boolean withWarnings) {
        BankStress s = request.stress();
        CapacitorPart p = layout.part();
        int n = layout.series();
        int m = layout.parallel();
        double f = s.frequency();
        // main array impedance n/m × part impedance
        double zr = facts(p)[0] * n / m;
        double zi = (omega * p.esl() - 1 / (omega * p.capacitance())) * n / m;
        double mainMag = magnitude(zr, zi);
        double br = zr;
        double bi = zi;
        double tr = 0;
        double ti = 0;
        CapacitorPart t = layout.trim();
        if (t != null) {
            tr = facts(t)[0];
            ti = omega * t.esl() - 1 / (omega * t.capacitance());
            if (layout.trimPosition() == TrimPosition.SERIES) {
                br = zr + tr;
                bi = zi + ti;
            } else { // 1/(1/Zm + 1/Zt) = Zm·Zt/(Zm + Zt)
                double nr = zr * tr - zi * ti;
                double ni = zr * ti + zi * tr;
                double dr = zr + tr;
                double di = zi + ti;
                double d2 = dr * dr + di * di;
                br = (nr * dr + ni * di) / d2;
                bi = (ni * dr - nr * di) / d2;
            }
        }
        double bankMag = magnitude(br, bi);
        double vBank = Math.max(s.voltageRms(), s.currentRms() * bankMag);
        double iBank = Math.max(s.currentRms(), s.voltageRms() / bankMag);
        double crest = s.crestFactor();
        double dvdtScale = s.dvdt() > 0 && s.voltageRms() > 0 ? s.dvdt() / s.voltageRms() : omega * crest;

        double vMain;
        double iMain;
        double dcMain;
        double vTrim = 0;
        double iTrim = 0;
        double dcTrim = 0;
        if (t == null) {
            vMain = vBank;
            iMain = iBank;
            dcMain = s.dcBias();
        } else if (layout.trimPosition() == TrimPosition.PARALLEL) {
            vMain = vBank;
            iMain = vBank / mainMag;
            dcMain = s.dcBias();
            vTrim = vBank;
            iTrim = vBank / magnitude(tr, ti);
            dcTrim = s.dcBias();
        } else {
            iMain = iBank;
            vMain = iBank * mainMag;
            iTrim = iBank;
            vTrim = iBank * magnitude(tr, ti);
            double cm = layout.mainCapacitance();
            double ct = t.capacitance();
            dcMain = s.dcBias() * ct / (cm + ct); // capacitive (balanced) division of the DC
            dcTrim = s.dcBias() * cm / (cm + ct);
        }
        DeratingRules r = request.derating();
        double vsh = seriesShare(n, p.tolerance());
        double ish = m == 1 ? 1.0 : Math.min(1.0, parallelShare(m, p.tolerance()) * (1 + r.parallelImbalance()));
        PartDuty mainDuty = duty("main", p, n * m, vMain * vsh, dcMain * vsh, iMain * ish, crest, dvdtScale);
        PartDuty trimDuty = t == null ? null : duty("trim", t, 1, vTrim, dcTrim, iTrim, crest, dvdtScale);

        double c = layout.capacitance();
        double esl = Math.max(0, (bi + 1 / (omega * c)) / omega);
        double srf = esl == 0 ? Double.POSITIVE_INFINITY : 1 / (2 * Math.PI * Math.sqrt(esl * c));
        double tol;
        double tempco;
        if (t == null) {
            tol = p.tolerance();
            tempco = p.tempcoPpmPerK();
        } else {
            double cm = layout.mainCapacitance();
            double ct = t.capacitance();
            double wm = layout.trimPosition() == TrimPosition.PARALLEL ? cm / (cm + ct) : ct / (cm + ct);
            tol = wm * p.tolerance() + (1 - wm) * t.tolerance();
            tempco = wm * p.tempcoPpmPerK() + (1 - wm) * t.tempcoPpmPerK();
        }
        double vTop = s.dcBias() + crest * vBank;
        Double price = p.price() == null || (t != null && t.price() == null) ? null
                : p.price() * n * m + (t == null ? 0 : t.price());
        return new CapacitorBank(layout, c, c / request.targetCapacitance() - 1, br, esl, srf, tol, tempco,
                vBank, iBank, iBank * iBank * br, 0.5 * c * vTop * vTop, price, mainDuty, trimDuty,
                withWarnings ? warnings(layout, vBank, iBank) : List.of(), PROVENANCE);
    }

    private PartDuty duty(String role, CapacitorPart p, int count, double vrms, double vdc, double irms,
                          double crest, double dvdtScale) {
        DeratingRules r = request.derating();
        double f = request.stress().frequency();
        double peak = vdc + crest * vrms;
        double peakLimit = r.peakVoltageFraction() * p.dcRating();
        double vLimit = voltageLimit(p, vdc);
        double iLimit = r.currentFraction() * p.currentRating();
        double pd = irms * irms * facts(p)[0];
        double pLimit = p.maxDissipation() == null ? Double.POSITIVE_INFINITY : r.dissipationFraction() * p.maxDissipation();
        double dvdt = dvdtScale * vrms;
        double dvdtLimit = p.dvdtRating() == null ? Double.POSITIVE_INFINITY : r.dvdtFraction() * p.dvdtRating();
        double srf = p.srf();
        double srfLimit = r.srfFactor() * f;

        String worst = "voltage";
        double ratio = ratio(vrms, vLimit);
        double q = ratio(peak, peakLimit);
        if (q > ratio) { ratio = q; worst = "peak voltage"; }
        q = ratio(irms, iLimit);
        if (q > ratio) { ratio = q; worst = "current"; }
        q = ratio(pd, pLimit);
        if (q > ratio) { ratio = q; worst = "dissipation"; }
        q = ratio(dvdt, dvdtLimit);
        if (q > ratio) { ratio = q; worst = "dV/dt"; }
        q = ratio(srfLimit, srf);
        if (q > ratio) { ratio = q; worst = "SRF"; }
        if (p.dielectric().isClass2() && !r.allowClass2()) {
            ratio = FAR_OVER;
            worst = "class-2 dielectric";
        }
        return new PartDuty(role, p, count, vrms, vdc, peak, irms, pd, dvdt, vLimit, peakLimit, iLimit, pLimit,
                dvdtLimit, srf, srfLimit, 1 - ratio, worst);
    }

    /** |x + jy|; plain √ (Math.hypot guards against overflow these values never reach, slowly). */
    private static double magnitude(double x, double y) {
        return Math.sqrt(x * x + y * y);
    }

    private static double ratio(double stress, double limit) {
        if (stress <= 0) {
            return 0;
        }
        return limit > 0 ? Math.min(FAR_OVER, stress / limit) : FAR_OVER;
    }

    private List<String> warnings(BankLayout layout, double vBank, double iBank) {
        List<String> w = new ArrayList<>();
        BankStress s = request.stress();
        for (CapacitorPart p : layout.trim() == null ? List.of(layout.part()) : List.of(layout.part(), layout.trim())) {
            if (p.dielectric().isClass2()) {
                w.add(p.id() + ": class-2 ceramic: capacitance drifts with DC bias, AC voltage, temperature and age,"
                        + " and losses are high; unsuited to a resonant tank");
            } else if (!p.dielectric().suitsResonantTank()) {
                w.add(p.id() + ": " + p.dielectric().description() + " has high losses at tank frequencies");
            }
            if (!p.hasAcRating()) {
                w.add(p.id() + ": no AC rating given; checked against its DC rating only");
            }
        }
        int seriesParts = layout.series() + (layout.trimPosition() == TrimPosition.SERIES ? 1 : 0);
        if (s.dcBias() > 0 && seriesParts > 1) {
            w.add("DC bias across series parts: fit balancing resistors so each part takes its share");
        }
        if (layout.parallel() > 1) {
            w.add("paralleled strings share current by layout and ESL: keep the connections symmetric"
                    + " (derated for " + Math.round(request.derating().parallelImbalance() * 100) + " % imbalance)");
        }
        if (s.voltageRms() > 0 && s.currentRms() > 0) {
            double rel = Math.max(vBank / s.voltageRms(), iBank / s.currentRms());
            if (rel > 1.05) {
                w.add(String.format(java.util.Locale.ROOT,
                        "the given voltage and current disagree with this bank's impedance by a factor %.2f;"
                                + " the bank is checked at %.4g V rms and %.4g A rms", rel, vBank, iBank));
            }
        }
        return List.copyOf(w);
    }
}
