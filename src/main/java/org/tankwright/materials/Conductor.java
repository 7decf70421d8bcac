package org.tankwright.materials;

import java.util.ArrayList;
import java.util.List;

/**
 * What a coil is wound from: solid round wire, litz, a round tube or a PCB trace. All lengths in
 * metres. Each kind checks itself ({@link #problems()}); the other methods assume it is valid.
 *
 * <p>Two sizes describe how the conductor sits in a winding: {@link #footprintWidth()} is the room
 * it takes beside its neighbour in the same layer (the pitch must be at least this), and
 * {@link #footprintHeight()} the room across the layer (axial for a flat spiral, radial for a
 * solenoid layer). For round conductors both are the outer (insulated or bundle) diameter.
 */
public sealed interface Conductor permits Conductor.RoundWire, Conductor.Litz, Conductor.Tube, Conductor.Trace {

    /** Copper thickness of one ounce per square foot, 35 µm (common practice, IPC nominal 1.378 mil). */
    double OUNCE_COPPER_THICKNESS = 35e-6;

    /** The metal. */
    ConductorMaterial material();

    /** Cross-section of metal carrying current, m². */
    double metalArea();

    /** Width the conductor takes beside its neighbour in a layer, m (outer diameter, or trace width). */
    double footprintWidth();

    /** Size across the layer, m (outer diameter, or trace thickness). */
    double footprintHeight();

    /**
     * Geometric mean distance of the cross-section from itself (Grover 1946, ch. 3); the self term
     * of a filament uses a round wire of the same GMD, radius {@code selfGmd()·e^{1/4}}.
     */
    double selfGmd();

    /** Short description for tables, e.g. "round 1.00 mm copper". */
    String describe();

    /** Empty when valid; otherwise one message per problem naming the field, the value and what is allowed. */
    List<String> problems();

    /** Radius of the solid round wire with the same self-GMD: what a {@code Filament}'s wireRadius holds. */
    default double equivalentRadius() {
        return selfGmd() * Math.exp(0.25);
    }

    /** DC resistance per metre at {@code celsius}, Ω/m. */
    default double resistancePerMetre(double celsius) {
        return material().resistivity(celsius) / metalArea();
    }

    /** Mass of metal per metre, kg/m. */
    default double massPerMetre() {
        return material().density() * metalArea();
    }

    /** Solid round wire of bare diameter {@code diameter} and insulated outer diameter {@code outerDiameter}. */
    record RoundWire(double diameter, double outerDiameter, ConductorMaterial material) implements Conductor {
        /** Bare wire, outer diameter equal to the bare one. */
        public static RoundWire bare(double diameter, ConductorMaterial material) {
            return new RoundWire(diameter, diameter, material);
        }

        /** AWG wire (ASTM B258 diameter) with the given outer diameter; 0 or NaN outer means bare. */
        public static RoundWire awg(int gauge, double outerDiameter, ConductorMaterial material) {
            double d = WireGauge.awgDiameter(gauge);
            return new RoundWire(d, outerDiameter > 0 ? outerDiameter : d, material);
        }

        @Override
        public double metalArea() {
            return Math.PI * 0.25 * diameter * diameter;
        }

        @Override
        public double footprintWidth() {
            return outerDiameter;
        }

        @Override
        public double footprintHeight() {
            return outerDiameter;
        }

        @Override
        public double selfGmd() {
            return 0.5 * diameter * Math.exp(-0.25);
        }

        @Override
        public String describe() {
            return String.format(java.util.Locale.ROOT, "round wire %.4g mm %s", diameter * 1e3, material.label());
        }

        @Override
        public List<String> problems() {
            List<String> p = new ArrayList<>();
            Checks.positive(p, "wire diameter", diameter);
            Checks.positive(p, "wire outer diameter", outerDiameter);
            if (p.isEmpty() && outerDiameter < diameter) {
                p.add(Checks.fmt("wire outer diameter", outerDiameter) + ": must be at least the bare diameter "
                        + Checks.m(diameter));
            }
            return p;
        }
    }

