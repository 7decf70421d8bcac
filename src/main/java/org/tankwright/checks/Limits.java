package org.tankwright.checks;

import org.tankwright.design.Enums.ExposureSet;
import org.tankwright.design.Enums.Population;

import java.util.List;

/**
 * Every limit the checks hold a result to, in one place, each with its source. Values recalled
 * rather than read from the published table are marked "from memory" beside them; the docs
 * ({@code docs/safety.md}) list which were cross-checked.
 */
public final class Limits {
    private Limits() {
    }

    /** A limit's number as written in a source string. */
    private static String n(double x) {
        return org.tankwright.units.Quantities.number(x, 3).replaceAll("\\.0+$", "");
    }

    // ---------------------------------------------------------------- voltage bands

    /** Upper limit of extra-low voltage, a.c. rms (IEC 61140, IEC 60449 band I; cross-checked: IEC Electropedia). */
    public static final double ELV_AC_RMS = 50.0;
    /** Upper limit of extra-low voltage, ripple-free d.c. (IEC 61140, IEC 60449 band I). */
    public static final double ELV_DC = 120.0;
    /** Upper limit of low voltage, a.c. rms; above it is high voltage (IEC 60449 band II; cross-checked: IEC Electropedia). */
    public static final double LV_AC_RMS = 1000.0;
    /** Upper limit of low voltage, d.c. (IEC 60449 band II). */
    public static final double LV_DC = 1500.0;
    /** The source named for the voltage bands. */
    public static final String VOLTAGE_BANDS = "IEC 61140 / IEC 60449 voltage bands";

    /** Peak of a sine at the a.c. extra-low-voltage limit, V. */
    public static double elvAcPeak() {
        return ELV_AC_RMS * Math.sqrt(2);
    }

    /** Peak of a sine at the a.c. low-voltage limit, V. */
    public static double lvAcPeak() {
        return LV_AC_RMS * Math.sqrt(2);
    }

    // ---------------------------------------------------------------- insulation

    /**
     * Minimum of Paschen's curve for air at atmospheric pressure, V peak: below it no gap in air
     * breaks down, so partial discharge between turns or to a core cannot start in an air void
     * (Paschen 1889; value ≈ 327 V from memory).
     */
    public static final double PASCHEN_MIN_AIR = 327.0;
    /** The source of {@link #PASCHEN_MIN_AIR}. */
    public static final String PASCHEN_SOURCE = "Paschen's law: minimum breakdown voltage of air ≈ " + n(PASCHEN_MIN_AIR) + " V peak (from memory)";
    /** Frequency above which IEC 60664-4 adds to IEC 60664-1 for clearance, creepage and solid insulation, Hz. */
    public static final double IEC_60664_4_FROM = 30e3;

    // ---------------------------------------------------------------- parts

    /**
     * A part (capacitor or coil) is "too close" to its self-resonance when it runs above
     * 1/SRF_RATIO of it: its apparent value then shifts by 1/(1 − (f/f_SR)²) − 1 ≈ 4 % (common practice).
     */
    public static final double SRF_RATIO = 5.0;
    /** The source of {@link #SRF_RATIO}. */
    public static final String SRF_SOURCE = "common practice (self-resonance at least " + n(SRF_RATIO) + " × the operating frequency)";
    /** Loaded Q below which the fundamental-harmonic analysis loses accuracy (common practice, about 3). */
    public static final double FHA_MIN_Q = 3.0;
    /**
     * Largest |input phase| of a voltage-fed bridge before most of its current is reactive: 60°,
     * power factor 0.5, the bridge carries twice the current the power needs (common practice).
     */
    public static final double REACTIVE_PHASE_DEG = 60.0;
    /** A deliberately chosen target phase within this of the operating phase is the design's own power control. */
    public static final double TARGET_PHASE_MATCH_DEG = 5.0;
    /** The source of {@link #FHA_MIN_Q}. */
    public static final String FHA_SOURCE = "common practice (loaded Q of about " + n(FHA_MIN_Q) + " or more)";
    /** Margin to a derated rating below which the checks call it thin, fraction (common practice). */
    public static final double THIN_MARGIN = 0.10;
    /** Dissipation of one film capacitor part in still air above which it needs a thermal check, W (common practice). */
    public static final double CAPACITOR_PART_LOSS = 1.0;
    /** The source of {@link #CAPACITOR_PART_LOSS}. */
    public static final String CAPACITOR_LOSS_SOURCE = "common practice (about " + n(CAPACITOR_PART_LOSS) + " W per film part in still air)";
    /** rms current density in a round or litz winding cooled by still air, A/m² (common practice: 5 A/mm²). */
    public static final double CURRENT_DENSITY_AIR = 5e6;
    /** The source of {@link #CURRENT_DENSITY_AIR}. */
    public static final String CURRENT_DENSITY_SOURCE = "common practice (" + n(CURRENT_DENSITY_AIR / 1e6) + " A/mm² for air-cooled windings)";
    /** Litz strands should be no thicker than one skin depth (common practice; Sullivan, IEEE TPEL 14(2), 1999). */
    public static final double LITZ_STRAND_PER_SKIN_DEPTH = 1.0;

