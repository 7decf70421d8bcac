package org.tankwright.analysis;

import org.tankwright.circuit.LinkValues;
import org.tankwright.design.Design;
import org.tankwright.design.Workpiece;
import org.tankwright.heating.BarGeometry;
import org.tankwright.heating.CoilLoad;
import org.tankwright.heating.FlatWorkCoil;
import org.tankwright.heating.PlateGeometry;
import org.tankwright.heating.PlateLoad;
import org.tankwright.heating.LoadedPlateCoil;
import org.tankwright.heating.CoolantFlow;
import org.tankwright.heating.FrequencyAdvice;
import org.tankwright.heating.HeatingTime;
import org.tankwright.heating.LossAllowance;
import org.tankwright.heating.WorkCoil;
import org.tankwright.heating.WorkpieceLoad;
import org.tankwright.heating.WorkpieceMedium;
import org.tankwright.magnetics.CoilGeometry;
import org.tankwright.magnetics.SingleLayerSolenoid;
import org.tankwright.materials.WorkpieceMaterial;
import org.tankwright.materials.WorkpieceMaterials;
import org.tankwright.tuning.LinkDesign;
import org.tankwright.tuning.TuningResult;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.HashMap;
import java.util.function.BiFunction;
import java.util.function.DoubleUnaryOperator;

/**
 * An induction heater: the work coil loaded by its workpiece (a bar inside a solenoid, or a plate
 * below a flat spiral or loop), tuned as a single tank at the cold
 * point, then the hot point with the same capacitor and a driver that follows the tank's
 * resonance. The coil current and the workpiece's µr(H) are iterated together.
 */
final class HeaterStage {
    static final int ITERATIONS = 6;
    static final double CURRENT_TOLERANCE = 0.005;

    /** Plate-model tables (the coil's rings over the plate), kept for the last few coils and plates. */
    private static final Memo<PlateKey, PlateLoad> PLATE_TABLES = new Memo<>(4);

    /** What a plate-model table depends on: the coil's geometry (its rings follow from it) and the plate. */
    private record PlateKey(CoilGeometry geometry, PlateGeometry plate) {
    }

    private HeaterStage() {
    }

    /** The heater's result: the tuned cold network (the operating point) and the report of both points. */
    record Heated(TuningResult cold, TuningResult hot, HeaterReport report) {
    }

    /** A real capacitor bank put in place of the tuned capacitor: its capacitance, ESR and ESL. */
    record Bank(double capacitance, double esr, double esl) {
    }

    static Heated solve(Design d, CoilStage.Analysed coil) {
        return solve(d, coil, null, null);
    }

