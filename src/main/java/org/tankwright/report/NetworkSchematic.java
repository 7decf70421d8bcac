package org.tankwright.report;

import org.tankwright.design.Enums.Topology;
import org.tankwright.report.TunedNetwork.Kind;
import org.tankwright.report.TunedNetwork.Part;
import org.tankwright.units.Dimension;

import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.geom.Line2D;
import java.util.ArrayList;
import java.util.List;

/**
 * The schematic of a tuned network, drawn from its parts with every element's value: the
 * primary loop on the left (source, then its capacitor in series on the top wire or across
 * the coil), the coupled coils facing each other with their start terminals dotted, and the
 * secondary loop on the right (capacitor in series or across, then the load). A coil's
 * resistance and a bank's ESR are written beside the coil and the bank they belong to.
 */
final class NetworkSchematic {
    private static final float FONT = 7.6f;
    private static final float LINE = 9.2f;
    private static final float SYMBOL_HALF_WIDTH = 11f;
    private static final float COUPLING_GAP = 62f;

    /** A part drawn across the top wire. */
    private record Rail(Part part, List<String> label) {
    }

    /** A part drawn from the top wire down to the bottom wire; its label on the left or right. */
    private record Branch(Part part, List<String> label, boolean labelLeft, int side) {
    }

    private final TunedNetwork net;
    private final List<Object> primary = new ArrayList<>();
    private final List<Object> secondary = new ArrayList<>();

    NetworkSchematic(TunedNetwork net) {
        this.net = net;
        Topology t = net.topology();
        boolean link = net.isLink();
        Part src = net.part("V1") != null ? net.part("V1") : net.part("I1");
        primary.add(new Branch(src, sourceLabel(src), true, 0));
        if (net.part("RS") != null) {
            primary.add(new Rail(net.part("RS"), List.of("RS source", Fmt.build(net.part("RS").value(), Dimension.RESISTANCE))));
        }
        boolean parallel1 = t == Topology.PARALLEL || t == Topology.PS || t == Topology.PP;
        if (parallel1) {
            primary.add(new Branch(net.part("C1"), capLabel("C1"), false, 0));
        } else {
            primary.add(new Rail(net.part("C1"), capLabel("C1")));
        }
        // a vertical coil bulges toward the other coil: screen +x is local −y when rotated
        primary.add(new Branch(net.part("L1"), coilLabel("1"), link, -1));
        if (link) {
            secondary.add(new Branch(net.part("L2"), coilLabel("2"), false, 1));
            boolean parallel2 = t == Topology.SP || t == Topology.PP;
            if (parallel2) {
                secondary.add(new Branch(net.part("C2"), capLabel("C2"), false, 0));
            } else {
                secondary.add(new Rail(net.part("C2"), capLabel("C2")));
            }
            secondary.add(new Branch(net.part("RL"), List.of("RL load (AC)", Fmt.build(net.part("RL").value(), Dimension.RESISTANCE)), false, 0));
        }
    }

    /** The height the drawing needs, points. */
    float height() {
        int lines = 2;
        for (List<Object> side : List.of(primary, secondary)) {
            for (Object o : side) {
                lines = Math.max(lines, o instanceof Branch b ? b.label().size() : 0);
            }
        }
        return top() + Math.max(78f, lines * LINE + 34f) + 8f;
    }

    private float top() {
        int lines = 0;
        for (List<Object> side : List.of(primary, secondary)) {
            for (Object o : side) {
                if (o instanceof Rail r) {
                    lines = Math.max(lines, r.label().size());
                }
            }
        }
        return 6 + lines * LINE + 12;
    }

