package org.tankwright.magnetics;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.tankwright.materials.Conductor;
import org.tankwright.units.Constants;

/**
 * The model of one coil. {@link #of(CoilGeometry)} does the frequency-independent work once
 * (inductance models, the field each turn sees from the others, self-capacitance); then
 * {@link #analyse(OperatingPoint)}, {@link #resistanceAc(double, double)} and the other queries are cheap,
 * so sweeps and keystroke recomputes reuse one model.
 */
public final class CoilModel {
    /** Current density above which a caution is shown, A/m² (common practice for air-cooled windings). */
    private static final double HOT_CURRENT_DENSITY = 6e6;
    /** Largest number of rings the capacitance solve uses; larger windings are grouped. */
    private static final int MAX_CAPACITANCE_RINGS = 300;

    private final CoilGeometry geometry;
    private final List<InductanceEstimate> models;
    private final InductanceEstimate chosen;
    private final double spread;
    private final double fieldSum;
    private final double selfCapacitance;
    private final double wireLength;
    /** Thin-skin surface-current solution, solved on first use (null inside when the model does not apply). */
    private SurfaceCurrentResistance.Solution thinSkin;
    private boolean thinSkinSolved;

    private CoilModel(CoilGeometry geometry) {
        this.geometry = geometry;
        List<Filament> filaments = geometry.filaments();
        this.models = List.copyOf(InductanceModels.all(geometry, filaments));
        InductanceEstimate best = null;
        for (InductanceEstimate e : models) {
            if (e.valid()) {
                best = e;
                break;
            }
        }
        this.chosen = best != null ? best : models.get(0);
        double lo = Double.MAX_VALUE;
        double hi = -Double.MAX_VALUE;
        for (InductanceEstimate e : models) {
            if (e.valid()) {
                lo = Math.min(lo, e.inductance());
                hi = Math.max(hi, e.inductance());
            }
        }
        this.spread = hi >= lo ? (hi - lo) / chosen.inductance() : 0.0;
        this.fieldSum = geometry instanceof MultilayerSolenoid m ? CoilFields.multilayer(m)
                : CoilFields.weightedFieldSquared(filaments, geometry.conductor(),
                        geometry instanceof PolygonSpiral p ? p.sides() : 1);
        this.wireLength = geometry.wireLength();
        this.selfCapacitance = capacitance(geometry, filaments);
    }

    /**
     * Builds the model of a valid coil.
     *
     * @throws IllegalArgumentException naming every problem when the geometry is not valid
     */
    public static CoilModel of(CoilGeometry geometry) {
        List<String> p = geometry.problems();
        if (!p.isEmpty()) {
            throw new IllegalArgumentException(String.join("; ", p));
        }
        return new CoilModel(geometry);
    }

    /** Convenience: builds the model and analyses one operating point. */
    public static CoilResult analyse(CoilGeometry geometry, OperatingPoint op) {
        return of(geometry).analyse(op);
    }

    /** The geometry. */
    public CoilGeometry geometry() {
        return geometry;
    }

    /** Every applicable inductance model, most accurate first. */
    public List<InductanceEstimate> models() {
        return models;
    }

    /** The most accurate valid model. */
    public InductanceEstimate chosen() {
        return chosen;
    }

    /** Chosen low-frequency inductance, H. */
    public double inductance() {
        return chosen.inductance();
    }

    /** Self-capacitance estimate, F. */
    public double selfCapacitance() {
        return selfCapacitance;
    }

    /** Self-resonant frequency estimate 1/(2π√(L C_self)), Hz. */
    public double selfResonance() {
        return 1 / (2 * Math.PI * Math.sqrt(inductance() * selfCapacitance));
    }

    /** DC resistance at the winding temperature, Ω. */
    public double resistanceDc(double temperature) {
        return geometry.conductor().resistancePerMetre(temperature) * wireLength;
    }

    /** Skin-effect part of the AC resistance, Ω. */
    public double resistanceSkin(double frequency, double temperature) {
        Conductor c = geometry.conductor();
        double delta = WireLoss.skinDepth(c.material().resistivity(temperature), frequency);
        return resistanceDc(temperature) * WireLoss.skinRatio(c, delta);
    }

