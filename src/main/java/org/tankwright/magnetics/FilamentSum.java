package org.tankwright.magnetics;

import java.util.List;

/**
 * Inductance as a sum over filaments: L = Σ self terms + Σ_{i≠j} M_ij. Rings must be coaxial (on one
 * axis parallel to z); segments pair with segments. Self terms: {@link MutualKernels#ringSelf} and
 * {@link MutualKernels#segmentSelf} with each filament's wire radius (uniform current).
 */
public final class FilamentSum {
    private FilamentSum() {
    }

    /** Self inductance of filaments carrying one current in series, H. */
    public static double selfInductance(List<Filament> filaments) {
        int n = filaments.size();
        double sum = 0.0;
        for (int i = 0; i < n; i++) {
            Filament fi = filaments.get(i);
            sum += self(fi);
            for (int j = i + 1; j < n; j++) {
                sum += 2.0 * mutual(fi, filaments.get(j));
            }
        }
        return sum;
    }

    /**
     * Self inductance of turns that each are a regular polygon of {@code sides} segments in order,
     * segment k being segment 0 rotated by 2πk/sides about z (as {@link PolygonSpiral} builds them):
     * by that symmetry L = sides · Σ_i Σ_(j,k) M(segment (i,0), segment (j,k)), a factor {@code sides} fewer
     * kernel evaluations than {@link #selfInductance(List)}.
     */
    public static double selfInductanceRotational(List<Filament> filaments, int sides) {
        int n = filaments.size();
        if (n % sides != 0) {
            throw new IllegalArgumentException("filament count " + n + " is not a multiple of " + sides + " sides");
        }
        double sum = 0.0;
        for (int i = 0; i < n; i += sides) {
            Filament fi = filaments.get(i);
            for (int j = 0; j < n; j++) {
                sum += j == i ? self(fi) : mutual(fi, filaments.get(j));
            }
        }
        return sides * sum;
    }

    /**
     * Self inductance of a multilayer solenoid by layer pairs: within a pair of layers the mutual
     * inductance of two turns depends only on their index offset, so each pair needs n1 + n2 − 1 kernel
     * calls instead of n1·n2. Equals {@link #selfInductance(List)} of its filaments.
     */
    public static double multilayer(MultilayerSolenoid m) {
        double a = m.conductor().equivalentRadius();
        double p = m.pitch();
        double sum = 0;
        for (int j1 = 0; j1 < m.layers(); j1++) {
            int n1 = m.turnsInLayer(j1);
            double r1 = m.layerRadius(j1);
            for (int j2 = j1; j2 < m.layers(); j2++) {
                int n2 = m.turnsInLayer(j2);
                double r2 = m.layerRadius(j2);
                double shift = m.turnZ(j2, 0) - m.turnZ(j1, 0);
                double pair = 0;
                for (int d = -(n1 - 1); d <= n2 - 1; d++) {
                    int count = Math.min(n1, n2 - d) - Math.max(0, -d);
                    if (count <= 0) {
                        continue;
                    }
                    double dz = shift + d * p;
                    double mij = j1 == j2 && d == 0 ? MutualKernels.ringSelf(r1, a)
                            : MutualKernels.coaxialRings(r1, r2, dz);
                    pair += count * mij;
                }
                sum += j1 == j2 ? pair : 2 * pair;
            }
        }
        return sum;
    }

    /** Mutual inductance between two coils given as filaments, H (each list in series). */
    public static double mutualInductance(List<Filament> a, List<Filament> b) {
        double sum = 0.0;
        for (Filament fa : a) {
            for (Filament fb : b) {
                sum += mutual(fa, fb);
            }
        }
        return sum;
    }

    /** Self inductance of one filament with its wire radius, H. */
    public static double self(Filament f) {
        if (f instanceof Ring r) {
            return MutualKernels.ringSelf(r.radius(), r.wireRadius());
        }
        Segment s = (Segment) f;
        return MutualKernels.segmentSelf(s.length(), s.wireRadius());
    }

    /** Mutual inductance of two distinct filaments, H: coaxial rings (Maxwell) or two segments (Neumann). */
    public static double mutual(Filament a, Filament b) {
        if (a instanceof Ring ra && b instanceof Ring rb) {
            double scale = Math.max(ra.radius(), rb.radius());
            if (Math.abs(ra.x() - rb.x()) > 1e-12 * scale || Math.abs(ra.y() - rb.y()) > 1e-12 * scale) {
                throw new IllegalArgumentException("rings are not coaxial; the filament sum handles coaxial rings only");
            }
            return MutualKernels.coaxialRings(ra.radius(), rb.radius(), rb.z() - ra.z());
        }
        if (a instanceof Segment sa && b instanceof Segment sb) {
            return MutualKernels.segments(sa, sb);
        }
        throw new IllegalArgumentException("a ring and a segment cannot be paired in the filament sum");
    }
}
