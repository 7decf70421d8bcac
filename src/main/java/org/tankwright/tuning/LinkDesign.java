package org.tankwright.tuning;

import org.tankwright.circuit.BridgeParts;
import org.tankwright.circuit.LinkValues;
import org.tankwright.circuit.Load;
import org.tankwright.circuit.Source;
import org.tankwright.circuit.Topology;

/**
 * What {@link Tuner} needs, as values: topology, coil values, drive frequency, source, load,
 * optional fixed capacitors (0 = size them), capacitor ESR and ESL, the target input phase
 * (null = {@link #defaultTargetPhaseDeg}), and the switch parameters for the ZVS margin. For a
 * single tank, {@code coils} is {@link LinkValues#tank} and {@code load} is ignored.
 */
public record LinkDesign(Topology topology, LinkValues coils, double frequency, Source source, Load load,
                         double c1, double c2, double esr1, double esl1, double esr2, double esl2,
                         Double targetPhaseDeg, BridgeParts parts) {

    /**
     * Default target input phase for a bridge drive, degrees inductive. At 10° the turn-off current
     * is √2·I·sin 10° ≈ 0.25 of the current's crest, usually enough to swing the switch node within
     * the dead time, while the reactive current adds only 1/cos 10° − 1 ≈ 1.5 % to the rms current.
     */
    public static final double BRIDGE_TARGET_PHASE_DEG = 10;

    public LinkDesign {
        if (topology == null || coils == null || source == null) {
            throw new IllegalArgumentException("topology, coils and source are required");
        }
        if (!(frequency > 0) || Double.isInfinite(frequency)) {
            throw new IllegalArgumentException("frequency " + frequency + " Hz must be positive and finite");
        }
        if (topology.isLink() && load == null) {
            throw new IllegalArgumentException("a link needs a load");
        }
        if (topology.isLink() && !(coils.l2() > 0)) {
            throw new IllegalArgumentException("a link needs L2 > 0, got " + coils.l2());
        }
        for (double v : new double[]{c1, c2, esr1, esl1, esr2, esl2}) {
            if (!(v >= 0) || Double.isInfinite(v)) {
                throw new IllegalArgumentException("capacitor values, ESR and ESL must be finite and ≥ 0 (0 = size it), got " + v);
            }
        }
        if (targetPhaseDeg != null && !(Math.abs(targetPhaseDeg) < 90)) {
            throw new IllegalArgumentException("target phase " + targetPhaseDeg + "° must be between −90° and 90°");
        }
        if (parts == null) {
            parts = BridgeParts.NONE;
        }
    }

    /** A design with ideal capacitors to be sized, default target phase and no switch data. */
    public static LinkDesign of(Topology t, LinkValues coils, double f, Source source, Load load) {
        return new LinkDesign(t, coils, f, source, load, 0, 0, 0, 0, 0, 0, null, BridgeParts.NONE);
    }

    /** 10° inductive for a bridge drive (zero-voltage switching), 0° otherwise (the textbook case). */
    public static double defaultTargetPhaseDeg(Source s) {
        return s.isBridge() ? BRIDGE_TARGET_PHASE_DEG : 0;
    }

    /** The target phase in effect. */
    public double targetPhase() {
        return targetPhaseDeg != null ? targetPhaseDeg : defaultTargetPhaseDeg(source);
    }

    public LinkDesign withTargetPhase(double deg) {
        return new LinkDesign(topology, coils, frequency, source, load, c1, c2, esr1, esl1, esr2, esl2, deg, parts);
    }

    public LinkDesign withCapacitors(double newC1, double newC2) {
        return new LinkDesign(topology, coils, frequency, source, load, newC1, newC2, esr1, esl1, esr2, esl2,
                targetPhaseDeg, parts);
    }

    public LinkDesign withCapacitorLosses(double newEsr1, double newEsl1, double newEsr2, double newEsl2) {
        return new LinkDesign(topology, coils, frequency, source, load, c1, c2, newEsr1, newEsl1, newEsr2, newEsl2,
                targetPhaseDeg, parts);
    }

    public LinkDesign withParts(BridgeParts p) {
        return new LinkDesign(topology, coils, frequency, source, load, c1, c2, esr1, esl1, esr2, esl2,
                targetPhaseDeg, p);
    }
}
