package org.tankwright.report;

import org.tankwright.analysis.BankReport;

import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.geom.Line2D;
import java.util.ArrayList;
import java.util.List;

/**
 * A capacitor bank's arrangement as a small schematic: strings of parts in series between two
 * bus wires, strings side by side in parallel, and the trim part as its own string. Long rows
 * and columns are shortened with an ellipsis and their count written out.
 */
final class BankDrawing {
    private static final int MAX_COLUMNS = 6;
    private static final int MAX_ROWS = 4;
    private static final float CELL_H = 32f;
    private static final float COL_W = 28f;
    private static final float FONT = 7.6f;

    private final BankReport bank;

    BankDrawing(BankReport bank) {
        this.bank = bank;
    }

    private int rowsShown() {
        return Math.min(bank.seriesCount(), MAX_ROWS);
    }

    private int columnsShown() {
        return Math.min(Math.max(1, bank.parallelCount()), MAX_COLUMNS);
    }

    private boolean hasTrim() {
        return bank.trim() != null && !bank.trim().isBlank();
    }

    float height() {
        return 16 + rowsShown() * CELL_H + 18;
    }

    void paint(Graphics2D g, float width) {
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 10).deriveFont(FONT));
        g.setColor(Color.BLACK);
        g.setStroke(Symbols.WIRE);
        FontMetrics fm = g.getFontMetrics();
        int cols = columnsShown();
        boolean cut = bank.parallelCount() > MAX_COLUMNS;
        int drawn = cols + (hasTrim() ? 1 : 0);
        float x0 = 40;
        float top = 16;
        float bottom = top + rowsShown() * CELL_H + 6;
        float xEnd = x0 + (drawn - 1) * COL_W;
        g.draw(new Line2D.Float(x0 - 24, top, xEnd, top));
        g.draw(new Line2D.Float(x0 - 24, bottom, xEnd, bottom));
        g.drawString(bank.id(), x0 - 24, top - 4);
        for (int c = 0; c < drawn; c++) {
            float x = x0 + c * COL_W;
            boolean trim = hasTrim() && c == drawn - 1;
            if (cut && c == cols - 2) {
                String dots = "\u2026";
                g.drawString(dots, x - fm.stringWidth(dots) / 2f, (top + bottom) / 2);
                continue;
            }
            stringOfParts(g, x, top, bottom, trim ? 1 : bank.seriesCount());
            Symbols.dot(g, x, top, 1.6);
            Symbols.dot(g, x, bottom, 1.6);
            if (trim) {
                g.drawString("trim", x - fm.stringWidth("trim") / 2f, bottom + 10);
            }
        }
        float tx = xEnd + 22;
        List<String> lines = new ArrayList<>();
        lines.add(bank.seriesCount() + " in series \u00D7 " + bank.parallelCount() + " strings in parallel"
                + (hasTrim() ? ", plus the trim part" : ""));
        lines.add(bank.partCount() + " parts: " + bank.part());
        if (hasTrim()) {
            lines.add("trim: " + bank.trim());
        }
        float ty = top + 10;
        for (String s : lines) {
            for (String piece : wrap(s, fm, width - tx - 2)) {
                if (ty < height()) {
                    g.drawString(piece, tx, ty);
                }
                ty += 11;
            }
        }
    }

    private static List<String> wrap(String s, FontMetrics fm, float width) {
        List<String> out = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : s.split(" ")) {
            String candidate = line.isEmpty() ? word : line + " " + word;
            if (fm.stringWidth(candidate) > width && !line.isEmpty()) {
                out.add(line.toString());
                line.setLength(0);
                line.append(word);
            } else {
                line.setLength(0);
                line.append(candidate);
            }
        }
        out.add(line.toString());
        return out;
    }

    private void stringOfParts(Graphics2D g, float x, float top, float bottom, int n) {
        int shown = Math.min(n, MAX_ROWS);
        float cell = (bottom - top) / shown;
        for (int r = 0; r < shown; r++) {
            float cy = top + cell * (r + 0.5f);
            boolean ellipsis = n > MAX_ROWS && r == shown - 2;
            if (ellipsis) {
                g.draw(new Line2D.Float(x, top + cell * r, x, cy - 6));
                g.draw(new Line2D.Float(x, cy + 6, x, top + cell * (r + 1)));
                for (int d = -1; d <= 1; d++) {
                    Symbols.dot(g, x, cy + 3.5 * d, 0.9);
                }
                continue;
            }
            g.draw(new Line2D.Float(x, top + cell * r, x, cy - Symbols.LENGTH / 2));
            g.draw(new Line2D.Float(x, cy + Symbols.LENGTH / 2, x, top + cell * (r + 1)));
            Symbols.capacitor(g, x, cy, true);
        }
    }
}
