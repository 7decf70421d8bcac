package org.tankwright.ui.drawing;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import javax.swing.JComponent;
import javax.swing.UIManager;
import org.tankwright.units.Quantities;

/**
 * A to-scale drawing of the coils: the top view (looking down the axis: every turn, the wire's
 * width, the offset) beside the side view (a section through the axes: wire cross-sections,
 * ferrite plates, the gap). Both views share one scale, shown by a scale bar.
 */
public final class CoilDrawing extends JComponent {

    private static final int MARGIN = 28;
    private CoilSketch sketch;
    private String emptyText = "No coil geometry in this design";

    public CoilDrawing() {
        setName("coilDrawing");
        setPreferredSize(new Dimension(420, 260));
        setMinimumSize(new Dimension(200, 140));
    }

    /** Shows {@code s} (null shows {@code whyEmpty}). */
    public void show(CoilSketch s, String whyEmpty) {
        this.sketch = s;
        if (whyEmpty != null) {
            emptyText = whyEmpty;
        }
        repaint();
    }

    public CoilSketch sketch() {
        return sketch;
    }

    @Override
    protected void paintComponent(Graphics g0) {
        Graphics2D g = (Graphics2D) g0.create();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
            g.setColor(color("Panel.background", Color.WHITE));
            g.fillRect(0, 0, getWidth(), getHeight());
            Color fg = color("Label.foreground", Color.BLACK);
            g.setFont(font());
            if (sketch == null || sketch.coils().isEmpty()) {
                g.setColor(color("Label.disabledForeground", Color.GRAY));
                g.drawString(emptyText, MARGIN, getHeight() / 2);
                return;
            }
            paintViews(g, fg);
        } finally {
            g.dispose();
        }
    }

    private void paintViews(Graphics2D g, Color fg) {
        Bounds b = Bounds.of(sketch);
        int w = getWidth() - 3 * MARGIN;
        int h = getHeight() - 2 * MARGIN - 18;
        double viewW = w / 2.0;
        // one scale for both views: top view spans b.width × b.depth, side view b.width × b.height
        double scale = Math.min(viewW / b.width(), h / Math.max(b.depth(), b.height()));
        double topCx = MARGIN + viewW / 2.0;
        double sideCx = 2 * MARGIN + viewW + viewW / 2.0;
        double cy = MARGIN + 14 + h / 2.0;
        double midX = (b.minX() + b.maxX()) / 2.0;
        double midZ = (b.minZ() + b.maxZ()) / 2.0;

        g.setColor(fg);
        g.drawString("top view", MARGIN, MARGIN);
        g.drawString("side view (section)", (int) (2 * MARGIN + viewW), MARGIN);

        Color wire = color("Component.accentColor", new Color(0xc8741b));
        Color ferrite = color("Label.disabledForeground", Color.GRAY);
        for (CoilSketch.Coil c : sketch.coils()) {
            paintTop(g, c, topCx + (c.x() - midX) * scale, cy, scale, copper(wire));
            paintSide(g, c, sideCx, cy, midX, midZ, scale, copper(wire), ferrite, fg);
        }
        paintDimensions(g, sideCx, cy, midX, midZ, scale, fg);
        paintScaleBar(g, scale, fg);
    }

    private static Color copper(Color accent) {
        return new Color(0xc8741b).equals(accent) ? accent : new Color(0xd08a3a);
    }

    private void paintTop(Graphics2D g, CoilSketch.Coil c, double cx, double cy, double scale, Color wire) {
        float strokeW = (float) Math.max(1.0, c.wireDiameter() * scale);
        g.setStroke(new BasicStroke(strokeW));
        g.setColor(wire);
        int n = Math.max(1, (int) Math.ceil(c.turns()));
        for (int i = 0; i < n; i++) {
            double r = radiusOfTurn(c, i, n);
            g.draw(new Ellipse2D.Double(cx - r * scale, cy - r * scale, 2 * r * scale, 2 * r * scale));
        }
        if (c.ferrite() != null) {
            g.setStroke(new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {4f, 3f}, 0f));
            g.setColor(color("Label.disabledForeground", Color.GRAY));
            double r = c.ferrite().radius() * scale;
            g.draw(new Rectangle2D.Double(cx - r, cy - r, 2 * r, 2 * r));
        }
    }

    private void paintSide(Graphics2D g, CoilSketch.Coil c, double cx, double cy, double midX, double midZ,
                           double scale, Color wire, Color ferrite, Color fg) {
        int n = Math.max(1, (int) Math.ceil(c.turns()));
        double d = c.wireDiameter();
        double sign = c.facingUp() ? -1 : 1; // windings extend away from the other coil
        g.setColor(wire);
        for (int i = 0; i < n; i++) {
            double r = radiusOfTurn(c, i, n);
            double z = c.winding() == CoilSketch.Winding.HELIX
                    ? c.z() + sign * (d / 2 + (n == 1 ? 0 : i * (c.length() - d) / (n - 1)))
                    : c.z() + sign * d / 2;
            for (double side : new double[] {-1, 1}) {
                double px = cx + (c.x() + side * r - midX) * scale;
                double py = cy - (z - midZ) * scale;
                double rr = Math.max(1.0, d * scale / 2);
                g.fill(new Ellipse2D.Double(px - rr, py - rr, 2 * rr, 2 * rr));
            }
        }
        if (c.ferrite() != null) {
            CoilSketch.Ferrite f = c.ferrite();
            double depth = c.winding() == CoilSketch.Winding.HELIX ? c.length() : d;
            double z0 = c.z() + sign * (depth + f.spacing());
            double z1 = z0 + sign * f.thickness();
            double top = Math.max(z0, z1);
            g.setColor(ferrite);
            g.fill(new Rectangle2D.Double(cx + (c.x() - f.radius() - midX) * scale, cy - (top - midZ) * scale,
                    2 * f.radius() * scale, Math.max(1.0, f.thickness() * scale)));
        }
        g.setColor(fg);
        g.setStroke(new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {6f, 3f, 2f, 3f}, 0f));
        double ax = cx + (c.x() - midX) * scale;
        double zEnd = c.z() + sign * Math.max(d, c.length());
        g.draw(new Line2D.Double(ax, cy - (c.z() - midZ) * scale + 6, ax, cy - (zEnd - midZ) * scale - 6));
        g.drawString(c.label(), (float) (ax + 4), (float) (cy - (zEnd - midZ) * scale + (c.facingUp() ? 14 : -4)));
    }

    private void paintDimensions(Graphics2D g, double cx, double cy, double midX, double midZ, double scale, Color fg) {
        if (sketch.coils().size() < 2) {
            return;
        }
        CoilSketch.Coil a = sketch.coils().get(0);
        CoilSketch.Coil b = sketch.coils().get(1);
        g.setColor(fg);
        g.setStroke(new BasicStroke(1f));
        double xRight = cx + (Math.max(a.x() + a.outerRadius(), b.x() + b.outerRadius()) - midX) * scale + 10;
        double ya = cy - (a.z() - midZ) * scale;
        double yb = cy - (b.z() - midZ) * scale;
        if (Double.isFinite(sketch.gap())) {
            g.draw(new Line2D.Double(xRight, ya, xRight, yb));
            g.draw(new Line2D.Double(xRight - 4, ya, xRight + 4, ya));
            g.draw(new Line2D.Double(xRight - 4, yb, xRight + 4, yb));
            g.drawString("gap " + Quantities.format(sketch.gap(), org.tankwright.units.Dimension.LENGTH, 3),
                    (float) xRight - 30, (float) ((ya + yb) / 2 + 4));
        }
        if (Double.isFinite(sketch.offset()) && sketch.offset() != 0) {
            double x0 = cx + (a.x() - midX) * scale;
            double x1 = cx + (b.x() - midX) * scale;
            double yo = Math.max(ya, yb) + 14;
            g.draw(new Line2D.Double(x0, yo, x1, yo));
            g.drawString("offset " + Quantities.format(sketch.offset(), org.tankwright.units.Dimension.LENGTH, 3),
                    (float) Math.min(x0, x1), (float) yo + 13);
        }
    }

    private void paintScaleBar(Graphics2D g, double scale, Color fg) {
        double target = 80 / scale; // metres shown by ~80 px
        double pow = Math.pow(10, Math.floor(Math.log10(target)));
        double step = target / pow >= 5 ? 5 * pow : target / pow >= 2 ? 2 * pow : pow;
        int px = (int) Math.round(step * scale);
        int y = getHeight() - 10;
        g.setColor(fg);
        g.setStroke(new BasicStroke(2f));
        g.drawLine(MARGIN, y, MARGIN + px, y);
        g.drawString(Quantities.format(step, org.tankwright.units.Dimension.LENGTH, 2), MARGIN + px + 6, y + 4);
    }

    /** Radius of turn {@code i} of {@code n}: evenly from inner to outer (a helix keeps one radius). */
    static double radiusOfTurn(CoilSketch.Coil c, int i, int n) {
        if (c.winding() == CoilSketch.Winding.HELIX || n == 1) {
            return c.innerRadius();
        }
        return c.innerRadius() + (c.outerRadius() - c.innerRadius()) * i / (n - 1);
    }

    private Font font() {
        Font f = UIManager.getFont("Label.font");
        return f != null ? f.deriveFont(f.getSize2D() - 1f) : new Font(Font.SANS_SERIF, Font.PLAIN, 11);
    }

    private static Color color(String key, Color fallback) {
        Color c = UIManager.getColor(key);
        return c != null ? c : fallback;
    }

    /** The extent of everything drawn, in metres. */
    record Bounds(double minX, double maxX, double minZ, double maxZ, double depth) {
        double width() {
            return Math.max(1e-6, maxX - minX);
        }

        double height() {
            return Math.max(1e-6, maxZ - minZ);
        }

        static Bounds of(CoilSketch s) {
            double minX = Double.MAX_VALUE;
            double maxX = -Double.MAX_VALUE;
            double minZ = Double.MAX_VALUE;
            double maxZ = -Double.MAX_VALUE;
            double depth = 0;
            for (CoilSketch.Coil c : s.coils()) {
                double r = c.outerRadius() + c.wireDiameter() / 2;
                if (c.ferrite() != null) {
                    r = Math.max(r, c.ferrite().radius());
                }
                minX = Math.min(minX, c.x() - r);
                maxX = Math.max(maxX, c.x() + r);
                depth = Math.max(depth, 2 * r);
                double sign = c.facingUp() ? -1 : 1;
                double back = Math.max(c.wireDiameter(), c.length())
                        + (c.ferrite() != null ? c.ferrite().spacing() + c.ferrite().thickness() : 0);
                minZ = Math.min(minZ, Math.min(c.z(), c.z() + sign * back));
                maxZ = Math.max(maxZ, Math.max(c.z(), c.z() + sign * back));
            }
            double padX = 0.08 * (maxX - minX);
            double padZ = 0.15 * Math.max(maxZ - minZ, 1e-3);
            return new Bounds(minX - padX, maxX + padX, minZ - padZ, maxZ + padZ, depth * 1.08);
        }
    }
}
