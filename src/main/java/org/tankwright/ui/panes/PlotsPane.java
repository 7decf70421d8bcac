package org.tankwright.ui.panes;

import io.github.andrewauclair.moderndocking.DockableStyle;
import java.util.ArrayList;
import java.util.List;
import javax.swing.JTabbedPane;
import javax.swing.UIManager;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.charts.ChartStyle;
import org.tankwright.charts.Figure;
import org.tankwright.charts.ResultFigures;
import org.tankwright.ui.model.OpenDesign;
import org.tankwright.ui.model.Workspace;
import org.tankwright.ui.plots.FigureView;
import org.tankwright.ui.plots.ToleranceTab;

/** The figures of the selected design's result, one tab each; restyled when the theme changes. */
public final class PlotsPane extends ResultPane {

    private final JTabbedPane tabs = new JTabbedPane(JTabbedPane.TOP, JTabbedPane.SCROLL_TAB_LAYOUT);
    private final List<FigureView> views = new ArrayList<>();
    private final ToleranceTab tolerance;
    private final javax.swing.JComboBox<Object> compare = new javax.swing.JComboBox<>();
    private final Workspace workspace;
    /** What each figure tab shows now; a tab is built only when it is the one shown (the others wait until picked). */
    private final List<Object> builtFor = new ArrayList<>();
    private Object wanted;
    private boolean refilling;
    private static final String NONE = "(no comparison)";

    public PlotsPane(Workspace workspace) {
        super(PaneArrangement.PLOTS, "Plots", "Impedance, power, efficiency, capacitor voltage, coupling, envelope, tolerance",
                DockableStyle.BOTH, workspace);
        tabs.setName("plotTabs");
        for (String title : ResultFigures.TITLES.subList(0, TOLERANCE)) {
            FigureView v = new FigureView("plot " + title);
            views.add(v);
            builtFor.add(null);
            tabs.addTab(title, v);
        }
        tabs.addChangeListener(e -> buildShownTab());
        tolerance = new ToleranceTab(() -> workspace.selected() == null ? null : workspace.selected().result());
        tabs.addTab(ResultFigures.TITLES.get(TOLERANCE), tolerance);
        compare.setName("compareWith");
        compare.setToolTipText("Overlay another open design's curves on the frequency plots for comparison");
        compare.addActionListener(e -> {
            if (!refilling) {
                showFigures(workspace.selected());
            }
        });
        javax.swing.JPanel bar = new javax.swing.JPanel(new java.awt.FlowLayout(java.awt.FlowLayout.RIGHT, 6, 0));
        bar.setOpaque(false);
        bar.add(new javax.swing.JLabel("Compare with:"));
        bar.add(compare);
        // beside the figure tabs, not above them: the height goes to the curves
        tabs.putClientProperty(com.formdev.flatlaf.FlatClientProperties.TABBED_PANE_TRAILING_COMPONENT, bar);
        add(tabs);
        this.workspace = workspace;
        UIManager.addPropertyChangeListener(e -> {
            if ("lookAndFeel".equals(e.getPropertyName())) {
                showFigures(workspace.selected());
                tolerance.restyle();
            }
        });
    }

    /** Index of the tolerance tab: the study runs on demand, not with every edit. */
    private static final int TOLERANCE = 5;

    public ToleranceTab tolerance() {
        return tolerance;
    }

    public List<FigureView> views() {
        return List.copyOf(views);
    }

    @Override
    protected void show(OpenDesign d) {
        if (d != null && d.isPreview() && wanted instanceof Wanted w && w.design() == d && w.result() != null) {
            return; // an edit's operating point has no sweeps: keep the last curves until its full result comes
        }
        tolerance.resultChanged();
        showFigures(d);
    }


    /** The other open designs, offered for comparison; the current choice is kept when it is still open. */
    private OpenDesign comparison(OpenDesign d) {
        Object chosen = compare.getSelectedItem();
        refilling = true;
        try {
            compare.removeAllItems();
            compare.addItem(NONE);
            for (OpenDesign o : workspace.designs()) {
                if (o != d) {
                    compare.addItem(new Choice(o));
                }
            }
            for (int i = 0; i < compare.getItemCount(); i++) {
                if (compare.getItemAt(i) instanceof Choice c && chosen instanceof Choice old && c.design() == old.design()) {
                    compare.setSelectedIndex(i);
                }
            }
        } finally {
            refilling = false;
        }
        return compare.getSelectedItem() instanceof Choice c ? c.design() : null;
    }

    /** A design offered in the comparison list, shown by its name. */
    private record Choice(OpenDesign design) {
        @Override
        public String toString() {
            return design.design().name();
        }
    }

    private void showFigures(OpenDesign d) {
        OpenDesign other = d == null ? null : comparison(d);
        AnalysisResult r = d == null ? null : d.result();
        wanted = new Wanted(d, r, other == null ? null : other.result(), ChartStyle.fromLookAndFeel());
        buildShownTab();
    }

    /** What the figure tabs are to show: a design's result, the one compared with it, the style. */
    private record Wanted(OpenDesign design, AnalysisResult result, AnalysisResult other, ChartStyle style) {
    }

    /** Builds the shown figure tab when it does not show what is wanted yet. */
    private void buildShownTab() {
        int i = tabs.getSelectedIndex();
        if (i < 0 || i >= views.size() || !(wanted instanceof Wanted w) || builtFor.get(i) == w) {
            return;
        }
        builtFor.set(i, w);
        views.get(i).show(w.result() != null ? ResultFigures.one(i, w.result(), w.other(), w.style())
                : Figure.missing(ResultFigures.TITLES.get(i), w.design() == null ? "No design open." : "Computing…"));
    }
}
