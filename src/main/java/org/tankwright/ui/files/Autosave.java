package org.tankwright.ui.files;

import java.io.IOException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import javax.swing.Timer;
import org.tankwright.design.DesignFiles;
import org.tankwright.ui.model.OpenDesign;
import org.tankwright.ui.model.Workspace;

/**
 * Every minute, writes each design with unsaved edits to the recovery folder (off the event
 * thread; the designs are immutable). A clean save or close removes the copy.
 */
public final class Autosave implements AutoCloseable {

    private final Workspace workspace;
    private final RecoveryFolder recovery;
    private final Timer timer;
    private final ExecutorService writer = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "tankwright-autosave");
        t.setDaemon(true);
        return t;
    });

    public Autosave(Workspace workspace, RecoveryFolder recovery, int periodMillis) {
        this.workspace = workspace;
        this.recovery = recovery;
        this.timer = new Timer(periodMillis, e -> saveNow());
        timer.setRepeats(true);
    }

    public void start() {
        timer.start();
    }

    /** Writes the copies now (call on the event thread). */
    public void saveNow() {
        for (OpenDesign d : workspace.designs()) {
            if (!d.isDirty()) {
                continue;
            }
            var design = d.design();
            var target = recovery.fileFor(d.key());
            writer.execute(() -> {
                try {
                    DesignFiles.replaceAtomically(target, DesignFiles.toJson(design));
                } catch (IOException e) {
                    System.err.println("tankwright: autosave to " + target + " failed: " + e.getMessage());
                }
            });
        }
    }

    @Override
    public void close() {
        timer.stop();
        writer.shutdown();
    }
}
