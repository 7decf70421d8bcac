package org.tankwright.magnetics;

import java.util.List;
import org.tankwright.materials.Conductor;
import org.tankwright.units.Constants;

/**
 * The AC field each part of a coil sees from all the other parts, for the proximity loss: returns
 * Σ ℓ_i h_i², h_i the field per ampere (A/m per A) at filament i's centre from every other filament,
 * ℓ_i its length. For round conductors h is the component transverse to the wire; for a PCB trace only
 * the component normal to the board (which drives the dominant eddy currents across the width).
 *
 * <p>The field at a wire's centre is the uniform part of the external field over its cross-section
 * (mean-value property of a source-free field); gradients add a smaller quadrupole loss, neglected.
 * Rings: exact elliptic-integral field of coaxial loops. Segments: exact Biot–Savart field of finite
 * straight filaments, averaged over three Gauss points along each segment.
 */
final class CoilFields {
    private static final double[] NODES = {0.5 - 0.5 * Math.sqrt(0.6), 0.5, 0.5 + 0.5 * Math.sqrt(0.6)};
    private static final double[] WEIGHTS = {5.0 / 18, 8.0 / 18, 5.0 / 18};

    private CoilFields() {
    }

    /**
     * @param rotationalSymmetry n when every turn is a regular n-gon whose segment k is segment 0 rotated
     *                           by 2πk/n (each segment then sees the same field as the turn's first), else 1
     */
    static double weightedFieldSquared(List<Filament> filaments, Conductor conductor, int rotationalSymmetry) {
        boolean normalOnly = conductor instanceof Conductor.Trace;
        if (filaments.get(0) instanceof Ring) {
            return rings(filaments, normalOnly);
        }
        return segments(filaments, normalOnly, rotationalSymmetry);
    }

    /**
     * Multilayer solenoid by layer pairs: the field of layer j2's turn i2 at layer j1's turn i1 depends
     * only on i1 − i2, so each pair of layers needs n1 + n2 − 1 field evaluations.
     */
    static double multilayer(MultilayerSolenoid m) {
        double[] b = new double[2];
        double p = m.pitch();
        int layers = m.layers();
        double sum = 0;
        for (int j1 = 0; j1 < layers; j1++) {
            int n1 = m.turnsInLayer(j1);
            double r1 = m.layerRadius(j1);
            double[] br = new double[n1];
            double[] bz = new double[n1];
            for (int j2 = 0; j2 < layers; j2++) {
                int n2 = m.turnsInLayer(j2);
                double r2 = m.layerRadius(j2);
                double shift = m.turnZ(j1, 0) - m.turnZ(j2, 0);
                int offset = n2 - 1;
                double[] fr = new double[n1 + n2 - 1];
                double[] fz = new double[n1 + n2 - 1];
                for (int d = -(n2 - 1); d <= n1 - 1; d++) {
                    if (j1 == j2 && d == 0) {
                        continue; // a turn's own field is the skin effect, not proximity
                    }
                    MutualKernels.ringField(r2, r1, shift + d * p, b);
                    fr[d + offset] = b[0];
                    fz[d + offset] = b[1];
                }
                for (int i1 = 0; i1 < n1; i1++) {
                    for (int i2 = 0; i2 < n2; i2++) {
                        br[i1] += fr[i1 - i2 + offset];
                        bz[i1] += fz[i1 - i2 + offset];
                    }
                }
            }
            for (int i1 = 0; i1 < n1; i1++) {
                sum += 2 * Math.PI * r1 * (br[i1] * br[i1] + bz[i1] * bz[i1]) / (Constants.MU0 * Constants.MU0);
            }
        }
        return sum;
    }

