package org.tankwright.ui.fields;

import java.awt.Color;
import java.awt.Font;
import java.awt.event.FocusAdapter;
import java.awt.event.FocusEvent;
import java.lang.reflect.RecordComponent;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import javax.swing.BorderFactory;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.UIManager;
import net.miginfocom.swing.MigLayout;
import org.tankwright.design.Design;
import org.tankwright.design.Field;
import org.tankwright.design.Problem;
import org.tankwright.ui.model.FieldPath;
import org.tankwright.ui.model.OpenDesign;
import org.tankwright.ui.model.Workspace;

/**
 * The editor form of one design, generated from the design records' field descriptions: one
 * titled section per part of the design (coils, placement, compensation, source, load,
 * capacitor banks, workpiece, studies), a unit-aware field per number, a combo box per choice.
 * Every valid edit goes to the {@link Workspace} as a new design; a refused one leaves the
 * document as it was and says why.
 */
public final class DesignForm extends JPanel {

    /** Section order and titles; components not listed follow in declaration order. */
    private static final Map<String, String> SECTIONS = new LinkedHashMap<>();

    static {
        SECTIONS.put("primary", "Primary coil");
        SECTIONS.put("secondary", "Secondary coil");
        SECTIONS.put("placement", "Placement");
        SECTIONS.put("compensation", "Compensation");
        SECTIONS.put("source", "Source");
        SECTIONS.put("load", "Load");
        SECTIONS.put("capacitors", "Capacitor banks");
        SECTIONS.put("workpiece", "Heater workpiece");
        SECTIONS.put("envelope", "Study: operating envelope");
        SECTIONS.put("tolerances", "Study: tolerances");
        SECTIONS.put("safety", "Study: safety screening");
    }

    private final Workspace workspace;
    private final OpenDesign document;
    private final List<FieldEditor> editors = new ArrayList<>();
    private final Map<String, JComponent> sections = new LinkedHashMap<>();
    private final JLabel message = new JLabel(" ");
    private final javax.swing.JCheckBox showAll = new javax.swing.JCheckBox("Show every field, also the unset alternatives");
    private String shape;

    public DesignForm(Workspace workspace, OpenDesign document) {
        super(new MigLayout("insets 8, wrap 1, gapy 10", "[grow,fill]", ""));
        this.workspace = workspace;
        this.document = document;
        setName("designForm");
        message.setName("form.message");
        showAll.setName("form.showAll");
        showAll.setToolTipText("Coils, wires, backings, sources and loads have fields for each shape or kind; unset ones are hidden");
        showAll.addActionListener(e -> build());
        build();
    }

    /** Brings the form up to date with the document (after an edit, undo or redo). */
    public void refresh() {
        Design d = document.design();
        if (!structure(d).equals(shape)) {
            build();
            return;
        }
        for (FieldEditor e : editors) {
            e.refresh(d);
        }
        message.setText(" ");
    }

    /** The field editing {@code jsonPath} (e.g. {@code $.compensation.c1_F}), or null. */
    public FieldEditor editorFor(String jsonPath) {
        for (FieldEditor e : editors) {
            if (e.path().json().equals(jsonPath)) {
                return e;
            }
        }
        return null;
    }

    /** The section panel for {@code jsonPath} or the nearest enclosing section, or null. */
    public JComponent sectionFor(String jsonPath) {
        String p = jsonPath;
        while (p.contains(".")) {
            JComponent c = sections.get(p);
            if (c != null) {
                return c;
            }
            p = p.substring(0, p.lastIndexOf('.'));
        }
        return null;
    }

    /** Focuses the field at {@code jsonPath} (or its section) and scrolls to it; true when found. */
    public boolean reveal(String jsonPath) {
        FieldEditor e = editorFor(jsonPath);
        JComponent target = e != null ? e.component() : sectionFor(jsonPath);
        if (target == null) {
            return false;
        }
        target.scrollRectToVisible(new java.awt.Rectangle(0, 0, target.getWidth(), target.getHeight() + 40));
        if (e != null) {
            e.focus();
        }
        return true;
    }

    public List<FieldEditor> editors() {
        return List.copyOf(editors);
    }

