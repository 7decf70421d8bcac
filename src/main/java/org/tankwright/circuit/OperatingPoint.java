package org.tankwright.circuit;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Everything at one operating point of a tank or link: input impedance and phase, powers,
 * efficiency, every element's stress, the bridge's and the rectifier's view, and the validity of
 * the fundamental-harmonic result.
 *
 * @param inputImpedance  V/I at the source terminals (after the source resistance)
 * @param inputPhaseDeg   arg(V/I) in degrees, positive = inductive
 * @param pSource         power the source EMF (or current source) delivers, including its own resistance's loss
 * @param pIn             power at the source terminals
 * @param pOut            power into the load (links) or into the coil's resistance (tanks)
 * @param efficiency      pOut / pIn (0 when pIn is 0)
 * @param sourceCurrent   rms current at the source or bridge output
 * @param dcCurrent       DC bus current of a bridge (pIn/Vdc, lossless bridge); 0 without a bridge
 * @param loadAc          the load's AC resistance as solved (a battery's equivalent; +∞ = open)
 * @param outputVoltage   DC output voltage behind a rectifier or battery, else rms at the load
 * @param outputCurrent   DC output current behind a rectifier or battery, else rms at the load
 * @param loadedQ         ω·L1·|I_L1|²/pIn: the loaded Q the source sees (common-practice FHA check)
 * @param verdict         "valid" or "doubtful" for the fundamental-harmonic model
 * @param warnings        reasons for a doubtful verdict and other cautions
 */
