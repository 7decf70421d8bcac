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
            if (row < 0) {
                return null;
            }
            Readings.Row r = model.rows().get(convertRowIndexToModel(row));
            return r.quantity() + ": " + r.value() + (r.note() == null || r.note().isBlank() ? "" : " (" + r.note() + ")");
        }

        @Override
        public void doLayout() {
            fitColumns();
            super.doLayout();
        }
    };
    private final WrappingCell cell = new WrappingCell();
    /** The widths the row heights were last fitted to. */
    private int fittedWidth0 = -1;
    private int fittedWidth1 = -1;
    private final JLabel state = new JLabel(" ");
    private final javax.swing.JTextArea missing = new javax.swing.JTextArea(" ");

    public FiguresPane(Workspace workspace) {
        super(PaneArrangement.FIGURES, "Key figures", "The selected design's main results", DockableStyle.BOTH, workspace);
        table.setName("figuresTable");
        table.setFillsViewportHeight(true);
        table.setShowHorizontalLines(true);
        table.setDefaultRenderer(Object.class, cell);
        table.setAutoResizeMode(JTable.AUTO_RESIZE_OFF); // fitColumns shares the width out
        model.addTableModelListener(e -> {
            fittedWidth0 = -1;
            table.revalidate();
        });
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

    /**
     * Shares the table's width between the columns: the quantity column as wide as its longest
     * name (at most 55 % of the width), the value column the rest; then each row is as tall as its
     * longer cell wraps to, so no name or value is cut short at any pane width.
     */
    private void fitColumns() {
        int width = table.getParent() != null ? table.getParent().getWidth() : table.getWidth();
        if (width <= 0 || table.getColumnCount() < 2) {
            return;
        }
        java.awt.FontMetrics fm = table.getFontMetrics(table.getFont());
        int pad = 2 * cell.gap() + 4;
        int names = fm.stringWidth("quantity");
        int values = fm.stringWidth("value");
        for (Readings.Row r : model.rows()) {
            names = Math.max(names, fm.stringWidth(r.quantity()));
            values = Math.max(values, fm.stringWidth(r.value()));
        }
        int w0 = Math.min(names + pad, (int) (0.55 * width));
        w0 = Math.max(w0, Math.min(names + pad, width - (values + pad)));
        w0 = Math.max(40, Math.min(w0, width - 40));
        int w1 = width - w0;
        table.getColumnModel().getColumn(0).setPreferredWidth(w0);
        table.getColumnModel().getColumn(0).setWidth(w0);
        table.getColumnModel().getColumn(1).setPreferredWidth(w1);
        table.getColumnModel().getColumn(1).setWidth(w1);
        if (w0 == fittedWidth0 && w1 == fittedWidth1) {
            return;
        }
        fittedWidth0 = w0;
        fittedWidth1 = w1;
        int line = Math.max(table.getRowHeight(), fm.getHeight() + 4);
        for (int row = 0; row < table.getRowCount(); row++) {
            int lines = 1;
            for (int col = 0; col < 2; col++) {
                Object v = table.getValueAt(row, col);
                lines = Math.max(lines, WrappingCell.lines(fm, v == null ? "" : v.toString(),
                        table.getColumnModel().getColumn(col).getWidth() - 2 * cell.gap() - 2));
            }
            int h = lines == 1 ? line : lines * fm.getHeight() + 6;
            if (table.getRowHeight(row) != h) {
                table.setRowHeight(row, h);
            }
        }
    }

    /**
     * A table cell that shows its text on one line when it fits, and wrapped at word boundaries
     * (instead of ending in "…") when it does not.
     */
    private static final class WrappingCell extends javax.swing.table.DefaultTableCellRenderer {
        /** Draws its lines of text itself: cheaper to paint than a text component. */
        private final Lines wrapped = new Lines();

        int gap() {
            return 4;
        }

        @Override
        public java.awt.Component getTableCellRendererComponent(JTable t, Object value, boolean selected, boolean focus,
                                                                int row, int column) {
            String text = value == null ? "" : value.toString();
            int width = t.getColumnModel().getColumn(column).getWidth() - 2 * gap() - 2;
            if (lines(t.getFontMetrics(t.getFont()), text, width) <= 1) {
                java.awt.Component c = super.getTableCellRendererComponent(t, value, selected, false, row, column);
                setBorder(javax.swing.BorderFactory.createEmptyBorder(0, gap(), 0, gap()));
                return c;
            }
            wrapped.show(text, t.getFont(), width, gap(), selected ? t.getSelectionBackground() : t.getBackground(),
                    selected ? t.getSelectionForeground() : t.getForeground());
            return wrapped;
        }

        /** The words of {@code text} in lines no wider than {@code width} (a longer word has a line of its own). */
        static java.util.List<String> wrap(java.awt.FontMetrics fm, String text, int width) {
            java.util.List<String> out = new java.util.ArrayList<>();
            StringBuilder line = new StringBuilder();
            for (String word : text.split(" ")) {
                if (line.length() > 0 && fm.stringWidth(line + " " + word) > width) {
                    out.add(line.toString());
                    line.setLength(0);
                }
                line.append(line.length() > 0 ? " " : "").append(word);
            }
            out.add(line.toString());
            return out;
        }

        /** How many lines {@code text} takes wrapped at spaces in {@code width} pixels (a word longer than the width takes its own line). */
        static int lines(java.awt.FontMetrics fm, String text, int width) {
            if (width <= 0 || fm.stringWidth(text) <= width) {
                return 1;
            }
            return wrap(fm, text, width).size();
        }
    }

    /** A cell's text in wrapped lines, painted directly. */
    private static final class Lines extends javax.swing.JComponent {
        private java.util.List<String> lines = java.util.List.of();
        private int gap;
        private java.awt.Color background;

        void show(String text, java.awt.Font font, int width, int gap, java.awt.Color bg, java.awt.Color fg) {
            setFont(font);
            this.lines = WrappingCell.wrap(getFontMetrics(font), text, width);
            this.gap = gap;
            this.background = bg;
            setForeground(fg);
        }

        @Override
        protected void paintComponent(java.awt.Graphics g) {
            g.setColor(background);
            g.fillRect(0, 0, getWidth(), getHeight());
            g.setColor(getForeground());
            g.setFont(getFont());
            java.awt.FontMetrics fm = g.getFontMetrics();
            int y = 3 + fm.getAscent();
            for (String l : lines) {
                g.drawString(l, gap, y);
                y += fm.getHeight();
            }
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
