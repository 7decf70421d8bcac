package org.tankwright.ui.fields;

import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;

/** A document listener that runs one action on every change of the text. */
final class OnTextChange implements DocumentListener {

    private final Runnable action;

    OnTextChange(Runnable action) {
        this.action = action;
    }

    @Override
    public void insertUpdate(DocumentEvent e) {
        action.run();
    }

    @Override
    public void removeUpdate(DocumentEvent e) {
        action.run();
    }

    @Override
    public void changedUpdate(DocumentEvent e) {
        action.run();
    }
}