    /**
     * Solves the heater; with a {@code bank}, its real C, ESR and ESL replace the tuned capacitor.
     * With a {@code previous} solution of the same heater (before the bank), its coil currents, hot
     * frequency and µr start the iterations: they converge to the same tolerance in fewer steps.
     */
    static Heated solve(Design d, CoilStage.Analysed coil, Bank bank, Heated previous) {
        Workpiece w = d.workpiece();
        WorkpieceMaterial material;
        try {
            material = WorkpieceMaterials.builtIn().require(w.material());
        } catch (IllegalArgumentException e) {
            throw new AnalysisException("$.workpiece.material: " + e.getMessage(), true);
        }
        double f = d.frequency();
        Map<Double, Double> muHints = new HashMap<>();
        if (previous != null) {
            muHints.put(w.temperatureCold(), previous.report().cold().muR());
            muHints.put(w.temperatureHot(), previous.report().hot().muR());
        }
        Work work = w.isPlate() ? plate(d, coil, w, muHints) : bar(coil, w);
        Double fixedC = bank != null ? Double.valueOf(bank.capacitance()) : d.compensation().c1();
        double esr = bank == null ? 0 : bank.esr();
        double esl = bank == null ? 0 : bank.esl();

        // Cold: the capacitor is tuned (unless fixed) for the loaded coil at the design frequency.
        WorkpieceMedium coldMedium = new WorkpieceMedium.OfMaterial(material, w.temperatureCold());
        double current = previous != null ? previous.report().cold().coilCurrent() : 10.0;
        CoilLoad coldLoad = null;
        TuningResult cold = null;
        for (int i = 0; i < ITERATIONS; i++) {
            coldLoad = work.load(coldMedium, f, current);
            cold = NetworkStage.tuneTankQuickly(NetworkStage.linkDesign(d, f,
                    LinkValues.tank(coldLoad.loadedInductance(), coldLoad.totalResistance()), fixedC == null ? 0 : fixedC, 0)
                    .withCapacitorLosses(esr, esl, 0, 0));
            double next = coilCurrent(cold);
            boolean done = Math.abs(next - current) <= CURRENT_TOLERANCE * next;
            current = next;
            if (done) {
                break;
            }
        }
        cold = NetworkStage.tune(cold.design()); // once more with the scan for every zero-phase frequency
        double c = cold.c1();

        // Hot: same capacitor; the driver follows the tank's resonance as the load changes.
        WorkpieceMedium hotMedium = new WorkpieceMedium.OfMaterial(material, w.temperatureHot());
        double fh = previous != null ? previous.report().hot().resonantFrequency() : f;
        double ih = previous != null ? previous.report().hot().coilCurrent() : current;
        CoilLoad hotLoad = null;
        TuningResult hot = null;
        for (int i = 0; i < ITERATIONS; i++) {
            hotLoad = work.load(hotMedium, fh, ih);
            LinkValues hv = LinkValues.tank(hotLoad.loadedInductance(), hotLoad.totalResistance());
            fh = samePhaseFrequency(d, hv, c, cold.design().targetPhase(), fh);
            hot = NetworkStage.tuneTankQuickly(NetworkStage.linkDesign(d, fh, hv, c, 0).withCapacitorLosses(esr, esl, 0, 0));
            double next = coilCurrent(hot);
            boolean done = Math.abs(next - ih) <= CURRENT_TOLERANCE * next;
            ih = next;
            if (done) {
                break;
            }
        }
        hot = NetworkStage.tune(hot.design());
        HeaterReport.HeaterPoint coldPoint = point(w.temperatureCold(), coldLoad, cold);
        HeaterReport.HeaterPoint hotPoint = point(w.temperatureHot(), hotLoad, hot);

        double mass = work.mass(material.density());
        List<String> notes = new ArrayList<>();
        notes.add("cold point: capacitor " + (fixedC == null ? "tuned" : "fixed") + " at the design frequency; "
                + "hot point: same capacitor, the driver follows the tank to the same input phase (common practice for heater drivers)");
        notes.addAll(work.notes());
        notes.addAll(coldLoad.provenance().notes());
        if (!hotLoad.provenance().valid()) {
            hotLoad.provenance().notes().stream().filter(n -> !notes.contains(n)).forEach(notes::add);
        }
        double heatingTime = Double.NaN;
        try {
            double pCold = coldPoint.power();
            double pHot = hotPoint.power();
            double span = w.temperatureHot() - w.temperatureCold();
            HeatingTime.Estimate est = HeatingTime.estimate(mass, material, w.temperatureCold(), w.temperatureHot(),
                    t -> pCold + (pHot - pCold) * Math.min(1, Math.max(0, (t - w.temperatureCold()) / span)),
                    new LossAllowance.Fraction(w.lossAllowance()));
            heatingTime = est.reachable() ? est.timeSeconds() : Double.POSITIVE_INFINITY;
            if (!est.reachable()) {
                notes.add("the workpiece does not reach " + w.temperatureHot() + " °C with the stated loss allowance");
            }
        } catch (IllegalArgumentException e) {
            notes.add("heating time not estimated: " + e.getMessage());
        }
        double worstCoilLoss = Math.max(coldPoint.coilLoss(), hotPoint.coilLoss());
        boolean tube = d.primary().wire() != null && d.primary().wire().kind() == org.tankwright.design.Enums.WireKind.TUBE;
        double coolantFlow = tube ? CoolantFlow.water(worstCoilLoss, w.coolantRise()).volumeFlow() : Double.NaN;
        if (!tube) {
            notes.add("the work coil is not a tube: no coolant flow is computed; its loss goes to the air around it");
        }
        FrequencyAdvice advice = work.advice(hotLoad, f);
        HeaterReport report = new HeaterReport(coldPoint, hotPoint, Math.min(f, hotPoint.resonantFrequency()),
                Math.max(f, hotPoint.resonantFrequency()), advice.lowFrequency(), advice.highFrequency(), mass,
                heatingTime, coolantFlow, List.copyOf(notes));
        return new Heated(cold, hot, report);
    }

