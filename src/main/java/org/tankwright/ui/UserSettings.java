package org.tankwright.ui;

import java.io.IOException;
import java.io.Reader;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Properties;

/**
 * The workbench's remembered choices (theme, recent files) in a small properties file under the
 * user's configuration folder, beside the saved pane arrangement and the recovery folder.
 * Tests hand it a temporary folder.
 */
public final class UserSettings {

    private static final int RECENT_LIMIT = 8;
    private final Path folder;
    private final Properties values = new Properties();

    /** Settings kept in {@code folder} (created when first written). */
    public UserSettings(Path folder) {
        this.folder = folder;
        Path file = file();
        if (Files.isRegularFile(file)) {
            try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
                values.load(r);
            } catch (IOException | IllegalArgumentException e) {
                values.clear(); // a damaged settings file is replaced by defaults, never fatal
            }
        }
    }

    /**
     * The default folder: system property {@code tankwright.config}, else
     * {@code $XDG_CONFIG_HOME/tankwright}, else {@code ~/.config/tankwright}.
     */
    public static Path defaultFolder() {
        String override = System.getProperty("tankwright.config");
        if (override != null && !override.isBlank()) {
            return Paths.get(override);
        }
        String xdg = System.getenv("XDG_CONFIG_HOME");
        Path base = xdg != null && !xdg.isBlank() ? Paths.get(xdg) : Paths.get(System.getProperty("user.home"), ".config");
        return base.resolve("tankwright");
    }

    public Path folder() {
        return folder;
    }

    /** Where the pane arrangement is kept. */
    public Path layoutFile() {
        return folder.resolve("panes.xml");
    }

    /** Where autosaved copies of open designs go. */
    public Path recoveryFolder() {
        return folder.resolve("recovery");
    }

    public Theme theme() {
        try {
            return Theme.parse(values.getProperty("theme", "light"));
        } catch (IllegalArgumentException e) {
            return Theme.LIGHT;
        }
    }

    public void setTheme(Theme theme) {
        values.setProperty("theme", theme.label());
        store();
    }

    /** Recently opened files, newest first. */
    public List<Path> recentFiles() {
        List<Path> out = new ArrayList<>();
        for (int i = 0; i < RECENT_LIMIT; i++) {
            String p = values.getProperty("recent." + i);
            if (p != null) {
                out.add(Paths.get(p));
            }
        }
        return out;
    }

    /** Puts {@code file} first in the recent list. */
    public void addRecent(Path file) {
        Path abs = file.toAbsolutePath().normalize();
        List<Path> list = recentFiles();
        list.remove(abs);
        list.add(0, abs);
        for (int i = 0; i < RECENT_LIMIT; i++) {
            if (i < list.size()) {
                values.setProperty("recent." + i, list.get(i).toString());
            } else {
                values.remove("recent." + i);
            }
        }
        store();
    }

    private Path file() {
        return folder.resolve("workbench.properties");
    }

    private void store() {
        try {
            Files.createDirectories(folder);
            Path tmp = Files.createTempFile(folder, "workbench", ".tmp");
            try (Writer w = Files.newBufferedWriter(tmp, StandardCharsets.UTF_8)) {
                values.store(w, "Tankwright workbench settings");
            }
            Files.move(tmp, file(), StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException e) {
            // settings are a convenience: failing to remember them must not stop the work
            System.err.println("tankwright: could not save workbench settings in " + folder + ": " + e.getMessage());
        }
    }
}
