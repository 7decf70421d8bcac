package org.tankwright.tuning;

import org.tankwright.circuit.OperatingPoint;
import org.tankwright.circuit.Topologies;

import java.util.function.ToDoubleFunction;

/** The stresses the envelope tracks; each is worst at its maximum except the ZVS margin (worst at its minimum). */
public enum Stress {
    I_SOURCE("i_source_A", true, OperatingPoint::sourceCurrent),
    I_L1("i_l1_A", true, op -> op.stress(Topologies.L1).iRms()),
    I_L2("i_l2_A", true, op -> op.stress(Topologies.L2).iRms()),
    V_L1("v_l1_V", true, op -> op.stress(Topologies.L1).vRms()),
    V_L2("v_l2_V", true, op -> op.stress(Topologies.L2).vRms()),
    V_C1_PEAK("v_c1_peak_V", true, op -> op.stress(Topologies.C1).vPeak()),
    V_C2_PEAK("v_c2_peak_V", true, op -> op.stress(Topologies.C2).vPeak()),
    I_C1("i_c1_A", true, op -> op.stress(Topologies.C1).iRms()),
    I_C2("i_c2_A", true, op -> op.stress(Topologies.C2).iRms()),
    V_OUT("v_out_V", true, OperatingPoint::outputVoltage),
    LOSSES("losses_W", true, OperatingPoint::losses),
    SWITCH_RMS("switch_rms_A", true, op -> op.bridge() == null ? 0 : op.bridge().switchRms()),
    ZVS_MARGIN("zvs_margin_A", false, op -> op.bridge() == null ? 0 : op.bridge().zvsMargin()),
    DIODE_PEAK("diode_peak_A", true, op -> op.rectifier() == null ? 0 : op.rectifier().diodePeak()),
    DIODE_REVERSE("diode_reverse_V", true, op -> op.rectifier() == null ? 0 : op.rectifier().diodeReverse());

    private final String key;
    private final boolean worstHigh;
    private final ToDoubleFunction<OperatingPoint> value;

    Stress(String key, boolean worstHigh, ToDoubleFunction<OperatingPoint> value) {
        this.key = key;
        this.worstHigh = worstHigh;
        this.value = value;
    }

    /** The JSON key. */
    public String key() {
        return key;
    }

    /** True when the worst value is the largest. */
    public boolean worstHigh() {
        return worstHigh;
    }

    public double of(OperatingPoint op) {
        return value.applyAsDouble(op);
    }

    /** Whether the stress exists at this operating point (bridge and rectifier stresses need those parts). */
    public boolean appliesTo(OperatingPoint op) {
        return switch (this) {
            case SWITCH_RMS, ZVS_MARGIN -> op.bridge() != null;
            case DIODE_PEAK, DIODE_REVERSE -> op.rectifier() != null;
            default -> true;
        };
    }

    /** Badness for the search: larger is worse. */
    double badness(double v) {
        return worstHigh ? v : -v;
    }
}
