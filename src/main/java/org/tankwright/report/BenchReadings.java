package org.tankwright.report;

import com.google.gson.JsonObject;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.ElementStress;
import org.tankwright.analysis.HeaterReport;
import org.tankwright.analysis.NetworkReport;
import org.tankwright.design.Enums.SourceKind;
import org.tankwright.design.Problems;
import org.tankwright.design.RecordCodec;
import org.tankwright.design.Tolerances;
import org.tankwright.units.Dimension;

import java.util.ArrayList;
import java.util.List;

/**
 * The readings a builder should see at the bench, from the result's operating point: first at a
 * low drive level into a dummy load, then at full power. The network is linear (a phasor model
 * at the fundamental), so every voltage and current at the low level is the full-power value
 * times the drive ratio, powers go with its square, and frequency and efficiency stay.
 *
 * <p>Tolerance bands are the design's own acceptance limits: the resonant frequency within
 * the frequency limit, output power within the power limit, and voltages, currents and
 * efficiency within half the power limit (power goes with the square of a voltage or current,
 * so half the relative band to first order).
 */
public final class BenchReadings {
    /** Highest peak voltage on any part at the low-voltage step, V: inside extra-low voltage (IEC 61140, band I ≤ 50 V rms AC). */
    public static final double LOW_STEP_PEAK = 30.0;

    /**
     * One reading.
     *
     * @param quantity    what to measure, in words
     * @param dim         its dimension
     * @param expected    expected value (the cold point for a heater)
     * @param expectedHot expected value at the hot point (NaN unless a heater)
     * @param band        relative tolerance (± fraction)
     */
    public record Reading(String quantity, Dimension dim, double expected, double expectedHot, double band) {
        /** Lower end of the band (a fraction never above 1). */
        public double min(double v) {
            return v * (1 - band);
        }

        /** Upper end of the band (an efficiency never above 100 %). */
        public double max(double v) {
            double m = v * (1 + band);
            return dim == Dimension.FRACTION ? Math.min(1.0, m) : m;
        }
    }

    /**
     * The low-voltage step and the full-power readings.
     *
     * @param scale          the drive ratio of the low-voltage step (1 when the source is already low)
     * @param currentDriven  whether the drive is a current (current-fed source) rather than a voltage
     * @param drive          the low-step drive amplitude: V rms, or A rms when current-driven
     * @param dummyLoad      the dummy load's resistance, Ω (NaN when the design has no load)
     * @param dummyRating    the power a dummy load must take at full power, W (NaN without a load)
     * @param inputImpedance |Z_in| the low-step source must drive, Ω (NaN when unknown)
     * @param low            readings of the low-voltage step
     * @param full           readings at full power
     * @param heater         whether the full-power readings have a hot column
     * @param frequencyLimit the frequency band, ± fraction
     * @param powerLimit     the power band, ± fraction
     */
    public record Plan(double scale, boolean currentDriven, double drive, double dummyLoad, double dummyRating,
                       double inputImpedance, List<Reading> low, List<Reading> full, boolean heater,
                       double frequencyLimit, double powerLimit) {
    }

    private BenchReadings() {
    }

    /** The design's tolerances, with the file format's defaults when the design sets none. */
    static Tolerances tolerances(AnalysisResult r) {
        Tolerances t = r.design().tolerances();
        return t != null ? t : RecordCodec.read(Tolerances.class, new JsonObject(), "$.tolerances", new Problems());
    }