    /**
     * Litz: {@code strands} strands of bare diameter {@code strandDiameter} in a bundle of outer
     * diameter {@code bundleDiameter}. The self-GMD is that of the bundle as a solid round section.
     */
    record Litz(int strands, double strandDiameter, double bundleDiameter, ConductorMaterial material)
            implements Conductor {
        /** Densest possible packing of round strands, π/(2√3) (hexagonal). */
        public static final double MAX_FILL = Math.PI / (2 * Math.sqrt(3));

        @Override
        public double metalArea() {
            return strands * Math.PI * 0.25 * strandDiameter * strandDiameter;
        }

        @Override
        public double footprintWidth() {
            return bundleDiameter;
        }

        @Override
        public double footprintHeight() {
            return bundleDiameter;
        }

        @Override
        public double selfGmd() {
            return 0.5 * bundleDiameter * Math.exp(-0.25);
        }

        /** Share of the bundle's circle filled by metal. */
        public double fillFactor() {
            return metalArea() / (Math.PI * 0.25 * bundleDiameter * bundleDiameter);
        }

        @Override
        public String describe() {
            return String.format(java.util.Locale.ROOT, "litz %d x %.4g mm %s", strands, strandDiameter * 1e3,
                    material.label());
        }

        @Override
        public List<String> problems() {
            List<String> p = new ArrayList<>();
            if (strands < 1) {
                p.add("litz strand count = " + strands + ": must be at least 1");
            }
            Checks.positive(p, "litz strand diameter", strandDiameter);
            Checks.positive(p, "litz bundle diameter", bundleDiameter);
            if (p.isEmpty() && fillFactor() > MAX_FILL) {
                p.add(Checks.fmt("litz bundle diameter", bundleDiameter) + ": too small for " + strands
                        + " strands of " + Checks.m(strandDiameter) + "; at least "
                        + Checks.m(Math.sqrt(metalArea() / MAX_FILL / (Math.PI * 0.25))) + " is needed");
            }
            return p;
        }
    }

    /** Round tube of outer diameter {@code outerDiameter} and wall thickness {@code wall}. */
    record Tube(double outerDiameter, double wall, ConductorMaterial material) implements Conductor {
        @Override
        public double metalArea() {
            double ri = 0.5 * outerDiameter - wall;
            return Math.PI * (0.25 * outerDiameter * outerDiameter - ri * ri);
        }

        @Override
        public double footprintWidth() {
            return outerDiameter;
        }

        @Override
        public double footprintHeight() {
            return outerDiameter;
        }

        /** GMD of an annulus (Grover 1946, eq. for a tube). */
        @Override
        public double selfGmd() {
            double ro = 0.5 * outerDiameter;
            double ri = ro - wall;
            if (ri <= 0) {
                return ro * Math.exp(-0.25);
            }
            double ro2 = ro * ro;
            double ri2 = ri * ri;
            double d2 = ro2 - ri2;
            double ln = Math.log(ro) - ri2 * ri2 / (d2 * d2) * Math.log(ro / ri) + (3 * ri2 - ro2) / (4 * d2);
            return Math.exp(ln);
        }

        @Override
        public String describe() {
            return String.format(java.util.Locale.ROOT, "tube %.4g mm x %.3g mm wall %s", outerDiameter * 1e3,
                    wall * 1e3, material.label());
        }

        @Override
        public List<String> problems() {
            List<String> p = new ArrayList<>();
            Checks.positive(p, "tube outer diameter", outerDiameter);
            Checks.positive(p, "tube wall", wall);
            if (p.isEmpty() && wall > 0.5 * outerDiameter) {
                p.add(Checks.fmt("tube wall", wall) + ": must be at most half the outer diameter "
                        + Checks.m(0.5 * outerDiameter));
            }
            return p;
        }
    }

    /** Flat PCB trace (or strip) of {@code width} and copper {@code thickness}. */
    record Trace(double width, double thickness, ConductorMaterial material) implements Conductor {
        /** A trace of the given copper weight in ounces per square foot (1 oz = 35 µm, common practice). */
        public static Trace ofCopperWeight(double width, double ounces, ConductorMaterial material) {
            return new Trace(width, ounces * OUNCE_COPPER_THICKNESS, material);
        }

        @Override
        public double metalArea() {
            return width * thickness;
        }

        @Override
        public double footprintWidth() {
            return width;
        }

        @Override
        public double footprintHeight() {
            return thickness;
        }

        /** GMD of a rectangle ≈ 0.2235 (w + t) (Rosa &amp; Grover 1912; within 0.5 %). */
        @Override
        public double selfGmd() {
            return 0.2235 * (width + thickness);
        }

        @Override
        public String describe() {
            return String.format(java.util.Locale.ROOT, "trace %.4g mm x %.3g µm %s", width * 1e3, thickness * 1e6,
                    material.label());
        }

        @Override
        public List<String> problems() {
            List<String> p = new ArrayList<>();
            Checks.positive(p, "trace width", width);
            Checks.positive(p, "trace thickness", thickness);
            return p;
        }
    }
}
