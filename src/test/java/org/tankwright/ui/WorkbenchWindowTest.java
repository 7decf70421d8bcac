package org.tankwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import javax.swing.JTextField;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tankwright.analysis.Analysis;
import org.tankwright.analysis.Presets;
import org.tankwright.design.Design;
import org.tankwright.design.DesignFiles;
import org.tankwright.ui.fields.FieldEditor;
import org.tankwright.ui.fields.QuantityField;
import org.tankwright.ui.model.OpenDesign;

/** The window's behaviour that matters, driven like a user would: typing, undo, save and open. */
class WorkbenchWindowTest {

    private static final String C1 = "$.compensation.c1_F";

    @Test
    void typing4n7IntoC1ChangesTheKeyFigures() throws Exception {
        {
            WorkbenchWindow w = WindowHarness.open(Presets.demo(), Analysis::run);
            WindowHarness.await("the demo's first result is shown", () -> !w.figures().valueOf("C1 (primary)").isEmpty());
            String tuned = WindowHarness.onEdt(() -> w.figures().valueOf("C1 (primary)"));
            assertNotEquals("4.70 nF", tuned, "the demo's C1 is tuned automatically, not 4.7 nF");
            JTextField field = WindowHarness.onEdt(() -> {
                OpenDesign d = w.workspace().selected();
                w.editor().reveal(d, C1);
                return (JTextField) w.editor().tabOf(d).form().editorFor(C1).component();
            });
            WindowHarness.onEdt(() -> {
                field.selectAll();
                WindowHarness.type(field, "4n7");
                return null;
            });
            WindowHarness.await("the key figures show the typed C1",
                    () -> "4.70 nF".equals(w.figures().valueOf("C1 (primary)")));
            Design now = WindowHarness.onEdt(() -> w.workspace().selected().design());
            assertEquals(4.7e-9, now.compensation().c1(), 1e-21, "the document holds 4.7 nF");
            assertTrue(WindowHarness.onEdt(() -> w.workspace().selected().isDirty()), "an edit marks the design unsaved");
        }
    }

    @Test
    void anInvalidValueTurnsTheFieldRedAndLeavesTheDocumentUnchanged() throws Exception {
        {
            WorkbenchWindow w = WindowHarness.open(Presets.demo(), Analysis::run);
            Design before = WindowHarness.onEdt(() -> w.workspace().selected().design());
            QuantityField field = WindowHarness.onEdt(() -> {
                QuantityField f = c1(w);
                f.textField().setText("4n7 H"); // an inductance unit in a capacitance field
                return f;
            });
            assertEquals("error", WindowHarness.onEdt(field::outline));
            String problem = WindowHarness.onEdt(field::problem);
            assertNotNull(problem);
            assertTrue(problem.contains("C1") && problem.contains("4n7 H"), "the message names the field and the value: " + problem);
            assertEquals(before, WindowHarness.onEdt(() -> w.workspace().selected().design()));
            assertFalse(WindowHarness.onEdt(() -> w.workspace().selected().history().canUndo()), "no undo step was made");

            WindowHarness.onEdt(() -> {
                field.textField().setText("-1n"); // parses, but below the allowed range
                return null;
            });
            assertEquals("error", WindowHarness.onEdt(field::outline));
            assertEquals(before, WindowHarness.onEdt(() -> w.workspace().selected().design()));
        }
    }

    @Test
    void undoRestoresTheDesignAndTheFieldAndRedoRepeatsIt() throws Exception {
        {
            WorkbenchWindow w = WindowHarness.open(Presets.demo(), Analysis::run);
            Design before = WindowHarness.onEdt(() -> w.workspace().selected().design());
            QuantityField field = WindowHarness.onEdt(() -> c1(w));
            WindowHarness.onEdt(() -> {
                for (String keystroke : new String[] {"4", "4n", "4n7"}) {
                    field.textField().setText(keystroke);
                }
                return null;
            });
            WindowHarness.await("the edit is shown", () -> "4.70 nF".equals(w.figures().valueOf("C1 (primary)")));
            WindowHarness.onEdt(() -> {
                w.workspace().undo(w.workspace().selected());
                return null;
            });
            assertEquals(before, WindowHarness.onEdt(() -> w.workspace().selected().design()),
                    "one undo reverts the whole typed value (one field's keystrokes are one step)");
            assertNull(WindowHarness.onEdt(field::value));
            assertEquals("", WindowHarness.onEdt(() -> field.textField().getText()));
            WindowHarness.await("the figures follow the undo", () -> !"4.70 nF".equals(w.figures().valueOf("C1 (primary)")));
            assertFalse(WindowHarness.onEdt(() -> w.workspace().selected().isDirty()), "back at the opened state");
            WindowHarness.onEdt(() -> {
                w.workspace().redo(w.workspace().selected());
                return null;
            });
            assertEquals(4.7e-9, WindowHarness.onEdt(field::value), 1e-21);
        }
    }

    @Test
    void saveThenOpenRoundTripsTheEditedDesign(@TempDir Path work) throws Exception {
        Path file = work.resolve("pad.json");
        {
            WorkbenchWindow w = WindowHarness.open(Presets.demo(), Analysis::run);
            Design edited = WindowHarness.onEdt(() -> {
                c1(w).textField().setText("4n7");
                OpenDesign d = w.workspace().selected();
                assertTrue(w.files().saveTo(d, file));
                assertFalse(d.isDirty(), "saving clears the unsaved marker");
                Design e = d.design();
                assertTrue(w.files().close(d));
                return e;
            });
            assertEquals(edited, DesignFiles.load(file), "the file holds the edited design");
            OpenDesign reopened = WindowHarness.onEdt(() -> w.files().open(file));
            assertNotNull(reopened);
            assertEquals(edited, WindowHarness.onEdt(reopened::design));
            assertEquals(file.toAbsolutePath().normalize(), reopened.file());
            assertFalse(WindowHarness.onEdt(reopened::isDirty));
            WindowHarness.await("the reopened design is computed", () -> "4.70 nF".equals(w.figures().valueOf("C1 (primary)")));
        }
    }

    @Test
    void anUnreadableSavedPaneArrangementFallsBackToTheDefault(@TempDir Path dir) throws Exception {
        WorkbenchWindow w = WindowHarness.open(Presets.demo(), Analysis::run);
        Path saved = dir.resolve("panes.xml");
        java.nio.file.Files.writeString(saved, "<not-a-layout");
        boolean restored = WindowHarness.onEdt(() -> {
            try {
                return w.arrangement().restoreAndRemember(saved);
            } finally {
                io.github.andrewauclair.moderndocking.app.AppState.setAutoPersist(false);
            }
        });
        assertFalse(restored, "the damaged arrangement is not used");
        for (String pane : new String[] {"designs", "editor", "figures", "plots", "stress", "checks"}) {
            assertTrue(WindowHarness.onEdt(() -> io.github.andrewauclair.moderndocking.app.Docking.isDocked(pane)),
                    pane + " is in place after the fallback");
        }
    }

    private static QuantityField c1(WorkbenchWindow w) {
        OpenDesign d = w.workspace().selected();
        FieldEditor e = w.editor().tabOf(d).form().editorFor(C1);
        return ((FieldEditor.Number) e).field();
    }
}
