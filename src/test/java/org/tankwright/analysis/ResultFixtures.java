package org.tankwright.analysis;

import org.apache.commons.math3.complex.Complex;
import org.tankwright.analysis.HeaterReport.HeaterPoint;
import org.tankwright.checks.Finding;
import org.tankwright.design.Backing;
import org.tankwright.design.Coil;
import org.tankwright.design.Compensation;
import org.tankwright.design.Design;
import org.tankwright.design.Enums.BackingKind;
import org.tankwright.design.Enums.CoilShape;
import org.tankwright.design.Enums.ConductorMaterial;
import org.tankwright.design.Enums.DesignKind;
import org.tankwright.design.Enums.ExposureSet;
import org.tankwright.design.Enums.LoadKind;
import org.tankwright.design.Enums.Population;
import org.tankwright.design.Enums.SourceKind;
import org.tankwright.design.Enums.Topology;
import org.tankwright.design.Enums.WireKind;
import org.tankwright.design.Envelope;
import org.tankwright.design.Load;
import org.tankwright.design.Placement;
import org.tankwright.design.Safety;
import org.tankwright.design.Source;
import org.tankwright.design.Wire;
import org.tankwright.design.Workpiece;
import org.tankwright.units.Dimension;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Plausible, internally consistent analysis results for tests of the faces and the checks, built
 * without the physics engines. Each scenario has a parameter object with public fields a test may
 * change before {@code build()}; every derived number (currents, voltages, bank stresses, stored
 * energy, field estimate) is computed from those parameters with the textbook formulas named
 * beside them, so a changed parameter moves every value that depends on it.
 *
 * <ul>
 *   <li>{@link #ssLink()}: an invented 4 kW class SS charging pad at 85 kHz, full bridge from a
 *       400 V bus, rectified output, envelope over coupling, film-capacitor banks, field screening.</li>
 *   <li>{@link #heater()}: a parallel-tank induction heater fed by a current-fed inverter, copper-tube
 *       work coil, steel bar with cold and hot points.</li>
 *   <li>{@link #measuredTank()}: a measured coil in a single series tank driven by a sine source.</li>
 * </ul>
 * The records are immutable; {@link #withFindings} and friends make varied copies.
 */
public final class ResultFixtures {
    private static final double MU0 = 4e-7 * Math.PI;
    /** Fundamental of a full-bridge square wave: (2√2/π)·Vdc rms (Fourier series of a square wave). */
    public static final double SQUARE_FUNDAMENTAL = 2 * Math.sqrt(2) / Math.PI;

    private ResultFixtures() {
    }

    // ------------------------------------------------------------------ SS link

    /** Parameters of the SS link scenario (SI units). */
    public static final class Link {
        public String name = "Fixture SS pad";
        public Topology topology = Topology.SS;
        public SourceKind sourceKind = SourceKind.FULL_BRIDGE;
        public double frequency = 85e3;
        public double l1 = 300e-6;
        public double l2 = 150e-6;
        public double k = 0.25;
        /** k at the far and near ends of the envelope. */
        public double kMin = 0.18;
        public double kMax = 0.33;
        public double r1 = 0.35;
        public double r2 = 0.2;
        public double vdc = 400;
        public double sourceResistance = 0.05;
        public Boolean mainsDerived = Boolean.TRUE;
        public Boolean isolated = Boolean.FALSE;
        /** DC load behind a capacitive-filter bridge rectifier, Ω. */
        public double loadDc = 35;
        /** Inductive input angle the primary is tuned for, degrees. */
        public double phaseDeg = 12;
        /** Whether the design file states the target phase (false: the phase follows from fixed parts). */
        public boolean phaseStated = true;
        public double coss = 150e-12;
        public double deadTime = 200e-9;
        public double turns1 = 16;
        public double turns2 = 16;
        public double coilRadius = 0.2;
        public double selfCapacitance = 40e-12;
        public int litzStrands = 1000;
        public double strandDiameter = 0.1e-3;
        public double turnPitch = 6e-3;
        public boolean bifurcated = false;
        public boolean receiverRemovable = true;
        public List<String> unreachable = new ArrayList<>();
        /** Capacitor part: value is derived; ratings (derated, peak volts and rms amps). */
        public int seriesCount = 4;
        public int parallelCount = 4;
        public double partVoltageRating = 1600;
        public double partCurrentRating = 12;
        public double partDvDtRating = 2e9;
        public double partEsl = 15e-9;
        public double partTanDelta = 2e-4;
        public boolean class2 = false;
        public String dielectric = "polypropylene film";
        public double fieldDistance = 0.8;
        public ExposureSet exposureSet = ExposureSet.ICNIRP_2010;
        public Population population = Population.PUBLIC;
        public boolean withExposure = true;
        public boolean withEnvelope = true;
        public boolean withBanks = true;

        public AnalysisResult build() {
            return link(this);
        }
    }

    /** The default SS link. */
    public static AnalysisResult ssLink() {
        return new Link().build();
    }

    static AnalysisResult link(Link p) {
        double w = 2 * Math.PI * p.frequency;
        double m = p.k * Math.sqrt(p.l1 * p.l2);
        double vin = sourceFundamental(p.sourceKind, p.vdc);
        double rlAc = 8 * p.loadDc / (Math.PI * Math.PI); // Steigerwald, IEEE TPEL 3(2), 1988
        double c2 = 1 / (w * w * p.l2);
        // Secondary tuned: the reflected impedance (ωM)²/(R2 + RL) is real (Wang, Covic, Stielau 2004).
        double zr = p.sourceResistance + p.r1 + sq(w * m) / (p.r2 + rlAc);
        double x1 = zr * Math.tan(Math.toRadians(p.phaseDeg));
        double c1 = 1 / (w * (w * p.l1 - x1));
        double c1Textbook = 1 / (w * w * p.l1);
        Complex zin = new Complex(zr, x1);
        Complex i1 = new Complex(vin).divide(zin); // source voltage as the phase reference
        Complex i2 = i1.multiply(new Complex(0, w * m)).divide(p.r2 + rlAc);
        double i1r = i1.abs();
        double i2r = i2.abs();
        double vc1 = i1r / (w * c1);
        double vc2 = i2r / (w * c2);
        double vl1 = i1.multiply(new Complex(p.r1, w * p.l1)).subtract(i2.multiply(new Complex(0, w * m))).abs();
        double vl2 = i2.multiply(new Complex(p.r2, w * p.l2)).subtract(i1.multiply(new Complex(0, w * m))).abs();
        double pOut = i2r * i2r * rlAc;
        double pIn = vin * i1r * Math.cos(Math.toRadians(p.phaseDeg));
        double vRlAc = i2r * rlAc;
        double vOut = vRlAc / SQUARE_FUNDAMENTAL; // capacitive-filter rectifier: V_ac1 = (2√2/π)·V_dc
        double x = p.k * p.k * (w * p.l1 / p.r1) * (w * p.l2 / p.r2);
        double etaMax = x / sq(1 + Math.sqrt(1 + x)); // SS closed form (MODELS.md §3)
        double loadOpt = p.r2 * Math.sqrt(1 + x);
        double loadedQ = w * p.l1 / zr;
        double turnOff = Math.sqrt(2) * i1r * Math.sin(Math.toRadians(p.phaseDeg));
        double zvsReq = 2 * p.coss * p.vdc / p.deadTime;
        // Envelope: SS primary current scales as 1/M² at fixed secondary (reflected resistance ∝ M²).
        double i1AtKMin = vin / Math.hypot(p.sourceResistance + p.r1 + sq(w * p.kMin * Math.sqrt(p.l1 * p.l2))
                / (p.r2 + rlAc), x1);
        double envScale = i1AtKMin / i1r;
        double i2AtKMax = vin / (w * p.kMax * Math.sqrt(p.l1 * p.l2)); // SS: I2 → Vin/(ωM) when R1 is small
        double envScale2 = Math.max(1, i2AtKMax / i2r);
        boolean env = p.withEnvelope;
        String far = "k = " + p.kMin + " (largest gap)";
        String near = "k = " + p.kMax + " (smallest gap)";

        List<ElementStress> stresses = List.of(
                stress("C1", "primary capacitor", vc1, 0, i1r, 0, env, envScale, far),
                stress("L1", "primary coil", vl1, i1r * i1r * p.r1, i1r, 0, env, envScale, far),
                stress("C2", "secondary capacitor", vc2, 0, i2r, 0, env, envScale2, near),
                stress("L2", "secondary coil", vl2, i2r * i2r * p.r2, i2r, 0, env, envScale2, near),
                stress("RL", "load (AC equivalent)", vRlAc, pOut, i2r, 0, env, envScale2, near),
                new ElementStress("S", "bridge switch", p.vdc, p.vdc, i1r / Math.sqrt(2), i1r * Math.sqrt(2),
                        Double.NaN, env ? p.vdc : Double.NaN, env ? envScale * i1r / Math.sqrt(2) : Double.NaN,
                        env ? far : "", Double.NaN, Double.NaN));

        List<BankReport> banks = new ArrayList<>();
        if (p.withBanks) {
            banks.add(bank("C1", c1, c1, vc1 * Math.sqrt(2), i1r, p, w));
            banks.add(bank("C2", c2, c2, vc2 * Math.sqrt(2), i2r, p, w));
        }
        Envelope designEnv = new Envelope(0.1, 0.2, 0.1, p.loadDc * 0.8, p.loadDc * 1.25, null, null, 20.0, 70.0,
                p.receiverRemovable);
        EnvelopeReport envelope = env ? new EnvelopeReport(45,
                List.of(new WorstCase("C1 peak voltage", "C1", vc1 * Math.sqrt(2) * envScale, Dimension.VOLTAGE, far),
                        new WorstCase("L1 rms current", "L1", i1r * envScale, Dimension.CURRENT, far),
                        new WorstCase("C2 peak voltage", "C2", vc2 * Math.sqrt(2) * envScale2, Dimension.VOLTAGE, near)),
                1.2 * i1r * envScale, 1.2 * vOut * envScale2, List.copyOf(p.unreachable),
                p.topology == Topology.SS ? vin / Math.hypot(p.sourceResistance + p.r1, x1) : Double.NaN,
                p.topology == Topology.SP || p.topology == Topology.PP ? 3 * vOut : Double.NaN, null) : null;

        Coil coil1 = litzSpiral("primary pad", p.turns1, 2 * p.coilRadius, p.litzStrands, p.strandDiameter);
        Coil coil2 = litzSpiral("secondary pad", p.turns2, 2 * p.coilRadius, p.litzStrands, p.strandDiameter);
        Design design = new Design(p.name, "Invented fixture: an SS pad for tests.", DesignKind.LINK, p.frequency,
                coil1, coil2, new Placement(0.15, 0, 0, null, null),
                new Compensation(p.topology, null, null, p.phaseStated ? Double.valueOf(p.phaseDeg) : null),
                new Source(p.sourceKind, null, p.vdc, 1.0, null, p.sourceResistance, p.mainsDerived, p.isolated,
                        p.coss, p.deadTime),
                new Load(LoadKind.RECTIFIER_CAP, p.loadDc, null, null), null, null, designEnv, null,
                new Safety(p.fieldDistance, p.exposureSet, p.population));

        double area = p.litzStrands * Math.PI * sq(p.strandDiameter / 2);
        double delta = copperSkinDepth(p.frequency);
        List<CoilReport> coils = List.of(
                coilReport("primary", coil1, p.turns1, p.l1, p.r1, w, p.selfCapacitance, area, delta,
                        p.strandDiameter, p.turnPitch),
                coilReport("secondary", coil2, p.turns2, p.l2, p.r2, w, p.selfCapacitance, area, delta,
                        p.strandDiameter, p.turnPitch));
        CouplingReport coupling = new CouplingReport(m, p.k, p.l1, p.l2, "fixture", p.kMin, p.kMax, far, near,
                Double.NaN, List.of(), List.of());
        NetworkReport network = new NetworkReport(p.topology.token(), p.frequency, c1, c2, c1Textbook, c2,
                p.phaseDeg, vin, p.vdc, zr, x1, p.phaseDeg, pIn, pOut, pOut / pIn, i1r, pIn / p.vdc, vOut, rlAc,
                p.bifurcated ? new double[] {0.9 * p.frequency, p.frequency, 1.1 * p.frequency}
                        : new double[] {p.frequency},
                p.bifurcated, etaMax, loadOpt, loadedQ, turnOff, zvsReq, Map.of(), List.of(), List.of());
        ExposureReport exposure = p.withExposure
                ? dipoleExposure(p.fieldDistance, p.frequency,
                        new Complex(p.turns1 * Math.PI * sq(p.coilRadius)).multiply(i1)
                                .add(i2.multiply(p.turns2 * Math.PI * sq(p.coilRadius))))
                : null;
        return new AnalysisResult(design, coils, coupling, network, stresses, envelope, List.copyOf(banks), null,
                exposure, List.of(), List.of(), 0);
    }

    // ------------------------------------------------------------------ heater

    /** Parameters of the parallel-tank heater scenario (SI units, temperatures in °C). */
    public static final class Heater {
        public String name = "Fixture bar heater";
        public SourceKind sourceKind = SourceKind.CURRENT;
        public double vdc = 48;
        public Boolean mainsDerived = Boolean.FALSE;
        public Boolean isolated = null;
        public double capacitance = 1.0e-6;
        public double inductanceCold = 0.90e-6;
        public double inductanceHot = 0.95e-6;
        public double workResistanceCold = 0.09;
        public double workResistanceHot = 0.05;
        public double coilResistance = 0.01;
        public double turns = 6;
        public double coilDiameter = 0.05;
        public double tubeDiameter = 6e-3;
        public double tubeWall = 1e-3;
        public WireKind wireKind = WireKind.TUBE;
        public double coilTemperature = 40;
        public double temperatureCold = 20;
        public double temperatureHot = 900;
        public double coolantRise = 10;
        public double barDiameter = 0.02;
        public double barLength = 0.08;
        public int parallelCount = 5;
        public double partCurrentRating = 30;
        public double partVoltageRating = 600;
        public double fieldDistance = 0.7;
        public ExposureSet exposureSet = ExposureSet.ICNIRP_2010;
        public Population population = Population.WORKER;

        public AnalysisResult build() {
            return heater(this);
        }
    }

    /** The default heater. */
    public static AnalysisResult heater() {
        return new Heater().build();
    }

    static AnalysisResult heater(Heater p) {
        // Current-fed push-pull parallel tank: tank peak voltage π·Vdc, so rms π·Vdc/√2 (common practice).
        double vTank = Math.PI * p.vdc / Math.sqrt(2);
        HeaterPoint cold = heaterPoint(p, p.temperatureCold, 20, 2.0e-7, p.inductanceCold, p.workResistanceCold, vTank);
        HeaterPoint hot = heaterPoint(p, p.temperatureHot, 1, 1.15e-6, p.inductanceHot, p.workResistanceHot, vTank);
        double f = cold.resonantFrequency();
        double w = 2 * Math.PI * f;
        double iCoil = Math.max(cold.coilCurrent(), hot.coilCurrent());
        double iCap = Math.max(cold.capacitorCurrent(), hot.capacitorCurrent());
        double rTotal = p.workResistanceCold + p.coilResistance;
        double loadedQ = w * p.inductanceCold / rTotal;
        double sourceCurrent = cold.power() / vTank + cold.coilLoss() / vTank; // in phase at resonance
        double mass = 7850 * Math.PI * sq(p.barDiameter / 2) * p.barLength; // steel density, handbook value
        double energy = mass * 600 * (p.temperatureHot - p.temperatureCold); // mean specific heat ≈ 600 J/(kg·K)
        double avgPower = (cold.power() + hot.power()) / 2;
        double coilLoss = Math.max(cold.coilLoss(), hot.coilLoss());
        double flow = coilLoss / (1000 * 4186 * p.coolantRise); // water: ρ·c_p·ΔT
        HeaterReport report = new HeaterReport(cold, hot, Math.min(cold.resonantFrequency(), hot.resonantFrequency()),
                Math.max(cold.resonantFrequency(), hot.resonantFrequency()), 20e3, 200e3, mass,
                energy / (avgPower * 0.8), flow, List.of());
        Wire tube = new Wire(p.wireKind, ConductorMaterial.COPPER, p.tubeDiameter, null, null, null, null,
                p.wireKind == WireKind.TUBE ? p.tubeWall : null, null, null);
        Coil coil = new Coil("work coil", CoilShape.SOLENOID, p.turns, p.coilDiameter, null, null, null, null, null,
                null, 10e-3, null, tube, p.coilTemperature, null, null, null);
        Design design = new Design(p.name, "Invented fixture: a bar heater for tests.", DesignKind.HEATER, f, coil, null,
                null, new Compensation(Topology.PARALLEL, p.capacitance, null, null),
                new Source(p.sourceKind, null, p.vdc, 1.0, sourceCurrent, 0, p.mainsDerived, p.isolated, null, null),
                null, Workpiece.bar("carbon-steel", p.barDiameter, 0, p.barLength, p.temperatureCold,
                        p.temperatureHot, 0.2, p.coolantRise),
                null, null, null, new Safety(p.fieldDistance, p.exposureSet, p.population));
        double area = Math.PI * (sq(p.tubeDiameter / 2) - sq(p.tubeDiameter / 2 - p.tubeWall));
        CoilReport coilReport = coilReport("work coil", coil, p.turns, p.inductanceCold, p.coilResistance, w, 2e-12,
                area, copperSkinDepth(f), Double.NaN, 10e-3);
        NetworkReport network = new NetworkReport("parallel", f, p.capacitance, Double.NaN, p.capacitance, Double.NaN,
                0, Double.NaN, p.vdc, vTank / sourceCurrent, 0, 0, cold.power() + cold.coilLoss(), cold.power(),
                cold.coilEfficiency(), sourceCurrent, (cold.power() + cold.coilLoss()) / p.vdc, Double.NaN,
                Double.NaN, new double[] {f}, false, cold.coilEfficiency(), Double.NaN, loadedQ, Double.NaN, Double.NaN,
                Map.of(), List.of(), List.of());
        List<ElementStress> stresses = List.of(
                new ElementStress("C1", "tank capacitor", vTank, vTank * Math.sqrt(2), iCap, iCap * Math.sqrt(2),
                        Double.NaN, Double.NaN, Double.NaN, "", Double.NaN, Double.NaN),
                new ElementStress("L1", "work coil", vTank, vTank * Math.sqrt(2), iCoil, iCoil * Math.sqrt(2),
                        coilLoss, Double.NaN, Double.NaN, "", Double.NaN, Double.NaN));
        Link bankParams = new Link();
        bankParams.seriesCount = 1;
        bankParams.parallelCount = p.parallelCount;
        bankParams.partVoltageRating = p.partVoltageRating;
        bankParams.partCurrentRating = p.partCurrentRating;
        bankParams.partEsl = 10e-9;
        bankParams.partTanDelta = 3e-4;
        BankReport bank = bank("C1", p.capacitance, p.capacitance, vTank * Math.sqrt(2), iCap, bankParams, w);
        ExposureReport exposure = dipoleExposure(p.fieldDistance, f,
                new Complex(p.turns * iCoil * Math.PI * sq(p.coilDiameter / 2)));
        return new AnalysisResult(design, List.of(coilReport), null, network, stresses, null, List.of(bank), report,
                exposure, List.of(), List.of(), 0);
    }

    private static HeaterPoint heaterPoint(Heater p, double temperature, double muR, double resistivity, double l,
                                           double rWork, double vTank) {
        double f = 1 / (2 * Math.PI * Math.sqrt(l * p.capacitance));
        double w = 2 * Math.PI * f;
        double iCoil = vTank / Math.hypot(w * l, rWork + p.coilResistance);
        double iCap = vTank * w * p.capacitance;
        double delta = Math.sqrt(2 * resistivity / (w * MU0 * muR)); // reference depth, MODELS.md §5
        double h = iCoil / 10e-3; // long-solenoid field N·I/length, turns 10 mm apart
        return new HeaterPoint(temperature, muR, resistivity, delta, rWork, l, f, iCoil * iCoil * rWork,
                iCoil * iCoil * p.coilResistance, rWork / (rWork + p.coilResistance), iCoil, vTank, iCap, h);
    }

    // ------------------------------------------------------------------ measured series tank

    /** Parameters of the measured-coil series tank (SI units). */
    public static final class Tank {
        public String name = "Fixture measured tank";
        public double frequency = 100e3;
        public double inductance = 100e-6;
        public double resistance = 0.5;
        public double sourceVrms = 1.5;
        public double sourceResistance = 2.0;
        public SourceKind sourceKind = SourceKind.SINE;
        public Topology topology = Topology.SERIES;

        public AnalysisResult build() {
            return tank(this);
        }
    }

    /** The default measured tank. */
    public static AnalysisResult measuredTank() {
        return new Tank().build();
    }

    static AnalysisResult tank(Tank p) {
        double w = 2 * Math.PI * p.frequency;
        double c = 1 / (w * w * p.inductance);
        double vin = p.sourceKind == SourceKind.SINE ? p.sourceVrms : sourceFundamental(p.sourceKind, p.sourceVrms);
        double rt = p.resistance + p.sourceResistance;
        double i = vin / rt;
        double vc = i / (w * c);
        double vl = i * Math.hypot(w * p.inductance, p.resistance);
        Coil coil = new Coil("bench coil", CoilShape.MEASURED, null, null, null, null, null, null, null, null, null,
                null, null, 20, null, p.inductance, p.resistance);
        Design design = new Design(p.name, "Invented fixture: a measured coil in a series tank.", DesignKind.TANK,
                p.frequency, coil, null, null, new Compensation(p.topology, null, null, null),
                new Source(p.sourceKind, p.sourceKind == SourceKind.SINE ? p.sourceVrms : null,
                        p.sourceKind == SourceKind.SINE ? null : p.sourceVrms, 1.0, null, p.sourceResistance, null,
                        null, null, null),
                null, null, null, null, null, null);
        CoilReport cr = new CoilReport("primary", "bench coil", "measured", Double.NaN, p.inductance, "measured",
                List.of(), Double.NaN, Double.NaN, p.resistance, "measured", List.of(), w * p.inductance / p.resistance,
                Double.NaN, Double.NaN, p.inductance, Double.NaN, Double.NaN, Double.NaN, copperSkinDepth(p.frequency),
                Double.NaN, Double.NaN, List.of());
        NetworkReport network = new NetworkReport(p.topology.token(), p.frequency, c, Double.NaN, c, Double.NaN, 0,
                vin, p.sourceKind == SourceKind.SINE ? Double.NaN : p.sourceVrms, rt, 0, 0, vin * i,
                i * i * p.resistance, p.resistance / rt, i, Double.NaN, Double.NaN, Double.NaN,
                new double[] {p.frequency}, false, Double.NaN, Double.NaN, w * p.inductance / rt, Double.NaN,
                Double.NaN, Map.of(), List.of(), List.of());
        List<ElementStress> stresses = List.of(
                new ElementStress("C1", "tank capacitor", vc, vc * Math.sqrt(2), i, i * Math.sqrt(2), Double.NaN,
                        Double.NaN, Double.NaN, "", Double.NaN, Double.NaN),
                new ElementStress("L1", "tank coil", vl, vl * Math.sqrt(2), i, i * Math.sqrt(2),
                        i * i * p.resistance, Double.NaN, Double.NaN, "", Double.NaN, Double.NaN));
        return new AnalysisResult(design, List.of(cr), null, network, stresses, null, List.of(), null, null, List.of(),
                List.of(), 0);
    }

    // ------------------------------------------------------------------ copies

    /** A copy with other findings. */
    public static AnalysisResult withFindings(AnalysisResult r, List<Finding> findings) {
        return new AnalysisResult(r.design(), r.coils(), r.coupling(), r.network(), r.stresses(), r.envelope(),
                r.banks(), r.heater(), r.exposure(), findings, r.notes(), r.computeNanos());
    }

    /** A copy with another exposure estimate (null for none). */
    public static AnalysisResult withExposure(AnalysisResult r, ExposureReport e) {
        return new AnalysisResult(r.design(), r.coils(), r.coupling(), r.network(), r.stresses(), r.envelope(),
                r.banks(), r.heater(), e, r.findings(), r.notes(), r.computeNanos());
    }

    /** A copy with other stresses. */
    public static AnalysisResult withStresses(AnalysisResult r, List<ElementStress> stresses) {
        return new AnalysisResult(r.design(), r.coils(), r.coupling(), r.network(), stresses, r.envelope(),
                r.banks(), r.heater(), r.exposure(), r.findings(), r.notes(), r.computeNanos());
    }

    // ------------------------------------------------------------------ helpers

    /** rms fundamental of a bridge's square wave; a sine source is passed through. */
    static double sourceFundamental(SourceKind kind, double v) {
        return switch (kind) {
            case FULL_BRIDGE -> SQUARE_FUNDAMENTAL * v;
            case HALF_BRIDGE -> SQUARE_FUNDAMENTAL * v / 2;
            default -> v;
        };
    }

    /** Skin depth of copper at 20 °C, δ = √(ρ/(π f µ0)), ρ = 1.7241e-8 Ω·m (IEC 60028). */
    public static double copperSkinDepth(double f) {
        return Math.sqrt(1.7241e-8 / (Math.PI * f * MU0));
    }

    /** Far-field magnetic dipole estimate in the coil's plane: B = µ0·m/(4π d³) (a screening estimate). */
    static ExposureReport dipoleExposure(double d, double f, Complex moment) {
        return new ExposureReport(d, MU0 * moment.abs() / (4 * Math.PI * d * d * d), f,
                "magnetic dipole in the winding plane (fixture)");
    }

    private static ElementStress stress(String id, String role, double vRms, double loss, double iRms, double bias,
                                        boolean env, double scale, String at) {
        double vPeak = vRms * Math.sqrt(2) + bias;
        return new ElementStress(id, role, vRms, vPeak, iRms, iRms * Math.sqrt(2), loss,
                env ? vPeak * scale : Double.NaN, env ? iRms * scale : Double.NaN, env ? at : "", Double.NaN,
                Double.NaN);
    }

    /** A bank of {@code s} in series × {@code p} strings of one film part; stresses shared equally. */
    private static BankReport bank(String id, double target, double c, double vPeak, double iRms, Link p, double w) {
        int s = p.seriesCount;
        int n = p.parallelCount;
        double part = c * s / n;
        double partV = vPeak / s;
        double partI = iRms / n;
        double partEsr = p.partTanDelta / (w * part); // ESR = tan δ/(ωC), MODELS.md §4
        double srf = 1 / (2 * Math.PI * Math.sqrt(p.partEsl * part));
        return new BankReport(id, target, c, partEsr * s / n, p.partEsl * s / n, s, n,
                String.format(java.util.Locale.ROOT, "%.3g nF %s", part * 1e9, p.dielectric), "", s * n, p.dielectric,
                p.class2, partV, p.partVoltageRating, partI, p.partCurrentRating, partI * partI * partEsr, srf,
                w * partV, p.partDvDtRating, 0.5 * c * vPeak * vPeak, List.of(), List.of());
    }

    private static Coil litzSpiral(String label, double turns, double diameter, int strands, double strandDiameter) {
        Wire litz = new Wire(WireKind.LITZ, ConductorMaterial.COPPER, null, null, 5e-3, strands, strandDiameter, null,
                null, null);
        return new Coil(label, CoilShape.SPIRAL, turns, diameter, diameter * 0.4, null, null, null, null, null, null,
                null, litz, 40, new Backing(BackingKind.FERRITE, 2000.0, 5e-3, 2e-3, diameter * 1.1, null, null),
                null, null);
    }

    private static CoilReport coilReport(String role, Coil coil, double turns, double l, double r, double w,
                                         double cSelf, double area, double delta, double strand, double pitch) {
        double srf = 1 / (2 * Math.PI * Math.sqrt(l * cSelf));
        double f = w / (2 * Math.PI);
        return new CoilReport(role, coil.label(), coil.shape().name().toLowerCase(java.util.Locale.ROOT), turns, l,
                "fixture", List.of(new ModelValue("fixture", l, "invented", true, "")), 0, r / 3, r, "fixture",
                List.of(new ResistanceValue("fixture", r, "invented", true, "")), w * l / r, cSelf, srf, l / (1 - sq(f / srf)), Double.NaN, Double.NaN, area, delta, strand, pitch,
                List.of());
    }

    private static double sq(double x) {
        return x * x;
    }
}
