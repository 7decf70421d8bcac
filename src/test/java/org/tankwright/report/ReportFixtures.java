package org.tankwright.report;

import org.apache.commons.math3.complex.Complex;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.CouplingReport;
import org.tankwright.analysis.NetworkReport;
import org.tankwright.analysis.ResultFixtures;
import org.tankwright.analysis.Series;
import org.tankwright.checks.Finding;
import org.tankwright.checks.Severity;
import org.tankwright.units.Dimension;

import java.util.List;

/**
 * Variants of the shared result fixtures for the report's tests: the SS link with frequency
 * sweeps (computed from its own element values with the series-series phasor equations) and a
 * coupling-against-offset sweep, and with findings of every severity.
 */
final class ReportFixtures {
    private ReportFixtures() {
    }

    /** The SS link fixture with sweeps and findings. */
    static AnalysisResult ssLinkFull() {
        AnalysisResult r = ResultFixtures.ssLink();
        r = withSweeps(r);
        return ResultFixtures.withFindings(r, findings());
    }

    static List<Finding> findings() {
        return List.of(
                new Finding("TW-HV-01", Severity.DANGER, 1850, 50, "V", "IEC 61140 (extra-low voltage)", "C1",
                        "C1 reaches 1.85 kV peak, far above extra-low voltage.",
                        "Enclose the tank and interlock the cover; follow local codes and licensed practice."),
                new Finding("TW-EX-02", Severity.WARNING, 35e-6, 27e-6, "T", "ICNIRP 2010, public", "$.safety",
                        "The field at 0.8 m is above the public reference level.", "Keep people further away."),
                new Finding("TW-CAP-03", Severity.NOTICE, 0.08, 0.2, "", "common practice", "C2",
                        "The C2 bank has less than 20 % voltage margin.", "Use parts with a higher rating."));
    }

    /** Adds impedance, phase and capacitor-voltage sweeps of the SS network, and k against offset. */
    static AnalysisResult withSweeps(AnalysisResult r) {
        TunedNetwork net = TunedNetwork.of(r);
        NetworkReport n = r.network();
        int points = 121;
        double[] f = new double[points];
        double[] z = new double[points];
        double[] ph = new double[points];
        double[] vc1 = new double[points];
        double[] vc2 = new double[points];
        double m = net.mutual();
        for (int i = 0; i < points; i++) {
            f[i] = n.frequency() * (0.7 + 0.6 * i / (points - 1));
            double w = 2 * Math.PI * f[i];
            Complex z2 = new Complex(v(net, "R2") + v(net, "RC2") + v(net, "RL"), w * v(net, "L2") - 1 / (w * v(net, "C2")));
            Complex zin = new Complex(v(net, "RS") + v(net, "R1") + v(net, "RC1"), w * v(net, "L1") - 1 / (w * v(net, "C1")))
                    .add(new Complex(w * w * m * m).divide(z2));
            Complex i1 = new Complex(n.sourceVoltage()).divide(zin);
            Complex i2 = i1.multiply(new Complex(0, w * m)).divide(z2);
            z[i] = zin.abs();
            ph[i] = Math.toDegrees(zin.getArgument());
            vc1[i] = i1.abs() / (w * v(net, "C1"));
            vc2[i] = i2.abs() / (w * v(net, "C2"));
        }
        double fm = n.frequency();
        List<Series> sweeps = List.of(
                new Series("impedance-vs-frequency", "|Z in|", "frequency", Dimension.FREQUENCY, "impedance",
                        Dimension.RESISTANCE, f, z, fm),
                new Series("phase-vs-frequency", "phase", "frequency", Dimension.FREQUENCY, "phase", Dimension.ANGLE,
                        f, ph, fm),
                new Series("c1-voltage-vs-frequency", "C1 voltage", "frequency", Dimension.FREQUENCY, "C1 voltage",
                        Dimension.VOLTAGE, f, vc1, fm),
                new Series("c2-voltage-vs-frequency", "C2 voltage", "frequency", Dimension.FREQUENCY, "C2 voltage",
                        Dimension.VOLTAGE, f, vc2, fm));
        NetworkReport n2 = new NetworkReport(n.topology(), n.frequency(), n.c1(), n.c2(), n.c1Textbook(), n.c2Textbook(),
                n.targetPhaseDeg(), n.sourceVoltage(), n.busVoltage(), n.inputResistance(), n.inputReactance(),
                n.inputPhaseDeg(), n.powerIn(), n.powerOut(), n.efficiency(), n.sourceCurrent(), n.dcCurrent(),
                n.outputVoltage(), n.loadAc(), n.zeroPhaseFrequencies(), n.bifurcated(), n.efficiencyMax(),
                n.loadOptimal(), n.loadedQ(), n.turnOffCurrent(), n.zvsRequiredCurrent(), n.keys(), sweeps, n.notes());
        CouplingReport c = r.coupling();
        double[] off = new double[41];
        double[] k = new double[41];
        for (int i = 0; i < off.length; i++) {
            off[i] = 0.2 * i / (off.length - 1);
            // a smooth bell falling to zero near one coil radius, for drawing only
            k[i] = c.k() * Math.cos(Math.PI / 2 * off[i] / 0.2);
        }
        CouplingReport c2 = new CouplingReport(c.mutual(), c.k(), c.l1(), c.l2(), c.source(), c.kMin(), c.kMax(),
                c.kMinAt(), c.kMaxAt(), c.nullOffset(),
                List.of(new Series("k-vs-offset", "k", "lateral offset", Dimension.LENGTH, "k", Dimension.DIMENSIONLESS,
                        off, k, 0)), c.notes());
        return new AnalysisResult(r.design(), r.coils(), c2, n2, r.stresses(), r.envelope(), r.banks(), r.heater(),
                r.exposure(), r.findings(), r.notes(), r.computeNanos());
    }

    private static double v(TunedNetwork net, String name) {
        TunedNetwork.Part p = net.part(name);
        return p == null ? 0 : p.value();
    }
}
