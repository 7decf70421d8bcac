package org.tankwright.cli;

import org.tankwright.analysis.Analysis;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.report.Paper;
import org.tankwright.report.SheetInfo;
import org.tankwright.report.TuningSheet;
import org.tankwright.report.Version;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

import java.io.IOException;
import java.nio.file.Path;
import java.util.concurrent.Callable;

/** {@code tankwright sheet FILE -o out.pdf [--paper a4|letter]}: the printable bench tuning sheet. */
@Command(name = "sheet", mixinStandardHelpOptions = true, versionProvider = VersionInfo.class,
        description = {"Write the printable tuning sheet of a design as PDF: safety box, schematic with every value, "
                + "coil and capacitor-bank build data, expected bench readings with blank Measured and Pass/Fail "
                + "columns, trip levels, bench procedure, re-tune table, plots and the findings of the checks.",
                "Caution: resonant tanks carry many times the supply voltage; follow local codes and licensed practice."})
public final class SheetCommand implements Callable<Integer> {
    @Parameters(paramLabel = "FILE", description = "design file (.json)")
    Path file;

    @Option(names = {"-o", "--output"}, required = true, paramLabel = "PDF", description = "the PDF to write")
    Path output;

    @Option(names = "--paper", paramLabel = "SIZE", defaultValue = "a4", description = "a4 or letter (default ${DEFAULT-VALUE})")
    String paper;

    @Override
    public Integer call() {
        Paper p;
        try {
            p = Paper.parse(paper);
        } catch (IllegalArgumentException e) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, "--paper: " + e.getMessage());
        }
        AnalysisResult r = Analysis.run(DesignArgs.load(file));
        try {
            TuningSheet.write(r, output, p, SheetInfo.today(file.getFileName().toString(), Version.get()));
        } catch (IOException e) {
            throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, output + ": cannot be written: " + e.getMessage());
        }
        System.out.println("wrote " + output + " (" + p.token() + ")");
        return ExitCodes.OK;
    }
}
