package org.tankwright.ui.panes;

import io.github.andrewauclair.moderndocking.DockableStyle;
import java.util.List;
import javax.swing.JLabel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import org.tankwright.ui.model.OpenDesign;
import org.tankwright.ui.model.Workspace;

/** The key results of the selected design at a glance. */
public final class FiguresPane extends ResultPane {

    private final RowsModel<Readings.Row> model = new RowsModel<>(new String[] {"quantity", "value"},
            (row, c) -> c == 0 ? row.quantity() : row.value());
    private final JTable table = new JTable(model) {
        @Override
        public String getToolTipText(java.awt.event.MouseEvent e) {
            int row = rowAtPoint(e.getPoint());
            return row < 0 ? null : model.rows().get(convertRowIndexToModel(row)).note();
        }
    };
    private final JLabel state = new JLabel(" ");
    private final javax.swing.JTextArea missing = new javax.swing.JTextArea(" ");

    public FiguresPane(Workspace workspace) {
        super(PaneArrangement.FIGURES, "Key figures", "The selected design's main results", DockableStyle.BOTH, workspace);
        table.setName("figuresTable");
        table.setFillsViewportHeight(true);
        table.setShowHorizontalLines(true);
        table.getColumnModel().getColumn(0).setPreferredWidth(120);
        table.getColumnModel().getColumn(1).setPreferredWidth(110);
        state.setName("figures.state");
        missing.setName("figures.missing");
        missing.setEditable(false);
        missing.setFocusable(false);
        missing.setOpaque(false);
        missing.setLineWrap(true);
        missing.setWrapStyleWord(true);
        missing.setBorder(javax.swing.BorderFactory.createEmptyBorder(4, 4, 4, 4));
        add(state, java.awt.BorderLayout.NORTH);
        add(new JScrollPane(table));
        add(missing, java.awt.BorderLayout.SOUTH);
    }

    @Override
    public void computing(OpenDesign d) {
        if (d == workspace.selected()) {
            state.setText(" Computing…");
        }
    }

    @Override
    protected void show(OpenDesign d) {
        if (d == null) {
            model.set(List.of());
            state.setText(" No design open");
        } else if (d.result() == null) {
            model.set(List.of());
            state.setText(d.failure() != null ? " Not computed: " + d.failure() : " Computing…");
        } else {
            model.set(Readings.of(d.result()));
            String m = Readings.missing(d.result());
            missing.setText(m == null ? "" : m);
            missing.setForeground(javax.swing.UIManager.getColor("Label.disabledForeground"));
            missing.setFont(javax.swing.UIManager.getFont("Label.font"));
            state.setText(d.failure() != null ? " Showing the last good result; the latest failed: " + d.failure()
                    : " " + d.result().design().name());
        }
    }

    /** The value shown for {@code quantity}, or null (for tests). */
    public String valueOf(String quantity) {
        for (Readings.Row r : model.rows()) {
            if (r.quantity().equals(quantity)) {
                return r.value();
            }
        }
        return null;
    }
}
