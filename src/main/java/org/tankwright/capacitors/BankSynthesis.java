package org.tankwright.capacitors;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Exhaustive bank search: every part of the list, every n ≤ maxSeries in series and m ≤ maxParallel
 * strings in parallel, with no trim or one trim part (any part of the list) across the bank or
 * in series with it. It returns the same banks as evaluating every one of those layouts
 * (the brute force) but prunes: parts that fail on their own (SRF, dielectric) are dropped
 * once; for a given part, n and m the capacitance window fixes the range of m and of trim
 * values (binary search on the parts sorted by capacitance); and layouts with more parts than
 * the last of the best banks kept are not evaluated.
 *
 * <p>Order: fewest parts, then least |deviation|, then lowest price (unknown price last), then
 * largest worst margin. The banks returned differ in part, n or m (the best trim of each).
 */
public final class BankSynthesis {
    private static final double SLACK = 1e-9;

    /** The ranking order of banks. */
    public static final Comparator<CapacitorBank> ORDER = Comparator
            .comparingInt(CapacitorBank::partCount)
            .thenComparingDouble(b -> Math.abs(b.deviation()))
            .thenComparingDouble(b -> b.price() == null ? Double.POSITIVE_INFINITY : b.price())
            .thenComparingDouble(b -> -b.worstDuty().worstMargin())
            .thenComparing(b -> b.layout().describe());

    private BankSynthesis() {
    }

    /** Searches the parts for the best banks. */
    public static BankSearchResult search(BankRequest request, List<CapacitorPart> parts) {
        return new Search(request, parts).run();
    }

    /** Same as {@link #search} over parts made from E-series values with a template. */
    public static BankSearchResult searchSeries(BankRequest request, ESeries series, PartTemplate template) {
        double t = request.targetCapacitance();
        double low = Math.min(t / (2.0 * request.maxParallel()), t * Math.max(request.maxDeviation(), 1e-3) / 4); // trims too
        return search(request, template.parts(series, low, t * 2.0 * request.maxSeries()));
    }

    /**
     * The banks found, evaluated in full and written as a builder reads them
     * ({@link BankLayout#canonical()}: a trim of the main part itself becomes one more string, the
     * larger of two single parts is the main one), duplicates dropped, sorted. A rewritten layout
     * is evaluated again and kept only when it is still within its limits (an array of equal parts
     * carries the parallel-imbalance derating a trim does not).
     */
    public static List<CapacitorBank> asBuilt(List<CapacitorBank> found, BankEvaluator eval) {
        List<CapacitorBank> out = new ArrayList<>();
        for (CapacitorBank b : found) {
            CapacitorBank shown = eval.evaluate(b.layout());
            BankLayout c = b.layout().canonical();
            if (!c.equals(b.layout())) {
                CapacitorBank rewritten = eval.evaluate(c);
                if (rewritten.feasible() || !shown.feasible()) {
                    shown = rewritten;
                }
            }
            CapacitorBank add = shown;
            if (out.stream().noneMatch(o -> o.layout().equals(add.layout()))) {
                out.add(add);
            }
        }
        out.sort(ORDER);
        return out;
    }

    /** Key that makes banks distinct: part, series, parallel. */
    static String mainKey(BankLayout l) {
        return l.part().id() + "|" + l.series() + "|" + l.parallel();
    }

    private static final class Search {
        private final BankRequest req;
        private final BankEvaluator eval;
        private final List<CapacitorPart> all;
        private final List<BankSearchResult.PartRejection> rejected = new ArrayList<>();
        private final List<CapacitorBank> best = new ArrayList<>();
        private final Map<String, CapacitorBank> misses = new LinkedHashMap<>();
        private CapacitorPart[] usable;
        private double[] caps;
        private long evaluated;

        Search(BankRequest req, List<CapacitorPart> parts) {
            this.req = req;
            this.eval = new BankEvaluator(req);
            this.all = parts;
        }

