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

/** The figures of the selected design's result, one tab each; restyled when the theme changes. */
public final class PlotsPane extends ResultPane {

    private final JTabbedPane tabs = new JTabbedPane(JTabbedPane.TOP, JTabbedPane.SCROLL_TAB_LAYOUT);
    private final List<FigureView> views = new ArrayList<>();

    public PlotsPane(Workspace workspace) {
        super(PaneArrangement.PLOTS, "Plots", "Impedance, power, efficiency, capacitor voltage, coupling, envelope, tolerance",
                DockableStyle.BOTH, workspace);
        tabs.setName("plotTabs");
        for (String title : ResultFigures.TITLES) {
            FigureView v = new FigureView("plot " + title);
            views.add(v);
            tabs.addTab(title, v);
        }
        add(tabs);
        UIManager.addPropertyChangeListener(e -> {
            if ("lookAndFeel".equals(e.getPropertyName())) {
                show(workspace.selected());
            }
        });
    }

    public List<FigureView> views() {
        return List.copyOf(views);
    }

    @Override
    protected void show(OpenDesign d) {
        List<Figure> figures = d == null || d.result() == null ? null : ResultFigures.all(d.result(), ChartStyle.fromLookAndFeel());
        for (int i = 0; i < views.size(); i++) {
            String title = ResultFigures.TITLES.get(i);
            views.get(i).show(figures != null ? figures.get(i)
                    : Figure.missing(title, d == null ? "No design open." : "Computing…"));
        }
    }
}