    /** Draws the schematic into a box of {@code width} × {@link #height()} points. */
    void paint(Graphics2D g, float width) {
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 10).deriveFont(FONT));
        g.setColor(Color.BLACK);
        FontMetrics fm = g.getFontMetrics();
        float h = height();
        float railTop = top();
        float railBottom = h - 8f;
        List<float[]> slotsP = slots(primary, fm);
        List<float[]> slotsS = slots(secondary, fm);
        float wP = total(slotsP);
        float wS = total(slotsS);
        float gap = Math.max(COUPLING_GAP, width(couplingLabel(), fm) + 30);
        float natural = wP + (secondary.isEmpty() ? 0 : gap + wS);
        float scale = Math.min(1f, width / natural);
        Graphics2D c = (Graphics2D) g.create();
        c.translate((width - natural * scale) / 2, 0);
        c.scale(scale, scale);
        float xL1 = drawSide(c, primary, slotsP, 0, railTop, railBottom, fm);
        if (!secondary.isEmpty()) {
            float xL2 = drawSide(c, secondary, slotsS, wP + gap, railTop, railBottom, fm);
            drawCoupling(c, xL1, xL2, railTop, railBottom, fm);
        }
        c.dispose();
    }

    /** For each item: {left label room, symbol half-width, right label room}. */
    private List<float[]> slots(List<Object> items, FontMetrics fm) {
        List<float[]> out = new ArrayList<>();
        for (Object o : items) {
            if (o instanceof Rail r) {
                float w = Math.max(Symbols.LENGTH + 10, width(r.label(), fm) + 8);
                out.add(new float[] {w / 2, 0, w / 2});
            } else if (o instanceof Branch b) {
                float lw = width(b.label(), fm) + 14;
                out.add(b.labelLeft() ? new float[] {lw, SYMBOL_HALF_WIDTH, 6} : new float[] {6, SYMBOL_HALF_WIDTH, lw});
            }
        }
        return out;
    }

    private static float total(List<float[]> slots) {
        float t = 0;
        for (float[] s : slots) {
            t += s[0] + 2 * s[1] + s[2];
        }
        return t;
    }

    /** Draws one loop; returns the x of its coil branch (last on the primary, first on the secondary). */
    private float drawSide(Graphics2D g, List<Object> items, List<float[]> slots, float x0, float top, float bottom,
                           FontMetrics fm) {
        float x = x0;
        float[] centres = new float[items.size()];
        for (int i = 0; i < items.size(); i++) {
            float[] s = slots.get(i);
            centres[i] = x + s[0] + s[1];
            x += s[0] + 2 * s[1] + s[2];
        }
        float first = centres[0];
        float last = centres[centres.length - 1];
        float mid = (top + bottom) / 2;
        for (int i = 0; i < items.size(); i++) {
            Object o = items.get(i);
            float cx = centres[i];
            g.setStroke(Symbols.WIRE);
            if (i > 0) {
                float from = centres[i - 1] + (items.get(i - 1) instanceof Rail ? Symbols.LENGTH / 2 : 0);
                float to = cx - (o instanceof Rail ? Symbols.LENGTH / 2 : 0);
                g.draw(new Line2D.Float(from, top, to, top));
            }
            if (o instanceof Rail r) {
                symbol(g, r.part(), cx, top, false, 1);
                label(g, r.label(), cx, top - 12 - (r.label().size() - 1) * LINE, true, false, fm);
            } else if (o instanceof Branch b) {
                g.draw(new Line2D.Float(cx, top, cx, mid - Symbols.LENGTH / 2));
                g.draw(new Line2D.Float(cx, mid + Symbols.LENGTH / 2, cx, bottom));
                symbol(g, b.part(), cx, mid, true, b.side());
                float textTop = mid - (b.label().size() * LINE) / 2 + FONT;
                if (b.labelLeft()) {
                    label(g, b.label(), cx - SYMBOL_HALF_WIDTH - 4, textTop, false, true, fm);
                } else {
                    label(g, b.label(), cx + SYMBOL_HALF_WIDTH + 4, textTop, false, false, fm);
                }
                if (i > 0 && i < items.size() - 1) {
                    Symbols.dot(g, cx, top, 1.8);
                    Symbols.dot(g, cx, bottom, 1.8);
                }
            }
        }
        g.setStroke(Symbols.WIRE);
        g.draw(new Line2D.Float(first, bottom, last, bottom));
        return items == primary ? last : first;
    }

    private void drawCoupling(Graphics2D g, float xL1, float xL2, float top, float bottom, FontMetrics fm) {
        float mid = (top + bottom) / 2;
        float start = mid - Symbols.LENGTH / 2;
        float end = mid + Symbols.LENGTH / 2;
        Symbols.dot(g, xL1 - 7, start + 2, 1.9);
        Symbols.dot(g, xL2 + 7, net.reversed() ? end - 2 : start + 2, 1.9);
        float cx = (xL1 + xL2) / 2;
        label(g, couplingLabel(), cx, mid - LINE / 2 + FONT / 2, true, false, fm);
    }

    private List<String> couplingLabel() {
        return List.of("k " + Fmt.number(net.coupling(), Fmt.BUILD), "M " + Fmt.build(net.mutual(), Dimension.INDUCTANCE));
    }

    private static void symbol(Graphics2D g, Part p, float cx, float cy, boolean vertical, int side) {
        switch (p.kind()) {
            case RESISTOR -> Symbols.resistor(g, cx, cy, vertical);
            case CAPACITOR -> Symbols.capacitor(g, cx, cy, vertical);
            case INDUCTOR -> Symbols.inductor(g, cx, cy, vertical, side);
            case VOLTAGE_SOURCE -> Symbols.source(g, cx, cy, false);
            case CURRENT_SOURCE -> Symbols.source(g, cx, cy, true);
        }
    }

    /** Lines of text from {@code y} (first baseline) down; centred, right-aligned at x, or left-aligned at x. */
    private static void label(Graphics2D g, List<String> lines, float x, float y, boolean centred, boolean rightAligned,
                              FontMetrics fm) {
        float by = y;
        for (String s : lines) {
            float w = fm.stringWidth(s);
            float tx = centred ? x - w / 2 : rightAligned ? x - w : x;
            g.drawString(s, tx, by);
            by += LINE;
        }
    }

    private static float width(List<String> lines, FontMetrics fm) {
        float w = 0;
        for (String s : lines) {
            w = Math.max(w, fm.stringWidth(s));
        }
        return w;
    }

    private List<String> sourceLabel(Part src) {
        boolean current = src.kind() == Kind.CURRENT_SOURCE;
        return List.of(src.name() + " source", Fmt.build(src.value(), current ? Dimension.CURRENT : Dimension.VOLTAGE) + " rms",
                "at " + Fmt.build(net.frequency(), Dimension.FREQUENCY));
    }

    private List<String> capLabel(String id) {
        List<String> out = new ArrayList<>();
        out.add(id);
        out.add(Fmt.build(net.part(id).value(), Dimension.CAPACITANCE));
        Part esr = net.part("R" + id);
        if (esr != null) {
            out.add("ESR " + Fmt.build(esr.value(), Dimension.RESISTANCE));
        }
        return out;
    }

    private List<String> coilLabel(String index) {
        List<String> out = new ArrayList<>();
        out.add("L" + index + (net.heater() ? " work coil" : ""));
        out.add(Fmt.build(net.part("L" + index).value(), Dimension.INDUCTANCE));
        out.add("R" + index + " " + Fmt.build(net.part("R" + index).value(), Dimension.RESISTANCE));
        if ("1".equals(index) && net.part("RW") != null) {
            out.add("RW " + Fmt.build(net.part("RW").value(), Dimension.RESISTANCE) + " (cold)");
        }
        return out;
    }
}
