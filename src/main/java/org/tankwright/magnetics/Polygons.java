package org.tankwright.magnetics;

import java.util.List;

/** Builds closed polygon turns of straight filaments in the plane z = 0. */
final class Polygons {
    private Polygons() {
    }

    /** Appends the closed polygon through the vertices (counter-clockwise seen from +z). */
    static void addClosed(List<Filament> out, double[] xs, double[] ys, double wireRadius) {
        int n = xs.length;
        for (int k = 0; k < n; k++) {
            int j = (k + 1) % n;
            out.add(new Segment(xs[k], ys[k], 0, xs[j], ys[j], 0, wireRadius));
        }
    }
}
