package org.tankwright.ui.panes;

import io.github.andrewauclair.moderndocking.DockableStyle;
import java.util.ArrayList;
import java.util.List;
import javax.swing.JTabbedPane;
import javax.swing.UIManager;
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

    public PlotsPane(Workspace workspace) {
        super(PaneArrangement.PLOTS, "Plots", "Impedance, power, efficiency, capacitor voltage, coupling, envelope, tolerance",
                DockableStyle.BOTH, workspace);
        tabs.setName("plotTabs");
        for (String title : ResultFigures.TITLES.subList(0, TOLERANCE)) {
            FigureView v = new FigureView("plot " + title);
            views.add(v);
            tabs.addTab(title, v);
        }
        tolerance = new ToleranceTab(() -> workspace.selected() == null ? null : workspace.selected().result());
        tabs.addTab(ResultFigures.TITLES.get(TOLERANCE), tolerance);
        add(tabs);
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
        tolerance.resultChanged();
        showFigures(d);
    }


    private void showFigures(OpenDesign d) {
        List<Figure> figures = d == null || d.result() == null ? null : ResultFigures.all(d.result(), ChartStyle.fromLookAndFeel());
        for (int i = 0; i < views.size(); i++) {
            String title = ResultFigures.TITLES.get(i);
            views.get(i).show(figures != null ? figures.get(i)
                    : Figure.missing(title, d == null ? "No design open." : "Computing…"));
        }
    }
}
