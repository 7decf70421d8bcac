package org.tankwright.cli;

import org.tankwright.analysis.Presets;
import org.tankwright.analysis.Summary;
import org.tankwright.design.Design;
import org.tankwright.ui.HeadStart;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

import java.awt.GraphicsEnvironment;
import java.nio.file.Path;
import java.util.concurrent.Callable;

/**
 * {@code tankwright open [FILE]}: the workbench window on a design (the bundled demo when no file
 * is given). Without a display it says so and prints the design's solved summary instead.
 */
@Command(name = "open", mixinStandardHelpOptions = true, versionProvider = VersionInfo.class,
        description = "Open the workbench window on a design file (the bundled demo when none is given). "
                + "Without a display, print the solved summary instead.")
public final class OpenCommand implements Callable<Integer> {
    @Parameters(arity = "0..1", paramLabel = "FILE", description = "design file to open")
    Path file;

    @Option(names = "--snapshot", paramLabel = "PNG",
            description = "Lay the window out, wait until the analysis is shown, write a PNG of the whole window and exit (needs a display, e.g. xvfb-run).")
    Path snapshot;

    @Option(names = "--theme", paramLabel = "light|dark", description = "Window theme (default: the remembered one; light for --snapshot).")
    String theme;

    @Option(names = "--size", paramLabel = "WxH", description = "Window size in pixels, e.g. 1440x900.")
    String size;

    @Override
    public Integer call() {
        org.tankwright.ui.StartTrace.mark("command line parsed");
        HeadStart head = WindowHeadStart.current();
        Design early = head == null ? null : head.design(file);
        Design design = early != null ? early : file == null ? Presets.demo() : DesignArgs.load(file);
        org.tankwright.ui.Workbench.Options opts = WorkbenchOptions.parse(theme, size, snapshot)
                .withHeadStart(early != null ? head : null);
        if (snapshot != null) {
            return WorkbenchOptions.snapshot(file, design, opts);
        }
        if (GraphicsEnvironment.isHeadless()) {
            return printSummary(design, opts, "No display is available");
        }
        try {
            org.tankwright.ui.Workbench.launch(file, design, opts);
        } catch (java.io.IOException e) {
            throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, e.getMessage());
        } catch (java.awt.AWTError | java.awt.HeadlessException | UnsatisfiedLinkError e) {
            return printSummary(design, opts, "The display cannot be opened (" + e.getMessage() + ")");
        }
        return ExitCodes.OK;
    }

    private static int printSummary(Design design, org.tankwright.ui.Workbench.Options opts, String why) {
        System.out.println(why + ", so the workbench window cannot open."
                + " Here is the solved summary of \"" + design.name() + "\" instead.");
        System.out.println();
        System.out.print(Summary.text(opts.fullAnalysis().apply(design)));
        return ExitCodes.OK;
    }
}