    /** The readings of a result with a tuned network. */
    public static Plan of(AnalysisResult r) {
        NetworkReport n = r.network();
        Tolerances tol = tolerances(r);
        double fLim = tol.frequencyLimit();
        double pLim = tol.powerLimit();
        double vBand = pLim / 2;
        boolean currentDriven = r.design().source().kind() == SourceKind.CURRENT;
        double full = currentDriven ? n.sourceCurrent() : n.sourceVoltage();
        double maxPeak = 0;
        for (ElementStress s : r.stresses()) {
            if (Fmt.has(s.voltageRms())) {
                maxPeak = Math.max(maxPeak, Math.sqrt(2) * s.voltageRms());
            }
        }
        double scale = maxPeak > LOW_STEP_PEAK ? LOW_STEP_PEAK / maxPeak : 1.0;
        double drive = scale < 1 ? niceFloor(full * scale) : full;
        scale = scale < 1 && Fmt.has(full) && full > 0 ? drive / full : scale;
        HeaterReport h = r.heater();
        double f0 = resonance(n);

        List<Reading> low = new ArrayList<>();
        low.add(new Reading("Resonant frequency (zero phase at the input)", Dimension.FREQUENCY, f0, Double.NaN, fLim));
        if (currentDriven) {
            low.add(new Reading("Drive current", Dimension.CURRENT, full * scale, Double.NaN, vBand));
        } else {
            low.add(new Reading("Input current", Dimension.CURRENT, n.sourceCurrent() * scale, Double.NaN, vBand));
        }
        addStresses(r, low, scale, vBand);
        boolean hasLoad = Fmt.has(n.loadAc()) && n.loadAc() > 0;
        if (hasLoad) {
            low.add(new Reading("Voltage across the dummy load", Dimension.VOLTAGE,
                    Math.sqrt(n.powerOut() * n.loadAc()) * scale, Double.NaN, vBand));
        }
        low.add(new Reading(h != null ? "Power into the workpiece" : hasLoad ? "Power into the dummy load" : "Power into the tank",
                Dimension.POWER, (h != null || hasLoad ? n.powerOut() : n.powerIn()) * scale * scale, Double.NaN, pLim));
        if (hasLoad || h != null) {
            low.add(new Reading("Efficiency", Dimension.FRACTION, n.efficiency(), Double.NaN, vBand));
        }

        List<Reading> fullList = new ArrayList<>();
        if (h != null) {
            HeaterReport.HeaterPoint c = h.cold();
            HeaterReport.HeaterPoint t = h.hot();
            fullList.add(new Reading("Resonant frequency", Dimension.FREQUENCY, c.resonantFrequency(), t.resonantFrequency(), fLim));
            fullList.add(new Reading("Work-coil current", Dimension.CURRENT, c.coilCurrent(), t.coilCurrent(), vBand));
            fullList.add(new Reading("Tank capacitor voltage", Dimension.VOLTAGE, c.capacitorVoltage(), t.capacitorVoltage(), vBand));
            fullList.add(new Reading("Tank capacitor current", Dimension.CURRENT, c.capacitorCurrent(), t.capacitorCurrent(), vBand));
            fullList.add(new Reading("Power into the workpiece", Dimension.POWER, c.power(), t.power(), pLim));
            String lossTo = Fmt.has(h.coolantFlow()) ? "Work-coil loss (to the coolant)" : "Work-coil loss (to the air)";
            fullList.add(new Reading(lossTo, Dimension.POWER, c.coilLoss(), t.coilLoss(), pLim));
            fullList.add(new Reading("Coil efficiency", Dimension.FRACTION, c.coilEfficiency(), t.coilEfficiency(), vBand));
            if (Fmt.has(n.sourceCurrent())) {
                fullList.add(new Reading(currentDriven ? "Drive current" : "Input current", Dimension.CURRENT,
                        n.sourceCurrent(), Double.NaN, vBand));
            }
        } else {
            fullList.add(new Reading("Resonant frequency (zero phase at the input)", Dimension.FREQUENCY, f0, Double.NaN, fLim));
            fullList.add(new Reading(currentDriven ? "Drive current" : "Input current (fundamental)", Dimension.CURRENT,
                    n.sourceCurrent(), Double.NaN, vBand));
            if (Fmt.has(n.dcCurrent())) {
                fullList.add(new Reading("DC bus current", Dimension.CURRENT, n.dcCurrent(), Double.NaN, vBand));
            }
            addStresses(r, fullList, 1.0, vBand);
            if (Fmt.has(n.outputVoltage())) {
                fullList.add(new Reading("Output voltage", Dimension.VOLTAGE, n.outputVoltage(), Double.NaN, vBand));
            }
            fullList.add(new Reading(hasLoad ? "Output power" : "Power into the tank", Dimension.POWER,
                    hasLoad ? n.powerOut() : n.powerIn(), Double.NaN, pLim));
            if (hasLoad) {
                fullList.add(new Reading("Efficiency (source to load)", Dimension.FRACTION, n.efficiency(), Double.NaN, vBand));
            }
        }
        fullList.removeIf(x -> !Fmt.has(x.expected()));
        low.removeIf(x -> !Fmt.has(x.expected()));
        double zin = Math.hypot(n.inputResistance(), n.inputReactance());
        return new Plan(scale, currentDriven, drive, hasLoad ? n.loadAc() : Double.NaN,
                hasLoad ? n.powerOut() : Double.NaN, zin, List.copyOf(low), List.copyOf(fullList), h != null, fLim, pLim);
    }

    /** The zero-phase frequency nearest the operating frequency (the operating frequency when none was found). */
    static double resonance(NetworkReport n) {
        double best = n.frequency();
        double gap = Double.POSITIVE_INFINITY;
        if (n.zeroPhaseFrequencies() != null) {
            for (double f : n.zeroPhaseFrequencies()) {
                if (Math.abs(f - n.frequency()) < gap) {
                    gap = Math.abs(f - n.frequency());
                    best = f;
                }
            }
        }
        return best;
    }

    private static void addStresses(AnalysisResult r, List<Reading> out, double scale, double band) {
        for (ElementStress s : r.stresses()) {
            if (s.id().startsWith("C") || s.id().startsWith("L")) {
                String what = s.id().startsWith("C") ? "capacitor" : "coil";
                out.add(new Reading(s.id() + " " + what + " voltage", Dimension.VOLTAGE, s.voltageRms() * scale,
                        Double.NaN, band));
            }
        }
    }

    /** The largest of 1, 2, 5 × 10ⁿ not above {@code v} (v itself when not positive and finite). */
    static double niceFloor(double v) {
        if (!(v > 0) || !Double.isFinite(v)) {
            return v;
        }
        double p = Math.pow(10, Math.floor(Math.log10(v)));
        double m = v / p * (1 + 1e-9);
        double step = m >= 5 ? 5 : m >= 2 ? 2 : 1;
        return step * p;
    }
}
