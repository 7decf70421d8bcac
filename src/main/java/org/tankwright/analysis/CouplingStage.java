package org.tankwright.analysis;

import org.tankwright.coupling.BackingPlate;
import org.tankwright.coupling.CoupledCoils;
import org.tankwright.coupling.CouplingRange;
import org.tankwright.coupling.CouplingResult;
import org.tankwright.coupling.CouplingSweep;
import org.tankwright.design.Backing;
import org.tankwright.design.Design;
import org.tankwright.design.Enums.BackingKind;
import org.tankwright.design.Envelope;
import org.tankwright.design.Placement;
import org.tankwright.magnetics.CoilGeometry;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;

/** Coupling of a link: M, k and the coils' in-place inductances, sweeps and the envelope's coupling range. */
final class CouplingStage {
    /** Default resistivity of a shield when none is given: aluminium, 2.82·10⁻⁸ Ω·m (MODELS.md §1). */
    static final double ALUMINIUM_RESISTIVITY = 2.82e-8;
    static final int SWEEP_POINTS = 31;
    /** Fewer sweep points for polygonal coils, whose coupling is a slower segment sum. */
    static final int SWEEP_POINTS_POLYGON = 13;
    /** Points per axis of the envelope grid. */
    static final int GRID_POINTS = 5;

    /**
     * The last few compiled links: a compiled link keeps its pair sums and the image series it has summed
     * (per distance), so an edit that leaves both coils and plates as they were reuses them.
     */
    private static final Memo<Pair, CoupledCoils> LINKS = new Memo<>(4);

    private CouplingStage() {
    }

    /** The two coils of a link as the coupling model sees them (records: equal coils compare equal). */
    private record Pair(CoupledCoils.Coil a, CoupledCoils.Coil b) {
    }

    /** The link's coupling, with the model when both coils have geometry, else from the entered values. */
    record Linked(CoupledCoils model, CouplingReport report, EnvelopeGrid grid) {
    }

    /**
     * The coupling solved on a grid over the envelope's distance × offset (offset along x), shared by the
     * coupling range, the operating envelope and the envelope map.
     */
    record EnvelopeGrid(double[] distances, double[] offsets, CouplingResult[][] results) {
        static EnvelopeGrid solve(CoupledCoils link, double dMin, double dMax, double offMax) {
            double[] ds = CouplingSweep.linspace(dMin, dMax, dMax > dMin ? GRID_POINTS : 1);
            double[] os = CouplingSweep.linspace(0, offMax, offMax > 0 ? GRID_POINTS : 1);
            CouplingResult[][] r = new CouplingResult[ds.length][os.length];
            java.util.stream.IntStream.range(0, ds.length * os.length).parallel()
                    .forEach(idx -> r[idx / os.length][idx % os.length] = link.at(ds[idx / os.length], os[idx % os.length], 0));
            return new EnvelopeGrid(ds, os, r);
        }
    }

