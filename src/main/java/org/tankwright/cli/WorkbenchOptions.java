package org.tankwright.cli;

import java.awt.Dimension;
import java.awt.GraphicsEnvironment;
import java.io.IOException;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.tankwright.design.Design;
import org.tankwright.ui.Theme;
import org.tankwright.ui.Workbench;

/** The window options of {@code tankwright open}: {@code --theme}, {@code --size}, {@code --snapshot}. */
final class WorkbenchOptions {

    private static final Pattern SIZE = Pattern.compile("(\\d{3,5})[xX×](\\d{3,5})");

    private WorkbenchOptions() {
    }

    /** Parses the options; a bad value is a usage error naming the option, the value and what is allowed. */
    static Workbench.Options parse(String theme, String size, Path snapshot) {
        Theme t = null;
        if (theme != null) {
            try {
                t = Theme.parse(theme);
            } catch (IllegalArgumentException e) {
                throw new ExitCodes.UserError(ExitCodes.USAGE, "--theme: " + e.getMessage());
            }
        }
        Dimension d = null;
        if (size != null) {
            Matcher m = SIZE.matcher(size.strip());
            if (!m.matches()) {
                throw new ExitCodes.UserError(ExitCodes.USAGE,
                        "--size: '" + size + "' is not a window size; allowed: WIDTHxHEIGHT in pixels, each 640 to 10000, e.g. 1440x900");
            }
            int w = Integer.parseInt(m.group(1));
            int h = Integer.parseInt(m.group(2));
            if (w < 640 || h < 480 || w > 10000 || h > 10000) {
                throw new ExitCodes.UserError(ExitCodes.USAGE,
                        "--size: " + w + "x" + h + " is out of range; allowed: width 640 to 10000, height 480 to 10000");
            }
            d = new Dimension(w, h);
        }
        return new Workbench.Options(t, snapshot, d);
    }

    /** Writes the snapshot; without a display that is a refused computation, with a hint. */
    static int snapshot(Path file, Design design, Workbench.Options opts) {
        if (GraphicsEnvironment.isHeadless()) {
            throw new ExitCodes.UserError(ExitCodes.REFUSED,
                    "--snapshot needs a display to lay the window out; run it under a virtual one, e.g. xvfb-run -a tankwright open FILE --snapshot out.png");
        }
        try {
            Workbench.launch(file, design, opts);
            System.out.println("wrote " + opts.snapshot());
            return ExitCodes.OK;
        } catch (IOException e) {
            throw new ExitCodes.UserError(ExitCodes.REFUSED, "--snapshot: " + e.getMessage());
        }
    }
}
