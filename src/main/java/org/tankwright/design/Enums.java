package org.tankwright.design;

/** The choices a design file offers, spelled as in the file (see {@link Token}). */
public final class Enums {
    private Enums() {
    }

    /** What a design is: a two-coil link, a single tank around one measured or modelled coil, or an induction heater. */
    public enum DesignKind { LINK, TANK, HEATER }

    /** Coil geometries; {@code MEASURED} is a coil known only by its entered inductance and resistance. */
    public enum CoilShape {
        SOLENOID, MULTILAYER, SPIRAL, SQUARE_SPIRAL, HEX_SPIRAL, OCTAGON_SPIRAL, RECT_SPIRAL, LOOP, MEASURED;

        /** Whether the shape is drawn and modelled as a flat (planar) winding. */
        public boolean planar() {
            return this == SPIRAL || this == SQUARE_SPIRAL || this == HEX_SPIRAL || this == OCTAGON_SPIRAL
                    || this == RECT_SPIRAL || this == LOOP;
        }
    }

    /** Conductor kinds. */
    public enum WireKind { ROUND, LITZ, TUBE, TRACE }

    /** Conductor materials. */
    public enum ConductorMaterial { COPPER, ALUMINIUM }

    /** What sits behind a coil. */
    public enum BackingKind { FERRITE, SHIELD }

    /** Compensation topology: the first letter is the primary capacitor (Series with / Parallel across the coil), the second the secondary's. */
    public enum Topology implements Token {
        SS, SP, PS, PP, SERIES, PARALLEL;

        @Override
        public String token() {
            return this == SERIES ? "series" : this == PARALLEL ? "parallel" : name();
        }

        /** Whether this is a single tank rather than a two-coil link. */
        public boolean singleTank() {
            return this == SERIES || this == PARALLEL;
        }
    }

    /** A heater's workpiece: a round bar inside a solenoid work coil, or a flat plate (disc) below a flat spiral. */
    public enum WorkpieceShape { BAR, PLATE }

    /** Sources, described by their fundamental. */
    public enum SourceKind { SINE, FULL_BRIDGE, HALF_BRIDGE, CURRENT }

    /** Loads at the secondary terminals. */
    public enum LoadKind { RESISTOR, RECTIFIER_CAP, RECTIFIER_IND, BATTERY }

    /** Field-exposure reference levels. */
    public enum ExposureSet { ICNIRP_2010, ICNIRP_1998, ICNIRP_2020 }

    /** Who is exposed. */
    public enum Population { PUBLIC, WORKER }
}