    private void build() {
        removeAll();
        editors.clear();
        sections.clear();
        Design d = document.design();
        shape = structure(d);
        message.setForeground(errorColor());
        add(showAll);
        add(message);
        JPanel general = section("Design", FieldPath.root().json());
        List<RecordComponent> nested = new ArrayList<>();
        for (RecordComponent c : Design.class.getRecordComponents()) {
            if (Record.class.isAssignableFrom(c.getType())) {
                nested.add(c);
            } else {
                addField(general, FieldPath.root().then(c), c);
            }
        }
        add(general);
        nested.sort((a, b) -> Integer.compare(order(a.getName()), order(b.getName())));
        for (RecordComponent c : nested) {
            FieldPath p = FieldPath.root().then(c);
            Object value = p.get(d);
            if (value == null) {
                continue; // not used by this kind of design
            }
            String title = SECTIONS.getOrDefault(c.getName(), human(c.getName()));
            if (value instanceof org.tankwright.design.Coil coil && coil.label() != null) {
                title += " — " + coil.label();
            }
            JPanel s = section(title, p.json());
            addRecord(s, p, c.getType(), d);
            add(s);
        }
        revalidate();
        repaint();
    }

    private void addRecord(JPanel panel, FieldPath path, Class<?> type, Design d) {
        boolean alternatives = java.util.Arrays.stream(type.getRecordComponents())
                .anyMatch(c -> c.getName().equals("shape") || c.getName().equals("kind"));
        for (RecordComponent c : type.getRecordComponents()) {
            FieldPath p = path.then(c);
            Field f = c.getAnnotation(Field.class);
            boolean unsetAlternative = alternatives && !c.getType().isPrimitive() && p.get(d) == null
                    && (f == null || !f.required());
            if (unsetAlternative && !showAll.isSelected()) {
                continue;
            }
            if (Record.class.isAssignableFrom(c.getType())) {
                if (p.get(d) == null) {
                    continue;
                }
                JLabel sub = new JLabel(human(c.getName()));
                sub.setFont(sub.getFont().deriveFont(Font.BOLD));
                panel.add(sub, "span 2, alignx left, gaptop 6");
                sections.put(p.json(), sub);
                addRecord(panel, p, c.getType(), d);
            } else {
                addField(panel, p, c);
            }
        }
    }

    private void addField(JPanel panel, FieldPath p, RecordComponent c) {
        Field f = c.getAnnotation(Field.class);
        if (f == null) {
            return;
        }
        FieldEditor e = FieldEditor.create(p, c, f, human(c.getName()), this::apply);
        e.refresh(document.design());
        e.component().addFocusListener(new FocusAdapter() {
            @Override
            public void focusLost(FocusEvent ev) {
                document.history().endMerge();
            }
        });
        JLabel label = new JLabel(human(c.getName()));
        label.setToolTipText(f.doc());
        label.setLabelFor(e.component());
        panel.add(label);
        panel.add(e.view(), "growx");
        editors.add(e);
    }

    /** Applies a value typed or chosen in {@code source}; returns the problems when the design refused it. */
    private List<Problem> apply(FieldEditor source, Object value, boolean merge) {
        Design next;
        try {
            next = source.path().with(document.design(), value);
        } catch (RuntimeException e) {
            message.setText(source.path().json() + ": " + e.getMessage());
            return List.of(new Problem(source.path().json(), String.valueOf(value), e.getMessage()));
        }
        List<Problem> problems = workspace.edit(document, next, "edit " + source.path().json(), merge);
        message.setText(problems.isEmpty() ? " " : "Not applied — " + problems.get(0));
        return problems;
    }

    private JPanel section(String title, String jsonPath) {
        JPanel p = new JPanel(new MigLayout("insets 6 10 8 10, wrap 2, gapy 4", "[right][grow,fill]", ""));
        Color line = UIManager.getColor("Component.borderColor");
        p.setBorder(BorderFactory.createTitledBorder(BorderFactory.createMatteBorder(1, 0, 0, 0,
                line != null ? line : Color.GRAY), title));
        p.setName("section " + jsonPath);
        sections.put(jsonPath, p);
        return p;
    }

    private static int order(String name) {
        int i = 0;
        for (String k : SECTIONS.keySet()) {
            if (k.equals(name)) {
                return i;
            }
            i++;
        }
        return i;
    }

    /** Which sections are present: when it changes (a section appears or goes) the form is rebuilt. */
    private static String structure(Object node) {
        StringBuilder sb = new StringBuilder();
        if (node instanceof Record r) {
            for (RecordComponent c : r.getClass().getRecordComponents()) {
                if (Record.class.isAssignableFrom(c.getType())) {
                    Object v = FieldPath.root().then(c).get(r);
                    sb.append(c.getName()).append(v == null ? "-" : "{" + structure(v) + "}");
                }
            }
        }
        return sb.toString();
    }

    /** "innerDiameter" → "inner diameter". */
    static String human(String camel) {
        String s = camel.replaceAll("([a-z0-9])([A-Z])", "$1 $2").toLowerCase(Locale.ROOT);
        return s.replace("mu r", "µr").replace("c1", "C1").replace("c2", "C2");
    }

    private static Color errorColor() {
        Color c = UIManager.getColor("Component.error.focusedBorderColor");
        return c != null ? c : Color.RED;
    }
}
