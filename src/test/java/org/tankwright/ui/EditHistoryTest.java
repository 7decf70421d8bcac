package org.tankwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class EditHistoryTest {

    @Test
    void undoRedoWalkTheListOfStates() {
        EditHistory<String> h = new EditHistory<>("a", 10);
        assertTrue(h.push("b", "edit 1"));
        assertTrue(h.push("c", "edit 2"));
        assertEquals("edit 2", h.undoName());
        assertEquals("b", h.undo());
        assertEquals("a", h.undo());
        assertFalse(h.canUndo());
        assertEquals("b", h.redo());
        assertEquals("edit 2", h.redoName());
    }

    @Test
    void anEditAfterUndoDropsTheRedoTail() {
        EditHistory<String> h = new EditHistory<>("a", 10);
        h.push("b", "x");
        h.undo();
        h.push("c", "y");
        assertFalse(h.canRedo());
        assertNull(h.redoName());
        assertEquals("a", h.undo());
    }

    @Test
    void anEqualStateIsNotAStep() {
        EditHistory<String> h = new EditHistory<>("a", 10);
        assertFalse(h.push("a", "same"));
        assertFalse(h.canUndo());
    }

    @Test
    void dirtyFollowsTheSavedState() {
        EditHistory<String> h = new EditHistory<>("a", 10);
        assertFalse(h.isDirty());
        h.push("b", "x");
        assertTrue(h.isDirty());
        h.markSaved();
        assertFalse(h.isDirty());
        h.undo();
        assertTrue(h.isDirty(), "undo past the save is an unsaved change");
        h.redo();
        assertFalse(h.isDirty());
        h.undo();
        h.push("c", "y");
        assertTrue(h.isDirty(), "the saved state was dropped with the redo tail");
    }

    @Test
    void limitForgetsTheOldestSteps() {
        EditHistory<Integer> h = new EditHistory<>(0, 3);
        for (int i = 1; i <= 5; i++) {
            h.push(i, "set " + i);
        }
        assertEquals(4, h.undo());
        assertEquals(3, h.undo());
        assertFalse(h.canUndo());
        assertThrows(IllegalStateException.class, h::undo);
    }

    @Test
    void mergingCoalescesOneFieldsKeystrokes() {
        EditHistory<String> h = new EditHistory<>("", 10);
        h.pushOrMerge("4", "C1");
        h.pushOrMerge("4n", "C1");
        h.pushOrMerge("4n7", "C1");
        assertEquals("4n7", h.current());
        assertEquals("", h.undo(), "three keystrokes in one field are one undo step");
        h.redo();
        h.endMerge();
        h.pushOrMerge("4n8", "C1");
        assertEquals("4n7", h.undo(), "after the field was left, a new edit is a new step");
    }
}
