package org.tankwright.charts;

import java.awt.Rectangle;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.graphics2d.svg.SVGGraphics2D;

/** Writes a figure to PNG or SVG (atomically: a temporary file, then a move). */
public final class ChartExport {

    private ChartExport() {
    }

    /** Writes {@code chart} as a PNG of {@code width} × {@code height} pixels. */
    public static void writePng(JFreeChart chart, Path file, int width, int height) throws IOException {
        Path tmp = temp(file);
        ChartUtils.saveChartAsPNG(tmp.toFile(), chart, width, height);
        Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING);
    }

    /** The SVG document of {@code chart} at {@code width} × {@code height} user units. */
    public static String svg(JFreeChart chart, int width, int height) {
        SVGGraphics2D g = new SVGGraphics2D(width, height);
        chart.draw(g, new Rectangle(0, 0, width, height));
        return g.getSVGDocument();
    }

    /** Writes {@code chart} as an SVG file. */
    public static void writeSvg(JFreeChart chart, Path file, int width, int height) throws IOException {
        Path tmp = temp(file);
        Files.writeString(tmp, svg(chart, width, height), StandardCharsets.UTF_8);
        Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING);
    }

    private static Path temp(Path file) throws IOException {
        Path dir = file.toAbsolutePath().getParent();
        Files.createDirectories(dir);
        return Files.createTempFile(dir, ".chart", ".tmp");
    }
}
