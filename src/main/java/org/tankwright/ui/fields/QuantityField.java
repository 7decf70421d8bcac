package org.tankwright.ui.fields;

import com.formdev.flatlaf.FlatClientProperties;
import java.awt.Color;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.function.Consumer;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JTextField;
import javax.swing.UIManager;
import net.miginfocom.swing.MigLayout;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;

/**
 * A text field for one quantity: accepts anything the units parser accepts ({@code 4n7},
 * {@code 4.7 nF}, {@code 100k}), shows the parsed value with its unit beside it, and turns red
 * with a message naming the field, the value and what is allowed when the text is not valid.
 * The value it reports is always the last valid one: invalid text never reaches the document.
 * An optional field may be left empty (the value is then absent: null).
 */
public final class QuantityField extends JPanel {

    private static final int SIG = 3;

    private final QuantitySpec spec;
    private final JTextField text = new JTextField(9);
    private final JLabel echo = new JLabel(" ");
    private final List<Consumer<Double>> listeners = new ArrayList<>();
    private final String tip;
    private Double value;
    private String problem;
    private boolean quiet;

    public QuantityField(QuantitySpec spec) {
        super(new MigLayout("insets 0, gap 6", "[grow,fill][130!]", ""));
        this.spec = spec;
        setOpaque(false);
        text.setName(spec.label());
        echo.setName(spec.label() + ".echo");
        tip = "<html><b>" + escape(spec.label()) + "</b><br>" + escape(spec.meaning()) + "<br>allowed: " + escape(spec.range())
                + (spec.optional() ? "; may be left empty" : "") + "<br>e.g. " + escape(spec.dimension().example()) + "</html>";
        text.setToolTipText(tip);
        echo.setToolTipText(tip);
        if (spec.optional()) {
            text.putClientProperty(FlatClientProperties.PLACEHOLDER_TEXT, "auto");
        }
        add(text);
        add(echo);
        text.getDocument().addDocumentListener(new OnTextChange(this::edited));
    }

    /** Called with each new valid value the user types (null: left empty). */
    public void addValueListener(Consumer<Double> listener) {
        listeners.add(listener);
    }

    /** Shows {@code si} (from the document) without notifying listeners; clears any error. */
    public void setValue(Double si) {
        if (problem == null && Objects.equals(si, value) && Objects.equals(parsedText(), si)) {
            return; // the user's own spelling already says this; keep it
        }
        value = si;
        quiet = true;
        try {
            text.setText(si == null ? "" : formatted(si));
        } finally {
            quiet = false;
        }
        showValid();
    }

    /** The last valid value (SI), or null when absent. */
    public Double value() {
        return value;
    }

    /** The current problem with the text, or null when it is valid. */
    public String problem() {
        return problem;
    }

    public JTextField textField() {
        return text;
    }

    public QuantitySpec spec() {
        return spec;
    }

    /** Marks the field invalid with {@code message} (a rule across fields refused the value); the document is unchanged. */
    public void showProblem(String message) {
        showInvalid(spec.label() + ": " + message);
    }

    /** The invalid state's outline marker (for tests): {@code "error"} or null. */
    public Object outline() {
        return text.getClientProperty(FlatClientProperties.OUTLINE);
    }

    private String formatted(double si) {
        return spec.integer() || spec.dimension() == Dimension.DIMENSIONLESS
                ? Quantities.number(si, 6).replaceFirst("\\.?0+$", "")
                : Quantities.format(si, spec.dimension(), 4);
    }

    private Double parsedText() {
        String t = text.getText();
        if (t.isBlank()) {
            return null;
        }
        try {
            return Quantities.parse(t, spec.dimension());
        } catch (IllegalArgumentException e) {
            return Double.NaN;
        }
    }

    private void edited() {
        if (quiet) {
            return;
        }
        Double parsed;
        if (text.getText().isBlank()) {
            if (!spec.optional()) {
                showInvalid(spec.label() + ": is required; allowed " + spec.range());
                return;
            }
            // Replacing the text removes it before inserting the new one: wait until the
            // event is over, and only then take an empty field to mean "absent".
            javax.swing.SwingUtilities.invokeLater(() -> {
                if (text.getText().isBlank()) {
                    commit(null);
                }
            });
            return;
        } else {
            try {
                parsed = Quantities.parse(text.getText(), spec.dimension());
            } catch (IllegalArgumentException e) {
                showInvalid(spec.label() + ": " + e.getMessage());
                return;
            }
            String wrong = spec.check(parsed);
            if (wrong != null) {
                showInvalid(spec.label() + ": " + formatted(parsed) + " " + wrong);
                return;
            }
        }
        commit(parsed);
    }

    private void commit(Double parsed) {
        boolean changed = !Objects.equals(parsed, value);
        value = parsed;
        showValid();
        if (changed) {
            for (Consumer<Double> l : List.copyOf(listeners)) {
                l.accept(parsed);
            }
        }
    }

    private void showValid() {
        problem = null;
        text.putClientProperty(FlatClientProperties.OUTLINE, null);
        text.setToolTipText(tip);
        echo.setForeground(UIManager.getColor("Label.disabledForeground"));
        echo.setText(value == null ? "auto" : "= " + (spec.integer() ? formatted(value) : Quantities.format(value, spec.dimension(), SIG)));
    }

    private void showInvalid(String message) {
        problem = message;
        text.putClientProperty(FlatClientProperties.OUTLINE, FlatClientProperties.OUTLINE_ERROR);
        Color err = UIManager.getColor("Component.error.focusedBorderColor");
        echo.setForeground(err != null ? err : Color.RED);
        echo.setText("invalid: keeps " + (value == null ? "auto" : formatted(value)));
        text.setToolTipText("<html><b>" + escape(message) + "</b><br>" + tip.substring("<html>".length()));
    }

    static String escape(String s) {
        return s == null ? "" : s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }
}