    static Linked couple(Design d, CoilStage.Analysed a, CoilStage.Analysed b, boolean full) {
        Placement p = d.placement();
        List<String> notes = new ArrayList<>();
        double la = a.report().inductance();
        double lb = b.report().inductance();
        if (p.mutual() != null || p.k() != null || a.measured() || b.measured()) {
            double m;
            String source;
            if (p.mutual() != null) {
                m = p.mutual();
                source = "measured mutual inductance (entered)";
            } else if (p.k() != null) {
                m = p.k() * Math.sqrt(la * lb);
                source = "measured coupling coefficient (entered)";
            } else {
                throw new AnalysisException("$.placement: a measured coil has no geometry, so give the measured mutual_H or k", true);
            }
            double k = m / Math.sqrt(la * lb);
            notes.add("coupling entered, not modelled: no sweeps against distance or offset");
            return new Linked(null, new CouplingReport(m, k, la, lb, source, Math.abs(k), Math.abs(k), "nominal",
                    "nominal", Double.NaN, List.of(), notes), null);
        }
        CoupledCoils link = LINKS.get(new Pair(coil("primary", a, false), coil("secondary", b, true)),
                pair -> new CoupledCoils(pair.a(), pair.b()));
        double distance = p.distance();
        CouplingResult nominal = link.at(distance, p.offsetX(), p.offsetY());
        double l1 = nominal.inductanceA();
        double l2 = nominal.inductanceB();
        if (a.coil().inductance() != null) {
            l1 = la;
            notes.add("primary inductance entered as measured; the model's in-place value is "
                    + Quantities.format(nominal.inductanceA(), Dimension.INDUCTANCE, 4));
        }
        if (b.coil().inductance() != null) {
            l2 = lb;
            notes.add("secondary inductance entered as measured; the model's in-place value is "
                    + Quantities.format(nominal.inductanceB(), Dimension.INDUCTANCE, 4));
        }
        notes.addAll(nominal.provenance().notes());
        double kNominal = nominal.mutual() / Math.sqrt(l1 * l2);
        Envelope env = d.envelope();
        double kMin = Math.abs(kNominal);
        double kMax = Math.abs(kNominal);
        String kMinAt = "nominal placement";
        String kMaxAt = "nominal placement";
        List<Series> sweeps = new ArrayList<>();
        double nullOffset = Double.NaN;
        EnvelopeGrid grid = null;
        if (full) {
            double dMin = env != null && env.distanceMin() != null ? env.distanceMin() : distance;
            double dMax = env != null && env.distanceMax() != null ? env.distanceMax() : distance;
            double offMax = env != null && env.offsetMax() != null ? env.offsetMax() : 0.0;
            if (dMax > dMin || offMax > 0) {
                grid = EnvelopeGrid.solve(link, dMin, dMax, offMax);
                CouplingResult lo;
                CouplingResult hi;
                if (link.axisymmetric()) {
                    // Round coils: the grid and a search through the envelope's interior.
                    CouplingRange range = CouplingSweep.range(link, link.gapForDistance(dMin), link.gapForDistance(dMax), offMax);
                    lo = range.lowest();
                    hi = range.highest();
                } else {
                    lo = grid.results()[0][0];
                    hi = lo;
                    for (CouplingResult[] row : grid.results()) {
                        for (CouplingResult r : row) {
                            lo = Math.abs(r.k()) < Math.abs(lo.k()) ? r : lo;
                            hi = Math.abs(r.k()) > Math.abs(hi.k()) ? r : hi;
                        }
                    }
                    notes.add("coupling range of the polygonal coils from a " + GRID_POINTS + " × " + GRID_POINTS
                            + " grid over the envelope's distance and offset (along x)");
                }
                kMin = Math.min(Math.abs(lo.k()), Math.abs(hi.k()));
                kMax = Math.max(Math.abs(lo.k()), Math.abs(hi.k()));
                kMinAt = where(Math.abs(lo.k()) <= Math.abs(hi.k()) ? lo : hi);
                kMaxAt = where(Math.abs(lo.k()) <= Math.abs(hi.k()) ? hi : lo);
            }
            double sweepMin = Math.max(link.distanceForGap(0) * 1.0001, Math.min(dMin, distance) * 0.5);
            double sweepMax = Math.max(dMax, distance) * 2.0;
            int points = link.axisymmetric() ? SWEEP_POINTS : SWEEP_POINTS_POLYGON;
            double[] ds = CouplingSweep.linspace(sweepMin, sweepMax, points);
            double[] gaps = new double[ds.length];
            for (int i = 0; i < ds.length; i++) {
                gaps[i] = link.gapForDistance(ds[i]);
            }
            List<CouplingResult> overGap = CouplingSweep.overGap(link, gaps, p.offsetX(), p.offsetY());
            addSweeps(sweeps, "distance", "axial distance", overGap, true, distance);
            double offsetSpan = Math.max(offMax * 1.5, 1.2 * link.radiusSum());
            double[] offs = CouplingSweep.linspace(0, offsetSpan, points);
            List<CouplingResult> overOffset = CouplingSweep.overOffset(link, link.gapForDistance(distance), offs, 0.0);
            addSweeps(sweeps, "offset", "lateral offset", overOffset, false, Math.hypot(p.offsetX(), p.offsetY()));
            OptionalDouble nul = CouplingSweep.nullOffset(link, link.gapForDistance(distance), 0.0, offsetSpan);
            nullOffset = nul.orElse(Double.NaN);
        }
        return new Linked(link, new CouplingReport(nominal.mutual(), kNominal, l1, l2,
                nominal.provenance().model() + " (" + nominal.provenance().source() + ")", kMin, kMax, kMinAt,
                kMaxAt, nullOffset, List.copyOf(sweeps), List.copyOf(notes)), grid);
    }

    private static String where(CouplingResult r) {
        return "distance " + Quantities.format(r.distance(), Dimension.LENGTH, 3) + ", offset "
                + Quantities.format(r.offset(), Dimension.LENGTH, 3);
    }

    private static void addSweeps(List<Series> out, String axis, String label, List<CouplingResult> rs,
                                  boolean byDistance, double marker) {
        int n = rs.size();
        double[] x = new double[n];
        double[] k = new double[n];
        double[] m = new double[n];
        double[] la = new double[n];
        double[] lb = new double[n];
        for (int i = 0; i < n; i++) {
            CouplingResult r = rs.get(i);
            x[i] = byDistance ? r.distance() : r.offset();
            k[i] = r.k();
            m[i] = r.mutual();
            la[i] = r.inductanceA();
            lb[i] = r.inductanceB();
        }
        out.add(new Series("k-vs-" + axis, "Coupling coefficient against " + label, label, Dimension.LENGTH,
                "k", Dimension.DIMENSIONLESS, x, k, marker));
        out.add(new Series("mutual-vs-" + axis, "Mutual inductance against " + label, label, Dimension.LENGTH,
                "M", Dimension.INDUCTANCE, x, m, marker));
        out.add(new Series("l1-vs-" + axis, "Primary inductance in place against " + label, label,
                Dimension.LENGTH, "L1", Dimension.INDUCTANCE, x, la, marker));
        out.add(new Series("l2-vs-" + axis, "Secondary inductance in place against " + label, label,
                Dimension.LENGTH, "L2", Dimension.INDUCTANCE, x, lb, marker));
    }

    /** The coupling model's view of an analysed coil; the secondary faces the primary, its plate above it. */
    static CoupledCoils.Coil coil(String name, CoilStage.Analysed a, boolean secondary) {
        CoilGeometry g = a.geometry();
        double freeL = a.result().inductance();
        return new CoupledCoils.Coil(name, g.filaments(), freeL, plate(a.coil().backing()), -g.zMin(), g.zMax());
    }

    static BackingPlate plate(Backing b) {
        if (b == null) {
            return null;
        }
        BackingPlate p = b.kind() == BackingKind.FERRITE
                ? BackingPlate.ferrite(b.muR(), b.thickness(), b.distance())
                : BackingPlate.metal(b.resistivity() == null ? ALUMINIUM_RESISTIVITY : b.resistivity(), b.thickness(), b.distance());
        return b.imageCoefficient() == null ? p : p.withMeasuredCoefficient(b.imageCoefficient());
    }
}
