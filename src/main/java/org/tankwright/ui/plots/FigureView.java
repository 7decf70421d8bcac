package org.tankwright.ui.plots;

import java.awt.BorderLayout;
import java.awt.CardLayout;
import java.awt.Toolkit;
import java.awt.datatransfer.DataFlavor;
import java.awt.datatransfer.Transferable;
import java.awt.geom.Point2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.StringJoiner;
import javax.swing.JFileChooser;
import javax.swing.JLabel;
import javax.swing.JMenuItem;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.JPopupMenu;
import javax.swing.SwingConstants;
import javax.swing.UIManager;
import javax.swing.filechooser.FileNameExtensionFilter;
import org.jfree.chart.ChartMouseEvent;
import org.jfree.chart.ChartMouseListener;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.panel.CrosshairOverlay;
import org.jfree.chart.plot.Crosshair;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.xy.XYDataset;
import org.tankwright.charts.ChartExport;
import org.tankwright.charts.ChartStyle;
import org.tankwright.charts.Figure;

/**
 * One figure in the window: the chart with a crosshair and a readout of every line's value at
 * the cursor, a menu to copy or save it (PNG, SVG), or, when the result has no data for it, a
 * sentence saying why.
 */
public final class FigureView extends JPanel {

    private static final String CHART = "chart";
    private static final String TEXT = "text";
    private final CardLayout cards = new CardLayout();
    private final JPanel body = new JPanel(cards);
    private final ChartPanel chartPanel = new ChartPanel(null, false, false, false, true, false);
    private final JLabel missing = new JLabel("", SwingConstants.CENTER);
    private final JLabel readout = new JLabel(" ");
    private final Crosshair crosshair = new Crosshair(Double.NaN);
    private Figure figure;

    public FigureView(String name) {
        super(new BorderLayout());
        setName(name);
        chartPanel.setMouseWheelEnabled(true);
        chartPanel.setMinimumDrawWidth(200);
        chartPanel.setMinimumDrawHeight(120);
        chartPanel.setMaximumDrawWidth(4000);
        chartPanel.setMaximumDrawHeight(3000);
        CrosshairOverlay overlay = new CrosshairOverlay();
        overlay.addDomainCrosshair(crosshair);
        chartPanel.addOverlay(overlay);
        chartPanel.addChartMouseListener(new ChartMouseListener() {
            @Override
            public void chartMouseClicked(ChartMouseEvent e) {
                // the readout follows the cursor; a click adds nothing
            }

            @Override
            public void chartMouseMoved(ChartMouseEvent e) {
                follow(e.getTrigger().getX(), e.getTrigger().getY());
            }
        });
        chartPanel.setPopupMenu(menu());
        missing.setName(name + ".missing");
        readout.setName(name + ".readout");
        body.add(chartPanel, CHART);
        body.add(missing, TEXT);
        add(body, BorderLayout.CENTER);
        add(readout, BorderLayout.SOUTH);
    }

    /** Shows {@code f}: its chart, or its reason for having none. */
    public void show(Figure f) {
        if (!f.present() && figure != null && !figure.present() && figure.notShown().equals(f.notShown())) {
            return; // the same sentence: nothing to redraw
        }
        figure = f;
        if (f.present()) {
            fitToPane(f.chart());
            chartPanel.setChart(f.chart());
            crosshair.setPaint(ChartStyle.fromLookAndFeel().foreground());
            crosshair.setValue(Double.NaN);
            cards.show(body, CHART);
            readout.setText(" ");
        } else {
            chartPanel.setChart(null);
            missing.setForeground(UIManager.getColor("Label.disabledForeground"));
            missing.setText("<html><div style='text-align:center'>" + f.title() + "<br>" + f.notShown() + "</div></html>");
            cards.show(body, TEXT);
            readout.setText(" ");
        }
    }

    /**
     * The pane is wide and short: the tab already names the figure, so its title is not drawn,
     * and the legend goes to the right, leaving the height to the curves.
     */
    private static void fitToPane(JFreeChart chart) {
        if (chart.getTitle() != null) {
            chart.getTitle().setVisible(false);
        }
        org.jfree.chart.title.LegendTitle legend = chart.getLegend();
        if (legend != null) {
            legend.setPosition(org.jfree.chart.ui.RectangleEdge.RIGHT);
            legend.setVerticalAlignment(org.jfree.chart.ui.VerticalAlignment.CENTER);
        }
    }

    public Figure figure() {
        return figure;
    }

    public String readoutText() {
        return readout.getText();
    }

