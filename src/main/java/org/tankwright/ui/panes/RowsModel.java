package org.tankwright.ui.panes;

import java.util.List;
import java.util.function.BiFunction;
import javax.swing.table.AbstractTableModel;

/** A read-only table over a list of rows: named columns and a function giving each cell. */
final class RowsModel<R> extends AbstractTableModel {

    private static final long serialVersionUID = 1L;
    private final String[] columns;
    private final transient BiFunction<R, Integer, Object> cell;
    private transient List<R> rows = List.of();

    RowsModel(String[] columns, BiFunction<R, Integer, Object> cell) {
        this.columns = columns.clone();
        this.cell = cell;
    }

    void set(List<R> r) {
        rows = List.copyOf(r);
        fireTableDataChanged();
    }

    List<R> rows() {
        return rows;
    }

    @Override
    public int getRowCount() {
        return rows.size();
    }

    @Override
    public int getColumnCount() {
        return columns.length;
    }

    @Override
    public String getColumnName(int c) {
        return columns[c];
    }

    @Override
    public Object getValueAt(int r, int c) {
        return cell.apply(rows.get(r), c);
    }
}
