package org.tankwright.coupling;

import org.tankwright.magnetics.Segment;
import org.tankwright.units.Constants;

/**
 * Mutual inductance of two straight filaments in any relative position, and the flux density of one.
 *
 * <p>Neumann: M = (µ0/4π) (ê1·ê2) ∫∫ ds dt / r. Perpendicular filaments give exactly 0.
 * Parallel (or antiparallel) filaments take Grover's closed form (Grover 1946, ch. 5 "parallel
 * filaments"): with F(u) = u·asinh(u/d) − √(u²+d²) and the along-axis coordinates t0, t1 of the
 * second filament's ends measured from the first one's start,
 * {@code M = (µ0/4π) [F(L1−t0) − F(t0) − F(L1−t1) + F(t1)]}; collinear filaments (d = 0) use the
 * limit F(u) = |u| ln|u| − |u|, the ln d terms cancelling between the four corners.
 * Skew or intersecting-direction filaments integrate the exact inner integral
 * ∫dt/r = 2 atanh(L2/(R0+R1)) (R0, R1 the distances to the second filament's ends) along the first
 * by adaptive Gauss–Legendre quadrature: semi-analytic, valid in every position including coplanar
 * ones, singular only where the filaments touch.
 *
 * <p>An instance is a reusable workspace (not thread-safe); the static methods make their own.
 */
public final class SegmentKernel {
    /** Relative tolerance of the quadrature for non-parallel filaments. */
    static final double TOLERANCE = 1e-11;
    private static final double MU0_4PI = Constants.MU0 / (4 * Math.PI);

    private final InnerIntegral inner = new InnerIntegral();

    /** Mutual inductance in henries of two straight filaments (current from start to end). */
    public static double mutual(Segment a, Segment b) {
        return new SegmentKernel().mutual(a.x0(), a.y0(), a.z0(), a.x1(), a.y1(), a.z1(),
                b.x0(), b.y0(), b.z0(), b.x1(), b.y1(), b.z1(), a.wireRadius() + b.wireRadius());
    }

    /**
     * Mutual inductance of the filaments A0→A1 and B0→B1; {@code touching} is the distance used
     * if they overlap on one line (the sum of the wire radii).
     */
    public double mutual(double ax0, double ay0, double az0, double ax1, double ay1, double az1,
                         double bx0, double by0, double bz0, double bx1, double by1, double bz1, double touching) {
        double ux = ax1 - ax0;
        double uy = ay1 - ay0;
        double uz = az1 - az0;
        double l1 = Math.sqrt(ux * ux + uy * uy + uz * uz);
        double vx = bx1 - bx0;
        double vy = by1 - by0;
        double vz = bz1 - bz0;
        double l2 = Math.sqrt(vx * vx + vy * vy + vz * vz);
        if (l1 == 0 || l2 == 0) {
            return 0;
        }
        ux /= l1;
        uy /= l1;
        uz /= l1;
        vx /= l2;
        vy /= l2;
        vz /= l2;
        int relation = relation(ux, uy, uz, vx, vy, vz);
        if (relation == PERPENDICULAR) {
            return 0;
        }
        if (relation == PARALLEL) {
            return parallel(l1, ux, uy, uz, bx0 - ax0, by0 - ay0, bz0 - az0, bx1 - ax0, by1 - ay0, bz1 - az0, touching);
        }
        inner.set(ax0, ay0, az0, ux, uy, uz, bx0, by0, bz0, bx1, by1, bz1, l2);
        double integral = AdaptiveGauss.integrate(inner, 0, l1, TOLERANCE);
        return MU0_4PI * (ux * vx + uy * vy + uz * vz) * integral;
    }

    /** Relations of two filaments' directions: M is then 0, Grover's closed form, or the quadrature. */
    static final int PERPENDICULAR = 0;
    static final int PARALLEL = 1;
    static final int OBLIQUE = 2;

    /** How two unit directions relate: perpendicular (|cos| ≤ 1e-14), parallel (sin² ≤ 1e-24) or oblique. */
    static int relation(double ux, double uy, double uz, double vx, double vy, double vz) {
        double cos = ux * vx + uy * vy + uz * vz;
        if (Math.abs(cos) <= 1e-14) {
            return PERPENDICULAR;
        }
        double cx = uy * vz - uz * vy;
        double cy = uz * vx - ux * vz;
        double cz = ux * vy - uy * vx;
        return cx * cx + cy * cy + cz * cz <= 1e-24 ? PARALLEL : OBLIQUE;
    }

    private static double parallel(double l1, double ux, double uy, double uz,
                                   double px, double py, double pz, double qx, double qy, double qz, double touching) {
        double t0 = px * ux + py * uy + pz * uz;
        double t1 = qx * ux + qy * uy + qz * uz;
        double ex = px - t0 * ux;
        double ey = py - t0 * uy;
        double ez = pz - t0 * uz;
        return parallel(l1, t0, t1, Math.sqrt(ex * ex + ey * ey + ez * ez), touching);
    }

