package org.tankwright.cli;

import org.tankwright.capacitors.BankRequest;
import org.tankwright.capacitors.BankSearchResult;
import org.tankwright.capacitors.BankStress;
import org.tankwright.capacitors.BankSynthesis;
import org.tankwright.capacitors.CapacitorBank;
import org.tankwright.capacitors.CapacitorPart;
import org.tankwright.capacitors.Catalogue;
import org.tankwright.capacitors.CatalogueReader;
import org.tankwright.capacitors.DeratingRules;
import org.tankwright.capacitors.ESeries;
import org.tankwright.capacitors.PartDuty;
import org.tankwright.capacitors.PartTemplate;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;

/** {@code tankwright caps}: chooses capacitor banks for a target capacitance and its stress. */
@Command(name = "caps", mixinStandardHelpOptions = true, versionProvider = VersionInfo.class,
        description = {"Choose a capacitor bank: n parts in series × m strings in parallel plus at most one trim part,"
                + " within derated voltage, current, dissipation and dV/dt limits, SRF well above the frequency;"
                + " fewest parts first, then least deviation. Exit 4 when no bank fits."})
public final class CapsCommand implements Callable<Integer> {
    static final String CAUTION = "Caution: a charged capacitor bank at these voltages can hold a dangerous charge after"
            + " power-off; fit bleed resistors, discharge and verify before touching. Follow local electrical codes"
            + " and licensed practice.";

    @Option(names = "--target", required = true, paramLabel = "C", description = "capacitance wanted, e.g. 47n")
    String target;
    @Option(names = "--vrms", paramLabel = "V", description = "rms AC voltage across the bank")
    String vrms;
    @Option(names = "--vpeak", paramLabel = "V", description = "AC peak across the bank (default √2 × rms)")
    String vpeak;
    @Option(names = "--irms", paramLabel = "A", description = "rms current through the bank")
    String irms;
    @Option(names = "--frequency", required = true, paramLabel = "F", description = "operating frequency, e.g. 100k")
    String frequency;
    @Option(names = "--vdc-bias", paramLabel = "V", description = "DC voltage across the bank (default 0)")
    String vdcBias;
    @Option(names = "--catalogue", paramLabel = "FILE", description = "parts catalogue (.json or .csv); default: the bundled demo")
    Path catalogue;
    @Option(names = "--e-series", paramLabel = "E", description = "use E-series values (E6 … E192) with --template instead of a catalogue")
    String eSeries;
    @Option(names = "--template", paramLabel = "NAME", description = "part template for --e-series: pp-film-630v, pp-film-1600v, c0g-1000v, mica-500v")
    String template;
    @Option(names = "--max-deviation", paramLabel = "FRACTION", defaultValue = "2%", description = "largest |C/target − 1| (default 2%%)")
    String maxDeviation;
    @Option(names = "--max-series", defaultValue = "8", description = "search bound: parts in series (default 8)")
    int maxSeries;
    @Option(names = "--max-parallel", defaultValue = "32", description = "search bound: strings in parallel (default 32)")
    int maxParallel;
    @Option(names = "--no-trim", description = "no trim part")
    boolean noTrim;
    @Option(names = "--alternatives", defaultValue = "5", description = "banks to list (default 5)")
    int alternatives;
    @Option(names = "--derating", paramLabel = "FILE", description = "derating rules (JSON); keys left out keep the common-practice defaults")
    Path derating;
    @Option(names = "--json", description = "print JSON")
    boolean json;

