package org.tankwright.ui.drawing;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import javax.swing.JComponent;
import javax.swing.UIManager;
import org.tankwright.units.Quantities;

/**
 * A to-scale drawing of the coils: the top view (looking down the axis: every turn with the
 * wire's width, the lateral offset) beside the side view (a section through the axes: wire
 * cross-sections, ferrite plates or shields, the workpiece, the distance between the windings).
 * Both views share one scale, shown by a scale bar.
 */
public final class CoilDrawing extends JComponent {

    private static final int M = 26;
    private static final int MAX_DRAWN = 400;
    /** Room right of the side view for the distance label. */
    private static final int DIM_ROOM = 64;
    private static final Color COPPER = new Color(0xc87533);
    /** The second coil, translucent so that the first shows through in the top view. */
    private static final Color SECOND = new Color(0x4f86c6 & 0xffffff | 0xb0000000, true);
    private CoilSketch sketch;
    private String emptyText = "No coil geometry in this design";

    public CoilDrawing() {
        setName("coilDrawing");
        setPreferredSize(new Dimension(380, 280));
        setMinimumSize(new Dimension(220, 160));
    }

    /** Shows {@code s}; when it is null, {@code whyNone} says why. */
    public void show(CoilSketch s, String whyNone) {
        sketch = s;
        if (whyNone != null) {
            emptyText = whyNone;
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
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setColor(color("Panel.background", Color.WHITE));
            g.fillRect(0, 0, getWidth(), getHeight());
            g.setFont(font());
            if (sketch == null || sketch.coils().isEmpty()) {
                g.setColor(color("Label.disabledForeground", Color.GRAY));
                g.drawString(emptyText, M, getHeight() / 2);
                return;
            }
            paintViews(g);
        } finally {
            g.dispose();
        }
    }

    private void paintViews(Graphics2D g) {
        Color fg = color("Label.foreground", Color.BLACK);
        Color bg = color("Panel.background", Color.WHITE);
        Extent e = Extent.of(sketch);
        boolean stacked = getHeight() > getWidth() * 0.75;
        double viewW = stacked ? getWidth() - 2.0 * M - DIM_ROOM : (getWidth() - 3.0 * M - DIM_ROOM) / 2.0;
        double viewH = stacked ? (getHeight() - 3.0 * M - 40) / 2.0 : getHeight() - 2.0 * M - 24;
        double scale = Math.max(1e-9, Math.min(viewW / e.width(), viewH / Math.max(e.depth(), e.height())));
        double topX = M + viewW / 2;
        double topY = M + 16 + viewH / 2;
        double sideX = stacked ? topX : 2 * M + viewW + viewW / 2;
        double sideY = stacked ? 2 * M + 32 + viewH + viewH / 2 : topY;
        View top = new View(topX - e.midX() * scale, topY + e.midY() * scale, scale);
        View side = new View(sideX - e.midX() * scale, sideY + e.midZ() * scale, scale);

        g.setColor(fg);
        g.drawString("top view", M, M);
        g.drawString("side view (section along x)", (int) (stacked ? M : 2 * M + viewW), (int) (stacked ? 2 * M + 16 + viewH : M));

        Color ferrite = blend(bg, fg, 0.45);
        Color shield = blend(bg, new Color(0x5a8fd0), 0.6);
        Color steel = blend(bg, new Color(0x8a8f98), 0.8);
        if (sketch.workpiece() != null) {
            paintBar(g, top, side, sketch.workpiece(), steel, fg);
        }
        for (CoilSketch.Coil c : sketch.coils()) {
            if (c.backing() != null) {
                paintPlate(g, top, side, c, c.backing().magnetic() ? ferrite : shield);
            }
        }
        for (int i = 0; i < sketch.coils().size(); i++) {
            CoilSketch.Coil c = sketch.coils().get(i);
            Color wire = i == 0 ? COPPER : SECOND;
            paintTop(g, top, c, wire);
            paintSide(g, side, c, wire, fg);
        }
        paintDimensions(g, side, fg);
        paintScaleBar(g, scale, fg);
    }