    /** The load of the workpiece in its work coil at a medium, frequency and coil current. */
    private interface Loader {
        CoilLoad load(WorkpieceMedium medium, double frequency, double current);
    }

    /** The workpiece in its work coil, whatever its shape: its load, mass, frequency advice and model notes. */
    private record Work(Loader loader, DoubleUnaryOperator massAt, BiFunction<CoilLoad, Double, FrequencyAdvice> adviceAt,
                        List<String> notes) {
        CoilLoad load(WorkpieceMedium medium, double frequency, double current) {
            return loader.load(medium, frequency, current);
        }

        double mass(double density) {
            return massAt.applyAsDouble(density);
        }

        FrequencyAdvice advice(CoilLoad hot, double frequency) {
            return adviceAt.apply(hot, frequency);
        }
    }

    /** A round bar inside a solenoid work coil (magnetic circuit with the exact bar solution). */
    private static Work bar(CoilStage.Analysed coil, Workpiece w) {
        if (coil.geometry() != null && FlatWorkCoil.flat(coil.geometry())) {
            throw new AnalysisException("$.workpiece.shape: a bar is heated inside a solenoid work coil, and this work coil is"
                    + " a flat " + coil.report().shape() + " ($.primary.shape); for a flat coil set $.workpiece.shape to"
                    + " plate (with thickness_m and gap_m)", true);
        }
        if (!(coil.geometry() instanceof SingleLayerSolenoid sol)) {
            throw new AnalysisException("$.primary.shape: the heater models a solenoid work coil around a bar or a flat"
                    + " spiral (or loop) over a plate; a " + coil.report().shape() + " work coil is not modelled", false);
        }
        double coilInner = sol.meanDiameter() - sol.conductor().footprintWidth();
        if (w.diameter() >= coilInner) {
            throw new AnalysisException("$.workpiece.diameter_m: the bar (" + w.diameter() * 1e3
                    + " mm) does not fit inside the work coil's bore (" + Math.round(coilInner * 1e4) / 10.0 + " mm)", true);
        }
        WorkCoil wc = new WorkCoil(sol.turns(), sol.turns() * sol.pitch(), coilInner, coil.report().inductance(),
                coil.report().resistanceAc());
        BarGeometry bar = w.innerDiameter() > 0 ? BarGeometry.tube(w.diameter(), w.innerDiameter(), w.length())
                : BarGeometry.solid(w.diameter(), w.length());
        return new Work((m, fr, i) -> WorkpieceLoad.inCoil(wc, bar, m, fr, i), bar::mass,
                (hot, fr) -> FrequencyAdvice.forBar(w.diameter(), hot.resistivity(), hot.muR(), fr), List.of());
    }

