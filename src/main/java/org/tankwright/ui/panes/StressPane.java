package org.tankwright.ui.panes;

import io.github.andrewauclair.moderndocking.DockableStyle;
import java.util.Comparator;
import java.util.List;
import javax.swing.JLabel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.table.TableRowSorter;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.ElementStress;
import org.tankwright.ui.model.OpenDesign;
import org.tankwright.ui.model.Workspace;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;

/** One row per component: rms and peak voltage and current, loss, rating, margin and status; sortable by any column. */
public final class StressPane extends ResultPane {

    /** One component's stresses (SI; NaN where not applicable). */
    public record Row(String component, double vRms, double vPeak, double iRms, double iPeak, double loss,
                      String rating, double margin, String status) { }

    private static final String[] COLUMNS = {"element", "V rms", "V peak (worst)", "I rms (worst)", "I peak", "loss", "rating", "margin", "status"};
    private static final Dimension[] DIMS = {null, Dimension.VOLTAGE, Dimension.VOLTAGE, Dimension.CURRENT, Dimension.CURRENT,
            Dimension.POWER, null, Dimension.FRACTION, null};
    private final RowsModel<Row> model = new RowsModel<>(COLUMNS, StressPane::cell);
    private final JTable table = new JTable(model);
    private final JLabel state = new JLabel(" ");

    public StressPane(Workspace workspace) {
        super(PaneArrangement.STRESS, "Component stress", "Voltage, current and loss of every part against its rating",
                DockableStyle.BOTH, workspace);
        table.setName("stressTable");
        table.setFillsViewportHeight(true);
        TableRowSorter<RowsModel<Row>> sorter = new TableRowSorter<>(model);
        for (int c = 1; c < COLUMNS.length; c++) {
            if (DIMS[c] != null) {
                sorter.setComparator(c, Comparator.comparingDouble(o -> ((Cell) o).si()));
            }
        }
        table.setRowSorter(sorter);
        state.setName("stress.state");
        add(state, java.awt.BorderLayout.NORTH);
        add(new JScrollPane(table));
    }

    /** The stress rows of a result: each element at the operating point, or at the envelope's worst point when larger. */
    static List<Row> rowsOf(AnalysisResult r) {
        if (r.stresses() == null) {
            return List.of();
        }
        return r.stresses().stream().map(StressPane::row).toList();
    }

    private static Row row(ElementStress s) {
        double vPeak = Double.isFinite(s.worstVoltagePeak()) ? Math.max(s.voltagePeak(), s.worstVoltagePeak()) : s.voltagePeak();
        double iRms = Double.isFinite(s.worstCurrentRms()) ? Math.max(s.currentRms(), s.worstCurrentRms()) : s.currentRms();
        String rating = (Double.isFinite(s.voltageRating()) ? Quantities.format(s.voltageRating(), Dimension.VOLTAGE, 3) + " pk" : "")
                + (Double.isFinite(s.voltageRating()) && Double.isFinite(s.currentRating()) ? ", " : "")
                + (Double.isFinite(s.currentRating()) ? Quantities.format(s.currentRating(), Dimension.CURRENT, 3) + " rms" : "");
        double m = s.margin();
        String status = !Double.isFinite(m) ? "no rating" : m < 0 ? "OVER RATING" : m < 0.2 ? "low margin" : "ok";
        return new Row(s.id() + " " + s.role(), s.voltageRms(), vPeak, iRms, s.currentPeak(), s.loss(),
                rating.isEmpty() ? "—" : rating, m, status);
    }

    @Override
    protected void show(OpenDesign d) {
        List<Row> rows = d == null || d.result() == null ? List.of() : rowsOf(d.result());
        model.set(rows);
        state.setText(d == null ? " No design open"
                : rows.isEmpty() ? " Component stresses: not computed for this design" : " Peak voltage and rms current include the envelope's worst point; margin is to the derated rating");
    }

    /** A number with the dimension it is shown in, sorted by value. */
    record Cell(double si, Dimension dim) {
        @Override
        public String toString() {
            return Double.isFinite(si) ? Quantities.format(si, dim, 3) : "—";
        }
    }

    private static Object cell(Row row, int c) {
        return switch (c) {
            case 0 -> row.component();
            case 1 -> new Cell(row.vRms(), DIMS[c]);
            case 2 -> new Cell(row.vPeak(), DIMS[c]);
            case 3 -> new Cell(row.iRms(), DIMS[c]);
            case 4 -> new Cell(row.iPeak(), DIMS[c]);
            case 5 -> new Cell(row.loss(), DIMS[c]);
            case 6 -> row.rating();
            case 7 -> new Cell(row.margin(), DIMS[c]);
            default -> row.status();
        };
    }
}
