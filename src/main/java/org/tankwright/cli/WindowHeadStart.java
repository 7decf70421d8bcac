package org.tankwright.cli;

import java.nio.file.Path;
import org.tankwright.analysis.Presets;
import org.tankwright.design.DesignFiles;
import org.tankwright.ui.HeadStart;

/**
 * Recognises, before the command line is parsed, the arguments that open the window
 * ({@code tankwright} alone, or {@code tankwright open [FILE] [--snapshot PNG] [--theme T] [--size WxH]})
 * and starts reading and solving the design at once (see {@link HeadStart}). Anything else,
 * including help, version and unknown options, starts nothing: the command line then does its
 * ordinary work and reports any problem.
 */
final class WindowHeadStart {
    private static volatile HeadStart current;

    private WindowHeadStart() {
    }

    /** Starts the head start when {@code args} open the window. */
    static void begin(String[] args) {
        if (args.length == 0) {
            current = HeadStart.begin(null, Presets::demo, true);
            return;
        }
        if (!args[0].equals("open")) {
            return;
        }
        Path file = null;
        boolean snapshot = false;
        for (int i = 1; i < args.length; i++) {
            String a = args[i];
            if (a.equals("--snapshot") || a.equals("--theme") || a.equals("--size")) {
                snapshot |= a.equals("--snapshot");
                i++;
            } else if (a.startsWith("--snapshot=") || a.startsWith("--theme=") || a.startsWith("--size=")) {
                snapshot |= a.startsWith("--snapshot=");
            } else if (a.startsWith("-") || file != null) {
                return; // help, version, an unknown option or a second file: no head start
            } else {
                try {
                    file = Path.of(a);
                } catch (RuntimeException e) {
                    return;
                }
            }
        }
        Path f = file;
        current = HeadStart.begin(f, f == null ? Presets::demo : () -> DesignFiles.load(f), !snapshot);
    }

    /** The head start begun for this process, or null. */
    static HeadStart current() {
        return current;
    }
}
