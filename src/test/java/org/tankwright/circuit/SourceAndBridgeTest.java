package org.tankwright.circuit;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** Source fundamentals and the bridge's turn-off current and ZVS margin. */
class SourceAndBridgeTest {

    /** rms of the fundamental of a quasi-square wave ±vdc, non-zero for a fraction d of each half period, by quadrature. */
    private static double fundamentalByQuadrature(double vdc, double d) {
        int n = 200_000;
        double b1 = 0;
        for (int i = 0; i < n; i++) {
            double th = 2 * Math.PI * (i + 0.5) / n;
            double phase = th % Math.PI;
            double half = th < Math.PI ? 1 : -1;
            double v = Math.abs(phase - Math.PI / 2) < Math.PI * d / 2 ? half * vdc : 0;
            b1 += v * Math.sin(th) * (2 * Math.PI / n);
        }
        return b1 / Math.PI / Math.sqrt(2);
    }

    @Test
    void bridgeFundamentalsMatchFourierSeries() {
        for (double d : new double[]{1, 0.75, 0.4}) {
            double expected = fundamentalByQuadrature(400, d);
            assertEquals(expected, Source.fullBridge(400, d).fundamentalRms(), 1e-6 * expected,
                    "Fourier series of a quasi-square wave: (2√2/π)·Vdc·sin(πD/2), D = " + d);
        }
        // a half bridge swings its output between 0 and Vdc: ±Vdc/2 after the blocking capacitor (common practice)
        assertEquals(fundamentalByQuadrature(200, 1), Source.halfBridge(400).fundamentalRms(), 1e-6 * 90);
        assertEquals(200, Source.halfBridge(400).seriesCapacitorBias(), 0);
    }

    @Test
    void halfBridgeBiasAddsToSeriesCapacitorPeak() {
        double f = 100e3;
        double w = 2 * Math.PI * f;
        Source s = Source.halfBridge(300);
        Network net = Topologies.tank(Topology.SERIES_TANK, 20e-6, 0.5, CapacitorSpec.ideal(1 / (w * w * 20e-6)), s);
        OperatingPoint op = OperatingPoint.solve(net, Topology.SERIES_TANK, s, null, f, BridgeParts.NONE);
        ElementStress c = op.stress(Topologies.C1);
        assertEquals(Math.sqrt(2) * c.vRms() + 150, c.vPeak(), 1e-9 * c.vPeak(), "MODELS.md §3: DC bias Vdc/2 on the series capacitor");
    }

    /** A series tank at 100 kHz whose capacitor is {@code factor} times the resonant value, driven by a full bridge. */
    private static OperatingPoint detunedTank(double factor, double duty, BridgeParts parts) {
        double f = 100e3;
        double w = 2 * Math.PI * f;
        double l = 20e-6;
        Source s = Source.fullBridge(200, duty);
        Network net = Topologies.tank(Topology.SERIES_TANK, l, 1.0, CapacitorSpec.ideal(factor / (w * w * l)), s);
        return OperatingPoint.solve(net, Topology.SERIES_TANK, s, null, f, parts);
    }

    @Test
    void turnOffCurrentOfASquareWaveIsCrestTimesSinPhase() {
        // Square-wave drive, current lagging by φ: at each edge i = √2·I·sin φ (common practice).
        // a larger capacitor than resonant: the tank is inductive
        OperatingPoint op = detunedTank(1.05, 1, new BridgeParts(300e-12, 200e-9));
        double expected = Math.sqrt(2) * op.sourceCurrent() * Math.sin(Math.toRadians(op.inputPhaseDeg()));
        assertEquals(expected, op.bridge().turnOffLeading(), 1e-9 * expected);
        assertEquals(expected, op.bridge().turnOffLagging(), 1e-9 * expected);
        assertEquals(2 * 300e-12 * 200 / 200e-9, op.bridge().zvsRequired(), 1e-12, "2·Coss·Vdc/t_dead");
        assertEquals(expected - 0.6, op.bridge().zvsMargin(), 1e-9);
        assertTrue(op.bridge().zvs());
        assertEquals(op.sourceCurrent() / Math.sqrt(2), op.bridge().switchRms(), 1e-12, "each switch conducts half the period");
        assertEquals(op.pIn() / 200, op.dcCurrent(), 1e-12, "lossless bridge: Idc = P/Vdc");
    }

    @Test
    void capacitiveTankLosesZvs() {
        OperatingPoint op = detunedTank(0.95, 1, BridgeParts.NONE);
        assertTrue(op.inputPhaseDeg() < 0);
        assertFalse(op.bridge().zvs(), "capacitive load: the current has already reversed at the edge");
    }

    @Test
    void phaseShiftMakesTheLaggingLegHarder() {
        OperatingPoint op = detunedTank(1.1, 0.6, BridgeParts.NONE);
        assertTrue(op.bridge().turnOffLeading() > op.bridge().turnOffLagging(),
                "common practice (phase-shifted bridge): the leading leg switches a larger current");
    }
}