public record OperatingPoint(Topology topology, double frequency, Source source, Load load,
                             Phasor inputImpedance, double inputPhaseDeg, double pSource, double pIn, double pOut,
                             double efficiency, double sourceCurrent, double dcCurrent, double loadAc,
                             double outputVoltage, double outputCurrent, List<ElementStress> elements,
                             BridgeStress bridge, RectifierStress rectifier, double loadedQ, String verdict,
                             List<String> warnings) {

    /** Minimum loaded Q for the fundamental-harmonic model of a square-wave drive (common practice). */
    public static final double MIN_LOADED_Q = 3;
    public static final String MODEL = "fundamental-harmonic phasor analysis (modified nodal analysis of the network)";

    public OperatingPoint {
        elements = List.copyOf(elements);
        warnings = List.copyOf(warnings);
    }

    /** Solves a freshly built network at frequency f. */
    public static OperatingPoint solve(Network network, Topology topology, Source source, Load load, double f,
                                       BridgeParts parts) {
        return of(new PhasorSolver(network), topology, source, load, f, parts);
    }

    /**
     * Solves with an existing solver (its element values as they are set), after setting the
     * source value from {@code source} and, for a link, the load resistance from {@code load}.
     */
    public static OperatingPoint of(PhasorSolver s, Topology topology, Source source, Load load, double f,
                                    BridgeParts parts) {
        Network net = s.network();
        int src = net.sourceIndex();
        if (!(source.fundamentalRms() > 0)) {
            throw new IllegalArgumentException("source amplitude " + source.value() + " gives no drive: it must be positive");
        }
        s.setSourceValue(src, source.fundamentalRms());
        List<String> warnings = new ArrayList<>();
        boolean hasLoad = net.has(Topologies.LOAD);
        int ld = hasLoad ? net.indexOf(Topologies.LOAD) : -1;
        double loadAc;
        if (!hasLoad) {
            loadAc = 0;
            s.solve(f);
        } else if (load instanceof Load.Battery bat) {
            loadAc = BatterySolver.solve(s, ld, f, bat.fundamentalRms());
            if (Double.isInfinite(loadAc)) {
                warnings.add("the secondary's open-circuit voltage does not reach the battery voltage: no charge current");
            }
        } else {
            loadAc = load.acResistance();
            s.setResistance(ld, loadAc);
            s.solve(f);
        }
        String mismatch = load == null ? null : load.mismatch(topology);
        if (mismatch != null && hasLoad) {
            warnings.add(mismatch);
        }

        double[] z = new double[2];
        s.inputImpedance(src, z);
        double phase = s.inputPhaseDeg(src);
        double iSrc = s.currentRms(src);
        double pIn = s.sourceTerminalPower(src);
        double pSource = pIn + s.loss(src);
        int l1 = net.indexOf(Topologies.L1);
        double pOut = hasLoad ? s.loss(ld) : s.loss(l1);
        double eff = pIn > 0 ? pOut / pIn : 0;

        List<ElementStress> stresses = new ArrayList<>();
        double bias = topology.primarySeries() ? source.seriesCapacitorBias() : 0;
        for (int j = 0; j < s.elementCount(); j++) {
            String name = net.elements().get(j).name();
            double v = s.voltageRms(j);
            double i = s.currentRms(j);
            double dc = name.equals(Topologies.C1) ? bias : 0;
            stresses.add(new ElementStress(name, v, Math.sqrt(2) * v + dc, i, Math.sqrt(2) * i, s.loss(j), dc));
        }

        BridgeStress bridge = null;
        double idc = 0;
        if (source.isBridge()) {
            // lag of the current (out of the + terminal) behind the bridge EMF, whose phase is 0
            double lag = -Math.atan2(-s.currentIm(src), -s.currentRe(src));
            bridge = BridgeStress.of(iSrc, lag, source, parts);
            idc = source.value() > 0 ? pSource / source.value() : 0;
            if (!topology.primarySeries()) {
                warnings.add("a voltage-fed bridge drives a parallel capacitor directly: its current is impulsive and "
                        + "the fundamental-harmonic result does not hold; use a current-fed drive or a series inductor");
            }
        }
        RectifierStress rect = null;
        double vOut = 0;
        double iOut = 0;
        if (hasLoad) {
            double vl = s.voltageRms(ld);
            double il = s.currentRms(ld);
            Load.Filter filter = load == null ? null : load.filter();
            if (filter != null) {
                rect = RectifierStress.of(filter, vl, il);
                vOut = load instanceof Load.Battery bat ? bat.volts() : rect.vdc();
                iOut = rect.idc();
            } else {
                vOut = vl;
                iOut = il;
            }
        }

        double w = 2 * Math.PI * f;
        double q = pIn > 0 ? w * s.inductance(l1) * Math.pow(s.currentRms(l1), 2) / pIn : 1e12;
        q = Math.min(q, 1e12);
        boolean doubtful = false;
        if (source.isBridge() && q < MIN_LOADED_Q) {
            doubtful = true;
            // plain concatenation, not String.format: this runs on every envelope point of a low-Q design
            warnings.add("loaded Q " + Math.round(q * 100) / 100.0 + " is below " + Math.round(MIN_LOADED_Q)
                    + ": the current driven by a square wave is not close to a sine "
                    + "(common practice), so the fundamental-harmonic result is approximate");
        }
        if (mismatch != null || (source.isBridge() && !topology.primarySeries())) {
            doubtful = true;
        }
        return new OperatingPoint(topology, f, source, load, new Phasor(z[0], z[1]), phase, pSource, pIn, pOut, eff,
                iSrc, idc, loadAc, vOut, iOut, stresses, bridge, rect, q, doubtful ? "doubtful" : "valid", warnings);
    }

    /** The stress of the named element. */
    public ElementStress stress(String name) {
        for (ElementStress e : elements) {
            if (e.name().equals(name)) {
                return e;
            }
        }
        throw new IllegalArgumentException("no element named " + name);
    }

    /** Whether the network has an element of that name. */
    public boolean has(String name) {
        for (ElementStress e : elements) {
            if (e.name().equals(name)) {
                return true;
            }
        }
        return false;
    }

    private void putPair(Map<String, Object> m, String key1, String key2, String el1, String el2,
                         java.util.function.ToDoubleFunction<ElementStress> value) {
        m.put(key1, value.applyAsDouble(stress(el1)));
        if (has(el2)) {
            m.put(key2, value.applyAsDouble(stress(el2)));
        }
    }

    /** Sum of all element losses except the load's (W): coil, capacitor and source resistances. */
    public double losses() {
        double sum = 0;
        for (ElementStress e : elements) {
            if (!e.name().equals(Topologies.LOAD)) {
                sum += e.loss();
            }
        }
        return sum;
    }

    /**
     * The operating point as JSON-ready keys and SI values (the keys of {@code tankwright tune
     * --json}): input impedance and phase, powers, efficiency, currents and voltages of the coils
     * and capacitor banks, load, and the bridge, rectifier and validity details.
     */
    public Map<String, Object> keyValues() {
        Map<String, Object> m = new LinkedHashMap<>();
        Map<String, Object> z = new LinkedHashMap<>();
        z.put("re", inputImpedance.re());
        z.put("im", inputImpedance.im());
        m.put("input_impedance_ohm", z);
        m.put("input_phase_deg", inputPhaseDeg);
        m.put("p_in_W", pIn);
        m.put("p_out_W", pOut);
        m.put("efficiency", efficiency);
        m.put("i_source_A", sourceCurrent);
        if (source.isBridge()) {
            m.put("i_dc_A", dcCurrent);
        }
        // primary and secondary pairs in the contract's order; secondary keys only for a link
        putPair(m, "i_l1_A", "i_l2_A", Topologies.L1, Topologies.L2, ElementStress::iRms);
        putPair(m, "v_l1_V", "v_l2_V", Topologies.L1, Topologies.L2, ElementStress::vRms);
        putPair(m, "v_c1_V", "v_c2_V", Topologies.C1, Topologies.C2, ElementStress::vRms);
        putPair(m, "i_c1_A", "i_c2_A", Topologies.C1, Topologies.C2, ElementStress::iRms);
        putPair(m, "v_c1_peak_V", "v_c2_peak_V", Topologies.C1, Topologies.C2, ElementStress::vPeak);
        if (has(Topologies.LOAD)) {
            m.put("load_ac_ohm", Double.isInfinite(loadAc) ? "open" : loadAc);
            m.put("v_out_V", outputVoltage);
            m.put("i_out_A", outputCurrent);
        }
        m.put("frequency_Hz", frequency);
        m.put("loaded_q", loadedQ);
        List<Map<String, Object>> list = new ArrayList<>();
        for (ElementStress e : elements) {
            Map<String, Object> em = new LinkedHashMap<>();
            em.put("name", e.name());
            em.put("v_rms_V", e.vRms());
            em.put("v_peak_V", e.vPeak());
            em.put("i_rms_A", e.iRms());
            em.put("i_peak_A", e.iPeak());
            em.put("loss_W", e.loss());
            em.put("dc_bias_V", e.dcBias());
            list.add(em);
        }
        m.put("elements", list);
        if (bridge != null) {
            Map<String, Object> b = new LinkedHashMap<>();
            b.put("switch_rms_A", bridge.switchRms());
            b.put("turn_off_leading_A", bridge.turnOffLeading());
            b.put("turn_off_lagging_A", bridge.turnOffLagging());
            b.put("zvs_required_A", bridge.zvsRequired());
            b.put("zvs_margin_A", bridge.zvsMargin());
            b.put("zvs", bridge.zvs());
            b.put("coss_and_dead_time_given", bridge.partsGiven());
            m.put("bridge", b);
        }
        if (rectifier != null) {
            Map<String, Object> r = new LinkedHashMap<>();
            r.put("filter", rectifier.filter().name().toLowerCase(java.util.Locale.ROOT));
            r.put("v_dc_V", rectifier.vdc());
            r.put("i_dc_A", rectifier.idc());
            r.put("diode_average_A", rectifier.diodeAverage());
            r.put("diode_rms_A", rectifier.diodeRms());
            r.put("diode_peak_A", rectifier.diodePeak());
            r.put("diode_reverse_V", rectifier.diodeReverse());
            m.put("rectifier", r);
        }
        Map<String, Object> prov = new LinkedHashMap<>();
        prov.put("model", MODEL);
        prov.put("source_model", source.model());
        if (load != null && has(Topologies.LOAD)) {
            prov.put("load_model", load.model());
        }
        prov.put("verdict", verdict);
        prov.put("warnings", warnings);
        m.put("provenance", prov);
        return m;
    }
}
