package org.tankwright.ui.fields;

import com.formdev.flatlaf.FlatClientProperties;
import java.awt.Color;
import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleConsumer;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JTextField;
import javax.swing.UIManager;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
import net.miginfocom.swing.MigLayout;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;

/**
 * A text field for one quantity: accepts anything the units parser accepts ({@code 4n7},
 * {@code 4.7 nF}, {@code 100k}), shows the parsed value with its unit beside it, and turns red
 * with the parser's message when the text is not valid or out of range. The value it reports
 * is always the last valid one: an invalid text never reaches the document.
 */
public final class QuantityField extends JPanel {

    private static final int SIG = 3;

    private final String label;
    private final Dimension dimension;
    private final double min;
    private final double max;
    private final JTextField text = new JTextField(9);
    private final JLabel echo = new JLabel(" ");
    private final List<DoubleConsumer> listeners = new ArrayList<>();
    private final String tip;
    private double value;
    private String problem;
    private boolean quiet;

    /**
     * @param label     the field's name in messages ("C1 capacitance")
     * @param dimension what the field holds
     * @param min       smallest allowed value (inclusive)
     * @param max       largest allowed value (inclusive)
     * @param meaning   one sentence for the tooltip
     */
    public QuantityField(String label, Dimension dimension, double min, double max, String meaning) {
        super(new MigLayout("insets 0, gap 6", "[grow,fill][120!]", ""));
        this.label = label;
        this.dimension = dimension;
        this.min = min;
        this.max = max;
        setOpaque(false);
        text.setName(label);
        echo.setName(label + ".echo");
        String range = "allowed: " + Quantities.format(min, dimension, SIG) + " … " + Quantities.format(max, dimension, SIG);
        tip = "<html><b>" + escape(label) + "</b><br>" + escape(meaning) + "<br>" + escape(range)
                + "<br>e.g. " + escape(dimension.example()) + "</html>";
        text.setToolTipText(tip);
        echo.setToolTipText(tip);
        add(text);
        add(echo);
        text.getDocument().addDocumentListener(new DocumentListener() {
            @Override
            public void insertUpdate(DocumentEvent e) {
                edited();
            }

            @Override
            public void removeUpdate(DocumentEvent e) {
                edited();
            }

            @Override
            public void changedUpdate(DocumentEvent e) {
                edited();
            }
        });
    }

    /** Called with each new valid value the user types. */
    public void addValueListener(DoubleConsumer listener) {
        listeners.add(listener);
    }

    /** Shows {@code si} (from the document) without notifying listeners; clears any error. */
    public void setValue(double si) {
        value = si;
        if (problem == null && isCurrentText(si)) {
            return; // the user's own spelling already says this; keep it
        }
        quiet = true;
        try {
            text.setText(Quantities.format(si, dimension, 4));
        } finally {
            quiet = false;
        }
        showValid();
    }

    /** The last valid value (SI). */
    public double value() {
        return value;
    }

    /** The current problem with the text, or null when it is valid. */
    public String problem() {
        return problem;
    }

    public JTextField textField() {
        return text;
    }

    public Dimension dimension() {
        return dimension;
    }

    private boolean isCurrentText(double si) {
        try {
            return Quantities.parse(text.getText(), dimension) == si;
        } catch (IllegalArgumentException e) {
            return false;
        }
    }

    private void edited() {
        if (quiet) {
            return;
        }
        double parsed;
        try {
            parsed = Quantities.parse(text.getText(), dimension);
        } catch (IllegalArgumentException e) {
            showInvalid(label + ": " + e.getMessage());
            return;
        }
        if (parsed < min || parsed > max) {
            showInvalid(label + ": " + Quantities.format(parsed, dimension, SIG) + " is out of range; allowed "
                    + Quantities.format(min, dimension, SIG) + " … " + Quantities.format(max, dimension, SIG));
            return;
        }
        showValid();
        if (parsed != value) {
            value = parsed;
            for (DoubleConsumer l : List.copyOf(listeners)) {
                l.accept(parsed);
            }
        }
    }

    private void showValid() {
        problem = null;
        text.putClientProperty(FlatClientProperties.OUTLINE, null);
        text.setToolTipText(tip);
        echo.setForeground(UIManager.getColor("Label.disabledForeground"));
        echo.setText("= " + Quantities.format(value, dimension, SIG));
    }

    private void showInvalid(String message) {
        problem = message;
        text.putClientProperty(FlatClientProperties.OUTLINE, FlatClientProperties.OUTLINE_ERROR);
        Color err = UIManager.getColor("Component.error.focusedBorderColor");
        echo.setForeground(err != null ? err : Color.RED);
        echo.setText("invalid; keeps " + Quantities.format(value, dimension, SIG));
        text.setToolTipText("<html><b>" + escape(message) + "</b><br>" + tip.substring("<html>".length()));
    }

    /** The invalid state's outline marker (for tests): {@code "error"} or null. */
    public Object outline() {
        return text.getClientProperty(FlatClientProperties.OUTLINE);
    }

    static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }
}
