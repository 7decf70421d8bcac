package org.tankwright.cli;

import org.tankwright.analysis.Analysis;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.Summary;
import org.tankwright.report.ResultJson;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

import java.nio.file.Path;
import java.util.concurrent.Callable;

/** {@code tankwright solve FILE}: runs the whole pipeline on a design file and prints the result. */
@Command(name = "solve", mixinStandardHelpOptions = true, versionProvider = VersionInfo.class,
        description = "Run the whole analysis on a design file (coils, coupling, tuning, banks, envelope, checks) "
                + "and print the result: a readable summary, or with --json everything, the operating point under "
                + "the same top-level keys as 'tankwright tune --json'.")
public final class SolveCommand implements Callable<Integer> {
    @Parameters(paramLabel = "FILE", description = "design file (.json)")
    Path file;

    @Option(names = "--json", description = "print the whole result as one JSON object (SI values)")
    boolean json;

    @Option(names = "--quick", description = "the operating point only: skip the sweeps and the operating envelope")
    boolean quick;

    @Override
    public Integer call() {
        AnalysisResult r = Analysis.run(DesignArgs.load(file), quick ? Analysis.Scope.OPERATING_POINT : Analysis.Scope.FULL);
        if (json) {
            System.out.print(ResultJson.text(r));
        } else {
            System.out.print(Summary.text(r));
        }
        return ExitCodes.OK;
    }
}