    @Override
    public Integer call() {
        double c = CliSupport.quantity("--target", target, Dimension.CAPACITANCE);
        double f = CliSupport.quantity("--frequency", frequency, Dimension.FREQUENCY);
        double v = CliSupport.quantity("--vrms", vrms, Dimension.VOLTAGE, 0);
        double vp = CliSupport.quantity("--vpeak", vpeak, Dimension.VOLTAGE, 0);
        double i = CliSupport.quantity("--irms", irms, Dimension.CURRENT, 0);
        double dc = CliSupport.quantity("--vdc-bias", vdcBias, Dimension.VOLTAGE, 0);
        double dev = CliSupport.quantity("--max-deviation", maxDeviation, Dimension.FRACTION);
        if (vrms == null && irms == null) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, "give --vrms or --irms (or both): the bank's stress");
        }
        BankRequest req;
        try {
            req = new BankRequest(c, dev, new BankStress(v, vp, dc, i, f, 0), readDerating(),
                    maxSeries, maxParallel, !noTrim, alternatives);
        } catch (IllegalArgumentException e) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, e.getMessage());
        }
        BankSearchResult r;
        String source;
        if (eSeries != null || template != null) {
            if (eSeries == null || template == null || catalogue != null) {
                throw new ExitCodes.UserError(ExitCodes.USAGE, "--e-series and --template go together, without --catalogue");
            }
            ESeries s = parseOrUsage(() -> ESeries.parse(eSeries));
            PartTemplate t = parseOrUsage(() -> PartTemplate.named(template));
            r = BankSynthesis.searchSeries(req, s, t);
            source = s + " values, template " + t.name();
        } else {
            Catalogue cat = loadCatalogue(catalogue);
            r = BankSynthesis.search(req, cat.parts());
            source = cat.name();
        }
        if (json) {
            Map<String, Object> out = toJson(req, r, source);
            out.put("derating_source", derating == null ? "common-practice defaults" : derating.toString());
            CliSupport.printJson(out);
        } else {
            printText(req, r, source);
        }
        if (r.best() == null) {
            if (!json) {
                System.err.println("tankwright: no bank fits within the bounds and limits; " + (r.nearMisses().isEmpty()
                        ? "try larger --max-series / --max-parallel, a larger --max-deviation or another catalogue"
                        : "the near misses above say why"));
            }
            return ExitCodes.REFUSED;
        }
        return ExitCodes.OK;
    }

    private static <T> T parseOrUsage(java.util.function.Supplier<T> s) {
        try {
            return s.get();
        } catch (IllegalArgumentException e) {
            throw new ExitCodes.UserError(ExitCodes.USAGE, e.getMessage());
        }
    }

    private DeratingRules readDerating() {
        if (derating == null) {
            return DeratingRules.COMMON_PRACTICE;
        }
        try {
            return DeratingRules.fromJson(Files.readString(derating));
        } catch (IOException e) {
            throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, derating + ": cannot be read (" + e.getMessage() + ")");
        } catch (IllegalArgumentException e) {
            throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, derating + ": " + e.getMessage());
        }
    }

    /** The catalogue file, or the bundled demo when {@code file} is null; errors become user errors (exit 3). */
    static Catalogue loadCatalogue(Path file) {
        if (file == null) {
            return CatalogueReader.demo();
        }
        try {
            return CatalogueReader.read(file);
        } catch (NoSuchFileException e) {
            throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, file + ": no such file");
        } catch (IOException e) {
            throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, file + ": cannot be read (" + e.getMessage() + ")");
        } catch (IllegalArgumentException e) {
            throw new ExitCodes.UserError(ExitCodes.INVALID_INPUT, e.getMessage());
        }
    }

    static Map<String, Object> toJson(BankRequest req, BankSearchResult r, String source) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("target_F", req.targetCapacitance());
        m.put("max_deviation", req.maxDeviation());
        BankStress s = req.stress();
        Map<String, Object> st = new LinkedHashMap<>();
        st.put("voltage_rms_V", s.voltageRms());
        st.put("voltage_peak_V", s.crestFactor() * s.voltageRms());
        st.put("dc_bias_V", s.dcBias());
        st.put("current_rms_A", s.currentRms());
        st.put("frequency_Hz", s.frequency());
        m.put("stress", st);
        m.put("parts_source", source);
        m.put("derating", req.derating().toMap());
        m.put("search_bounds", r.bounds());
        m.put("layouts_evaluated", r.evaluated());
        List<Object> banks = new ArrayList<>();
        for (int k = 0; k < r.banks().size(); k++) {
            Map<String, Object> b = bankJson(r.banks().get(k));
            b.put("rank", k + 1);
            b.put("verdict", r.verdicts().get(k));
            banks.add(b);
        }
        m.put("banks", banks);
        m.put("near_misses", r.nearMisses().stream().map(CapsCommand::bankJson).toList());
        List<Object> rej = new ArrayList<>();
        for (BankSearchResult.PartRejection p : r.rejectedParts()) {
            rej.add(Map.of("part_id", p.partId(), "reason", p.reason()));
        }
        m.put("rejected_parts", rej);
        m.put("cautions", List.of(CAUTION));
        return m;
    }

    static Map<String, Object> bankJson(CapacitorBank b) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("capacitance_F", b.capacitance());
        m.put("deviation", b.deviation());
        m.put("layout", b.layout().describe());
        List<Object> parts = new ArrayList<>();
        Map<String, Object> main = partJson(b.layout().part());
        main.put("role", "main");
        main.put("series", b.layout().series());
        main.put("parallel", b.layout().parallel());
        main.put("count", b.layout().series() * b.layout().parallel());
        parts.add(main);
        if (b.layout().trim() != null) {
            Map<String, Object> t = partJson(b.layout().trim());
            t.put("role", "trim");
            t.put("position", b.layout().trimPosition().key());
            t.put("count", 1);
            parts.add(t);
        }
        m.put("parts", parts);
        m.put("part_count", b.partCount());
        PartDuty w = b.worstDuty();
        m.put("worst_part_id", w.part().id());
        for (Map.Entry<String, Object> e : dutyJson(w).entrySet()) { // the worst part's duty, keys prefixed part_
            if (!e.getKey().equals("role") && !e.getKey().equals("part_id")) {
                m.put("part_" + e.getKey(), e.getValue());
            }
        }
        m.put("duties", b.trim() == null ? List.of(dutyJson(b.main())) : List.of(dutyJson(b.main()), dutyJson(b.trim())));
        m.put("esr_ohm", b.esr());
        m.put("esl_H", b.esl());
        m.put("srf_Hz", finiteOrNull(b.srf()));
        m.put("tolerance", b.tolerance());
        m.put("tempco_ppm_per_K", b.tempcoPpmPerK());
        m.put("bank_voltage_V", b.voltageRms());
        m.put("bank_current_A", b.currentRms());
        m.put("dissipation_W", b.dissipation());
        m.put("stored_energy_J", b.storedEnergy());
        m.put("price", b.price());
        m.put("warnings", b.warnings());
        m.put("model", b.provenance().model());
        m.put("source", b.provenance().source());
        m.put("validity", b.provenance().validity());
        return m;
    }

    static Map<String, Object> dutyJson(PartDuty d) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("role", d.role());
        m.put("part_id", d.part().id());
        m.put("voltage_V", d.voltageRms());
        m.put("voltage_rating_V", d.voltageRmsLimit());
        m.put("dc_voltage_V", d.dcVoltage());
        m.put("peak_voltage_V", d.peakVoltage());
        m.put("peak_voltage_rating_V", d.peakVoltageLimit());
        m.put("current_A", d.currentRms());
        m.put("current_rating_A", d.currentLimit());
        m.put("dissipation_W", d.dissipation());
        m.put("dissipation_rating_W", finiteOrNull(d.dissipationLimit()));
        m.put("dvdt_V_per_s", d.dvdt());
        m.put("dvdt_rating_V_per_s", finiteOrNull(d.dvdtLimit()));
        m.put("srf_Hz", finiteOrNull(d.srf()));
        m.put("srf_minimum_Hz", d.srfLimit());
        m.put("margin", d.worstMargin());
        m.put("limiting_check", d.limitingCheck());
        return m;
    }

    static Map<String, Object> partJson(CapacitorPart p) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("part_id", p.id());
        m.put("description", p.description());
        m.put("capacitance_F", p.capacitance());
        m.put("dielectric", p.dielectric().key());
        m.put("dc_rating_V", p.dcRating());
        return m;
    }

    static Double finiteOrNull(double v) {
        return Double.isFinite(v) ? v : null;
    }

    private static String q(double v, Dimension d) {
        return Quantities.format(v, d, 3);
    }

    private static void printText(BankRequest req, BankSearchResult r, String source) {
        BankStress s = req.stress();
        System.out.printf(Locale.ROOT, "Target %s ±%.3g %%, %s rms, %s rms, DC %s, at %s — parts: %s%n",
                q(req.targetCapacitance(), Dimension.CAPACITANCE), 100 * req.maxDeviation(), q(s.voltageRms(), Dimension.VOLTAGE),
                q(s.currentRms(), Dimension.CURRENT), q(s.dcBias(), Dimension.VOLTAGE), q(s.frequency(), Dimension.FREQUENCY), source);
        System.out.println("Search: " + r.bounds() + "; " + r.evaluated() + " layouts evaluated");
        for (int k = 0; k < r.banks().size(); k++) {
            CapacitorBank b = r.banks().get(k);
            PartDuty w = b.worstDuty();
            System.out.printf(Locale.ROOT, "%n%d. %s%n   %s (%+.2f %%), %d part(s), ESR %s, ESL %s — %s%n",
                    k + 1, b.layout().describe(), q(b.capacitance(), Dimension.CAPACITANCE), 100 * b.deviation(),
                    b.partCount(), q(b.esr(), Dimension.RESISTANCE), q(b.esl(), Dimension.INDUCTANCE), r.verdicts().get(k));
            System.out.printf(Locale.ROOT, "   worst part %s: %s of %s rms, %s of %s peak, %s of %s, SRF %s; limit: %s (margin %.0f %%)%n",
                    w.part().id(), q(w.voltageRms(), Dimension.VOLTAGE), q(w.voltageRmsLimit(), Dimension.VOLTAGE),
                    q(w.peakVoltage(), Dimension.VOLTAGE), q(w.peakVoltageLimit(), Dimension.VOLTAGE),
                    q(w.currentRms(), Dimension.CURRENT), q(w.currentLimit(), Dimension.CURRENT), q(w.srf(), Dimension.FREQUENCY),
                    w.limitingCheck(), 100 * w.worstMargin());
            for (String warning : b.warnings()) {
                System.out.println("   ! " + warning);
            }
        }
        if (!r.nearMisses().isEmpty()) {
            System.out.println();
            System.out.println("Fewer parts do not fit:");
            for (CapacitorBank b : r.nearMisses()) {
                PartDuty w = b.worstDuty();
                System.out.printf(Locale.ROOT, "  %s (%d part(s)): %s over its limit on %s%n", b.layout().describe(),
                        b.partCount(), w.part().id(), w.limitingCheck());
            }
        }
        if (!r.rejectedParts().isEmpty()) {
            System.out.println();
            System.out.println(r.rejectedParts().size() + " part(s) left out, e.g. " + r.rejectedParts().get(0).partId()
                    + ": " + r.rejectedParts().get(0).reason());
        }
        System.out.println();
        System.out.println("Derating (common practice unless --derating): " + req.derating().toMap());
        System.out.println(CAUTION);
    }
}
