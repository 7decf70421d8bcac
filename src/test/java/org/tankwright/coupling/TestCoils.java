package org.tankwright.coupling;

import org.tankwright.magnetics.Filament;
import org.tankwright.magnetics.Ring;
import org.tankwright.units.Constants;

import java.util.ArrayList;
import java.util.List;

/** Coils for the tests, built here so that the tests do not depend on the coil model. */
final class TestCoils {
    private TestCoils() {
    }

    /** A flat spiral approximated by concentric rings in the plane z = 0. */
    static List<Filament> spiral(int turns, double innerRadius, double pitch, double wireRadius) {
        return org.tankwright.bench.BenchCoils.spiral(turns, innerRadius, pitch, wireRadius);
    }

    /** A single-layer solenoid approximated by coaxial rings, centred on z = 0. */
    static List<Filament> solenoid(int turns, double radius, double pitch, double wireRadius) {
        List<Filament> rings = new ArrayList<>();
        for (int i = 0; i < turns; i++) {
            rings.add(new Ring(0, 0, (i - (turns - 1) / 2.0) * pitch, radius, wireRadius));
        }
        return rings;
    }

    /**
     * Self-inductance of a ring coil as the filament sum: each turn a round-wire loop
     * µ0R(ln(8R/a) − 2 + 1/4) (Grover 1946, uniform current) plus the mutual inductance of every pair of turns.
     */
    static double selfInductance(List<Filament> rings) {
        double sum = 0;
        for (int i = 0; i < rings.size(); i++) {
            Ring r = (Ring) rings.get(i);
            sum += Constants.MU0 * r.radius() * (Math.log(8 * r.radius() / r.wireRadius()) - 1.75);
            for (int j = i + 1; j < rings.size(); j++) {
                Ring s = (Ring) rings.get(j);
                sum += 2 * RingKernel.mutual(r.radius(), s.radius(), s.z() - r.z(), Math.hypot(s.x() - r.x(), s.y() - r.y()));
            }
        }
        return sum;
    }

    static CoupledCoils.Coil coil(String name, List<Filament> filaments, BackingPlate plate) {
        boolean rings = filaments.stream().allMatch(f -> f instanceof Ring);
        // segment coils: the coil model's segment sum (Grover's straight-filament self and mutual terms)
        double l = rings ? selfInductance(filaments) : org.tankwright.magnetics.FilamentSum.selfInductance(filaments);
        return new CoupledCoils.Coil(name, filaments, l, plate);
    }

    /** A flat square spiral of closed square turns (side from outerSide down by 2·pitch per turn) at z = 0. */
    static List<Filament> squareSpiral(int turns, double outerSide, double pitch, double wireRadius) {
        List<Filament> out = new ArrayList<>();
        for (int t = 0; t < turns; t++) {
            double h = outerSide / 2 - t * pitch;
            double[][] p = {{-h, -h}, {h, -h}, {h, h}, {-h, h}, {-h, -h}};
            for (int i = 0; i < 4; i++) {
                out.add(new org.tankwright.magnetics.Segment(p[i][0], p[i][1], 0, p[i + 1][0], p[i + 1][1], 0, wireRadius));
            }
        }
        return out;
    }
}
