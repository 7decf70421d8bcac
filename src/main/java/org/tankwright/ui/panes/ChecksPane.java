package org.tankwright.ui.panes;

import io.github.andrewauclair.moderndocking.DockableStyle;
import java.awt.Color;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.util.ArrayList;
import java.util.List;
import java.util.function.BiConsumer;
import javax.swing.JLabel;
import javax.swing.JScrollPane;
import javax.swing.JTree;
import javax.swing.tree.DefaultMutableTreeNode;
import javax.swing.tree.DefaultTreeCellRenderer;
import javax.swing.tree.DefaultTreeModel;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.checks.Finding;
import org.tankwright.checks.Severity;
import org.tankwright.ui.model.OpenDesign;
import org.tankwright.ui.model.Workspace;

/**
 * Findings grouped by severity under the signal words and colours of ANSI Z535 / ISO 3864
 * (danger red, warning orange, caution yellow, notice blue), then the pipeline's notes. Each
 * finding shows the number, the limit, its source and what to do; double-click goes to the
 * field it concerns.
 */
public final class ChecksPane extends ResultPane {

    /** A line in the tree: its text and the design field it concerns (a JSON path, or null). */
    record Line(String text, String path) {
        @Override
        public String toString() {
            return text;
        }
    }

    /** A group heading: a severity, or the notes. */
    record Group(String title, Color color) {
        @Override
        public String toString() {
            return title;
        }
    }

    private final DefaultMutableTreeNode root = new DefaultMutableTreeNode("findings");
    private final JTree tree = new JTree(new DefaultTreeModel(root));
    private final JLabel state = new JLabel(" ");
    private List<Finding> findings = List.of();

    public ChecksPane(Workspace workspace, BiConsumer<OpenDesign, String> reveal) {
        super(PaneArrangement.CHECKS, "Checks", "Design-rule and safety findings by severity", DockableStyle.BOTH, workspace);
        tree.setName("checksTree");
        tree.setRootVisible(false);
        tree.setShowsRootHandles(true);
        tree.setCellRenderer(new DefaultTreeCellRenderer() {
            @Override
            public java.awt.Component getTreeCellRendererComponent(JTree t, Object value, boolean sel, boolean exp,
                                                                   boolean leaf, int row, boolean focus) {
                super.getTreeCellRendererComponent(t, value, sel, exp, leaf, row, focus);
                Object o = ((DefaultMutableTreeNode) value).getUserObject();
                if (o instanceof Group g && g.color() != null && !sel) {
                    setForeground(g.color());
                }
                return this;
            }
        });
        tree.addMouseListener(new MouseAdapter() {
            @Override
            public void mouseClicked(MouseEvent e) {
                if (e.getClickCount() == 2 && tree.getSelectionPath() != null) {
                    Object o = ((DefaultMutableTreeNode) tree.getSelectionPath().getLastPathComponent()).getUserObject();
                    if (o instanceof Line l && l.path() != null && workspace.selected() != null) {
                        reveal.accept(workspace.selected(), l.path());
                    }
                }
            }
        });
        state.setName("checks.state");
        add(state, java.awt.BorderLayout.NORTH);
        add(new JScrollPane(tree));
    }

    /** The signal colour of a severity (ANSI Z535.1 safety colours; notice is safety blue). */
    static Color color(Severity s) {
        return switch (s) {
            case DANGER -> new Color(0xc8102e);
            case WARNING -> new Color(0xff8200);
            case CAUTION -> new Color(0xc9a000);
            case NOTICE -> new Color(0x2f7fc1);
        };
    }

    /** The design field a finding's element points to, or null: a JSON path as is, C1/C2/L1/L2 to their sections. */
    static String fieldOf(String element) {
        if (element == null || element.isBlank()) {
            return null;
        }
        if (element.startsWith("$")) {
            return element;
        }
        return switch (element) {
            case "C1" -> "$.compensation.c1_F";
            case "C2" -> "$.compensation.c2_F";
            case "L1" -> "$.primary";
            case "L2" -> "$.secondary";
            case "RL" -> "$.load";
            case "S" -> "$.source";
            default -> null;
        };
    }

    /** One finding as a line: what, the number against the limit, the source and what to do. */
    static String describe(Finding f) {
        StringBuilder sb = new StringBuilder(f.severity().name()).append(' ').append(f.id()).append(": ").append(f.message());
        if (Double.isFinite(f.value())) {
            sb.append(" — ").append(org.tankwright.units.Quantities.number(f.value(), 3)).append(' ').append(f.unit());
            if (Double.isFinite(f.limit())) {
                sb.append(" against ").append(org.tankwright.units.Quantities.number(f.limit(), 3)).append(' ').append(f.unit());
            }
        }
        if (f.source() != null && !f.source().isBlank()) {
            sb.append(" (").append(f.source()).append(')');
        }
        if (f.action() != null && !f.action().isBlank()) {
            sb.append(". ").append(f.action());
        }
        return sb.toString();
    }

    public List<Finding> findings() {
        return findings;
    }

    @Override
    protected void show(OpenDesign d) {
        AnalysisResult r = d == null ? null : d.result();
        findings = r == null || r.findings() == null ? List.of() : r.findings();
        root.removeAllChildren();
        for (Severity s : Severity.values()) {
            List<Finding> these = findings.stream().filter(f -> f.severity() == s).toList();
            if (!these.isEmpty()) {
                DefaultMutableTreeNode group = new DefaultMutableTreeNode(new Group(s.name() + " (" + these.size() + ")", color(s)));
                these.forEach(f -> group.add(new DefaultMutableTreeNode(new Line(describe(f), fieldOf(f.element())))));
                root.add(group);
            }
        }
        List<String> notes = r == null || r.notes() == null ? List.of() : new ArrayList<>(r.notes());
        if (!notes.isEmpty()) {
            DefaultMutableTreeNode group = new DefaultMutableTreeNode(new Group("Notes of the analysis (" + notes.size() + ")", null));
            notes.forEach(n -> group.add(new DefaultMutableTreeNode(new Line(n, null))));
            root.add(group);
        }
        ((DefaultTreeModel) tree.getModel()).reload();
        for (int i = 0; i < tree.getRowCount(); i++) {
            tree.expandRow(i);
        }
        state.setText(d == null ? " No design open" : r == null ? " Computing…" : findings.isEmpty()
                ? " No findings from the checks. Still: defer to local codes and licensed practice for high voltage,"
                  + " stored energy, RF fields and hot metal."
                : " " + findings.size() + " finding(s); double-click one to go to its field");
    }

    /** Counts by severity: danger, warning, and caution with notice (for the status bar). */
    public int[] counts() {
        int[] c = new int[3];
        for (Finding f : findings) {
            c[Math.min(2, f.severity().ordinal())]++;
        }
        return c;
    }
}
