package org.tankwright.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Arc2D;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;

/**
 * Circuit symbols drawn with lines on a Graphics2D, each centred on a point and running along x
 * ({@code vertical} false) or along y. Every symbol spans {@link #LENGTH} points between its leads.
 */
final class Symbols {
    static final float LENGTH = 30f;
    static final BasicStroke WIRE = new BasicStroke(1.0f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    static final BasicStroke THICK = new BasicStroke(1.8f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER);

    private Symbols() {
    }

    /** A zigzag resistor. */
    static void resistor(Graphics2D g, double cx, double cy, boolean vertical) {
        Path2D p = new Path2D.Double();
        int teeth = 6;
        double half = LENGTH / 2;
        double amp = 4;
        p.moveTo(-half, 0);
        p.lineTo(-half + 3, 0);
        double step = (LENGTH - 6) / teeth;
        for (int i = 0; i < teeth; i++) {
            p.lineTo(-half + 3 + step * (i + 0.5), (i % 2 == 0 ? -amp : amp));
        }
        p.lineTo(half - 3, 0);
        p.lineTo(half, 0);
        draw(g, p, cx, cy, vertical, WIRE);
    }

    /** Two plates across the line. */
    static void capacitor(Graphics2D g, double cx, double cy, boolean vertical) {
        double gap = 2.5;
        double plate = 8;
        Path2D leads = new Path2D.Double();
        leads.moveTo(-LENGTH / 2, 0);
        leads.lineTo(-gap, 0);
        leads.moveTo(gap, 0);
        leads.lineTo(LENGTH / 2, 0);
        draw(g, leads, cx, cy, vertical, WIRE);
        Path2D plates = new Path2D.Double();
        plates.moveTo(-gap, -plate);
        plates.lineTo(-gap, plate);
        plates.moveTo(gap, -plate);
        plates.lineTo(gap, plate);
        draw(g, plates, cx, cy, vertical, THICK);
    }

    /** Four half-turns bulging to the {@code side} (+1 right/down of the line, −1 left/up). */
    static void inductor(Graphics2D g, double cx, double cy, boolean vertical, int side) {
        Path2D p = new Path2D.Double();
        int humps = 4;
        double d = LENGTH / humps;
        for (int i = 0; i < humps; i++) {
            double x0 = -LENGTH / 2 + i * d;
            // a half circle from x0 to x0 + d, on the chosen side
            Arc2D arc = new Arc2D.Double(x0, -d / 2, d, d, 180, side > 0 ? 180 : -180, Arc2D.OPEN);
            p.append(arc, true);
        }
        draw(g, p, cx, cy, vertical, WIRE);
    }

    /** A circle with a sine inside (a voltage source) or an arrow (a current source, pointing to −y). */
    static void source(Graphics2D g, double cx, double cy, boolean current) {
        double r = 11;
        g.setStroke(WIRE);
        g.draw(new Line2D.Double(cx, cy - LENGTH / 2 - 2, cx, cy - r));
        g.draw(new Line2D.Double(cx, cy + r, cx, cy + LENGTH / 2 + 2));
        g.draw(new Ellipse2D.Double(cx - r, cy - r, 2 * r, 2 * r));
        Path2D p = new Path2D.Double();
        if (current) {
            p.moveTo(cx, cy + 6);
            p.lineTo(cx, cy - 6);
            p.moveTo(cx - 3, cy - 2.5);
            p.lineTo(cx, cy - 6);
            p.lineTo(cx + 3, cy - 2.5);
        } else {
            p.moveTo(cx - 6, cy);
            for (int i = 1; i <= 24; i++) {
                double t = i / 24.0;
                p.lineTo(cx - 6 + 12 * t, cy - 3.5 * Math.sin(2 * Math.PI * t));
            }
        }
        g.draw(p);
    }

    /** A filled dot (a junction, or an inductor's start terminal). */
    static void dot(Graphics2D g, double x, double y, double r) {
        g.fill(new Ellipse2D.Double(x - r, y - r, 2 * r, 2 * r));
    }

    private static void draw(Graphics2D g, Path2D shape, double cx, double cy, boolean vertical, BasicStroke stroke) {
        Graphics2D c = (Graphics2D) g.create();
        c.translate(cx, cy);
        if (vertical) {
            c.rotate(Math.PI / 2);
        }
        c.setStroke(stroke);
        c.setColor(g.getColor() == null ? Color.BLACK : g.getColor());
        c.draw(shape);
        c.dispose();
    }
}