    /** Moves the crosshair to screen point (x, y) and writes each line's nearest value. */
    void follow(int x, int y) {
        JFreeChart chart = chartPanel.getChart();
        if (chart == null || !(chart.getPlot() instanceof XYPlot plot)) {
            return;
        }
        Rectangle2D area = chartPanel.getScreenDataArea();
        if (area == null || !area.contains(x, y)) {
            crosshair.setValue(Double.NaN);
            return;
        }
        Point2D p = chartPanel.translateScreenToJava2D(new java.awt.Point(x, y));
        Rectangle2D data = chartPanel.getChartRenderingInfo().getPlotInfo().getDataArea();
        ValueAxis domain = plot.getDomainAxis();
        double xv = domain.java2DToValue(p.getX(), data, plot.getDomainAxisEdge());
        crosshair.setValue(xv);
        StringJoiner text = new StringJoiner("   ");
        text.add(domain.getLabel() + " " + format(domain, xv));
        for (int d = 0; d < plot.getDatasetCount(); d++) {
            XYDataset ds = plot.getDataset(d);
            if (ds == null) {
                continue;
            }
            ValueAxis range = plot.getRangeAxisForDataset(d);
            for (int s = 0; s < ds.getSeriesCount(); s++) {
                int i = nearest(ds, s, xv);
                if (i >= 0) {
                    text.add(ds.getSeriesKey(s) + " " + format(range, ds.getYValue(s, i)));
                }
            }
        }
        readout.setText(text.toString());
    }

    private static String format(ValueAxis axis, double v) {
        if (axis instanceof org.jfree.chart.axis.NumberAxis na && na.getNumberFormatOverride() != null) {
            return na.getNumberFormatOverride().format(v);
        }
        if (axis instanceof org.jfree.chart.axis.LogAxis la && la.getNumberFormatOverride() != null) {
            return la.getNumberFormatOverride().format(v);
        }
        return String.format(java.util.Locale.ROOT, "%.4g", v);
    }

    private static int nearest(XYDataset ds, int s, double x) {
        int best = -1;
        double bestD = Double.MAX_VALUE;
        for (int i = 0; i < ds.getItemCount(s); i++) {
            double d = Math.abs(ds.getXValue(s, i) - x);
            if (d < bestD) {
                bestD = d;
                best = i;
            }
        }
        return best;
    }

    private JPopupMenu menu() {
        JPopupMenu m = new JPopupMenu();
        JMenuItem copy = new JMenuItem("Copy as picture");
        copy.addActionListener(e -> copyImage());
        JMenuItem png = new JMenuItem("Save as PNG…");
        png.addActionListener(e -> save("png"));
        JMenuItem svg = new JMenuItem("Save as SVG…");
        svg.addActionListener(e -> save("svg"));
        JMenuItem zoom = new JMenuItem("Fit to data");
        zoom.addActionListener(e -> chartPanel.restoreAutoBounds());
        m.add(copy);
        m.add(png);
        m.add(svg);
        m.addSeparator();
        m.add(zoom);
        return m;
    }

    private void copyImage() {
        JFreeChart chart = chartPanel.getChart();
        if (chart == null) {
            return;
        }
        BufferedImage img = chart.createBufferedImage(Math.max(400, chartPanel.getWidth()), Math.max(300, chartPanel.getHeight()));
        Toolkit.getDefaultToolkit().getSystemClipboard().setContents(new ImageSelection(img), null);
    }

    private void save(String ext) {
        JFreeChart chart = chartPanel.getChart();
        if (chart == null) {
            return;
        }
        JFileChooser chooser = new JFileChooser();
        chooser.setFileFilter(new FileNameExtensionFilter(ext.toUpperCase(java.util.Locale.ROOT) + " image", ext));
        if (chooser.showSaveDialog(this) != JFileChooser.APPROVE_OPTION) {
            return;
        }
        Path file = chooser.getSelectedFile().toPath();
        if (!file.getFileName().toString().toLowerCase(java.util.Locale.ROOT).endsWith("." + ext)) {
            file = file.resolveSibling(file.getFileName() + "." + ext);
        }
        int w = Math.max(640, chartPanel.getWidth());
        int h = Math.max(400, chartPanel.getHeight());
        try {
            if (ext.equals("svg")) {
                ChartExport.writeSvg(chart, file, w, h);
            } else {
                ChartExport.writePng(chart, file, w, h);
            }
        } catch (IOException e) {
            JOptionPane.showMessageDialog(this, "Could not write " + file + ": " + e.getMessage(), "Save figure",
                    JOptionPane.ERROR_MESSAGE);
        }
    }

    private record ImageSelection(BufferedImage image) implements Transferable {
        @Override
        public DataFlavor[] getTransferDataFlavors() {
            return new DataFlavor[] {DataFlavor.imageFlavor};
        }

        @Override
        public boolean isDataFlavorSupported(DataFlavor flavor) {
            return DataFlavor.imageFlavor.equals(flavor);
        }

        @Override
        public Object getTransferData(DataFlavor flavor) {
            return image;
        }
    }
}
