package org.tankwright.ui.plots;

import java.awt.BorderLayout;
import java.util.function.Supplier;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.SwingUtilities;
import net.miginfocom.swing.MigLayout;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.ToleranceRun;
import org.tankwright.charts.ChartStyle;
import org.tankwright.charts.Figure;
import org.tankwright.charts.ToleranceFigures;
import org.tankwright.tolerance.CancelToken;
import org.tankwright.tolerance.StudyResult;

/**
 * The tolerance study of the selected design: run on demand off the event thread (it can take
 * seconds), with progress and a Stop button; then a histogram of the chosen outcome. A new
 * result of the design makes the study stale: it is cleared, not silently kept.
 */
public final class ToleranceTab extends JPanel {

    private final Supplier<AnalysisResult> current;
    private final JButton run = new JButton("Run the tolerance study");
    private final JButton stop = new JButton("Stop");
    private final JProgressBar progress = new JProgressBar();
    private final JComboBox<String> outcome = new JComboBox<>(new String[] {
            ToleranceRun.FREQUENCY, ToleranceRun.POWER, ToleranceRun.EFFICIENCY, ToleranceRun.C1_VOLTAGE});
    private final JLabel note = new JLabel(" ");
    private final FigureView view = new FigureView("plot Tolerance");
    private CancelToken token;
    private StudyResult study;
    private long generation;

    /** @param current the selected design's latest result (null when none) */
    public ToleranceTab(Supplier<AnalysisResult> current) {
        super(new BorderLayout());
        this.current = current;
        setName("toleranceTab");
        run.setName("tolerance.run");
        stop.setName("tolerance.stop");
        stop.setEnabled(false);
        progress.setStringPainted(true);
        progress.setString("");
        JPanel bar = new JPanel(new MigLayout("insets 4 8 0 8, gap 8", "[][][120!][]push[]", ""));
        bar.add(run);
        bar.add(stop);
        bar.add(progress);
        bar.add(note);
        bar.add(outcome);
        add(bar, BorderLayout.NORTH);
        add(view, BorderLayout.CENTER);
        run.addActionListener(e -> start());
        stop.addActionListener(e -> {
            if (token != null) {
                token.cancel();
            }
        });
        outcome.addActionListener(e -> showStudy());
        reset();
    }

    /** The design's result changed: a study of the old one no longer applies. */
    public void resultChanged() {
        if (token != null) {
            token.cancel();
        }
        reset();
    }

    public StudyResult study() {
        return study;
    }

    private void reset() {
        generation++;
        study = null;
        token = null;
        run.setEnabled(current.get() != null && current.get().network() != null);
        stop.setEnabled(false);
        progress.setValue(0);
        progress.setString("");
        note.setText(" ");
        view.show(Figure.missing("Tolerance", current.get() == null || current.get().network() == null
                ? "Not computed for this design: the tolerance study needs a tuned network."
                : "Not run yet: press \"Run the tolerance study\" (it samples the design's tolerances; it can take a few seconds)."));
    }

    private void start() {
        AnalysisResult base = current.get();
        if (base == null) {
            return;
        }
        long mine = ++generation;
        CancelToken t = new CancelToken();
        token = t;
        run.setEnabled(false);
        stop.setEnabled(true);
        progress.setString("0 %");
        Thread worker = new Thread(() -> {
            StudyResult r = null;
            String failure = null;
            try {
                r = ToleranceRun.run(base, t, (done, total) -> SwingUtilities.invokeLater(() -> {
                    if (mine == generation && total > 0) {
                        progress.setValue((int) Math.round(100.0 * done / total));
                        progress.setString(done + " / " + total);
                    }
                }));
            } catch (RuntimeException e) {
                failure = e.getMessage() != null ? e.getMessage() : e.getClass().getSimpleName();
            }
            StudyResult done = r;
            String why = failure;
            SwingUtilities.invokeLater(() -> finished(mine, done, why));
        }, "tankwright-tolerance");
        worker.setDaemon(true);
        worker.setPriority(Thread.NORM_PRIORITY - 1);
        worker.start();
    }

    private void finished(long mine, StudyResult r, String failure) {
        if (mine != generation) {
            return; // the design changed meanwhile
        }
        token = null;
        run.setEnabled(true);
        stop.setEnabled(false);
        if (r == null) {
            view.show(Figure.missing("Tolerance", "The study failed: " + failure));
            return;
        }
        study = r;
        note.setText(r.cancelled() ? "stopped after " + r.completed() + " samples" : r.completed() + " samples");
        showStudy();
    }

    /** Redraws the histogram in the current theme's colours. */
    public void restyle() {
        showStudy();
    }

    private void showStudy() {
        if (study != null) {
            view.show(ToleranceFigures.histogram(study, (String) outcome.getSelectedItem(), ChartStyle.fromLookAndFeel()));
        }
    }
}
