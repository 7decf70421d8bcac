package org.tankwright.analysis;

import org.tankwright.design.Coil;
import org.tankwright.design.Enums.CoilShape;
import org.tankwright.design.Enums.WireKind;
import org.tankwright.design.Token;
import org.tankwright.design.Wire;
import org.tankwright.magnetics.CoilGeometry;
import org.tankwright.magnetics.CoilModel;
import org.tankwright.magnetics.CoilResult;
import org.tankwright.magnetics.FlatSpiral;
import org.tankwright.magnetics.InductanceEstimate;
import org.tankwright.magnetics.ResistanceEstimate;
import org.tankwright.magnetics.MultilayerSolenoid;
import org.tankwright.magnetics.OperatingPoint;
import org.tankwright.magnetics.PolygonSpiral;
import org.tankwright.magnetics.RectangularSpiral;
import org.tankwright.magnetics.SingleLayerSolenoid;
import org.tankwright.magnetics.SingleLoop;
import org.tankwright.materials.Conductor;
import org.tankwright.materials.ConductorMaterial;

import java.util.ArrayList;
import java.util.List;

/** Turns a design's coil into a geometry, runs the coil model and reports it. */
final class CoilStage {
    /** Packing of round strands in a litz bundle when its outer diameter is not given (common practice). */
    static final double LITZ_FILL = 0.6;

    /** The coil models' last results: an edit elsewhere in the design leaves a coil's model as it was. */
    private static final Memo<Modelled, CoilResult> MODELS = new Memo<>(8);

    private CoilStage() {
    }

    /** The inputs of one coil-model run (records, so equal inputs compare equal). */
    private record Modelled(CoilGeometry geometry, OperatingPoint point) {
    }

    /** One analysed coil: the geometry (null when measured), the model's result (null when measured) and its report. */
    record Analysed(Coil coil, CoilGeometry geometry, CoilResult result, CoilReport report) {
        boolean measured() {
            return geometry == null;
        }
    }

    static Analysed analyse(String role, Coil c, double frequency, String path) {
        if (c.shape() == CoilShape.MEASURED) {
            return new Analysed(c, null, null, measuredReport(role, c, frequency));
        }
        CoilGeometry g = geometry(c, path);
        List<String> problems = g.problems();
        if (!problems.isEmpty()) {
            throw new AnalysisException(path + ": the " + role + " coil does not fit together: "
                    + String.join("; ", problems), true);
        }
        CoilResult r = MODELS.get(new Modelled(g, new OperatingPoint(frequency, c.temperature(), 0.0)),
                m -> CoilModel.analyse(m.geometry(), m.point()));
        return new Analysed(c, g, r, report(role, c, g, r, frequency));
    }

    static CoilGeometry geometry(Coil c, String path) {
        Conductor w = conductor(c.wire(), path + ".wire");
        int n = c.turns() == null ? 1 : (int) Math.round(c.turns());
        return switch (c.shape()) {
            case SOLENOID -> c.pitch() != null ? new SingleLayerSolenoid(c.diameter(), n, c.pitch(), w)
                    : SingleLayerSolenoid.ofLength(c.diameter(), n, c.length(), w);
            case MULTILAYER -> c.pitch() != null ? new MultilayerSolenoid(c.diameter(), n, c.layers(), c.pitch(), w)
                    : MultilayerSolenoid.closeWound(c.diameter(), n, c.layers(), w);
            case SPIRAL -> new FlatSpiral(c.diameter(), c.innerDiameter(), n, w);
            case SQUARE_SPIRAL -> new PolygonSpiral(4, c.diameter(), c.innerDiameter(), n, w);
            case HEX_SPIRAL -> new PolygonSpiral(6, c.diameter(), c.innerDiameter(), n, w);
            case OCTAGON_SPIRAL -> new PolygonSpiral(8, c.diameter(), c.innerDiameter(), n, w);
            case RECT_SPIRAL -> new RectangularSpiral(c.width(), c.height(), c.innerWidth(), c.innerHeight(), n, w);
            case LOOP -> new SingleLoop(c.diameter(), w);
            case MEASURED -> throw new IllegalStateException("a measured coil has no geometry");
        };
    }

