package org.tankwright.cli;

import org.tankwright.capacitors.CapacitorPart;
import org.tankwright.capacitors.Retune;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;

/** {@code tankwright retune}: back-computes L and the capacitor trim from bench readings, and k from two readings. */
@Command(name = "retune", mixinStandardHelpOptions = true, versionProvider = VersionInfo.class,
        description = {"Bench re-tune: from a measured resonant frequency (with the installed capacitance) or a measured"
                + " inductance, the real L, the capacitance the design frequency needs and the trim with catalogue parts;"
                + " from --l-open and --l-short, the coupling k = √(1 − Lshort/Lopen)."})
public final class RetuneCommand implements Callable<Integer> {
    @Option(names = "--design-frequency", paramLabel = "F", description = "frequency the tank must resonate at")
    String designFrequency;
    @Option(names = "--capacitance", paramLabel = "C", description = "capacitance installed")
    String capacitance;
    @Option(names = "--measured-frequency", paramLabel = "F", description = "resonant frequency measured with the installed capacitance")
    String measuredFrequency;
    @Option(names = "--measured-inductance", paramLabel = "L", description = "inductance measured on the bench")
    String measuredInductance;
    @Option(names = "--l-open", paramLabel = "L", description = "coil 1 inductance with coil 2 in place, open")
    String lOpen;
    @Option(names = "--l-short", paramLabel = "L", description = "coil 1 inductance with coil 2 in place, shorted")
    String lShort;
    @Option(names = "--catalogue", paramLabel = "FILE", description = "parts catalogue for the trim; default: the bundled demo")
    Path catalogue;
    @Option(names = "--json", description = "print JSON")
    boolean json;

    @Override
    public Integer call() {
        boolean tune = designFrequency != null || capacitance != null || measuredFrequency != null || measuredInductance != null;
        boolean coupling = lOpen != null || lShort != null;
        if (!tune && !coupling) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, "give --design-frequency, --capacitance and --measured-frequency"
                    + " or --measured-inductance; and/or --l-open with --l-short");
        }
        Map<String, Object> out = new LinkedHashMap<>();
        Retune.Result r = null;
        if (tune) {
            if (designFrequency == null || capacitance == null || (measuredFrequency == null) == (measuredInductance == null)) {
                throw new ExitCodes.UserError(ExitCodes.USAGE, "re-tune needs --design-frequency, --capacitance and exactly one of"
                        + " --measured-frequency or --measured-inductance");
            }
            double fd = CliSupport.quantity("--design-frequency", designFrequency, Dimension.FREQUENCY);
            double c = CliSupport.quantity("--capacitance", capacitance, Dimension.CAPACITANCE);
            List<CapacitorPart> parts = CapsCommand.loadCatalogue(catalogue).parts();
            try {
                r = measuredFrequency != null
                        ? Retune.fromMeasuredFrequency(fd, c, CliSupport.quantity("--measured-frequency", measuredFrequency, Dimension.FREQUENCY), parts)
                        : Retune.fromMeasuredInductance(fd, c, CliSupport.quantity("--measured-inductance", measuredInductance, Dimension.INDUCTANCE), parts);
            } catch (IllegalArgumentException e) {
                throw new ExitCodes.UserError(ExitCodes.USAGE, e.getMessage());
            }
            out.put("inductance_H", r.inductance());
            out.put("capacitance_installed_F", r.installedCapacitance());
            out.put("design_frequency_Hz", r.designFrequency());
            out.put("capacitance_needed_F", r.capacitanceNeeded());
            out.put("trim_F", r.trim());
            out.put("action", r.action());
            out.put("series_capacitance_F", r.seriesCapacitance());
            List<Object> opts = new ArrayList<>();
            for (Retune.TrimOption o : r.options()) {
                Map<String, Object> m = new LinkedHashMap<>();
                m.put("position", o.position());
                m.put("parts", o.parts().stream().map(CapsCommand::partJson).toList());
                m.put("capacitance_F", o.capacitance());
                m.put("resulting_capacitance_F", o.resultingCapacitance());
                m.put("resulting_frequency_Hz", o.resultingFrequency());
                m.put("frequency_error", o.frequencyError());
                m.put("note", o.note());
                opts.add(m);
            }
            out.put("trim_parts", opts);
            out.put("model", r.provenance().model());
            out.put("source", r.provenance().source());
            out.put("validity", r.provenance().validity());
        }
        Double k = null;
        if (coupling) {
            if (lOpen == null || lShort == null) {
                throw new ExitCodes.UserError(ExitCodes.USAGE, "the coupling needs both --l-open and --l-short");
            }
            try {
                k = Retune.coupling(CliSupport.quantity("--l-open", lOpen, Dimension.INDUCTANCE),
                        CliSupport.quantity("--l-short", lShort, Dimension.INDUCTANCE));
            } catch (IllegalArgumentException e) {
                throw new ExitCodes.UserError(ExitCodes.USAGE, e.getMessage());
            }
            out.put("k", k);
        }
        if (json) {
            out.put("cautions", List.of(CapsCommand.CAUTION));
            CliSupport.printJson(out);
        } else {
            printText(r, k);
        }
        return ExitCodes.OK;
    }

    private static String q(double v, Dimension d) {
        return Quantities.format(v, d, 4);
    }

    private static void printText(Retune.Result r, Double k) {
        if (r != null) {
            System.out.println("Inductance as built: " + q(r.inductance(), Dimension.INDUCTANCE));
            System.out.println("Capacitance needed for " + q(r.designFrequency(), Dimension.FREQUENCY) + ": "
                    + q(r.capacitanceNeeded(), Dimension.CAPACITANCE) + " (installed " + q(r.installedCapacitance(), Dimension.CAPACITANCE) + ")");
            System.out.println("Trim: " + (r.trim() >= 0 ? "+" : "") + q(r.trim(), Dimension.CAPACITANCE) + " — " + r.action());
            if (r.seriesCapacitance() != null) {
                System.out.println("  series part that makes it: " + q(r.seriesCapacitance(), Dimension.CAPACITANCE));
            }
            for (Retune.TrimOption o : r.options()) {
                StringBuilder ids = new StringBuilder();
                for (CapacitorPart p : o.parts()) {
                    ids.append(ids.length() == 0 ? "" : " + ").append(p.id());
                }
                System.out.printf(Locale.ROOT, "  %s %s (%s): lands at %s (%+.2f %%); %s%n", o.position(), ids,
                        q(o.capacitance(), Dimension.CAPACITANCE), q(o.resultingFrequency(), Dimension.FREQUENCY),
                        100 * o.frequencyError(), o.note());
            }
            System.out.println("Model: " + r.provenance().model() + "; " + r.provenance().validity());
        }
        if (k != null) {
            System.out.printf(Locale.ROOT, "Coupling k = %.4f (k = √(1 − Lshort/Lopen))%n", k);
        }
        System.out.println(CapsCommand.CAUTION);
    }
}
