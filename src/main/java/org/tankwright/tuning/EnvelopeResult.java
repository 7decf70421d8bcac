package org.tankwright.tuning;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * What {@link OperatingEnvelope#evaluate} finds: every grid point with its control setting, the
 * worst value of each stress and the point producing it (grid plus a local search of the
 * interior), where the control target cannot be reached, the trip levels, and the fault cases
 * (open load, shorted load, removed receiver) checked against those levels.
 */
public record EnvelopeResult(List<Point> grid, Map<Stress, Worst> worst, List<Coordinates> unreachable,
                             TripLevels trip, List<Fault> faults, List<String> warnings) {

    public EnvelopeResult {
        grid = List.copyOf(grid);
        worst = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(worst));
        unreachable = List.copyOf(unreachable);
        faults = List.copyOf(faults);
        warnings = List.copyOf(warnings);
    }

    /**
     * A point of the envelope: s (and t, the second coupling axis, 0 for a path) along the coupling
     * range and its state, the load in the design
     * load's unit, frequency (Hz) and coil temperature (°C).
     */
    public record Coordinates(double s, double t, double k, double m, double l1, double l2, double load, double frequency,
                              double temperatureC) {
        Map<String, Object> keyValues() {
            Map<String, Object> m0 = new LinkedHashMap<>();
            m0.put("coupling_s", s);
            m0.put("coupling_t", t);
            m0.put("coupling_k", k);
            m0.put("m_H", m);
            m0.put("l1_H", l1);
            m0.put("l2_H", l2);
            m0.put("load", load);
            m0.put("frequency_Hz", frequency);
            m0.put("temperature_C", temperatureC);
            return m0;
        }
    }

    /** A grid point: the control setting found there, whether the target was reached, and the held output. */
    public record Point(Coordinates at, double amplitude, double duty, boolean reachable, double output) {
    }

    /** The worst value of one stress, where it happens and with what control setting. */
    public record Worst(Stress stress, double value, Coordinates at, double amplitude, double duty, boolean reachable) {
    }

    /**
     * Trip levels a controller needs: primary over-current (rms of I_L1) and output over-voltage,
     * each the worst value in normal operation raised by the margin.
     */
    public record TripLevels(double primaryOverCurrent, double outputOverVoltage, double margin, String basis) {
    }

    /**
     * A fault case: its primary current and output voltage with the control setting held from the
     * nominal point and with the control driven to its limit (chasing a target it lost), and
     * whether the trip levels catch it. {@code unbounded} marks a case the network cannot bound
     * (a lossless resonance, e.g. R1 = 0 with the receiver removed).
     */
    public record Fault(String name, double iL1Held, double vOutHeld, double vC1PeakHeld, double iL1Limit,
                        double vOutLimit, double vC1PeakLimit, boolean detected, boolean unbounded) {
    }

    /** JSON-ready keys (SI values). */
    public Map<String, Object> keyValues() {
        Map<String, Object> m = new LinkedHashMap<>();
        Map<String, Object> w = new LinkedHashMap<>();
        for (Worst x : worst.values()) {
            Map<String, Object> e = new LinkedHashMap<>();
            e.put("value", x.value());
            e.put("at", x.at().keyValues());
            e.put("amplitude", x.amplitude());
            e.put("duty", x.duty());
            e.put("target_reached", x.reachable());
            w.put(x.stress().key(), e);
        }
        m.put("worst", w);
        List<Object> un = new ArrayList<>();
        for (Coordinates c : unreachable) {
            un.add(c.keyValues());
        }
        m.put("unreachable_points", un);
        m.put("grid_points", grid.size());
        Map<String, Object> t = new LinkedHashMap<>();
        t.put("primary_over_current_A", trip.primaryOverCurrent());
        t.put("output_over_voltage_V", trip.outputOverVoltage());
        t.put("margin", trip.margin());
        t.put("basis", trip.basis());
        m.put("trip_levels", t);
        List<Object> fl = new ArrayList<>();
        for (Fault f : faults) {
            Map<String, Object> e = new LinkedHashMap<>();
            e.put("name", f.name());
            e.put("unbounded", f.unbounded());
            if (!f.unbounded()) {
                e.put("i_l1_held_A", f.iL1Held());
                e.put("v_out_held_V", f.vOutHeld());
                e.put("v_c1_peak_held_V", f.vC1PeakHeld());
                e.put("i_l1_at_limit_A", f.iL1Limit());
                e.put("v_out_at_limit_V", f.vOutLimit());
                e.put("v_c1_peak_at_limit_V", f.vC1PeakLimit());
            }
            e.put("detected_by_trip", f.detected());
            fl.add(e);
        }
        m.put("faults", fl);
        m.put("warnings", warnings);
        return m;
    }
}
