package org.tankwright.ui;

import com.formdev.flatlaf.FlatLightLaf;
import org.tankwright.analysis.Analysis;
import org.tankwright.analysis.Summary;
import org.tankwright.design.Design;

import javax.swing.JFrame;
import javax.swing.JScrollPane;
import javax.swing.JTextArea;
import javax.swing.SwingUtilities;
import java.awt.Font;
import java.nio.file.Path;

/** The workbench window's entry point. */
public final class Workbench {
    private Workbench() {
    }

    /** Opens the window on {@code design} (loaded from {@code file}, or the demo when file is null). */
    public static void launch(Path file, Design design) {
        SwingUtilities.invokeLater(() -> {
            FlatLightLaf.setup();
            JFrame f = new JFrame("Tankwright — " + design.name());
            JTextArea text = new JTextArea(Summary.text(Analysis.run(design)));
            text.setEditable(false);
            text.setFont(new Font(Font.MONOSPACED, Font.PLAIN, 13));
            f.add(new JScrollPane(text));
            f.setSize(900, 600);
            f.setDefaultCloseOperation(JFrame.EXIT_ON_CLOSE);
            f.setVisible(true);
        });
    }
}