    // ---------------------------------------------------------------- energy and charge

    /** Stored energy treated as a hazardous energy level (IEC 60950-1 §1.2.8.10: 20 J at 2 V or more; from memory, its 240 VA twin cross-checked). */
    public static final double HAZARDOUS_ENERGY = 20.0;
    /** The source of {@link #HAZARDOUS_ENERGY}. */
    public static final String HAZARDOUS_ENERGY_SOURCE = "IEC 60950-1 hazardous energy level (" + n(HAZARDOUS_ENERGY) + " J; from memory)";
    /**
     * Discharge limits for a part not to count as live (IEC 60335-1 §8.1.4; cross-checked against a
     * quotation of the clause): above 42.4 V peak up to 450 V, at most 0.1 µF; above 450 V up to
     * 15 kV, at most 45 µC; above 15 kV, at most 350 mJ.
     */
    public static final double DISCHARGE_FROM_PEAK = 42.4;
    /** Upper end of the capacitance band of IEC 60335-1 §8.1.4, V peak. */
    public static final double DISCHARGE_CAPACITANCE_UPTO = 450;
    /** Largest capacitance between 42.4 V and 450 V peak, F. */
    public static final double DISCHARGE_CAPACITANCE = 0.1e-6;
    /** Upper end of the charge band, V peak. */
    public static final double DISCHARGE_CHARGE_UPTO = 15e3;
    /** Largest charge between 450 V and 15 kV peak, C. */
    public static final double DISCHARGE_CHARGE = 45e-6;
    /** Largest discharge energy above 15 kV peak, J. */
    public static final double DISCHARGE_ENERGY = 0.35;
    /** The source of the discharge limits. */
    public static final String DISCHARGE_SOURCE = "IEC 60335-1 §8.1.4 discharge limits (0.1 µF to 450 V, 45 µC to 15 kV, 350 mJ above)";

    // ---------------------------------------------------------------- heat

    /** Surface temperature above which touching bare metal for a minute burns, °C (EN ISO 13732-1; ≈ 51 °C from memory). */
    public static final double BURN_THRESHOLD_C = 51.0;
    /** The source of {@link #BURN_THRESHOLD_C}. */
    public static final String BURN_SOURCE = "EN ISO 13732-1 burn threshold for touching bare metal for 1 min (≈ " + n(BURN_THRESHOLD_C) + " °C; from memory)";
    /** Work-coil loss above which an air-cooled coil is no longer enough, W (common practice). */
    public static final double WORK_COIL_AIR_LOSS = 25.0;
    /** The source of {@link #WORK_COIL_AIR_LOSS}. */
    public static final String WORK_COIL_SOURCE = "common practice (about " + n(WORK_COIL_AIR_LOSS) + " W for an air-cooled work coil); water ρ·c_p·ΔT";

    // ---------------------------------------------------------------- field exposure

    /**
     * One piece of a reference-level table: between {@code fLow} and {@code fHigh} (Hz, lower end
     * both inclusive) the level is {@code a·f^(−n)} tesla (f in Hz).
     */
    public record Piece(double fLow, double fHigh, double a, double n) {
        double at(double f) {
            return a * Math.pow(f, -n);
        }
    }

    /** A reference-level table for one population, as a piecewise function of frequency. */
    public record LevelTable(String source, List<Piece> pieces) {
        /** The level at {@code f}, T, or NaN outside the table. */
        public double at(double f) {
            for (Piece p : pieces) {
                if (f >= p.fLow() && f <= p.fHigh()) {
                    return p.at(f);
                }
            }
            return Double.NaN;
        }