        BankSearchResult run() {
            filterParts();
            double lo = req.targetCapacitance() * (1 - req.maxDeviation());
            double hi = req.targetCapacitance() * (1 + req.maxDeviation());
            for (CapacitorPart p : usable) {
                double c = p.capacitance();
                for (int n = 1; n <= req.maxSeries(); n++) {
                    // no voltage pruning here: the few untrimmed layouts that fail explain the near misses
                    int m0 = Math.max(1, (int) Math.ceil(lo * n / c * (1 - SLACK)));
                    int m1 = Math.min(req.maxParallel(), (int) Math.floor(hi * n / c * (1 + SLACK)));
                    for (int m = m0; m <= m1 && n * m <= threshold(); m++) {
                        consider(BankLayout.of(p, n, m));
                    }
                }
            }
            if (req.allowTrim()) {
                for (CapacitorPart p : usable) {
                    for (int n = 1; n <= req.maxSeries(); n++) {
                        boolean overVoltage = overVoltageAtAnyM(p, n);
                        for (int m = 1; m <= req.maxParallel() && n * m + 1 <= threshold(); m++) {
                            trims(p, n, m, lo, hi, overVoltage);
                        }
                    }
                }
            }
            List<CapacitorBank> shown = asBuilt(best, eval);
            best.clear();
            best.addAll(shown);
            misses.replaceAll((k, b) -> eval.evaluate(b.layout()));
            List<String> verdicts = new ArrayList<>();
            for (CapacitorBank b : best) {
                verdicts.add(verdict(b, best.get(0)));
            }
            int bestCount = best.isEmpty() ? Integer.MAX_VALUE : best.get(0).partCount();
            List<CapacitorBank> near = misses.values().stream()
                    .filter(b -> b.partCount() < bestCount).sorted(ORDER).toList();
            String bounds = "parts " + all.size() + " (" + usable.length + " usable), series 1.." + req.maxSeries()
                    + ", parallel 1.." + req.maxParallel() + (req.allowTrim() ? ", one trim part (parallel or series)" : ", no trim");
            return new BankSearchResult(List.copyOf(best), List.copyOf(verdicts), near, List.copyOf(rejected), evaluated, bounds);
        }

        private void filterParts() {
            DeratingRules r = req.derating();
            double srfMin = r.srfFactor() * req.stress().frequency();
            List<CapacitorPart> ok = new ArrayList<>();
            for (CapacitorPart p : all) {
                if (p.srf() < srfMin) {
                    rejected.add(new BankSearchResult.PartRejection(p.id(), String.format(Locale.ROOT,
                            "SRF %.4g Hz is below %.3g × the operating frequency (%.4g Hz): the part would act as an inductor or near it",
                            p.srf(), r.srfFactor(), srfMin)));
                } else if (p.dielectric().isClass2() && !r.allowClass2()) {
                    rejected.add(new BankSearchResult.PartRejection(p.id(),
                            "class-2 ceramic: not allowed in a tank by the derating rules (allow_class2 = false)"));
                } else {
                    ok.add(p);
                }
            }
            ok.sort(Comparator.comparingDouble(CapacitorPart::capacitance));
            usable = ok.toArray(new CapacitorPart[0]);
            caps = new double[usable.length];
            for (int i = 0; i < usable.length; i++) {
                caps[i] = usable[i].capacitance();
            }
        }

        /**
         * Whether the main parts are over their voltage limit whatever m (untrimmed or with a
         * parallel trim, the main array sees at least the given rms voltage and the full DC).
         */
        private boolean overVoltageAtAnyM(CapacitorPart p, int n) {
            double share = BankEvaluator.seriesShare(n, p.tolerance());
            double v = req.stress().voltageRms() * share;
            return v > eval.voltageLimit(p, req.stress().dcBias() * share) * (1 + SLACK);
        }

        /** Whether the main parts are over their current limit whatever the trim (series trim: the bank current flows). */
        private boolean overCurrentInSeries(CapacitorPart p, int m) {
            double share = m == 1 ? 1.0 : Math.min(1.0, BankEvaluator.parallelShare(m, p.tolerance())
                    * (1 + req.derating().parallelImbalance()));
            return req.stress().currentRms() * share > req.derating().currentFraction() * p.currentRating() * (1 + SLACK);
        }

        private void trims(CapacitorPart p, int n, int m, double lo, double hi, boolean overVoltage) {
            double cm = m * p.capacitance() / n;
            if (cm < hi && !overVoltage) {
                scanTrims(p, n, m, TrimPosition.PARALLEL, Math.max(0, lo - cm), hi - cm);
            }
            if (cm > lo && !overCurrentInSeries(p, m)) {
                double tLo = 1 / (1 / lo - 1 / cm);
                double tHi = cm > hi ? 1 / (1 / hi - 1 / cm) : Double.POSITIVE_INFINITY;
                scanTrims(p, n, m, TrimPosition.SERIES, tLo, tHi);
            }
        }

