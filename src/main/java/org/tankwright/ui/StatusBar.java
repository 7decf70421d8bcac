package org.tankwright.ui;

import java.awt.Color;
import java.util.Locale;
import javax.swing.BorderFactory;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.UIManager;
import net.miginfocom.swing.MigLayout;

/** The strip along the bottom: computation state and time, findings count, the file's state. */
public final class StatusBar extends JPanel {

    private final JLabel state = new JLabel("Ready");
    private final JLabel findings = new JLabel(" ");
    private final JLabel file = new JLabel(" ");
    private final javax.swing.JProgressBar busy = new javax.swing.JProgressBar();
    private final javax.swing.JButton stop = new javax.swing.JButton("Stop");
    private long computations;

    public StatusBar() {
        super(new MigLayout("insets 2 8 2 8, gap 16, hidemode 3", "", ""));
        Color line = UIManager.getColor("Component.borderColor");
        setBorder(BorderFactory.createMatteBorder(1, 0, 0, 0, line != null ? line : Color.GRAY));
        state.setName("status.state");
        findings.setName("status.findings");
        file.setName("status.file");
        busy.setIndeterminate(true);
        busy.setVisible(false);
        busy.setName("status.busy");
        stop.setVisible(false);
        stop.setName("status.stop");
        stop.setToolTipText("Stop the computation in flight and keep showing the last result");
        stop.putClientProperty("JButton.buttonType", "borderless");
        add(busy, "w 80!, h 10!");
        add(stop);
        add(state, "growx, pushx");
        add(findings);
        add(file);
    }

    /** Its height is fixed by the window: a change of text is laid out here, not across the window. */
    @Override
    public boolean isValidateRoot() {
        return true;
    }

    /** A computation was started. */
    public void computing() {
        state.setText("Computing…");
        showBusy(true);
    }

    /** Runs {@code action} when the user presses Stop. */
    public void onStop(Runnable action) {
        stop.addActionListener(e -> action.run());
    }

    private void showBusy(boolean on) {
        busy.setVisible(on);
        stop.setVisible(on);
    }

    /** A computation finished and is shown. */
    public void computed(long nanos) {
        computations++;
        showBusy(false);
        state.setText(String.format(Locale.ROOT, "Computed in %.1f ms", nanos / 1e6));
    }

    /** An edit's operating point is shown; its sweeps and envelope are still being computed. */
    public void previewShown(long nanos) {
        showBusy(true);
        state.setText(String.format(Locale.ROOT, "Operating point in %.1f ms · computing the sweeps and the envelope…", nanos / 1e6));
    }

    /** The last computation failed. */
    public void failed(String message) {
        showBusy(false);
        state.setText("Not computed: " + message);
    }

    /** Plain message in the state slot. */
    public void message(String text) {
        state.setText(text);
    }

    /** Shows how many findings of each weight the result has. */
    public void findings(int dangers, int warnings, int notes) {
        findings.setText(dangers + " danger · " + warnings + " warning · " + notes + " caution or notice");
    }

    /** Shows the file name and whether it has unsaved edits. */
    public void file(String name, boolean dirty) {
        file.setText(dirty ? name + " • unsaved" : name);
    }

    /** How many results were shown (for tests). */
    public long computations() {
        return computations;
    }

    public String stateText() {
        return state.getText();
    }
}
