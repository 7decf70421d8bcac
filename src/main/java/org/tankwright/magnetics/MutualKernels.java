package org.tankwright.magnetics;

import org.tankwright.units.Constants;

/**
 * Mutual-inductance kernels between filaments, shared by the coil model (self inductance as a
 * sum of mutual terms) and the coupling model.
 */
public final class MutualKernels {
    private MutualKernels() {
    }

    /**
     * Maxwell's formula for two coaxial circular filaments of radii {@code r1}, {@code r2} whose
     * planes are {@code d} apart: M = µ0 √(r1 r2) [(2/k − k) K(k²) − (2/k) E(k²)],
     * k² = 4 r1 r2 / ((r1 + r2)² + d²). Source: Maxwell, Treatise (1873) §701; Grover (1946) ch. 13.
     * For small k the bracket suffers cancellation; there the series form is used instead.
     */
    public static double coaxialRings(double r1, double r2, double d) {
        if (!(r1 > 0 && r2 > 0)) {
            throw new IllegalArgumentException("ring radii must be > 0, got " + r1 + ", " + r2);
        }
        double m = 4.0 * r1 * r2 / ((r1 + r2) * (r1 + r2) + d * d);
        double k = Math.sqrt(m);
        if (m < 1e-3) {
            // Series of the bracket in m (Grover 1946, eq. 77 type expansion):
            // (2/k − k)K − (2/k)E = (π/16) k³ (1 + 3/4 m + 75/128 m² + 245/512 m³ + ...)
            double series = 1 + 0.75 * m + 75.0 / 128.0 * m * m + 245.0 / 512.0 * m * m * m;
            return Constants.MU0 * Math.sqrt(r1 * r2) * Math.PI / 16.0 * k * m * series;
        }
        return Constants.MU0 * Math.sqrt(r1 * r2) * ((2.0 / k - k) * Elliptic.k(m) - 2.0 / k * Elliptic.e(m));
    }
    /**
     * Self inductance of a circular loop of radius {@code radius} made of round wire of radius
     * {@code wireRadius} with uniform current: µ0 R (ln(8R/a) − 2 + 1/4) (Grover 1946, ch. 13;
     * Y = 1/4 for uniform current). Valid for R ≫ a.
     */
    public static double ringSelf(double radius, double wireRadius) {
        return Constants.MU0 * radius * (Math.log(8.0 * radius / wireRadius) - 1.75);
    }

    /**
     * Self inductance of a straight round wire of length {@code length} and radius {@code wireRadius}
     * with uniform current, as the mutual inductance of two parallel filaments at the wire's geometric
     * mean distance g = a·e^{−1/4}: (µ0/2π)[l·asinh(l/g) − √(l² + g²) + g] (Grover 1946, ch. 3 and 7;
     * Rosa 1908). Ends of the wire are included exactly, no l ≫ a assumption.
     */
    public static double segmentSelf(double length, double wireRadius) {
        double g = wireRadius * Math.exp(-0.25);
        return Constants.MU0 / (2.0 * Math.PI) * (length * asinh(length / g) - Math.hypot(length, g) + g);
    }

    /**
     * Mutual inductance of two straight filaments by Neumann's formula M = (µ0/4π) cos ε ∬ ds dt / r
     * (Grover 1946, ch. 7). Perpendicular pairs give 0; parallel pairs use the closed form with
     * G(x) = x·asinh(x/d) − √(x² + d²); pairs meeting at a vertex use the closed form
     * ∬ = 2[a·atanh(b/(a+R)) + b·atanh(a/(b+R))] (R the distance of the free ends); other pairs
     * integrate the exact inner integral ln((r0 + r1 + L)/(r0 + r1 − L)) over the first filament
     * by Gauss-Legendre on panels graded toward the closest approach. Filaments must not overlap.
     */
    public static double segments(Segment a, Segment b) {
        double la = a.length();
        double lb = b.length();
        double ux = (a.x1() - a.x0()) / la;
        double uy = (a.y1() - a.y0()) / la;
        double uz = (a.z1() - a.z0()) / la;
        double vx = (b.x1() - b.x0()) / lb;
        double vy = (b.y1() - b.y0()) / lb;
        double vz = (b.z1() - b.z0()) / lb;
        double cos = ux * vx + uy * vy + uz * vz;
        if (Math.abs(cos) < 1e-13) {
            return 0.0;
        }
        double cx = uy * vz - uz * vy;
        double cy = uz * vx - ux * vz;
        double cz = ux * vy - uy * vx;
        double sin = Math.sqrt(cx * cx + cy * cy + cz * cz);
        double scale = Math.max(la, lb);
        double integral;
        if (sin < 1e-12) {
            integral = parallelIntegral(a, la, ux, uy, uz, b, scale);
        } else {
            integral = vertexIntegral(a, la, b, lb, scale);
            if (Double.isNaN(integral)) {
                integral = quadratureIntegral(a, la, ux, uy, uz, b, lb);
            }
        }
        return Constants.MU0 / (4.0 * Math.PI) * cos * integral;
    }