    /** Proximity part of the AC resistance (field from the other turns, and a litz bundle's own field), Ω. */
    public double resistanceProximity(double frequency, double temperature) {
        Conductor c = geometry.conductor();
        double rho = c.material().resistivity(temperature);
        double delta = WireLoss.skinDepth(rho, frequency);
        double h2 = fieldSum + WireLoss.internalFieldSquared(c) * wireLength;
        return WireLoss.proximityCoefficient(c, rho, delta) * h2;
    }

    /** AC resistance of our skin + proximity model (the filament-proximity model), Ω. */
    public double resistanceFilamentProximity(double frequency, double temperature) {
        return resistanceSkin(frequency, temperature) + resistanceProximity(frequency, temperature);
    }

    /**
     * The chosen AC resistance, Ω: the thin-skin surface-current model where it is valid (round wire or tube,
     * round axisymmetric coil, wire radius and the gap between turns each several skin depths), else skin +
     * proximity ({@link #resistanceFilamentProximity}).
     */
    public double resistanceAc(double frequency, double temperature) {
        if (SurfaceCurrentResistance.treats(geometry)) {
            Conductor c = geometry.conductor();
            double rho = c.material().resistivity(temperature);
            double delta = WireLoss.skinDepth(rho, frequency);
            SurfaceCurrentResistance.Solution s = thinSkin();
            if (SurfaceCurrentResistance.valid(c, s, delta)) {
                return SurfaceCurrentResistance.resistance(s, SurfaceCurrentResistance.radius(c), rho, delta);
            }
        }
        return resistanceFilamentProximity(frequency, temperature);
    }

    /** The thin-skin surface-current solution of this coil, or null when the model does not apply. */
    public synchronized SurfaceCurrentResistance.Solution thinSkin() {
        if (!thinSkinSolved) {
            thinSkin = SurfaceCurrentResistance.of(geometry);
            thinSkinSolved = true;
        }
        return thinSkin;
    }

    /** The surface-current model's estimate with its verdict, or null when it does not treat this coil. */
    private ResistanceEstimate surfaceCurrent(double frequency, double temperature) {
        if (!SurfaceCurrentResistance.treats(geometry)) {
            return null;
        }
        double rho = geometry.conductor().material().resistivity(temperature);
        return SurfaceCurrentResistance.estimate(geometry, thinSkin(), rho, WireLoss.skinDepth(rho, frequency));
    }

    /**
     * Inductance at a frequency: the chosen low-frequency value less the internal inductance a solid round
     * wire loses to skin effect, (µ0 ℓ/8π)(1 − 8 X(x)/x²), X the wire's internal reactance ratio. Other
     * conductors keep the low-frequency value.
     */
    public double inductanceAt(double frequency, double temperature) {
        if (geometry.conductor() instanceof Conductor.RoundWire w) {
            double delta = WireLoss.skinDepth(w.material().resistivity(temperature), frequency);
            double x = Math.sqrt(2) * 0.5 * w.diameter() / delta;
            double keep = x < 1e-4 ? 1.0 : 8 * org.tankwright.numerics.Kelvin.skinReactanceRatio(x) / (x * x);
            return inductance() - Constants.MU0 * wireLength / (8 * Math.PI) * (1 - keep);
        }
        return inductance();
    }

    /** Apparent inductance L_f/(1 − (f/f_SR)²) an LCR meter reads; negative above self-resonance. */
    public double apparentInductance(double frequency, double temperature) {
        double r = frequency / selfResonance();
        double den = 1 - r * r;
        if (Math.abs(den) < 1e-9) {
            den = Math.copySign(1e-9, den);
        }
        return inductanceAt(frequency, temperature) / den;
    }

    /** Q = ω L_f / R_ac. */
    public double q(double frequency, double temperature) {
        return 2 * Math.PI * frequency * inductanceAt(frequency, temperature) / resistanceAc(frequency, temperature);
    }