    /**
     * Grover's closed form for parallel filaments: the first runs from 0 to l1 along its axis, the
     * second from t0 to t1 along the same axis (t1 &lt; t0 when antiparallel) at distance d from it.
     */
    static double parallel(double l1, double t0, double t1, double d, double touching) {
        double scale = l1 + Math.abs(t1 - t0);
        if (d <= 1e-12 * scale) {
            double lo = Math.min(t0, t1);
            double hi = Math.max(t0, t1);
            boolean overlap = hi > 1e-12 * scale && lo < l1 - 1e-12 * scale;
            if (!overlap) {
                return MU0_4PI * (g(l1 - t0) - g(t0) - g(l1 - t1) + g(t1));
            }
            if (!(touching > 0)) {
                throw new IllegalArgumentException("collinear overlapping filaments with no wire radius");
            }
            d = touching;
        }
        return MU0_4PI * (f(l1 - t0, d) - f(t0, d) - f(l1 - t1, d) + f(t1, d));
    }

    /** F(u) = u·asinh(u/d) − √(u²+d²), even in u; the square root is shared with the logarithm. */
    private static double f(double u, double d) {
        double a = Math.abs(u);
        double r = Math.sqrt(a * a + d * d);
        double x = a / d;
        double asinh;
        if (x < 1e-4) {
            asinh = x * (1 - x * x / 6);
        } else if (x > 1e8) {
            asinh = Math.log(2 * x);
        } else {
            asinh = Math.log((a + r) / d);
        }
        return a * asinh - r;
    }

    private static double g(double u) {
        double a = Math.abs(u);
        return a == 0 ? 0 : a * Math.log(a) - a;
    }

    /** ∫_B dt/|P(s) − Q(t)| = 2 atanh(L2/(R0+R1)) = ln((R0+R1+L2)/(R0+R1−L2)) along the first filament. */
    private static final class InnerIntegral extends AdaptiveGauss.Integrand {
        private double ax;
        private double ay;
        private double az;
        private double ux;
        private double uy;
        private double uz;
        private double bx0;
        private double by0;
        private double bz0;
        private double bx1;
        private double by1;
        private double bz1;
        private double l2;

        void set(double ax, double ay, double az, double ux, double uy, double uz,
                 double bx0, double by0, double bz0, double bx1, double by1, double bz1, double l2) {
            this.ax = ax;
            this.ay = ay;
            this.az = az;
            this.ux = ux;
            this.uy = uy;
            this.uz = uz;
            this.bx0 = bx0;
            this.by0 = by0;
            this.bz0 = bz0;
            this.bx1 = bx1;
            this.by1 = by1;
            this.bz1 = bz1;
            this.l2 = l2;
        }

        @Override
        double value(double s) {
            double px = ax + s * ux;
            double py = ay + s * uy;
            double pz = az + s * uz;
            double r0 = Math.sqrt(sq(px - bx0) + sq(py - by0) + sq(pz - bz0));
            double r1 = Math.sqrt(sq(px - bx1) + sq(py - by1) + sq(pz - bz1));
            double sum = r0 + r1;
            return Math.log((sum + l2) / (sum - l2));
        }
    }

    static double sq(double v) {
        return v * v;
    }

    /**
     * Flux density per ampere of the filament A→B at point P, added into out[0..2]:
     * B = (µ0/4π) (ê × r_A)/h² · (ê·r_A/|r_A| − ê·r_B/|r_B|), r = P − end, h the distance to the line.
     */
    public static void addFluxDensity(double ax, double ay, double az, double bx, double by, double bz,
                                      double px, double py, double pz, double weight, double[] out) {
        double ex = bx - ax;
        double ey = by - ay;
        double ez = bz - az;
        double len = Math.sqrt(ex * ex + ey * ey + ez * ez);
        if (len == 0) {
            return;
        }
        ex /= len;
        ey /= len;
        ez /= len;
        double rax = px - ax;
        double ray = py - ay;
        double raz = pz - az;
        double rbx = px - bx;
        double rby = py - by;
        double rbz = pz - bz;
        double cx = ey * raz - ez * ray;
        double cy = ez * rax - ex * raz;
        double cz = ex * ray - ey * rax;
        double h2 = cx * cx + cy * cy + cz * cz;
        double ra = Math.sqrt(rax * rax + ray * ray + raz * raz);
        double rb = Math.sqrt(rbx * rbx + rby * rby + rbz * rbz);
        if (h2 <= 1e-24 * len * len) {
            if (ra + rb <= len * (1 + 1e-12)) {
                throw new IllegalArgumentException("field point lies on a straight filament");
            }
            return; // on the line's extension: no field
        }
        double factor = weight * MU0_4PI / h2 * ((ex * rax + ey * ray + ez * raz) / ra - (ex * rbx + ey * rby + ez * rbz) / rb);
        out[0] += factor * cx;
        out[1] += factor * cy;
        out[2] += factor * cz;
    }
}
