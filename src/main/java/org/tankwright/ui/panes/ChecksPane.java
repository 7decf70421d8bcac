package org.tankwright.ui.panes;

import io.github.andrewauclair.moderndocking.DockableStyle;
import java.awt.Color;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.util.List;
import java.util.function.BiConsumer;
import javax.swing.JLabel;
import javax.swing.JScrollPane;
import javax.swing.JTree;
import javax.swing.tree.DefaultMutableTreeNode;
import javax.swing.tree.DefaultTreeCellRenderer;
import javax.swing.tree.DefaultTreeModel;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.design.Problem;
import org.tankwright.ui.model.DesignCheck;
import org.tankwright.ui.model.OpenDesign;
import org.tankwright.ui.model.Workspace;

/**
 * Findings grouped by severity, with the signal words and colours of ANSI Z535 / ISO 3864
 * (danger red, warning orange, caution yellow, notice blue). Double-click a finding to go to
 * its field.
 */
public final class ChecksPane extends ResultPane {

    /** Severity, most severe first. */
    public enum Severity {
        DANGER(new Color(0xc8102e)), WARNING(new Color(0xff8200)), CAUTION(new Color(0xd4a000)), NOTICE(new Color(0x0067a5));

        private final Color color;

        Severity(Color color) {
            this.color = color;
        }

        public Color color() {
            return color;
        }
    }

    /** One finding: its weight, what it says, and the design field it is about (a JSON path, or null). */
    public record Finding(Severity severity, String text, String path) {
        @Override
        public String toString() {
            return text;
        }
    }

    private final BiConsumer<OpenDesign, String> reveal;
    private final DefaultMutableTreeNode root = new DefaultMutableTreeNode("findings");
    private final JTree tree = new JTree(new DefaultTreeModel(root));
    private final JLabel state = new JLabel(" ");
    private List<Finding> findings = List.of();

    public ChecksPane(Workspace workspace, BiConsumer<OpenDesign, String> reveal) {
        super(PaneArrangement.CHECKS, "Checks", "Design-rule and safety findings by severity", DockableStyle.BOTH, workspace);
        this.reveal = reveal;
        tree.setName("checksTree");
        tree.setRootVisible(false);
        tree.setShowsRootHandles(true);
        tree.setCellRenderer(new DefaultTreeCellRenderer() {
            @Override
            public java.awt.Component getTreeCellRendererComponent(JTree t, Object value, boolean sel, boolean exp,
                                                                   boolean leaf, int row, boolean focus) {
                super.getTreeCellRendererComponent(t, value, sel, exp, leaf, row, focus);
                Object o = ((DefaultMutableTreeNode) value).getUserObject();
                if (o instanceof Severity s && !sel) {
                    setForeground(s.color());
                }
                return this;
            }
        });
        tree.addMouseListener(new MouseAdapter() {
            @Override
            public void mouseClicked(MouseEvent e) {
                if (e.getClickCount() == 2 && tree.getSelectionPath() != null) {
                    Object o = ((DefaultMutableTreeNode) tree.getSelectionPath().getLastPathComponent()).getUserObject();
                    if (o instanceof Finding f && f.path() != null && workspace.selected() != null) {
                        reveal.accept(workspace.selected(), f.path());
                    }
                }
            }
        });
        state.setName("checks.state");
        add(state, java.awt.BorderLayout.NORTH);
        add(new JScrollPane(tree));
    }

    /** The findings a result holds: today the design rules of the document itself; the engine's checks join when the result carries them. */
    static List<Finding> findingsOf(AnalysisResult r) {
        List<Problem> problems = DesignCheck.problems(r.design());
        return problems.stream().map(p -> new Finding(Severity.WARNING, p.toString(), p.path())).toList();
    }

    public List<Finding> findings() {
        return findings;
    }

    @Override
    protected void show(OpenDesign d) {
        findings = d == null || d.result() == null ? List.of() : findingsOf(d.result());
        root.removeAllChildren();
        for (Severity s : Severity.values()) {
            List<Finding> these = findings.stream().filter(f -> f.severity() == s).toList();
            if (these.isEmpty()) {
                continue;
            }
            DefaultMutableTreeNode group = new DefaultMutableTreeNode(s);
            these.forEach(f -> group.add(new DefaultMutableTreeNode(f)));
            root.add(group);
        }
        ((DefaultTreeModel) tree.getModel()).reload();
        for (int i = 0; i < tree.getRowCount(); i++) {
            tree.expandRow(i);
        }
        state.setText(d == null ? " No design open" : findings.isEmpty()
                ? " No findings. The engine's safety and design-rule checks are not in this version of the analysis;"
                  + " defer to local codes and licensed practice for high voltage, stored energy, RF fields and hot metal."
                : " " + findings.size() + " finding(s)");
    }

    /** Counts by severity (danger, warning, caution+notice), for the status bar. */
    public int[] counts() {
        int[] c = new int[3];
        for (Finding f : findings) {
            c[Math.min(2, f.severity().ordinal())]++;
        }
        return c;
    }
}