    /**
     * The full result at one operating point.
     *
     * @throws IllegalArgumentException naming the bad field when the operating point is not valid
     */
    public CoilResult analyse(OperatingPoint op) {
        List<String> p = op.problems();
        if (!p.isEmpty()) {
            throw new IllegalArgumentException(String.join("; ", p));
        }
        double f = op.frequency();
        double t = op.temperature();
        Conductor c = geometry.conductor();
        double rho = c.material().resistivity(t);
        double delta = WireLoss.skinDepth(rho, f);
        double rdc = resistanceDc(t);
        double rs = resistanceSkin(f, t);
        double rac = resistanceAc(f, t);
        double rsShown = rs;
        if (rac != resistanceFilamentProximity(f, t)) { // the surface-current model is chosen: its own split
            rsShown = SurfaceCurrentResistance.skinPart(thinSkin(), SurfaceCurrentResistance.radius(c), rho, delta);
        }
        double rp = rac - rsShown;
        double lf = inductanceAt(f, t);
        double srf = selfResonance();
        double area = c.metalArea();
        List<ResistanceEstimate> resistanceModels = resistanceModels(f, t);
        List<String> warnings = warnings(f, srf, delta, op.current() / (area * rdc / rs), resistanceModels);
        String rText = resistanceModels.get(0).name().equals(SurfaceCurrentResistance.NAME)
                ? SurfaceCurrentResistance.SOURCE : resistanceModelText(c);
        return new CoilResult(geometry.kind(), inductance(), chosen.name(), models, spread, lf,
                apparentInductance(f, t), rdc, rac, rsShown, rp, rText, resistanceModels, delta,
                2 * Math.PI * f * lf / rac, selfCapacitance, srf, SelfCapacitance.DESCRIPTION, srf / f,
                wireLength, c.massPerMetre() * wireLength, op.current() / area,
                op.current() / (area * rdc / rs), f, t, op.current(), qCurve(f, t, srf), warnings);
    }

    /**
     * Every AC-resistance model that applies at a frequency, the chosen one first: the thin-skin surface-current
     * model ({@value SurfaceCurrentResistance#NAME}) where it is valid, else ours skin + proximity
     * ({@value #OURS}); then the others, with their own validity verdicts (Medhurst's measured table for a
     * single-layer solenoid of round wire or tube is a cross-check).
     */
    public List<ResistanceEstimate> resistanceModels(double frequency, double temperature) {
        double rs = resistanceSkin(frequency, temperature);
        ResistanceEstimate surface = surfaceCurrent(frequency, temperature);
        boolean surfaceChosen = surface != null && surface.valid();
        ResistanceEstimate filament = new ResistanceEstimate(OURS, rs + resistanceProximity(frequency, temperature),
                resistanceModelText(geometry.conductor()), true, surfaceChosen
                        ? "field at each wire's centre: good for spaced turns, low for close ones (docs/models.md); "
                                + "the surface-current model is chosen here"
                        : "the chosen value" + (surface == null ? ""
                                : Double.isFinite(surface.resistanceAc()) ? " (the surface-current model is outside its "
                                        + "validity here)" : " (surface-current model " + surface.note() + ")")
                                + "; for single-layer solenoids at thin skin depth it is within a few "
                                + "per cent of Medhurst's measurements for spaced turns (pitch ≥ 2.5 wire diameters), "
                                + "less good for close turns (docs/models.md)");
        List<ResistanceEstimate> out = new ArrayList<>(3);
        if (surfaceChosen) {
            out.add(surface);
            out.add(filament);
        } else {
            out.add(filament);
            if (surface != null && Double.isFinite(surface.resistanceAc())) {
                out.add(surface);
            }
        }
        if (geometry instanceof SingleLayerSolenoid s) {
            double rho = geometry.conductor().material().resistivity(temperature);
            double delta = WireLoss.skinDepth(rho, frequency);
            // Medhurst's straight wire: a tube is taken as the solid conductor of its outer diameter
            double straight = rs;
            if (geometry.conductor() instanceof Conductor.Tube t) {
                double a = 0.5 * t.outerDiameter();
                straight = rho * wireLength / (Math.PI * a * a)
                        * org.tankwright.numerics.Kelvin.skinResistanceRatio(Math.sqrt(2) * a / delta);
            }
            ResistanceEstimate m = MedhurstResistance.estimate(s, straight, delta);
            if (m != null) {
                out.add(m);
            }
        }
        return List.copyOf(out);
    }

