package org.tankwright.ui;

import java.awt.Toolkit;
import java.awt.event.ActionEvent;
import java.awt.event.InputEvent;
import java.awt.event.KeyEvent;
import javax.swing.AbstractAction;
import javax.swing.Action;
import javax.swing.KeyStroke;

/** One action object drives a menu item, a button and a shortcut. */
final class Actions {

    private Actions() {
    }

    /** An action named {@code name} running {@code body}; {@code key} (a {@link KeyEvent} code, or 0) with the platform's menu modifier. */
    static Action of(String name, int key, boolean shift, String tooltip, Runnable body) {
        Action a = new AbstractAction(name) {
            @Override
            public void actionPerformed(ActionEvent e) {
                body.run();
            }
        };
        if (key != 0) {
            int mask = Toolkit.getDefaultToolkit().getMenuShortcutKeyMaskEx() | (shift ? InputEvent.SHIFT_DOWN_MASK : 0);
            a.putValue(Action.ACCELERATOR_KEY, KeyStroke.getKeyStroke(key, mask));
        }
        if (tooltip != null) {
            a.putValue(Action.SHORT_DESCRIPTION, tooltip);
        }
        return a;
    }
}
