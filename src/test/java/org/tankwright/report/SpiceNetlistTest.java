package org.tankwright.report;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.tankwright.design.Enums.Topology;

import java.util.List;
import java.util.Map;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.CouplingReport;
import org.tankwright.analysis.ElementStress;
import org.tankwright.analysis.ResultFixtures;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class SpiceNetlistTest {

    @Test
    void scaleLettersUseMegForMegaAndMForMilli() {
        // SPICE2 scale factors (Nagel 1975, from memory): M = 1e-3, MEG = 1e6
        assertEquals("1.5MEG", SpiceNetlist.value(1.5e6));
        assertEquals("12.5M", SpiceNetlist.value(12.5e-3));
        assertEquals("47N", SpiceNetlist.value(47e-9));
        assertEquals("2.2U", SpiceNetlist.value(2.2e-6));
        assertEquals("100K", SpiceNetlist.value(100e3));
        assertEquals("1K", SpiceNetlist.value(999.9999999));
        assertEquals("3.3P", SpiceNetlist.value(3.3e-12));
        for (double v : new double[] {1.5e6, 12.5e-3, 47e-9, 0.35, 85e3, 3.0e9, 1.234567e-7, 2.7e12}) {
            assertEquals(v, NetlistParser.number(SpiceNetlist.value(v)), Math.abs(v) * 5e-6, "round trip of " + v + " to 6 significant digits");
        }
    }

    @Test
    void linkNetlistParsesBackWithEveryElementAndItsValue() {
        AnalysisResult r = ResultFixtures.ssLink();
        TunedNetwork net = TunedNetwork.of(r);
        String text = SpiceNetlist.write(net, r.design().name());
        NetlistParser.Netlist n = NetlistParser.parse(text);
        assertEquals(r.design().name(), n.title());
        assertTrue(n.ended(), ".END closes the netlist");
        for (String name : new String[] {"V1", "RS", "C1", "RC1", "L1", "R1", "L2", "R2", "C2", "RC2", "RL"}) {
            assertNotNull(n.elements().get(name), name + " is in the netlist");
            assertEquals(net.part(name).value(), n.elements().get(name).value(), net.part(name).value() * 1e-5, name);
        }
        assertEquals(r.coupling().k(), n.k(), 1e-6);
        assertEquals(r.network().frequency(), n.acStart(), 1e-3);
        assertEquals(r.network().frequency(), n.acStop(), 1e-3);
        assertEquals(1, n.acPoints());
        assertEquals(r.coils().get(0).resistanceAc(), n.elements().get("R1").value(), 1e-9);
        assertEquals(r.network().loadAc(), n.elements().get("RL").value(), r.network().loadAc() * 1e-5);
        assertFalse(text.contains("MEG") && text.matches("(?s).*\\d M\\b.*"), "no bare M used for mega");
    }

    @Test
    void independentSolveOfTheNetlistReproducesTheLinkOperatingPoint() {
        AnalysisResult r = ResultFixtures.ssLink();
        NetlistParser.Netlist n = NetlistParser.parse(SpiceNetlist.write(TunedNetwork.of(r), "ss"));
        NetlistSolver.Solution s = NetlistSolver.solve(n, n.acStart());
        double i1 = s.branches().get("V1").norm();
        // The fixture's phasor equations (Wang, Covic, Stielau 2004) leave out the banks' ESR (tens of mΩ
        // against ~28 Ω at the input), so agreement within 1 % is expected, not exact.
        assertEquals(r.network().sourceCurrent(), i1, r.network().sourceCurrent() * 0.01, "primary current");
        Complex vl = s.v(n.elements().get("RL").a());
        double pOut = vl.norm() * vl.norm() / n.elements().get("RL").value();
        assertEquals(r.network().powerOut(), pOut, r.network().powerOut() * 0.02, "load power");
    }

    @ParameterizedTest
    @EnumSource(value = Topology.class, names = {"SS", "SP", "PS", "PP"})
    void eachTopologyPutsTheCapacitorsWhereItsLettersSay(Topology t) {
        ResultFixtures.Link p = new ResultFixtures.Link();
        p.topology = t;
        NetlistParser.Netlist n = NetlistParser.parse(SpiceNetlist.write(TunedNetwork.of(p.build()), t.token()));
        Map<String, NetlistParser.Element> e = n.elements();
        int top = e.get("RS").b();
        boolean parallel1 = t == Topology.PS || t == Topology.PP;
        boolean parallel2 = t == Topology.SP || t == Topology.PP;
        // P: the bank (with its ESR) spans the coil's terminals; S: the bank sits between source and coil
        assertEquals(top, e.get("C1").a());
        assertEquals(parallel1, e.get("RC1").b() == 0, "C1 branch ends on the reference node");
        assertEquals(parallel1 ? top : e.get("RC1").b(), e.get("L1").a(), "L1 starts where C1's branch does (P) or ends (S)");
        assertEquals(0, e.get("R1").b());
        int out = e.get("RL").a();
        assertEquals(parallel2 ? out : e.get("RC2").b(), parallel2 ? e.get("C2").a() : out, "C2 across the load (P) or in the loop (S)");
        assertEquals(parallel2, e.get("RC2").b() == 0);
        assertEquals(0, e.get("RL").b());
        assertTrue(Double.isFinite(NetlistSolver.solve(n, n.acStart()).v(out).norm()), "the netlist solves");
        try (var doc = TuningSheet.build(p.build(), Paper.A4, new SheetInfo("f", "2026-12-02", "test"))) {
            assertTrue(TuningSheetTest.text(doc).contains(t.token() + " compensation"));
        } catch (java.io.IOException ex) {
            throw new java.io.UncheckedIOException(ex);
        }
    }

    @Test
    void negativeCouplingTurnsTheSecondaryAroundAndKeepsKPositive() {
        AnalysisResult r = ResultFixtures.ssLink();
        CouplingReport c = r.coupling();
        CouplingReport neg = new CouplingReport(-c.mutual(), -c.k(), c.l1(), c.l2(), c.source(), c.kMin(), c.kMax(),
                c.kMinAt(), c.kMaxAt(), c.nullOffset(), c.sweeps(), c.notes());
        AnalysisResult flipped = new AnalysisResult(r.design(), r.coils(), neg, r.network(), r.stresses(), r.envelope(),
                r.banks(), r.heater(), r.exposure(), r.findings(), r.notes(), r.computeNanos());
        NetlistParser.Netlist a = NetlistParser.parse(SpiceNetlist.write(TunedNetwork.of(r), "plus"));
        NetlistParser.Netlist b = NetlistParser.parse(SpiceNetlist.write(TunedNetwork.of(flipped), "minus"));
        assertTrue(b.k() > 0, "K stays positive");
        assertEquals(a.elements().get("L2").a(), b.elements().get("L2").b(), "L2 written end to start");
        // Reversing a coil's terminals and the sign of M describe the same circuit: the load sees the same power.
        double pa = NetlistSolver.solve(a, a.acStart()).v(a.elements().get("RL").a()).norm();
        double pb = NetlistSolver.solve(b, b.acStart()).v(b.elements().get("RL").a()).norm();
        assertEquals(pa, pb, pa * 1e-9);
    }

    @Test
    void anElementWithoutAValueIsRefusedByName() {
        TunedNetwork net = new TunedNetwork(Topology.SERIES, 1e5, List.of(
                new TunedNetwork.Part("V1", TunedNetwork.Kind.VOLTAGE_SOURCE, 1, 0, 1.0, "source"),
                new TunedNetwork.Part("C1", TunedNetwork.Kind.CAPACITOR, 1, 2, 1e-9, "primary capacitor bank"),
                new TunedNetwork.Part("L1", TunedNetwork.Kind.INDUCTOR, 2, 3, 1e-3, "primary coil"),
                new TunedNetwork.Part("R1", TunedNetwork.Kind.RESISTOR, 3, 0, Double.NaN, "coil AC resistance")),
                Double.NaN, Double.NaN, false, false);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> SpiceNetlist.write(net, "t"));
        assertTrue(e.getMessage().startsWith("R1 (coil AC resistance)"), e.getMessage());
    }

    @Test
    void heaterNetlistIsACurrentFedParallelTankThatReproducesTheTankVoltage() {
        AnalysisResult r = ResultFixtures.heater();
        NetlistParser.Netlist n = NetlistParser.parse(SpiceNetlist.write(TunedNetwork.of(r), "heater"));
        assertNotNull(n.elements().get("I1"));
        assertNotNull(n.elements().get("RW"), "the workpiece reflected into the coil");
        assertEquals(null, n.k1(), "a single tank has no K line");
        double vTank = NetlistSolver.solve(n, n.acStart()).v(1).norm();
        ElementStress c1 = r.stresses().get(0);
        // Fixture: tank voltage π·Vdc/√2 at the lossless resonance; loaded Q ≈ 9.5 moves the true peak by < 1 %.
        assertEquals(c1.voltageRms(), vTank, c1.voltageRms() * 0.03);
    }

    @Test
    void seriesTankNetlistGivesTheSourceCurrentExactly() {
        AnalysisResult r = ResultFixtures.measuredTank();
        NetlistParser.Netlist n = NetlistParser.parse(SpiceNetlist.write(TunedNetwork.of(r), "tank"));
        double i = NetlistSolver.solve(n, n.acStart()).branches().get("V1").norm();
        // At the tank's resonance the reactances cancel: I = V/(R_source + R_coil).
        assertEquals(r.network().sourceCurrent(), i, r.network().sourceCurrent() * 1e-5);
    }
}
