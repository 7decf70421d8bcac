package org.tankwright.ui.fields;

import java.lang.reflect.RecordComponent;
import java.util.List;
import javax.swing.JCheckBox;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JTextField;
import org.tankwright.design.Design;
import org.tankwright.design.Field;
import org.tankwright.design.Problem;
import org.tankwright.design.Token;
import org.tankwright.ui.model.FieldPath;

/** One field of the form bound to one path of the design: numbers, choices, switches and text. */
public abstract class FieldEditor {

    /** Where edits go; returns the problems when the design refused the value. */
    @FunctionalInterface
    public interface Sink {
        List<Problem> apply(FieldEditor source, Object value, boolean merge);
    }

    private final FieldPath path;
    protected final Sink sink;
    protected boolean quiet;

    protected FieldEditor(FieldPath path, Sink sink) {
        this.path = path;
        this.sink = sink;
    }

    public FieldPath path() {
        return path;
    }

    /** The focusable component (text field, combo box, check box). */
    public abstract JComponent component();

    /** What goes into the form (the component, or a panel around it). */
    public JComponent view() {
        return component();
    }

    /** Shows the value {@code d} holds at this path, without producing an edit. */
    public final void refresh(Design d) {
        quiet = true;
        try {
            show(path.get(d));
        } finally {
            quiet = false;
        }
    }

    protected abstract void show(Object value);

    public void focus() {
        component().requestFocusInWindow();
    }

    /** The editor suited to component {@code c}'s type. */
    static FieldEditor create(FieldPath p, RecordComponent c, Field f, String label, Sink sink) {
        Class<?> t = c.getType();
        if (t.isEnum()) {
            return new Choice(p, t, !f.required() && f.def().isEmpty(), sink);
        }
        if (t == Boolean.class || t == boolean.class) {
            return new Switch(p, label, sink);
        }
        if (t == String.class) {
            return new Text(p, sink);
        }
        return new Number(p, QuantitySpec.of(label, f, t), t, sink);
    }

    /** A quantity. */
    public static final class Number extends FieldEditor {
        private final QuantityField field;

        Number(FieldPath p, QuantitySpec spec, Class<?> type, Sink sink) {
            super(p, sink);
            field = new QuantityField(spec);
            field.textField().setName(p.json());
            field.addValueListener(v -> {
                List<Problem> problems = sink.apply(this, convert(v, type), true);
                if (!problems.isEmpty()) {
                    field.showProblem(problems.get(0).message());
                }
            });
        }

        @Override
        public JComponent component() {
            return field.textField();
        }

        @Override
        public JComponent view() {
            return field;
        }

        public QuantityField field() {
            return field;
        }

        @Override
        protected void show(Object value) {
            field.setValue(value == null ? null : ((java.lang.Number) value).doubleValue());
        }

        private static Object convert(Double v, Class<?> type) {
            if (v == null) {
                return null;
            }
            if (type == int.class || type == Integer.class) {
                return (int) Math.round(v);
            }
            if (type == long.class || type == Long.class) {
                return Math.round(v);
            }
            return v;
        }
    }

    /** A choice among an enum's tokens. */
    public static final class Choice extends FieldEditor {
        private static final String UNSET = "(default)";
        private final JComboBox<String> box = new JComboBox<>();
        private final Object[] constants;

        Choice(FieldPath p, Class<?> type, boolean optional, Sink sink) {
            super(p, sink);
            constants = type.getEnumConstants();
            box.setName(p.json());
            if (optional) {
                box.addItem(UNSET);
            }
            for (Object o : constants) {
                box.addItem(Token.of((Enum<?>) o));
            }
            box.addActionListener(e -> {
                if (quiet) {
                    return;
                }
                List<Problem> problems = sink.apply(this, selected(), false);
                box.putClientProperty("JComponent.outline", problems.isEmpty() ? null : "error");
            });
        }

        private Object selected() {
            String s = (String) box.getSelectedItem();
            for (Object o : constants) {
                if (Token.of((Enum<?>) o).equals(s)) {
                    return o;
                }
            }
            return null;
        }

        @Override
        public JComponent component() {
            return box;
        }

        @Override
        protected void show(Object value) {
            box.setSelectedItem(value == null ? UNSET : Token.of((Enum<?>) value));
            box.putClientProperty("JComponent.outline", null);
        }
    }

    /** A yes/no switch. */
    public static final class Switch extends FieldEditor {
        private final JCheckBox box;

        Switch(FieldPath p, String label, Sink sink) {
            super(p, sink);
            box = new JCheckBox();
            box.setName(p.json());
            box.addActionListener(e -> {
                if (!quiet) {
                    sink.apply(this, box.isSelected(), false);
                }
            });
        }

        @Override
        public JComponent component() {
            return box;
        }

        @Override
        protected void show(Object value) {
            box.setSelected(Boolean.TRUE.equals(value));
        }
    }

    /** Free text (names, materials, catalogue files). */
    public static final class Text extends FieldEditor {
        private final JTextField field = new JTextField(18);

        Text(FieldPath p, Sink sink) {
            super(p, sink);
            field.setName(p.json());
            field.getDocument().addDocumentListener(new OnTextChange(this::edited));
        }

        private void edited() {
            if (quiet) {
                return;
            }
            String s = field.getText();
            List<Problem> problems = sink.apply(this, s.isBlank() ? null : s, true);
            field.putClientProperty("JComponent.outline", problems.isEmpty() ? null : "error");
        }

        @Override
        public JComponent component() {
            return field;
        }

        @Override
        protected void show(Object value) {
            String s = value == null ? "" : value.toString();
            if (!s.equals(field.getText())) {
                field.setText(s);
                field.setCaretPosition(0); // show the beginning of a long name or description
            }
        }
    }
}