    /** Screen position of a point: x right, y (top view) or z (side view) up. */
    private record View(double ox, double oy, double s) {
        double x(double mx) {
            return ox + mx * s;
        }

        double y(double my) {
            return oy - my * s;
        }
    }

    private void paintTop(Graphics2D g, View v, CoilSketch.Coil c, Color wire) {
        int n = drawnTurns(c);
        g.setColor(wire);
        g.setStroke(new BasicStroke((float) Math.max(1.0, c.wireDiameter() * v.s())));
        int rings = c.winding() == CoilSketch.Winding.AXIAL ? c.layers() : n;
        for (int i = 0; i < rings; i++) {
            double r = radius(c, i, rings);
            g.draw(outline(c, v.x(c.x()), v.y(c.y()), r, v.s()));
        }
    }

    /** One turn of radius {@code rm} (metres) seen from above, at scale {@code s} pixels per metre. */
    private static Shape outline(CoilSketch.Coil c, double cx, double cy, double rm, double s) {
        double r = rm * s;
        if (c.sides() == 0) {
            return new Ellipse2D.Double(cx - r, cy - r, 2 * r, 2 * r);
        }
        if (c.sides() == 4) {
            double span = c.outerRadius() - c.innerRadius();
            double t = span > 0 ? (rm - c.innerRadius()) / span : 1;
            double h = r * (c.innerAspect() + (c.aspect() - c.innerAspect()) * t);
            return new Rectangle2D.Double(cx - r, cy - h, 2 * r, 2 * h);
        }
        Path2D.Double p = new Path2D.Double();
        double vertex = r / Math.cos(Math.PI / c.sides());
        for (int k = 0; k < c.sides(); k++) {
            double a = Math.PI / c.sides() + 2 * Math.PI * k / c.sides();
            double px = cx + vertex * Math.cos(a);
            double py = cy + vertex * Math.sin(a);
            if (k == 0) {
                p.moveTo(px, py);
            } else {
                p.lineTo(px, py);
            }
        }
        p.closePath();
        return p;
    }

