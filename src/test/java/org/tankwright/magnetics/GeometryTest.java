package org.tankwright.magnetics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.tankwright.materials.Conductor;
import org.tankwright.materials.ConductorMaterial;

class GeometryTest {
    private static final Conductor WIRE = new Conductor.RoundWire(1.0e-3, 1.1e-3, ConductorMaterial.COPPER);

    private static void assertProblem(CoilGeometry g, String... fragments) {
        List<String> p = g.problems();
        assertTrue(!p.isEmpty(), "expected a problem for " + g);
        String all = String.join(" | ", p);
        for (String f : fragments) {
            assertTrue(all.contains(f), "message '" + all + "' should contain '" + f + "'");
        }
        assertThrows(IllegalStateException.class, g::filaments);
    }

    @Test
    void badGeometryMessagesNameFieldValueAndLimit() {
        assertProblem(new SingleLayerSolenoid(20e-3, 0, 1.5e-3, WIRE), "turns = 0", "at least 1");
        assertProblem(new SingleLayerSolenoid(-20e-3, 10, 1.5e-3, WIRE), "diameter = -20.00 mm", "greater than 0");
        assertProblem(new SingleLayerSolenoid(20e-3, 10, 1.0e-3, WIRE), "pitch = 1.000 mm", "thicker than the pitch");
        assertProblem(new SingleLayerSolenoid(Double.NaN, 10, 1.5e-3, WIRE), "diameter = NaN");
        assertProblem(SingleLayerSolenoid.ofLength(20e-3, 10, Double.NaN, WIRE), "pitch = NaN");
        assertProblem(new FlatSpiral(50e-3, 60e-3, 5, WIRE), "inner diameter = 60.00 mm", "smaller than the outer");
        assertProblem(new FlatSpiral(50e-3, 40e-3, 10, WIRE), "thicker than the pitch");
        assertProblem(new PolygonSpiral(5, 50e-3, 10e-3, 5, WIRE), "sides = 5");
        assertProblem(new MultilayerSolenoid(20e-3, 10, 20, 1.1e-3, WIRE), "layers = 20", "cannot exceed turns");
        assertProblem(new RectangularSpiral(100e-3, 60e-3, 60e-3, 30e-3, 5, WIRE), "inner height", "20.00 mm");
        assertProblem(new SingleLoop(0.5e-3, WIRE), "diameter = 0.5000 mm");
        assertProblem(new SingleLayerSolenoid(20e-3, 10, 1.5e-3,
                new Conductor.Trace(1e-3, 35e-6, ConductorMaterial.COPPER)), "not a trace");
    }

    @Test
    void solenoidFilamentsAreCentredOnTheMiddleOfTheLength() {
        SingleLayerSolenoid s = new SingleLayerSolenoid(20e-3, 4, 2e-3, WIRE);
        List<Filament> f = s.filaments();
        assertEquals(4, f.size());
        assertEquals(-3e-3, ((Ring) f.get(0)).z(), 1e-15);
        assertEquals(3e-3, ((Ring) f.get(3)).z(), 1e-15);
        assertEquals(10e-3, ((Ring) f.get(0)).radius(), 0);
        assertEquals(3e-3 + 0.55e-3, s.zMax(), 1e-15);
        assertEquals(-s.zMax(), s.zMin(), 0);
        assertEquals(10.55e-3, s.outerRadius(), 1e-15);
        assertEquals(8e-3, s.length(), 1e-15);
        assertEquals(2e-3, s.turnPitch(), 0);
        assertEquals(0.0, new SingleLoop(0.1, WIRE).turnPitch(), 0);
        assertEquals(4 * Math.hypot(Math.PI * 20e-3, 2e-3), s.wireLength(), 1e-15);
    }

    @Test
    void spiralPitchFollowsTheCaliperConvention() {
        // ((outer − inner)/2 − wire)/(turns − 1) = ((50 − 10)/2 − 1.1)/9 = 2.1 mm
        FlatSpiral s = new FlatSpiral(50e-3, 10e-3, 10, WIRE);
        assertTrue(s.problems().isEmpty(), s.problems().toString());
        assertEquals(2.1e-3, s.pitch(), 1e-15);
        assertEquals(s.pitch(), s.turnPitch(), 0);
        assertEquals(25e-3 - 0.55e-3, ((Ring) s.filaments().get(0)).radius(), 1e-15);
        assertEquals(5e-3 + 0.55e-3, ((Ring) s.filaments().get(9)).radius(), 1e-15);
        assertEquals(0.55e-3, s.zMax(), 1e-15);
    }

    @Test
    void polygonSpiralIsClosedAndMeasuredAcrossFlats() {
        Conductor trace = Conductor.Trace.ofCopperWeight(1e-3, 1, ConductorMaterial.COPPER);
        for (int sides : new int[] {4, 6, 8}) {
            PolygonSpiral p = new PolygonSpiral(sides, 40e-3, 10e-3, 5, trace);
            assertTrue(p.problems().isEmpty(), p.problems().toString());
            List<Filament> f = p.filaments();
            assertEquals(5 * sides, f.size());
            double maxX = 0;
            double length = 0;
            for (Filament fi : f) {
                Segment s = (Segment) fi;
                maxX = Math.max(maxX, Math.max(s.x0(), s.x1()));
                length += s.length();
            }
            assertEquals(20e-3 - 0.5e-3, maxX, 1e-12, "outer flat at +x, conductor centre line");
            assertEquals(p.wireLength(), length, 1e-12);
            Segment last = (Segment) f.get(sides - 1);
            Segment first = (Segment) f.get(0);
            assertEquals(first.x0(), last.x1(), 1e-15, "turn closes");
        }
        assertEquals(17.5e-6, new PolygonSpiral(4, 40e-3, 10e-3, 5, trace).zMax(), 1e-18);
    }

    @Test
    void multilayerBuildFollowsLayersAndWireSize() {
        MultilayerSolenoid m = MultilayerSolenoid.closeWound(20e-3, 25, 3, WIRE);
        assertTrue(m.problems().isEmpty(), m.problems().toString());
        assertEquals(9, m.turnsPerLayer());
        assertEquals(7, m.turnsInLayer(2));
        assertEquals(25, m.filaments().size());
        assertEquals(10e-3 + 2.5 * 1.1e-3, m.layerRadius(2), 1e-15);
        assertEquals(10e-3 + 3 * 1.1e-3, m.outerRadius(), 1e-15);
    }

    @Test
    void rectangularSpiralDerivesAndChecksInnerHeight() {
        RectangularSpiral r = new RectangularSpiral(100e-3, 60e-3, 60e-3, 20e-3, 5, WIRE);
        assertTrue(r.problems().isEmpty(), r.problems().toString());
        assertEquals(20, r.filaments().size());
        assertEquals(100e-3, r.outerWidth(), 0);
        assertEquals(60e-3, r.outerHeight(), 0);
    }
}
