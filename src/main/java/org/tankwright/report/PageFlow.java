package org.tankwright.report;

import de.rototor.pdfbox.graphics2d.IPdfBoxGraphics2DFontTextDrawer;
import de.rototor.pdfbox.graphics2d.PdfBoxGraphics2D;
import de.rototor.pdfbox.graphics2d.PdfBoxGraphics2DFontTextDrawer;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.PDPageContentStream.AppendMode;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.graphics.form.PDFormXObject;
import org.apache.pdfbox.pdmodel.graphics.state.RenderingMode;
import org.apache.pdfbox.util.Matrix;

import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.io.Closeable;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

/**
 * Lays a sheet out top to bottom on as many pages as it needs: wrapped text, headings that are
 * never left alone at the foot of a page, tables whose cells wrap and whose header repeats on a
 * new page, boxes, and vector figures drawn through a Graphics2D-to-PDF bridge. Page numbers are
 * written when the flow is finished, once the page count is known.
 */
final class PageFlow implements Closeable {
    static final float BODY = 8.8f;
    static final float SMALL = 7.4f;
    static final float H1 = 15f;
    static final float H2 = 11.5f;
    static final float H3 = 9.6f;
    static final Color INK = Color.BLACK;
    static final Color GREY = new Color(0x55, 0x55, 0x55);
    static final Color RULE = new Color(0xb0, 0xb0, 0xb0);
    static final Color SHADE = new Color(0xec, 0xec, 0xec);
    private static final float MARGIN = 40f;
    private static final float FOOTER = 26f;
    private static final float CELL_PAD = 2.6f;

    private final PDDocument doc;
    private final Paper paper;
    private final SheetFont font;
    private final String running;
    private final FontDrawer textDrawer;
    private PDPageContentStream cs;
    private float y;

    PageFlow(PDDocument doc, Paper paper, String running) {
        this.doc = doc;
        this.paper = paper;
        this.font = new SheetFont(doc);
        this.running = running;
        this.textDrawer = new FontDrawer(font.pdf());
        newPage();
    }

    float left() {
        return MARGIN;
    }

    float width() {
        return paper.size().getWidth() - 2 * MARGIN;
    }

    private float top() {
        return paper.size().getHeight() - MARGIN;
    }

    private float bottom() {
        return MARGIN + FOOTER;
    }

    /** Room left on the current page, points. */
    float room() {
        return y - bottom();
    }

    static float lineHeight(float size) {
        return size * 1.28f;
    }

