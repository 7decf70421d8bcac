package org.tankwright.circuit;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The rectifier equivalents of Steigerwald (IEEE TPEL 3(2), 1988), checked against a time-domain
 * simulation of an ideal-diode bridge: R_ac/R_dc = 8/π² with a capacitive filter fed by a sine
 * current (series-tuned secondary), π²/8 with an inductive filter fed by a sine voltage
 * (parallel-tuned secondary). R_ac is the fundamental voltage over the fundamental current.
 */
class RectifierEquivalentTest {
    private static final int STEPS_PER_CYCLE = 4000;

    @Test
    void capacitiveFilterBehindSineCurrent() {
        double ip = 2;
        double rl = 10;
        double w = 2 * Math.PI;
        double cap = 200 / rl; // RC = 200 periods: small ripple
        double dt = 1.0 / STEPS_PER_CYCLE;
        double vc = 0;
        // settle: the capacitor takes |i| and the resistor drains it (exact step of the linear part)
        int cycles = 3000;
        double a = 0;
        double b = 0;
        double decay = Math.exp(-dt / (rl * cap));
        for (int n = 0; n < cycles * STEPS_PER_CYCLE; n++) {
            double t = (n + 0.5) * dt;
            double i = ip * Math.sin(w * t);
            vc = vc * decay + Math.abs(i) * rl * (1 - decay);
            if (n >= (cycles - 1) * STEPS_PER_CYCLE) {
                double vin = Math.signum(i) * vc; // bridge input voltage: ±Vdc following the current's sign
                a += vin * Math.sin(w * t) * dt * 2;
                b += vin * Math.cos(w * t) * dt * 2;
            }
        }
        double v1 = Math.hypot(a, b); // fundamental peak
        double rac = v1 / ip;
        assertEquals(Load.CAPACITIVE_RATIO * rl, rac, 2e-3 * rac, "Steigerwald 1988: R_ac = 8RL/π²");
        assertEquals(Load.CAPACITIVE_RATIO * rl, new Load.Rectifier(Load.Filter.CAPACITIVE, rl).acResistance(), 1e-12);
    }

    @Test
    void inductiveFilterBehindSineVoltage() {
        double vp = 10;
        double rl = 5;
        double w = 2 * Math.PI;
        double ind = 200 * rl; // L/R = 200 periods: small ripple
        double dt = 1.0 / STEPS_PER_CYCLE;
        double il = 0;
        int cycles = 3000;
        double a = 0;
        double b = 0;
        double decay = Math.exp(-dt * rl / ind);
        for (int n = 0; n < cycles * STEPS_PER_CYCLE; n++) {
            double t = (n + 0.5) * dt;
            double v = vp * Math.sin(w * t);
            il = il * decay + Math.abs(v) / rl * (1 - decay);
            if (n >= (cycles - 1) * STEPS_PER_CYCLE) {
                double iin = Math.signum(v) * il; // bridge input current: ±Idc following the voltage's sign
                a += iin * Math.sin(w * t) * dt * 2;
                b += iin * Math.cos(w * t) * dt * 2;
            }
        }
        double i1 = Math.hypot(a, b);
        double rac = vp / i1;
        assertEquals(Load.INDUCTIVE_RATIO * rl, rac, 2e-3 * rac, "Steigerwald 1988: R_ac = π²RL/8");
        assertEquals(Load.INDUCTIVE_RATIO * rl, new Load.Rectifier(Load.Filter.INDUCTIVE, rl).acResistance(), 1e-12);
    }

    @Test
    void rectifierStressConservesPowerAndSplitsCurrentOverTwoDiodes() {
        // A lossless bridge passes the fundamental power to DC; each diode pair carries half the DC current
        // (from the Steigerwald 1988 waveforms).
        for (Load.Filter f : Load.Filter.values()) {
            double vac = 120;
            double iac = 7;
            RectifierStress r = RectifierStress.of(f, vac, iac);
            assertEquals(vac * iac, r.vdc() * r.idc(), 1e-9 * vac * iac, f + ": power through the bridge");
            assertEquals(r.idc() / 2, r.diodeAverage(), 1e-12);
            double rdc = r.vdc() / r.idc();
            double ratio = f == Load.Filter.CAPACITIVE ? Load.CAPACITIVE_RATIO : Load.INDUCTIVE_RATIO;
            assertEquals(vac / iac, ratio * rdc, 1e-9 * rdc, f + ": R_ac/R_dc");
        }
    }
}
