package org.tankwright.ui.panes;

import io.github.andrewauclair.moderndocking.DockableStyle;
import java.awt.BorderLayout;
import java.util.IdentityHashMap;
import java.util.Map;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTabbedPane;
import javax.swing.SwingConstants;
import org.tankwright.ui.drawing.CoilDrawing;
import org.tankwright.ui.drawing.Sketches;
import org.tankwright.ui.fields.DesignForm;
import org.tankwright.ui.model.OpenDesign;
import org.tankwright.ui.model.Workspace;

/** The central area: one tab per open design, each its form beside a to-scale drawing of its coils. */
public final class EditorPane extends Pane implements Workspace.Listener {

    /** One design's tab. */
    public static final class DesignTab extends JPanel {
        private final DesignForm form;
        private final CoilDrawing drawing = new CoilDrawing();
        private final OpenDesign design;

        DesignTab(Workspace ws, OpenDesign d) {
            super(new BorderLayout());
            this.design = d;
            form = new DesignForm(ws, d);
            JScrollPane scroll = new JScrollPane(form);
            scroll.getVerticalScrollBar().setUnitIncrement(16);
            scroll.setBorder(null);
            scroll.setPreferredSize(new java.awt.Dimension(500, 400));
            scroll.setMinimumSize(new java.awt.Dimension(320, 200));
            JSplitPane split = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, scroll, drawing);
            split.setResizeWeight(0.55);
            split.setBorder(null);
            add(split);
            updateDrawing();
        }

        void refresh() {
            form.refresh();
            updateDrawing();
        }

        private void updateDrawing() {
            Sketches.Outcome s = Sketches.of(design.design());
            if (!java.util.Objects.equals(s.sketch(), drawing.sketch()) || drawing.sketch() == null) {
                drawing.show(s.sketch(), s.whyNone());
            }
        }

        public DesignForm form() {
            return form;
        }

        public CoilDrawing drawing() {
            return drawing;
        }
    }

    private final Workspace workspace;
    private final JTabbedPane tabs = new JTabbedPane(JTabbedPane.TOP, JTabbedPane.SCROLL_TAB_LAYOUT);
    private final Map<OpenDesign, DesignTab> byDesign = new IdentityHashMap<>();
    private final JLabel empty = new JLabel("No design open: File ▸ New from preset, or drop a design file here",
            SwingConstants.CENTER);
    private boolean quiet;

    public EditorPane(Workspace workspace) {
        super(PaneArrangement.EDITOR, "Editor", "The selected design's form and coil drawing", DockableStyle.BOTH);
        this.workspace = workspace;
        tabs.setName("designTabs");
        tabs.addChangeListener(e -> {
            if (quiet) {
                return;
            }
            int i = tabs.getSelectedIndex();
            if (i >= 0) {
                workspace.select(((DesignTab) tabs.getComponentAt(i)).design);
            }
        });
        add(empty);
        workspace.addListener(this);
    }

    @Override
    public boolean isClosable() {
        return false;
    }

    /** The tab of {@code d}, or null. */
    public DesignTab tabOf(OpenDesign d) {
        return byDesign.get(d);
    }

    /** Shows the field or section at {@code jsonPath} of {@code d}. */
    public void reveal(OpenDesign d, String jsonPath) {
        DesignTab t = byDesign.get(d);
        if (t != null) {
            tabs.setSelectedComponent(t);
            t.form().reveal(jsonPath);
        }
    }

    @Override
    public void designsChanged() {
        quiet = true;
        try {
            byDesign.keySet().removeIf(d -> {
                if (!workspace.designs().contains(d)) {
                    tabs.remove(byDesign.get(d));
                    return true;
                }
                return false;
            });
            for (OpenDesign d : workspace.designs()) {
                DesignTab t = byDesign.computeIfAbsent(d, k -> {
                    DesignTab nt = new DesignTab(workspace, k);
                    tabs.addTab(k.title(), nt);
                    return nt;
                });
                int i = tabs.indexOfComponent(t);
                String title = (d.isDirty() ? "• " : "") + d.title();
                String tip = d.file() != null ? d.file().toString() : "not saved yet";
                if (!title.equals(tabs.getTitleAt(i))) {
                    tabs.setTitleAt(i, title);
                }
                if (!tip.equals(tabs.getToolTipTextAt(i))) {
                    tabs.setToolTipTextAt(i, tip);
                }
            }
            java.awt.Component want = byDesign.isEmpty() ? empty : tabs;
            if (want.getParent() != this) {
                removeAll();
                add(want);
                revalidate();
                repaint();
            }
        } finally {
            quiet = false;
        }
        selected(workspace.selected());
    }

    @Override
    public void selected(OpenDesign d) {
        DesignTab t = d == null ? null : byDesign.get(d);
        if (t != null && tabs.getSelectedComponent() != t) {
            quiet = true;
            try {
                tabs.setSelectedComponent(t);
            } finally {
                quiet = false;
            }
        }
    }

    @Override
    public void designChanged(OpenDesign d) {
        DesignTab t = byDesign.get(d);
        if (t != null) {
            t.refresh();
        }
    }
}
