package org.tankwright.analysis;

import org.tankwright.circuit.BridgeStress;
import org.tankwright.circuit.OperatingPoint;
import org.tankwright.circuit.RectifierStress;
import org.tankwright.circuit.Topologies;

import java.util.ArrayList;
import java.util.List;

/** One stress row per element, with the envelope's worst case and the banks' derated ratings beside it. */
final class StressStage {
    private StressStage() {
    }

    static List<ElementStress> rows(OperatingPoint op, EnvelopeReport env, List<BankReport> banks, boolean heater) {
        List<ElementStress> out = new ArrayList<>();
        for (org.tankwright.circuit.ElementStress e : op.elements()) {
            String name = e.name();
            if (name.equals(Topologies.SOURCE)) {
                continue;
            }
            String id = name.equals(Topologies.LOAD) ? "RL" : name;
            double worstV = worst(env, "v_" + id.toLowerCase(java.util.Locale.ROOT) + "_peak_V");
            if (Double.isNaN(worstV)) {
                double rms = worst(env, "v_" + id.toLowerCase(java.util.Locale.ROOT) + "_V");
                worstV = Double.isNaN(rms) ? Double.NaN : Math.sqrt(2) * rms;
            }
            double worstI = worst(env, "i_" + id.toLowerCase(java.util.Locale.ROOT) + "_A");
            String at = worstAt(env, id);
            double vRating = Double.NaN;
            double iRating = Double.NaN;
            for (BankReport b : banks) {
                if (b.id().equals(id)) {
                    vRating = b.partVoltageRating() * b.seriesCount();
                    iRating = b.partCurrentRating() * b.parallelCount();
                }
            }
            out.add(new ElementStress(id, role(id, heater), e.vRms(), e.vPeak(), e.iRms(), e.iPeak(), e.loss(), worstV,
                    worstI, at, vRating, iRating));
        }
        BridgeStress b = op.bridge();
        if (b != null) {
            double vdc = op.source().isBridge() ? op.source().value() : Double.NaN;
            out.add(new ElementStress("S", "bridge switch (each of the bridge's transistors)", Double.NaN, vdc,
                    b.switchRms(), Math.abs(b.turnOffLagging()), Double.NaN, vdc, worst(env, "switch_rms_A"),
                    worstAt(env, "S"), Double.NaN, Double.NaN));
        }
        RectifierStress r = op.rectifier();
        if (r != null) {
            out.add(new ElementStress("D", "rectifier diode (each of the bridge's four)", Double.NaN, r.diodeReverse(),
                    r.diodeRms(), r.diodePeak(), Double.NaN, worst(env, "diode_reverse_V"), Double.NaN,
                    worstAt(env, "D"), Double.NaN, Double.NaN));
        }
        return List.copyOf(out);
    }

    private static double worst(EnvelopeReport env, String key) {
        if (env == null) {
            return Double.NaN;
        }
        for (WorstCase w : env.worst()) {
            if (w.quantity().equals(key)) {
                return w.value();
            }
        }
        return Double.NaN;
    }

    private static String worstAt(EnvelopeReport env, String id) {
        if (env == null) {
            return "";
        }
        for (WorstCase w : env.worst()) {
            if (w.element().equals(id) && (w.quantity().startsWith("v_") || w.quantity().startsWith("diode_reverse"))) {
                return w.at();
            }
        }
        for (WorstCase w : env.worst()) {
            if (w.element().equals(id)) {
                return w.at();
            }
        }
        return "";
    }

    static String role(String id, boolean heater) {
        return switch (id) {
            case "C1" -> heater ? "tank capacitor" : "primary capacitor bank";
            case "C2" -> "secondary capacitor bank";
            case "L1" -> heater ? "work coil with its workpiece" : "primary coil";
            case "L2" -> "secondary coil";
            case "RL" -> "load (AC equivalent at the secondary terminals)";
            default -> id;
        };
    }
}