    static Conductor conductor(Wire w, String path) {
        ConductorMaterial m = switch (w.material() == null ? org.tankwright.design.Enums.ConductorMaterial.COPPER : w.material()) {
            case COPPER -> ConductorMaterial.COPPER;
            case ALUMINIUM -> ConductorMaterial.ALUMINIUM;
        };
        WireKind k = w.kind() == null ? WireKind.ROUND : w.kind();
        return switch (k) {
            case ROUND -> {
                if (w.diameter() == null) {
                    yield Conductor.RoundWire.awg(w.awg(), w.outerDiameter() == null ? Double.NaN : w.outerDiameter(), m);
                }
                yield new Conductor.RoundWire(w.diameter(), w.outerDiameter() == null ? w.diameter() : w.outerDiameter(), m);
            }
            case LITZ -> {
                double bundle = w.outerDiameter() != null ? w.outerDiameter()
                        : w.strandDiameter() * Math.sqrt(w.strands() / LITZ_FILL);
                yield new Conductor.Litz(w.strands(), w.strandDiameter(), bundle, m);
            }
            case TUBE -> new Conductor.Tube(w.diameter(), w.wall(), m);
            case TRACE -> new Conductor.Trace(w.width(), w.thickness(), m);
        };
    }

    private static CoilReport report(String role, Coil c, CoilGeometry g, CoilResult r, double f) {
        List<ModelValue> models = new ArrayList<>();
        for (InductanceEstimate e : r.models()) {
            models.add(new ModelValue(e.name(), e.inductance(), e.source(), e.valid(), e.note()));
        }
        List<String> notes = new ArrayList<>(r.warnings());
        double l = r.inductance();
        String lSource = r.chosenModel();
        if (c.inductance() != null) {
            l = c.inductance();
            lSource = "measured (entered; overrides the models)";
            notes.add("inductance entered as measured: " + fmtH(c.inductance()) + " instead of the model's " + fmtH(r.inductance()));
        }
        double rac = r.resistanceAc();
        String rModel = r.resistanceModel();
        if (c.resistance() != null) {
            rac = c.resistance();
            rModel = "measured (entered; overrides the model's " + fmtOhm(r.resistanceAc()) + ")";
        }
        Conductor w = g.conductor();
        double strand = w instanceof Conductor.Litz litz ? litz.strandDiameter() : Double.NaN;
        double pitch = pitchOf(g);
        double srf = r.selfResonance();
        double apparent = Double.isFinite(srf) && srf > f ? l / (1 - (f / srf) * (f / srf)) : Double.NaN;
        List<ResistanceValue> rModels = new ArrayList<>();
        for (ResistanceEstimate e : r.resistanceModels()) {
            rModels.add(new ResistanceValue(e.name(), e.resistanceAc(), e.source(), e.valid(), e.note()));
        }
        return new CoilReport(role, label(role, c), Token.of(c.shape()), g.turns(), l, lSource, models,
                r.modelSpread(), r.resistanceDc(), rac, rModel, List.copyOf(rModels), 2 * Math.PI * f * l / rac, r.selfCapacitance(), srf,
                apparent, r.wireLength(), r.conductorMass(), w.metalArea(), r.skinDepth(), strand, pitch,
                List.copyOf(notes));
    }

    private static double pitchOf(CoilGeometry g) {
        if (g instanceof SingleLayerSolenoid s) {
            return s.pitch();
        }
        if (g instanceof FlatSpiral s) {
            return s.pitch();
        }
        if (g instanceof PolygonSpiral s) {
            return s.pitch();
        }
        if (g instanceof MultilayerSolenoid s) {
            return s.pitch();
        }
        return Double.NaN;
    }

    private static CoilReport measuredReport(String role, Coil c, double f) {
        double l = c.inductance();
        double r = c.resistance();
        return new CoilReport(role, label(role, c), Token.of(CoilShape.MEASURED), Double.NaN, l,
                "measured (entered)", List.of(new ModelValue("measured", l, "entered by the user", true,
                "a measured coil: no geometry model")), 0.0, Double.NaN, r, "measured (entered)", List.of(),
                2 * Math.PI * f * l / r, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                Double.NaN, Double.NaN, Double.NaN,
                List.of("a measured coil: its self-resonance, conductor and field are unknown to the tool"));
    }

    private static String label(String role, Coil c) {
        return c.label() == null || c.label().isBlank() ? role : c.label();
    }

    private static String fmtH(double v) {
        return org.tankwright.units.Quantities.format(v, org.tankwright.units.Dimension.INDUCTANCE, 4);
    }

    private static String fmtOhm(double v) {
        return org.tankwright.units.Quantities.format(v, org.tankwright.units.Dimension.RESISTANCE, 4);
    }
}
