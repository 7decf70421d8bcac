package org.tankwright.bench;

import org.tankwright.magnetics.Filament;
import org.tankwright.magnetics.Ring;

import java.util.ArrayList;
import java.util.List;

/** Coils for the benchmarks and the coupling tests, built directly so that they do not depend on the coil model. */
public final class BenchCoils {
    private BenchCoils() {
    }

    /** A flat spiral approximated by concentric rings in the plane z = 0. */
    public static List<Filament> spiral(int turns, double innerRadius, double pitch, double wireRadius) {
        List<Filament> rings = new ArrayList<>();
        for (int i = 0; i < turns; i++) {
            rings.add(new Ring(0, 0, 0, innerRadius + i * pitch, wireRadius));
        }
        return rings;
    }

    /** The radii of a ring coil (every filament must be a ring). */
    public static double[] radii(List<Filament> rings) {
        double[] r = new double[rings.size()];
        for (int i = 0; i < r.length; i++) {
            r[i] = ((Ring) rings.get(i)).radius();
        }
        return r;
    }
}