    /** Starts a new page; pages after the first carry the running head. */
    void newPage() {
        try {
            if (cs != null) {
                cs.close();
            }
            PDPage page = new PDPage(paper.size());
            doc.addPage(page);
            cs = new PDPageContentStream(doc, page);
            y = top();
            if (doc.getNumberOfPages() > 1) {
                drawText(running, left(), y - SMALL, SMALL, false, GREY);
                y -= lineHeight(SMALL) + 2;
                rule(y, RULE, 0.5f);
                y -= 8;
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Moves to a new page unless {@code height} points still fit on this one. */
    void ensure(float height) {
        if (height > room() && y < top() - 40) {
            newPage();
        }
    }

    void space(float h) {
        y -= Math.min(h, room());
    }

    /** The sheet's title line. */
    void title(String text) {
        paragraph(text, H1, true, 0, INK);
    }

    /** A section heading with a rule under it, kept with at least a few lines of what follows. */
    void heading(String text) {
        ensure(lineHeight(H2) + 6 + 5 * lineHeight(BODY));
        space(7);
        paragraph(text, H2, true, 0, INK);
        rule(y + 1.5f, INK, 0.8f);
        space(4);
    }

    /** A smaller heading inside a section. */
    void subheading(String text) {
        ensure(lineHeight(H3) + 4 * lineHeight(BODY));
        space(3);
        paragraph(text, H3, true, 0, INK);
        space(1);
    }

    void paragraph(String text) {
        paragraph(text, BODY, false, 0, INK);
    }

    void note(String text) {
        paragraph(text, SMALL, false, 0, GREY);
    }

    /** Wrapped text; each line goes to a new page if it does not fit. */
    void paragraph(String text, float size, boolean bold, float indent, Color colour) {
        float lh = lineHeight(size);
        for (String line : wrap(text, size, width() - indent)) {
            ensure(lh);
            drawText(line, left() + indent, y - size, size, bold, colour);
            y -= lh;
        }
    }

    /** A list with bullets or numbers ({@code numbered}), wrapped under its own indent. */
    void list(List<String> items, boolean numbered) {
        float indent = 12;
        int n = 1;
        for (String item : items) {
            List<String> lines = wrap(item, BODY, width() - indent);
            float lh = lineHeight(BODY);
            for (int i = 0; i < lines.size(); i++) {
                ensure(lh);
                if (i == 0) {
                    drawText(numbered ? (n++) + "." : "\u2022", left() + 1, y - BODY, BODY, false, INK);
                }
                drawText(lines.get(i), left() + indent, y - BODY, BODY, false, INK);
                y -= lh;
            }
            y -= 1.2f;
        }
    }

    /** A table with wrapped cells; the header row repeats on each page the table runs onto. */
    void table(Table t) {
        float w = width();
        float[] cols = t.columnWidths(w);
        List<List<String>> header = cells(t.headers(), cols, BODY);
        float headerH = rowHeight(header, BODY);
        float firstRow = t.rows().isEmpty() ? 0 : rowHeight(cells(t.rows().get(0), cols, BODY), BODY);
        ensure(headerH + firstRow);
        drawRow(header, cols, BODY, true, headerH, t);
        for (String[] row : t.rows()) {
            List<List<String>> cells = cells(row, cols, BODY);
            float h = rowHeight(cells, BODY);
            if (h > room()) {
                newPage();
                drawRow(header, cols, BODY, true, headerH, t);
            }
            drawRow(cells, cols, BODY, false, h, t);
        }
        space(5);
    }

    private List<List<String>> cells(String[] row, float[] cols, float size) {
        List<List<String>> out = new ArrayList<>();
        for (int c = 0; c < cols.length; c++) {
            String text = c < row.length && row[c] != null ? row[c] : "";
            out.add(wrap(text, size, cols[c] - 2 * CELL_PAD));
        }
        return out;
    }

    private static float rowHeight(List<List<String>> cells, float size) {
        int lines = 1;
        for (List<String> c : cells) {
            lines = Math.max(lines, c.size());
        }
        return lines * lineHeight(size) + 2 * CELL_PAD;
    }

    private void drawRow(List<List<String>> cells, float[] cols, float size, boolean header, float h, Table t) {
        try {
            float x = left();
            if (header) {
                cs.setNonStrokingColor(SHADE);
                cs.addRect(x, y - h, width(), h);
                cs.fill();
            }
            cs.setStrokingColor(RULE);
            cs.setLineWidth(0.5f);
            for (int c = 0; c < cols.length; c++) {
                cs.addRect(x, y - h, cols[c], h);
                cs.stroke();
                float ty = y - CELL_PAD - size;
                for (String line : cells.get(c)) {
                    float tx = x + CELL_PAD;
                    if (!header && t.rightAligned(c)) {
                        tx = x + cols[c] - CELL_PAD - font.width(line, size);
                    }
                    drawText(line, tx, ty, size, header, INK);
                    ty -= lineHeight(size);
                }
                x += cols[c];
            }
            y -= h;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * A framed box of wrapped paragraphs under a bold title bar, kept on one page when it fits
     * on one (a longer box runs on, framed piece by piece).
     */
    void box(String title, List<String> paragraphs, Color frame, Color titleFill, Color titleInk) {
        float pad = 5;
        float inner = width() - 2 * pad;
        List<List<String>> wrapped = new ArrayList<>();
        float h = lineHeight(H3) + 2 * pad;
        for (String p : paragraphs) {
            List<String> lines = wrap(p, BODY, inner - 10);
            wrapped.add(lines);
            h += lines.size() * lineHeight(BODY) + 2;
        }
        h += pad;
        ensure(Math.min(h, top() - bottom() - 60));
        try {
            float titleH = lineHeight(H3) + 2 * pad;
            cs.setNonStrokingColor(titleFill);
            cs.addRect(left(), y - titleH, width(), titleH);
            cs.fill();
            drawText(title, left() + pad, y - pad - H3, H3, true, titleInk);
            float boxTop = y;
            y -= titleH + pad / 2;
            for (List<String> lines : wrapped) {
                for (int i = 0; i < lines.size(); i++) {
                    if (lineHeight(BODY) > room()) {
                        frame(boxTop, frame);
                        newPage();
                        boxTop = y;
                    }
                    if (i == 0) {
                        drawText("\u2022", left() + pad, y - BODY, BODY, false, INK);
                    }
                    drawText(lines.get(i), left() + pad + 10, y - BODY, BODY, false, INK);
                    y -= lineHeight(BODY);
                }
                y -= 2;
            }
            y -= pad;
            frame(boxTop, frame);
            space(6);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private void frame(float boxTop, Color colour) throws IOException {
        cs.setStrokingColor(colour);
        cs.setLineWidth(1.6f);
        cs.addRect(left(), y, width(), boxTop - y);
        cs.stroke();
    }

    /**
     * A vector figure of {@code w} × {@code h} points, placed at the left margin (or centred when
     * {@code centred}), drawn by {@code painter} on a Graphics2D whose origin is the figure's top left.
     */
    void figure(float w, float h, boolean centred, Consumer<Graphics2D> painter) {
        ensure(h + 4);
        PdfBoxGraphics2D g;
        try {
            g = new PdfBoxGraphics2D(doc, w, h);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        g.setFontTextDrawer(textDrawer);
        try {
            painter.accept(g);
        } finally {
            g.dispose();
        }
        PDFormXObject form = g.getXFormObject();
        float x = centred ? left() + (width() - w) / 2 : left();
        try {
            cs.saveGraphicsState();
            cs.transform(Matrix.getTranslateInstance(x, y - h));
            cs.drawForm(form);
            cs.restoreGraphicsState();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        y -= h + 4;
    }

    /** A horizontal rule across the text width at height {@code at}. */
    private void rule(float at, Color colour, float lineWidth) {
        try {
            cs.setStrokingColor(colour);
            cs.setLineWidth(lineWidth);
            cs.moveTo(left(), at);
            cs.lineTo(left() + width(), at);
            cs.stroke();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private void drawText(String printable, float x, float baseline, float size, boolean bold, Color colour) {
        if (printable.isEmpty()) {
            return;
        }
        try {
            cs.beginText();
            cs.setFont(font.pdf(), size);
            cs.setNonStrokingColor(colour);
            if (bold) {
                cs.setStrokingColor(colour);
                cs.setLineWidth(size * 0.045f);
                cs.setRenderingMode(RenderingMode.FILL_STROKE);
            }
            cs.newLineAtOffset(x, baseline);
            cs.showText(printable);
            if (bold) {
                cs.setRenderingMode(RenderingMode.FILL);
            }
            cs.endText();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * Breaks text into lines no wider than {@code width}: at ordinary spaces only (a no-break
     * space keeps a number with its unit), and inside a word only when the word alone is too wide.
     */
    List<String> wrap(String text, float size, float width) {
        String s = font.printable(text == null ? "" : text).strip();
        List<String> lines = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : s.split(" +")) {
            String candidate = line.isEmpty() ? word : line + " " + word;
            if (font.width(candidate, size) <= width) {
                line.setLength(0);
                line.append(candidate);
                continue;
            }
            if (!line.isEmpty()) {
                lines.add(line.toString());
                line.setLength(0);
            }
            String rest = word;
            while (font.width(rest, size) > width && rest.length() > 1) {
                int cut = rest.length() - 1;
                while (cut > 1 && font.width(rest.substring(0, cut), size) > width) {
                    cut--;
                }
                lines.add(rest.substring(0, cut));
                rest = rest.substring(cut);
            }
            line.append(rest);
        }
        if (!line.isEmpty() || lines.isEmpty()) {
            lines.add(line.toString());
        }
        return lines;
    }

    /** Writes the running foot with "page i of n" on every page, and closes the last page. */
    void finish(String foot) {
        try {
            cs.close();
            cs = null;
            int n = doc.getNumberOfPages();
            for (int i = 0; i < n; i++) {
                PDPage page = doc.getPage(i);
                try (PDPageContentStream foot1 = new PDPageContentStream(doc, page, AppendMode.APPEND, true, true)) {
                    cs = foot1;
                    float base = MARGIN - 2;
                    rule(base + SMALL + 5, RULE, 0.5f);
                    String left = font.printable(foot);
                    String right = "page " + (i + 1) + " of " + n;
                    float rw = font.width(right, SMALL);
                    List<String> leftLines = wrap(left, SMALL, width() - rw - 20);
                    drawText(leftLines.get(0), left(), base, SMALL, false, GREY);
                    drawText(right, left() + width() - rw, base, SMALL, false, GREY);
                }
            }
            cs = null;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Override
    public void close() {
        try {
            if (cs != null) {
                cs.close();
                cs = null;
            }
            textDrawer.close();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Maps every font a figure asks for to the sheet's own embedded face, so chart text stays text. */
    private static final class FontDrawer extends PdfBoxGraphics2DFontTextDrawer {
        private final PDFont face;

        FontDrawer(PDFont face) {
            this.face = face;
        }

        @Override
        protected boolean hasDynamicFontMapping() {
            return true;
        }

        @Override
        protected PDFont mapFont(Font f, IPdfBoxGraphics2DFontTextDrawer.IFontTextDrawerEnv env) {
            return face;
        }
    }
}
