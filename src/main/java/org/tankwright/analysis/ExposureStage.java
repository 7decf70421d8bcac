package org.tankwright.analysis;

import org.apache.commons.math3.complex.Complex;
import org.tankwright.circuit.PhasorSolver;
import org.tankwright.circuit.Topologies;
import org.tankwright.coupling.FilamentSet;
import org.tankwright.design.Design;
import org.tankwright.design.Enums.DesignKind;
import org.tankwright.magnetics.CoilGeometry;
import org.tankwright.tuning.TuningResult;

/** The field-exposure screening: rms flux density at the chosen distance from the coils' centre, in the winding plane. */
final class ExposureStage {
    /** Default distances (common practice): a body near a pad, an arm's length from a heater, a hand from a tank. */
    static final double PAD_DISTANCE = 0.2;
    static final double HEATER_DISTANCE = 0.7;
    static final double TANK_DISTANCE = 0.3;

    private ExposureStage() {
    }

    static double distance(Design d) {
        if (d.safety() != null && d.safety().fieldDistance() != null) {
            return d.safety().fieldDistance();
        }
        return d.kind() == DesignKind.LINK ? PAD_DISTANCE : d.kind() == DesignKind.HEATER ? HEATER_DISTANCE : TANK_DISTANCE;
    }

    static ExposureReport link(Design d, TuningResult t, CouplingStage.Linked linked) {
        if (linked.model() == null) {
            return null;
        }
        PhasorSolver s = t.newSolver();
        double f = t.design().frequency();
        s.solve(f);
        int i1 = s.indexOf(Topologies.L1);
        int i2 = s.indexOf(Topologies.L2);
        Complex ia = new Complex(s.currentRe(i1), s.currentIm(i1));
        Complex ib = new Complex(s.currentRe(i2), s.currentIm(i2));
        double dist = distance(d);
        double z = d.placement().distance() / 2;
        double b = linked.model().field(d.placement().distance(), d.placement().offsetX(), d.placement().offsetY(),
                ia, ib, dist, 0, z).bRms();
        return new ExposureReport(dist, b, f, "Biot–Savart sum over both coils' filaments and their plate images, "
                + "with the solved phasor currents, at the side of the link in its mid-plane (a screening estimate)");
    }

    static ExposureReport single(Design d, CoilGeometry g, double currentRms, double f) {
        if (g == null) {
            return null;
        }
        double dist = distance(d);
        double[] out = new double[3];
        FilamentSet.of(g.filaments()).fluxDensity(dist, 0, 0, out);
        double b = currentRms * Math.sqrt(out[0] * out[0] + out[1] * out[1] + out[2] * out[2]);
        return new ExposureReport(dist, b, f, "Biot–Savart sum over the coil's filaments at the coil's side in its "
                + "mid-plane, coil in free space (a screening estimate; a workpiece or plate changes it)");
    }
}
