package org.tankwright.report;

import java.time.LocalDate;
import java.time.ZoneOffset;

/**
 * What the sheet's header says about where the result came from, besides the result itself.
 *
 * @param fileName    the design file's name (or a preset's name)
 * @param date        the date printed on the sheet (ISO, e.g. 2026-12-02)
 * @param toolVersion the Tankwright version that made the sheet
 */
public record SheetInfo(String fileName, String date, String toolVersion) {

    /** Today's date (UTC) with the given file name and version. */
    public static SheetInfo today(String fileName, String toolVersion) {
        return new SheetInfo(fileName, LocalDate.now(ZoneOffset.UTC).toString(), toolVersion);
    }
}
