package org.tankwright.ui.drawing;

import java.util.ArrayList;
import java.util.List;
import org.tankwright.design.Backing;
import org.tankwright.design.Coil;
import org.tankwright.design.Design;
import org.tankwright.design.Enums.BackingKind;
import org.tankwright.design.Enums.CoilShape;
import org.tankwright.design.Placement;
import org.tankwright.design.Wire;
import org.tankwright.design.Workpiece;

/** Reads the drawing's geometry from a design, following the coil conventions of {@link Coil}. */
public final class Sketches {

    /** The sketch, or why there is none. */
    public record Outcome(CoilSketch sketch, String whyNone) { }

    private Sketches() {
    }

    public static Outcome of(Design d) {
        List<CoilSketch.Coil> coils = new ArrayList<>();
        Placement p = d.placement();
        double distance = p != null && p.distance() != null ? p.distance() : Double.NaN;
        double offX = p != null ? p.offsetX() : 0;
        double offY = p != null ? p.offsetY() : 0;
        CoilSketch.Coil primary = coil(d.primary(), 0, 0, 0, true);
        Workpiece w = d.workpiece();
        if (primary != null && w != null && w.isPlate() && primary.backing() == null && w.diameter() != null
                && w.thickness() != null && w.gap() != null) {
            // a heater's plate sits below its flat coil: drawn where a backing plate would be
            CoilSketch.Coil c = primary;
            primary = new CoilSketch.Coil(c.label(), c.winding(), c.sides(), c.aspect(), c.innerAspect(), c.innerRadius(),
                    c.outerRadius(), c.turns(), c.layers(), c.wireDiameter(), c.length(), c.x(), c.y(), c.z(), true,
                    new CoilSketch.Plate(w.diameter() / 2, w.thickness(), w.gap(), false));
        }
        if (primary != null) {
            coils.add(primary);
        }
        if (d.secondary() != null) {
            double z = Double.isFinite(distance) ? distance : drawnGap(d);
            CoilSketch.Coil secondary = coil(d.secondary(), offX, offY, z, false);
            if (secondary != null) {
                coils.add(secondary);
            }
        }
        if (coils.isEmpty()) {
            return new Outcome(null, "Measured coils have no geometry to draw");
        }
        CoilSketch.Bar bar = w == null || w.isPlate() || w.length() == null ? null : new CoilSketch.Bar(w.diameter() / 2, w.innerDiameter() / 2, w.length());
        return new Outcome(new CoilSketch(coils, d.secondary() != null ? distance : Double.NaN,
                d.secondary() != null ? offX : Double.NaN, bar), null);
    }

    /** Where to draw a secondary whose distance is not given (coupling entered as measured). */
    private static double drawnGap(Design d) {
        return Math.max(size(d.primary()), size(d.secondary())) * 0.3;
    }

    private static double size(Coil c) {
        return c == null || c.diameter() == null ? 0.01 : c.diameter() / 2;
    }

    private static CoilSketch.Coil coil(Coil c, double x, double y, double z, boolean backBelow) {
        if (c == null || c.shape() == null || c.shape() == CoilShape.MEASURED) {
            return null;
        }
        double turns = c.turns() != null ? c.turns() : 1;
        double w = wireDiameter(c.wire(), c);
        String label = c.label() != null ? c.label() : backBelow ? "primary" : "secondary";
        CoilSketch.Plate plate = plate(c.backing(), c);
        switch (c.shape()) {
            case SOLENOID -> {
                double len = c.length() != null ? c.length() : c.pitch() != null ? c.pitch() * turns : turns * w;
                double r = c.diameter() / 2;
                return new CoilSketch.Coil(label, CoilSketch.Winding.AXIAL, 0, 1, 1, r, r, turns, 1, w, len, x, y, z, backBelow, plate);
            }
            case MULTILAYER -> {
                int layers = c.layers() != null ? c.layers() : 1;
                double r0 = c.diameter() / 2 + w / 2;
                double len = c.length() != null ? c.length() : Math.ceil(turns / layers) * w;
                return new CoilSketch.Coil(label, CoilSketch.Winding.AXIAL, 0, 1, 1, r0, r0 + (layers - 1) * w, turns, layers,
                        w, len, x, y, z, backBelow, plate);
            }
            case LOOP -> {
                double r = c.diameter() / 2;
                return new CoilSketch.Coil(label, CoilSketch.Winding.FLAT, 0, 1, 1, r, r, turns, 1, w, 0, x, y, z, backBelow, plate);
            }
            case RECT_SPIRAL -> {
                double outer = c.width() / 2 - w / 2;
                double inner = c.innerWidth() / 2 + w / 2;
                double outerY = c.height() / 2 - w / 2;
                double innerY = c.innerHeight() / 2 + w / 2;
                return new CoilSketch.Coil(label, CoilSketch.Winding.FLAT, 4, outerY / outer, innerY / inner, inner, outer, turns, 1,
                        w, 0, x, y, z, backBelow, plate);
            }
            default -> {
                int sides = switch (c.shape()) {
                    case SQUARE_SPIRAL -> 4;
                    case HEX_SPIRAL -> 6;
                    case OCTAGON_SPIRAL -> 8;
                    default -> 0;
                };
                double outer = c.diameter() / 2 - w / 2;
                double inner = c.innerDiameter() != null ? c.innerDiameter() / 2 + w / 2 : outer;
                return new CoilSketch.Coil(label, CoilSketch.Winding.FLAT, sides, 1, 1, inner, outer, turns, 1, w, 0, x, y, z,
                        backBelow, plate);
            }
        }
    }

    /** The conductor's outer size as given; a gauge number alone is drawn at the winding's pitch. */
    private static double wireDiameter(Wire wire, Coil c) {
        if (wire != null) {
            if (wire.outerDiameter() != null) {
                return wire.outerDiameter();
            }
            if (wire.diameter() != null) {
                return wire.diameter();
            }
            if (wire.width() != null) {
                return wire.width();
            }
        }
        if (c.pitch() != null) {
            return c.pitch() * 0.8;
        }
        if (c.diameter() != null && c.innerDiameter() != null && c.turns() != null) {
            return 0.8 * (c.diameter() - c.innerDiameter()) / 2 / c.turns();
        }
        return c.diameter() != null ? c.diameter() * 0.02 : 0.001;
    }

    private static CoilSketch.Plate plate(Backing b, Coil c) {
        if (b == null) {
            return null;
        }
        double across = b.size() != null ? b.size() : c.diameter() != null ? c.diameter() * 1.1
                : c.width() != null ? c.width() * 1.1 : 0.05;
        return new CoilSketch.Plate(across / 2, b.thickness(), b.distance(), b.kind() == BackingKind.FERRITE);
    }
}