    private static double rings(List<Filament> f, boolean normalOnly) {
        int n = f.size();
        double[] b = new double[2];
        // A uniform column (one radius, even pitch, as in a single-layer solenoid) needs the field of
        // each separation once: O(N) kernel calls instead of O(N²).
        double[][] byOffset = uniformColumn(f) ? new double[n][] : null;
        double sum = 0;
        for (int i = 0; i < n; i++) {
            Ring ri = (Ring) f.get(i);
            double br = 0;
            double bz = 0;
            for (int j = 0; j < n; j++) {
                if (j == i) {
                    continue;
                }
                Ring rj = (Ring) f.get(j);
                if (byOffset != null) {
                    int k = Math.abs(i - j);
                    if (byOffset[k] == null) {
                        MutualKernels.ringField(rj.radius(), ri.radius(), k * (((Ring) f.get(1)).z() - ((Ring) f.get(0)).z()), b);
                        byOffset[k] = new double[] {b[0], b[1]};
                    }
                    // Br is odd in the separation, Bz even
                    br += i > j ? byOffset[k][0] : -byOffset[k][0];
                    bz += byOffset[k][1];
                } else {
                    MutualKernels.ringField(rj.radius(), ri.radius(), ri.z() - rj.z(), b);
                    br += b[0];
                    bz += b[1];
                }
            }
            double h2 = (normalOnly ? bz * bz : br * br + bz * bz) / (Constants.MU0 * Constants.MU0);
            sum += 2 * Math.PI * ri.radius() * h2;
        }
        return sum;
    }

    /** True when the rings share one radius and sit at an even, nonzero pitch along z in order. */
    static boolean uniformColumn(List<Filament> f) {
        int n = f.size();
        if (n < 3) {
            return false;
        }
        Ring r0 = (Ring) f.get(0);
        double pitch = ((Ring) f.get(1)).z() - r0.z();
        if (!(pitch > 0)) {
            return false;
        }
        for (int i = 1; i < n; i++) {
            Ring r = (Ring) f.get(i);
            if (r.radius() != r0.radius() || Math.abs(r.z() - r0.z() - i * pitch) > 1e-12 * pitch * n) {
                return false;
            }
        }
        return true;
    }

    private static double segments(List<Filament> f, boolean normalOnly, int symmetry) {
        int n = f.size();
        double[] h = new double[3];
        double sum = 0;
        for (int i = 0; i < n; i += symmetry) {
            Segment si = (Segment) f.get(i);
            double len = si.length();
            double ux = (si.x1() - si.x0()) / len;
            double uy = (si.y1() - si.y0()) / len;
            double uz = (si.z1() - si.z0()) / len;
            for (int q = 0; q < NODES.length; q++) {
                double px = si.x0() + NODES[q] * (si.x1() - si.x0());
                double py = si.y0() + NODES[q] * (si.y1() - si.y0());
                double pz = si.z0() + NODES[q] * (si.z1() - si.z0());
                double hx = 0;
                double hy = 0;
                double hz = 0;
                for (int j = 0; j < n; j++) {
                    if (j != i) {
                        segmentField((Segment) f.get(j), px, py, pz, h);
                        hx += h[0];
                        hy += h[1];
                        hz += h[2];
                    }
                }
                double along = hx * ux + hy * uy + hz * uz;
                double h2 = normalOnly ? hz * hz : hx * hx + hy * hy + hz * hz - along * along;
                sum += WEIGHTS[q] * len * h2 * symmetry;
            }
        }
        return sum;
    }

    /**
     * Field H per ampere of a straight filament at P: |H| = (cos θ1 − cos θ2)/(4π d), direction u × ρ̂
     * (Biot–Savart for a finite segment).
     */
    static void segmentField(Segment s, double px, double py, double pz, double[] out) {
        double len = s.length();
        double ux = (s.x1() - s.x0()) / len;
        double uy = (s.y1() - s.y0()) / len;
        double uz = (s.z1() - s.z0()) / len;
        double wx = px - s.x0();
        double wy = py - s.y0();
        double wz = pz - s.z0();
        double t = wx * ux + wy * uy + wz * uz;
        double rx = wx - t * ux;
        double ry = wy - t * uy;
        double rz = wz - t * uz;
        double d2 = rx * rx + ry * ry + rz * rz;
        if (d2 < 1e-24 * len * len) {
            out[0] = 0;
            out[1] = 0;
            out[2] = 0;
            return;
        }
        double ra = Math.sqrt(t * t + d2);
        double rb = Math.sqrt((t - len) * (t - len) + d2);
        double mag = (t / ra - (t - len) / rb) / (4 * Math.PI * d2); // divided by d once more: ρ not unit
        out[0] = mag * (uy * rz - uz * ry);
        out[1] = mag * (uz * rx - ux * rz);
        out[2] = mag * (ux * ry - uy * rx);
    }
}
