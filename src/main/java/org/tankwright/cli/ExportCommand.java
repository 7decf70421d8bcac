package org.tankwright.cli;

import org.tankwright.analysis.Analysis;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.report.ResultJson;
import org.tankwright.report.SeriesCsv;
import org.tankwright.report.SpiceNetlist;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

/** {@code tankwright export FILE [--csv DIR] [--json FILE] [--netlist FILE]}: the result's data for other tools. */
@Command(name = "export", mixinStandardHelpOptions = true, versionProvider = VersionInfo.class,
        description = {"Export a design's analysis: every data series as CSV (one file per series, units in the "
                + "header), the whole result as JSON (SI values, keys ending in their unit), and the tuned network as "
                + "a SPICE-format netlist (values with MEG for mega, an .AC line at the operating frequency). "
                + "Give any of the three."})
public final class ExportCommand implements Callable<Integer> {
    @Parameters(paramLabel = "FILE", description = "design file (.json)")
    Path file;

    @Option(names = "--csv", paramLabel = "DIR", description = "folder for one CSV file per data series")
    Path csv;

    @Option(names = "--json", paramLabel = "FILE", description = "the whole result as JSON")
    Path json;

    @Option(names = "--netlist", paramLabel = "FILE", description = "the tuned network as a SPICE-format netlist")
    Path netlist;

    @Override
    public Integer call() {
        if (csv == null && json == null && netlist == null) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, "give at least one of --csv DIR, --json FILE, --netlist FILE");
        }
        AnalysisResult r = Analysis.run(DesignArgs.load(file));
        if (netlist != null && r.network() == null) {
            throw new ExitCodes.UserError(ExitCodes.REFUSED, "--netlist: the analysis of " + file
                    + " produced no tuned network, so there is no netlist to write");
        }
        Path target = null;
        try {
            if (csv != null) {
                target = csv;
                List<Path> files = SeriesCsv.write(r, csv);
                System.out.println("wrote " + files.size() + " CSV file" + (files.size() == 1 ? "" : "s") + " to " + csv);
            }
            if (json != null) {
                target = json;
                ResultJson.write(r, json);
                System.out.println("wrote " + json);
            }
            if (netlist != null) {
                target = netlist;
                SpiceNetlist.write(r, netlist);
                System.out.println("wrote " + netlist);
            }
        } catch (IOException e) {
            throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, target + ": cannot be written: " + e.getMessage());
        }
        return ExitCodes.OK;
    }
}