        /** Whether the table covers {@code f}. */
        public boolean covers(double f) {
            return !Double.isNaN(at(f));
        }
    }

    private static final double MU0 = 4e-7 * Math.PI;

    /** ICNIRP 2010 (Health Physics 99:818–836), Table 4, general public, B in T; cross-checked against a reproduction of the table. */
    public static final LevelTable ICNIRP_2010_PUBLIC = new LevelTable("ICNIRP 2010 reference levels, general public", List.of(
            new Piece(1, 8, 4e-2, 2), new Piece(8, 25, 5e-3, 1), new Piece(25, 400, 2e-4, 0),
            new Piece(400, 3e3, 8e-2, 1), new Piece(3e3, 10e6, 2.7e-5, 0)));
    /** ICNIRP 2010, Table 3, occupational, B in T; cross-checked against a reproduction of the table. */
    public static final LevelTable ICNIRP_2010_WORKER = new LevelTable("ICNIRP 2010 reference levels, occupational", List.of(
            new Piece(1, 8, 0.2, 2), new Piece(8, 25, 2.5e-2, 1), new Piece(25, 300, 1e-3, 0),
            new Piece(300, 3e3, 0.3, 1), new Piece(3e3, 10e6, 1e-4, 0)));
    /**
     * ICNIRP 1998 (Health Physics 74:494–522), Table 7, general public, B in T (from memory:
     * 5/f_kHz µT to 0.8 kHz, 6.25 µT to 150 kHz, 0.92/f_MHz µT to 10 MHz, 0.092 µT to 400 MHz).
     */
    public static final LevelTable ICNIRP_1998_PUBLIC = new LevelTable("ICNIRP 1998 reference levels, general public", List.of(
            new Piece(1, 8, 4e-2, 2), new Piece(8, 800, 5e-3, 1), new Piece(800, 150e3, 6.25e-6, 0),
            new Piece(150e3, 10e6, 0.92, 1), new Piece(10e6, 400e6, 0.092e-6, 0)));
    /**
     * ICNIRP 1998, Table 6, occupational, B in T (from memory: 25/f_kHz µT to 0.82 kHz, 30.7 µT to
     * 65 kHz, 2.0/f_MHz µT to 10 MHz, 0.2 µT to 400 MHz).
     */
    public static final LevelTable ICNIRP_1998_WORKER = new LevelTable("ICNIRP 1998 reference levels, occupational", List.of(
            new Piece(1, 8, 0.2, 2), new Piece(8, 820, 2.5e-2, 1), new Piece(820, 65e3, 30.7e-6, 0),
            new Piece(65e3, 10e6, 2.0, 1), new Piece(10e6, 400e6, 0.2e-6, 0)));
    /**
     * ICNIRP 2020 (Health Physics 118:483–524), Table 5, whole-body exposure, general public:
     * H = 2.2/f_MHz A/m from 0.1 to 30 MHz (from memory; the local-exposure table's 4.9/f_MHz was
     * cross-checked), 0.073 A/m to 400 MHz (from memory); B = µ0·H.
     */
    public static final LevelTable ICNIRP_2020_PUBLIC = new LevelTable("ICNIRP 2020 reference levels (whole body), general public", List.of(
            new Piece(100e3, 30e6, MU0 * 2.2e6, 1), new Piece(30e6, 400e6, MU0 * 0.073, 0)));
    /**
     * ICNIRP 2020, Table 5, whole-body exposure, occupational: H = 4.9/f_MHz A/m from 0.1 to 30 MHz
     * (from memory; local table 10.8/f_MHz cross-checked), 0.16 A/m to 400 MHz (from memory).
     */
    public static final LevelTable ICNIRP_2020_WORKER = new LevelTable("ICNIRP 2020 reference levels (whole body), occupational", List.of(
            new Piece(100e3, 30e6, MU0 * 4.9e6, 1), new Piece(30e6, 400e6, MU0 * 0.16, 0)));

    /**
     * A reference level and the table that governs it.
     *
     * @param tesla   the level, T rms (NaN when no table covers the frequency)
     * @param source  the governing table
     */
    public record ReferenceLevel(double tesla, String source) {
    }

