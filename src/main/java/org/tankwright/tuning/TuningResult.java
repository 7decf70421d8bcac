package org.tankwright.tuning;

import org.tankwright.circuit.OperatingPoint;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The result of {@link Tuner#tune}: capacitors as sized (and their textbook values), the phase
 * solve, the operating point, zero-phase frequencies, bifurcation thresholds and the efficiency
 * optimum. {@link #keyValues()} is the one place the {@code tune --json} keys are built.
 *
 * @param c2 and {@code c2Textbook} are 0 for a single tank
 * @param phase              null when C1 was fixed (or for a tank)
 * @param optimum            numerical ηmax over the load (null for a tank)
 * @param closedForm         SS closed-form ηmax (null otherwise, or when a coil resistance is 0)
 * @param bifurcationLoads   AC load resistances where the number of zero-phase frequencies changes
 *                           (null when not searched)
 * @param bifurcationCouplings coupling factors (L1, L2 fixed) where it changes (null when not searched)
 */
public record TuningResult(LinkDesign design, double c1, double c2, double c1Textbook, double c2Textbook,
                           PhaseSolve phase, OperatingPoint operatingPoint, double[] zeroPhaseFrequencies,
                           EfficiencyOptimum optimum, EfficiencyOptimum closedForm, double[] bifurcationLoads,
                           double[] bifurcationCouplings, List<String> notes) {

    public TuningResult {
        notes = List.copyOf(notes);
    }

    /**
     * A fresh solver on the tuned network (capacitors as sized, the load at its solved AC
     * resistance, a battery at its equivalent, the source at its value), ready for
     * {@link org.tankwright.circuit.Sweeps} or further solves.
     */
    public org.tankwright.circuit.PhasorSolver newSolver() {
        double rl = design.topology().isLink() ? operatingPoint.loadAc() : 0;
        org.tankwright.circuit.PhasorSolver s = new org.tankwright.circuit.PhasorSolver(Tuner.network(design, c1, c2,
                Double.isInfinite(rl) ? 1 : rl));
        if (design.topology().isLink()) {
            s.setResistance(s.indexOf(org.tankwright.circuit.Topologies.LOAD), rl);
        }
        return s;
    }

    /** Resonant frequency of a single tank, 1/(2π√(LC)). */
    public double tankResonantFrequency() {
        return 1 / (2 * Math.PI * Math.sqrt(design.coils().l1() * c1));
    }

    /** Q of a single tank at resonance, (1/R)·√(L/C) (+∞ shown as 0 when R is 0 is avoided: R must be > 0). */
    public double tankQ() {
        return Math.sqrt(design.coils().l1() / c1) / design.coils().r1();
    }

    /** All results as JSON-ready keys with SI values, in the order of the {@code tune --json} contract. */
    public Map<String, Object> keyValues() {
        boolean link = design.topology().isLink();
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("topology", design.topology().name().toLowerCase(java.util.Locale.ROOT));
        m.put("c1_F", c1);
        if (link) {
            m.put("c2_F", c2);
        }
        m.put("c1_textbook_F", c1Textbook);
        if (link) {
            m.put("c2_textbook_F", c2Textbook);
        }
        Map<String, Object> op = operatingPoint.keyValues();
        for (Map.Entry<String, Object> e : op.entrySet()) {
            if (e.getKey().equals("elements") || e.getKey().equals("bridge") || e.getKey().equals("rectifier")
                    || e.getKey().equals("provenance")) {
                continue;
            }
            m.put(e.getKey(), e.getValue());
        }
        m.put("zero_phase_frequencies_Hz", zeroPhaseFrequencies.clone());
        if (link) {
            m.put("efficiency_max", optimum.efficiency());
            m.put("load_optimal_ohm", optimum.load());
            if (closedForm != null) {
                m.put("efficiency_max_closed_form", closedForm.efficiency());
                m.put("load_optimal_closed_form_ohm", closedForm.load());
            }
            m.put("bifurcated", zeroPhaseFrequencies.length > 1);
            if (bifurcationLoads != null) {
                m.put("bifurcation_load_ohm", bifurcationLoads.clone());
                m.put("bifurcation_coupling", bifurcationCouplings.clone());
            }
            m.put("coupling_k", design.coils().k());
        } else if (design.coils().r1() > 0) {
            m.put("resonant_frequency_Hz", tankResonantFrequency());
            m.put("q", tankQ());
            m.put("bandwidth_Hz", tankResonantFrequency() / tankQ());
        }
        if (phase != null) {
            m.put("target_phase_deg", phase.targetDeg());
            m.put("target_phase_reached", phase.reached());
        }
        for (String k : new String[]{"elements", "bridge", "rectifier"}) {
            if (op.containsKey(k)) {
                m.put(k, op.get(k));
            }
        }
        @SuppressWarnings("unchecked")
        Map<String, Object> prov = new LinkedHashMap<>((Map<String, Object>) op.get("provenance"));
        prov.put("compensation_model", TextbookCompensation.SOURCE + "; C1 then moved alone to the target phase "
                + "with all losses (numerical)");
        if (!notes.isEmpty()) {
            prov.put("notes", notes);
        }
        m.put("provenance", prov);
        return m;
    }
}
