package org.tankwright.analysis;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The fixtures are internally consistent: power balance, closed forms and resonance hold. */
class ResultFixturesTest {
    @Test
    void ssLinkIsConsistent() {
        AnalysisResult r = ResultFixtures.ssLink();
        NetworkReport n = r.network();
        // Efficiency cannot exceed the SS closed-form maximum k²Q1Q2/(1+√(1+k²Q1Q2))² (Wang, Covic, Stielau 2004).
        assertTrue(n.efficiency() <= n.efficiencyMax() + 1e-12, "η " + n.efficiency() + " > ηmax " + n.efficiencyMax());
        // Output power plus the copper losses equals the input power (energy balance).
        double losses = r.stresses().stream().filter(s -> s.id().startsWith("L")).mapToDouble(ElementStress::loss).sum()
                + n.sourceCurrent() * n.sourceCurrent() * r.design().source().resistance();
        assertEquals(n.powerIn(), n.powerOut() + losses, 1e-6 * n.powerIn(), "energy balance");
        // Secondary tuned to 1/(ω²L2) (MODELS.md §3).
        double w = 2 * Math.PI * n.frequency();
        assertEquals(1 / (w * w * r.coupling().l2()), n.c2(), 1e-15);
        // Bank stored energy ½CV² at peak voltage.
        BankReport b = r.banks().get(0);
        assertEquals(0.5 * b.capacitance() * Math.pow(b.partVoltagePeak() * b.seriesCount(), 2), b.storedEnergy(), 1e-9);
        assertTrue(n.loadedQ() > 3, "plausible loaded Q " + n.loadedQ());
        System.out.printf("SS: Pin %.0f W Pout %.0f W eta %.3f I1 %.1f A VC1 %.0f V VC2 %.0f V Vout %.0f V Q %.1f"
                        + " ZVS %.2f/%.2f A B %.2e T removed %.1f A E %.3f J%n", n.powerIn(), n.powerOut(),
                n.efficiency(), n.sourceCurrent(), r.stresses().get(0).voltageRms(), r.stresses().get(2).voltageRms(),
                n.outputVoltage(), n.loadedQ(), n.turnOffCurrent(), n.zvsRequiredCurrent(), r.exposure().bRms(),
                r.envelope().removedReceiverCurrent(), b.storedEnergy());
    }

    @Test
    void heaterIsConsistent() {
        AnalysisResult r = ResultFixtures.heater();
        HeaterReport h = r.heater();
        // Parallel tank resonance 1/(2π√(LC)).
        assertEquals(1 / (2 * Math.PI * Math.sqrt(h.cold().inductance() * r.network().c1())),
                h.cold().resonantFrequency(), 1e-6);
        assertTrue(h.hot().resonantFrequency() < h.cold().resonantFrequency(), "hot bar raises L, lowers f");
        System.out.printf("Heater: f %.0f Hz P %.0f W coil loss %.0f W Icoil %.0f A Vtank %.0f V Q %.1f B %.2e T%n",
                h.cold().resonantFrequency(), h.cold().power(), h.cold().coilLoss(), h.cold().coilCurrent(),
                h.cold().capacitorVoltage(), r.network().loadedQ(), r.exposure().bRms());
    }

    @Test
    void measuredTankIsConsistent() {
        AnalysisResult r = ResultFixtures.measuredTank();
        ElementStress c = r.stresses().get(0);
        // Series tank at resonance: V_C = Q_loaded · V_in.
        assertEquals(r.network().loadedQ() * r.network().sourceVoltage(), c.voltageRms(), 1e-9);
        assertTrue(Double.isNaN(r.coils().get(0).selfResonance()), "a measured coil has no modelled SRF");
    }
}
