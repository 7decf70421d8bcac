package org.tankwright.report;

import org.tankwright.design.DesignFiles;

import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.Series;
import org.tankwright.units.Dimension;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

/**
 * CSV of every data series of a result: one file per series, named by its id, with a header row
 * whose column names end in their unit ({@code frequency_Hz,impedance_ohm}). SI values written
 * so they read back exactly; a value that was not computed is an empty cell.
 */
public final class SeriesCsv {
    private SeriesCsv() {
    }

    /** Every series of the result (network sweeps, then coupling sweeps), keyed by a unique file stem. */
    public static Map<String, Series> all(AnalysisResult r) {
        List<Series> list = new ArrayList<>();
        if (r.network() != null && r.network().sweeps() != null) {
            list.addAll(r.network().sweeps());
        }
        if (r.coupling() != null && r.coupling().sweeps() != null) {
            list.addAll(r.coupling().sweeps());
        }
        Map<String, Series> out = new LinkedHashMap<>();
        Set<String> used = new HashSet<>();
        for (Series s : list) {
            String stem = stem(s.id());
            String unique = stem;
            for (int i = 2; !used.add(unique); i++) {
                unique = stem + "-" + i;
            }
            out.put(unique, s);
        }
        return out;
    }

    /** The CSV text of one series. */
    public static String csv(Series s) {
        StringBuilder sb = new StringBuilder(32 + 40 * s.size());
        sb.append(column(s.xLabel(), s.xDim())).append(',').append(column(s.yLabel(), s.yDim())).append('\n');
        for (int i = 0; i < s.size(); i++) {
            sb.append(cell(s.x()[i])).append(',').append(cell(s.y()[i])).append('\n');
        }
        return sb.toString();
    }

    /** The header name of a column: the label in snake case, then the unit suffix. */
    public static String column(String label, Dimension dim) {
        String base = ResultJson.snake(label == null || label.isBlank() ? "value" : label);
        String suffix = dim == null ? "" : dim.keySuffix();
        return suffix.isEmpty() || base.endsWith("_" + suffix) ? base : base + "_" + suffix;
    }

    /** Writes one file per series into {@code dir} (created when missing); returns the files written. */
    public static List<Path> write(AnalysisResult r, Path dir) throws IOException {
        Files.createDirectories(dir);
        List<Path> written = new ArrayList<>();
        for (Map.Entry<String, Series> e : all(r).entrySet()) {
            Path file = dir.resolve(e.getKey() + ".csv");
            DesignFiles.replaceAtomically(file, csv(e.getValue()));
            written.add(file);
        }
        return written;
    }

    private static String cell(double v) {
        return Double.isFinite(v) ? Double.toString(v) : "";
    }

    private static String stem(String id) {
        String s = id == null ? "" : id.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9._-]+", "-").replaceAll("^-+|-+$", "");
        return s.isEmpty() ? "series" : s;
    }
}
