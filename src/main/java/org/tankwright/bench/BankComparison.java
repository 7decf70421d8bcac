package org.tankwright.bench;

import org.tankwright.capacitors.BankEvaluator;
import org.tankwright.capacitors.BankLayout;
import org.tankwright.capacitors.BankRequest;
import org.tankwright.capacitors.BankSearchResult;
import org.tankwright.capacitors.BankStress;
import org.tankwright.capacitors.BankSynthesis;
import org.tankwright.capacitors.CapacitorBank;
import org.tankwright.capacitors.CapacitorPart;
import org.tankwright.capacitors.CatalogueReader;
import org.tankwright.capacitors.ESeries;
import org.tankwright.capacitors.PartTemplate;
import org.tankwright.capacitors.TrimPosition;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Capacitor bank search over a 300-part catalogue (the bundled demo catalogue filled up with C0G
 * 1000 V parts of the E24 series) against the brute force that evaluates every layout within the
 * same bounds (4 in series × 8 in parallel, with a trim part): 47 nF ± 2 % at 400 V, 5 A, 100 kHz.
 *
 * @param parts        catalogue size
 * @param searched     layouts the pruned search evaluated
 * @param bruteLayouts layouts the brute force enumerated
 * @param search       time of the pruned search
 * @param brute        time of the brute force
 * @param sameBanks    whether both return the same banks in the same order
 * @param best         the best bank's layout, or "none"
 */
public record BankComparison(int parts, long searched, long bruteLayouts, Timing search, Timing brute, boolean sameBanks,
                             String best) {

    /** The 300-part catalogue. */
    public static List<CapacitorPart> catalogue() {
        List<CapacitorPart> parts = new ArrayList<>(CatalogueReader.demo().parts());
        for (CapacitorPart p : PartTemplate.named("c0g-1000v").parts(ESeries.E24, 1e-9, 22e-9)) {
            if (parts.size() < 300) {
                parts.add(p);
            }
        }
        return parts;
    }

    /** The request compared (bounds small enough for the brute force to finish in seconds). */
    public static BankRequest request() {
        return BankRequest.of(47e-9, 0.02, BankStress.sinusoidal(400, 5, 0, 100e3)).withBounds(4, 8, true, 5);
    }

    /** Measures both ways; {@code quick} uses fewer runs. */
    public static BankComparison run(boolean quick) {
        List<CapacitorPart> parts = catalogue();
        BankRequest req = request();
        Timing ts = Timing.measure(quick ? 3 : 40, quick ? 5 : 31, () -> BankSynthesis.search(req, parts).evaluated());
        long[] count = new long[1];
        Timing tb = Timing.measure(quick ? 0 : 1, quick ? 1 : 3, () -> {
            count[0] = 0;
            return bruteForce(req, parts, count).size();
        });
        BankSearchResult r = BankSynthesis.search(req, parts);
        List<CapacitorBank> b = bruteForce(req, parts, count);
        boolean same = b.stream().map(x -> x.layout().describe()).toList()
                .equals(r.banks().stream().map(x -> x.layout().describe()).toList());
        return new BankComparison(parts.size(), r.evaluated(), count[0], ts, tb, same,
                r.best() == null ? "none" : r.best().layout().describe());
    }

    /** The same ratio in mean process CPU time. */
    public double cpuRatio() {
        return brute.cpuMillis() / Math.max(search.cpuMillis(), 1e-9);
    }

    /** How many times faster the pruned search is than the brute force (median wall times). */
    public double speedUp() {
        return brute.wallMillis() / Math.max(search.wallMillis(), 1e-9);
    }

    /**
     * Every layout within the request's bounds evaluated, the best per main part and count kept, sorted
     * by the search's order: the reference the pruned search must equal. {@code count[0]} receives the
     * number of layouts enumerated.
     */
    public static List<CapacitorBank> bruteForce(BankRequest req, List<CapacitorPart> parts, long[] count) {
        BankEvaluator ev = new BankEvaluator(req);
        Map<String, CapacitorBank> best = new LinkedHashMap<>();
        List<BankLayout> ls = new ArrayList<>();
        for (CapacitorPart p : parts) {
            for (int n = 1; n <= req.maxSeries(); n++) {
                for (int m = 1; m <= req.maxParallel(); m++) {
                    ls.clear();
                    ls.add(BankLayout.of(p, n, m));
                    if (req.allowTrim()) {
                        for (CapacitorPart t : parts) {
                            ls.add(new BankLayout(p, n, m, t, TrimPosition.PARALLEL));
                            ls.add(new BankLayout(p, n, m, t, TrimPosition.SERIES));
                        }
                    }
                    for (BankLayout l : ls) {
                        count[0]++;
                        if (Math.abs(l.capacitance() / req.targetCapacitance() - 1) > req.maxDeviation()) {
                            continue;
                        }
                        CapacitorBank b = ev.evaluate(l);
                        if (b.feasible()) {
                            best.merge(p.id() + "|" + n + "|" + m, b, (a, c) -> BankSynthesis.ORDER.compare(a, c) <= 0 ? a : c);
                        }
                    }
                }
            }
        }
        return BankSynthesis.asBuilt(best.values().stream().sorted(BankSynthesis.ORDER).limit(req.alternatives()).toList(), ev);
    }
}