    /** Name of our skin + proximity resistance model in results. */
    public static final String OURS = "filament-proximity";
    /** Relative difference between the chosen resistance and a valid cross-check above which a caution is shown. */
    private static final double RESISTANCE_DISAGREEMENT = 0.2;

    /** Q curve on 41 log-spaced points from f/10 to 10 f, stopping below 0.9 f_SR. */
    public List<CoilResult.QPoint> qCurve(double frequency, double temperature, double srf) {
        double lo = frequency / 10;
        double hi = Math.min(10 * frequency, 0.9 * srf);
        if (hi <= lo) {
            return List.of();
        }
        int n = 41;
        CoilResult.QPoint[] points = new CoilResult.QPoint[n];
        for (int i = 0; i < n; i++) {
            double f = lo * Math.pow(hi / lo, i / (double) (n - 1));
            double rac = resistanceAc(f, temperature);
            double lf = inductanceAt(f, temperature);
            double r = f / srf;
            points[i] = new CoilResult.QPoint(f, rac, 2 * Math.PI * f * lf / rac, lf / (1 - r * r));
        }
        return List.of(points);
    }

    private List<String> warnings(double f, double srf, double delta, double currentDensityAc,
            List<ResistanceEstimate> resistanceModels) {
        List<String> w = new ArrayList<>();
        ResistanceEstimate chosenR = resistanceModels.get(0);
        double ours = chosenR.resistanceAc();
        boolean surfaceChosen = chosenR.name().equals(SurfaceCurrentResistance.NAME);
        for (ResistanceEstimate e : resistanceModels.subList(1, resistanceModels.size())) {
            double gap = e.resistanceAc() / ours - 1;
            if (e.valid() && Math.abs(gap) > RESISTANCE_DISAGREEMENT) {
                w.add(String.format(Locale.ROOT, "AC resistance: %s gives %.3g Ω, %+.0f %% from the chosen %s (%.3g Ω); %s",
                        e.name(), e.resistanceAc(), 100 * gap, chosenR.name(), ours, surfaceChosen
                                ? "the chosen thin-skin surface-current model solves the current on each turn's surface; "
                                        + "Medhurst's table was measured on coils of 30-50 turns and the centre-field "
                                        + "proximity model neglects the field's variation across close turns (docs/models.md)"
                                : "the proximity model takes the field at each wire's centre and neglects its variation "
                                        + "across close turns (pitch under about 2.5 wire diameters), where Medhurst's "
                                        + "measurements are the better guide"));
            }
        }
        if (currentDensityAc > HOT_CURRENT_DENSITY) {
            w.add(String.format(Locale.ROOT, "rms current density %.3g A/mm² (skin-weighted) exceeds %.0f A/mm², a common-"
                    + "practice limit for air-cooled windings (PCB traces and water-cooled tube follow their own rules): "
                    + "check the temperature rise; hot conductors burn and insulation fails, defer to local codes and "
                    + "licensed practice", currentDensityAc * 1e-6, HOT_CURRENT_DENSITY * 1e-6));
        }
        if (f >= srf) {
            w.add(String.format(Locale.ROOT, "operating frequency is at or above the estimated self-resonance "
                    + "(%.3g Hz): the coil behaves as a capacitor; redesign (fewer turns, more spacing)", srf));
        } else if (f > srf / 3) {
            w.add(String.format(Locale.ROOT, "operating frequency is within a factor 3 of the estimated "
                    + "self-resonance (%.3g Hz, margin %.2f); common practice is to stay well below it", srf, srf / f));
        }
        Conductor c = geometry.conductor();
        if (c instanceof Conductor.Litz l && l.strandDiameter() > 2 * delta) {
            w.add("litz strands are thicker than two skin depths: the strand-level model loses accuracy and "
                    + "litz gives little benefit; use finer strands");
        }
        if (c instanceof Conductor.Tube t && t.wall() < 2 * delta) {
            w.add("tube wall is thinner than two skin depths: the tube's proximity estimate (solid-bar factor) "
                    + "is rough");
        }
        if (c instanceof Conductor.Trace) {
            w.add("trace AC resistance is an approximation (skin depth on both faces; proximity from the field "
                    + "normal to the board)");
        }
        if (!chosen.valid()) {
            w.add("no inductance model is inside its stated validity range; the value shown is the best available");
        }
        return List.copyOf(w);
    }

