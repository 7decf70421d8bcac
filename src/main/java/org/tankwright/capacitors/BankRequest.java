package org.tankwright.capacitors;

/**
 * What a bank must do and how far the search may go.
 *
 * @param targetCapacitance  capacitance wanted, F
 * @param maxDeviation       largest |C/target − 1| accepted (nominal values)
 * @param stress             voltage, current and frequency the bank carries
 * @param derating           derating rules
 * @param maxSeries          search bound: most parts in series per string
 * @param maxParallel        search bound: most strings in parallel
 * @param allowTrim          whether one trim part may be added
 * @param alternatives       how many banks to return (best first, distinct part/series/parallel)
 */
public record BankRequest(double targetCapacitance, double maxDeviation, BankStress stress,
                          DeratingRules derating, int maxSeries, int maxParallel, boolean allowTrim,
                          int alternatives) {

    /** Default search bounds: up to 8 in series, 32 strings in parallel, a trim allowed, 5 banks. */
    public static BankRequest of(double targetCapacitance, double maxDeviation, BankStress stress) {
        return new BankRequest(targetCapacitance, maxDeviation, stress, DeratingRules.COMMON_PRACTICE, 8, 32, true, 5);
    }

    public BankRequest {
        if (!(targetCapacitance > 0) || !Double.isFinite(targetCapacitance)) {
            throw new IllegalArgumentException("target = " + targetCapacitance + ": must be a positive number of farads");
        }
        if (!(maxDeviation >= 0 && maxDeviation < 0.5)) {
            throw new IllegalArgumentException("max deviation = " + maxDeviation + ": must be a fraction in [0, 0.5) (2% = 0.02)");
        }
        if (stress == null || derating == null) {
            throw new IllegalArgumentException("bank request needs a stress and derating rules");
        }
        if (maxSeries < 1 || maxSeries > 64) {
            throw new IllegalArgumentException("max series = " + maxSeries + ": must lie in 1..64");
        }
        if (maxParallel < 1 || maxParallel > 256) {
            throw new IllegalArgumentException("max parallel = " + maxParallel + ": must lie in 1..256");
        }
        if (alternatives < 1 || alternatives > 50) {
            throw new IllegalArgumentException("alternatives = " + alternatives + ": must lie in 1..50");
        }
    }

    public BankRequest withDerating(DeratingRules rules) {
        return new BankRequest(targetCapacitance, maxDeviation, stress, rules, maxSeries, maxParallel, allowTrim, alternatives);
    }

    public BankRequest withBounds(int series, int parallel, boolean trim, int count) {
        return new BankRequest(targetCapacitance, maxDeviation, stress, derating, series, parallel, trim, count);
    }
}