        /**
         * Trims of one position for the main array (p, n, m), in order of rising |deviation|
         * (the bank capacitance rises with the trim's in both positions, so |deviation| falls then
         * rises along the sorted parts): once one is feasible, only trims with the same
         * |deviation| can still be the best of this part/series/parallel, so the scan stops there.
         */
        private void scanTrims(CapacitorPart p, int n, int m, TrimPosition pos, double tLo, double tHi) {
            if (untrimmedKept(p, n, m)) {
                return; // the same array without trim is feasible and has fewer parts
            }
            if (caps.length == 0 || tLo * (1 - SLACK) > caps[caps.length - 1] || tHi * (1 + SLACK) < caps[0]) {
                return;
            }
            int lo = firstAtLeast(tLo * (1 - SLACK));
            int hi = firstAtLeast(Math.nextUp(tHi * (1 + SLACK))) - 1;
            if (lo > hi) {
                return;
            }
            double t = req.targetCapacitance();
            double cm = m * p.capacitance() / n;
            double ideal = pos == TrimPosition.PARALLEL ? t - cm : (cm > t ? 1 / (1 / t - 1 / cm) : Double.POSITIVE_INFINITY);
            int right = Math.max(lo, Math.min(hi + 1, firstAtLeast(ideal)));
            int left = right - 1;
            double found = Double.NaN;
            while (left >= lo || right <= hi) {
                double dl = left >= lo ? absDeviation(cm, caps[left], pos) : Double.POSITIVE_INFINITY;
                double dr = right <= hi ? absDeviation(cm, caps[right], pos) : Double.POSITIVE_INFINITY;
                int i;
                double d;
                if (dl <= dr) {
                    i = left--;
                    d = dl;
                } else {
                    i = right++;
                    d = dr;
                }
                if (d > found) { // false while found is NaN
                    return;
                }
                if (consider(new BankLayout(p, n, m, usable[i], pos)) && Double.isNaN(found)) {
                    found = d;
                }
            }
        }

        private double absDeviation(double cm, double ct, TrimPosition pos) {
            double c = pos == TrimPosition.PARALLEL ? cm + ct : cm * ct / (cm + ct); // as BankLayout.capacitance()
            return Math.abs(c / req.targetCapacitance() - 1);
        }

        private int firstAtLeast(double c) {
            int i = Arrays.binarySearch(caps, c);
            if (i < 0) {
                return -i - 1;
            }
            while (i > 0 && caps[i - 1] >= c) {
                i--;
            }
            return i;
        }

        private boolean untrimmedKept(CapacitorPart p, int n, int m) {
            for (CapacitorBank b : best) {
                BankLayout l = b.layout();
                if (l.trim() == null && l.part() == p && l.series() == n && l.parallel() == m) {
                    return true;
                }
            }
            return false;
        }

        private int threshold() {
            return best.size() < req.alternatives() ? Integer.MAX_VALUE : best.get(best.size() - 1).partCount();
        }

        /** Evaluates one layout within the deviation; true when it is feasible (and offered). */
        private boolean consider(BankLayout layout) {
            evaluated++;
            double dev = layout.capacitance() / req.targetCapacitance() - 1;
            if (Math.abs(dev) > req.maxDeviation()) {
                return false;
            }
            CapacitorBank b = eval.evaluate(layout, false);
            if (!b.feasible()) {
                String why = b.worstDuty().limitingCheck();
                CapacitorBank old = misses.get(why);
                if (old == null || ORDER.compare(b, old) < 0) {
                    misses.put(why, b);
                }
                return false;
            }
            offer(best, b, req.alternatives());
            return true;
        }
    }

    /** Keeps the k best banks with distinct part/series/parallel, sorted. */
    static void offer(List<CapacitorBank> list, CapacitorBank b, int k) {
        BankLayout l = b.layout();
        for (int i = 0; i < list.size(); i++) {
            BankLayout o = list.get(i).layout();
            if (o.part() == l.part() && o.series() == l.series() && o.parallel() == l.parallel()) {
                if (ORDER.compare(b, list.get(i)) < 0) {
                    list.remove(i);
                    insertSorted(list, b);
                }
                return;
            }
        }
        if (list.size() < k || ORDER.compare(b, list.get(list.size() - 1)) < 0) {
            insertSorted(list, b);
            if (list.size() > k) {
                list.remove(list.size() - 1);
            }
        }
    }

    private static void insertSorted(List<CapacitorBank> list, CapacitorBank b) {
        int i = 0;
        while (i < list.size() && ORDER.compare(list.get(i), b) <= 0) {
            i++;
        }
        list.add(i, b);
    }

    /** Why bank b ranks below the best. */
    static String verdict(CapacitorBank b, CapacitorBank best) {
        if (b == best) {
            return "best";
        }
        if (b.partCount() != best.partCount()) {
            return (b.partCount() - best.partCount()) + " more part(s): " + b.partCount() + " against " + best.partCount();
        }
        if (Math.abs(b.deviation()) != Math.abs(best.deviation())) {
            return String.format(Locale.ROOT, "same part count, larger deviation: %+.3f %% against %+.3f %%",
                    100 * b.deviation(), 100 * best.deviation());
        }
        if (b.price() == null || (best.price() != null && b.price() > best.price())) {
            return "same part count and deviation, " + (b.price() == null ? "price unknown" : "higher price");
        }
        return String.format(Locale.ROOT, "same part count, deviation and price, smaller margin: %.1f %% against %.1f %%",
                100 * b.worstDuty().worstMargin(), 100 * best.worstDuty().worstMargin());
    }
}
