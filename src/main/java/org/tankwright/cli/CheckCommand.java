package org.tankwright.cli;

import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import org.tankwright.analysis.Analysis;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.checks.Checks;
import org.tankwright.checks.Finding;
import org.tankwright.checks.FindingsReport;
import org.tankwright.design.Design;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

/** {@code tankwright check FILE [--json]}: design-rule and safety findings, exit 5 when any is a danger. */
@Command(name = "check", mixinStandardHelpOptions = true, versionProvider = VersionInfo.class,
        description = "Analyse a design and list its design-rule and safety findings by severity "
                + "(danger, warning, caution, notice). Exit 5 when any danger is found, else 0.")
public final class CheckCommand implements Callable<Integer> {
    @Parameters(paramLabel = "FILE", description = "design file (.json)")
    Path file;

    @Option(names = "--json", description = "print {\"findings\": [...]} as JSON instead of text")
    boolean json;

    @Override
    public Integer call() {
        Design design = DesignArgs.load(file);
        AnalysisResult r = Analysis.run(design);
        return report(r, json, System.out);
    }

    /** The findings of a result: those the pipeline attached, or (until it attaches them) the checks run here. */
    static List<Finding> findings(AnalysisResult r) {
        return r.findings() != null && !r.findings().isEmpty() ? r.findings() : Checks.run(r);
    }

    /** Prints the findings of {@code r} and returns the exit status (5 when any is a danger). */
    static int report(AnalysisResult r, boolean asJson, PrintStream out) {
        List<Finding> findings = findings(r);
        if (asJson) {
            JsonObject o = FindingsReport.json(findings);
            o.addProperty("design", r.design() == null ? null : r.design().name());
            JsonArray cautions = new JsonArray();
            Checks.cautions().forEach(cautions::add);
            o.add("cautions", cautions);
            out.println(new GsonBuilder().setPrettyPrinting().serializeNulls().disableHtmlEscaping().create().toJson(o));
        } else {
            if (r.design() != null) {
                out.println("Findings for \"" + r.design().name() + "\"");
                out.println();
            }
            out.print(FindingsReport.text(findings));
            out.println();
            out.println("General cautions:");
            for (String c : Checks.cautions()) {
                out.println("  - " + c);
            }
        }
        return Checks.anyDanger(findings) ? ExitCodes.DANGER : ExitCodes.OK;
    }
}