    private static double parallelIntegral(Segment a, double la, double ux, double uy, double uz, Segment b,
            double scale) {
        double t0 = (b.x0() - a.x0()) * ux + (b.y0() - a.y0()) * uy + (b.z0() - a.z0()) * uz;
        double t1 = (b.x1() - a.x0()) * ux + (b.y1() - a.y0()) * uy + (b.z1() - a.z0()) * uz;
        double px = b.x0() - a.x0() - t0 * ux;
        double py = b.y0() - a.y0() - t0 * uy;
        double pz = b.z0() - a.z0() - t0 * uz;
        double d = Math.sqrt(px * px + py * py + pz * pz);
        double lo = Math.min(t0, t1);
        double hi = Math.max(t0, t1);
        if (d < 1e-12 * scale) {
            if (hi > 1e-12 * scale && lo < la - 1e-12 * scale) {
                throw new IllegalArgumentException("overlapping collinear filaments have no finite mutual inductance");
            }
            d = 0.0;
        }
        return g(la - lo, d) - g(la - hi, d) - g(-lo, d) + g(-hi, d);
    }

    /** G(x) with G'' = 1/√(x² + d²); for d = 0 the terms linear in |x| cancel in the sum and are dropped. */
    private static double g(double x, double d) {
        if (d == 0.0) {
            double ax = Math.abs(x);
            return ax == 0.0 ? 0.0 : ax * Math.log(ax);
        }
        return x * asinh(x / d) - Math.hypot(x, d);
    }

    /** Closed form when the filaments share an end point; NaN when they do not. */
    private static double vertexIntegral(Segment a, double la, Segment b, double lb, double scale) {
        double tol = 1e-12 * scale;
        double[] free = null;
        if (near(a.x1(), a.y1(), a.z1(), b.x0(), b.y0(), b.z0(), tol)) {
            free = new double[] {a.x0(), a.y0(), a.z0(), b.x1(), b.y1(), b.z1()};
        } else if (near(a.x0(), a.y0(), a.z0(), b.x1(), b.y1(), b.z1(), tol)) {
            free = new double[] {a.x1(), a.y1(), a.z1(), b.x0(), b.y0(), b.z0()};
        } else if (near(a.x0(), a.y0(), a.z0(), b.x0(), b.y0(), b.z0(), tol)) {
            free = new double[] {a.x1(), a.y1(), a.z1(), b.x1(), b.y1(), b.z1()};
        } else if (near(a.x1(), a.y1(), a.z1(), b.x1(), b.y1(), b.z1(), tol)) {
            free = new double[] {a.x0(), a.y0(), a.z0(), b.x0(), b.y0(), b.z0()};
        }
        if (free == null) {
            return Double.NaN;
        }
        double r = Math.sqrt(sq(free[0] - free[3]) + sq(free[1] - free[4]) + sq(free[2] - free[5]));
        return 2.0 * (la * atanh(lb / (la + r)) + lb * atanh(la / (lb + r)));
    }

    /** 8-point Gauss-Legendre nodes and weights on [−1, 1]. */
    static final double[] GL_X = {
        -0.9602898564975363, -0.7966664774136267, -0.5255324099163290, -0.1834346424956498,
        0.1834346424956498, 0.5255324099163290, 0.7966664774136267, 0.9602898564975363};
    static final double[] GL_W = {
        0.1012285362903763, 0.2223810344533745, 0.3137066458778873, 0.3626837833783620,
        0.3626837833783620, 0.3137066458778873, 0.2223810344533745, 0.1012285362903763};

    private static double quadratureIntegral(Segment a, double la, double ux, double uy, double uz, Segment b,
            double lb) {
        // closest approach of b to the line of a, sampled at b's ends and the common perpendicular
        double sStar = closestParameter(a, la, ux, uy, uz, b, lb);
        double dMin = Math.max(distanceToSegment(a.x0() + sStar * ux, a.y0() + sStar * uy, a.z0() + sStar * uz, b, lb),
                1e-9 * la);
        double sum = 0.0;
        sum += gradedPanels(a, ux, uy, uz, b, lb, sStar, la, dMin);
        sum += gradedPanels(a, ux, uy, uz, b, lb, sStar, 0.0, dMin);
        return sum;
    }

    /** Integrates from sStar toward end, with panel lengths growing geometrically from the distance dMin. */
    private static double gradedPanels(Segment a, double ux, double uy, double uz, Segment b, double lb,
            double sStar, double end, double dMin) {
        double total = Math.abs(end - sStar);
        if (total == 0.0) {
            return 0.0;
        }
        double dir = Math.signum(end - sStar);
        double sum = 0.0;
        double start = 0.0;
        double h = Math.min(dMin, total);
        while (start < total) {
            double stop = Math.min(total, start + h);
            if (total - stop < 0.5 * h) {
                stop = total;
            }
            double mid = 0.5 * (start + stop);
            double half = 0.5 * (stop - start);
            for (int i = 0; i < GL_X.length; i++) {
                double s = sStar + dir * (mid + half * GL_X[i]);
                sum += GL_W[i] * half * innerIntegral(a.x0() + s * ux, a.y0() + s * uy, a.z0() + s * uz, b, lb);
            }
            start = stop;
            h *= 2.0;
        }
        return sum;
    }