    /**
     * The magnetic flux density reference level at {@code f} for the chosen set and population.
     * ICNIRP 1998 stands alone. ICNIRP 2010 (nerve stimulation, to 10 MHz) and ICNIRP 2020
     * (heating, from 100 kHz) are the two halves of the current set: below 100 kHz the 2010 table
     * governs; between 100 kHz and 10 MHz both apply and the stricter governs; above 10 MHz the
     * 2020 table. Choosing either of the two selects that pair.
     */
    public static ReferenceLevel magneticReference(ExposureSet set, Population pop, double f) {
        boolean worker = pop == Population.WORKER;
        if (set == ExposureSet.ICNIRP_1998) {
            LevelTable t = worker ? ICNIRP_1998_WORKER : ICNIRP_1998_PUBLIC;
            return new ReferenceLevel(t.at(f), t.source());
        }
        LevelTable nerve = worker ? ICNIRP_2010_WORKER : ICNIRP_2010_PUBLIC;
        LevelTable heat = worker ? ICNIRP_2020_WORKER : ICNIRP_2020_PUBLIC;
        double a = nerve.at(f);
        double b = heat.at(f);
        if (Double.isNaN(b) || (!Double.isNaN(a) && a <= b)) {
            return new ReferenceLevel(a, nerve.source() + (Double.isNaN(b) ? "" : " (stricter than the heating level here)"));
        }
        return new ReferenceLevel(b, heat.source() + (Double.isNaN(a) ? "" : " (stricter than the nerve level here)"));
    }

    // ---------------------------------------------------------------- radio bands

    /**
     * A frequency band commonly allotted to inductive power transfer or to ISM use.
     *
     * @param low    lower edge, Hz
     * @param high   upper edge, Hz
     * @param use    what it is allotted to
     * @param source the regulation or report that names it
     */
    public record Band(double low, double high, String use, String source) {
        /** Whether [fMin, fMax] lies inside the band. */
        public boolean contains(double fMin, double fMax) {
            return fMin >= low && fMax <= high;
        }
    }

    /** Bands for inductive power transfer and ISM use. Local radio rules decide in the end. */
    public static final List<Band> BANDS = List.of(
            new Band(9e3, 148.5e3, "inductive short-range devices (Europe)", "CEPT ERC/REC 70-03 Annex 9 (from memory)"),
            new Band(19e3, 21e3, "wireless power transfer", "ETSI EN 303 417 (cross-checked: ETSI TR 103 493)"),
            new Band(59e3, 61e3, "wireless power transfer", "ETSI EN 303 417 (cross-checked: ETSI TR 103 493)"),
            new Band(79e3, 90e3, "wireless power transfer for electric vehicles",
                    "Recommendation ITU-R SM.2110 (from memory); ETSI EN 303 417"),
            new Band(100e3, 148.5e3, "wireless power transfer for mobile and portable devices",
                    "Report ITU-R SM.2449; Recommendation ITU-R SM.2129 (from memory)"),
            new Band(100e3, 300e3, "wireless power transfer", "ETSI EN 303 417 (cross-checked: ETSI TR 103 493)"),
            new Band(315e3, 405e3, "wireless power transfer for mobile and portable devices (studied)",
                    "Report ITU-R SM.2449"),
            new Band(6.765e6, 6.795e6, "ISM; wireless power transfer", "ITU Radio Regulations No. 5.138; ETSI EN 303 417"),
            new Band(13.553e6, 13.567e6, "ISM", "ITU Radio Regulations No. 5.150"),
            new Band(26.957e6, 27.283e6, "ISM", "ITU Radio Regulations No. 5.150"),
            new Band(40.66e6, 40.70e6, "ISM", "ITU Radio Regulations No. 5.150"),
            new Band(433.05e6, 434.79e6, "ISM (Region 1)", "ITU Radio Regulations No. 5.138"),
            new Band(902e6, 928e6, "ISM (Region 2)", "ITU Radio Regulations No. 5.150"));

    /** The first band holding the whole range [fMin, fMax], or null. */
    public static Band bandFor(double fMin, double fMax) {
        for (Band b : BANDS) {
            if (b.contains(fMin, fMax)) {
                return b;
            }
        }
        return null;
    }
}