    private static String resistanceModelText(Conductor c) {
        String prox = "proximity: field from the other turns (filament model) times the round-wire proximity "
                + "factor (Ferreira, IEEE TPEL 9(1), 1994)";
        if (c instanceof Conductor.RoundWire) {
            return "skin: exact Bessel (Kelvin functions); " + prox;
        }
        if (c instanceof Conductor.Litz) {
            return "litz strand model (Bartoli et al., PESC 1996): strand skin (exact Bessel) + strand proximity in "
                    + "the bundle's own field and the other turns' field; ideal twisting assumed";
        }
        if (c instanceof Conductor.Tube) {
            return "tube: thin-wall skin (current on the outer face); " + prox + " with the tube as a solid bar";
        }
        return "trace: skin depth on both faces (approximation); proximity from the field normal to the board "
                + "with the round-conductor factor of equal low-frequency eddy loss";
    }

    private static double capacitance(CoilGeometry g, List<Filament> filaments) {
        int n = g.turns();
        double[] radius = new double[n];
        double[] z = new double[n];
        double[] length = new double[n];
        if (filaments.get(0) instanceof Ring) {
            int[] order = windingOrder(g);
            for (int i = 0; i < n; i++) {
                Ring r = (Ring) filaments.get(order[i]);
                radius[i] = r.radius();
                z[i] = r.z();
                length[i] = 2 * Math.PI * r.radius();
            }
        } else {
            int perTurn = filaments.size() / n;
            for (int i = 0; i < n; i++) {
                double perimeter = 0;
                for (int k = 0; k < perTurn; k++) {
                    perimeter += ((Segment) filaments.get(i * perTurn + k)).length();
                }
                radius[i] = perimeter / (2 * Math.PI);
                length[i] = perimeter;
            }
        }
        double total = 0;
        for (double l : length) {
            total += l;
        }
        double[] potential = new double[n];
        double run = 0;
        for (int i = 0; i < n; i++) {
            potential[i] = (run + 0.5 * length[i]) / total;
            run += length[i];
        }
        double chargeRadius = SelfCapacitance.chargeRadius(g.conductor());
        if (n > MAX_CAPACITANCE_RINGS) {
            return grouped(radius, z, potential, chargeRadius);
        }
        return SelfCapacitance.compute(radius, z, potential, chargeRadius);
    }

    /** Coarse-grains a long winding into groups of consecutive turns (each group a ring at its centre). */
    private static double grouped(double[] radius, double[] z, double[] potential, double chargeRadius) {
        int n = radius.length;
        int g = (n + MAX_CAPACITANCE_RINGS - 1) / MAX_CAPACITANCE_RINGS;
        int m = (n + g - 1) / g;
        double[] r = new double[m];
        double[] zz = new double[m];
        double[] v = new double[m];
        double spread = 0;
        for (int k = 0; k < m; k++) {
            int from = k * g;
            int to = Math.min(n, from + g);
            for (int i = from; i < to; i++) {
                r[k] += radius[i] / (to - from);
                zz[k] += z[i] / (to - from);
                v[k] += potential[i] / (to - from);
            }
            spread = Math.max(spread, Math.hypot(radius[to - 1] - radius[from], z[to - 1] - z[from]));
        }
        return SelfCapacitance.compute(r, zz, v, Math.max(chargeRadius, 0.25 * spread));
    }

    /** Index of each turn's filament in winding order (multilayer layers wound back and forth). */
    private static int[] windingOrder(CoilGeometry g) {
        int n = g.turns();
        int[] order = new int[n];
        if (g instanceof MultilayerSolenoid m) {
            int idx = 0;
            int start = 0;
            for (int j = 0; j < m.layers(); j++) {
                int count = m.turnsInLayer(j);
                for (int i = 0; i < count; i++) {
                    order[idx++] = start + (j % 2 == 0 ? i : count - 1 - i);
                }
                start += count;
            }
        } else {
            for (int i = 0; i < n; i++) {
                order[i] = i;
            }
        }
        return order;
    }
}