    /** ∫ dt / r along b from point P: ln((r0 + r1 + L)/(r0 + r1 − L)), with the small difference formed stably. */
    private static double innerIntegral(double px, double py, double pz, Segment b, double lb) {
        double r0 = Math.sqrt(sq(px - b.x0()) + sq(py - b.y0()) + sq(pz - b.z0()));
        double r1 = Math.sqrt(sq(px - b.x1()) + sq(py - b.y1()) + sq(pz - b.z1()));
        double sumR = r0 + r1;
        // (r0 + r1)² − L² = (r0 + r1 − L)(r0 + r1 + L)
        double small = (sumR * sumR - lb * lb) / (sumR + lb);
        return Math.log((sumR + lb) / small);
    }

    /**
     * Parameter along a (0..la) of the closest approach between the two segments (Ericson, Real-Time
     * Collision Detection, 2005, §5.1.9: closest points of two segments, clamped).
     */
    private static double closestParameter(Segment a, double la, double ux, double uy, double uz, Segment b, double lb) {
        double vx = (b.x1() - b.x0()) / lb;
        double vy = (b.y1() - b.y0()) / lb;
        double vz = (b.z1() - b.z0()) / lb;
        double rx = a.x0() - b.x0();
        double ry = a.y0() - b.y0();
        double rz = a.z0() - b.z0();
        double c = ux * vx + uy * vy + uz * vz;
        double d = ux * rx + uy * ry + uz * rz;
        double e = vx * rx + vy * ry + vz * rz;
        double den = 1 - c * c;
        double s = den > 1e-14 ? clamp((c * e - d) / den, 0, la) : 0.0;
        double t = s * c + e;
        if (t < 0) {
            t = 0;
            s = clamp(-d, 0, la);
        } else if (t > lb) {
            t = lb;
            s = clamp(lb * c - d, 0, la);
        }
        return s;
    }

    private static double clamp(double v, double lo, double hi) {
        return v < lo ? lo : v > hi ? hi : v;
    }

    private static double distanceToSegment(double px, double py, double pz, Segment b, double lb) {
        double vx = (b.x1() - b.x0()) / lb;
        double vy = (b.y1() - b.y0()) / lb;
        double vz = (b.z1() - b.z0()) / lb;
        double t = (px - b.x0()) * vx + (py - b.y0()) * vy + (pz - b.z0()) * vz;
        t = Math.max(0.0, Math.min(lb, t));
        return Math.sqrt(sq(px - b.x0() - t * vx) + sq(py - b.y0() - t * vy) + sq(pz - b.z0() - t * vz));
    }

    /**
     * Magnetic flux density per ampere of a circular filament (radius R, in the plane z = 0, axis z,
     * current counter-clockwise seen from +z) at a point at distance r from the axis and height z:
     * returns {Br, Bz} in T/A (Smythe, Static and Dynamic Electricity, §7.10; elliptic integrals K, E).
     */
    public static void ringField(double radius, double r, double z, double[] out) {
        double a2 = (radius + r) * (radius + r) + z * z;
        double b2 = (radius - r) * (radius - r) + z * z;
        double m = 4.0 * radius * r / a2;
        double kk = Elliptic.k(m);
        double ee = Elliptic.e(m);
        double sa = Math.sqrt(a2);
        double c = Constants.MU0 / (2.0 * Math.PI * sa);
        out[1] = c * (kk + (radius * radius - r * r - z * z) / b2 * ee);
        out[0] = r < 1e-12 * radius ? 0.0 : c * z / r * (-kk + (radius * radius + r * r + z * z) / b2 * ee);
    }

    private static boolean near(double x0, double y0, double z0, double x1, double y1, double z1, double tol) {
        return Math.abs(x0 - x1) <= tol && Math.abs(y0 - y1) <= tol && Math.abs(z0 - z1) <= tol;
    }

    private static double sq(double v) {
        return v * v;
    }

    /** Inverse hyperbolic sine, accurate for both signs and large arguments. */
    static double asinh(double x) {
        double ax = Math.abs(x);
        double r = ax > 1e8 ? Math.log(2.0 * ax) : Math.log(ax + Math.sqrt(ax * ax + 1.0));
        if (ax < 1e-4) {
            r = ax * (1.0 - ax * ax / 6.0);
        }
        return x < 0 ? -r : r;
    }

    private static double atanh(double x) {
        return 0.5 * Math.log((1.0 + x) / (1.0 - x));
    }
}
