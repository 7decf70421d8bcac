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
    private long computations;

    public StatusBar() {
        super(new MigLayout("insets 2 8 2 8, gap 16", "[grow,fill][][]", ""));
        Color line = UIManager.getColor("Component.borderColor");
        setBorder(BorderFactory.createMatteBorder(1, 0, 0, 0, line != null ? line : Color.GRAY));
        state.setName("status.state");
        findings.setName("status.findings");
        file.setName("status.file");
        add(state);
        add(findings);
        add(file);
    }

    /** A computation was started. */
    public void computing() {
        state.setText("Computing…");
    }

    /** A computation finished and is shown. */
    public void computed(long nanos) {
        computations++;
        state.setText(String.format(Locale.ROOT, "Computed in %.1f ms", nanos / 1e6));
    }

    /** The last computation failed. */
    public void failed(String message) {
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
