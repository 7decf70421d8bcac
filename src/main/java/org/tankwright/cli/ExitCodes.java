package org.tankwright.cli;

import picocli.CommandLine;

/** The exit statuses of every command, and the handlers that map errors to them without stack traces. */
public final class ExitCodes {
    public static final int OK = 0;
    public static final int USAGE = 2;
    public static final int INVALID_INPUT = 3;
    public static final int REFUSED = 4;
    public static final int DANGER = 5;

    private ExitCodes() {
    }

    /** Installs the exit-code mapping and the user-error handler on a command line. */
    public static CommandLine configure(CommandLine cl) {
        cl.setExitCodeExceptionMapper(ex -> {
            if (ex instanceof UserError ue) {
                return ue.status();
            }
            if (ex instanceof CommandLine.ParameterException) {
                return USAGE;
            }
            return REFUSED;
        });
        cl.setExecutionExceptionHandler((ex, commandLine, parseResult) -> {
            if (ex instanceof UserError ue) {
                commandLine.getErr().println("tankwright: " + ue.getMessage());
                return ue.status();
            }
            if (ex instanceof org.tankwright.analysis.AnalysisException ae) {
                commandLine.getErr().println("tankwright: " + (ae.invalidInput() ? "" : "computation refused: ") + ae.getMessage());
                return ae.invalidInput() ? INVALID_INPUT : REFUSED;
            }
            if (ex instanceof IllegalArgumentException) {
                commandLine.getErr().println("tankwright: " + ex.getMessage());
                return INVALID_INPUT;
            }
            commandLine.getErr().println("tankwright: computation refused: " + ex);
            return REFUSED;
        });
        cl.setParameterExceptionHandler((ex, args) -> {
            CommandLine c = ex.getCommandLine();
            c.getErr().println("tankwright: " + ex.getMessage());
            c.getErr().println("Try '" + c.getCommandSpec().qualifiedName() + " --help' for the options.");
            return USAGE;
        });
        return cl;
    }

    /** An error the user can fix; carries the exit status and a message without a stack trace. */
    public static final class UserError extends RuntimeException {
        private final int status;

        public UserError(int status, String message) {
            super(message);
            this.status = status;
        }

        public int status() {
            return status;
        }
    }
}
