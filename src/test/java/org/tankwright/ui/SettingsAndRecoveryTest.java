package org.tankwright.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tankwright.analysis.Analysis;
import org.tankwright.analysis.Presets;
import org.tankwright.design.DesignFiles;
import org.tankwright.ui.files.Autosave;
import org.tankwright.ui.files.RecoveryFolder;
import org.tankwright.ui.model.FieldPath;
import org.tankwright.ui.model.OpenDesign;
import org.tankwright.ui.model.Workspace;

/** Remembered settings, and the autosave that a crash leaves behind for recovery. */
class SettingsAndRecoveryTest {

    @Test
    void themeAndRecentFilesAreRememberedAcrossInstances(@TempDir Path dir) {
        UserSettings s = new UserSettings(dir);
        assertEquals(Theme.LIGHT, s.theme());
        s.setTheme(Theme.DARK);
        s.addRecent(dir.resolve("a.json"));
        s.addRecent(dir.resolve("b.json"));
        s.addRecent(dir.resolve("a.json"));
        UserSettings again = new UserSettings(dir);
        assertEquals(Theme.DARK, again.theme());
        assertEquals(List.of(dir.resolve("a.json"), dir.resolve("b.json")), again.recentFiles(), "newest first, no repeats");
    }

    @Test
    void aDamagedSettingsFileFallsBackToDefaults(@TempDir Path dir) throws Exception {
        Files.writeString(dir.resolve("workbench.properties"), "theme=\\u12");
        assertEquals(Theme.LIGHT, new UserSettings(dir).theme());
    }

    @Test
    void autosaveWritesOnlyUnsavedDesignsAndTheCopyReadsBack(@TempDir Path dir) throws Exception {
        RecoveryFolder recovery = new RecoveryFolder(dir.resolve("recovery"));
        OpenDesign[] open = new OpenDesign[2];
        try (Workspace ws = new Workspace(Analysis::run); Autosave autosave = new Autosave(ws, recovery, 60_000)) {
            javax.swing.SwingUtilities.invokeAndWait(() -> {
                open[0] = ws.open(Presets.demo(), null);
                open[1] = ws.open(Presets.demo(), null);
                FieldPath name = FieldPath.root().then(org.tankwright.design.Design.class, "name");
                assertTrue(ws.edit(open[0], name.with(open[0].design(), "edited pad"), "rename", false).isEmpty());
                autosave.saveNow();
            });
            long deadline = System.currentTimeMillis() + 5000;
            while (recovery.leftovers().isEmpty() && System.currentTimeMillis() < deadline) {
                Thread.sleep(20);
            }
            List<Path> left = recovery.leftovers();
            assertEquals(1, left.size(), "only the design with unsaved edits is written");
            assertEquals("edited pad", DesignFiles.load(left.get(0)).name());
            recovery.discard(open[0].key());
            assertTrue(recovery.leftovers().isEmpty(), "a save or clean close removes the copy");
            assertFalse(Files.exists(recovery.fileFor(open[1].key())));
        }
    }
}
