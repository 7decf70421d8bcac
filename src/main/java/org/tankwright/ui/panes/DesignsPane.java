package org.tankwright.ui.panes;

import io.github.andrewauclair.moderndocking.DockableStyle;
import java.lang.reflect.RecordComponent;
import java.util.function.BiConsumer;
import javax.swing.JScrollPane;
import javax.swing.JTree;
import javax.swing.tree.DefaultMutableTreeNode;
import javax.swing.tree.DefaultTreeModel;
import javax.swing.tree.TreePath;
import org.tankwright.design.Coil;
import org.tankwright.design.Design;
import org.tankwright.ui.model.FieldPath;
import org.tankwright.ui.model.OpenDesign;
import org.tankwright.ui.model.Workspace;

/** The open designs as a tree: each design with its coils, placement, compensation, source, load, banks and studies. */
public final class DesignsPane extends Pane implements Workspace.Listener {

    /** A node: the design it belongs to and the JSON path of the section it stands for. */
    record Node(OpenDesign design, String path, String text) {
        @Override
        public String toString() {
            return text;
        }
    }

    private final Workspace workspace;
    private final BiConsumer<OpenDesign, String> reveal;
    private final DefaultMutableTreeNode root = new DefaultMutableTreeNode("designs");
    private final JTree tree = new JTree(new DefaultTreeModel(root));
    private boolean quiet;
    private String shown = "";

    /** @param reveal called with a design and a section's JSON path when the user picks a node */
    public DesignsPane(Workspace workspace, BiConsumer<OpenDesign, String> reveal) {
        super(PaneArrangement.DESIGNS, "Designs", "Open designs and their parts", DockableStyle.VERTICAL);
        this.workspace = workspace;
        this.reveal = reveal;
        tree.setName("designsTree");
        tree.setRootVisible(false);
        tree.setShowsRootHandles(true);
        tree.addTreeSelectionListener(e -> {
            if (quiet || e.getNewLeadSelectionPath() == null) {
                return;
            }
            Object o = ((DefaultMutableTreeNode) e.getNewLeadSelectionPath().getLastPathComponent()).getUserObject();
            if (o instanceof Node n) {
                workspace.select(n.design());
                reveal.accept(n.design(), n.path());
            }
        });
        add(new JScrollPane(tree));
        workspace.addListener(this);
    }

    @Override
    public void designsChanged() {
        rebuild();
    }

    @Override
    public void designChanged(OpenDesign d) {
        rebuild();
    }

    @Override
    public void selected(OpenDesign d) {
        quiet = true;
        try {
            for (int i = 0; i < root.getChildCount(); i++) {
                DefaultMutableTreeNode n = (DefaultMutableTreeNode) root.getChildAt(i);
                if (((Node) n.getUserObject()).design() == d) {
                    tree.setSelectionPath(new TreePath(n.getPath()));
                }
            }
        } finally {
            quiet = false;
        }
    }

    /** What the tree shows, to skip rebuilding it when an edit changed none of it. */
    private String signature() {
        StringBuilder sb = new StringBuilder();
        for (OpenDesign od : workspace.designs()) {
            sb.append(System.identityHashCode(od)).append(od.isDirty()).append(od.design().name()).append('|');
            Design d = od.design();
            for (RecordComponent c : Design.class.getRecordComponents()) {
                if (Record.class.isAssignableFrom(c.getType())) {
                    Object v = FieldPath.root().then(c).get(d);
                    sb.append(v == null ? '-' : '+').append(v instanceof Coil coil ? coil.label() : "");
                }
            }
        }
        return sb.toString();
    }

    private void rebuild() {
        String now = signature();
        if (now.equals(shown)) {
            return;
        }
        shown = now;
        quiet = true;
        try {
            root.removeAllChildren();
            for (OpenDesign od : workspace.designs()) {
                DefaultMutableTreeNode dn = new DefaultMutableTreeNode(
                        new Node(od, "$", (od.isDirty() ? "• " : "") + od.design().name()));
                Design d = od.design();
                for (RecordComponent c : Design.class.getRecordComponents()) {
                    if (!Record.class.isAssignableFrom(c.getType())) {
                        continue;
                    }
                    FieldPath p = FieldPath.root().then(c);
                    Object v = p.get(d);
                    if (v == null) {
                        continue;
                    }
                    String text = c.getName();
                    if (v instanceof Coil coil && coil.label() != null) {
                        text += ": " + coil.label();
                    }
                    dn.add(new DefaultMutableTreeNode(new Node(od, p.json(), text)));
                }
                root.add(dn);
            }
            ((DefaultTreeModel) tree.getModel()).reload();
            for (int i = 0; i < tree.getRowCount(); i++) {
                tree.expandRow(i);
            }
        } finally {
            quiet = false;
        }
        selected(workspace.selected());
    }
}
