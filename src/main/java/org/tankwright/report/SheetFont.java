package org.tankwright.report;

import org.apache.fontbox.ttf.TTFParser;
import org.apache.fontbox.ttf.TrueTypeFont;
import org.apache.pdfbox.io.RandomAccessReadBuffer;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.font.PDType0Font;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.HashMap;
import java.util.Map;

/**
 * The one typeface of a sheet: Liberation Sans (SIL Open Font License), which PDFBox ships inside
 * its own jar, embedded as a subset so Ω, µ, √ and ² print on every machine. Bold is drawn by
 * stroking the glyph outlines (see {@link PageFlow}). Characters the face lacks are replaced by
 * plain spellings rather than dropped.
 */
final class SheetFont {
    private static final String RESOURCE = "/org/apache/pdfbox/resources/ttf/LiberationSans-Regular.ttf";
    private static final Map<Character, String> PLAIN = Map.of(
            '\u2192', "->", '\u2264', "<=", '\u2265', ">=", '\u221A', "sqrt", '\u2212', "-",
            '\u2248', "~", '\u00D7', "x", '\u2026', "...", '\u2126', "\u03A9");

    private static byte[] fontBytes;

    private final PDType0Font font;
    private final Map<Character, Float> widths = new HashMap<>();
    private final Map<Character, Boolean> covered = new HashMap<>();

    SheetFont(PDDocument doc) {
        try {
            TrueTypeFont ttf = new TTFParser().parse(new RandomAccessReadBuffer(bytes()));
            // Latin text needs no glyph substitution; without the table PDFBox skips its per-string ligature pass.
            ttf.getTableMap().remove("GSUB");
            font = PDType0Font.load(doc, ttf, true);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot load the sheet's font", e);
        }
    }

    private static synchronized byte[] bytes() throws IOException {
        if (fontBytes == null) {
            try (InputStream in = SheetFont.class.getResourceAsStream(RESOURCE)) {
                if (in == null) {
                    throw new IllegalStateException("the PDF library's bundled font " + RESOURCE + " is missing");
                }
                fontBytes = in.readAllBytes();
            }
        }
        return fontBytes;
    }

    PDType0Font pdf() {
        return font;
    }

    /** The text with every character the face cannot show replaced (tabs and line breaks become spaces). */
    String printable(String s) {
        StringBuilder sb = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == '\t' || c == '\n' || c == '\r') {
                sb.append(' ');
            } else if (has(c)) {
                sb.append(c);
            } else {
                String alt = PLAIN.get(c);
                sb.append(alt != null && alt.chars().allMatch(a -> has((char) a)) ? alt : "?");
            }
        }
        return sb.toString();
    }

    /** Width of already printable text at {@code size} points. */
    float width(String printable, float size) {
        float w = 0;
        for (int i = 0; i < printable.length(); i++) {
            w += widths.computeIfAbsent(printable.charAt(i), this::glyphWidth);
        }
        return w / 1000f * size;
    }

    private float glyphWidth(char c) {
        try {
            return font.getStringWidth(String.valueOf(c));
        } catch (IOException | IllegalArgumentException e) {
            return 500f;
        }
    }

    private boolean has(char c) {
        return covered.computeIfAbsent(c, ch -> {
            if (Character.isSurrogate(ch)) {
                return false;
            }
            try {
                font.encode(String.valueOf(ch));
                return true;
            } catch (IOException | IllegalArgumentException e) {
                return false;
            }
        });
    }
}
