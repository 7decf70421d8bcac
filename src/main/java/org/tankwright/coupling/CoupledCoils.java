package org.tankwright.coupling;

import org.tankwright.provenance.Provenance;
import org.apache.commons.math3.complex.Complex;
import org.tankwright.magnetics.Filament;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Two coils with parallel axes facing each other, each with an optional plate behind it: coil a
 * at the origin (its winding's mean plane at z = 0, plate below), coil b above it at an axial
 * distance and a lateral offset (plate above). Both coils' filaments are given in their own frames
 * (axis along z through x = y = 0) and both currents count positive counter-clockwise seen from +z.
 *
 * <p>M is the filament-pair sum of coil a with coil b and all of b's images in both plates; L_a and
 * L_b are the free self-inductances (from the coil model) plus the mutual inductance of each coil
 * with its own images, so they move with the gap when the other coil has a plate.
 * {@code k = M/√(L_a L_b)}. Compiled once; every placement then costs only the pair sums.
 * Immutable and thread-safe.
 */
public final class CoupledCoils {
    /**
     * One coil of the link.
     *
     * @param name          for messages ("a", "b", or a user's label)
     * @param filaments     its filaments in its own frame
     * @param selfInductance its free-space self-inductance from the coil model, henries (&gt; 0)
     * @param plate         its backing plate, or null
     * @param below         distance from the winding's mean plane down to its lowest conductor surface, m,
     *                      or NaN to take it from the filaments and their wire radii
     * @param above         distance from the mean plane up to the highest conductor surface, m, or NaN
     */
    public record Coil(String name, List<? extends Filament> filaments, double selfInductance, BackingPlate plate,
                       double below, double above) {
        public Coil {
            if (!(selfInductance > 0) || Double.isInfinite(selfInductance)) {
                throw new IllegalArgumentException("coil " + name + ": self-inductance must be > 0, got " + selfInductance + " H");
            }
            if (!(Double.isNaN(below) || below >= 0) || !(Double.isNaN(above) || above >= 0)
                    || Double.isInfinite(below) || Double.isInfinite(above)) {
                throw new IllegalArgumentException("coil " + name + ": conductor extents must be ≥ 0, got " + below + ", " + above);
            }
            filaments = List.copyOf(filaments);
        }

        /** A coil whose conductor surfaces follow from its filaments' wire radii. */
        public Coil(String name, List<? extends Filament> filaments, double selfInductance, BackingPlate plate) {
            this(name, filaments, selfInductance, plate, Double.NaN, Double.NaN);
        }
    }

    private static final String MODEL = "filament sum";
    private static final String SPECTRAL = "spectral filament sum (Hankel transform)";
    private static final String SOURCE = "Maxwell (1873) §701 coaxial rings; Grover (1946) ch. 13 and Babic et al., "
            + "IEEE Trans. Magn. 46(9) 2010 for offset rings; Neumann integral with Grover's straight-filament "
            + "formulas (1946) for segments";
    private static final String SPECTRAL_SOURCE = "Smythe, Static and Dynamic Electricity §7.13-7.14 (Hankel transform of "
            + "the ring's vector potential; equivalent to Maxwell's and Grover's ring formulas)";
    private static final String IMAGE_SOURCE = "; images: Smythe §7.18";

    private final Coil coilA;
    private final Coil coilB;
    private final FilamentSet a;
    private final FilamentSet b;
    private final PairSum ab;
    private final PairSum abMirror;
    private final PairSum aa;
    private final PairSum aaMirror;
    private final PairSum bb;
    private final PairSum bbMirror;
    private final double aTop;
    private final double aBottom;
    private final double bTop;
    private final double bBottom;
    private final double etaA;
    private final double etaB;
    private final double radiusSum;
    private final SpectralLink spectral;
    /**
     * The self terms' image series by placement: they depend on the distance only (through plate B), so an
     * offset sweep or a grid over distance × offset sums them once per distance. Bounded; values only.
     */
    private final Map<SelfKey, double[]> selfSeries = new ConcurrentHashMap<>();
    private static final int SELF_SERIES_KEPT = 256;

    private record SelfKey(double distance, double tolerance) {
    }

    public CoupledCoils(Coil coilA, Coil coilB) {
        this(coilA, coilB, true);
    }

    /** With {@code spectralAllowed} false, round coils too go through the filament-pair sums (for cross-checks). */
    CoupledCoils(Coil coilA, Coil coilB, boolean spectralAllowed) {
        this.coilA = coilA;
        this.coilB = coilB;
        FilamentSet rawA = FilamentSet.of(coilA.filaments());
        FilamentSet rawB = FilamentSet.of(coilB.filaments());
        a = rawA.transformed(false, 0, 0, -rawA.zMean(), 1);
        b = rawB.transformed(false, 0, 0, -rawB.zMean(), 1);
        aTop = Double.isNaN(coilA.above()) ? a.zMax() : coilA.above();
        aBottom = Double.isNaN(coilA.below()) ? a.zMin() : -coilA.below();
        bTop = Double.isNaN(coilB.above()) ? b.zMax() : coilB.above();
        bBottom = Double.isNaN(coilB.below()) ? b.zMin() : -coilB.below();
        radiusSum = a.outerRadius() + b.outerRadius();
        etaA = coilA.plate() == null ? 0 : coilA.plate().imageCoefficient(a.meanRadius());
        etaB = coilB.plate() == null ? 0 : coilB.plate().imageCoefficient(b.meanRadius());
        ab = new PairSum(a, b);
        spectral = spectralAllowed && a.axisymmetric() && b.axisymmetric() ? new SpectralLink(a, b, coilA.plate(), coilB.plate()) : null;
        boolean images = spectral == null && (etaA != 0 || etaB != 0);
        // a flat coil is its own mirror image: its mirrored pair sums are the direct ones
        abMirror = !images ? null : b.flat() ? ab : new PairSum(a, b.mirrored());
        aa = images ? new PairSum(a, a) : null;
        aaMirror = !images ? null : a.flat() ? aa : new PairSum(a, a.mirrored());
        bb = images ? new PairSum(b, b) : null;
        bbMirror = !images ? null : b.flat() ? bb : new PairSum(b, b.mirrored());
    }

    /** Coil a as given. */
    public Coil coilA() {
        return coilA;
    }

    /** Coil b as given. */
    public Coil coilB() {
        return coilB;
    }

    /** The axial distance between mean planes at which the conductor-to-conductor gap is {@code gap}. */
    public double distanceForGap(double gap) {
        return gap + aTop - bBottom;
    }

    /** The conductor-to-conductor gap at a mean-plane distance. */
    public double gapForDistance(double distance) {
        return distance - aTop + bBottom;
    }

    /** True when both coils are round and centred (M then depends on the offset's magnitude only). */
    public boolean axisymmetric() {
        return a.axisymmetric() && b.axisymmetric();
    }

    /** Sum of the two coils' outer radii: the natural scale of lateral offsets, metres. */
    public double radiusSum() {
        return radiusSum;
    }

    /** Coupling with the windings {@code gap} apart (conductor to conductor) and b offset by (dx, dy). */
    public CouplingResult atGap(double gap, double dx, double dy) {
        return at(distanceForGap(gap), dx, dy);
    }

    /** Coupling with the mean planes {@code distance} apart and b offset by (dx, dy). */
    public CouplingResult at(double distance, double dx, double dy) {
        return at(distance, dx, dy, RingKernel.DEFAULT_TOLERANCE);
    }

    /** As {@link #at(double, double, double)} with a given relative tolerance for each ring pair. */
    public CouplingResult at(double distance, double dx, double dy, double tolerance) {
        double gap = gapForDistance(distance);
        if (!(gap >= 0) || !Double.isFinite(distance) || !Double.isFinite(dx) || !Double.isFinite(dy)) {
            throw new IllegalArgumentException(String.format(
                    "the coils overlap: gap %.6g m (distance %.6g m) must be ≥ 0 and offsets finite", gap, distance));
        }
        double zA = aBottom - (coilA.plate() == null ? 0 : coilA.plate().spacing());
        double zB = distance + bTop + (coilB.plate() == null ? 0 : coilB.plate().spacing());
        List<String> notes = new ArrayList<>();
        boolean plates = etaA != 0 || etaB != 0;
        // values[0..2]: M, change of L_a, change of L_b
        double[] values;
        boolean valid = true;
        if (spectral != null) {
            SpectralLink.Values v = spectral.solve(distance, Math.hypot(dx, dy), zA, zB);
            values = new double[] {v.mutual(), v.deltaA(), v.deltaB()};
        } else {
            values = new double[] {ab.mutual(dx, dy, distance, tolerance), 0, 0};
            if (plates) {
                valid = imagesByPairSums(distance, dx, dy, zA, zB, tolerance, values, notes);
            }
        }
        double mutual = values[0];
        double la = coilA.selfInductance() + values[1];
        double lb = coilB.selfInductance() + values[2];
        if (plates) {
            valid &= plateNotes(notes);
            if (!(la > 0 && lb > 0)) {
                throw new IllegalArgumentException("the plates' images leave a self-inductance ≤ 0 (a: " + la + " H, b: "
                        + lb + " H): metal shields closer than the model can describe");
            }
        }
        double k = mutual / Math.sqrt(la * lb);
        if (Math.abs(k) >= 1) {
            notes.add(String.format("|k| = %.4f ≥ 1: the coil model's self-inductances are inconsistent with the filament sum", Math.abs(k)));
            valid = false;
        }
        String model = (spectral != null ? SPECTRAL : MODEL) + (plates ? " with plate images" : "");
        String source = (spectral != null ? SPECTRAL_SOURCE : SOURCE) + (plates ? IMAGE_SOURCE : "");
        return new CouplingResult(gap, distance, dx, dy, mutual, k, la, lb, new Provenance(model, source, valid, notes));
    }

    /** Adds the image series' M and self terms into values; false when the series had to be cut. */
    private boolean imagesByPairSums(double distance, double dx, double dy, double zA, double zB, double tol,
                                     double[] values, List<String> notes) {
        ImageSeries.Sum mb = ImageSeries.sum(zA, etaA, zB, etaB, distance, values[0], radiusSum,
                (mirror, shift, w) -> w * (mirror ? abMirror : ab).mutual(dx, dy, shift, tol));
        double[] self = selfSeries.get(new SelfKey(distance, tol));
        if (self == null) {
            ImageSeries.Sum sa = ImageSeries.sum(zA, etaA, zB, etaB, 0, coilA.selfInductance(), radiusSum, true,
                    (mirror, shift, w) -> w * (mirror ? aaMirror : aa).mutual(0, 0, shift, tol));
            ImageSeries.Sum sb = ImageSeries.sum(zA, etaA, zB, etaB, distance, coilB.selfInductance(), radiusSum, true,
                    (mirror, shift, w) -> w * (mirror ? bbMirror : bb).mutual(0, 0, shift - distance, tol));
            self = new double[] {sa.value(), sb.value(), sa.truncated() || sb.truncated() ? 1 : 0};
            if (selfSeries.size() >= SELF_SERIES_KEPT) {
                selfSeries.clear();
            }
            selfSeries.put(new SelfKey(distance, tol), self);
        }
        values[0] += mb.value();
        values[1] += self[0];
        values[2] += self[1];
        if (mb.truncated() || self[2] != 0) {
            notes.add("image series between the two plates cut after " + ImageSeries.MAX_ORDER
                    + " orders with a tail estimate: plates very close for their size");
            return false;
        }
        return true;
    }

    /** The plates' notes; false when a thin tile makes the single-wavenumber coefficient doubtful. */
    private boolean plateNotes(List<String> notes) {
        boolean valid = true;
        boolean exact = spectral != null;
        if (coilA.plate() != null) {
            notes.addAll(coilA.plate().notes(coilA.name(), a.meanRadius(), exact));
            valid &= exact || !coilA.plate().thinTileDoubtful(a.meanRadius());
        }
        if (coilB.plate() != null) {
            notes.addAll(coilB.plate().notes(coilB.name(), b.meanRadius(), exact));
            valid &= exact || !coilB.plate().thinTileDoubtful(b.meanRadius());
        }
        notes.add("image method: plates taken as infinite planes; valid when each plate extends beyond its coil "
                + "by more than the plate-to-plate distance");
        return valid;
    }

    /**
     * Eddy loss of coil a's (or b's) metal shield at {@code frequency}, as a resistance in series with
     * that coil ({@link ShieldLoss}); empty when that coil has no metal plate.
     */
    public java.util.Optional<ShieldLoss.Result> shieldLoss(boolean ofCoilA, double frequency) {
        Coil c = ofCoilA ? coilA : coilB;
        if (c.plate() == null || c.plate().material() != BackingPlate.Material.METAL) {
            return java.util.Optional.empty();
        }
        double plane = ofCoilA ? aBottom - c.plate().spacing() : bTop + c.plate().spacing();
        return java.util.Optional.of(ShieldLoss.addedResistance(ofCoilA ? a : b, plane, c.plate(), frequency));
    }

    /**
     * Flux density at (x, y, z) in coil a's frame with b at the given placement, coil a carrying the rms
     * phasor current {@code ia} and coil b {@code ib}, including both plates' images.
     */
    public PhasorFlux field(double distance, double dx, double dy, Complex ia, Complex ib, double x, double y, double z) {
        double zA = aBottom - (coilA.plate() == null ? 0 : coilA.plate().spacing());
        double zB = distance + bTop + (coilB.plate() == null ? 0 : coilB.plate().spacing());
        if ((etaA != 0 && z < zA) || (etaB != 0 && z > zB)) {
            throw new IllegalArgumentException(String.format(
                    "field point z = %.6g m lies in or behind a plate (the field is modelled between %.6g m and %.6g m)", z, zA, zB));
        }
        double[] acc = new double[6]; // per-ampere field of coil a (0..2) and coil b (3..5)
        double[] tmp = new double[3];
        a.fluxDensity(x, y, z, tmp);
        System.arraycopy(tmp, 0, acc, 0, 3);
        b.fluxDensity(x - dx, y - dy, z - distance, tmp);
        System.arraycopy(tmp, 0, acc, 3, 3);
        if (etaA != 0 || etaB != 0) {
            double scale = Math.abs(acc[2]) + Math.abs(acc[5]) + 1e-300;
            // the series' scalar is a magnitude for its stopping test; the vectors accumulate in acc
            ImageSeries.sum(zA, etaA, zB, etaB, 0, scale, radiusSum, (mirror, shift, w) -> {
                a.transformed(mirror, 0, 0, shift, 1).fluxDensity(x, y, z, tmp);
                return addInto(acc, 0, tmp, w);
            });
            ImageSeries.sum(zA, etaA, zB, etaB, distance, scale, radiusSum, (mirror, shift, w) -> {
                b.transformed(mirror, dx, dy, shift, 1).fluxDensity(x, y, z, tmp);
                return addInto(acc, 3, tmp, w);
            });
        }
        PhasorFlux fa = new PhasorFlux(ia.multiply(acc[0]), ia.multiply(acc[1]), ia.multiply(acc[2]));
        PhasorFlux fb = new PhasorFlux(ib.multiply(acc[3]), ib.multiply(acc[4]), ib.multiply(acc[5]));
        return fa.plus(fb);
    }

    private static double addInto(double[] acc, int at, double[] v, double w) {
        acc[at] += w * v[0];
        acc[at + 1] += w * v[1];
        acc[at + 2] += w * v[2];
        return Math.abs(w) * (Math.abs(v[0]) + Math.abs(v[1]) + Math.abs(v[2]));
    }
}