    private void paintSide(Graphics2D g, View v, CoilSketch.Coil c, Color wire, Color fg) {
        double d = c.wireDiameter();
        double rr = Math.max(0.8, d * v.s() / 2);
        g.setColor(wire);
        if (c.winding() == CoilSketch.Winding.FLAT) {
            int n = drawnTurns(c);
            for (int i = 0; i < n; i++) {
                double r = radius(c, i, n);
                for (double sgn : new double[] {-1, 1}) {
                    g.fill(new Ellipse2D.Double(v.x(c.x() + sgn * r) - rr, v.y(c.z()) - rr, 2 * rr, 2 * rr));
                }
            }
        } else {
            int perLayer = (int) Math.ceil(c.turns() / Math.max(1, c.layers()));
            for (int l = 0; l < c.layers(); l++) {
                double r = radius(c, l, c.layers());
                if (perLayer > MAX_DRAWN) {
                    for (double sgn : new double[] {-1, 1}) {
                        g.fill(new Rectangle2D.Double(v.x(c.x() + sgn * r) - rr, v.y(c.z() + c.length() / 2), 2 * rr, c.length() * v.s()));
                    }
                    continue;
                }
                for (int j = 0; j < perLayer; j++) {
                    double z = c.z() - c.length() / 2 + d / 2 + (perLayer == 1 ? 0 : j * (c.length() - d) / (perLayer - 1));
                    for (double sgn : new double[] {-1, 1}) {
                        g.fill(new Ellipse2D.Double(v.x(c.x() + sgn * r) - rr, v.y(z) - rr, 2 * rr, 2 * rr));
                    }
                }
            }
        }
        g.setColor(fg);
        g.setStroke(new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {8f, 3f, 2f, 3f}, 0f));
        double reach = Math.max(d, c.length()) / 2 + (c.backing() != null ? c.backing().distance() + c.backing().thickness() : 0);
        double ax = v.x(c.x());
        g.draw(new Line2D.Double(ax, v.y(c.z() - reach) + 8, ax, v.y(c.z() + reach) - 8));
        float ly = (float) (c.backBelow() ? v.y(c.z() - reach) + 20 : v.y(c.z() + reach) - 12);
        g.drawString(c.label(), (float) ax + 4, ly);
    }

    private void paintPlate(Graphics2D g, View top, View side, CoilSketch.Coil c, Color color) {
        CoilSketch.Plate p = c.backing();
        double reach = c.winding() == CoilSketch.Winding.AXIAL ? c.length() / 2 : 0;
        double face = c.backBelow() ? c.z() - reach - p.distance() : c.z() + reach + p.distance();
        double far = c.backBelow() ? face - p.thickness() : face + p.thickness();
        g.setColor(color);
        double h = p.halfSize();
        g.fill(new Rectangle2D.Double(side.x(c.x() - h), side.y(Math.max(face, far)), 2 * h * side.s(),
                Math.max(1.0, p.thickness() * side.s())));
        g.setStroke(new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {4f, 3f}, 0f));
        g.draw(new Rectangle2D.Double(top.x(c.x() - h), top.y(c.y() + h), 2 * h * top.s(), 2 * h * top.s()));
    }

    private void paintBar(Graphics2D g, View top, View side, CoilSketch.Bar b, Color steel, Color fg) {
        g.setColor(steel);
        double r = b.radius();
        g.fill(new Ellipse2D.Double(top.x(-r), top.y(r), 2 * r * top.s(), 2 * r * top.s()));
        g.fill(new Rectangle2D.Double(side.x(-r), side.y(b.length() / 2), 2 * r * side.s(), b.length() * side.s()));
        Color bg = color("Panel.background", Color.WHITE);
        if (b.innerRadius() > 0) {
            double q = b.innerRadius();
            g.setColor(bg);
            g.fill(new Ellipse2D.Double(top.x(-q), top.y(q), 2 * q * top.s(), 2 * q * top.s()));
            g.fill(new Rectangle2D.Double(side.x(-q), side.y(b.length() / 2), 2 * q * side.s(), b.length() * side.s()));
        }
        g.setColor(fg);
        g.drawString("workpiece", (float) side.x(r) + 4, (float) side.y(b.length() / 2) + 12);
    }

    private void paintDimensions(Graphics2D g, View v, Color fg) {
        if (sketch.coils().size() < 2 || !Double.isFinite(sketch.distance())) {
            return;
        }
        CoilSketch.Coil a = sketch.coils().get(0);
        CoilSketch.Coil b = sketch.coils().get(1);
        g.setColor(fg);
        g.setStroke(new BasicStroke(1f));
        double right = Math.max(a.x() + a.outerRadius(), b.x() + b.outerRadius()) + Math.max(a.wireDiameter(), b.wireDiameter());
        double x = v.x(right) + 8;
        double ya = v.y(a.z());
        double yb = v.y(b.z());
        g.draw(new Line2D.Double(x, ya, x, yb));
        g.draw(new Line2D.Double(x - 4, ya, x + 4, ya));
        g.draw(new Line2D.Double(x - 4, yb, x + 4, yb));
        String gap = Quantities.format(sketch.distance(), org.tankwright.units.Dimension.LENGTH, 3);
        g.drawString(gap, (float) x + 6, (float) ((ya + yb) / 2 + 4));
        if (Double.isFinite(sketch.offset()) && sketch.offset() != 0) {
            double y = Math.max(ya, yb) + 18;
            g.draw(new Line2D.Double(v.x(a.x()), y, v.x(b.x()), y));
            g.drawString("offset " + Quantities.format(sketch.offset(), org.tankwright.units.Dimension.LENGTH, 3),
                    (float) Math.min(v.x(a.x()), v.x(b.x())), (float) y + 14);
        }
    }

    private void paintScaleBar(Graphics2D g, double scale, Color fg) {
        double target = 90 / scale;
        double pow = Math.pow(10, Math.floor(Math.log10(target)));
        double step = target / pow >= 5 ? 5 * pow : target / pow >= 2 ? 2 * pow : pow;
        int px = (int) Math.round(step * scale);
        int y = getHeight() - 12;
        g.setColor(fg);
        g.setStroke(new BasicStroke(2f));
        g.drawLine(M, y, M + px, y);
        g.drawLine(M, y - 4, M, y + 4);
        g.drawLine(M + px, y - 4, M + px, y + 4);
        g.drawString(Quantities.format(step, org.tankwright.units.Dimension.LENGTH, 2) + " (both views to this scale)",
                M + px + 8, y + 4);
    }

    private static int drawnTurns(CoilSketch.Coil c) {
        return Math.max(1, Math.min(MAX_DRAWN, (int) Math.ceil(c.turns() - 1e-9)));
    }

    /** Radius of ring {@code i} of {@code n}: evenly from the inner to the outer turn. */
    static double radius(CoilSketch.Coil c, int i, int n) {
        return n <= 1 ? c.innerRadius() : c.innerRadius() + (c.outerRadius() - c.innerRadius()) * i / (n - 1);
    }

    private Font font() {
        Font f = UIManager.getFont("Label.font");
        return f != null ? f.deriveFont(f.getSize2D() - 1f) : new Font(Font.SANS_SERIF, Font.PLAIN, 11);
    }

    private static Color color(String key, Color fallback) {
        Color c = UIManager.getColor(key);
        return c != null ? c : fallback;
    }

    private static Color blend(Color a, Color b, double t) {
        return new Color((int) (a.getRed() + (b.getRed() - a.getRed()) * t), (int) (a.getGreen() + (b.getGreen() - a.getGreen()) * t),
                (int) (a.getBlue() + (b.getBlue() - a.getBlue()) * t));
    }

    /** What is drawn, in metres: x and y (top view), z (side view). */
    record Extent(double minX, double maxX, double minY, double maxY, double minZ, double maxZ) {
        double width() {
            return Math.max(1e-6, maxX - minX);
        }

        double depth() {
            return Math.max(1e-6, maxY - minY);
        }

        double height() {
            return Math.max(1e-6, maxZ - minZ);
        }

        double midX() {
            return (minX + maxX) / 2;
        }

        double midY() {
            return (minY + maxY) / 2;
        }

        double midZ() {
            return (minZ + maxZ) / 2;
        }

        static Extent of(CoilSketch s) {
            double x0 = Double.MAX_VALUE;
            double x1 = -Double.MAX_VALUE;
            double y0 = Double.MAX_VALUE;
            double y1 = -Double.MAX_VALUE;
            double z0 = Double.MAX_VALUE;
            double z1 = -Double.MAX_VALUE;
            for (CoilSketch.Coil c : s.coils()) {
                double r = (c.outerRadius() + c.wireDiameter() / 2) * (c.sides() == 0 || c.sides() == 4 ? 1 : 1.09);
                double ry = r * c.aspect();
                double zr = Math.max(c.wireDiameter(), c.length()) / 2;
                double back = 0;
                if (c.backing() != null) {
                    r = Math.max(r, c.backing().halfSize());
                    ry = Math.max(ry, c.backing().halfSize());
                    back = c.backing().distance() + c.backing().thickness() + (c.winding() == CoilSketch.Winding.AXIAL ? c.length() / 2 : 0);
                }
                x0 = Math.min(x0, c.x() - r);
                x1 = Math.max(x1, c.x() + r);
                y0 = Math.min(y0, c.y() - ry);
                y1 = Math.max(y1, c.y() + ry);
                z0 = Math.min(z0, c.z() - (c.backBelow() ? Math.max(zr, back) : zr));
                z1 = Math.max(z1, c.z() + (c.backBelow() ? zr : Math.max(zr, back)));
            }
            if (s.workpiece() != null) {
                x0 = Math.min(x0, -s.workpiece().radius());
                x1 = Math.max(x1, s.workpiece().radius());
                z0 = Math.min(z0, -s.workpiece().length() / 2);
                z1 = Math.max(z1, s.workpiece().length() / 2);
            }
            double px = 0.1 * (x1 - x0);
            double pz = 0.25 * Math.max(z1 - z0, 0.2 * (x1 - x0));
            return new Extent(x0 - px, x1 + px, y0 - px, y1 + px, z0 - pz, z1 + pz);
        }
    }
}
