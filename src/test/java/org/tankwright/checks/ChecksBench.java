package org.tankwright.checks;

import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.ResultFixtures;

/** Benchmark (not a test): time of one {@link Checks#run} on each fixture, after warm-up. */
public final class ChecksBench {
    private ChecksBench() {
    }

    public static void main(String[] args) {
        AnalysisResult[] rs = {ResultFixtures.ssLink(), ResultFixtures.heater(), ResultFixtures.measuredTank()};
        String[] names = {"SS pad", "heater", "measured tank"};
        for (int k = 0; k < rs.length; k++) {
            int sink = 0;
            for (int i = 0; i < 20_000; i++) {
                sink += Checks.run(rs[k]).size();
            }
            int n = 50_000;
            long t0 = System.nanoTime();
            for (int i = 0; i < n; i++) {
                sink += Checks.run(rs[k]).size();
            }
            double us = (System.nanoTime() - t0) / 1e3 / n;
            System.out.printf("%-14s %6.1f µs per run (%d)%n", names[k], us, sink);
        }
    }
}