    /** A flat plate below a flat round work coil (coaxial rings over a conducting layer). */
    private static Work plate(Design d, CoilStage.Analysed coil, Workpiece w, Map<Double, Double> muHints) {
        CoilGeometry g = coil.geometry();
        if (g == null || !FlatWorkCoil.flat(g)) {
            String shape = coil.measured() ? "measured" : coil.report().shape();
            throw new AnalysisException("$.workpiece.shape: a plate is heated by a flat work coil above it"
                    + " ($.primary.shape spiral, loop or a polygon spiral), and this work coil is a " + shape
                    + "; for a solenoid set $.workpiece.shape to bar", true);
        }
        FlatWorkCoil fc = FlatWorkCoil.of(g, coil.report().inductance(), coil.report().resistanceAc());
        PlateGeometry plate = new PlateGeometry(w.diameter(), w.thickness(), w.gap());
        PlateLoad model = PLATE_TABLES.get(new PlateKey(g, plate), k -> PlateLoad.of(fc, k.plate()));
        List<String> notes = new ArrayList<>();
        if (FlatWorkCoil.equalAreaRings(g)) {
            notes.add("each polygon turn taken as the ring of equal area for the plate's load (against the polygon's own"
                    + " image over a good conductor: ΔL within 0.4 % for a square spiral 8 mm above it, 3 % at 2 mm;"
                    + " hexagons and octagons closer; docs/models.md)");
        }
        if (d.primary().backing() != null) {
            notes.add("the work coil's backing ($.primary.backing) is not in the plate model: L0 and the plate's"
                    + " load are those of the bare coil");
        }
        Loader loader = (m, fr, i) -> {
            Double key = m instanceof WorkpieceMedium.OfMaterial om ? om.temperatureC() : null;
            // start from the last µr at this temperature, else from the last one at any temperature
            double hint = key == null ? Double.NaN : muHints.getOrDefault(key, muHints.getOrDefault(Double.NaN, Double.NaN));
            LoadedPlateCoil l = model.load(fc, plate, m, fr, i, hint);
            if (key != null) {
                muHints.put(key, l.muR());
                muHints.put(Double.NaN, l.muR());
            }
            return l;
        };
        return new Work(loader, plate::mass,
                (hot, fr) -> FrequencyAdvice.forPlate(w.thickness(), hot.resistivity(), hot.muR(), fr), List.copyOf(notes));
    }

    /**
     * The frequency at which the tank, with its capacitor fixed, shows the same input phase as at the
     * cold point: the driver follows the tank (common practice), found by bisection around its resonance.
     */
    static double samePhaseFrequency(Design d, LinkValues v, double c, double targetDeg, double guess) {
        double f0 = 1 / (2 * Math.PI * Math.sqrt(v.l1() * c));
        org.tankwright.circuit.PhasorSolver s = new org.tankwright.circuit.PhasorSolver(
                org.tankwright.tuning.Tuner.network(NetworkStage.linkDesign(d, f0, v, c, 0), c, 0, 0));
        int src = s.network().sourceIndex();
        double lo = f0 / 3;
        double hi = f0 * 3;
        s.solve(lo);
        double pLo = s.inputPhaseDeg(src) - targetDeg;
        s.solve(hi);
        double pHi = s.inputPhaseDeg(src) - targetDeg;
        if (Math.signum(pLo) == Math.signum(pHi)) {
            return Math.abs(targetDeg) < 1e-9 ? f0 : guess;
        }
        for (int i = 0; i < 60 && hi - lo > 1e-9 * f0; i++) {
            double mid = Math.sqrt(lo * hi);
            s.solve(mid);
            double pm = s.inputPhaseDeg(src) - targetDeg;
            if (Math.signum(pm) == Math.signum(pLo)) {
                lo = mid;
                pLo = pm;
            } else {
                hi = mid;
            }
        }
        return Math.sqrt(lo * hi);
    }

    private static double coilCurrent(TuningResult t) {
        return t.operatingPoint().stress(org.tankwright.circuit.Topologies.L1).iRms();
    }

    private static HeaterReport.HeaterPoint point(double temperature, CoilLoad load, TuningResult t) {
        var op = t.operatingPoint();
        var l1 = op.stress(org.tankwright.circuit.Topologies.L1);
        var c1 = op.stress(org.tankwright.circuit.Topologies.C1);
        double i = l1.iRms();
        double workPower = load.workResistance() * i * i;
        double coilLoss = load.coilResistance() * i * i;
        LinkDesign ld = t.design();
        return new HeaterReport.HeaterPoint(temperature, load.muR(), load.resistivity(), load.referenceDepth(),
                load.workResistance(), load.loadedInductance(), ld.frequency(), workPower, coilLoss,
                load.workResistance() / (load.workResistance() + load.coilResistance()), i, c1.vRms(), c1.iRms(),
                load.surfaceField() * i / Math.max(load.coilCurrent(), 1e-12));
    }
}
