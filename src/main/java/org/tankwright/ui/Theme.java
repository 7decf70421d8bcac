package org.tankwright.ui;

import com.formdev.flatlaf.FlatDarkLaf;
import com.formdev.flatlaf.FlatLaf;
import com.formdev.flatlaf.FlatLightLaf;
import java.util.Locale;

/** The two looks of the window. */
public enum Theme {
    LIGHT, DARK;

    /** Installs this look (call on the event thread; {@link #switchTo} also repaints open windows). */
    public void install() {
        FlatLaf laf = this == DARK ? new FlatDarkLaf() : new FlatLightLaf();
        FlatLaf.setup(laf);
    }

    /** Installs this look and updates every open window. */
    public void switchTo() {
        install();
        FlatLaf.updateUI();
    }

    /** Parses "light" or "dark" (any case); throws with a message naming the allowed values. */
    public static Theme parse(String text) {
        try {
            return valueOf(text.trim().toUpperCase(Locale.ROOT));
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("theme '" + text + "' is not known; allowed: light, dark", e);
        }
    }

    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }
}
