package org.tankwright.report;

import org.apache.pdfbox.pdmodel.common.PDRectangle;

import java.util.Locale;

/** The paper sizes a sheet is laid out for. */
public enum Paper {
    /** ISO 216 A4, 210 mm × 297 mm. */
    A4(PDRectangle.A4),
    /** US Letter, 8.5 in × 11 in. */
    LETTER(PDRectangle.LETTER);

    private final PDRectangle size;

    Paper(PDRectangle size) {
        this.size = size;
    }

    /** Page size in PDF points (1/72 in). */
    public PDRectangle size() {
        return size;
    }

    /** Reads {@code a4} or {@code letter} (any case). */
    public static Paper parse(String text) {
        for (Paper p : values()) {
            if (p.name().equalsIgnoreCase(text == null ? "" : text.strip())) {
                return p;
            }
        }
        throw new IllegalArgumentException("'" + text + "' is not a paper size: expected a4 or letter");
    }

    /** The spelling on the command line. */
    public String token() {
        return name().toLowerCase(Locale.ROOT);
    }
}
