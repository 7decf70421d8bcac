package org.tankwright.cli;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/** Entry point of {@code tankwright}: the command line, and the workbench when no command is given. */
@Command(name = "tankwright",
        mixinStandardHelpOptions = true,
        versionProvider = VersionInfo.class,
        description = "Design and tune resonant inductive circuits: wireless-power links and induction heaters.",
        subcommands = {
                CommandLine.HelpCommand.class,
                OpenCommand.class,
                ValidateCommand.class,
                TuneCommand.class,
                WorkpieceCommand.class,
                CapsCommand.class,
                RetuneCommand.class,
                CoupleCommand.class,
                FieldCommand.class,
                CoilCommand.class,
                SheetCommand.class,
                ExportCommand.class,
                CheckCommand.class,
                SolveCommand.class,
                ToleranceCommand.class,
                BenchCommand.class,
        })
public final class Main implements Runnable {

    public static void main(String[] args) {
        org.tankwright.ui.StartTrace.mark("main");
        WindowHeadStart.begin(args);
        System.exit(run(args));
    }

    /** Runs the command line and returns the exit status instead of exiting (for tests). */
    public static int run(String... args) {
        CommandLine cl = ExitCodes.configure(new CommandLine(new Main()));
        return cl.execute(args);
    }

    @Override
    public void run() {
        // No command: the workbench on the demo design, as `tankwright open`.
        int status = new OpenCommand().call();
        if (status != ExitCodes.OK) {
            throw new ExitCodes.UserError(status, "could not open the workbench");
        }
    }
}
