package org.tankwright.report;

import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.ElementStress;
import org.tankwright.analysis.BankReport;
import org.tankwright.checks.Checks;
import org.tankwright.checks.Finding;
import org.tankwright.checks.Severity;
import org.tankwright.design.Design;
import org.tankwright.design.DesignFiles;
import org.tankwright.design.Token;
import org.tankwright.units.Dimension;

import java.awt.Color;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;

/**
 * The printable tuning sheet: one PDF, laid out for A4 or Letter, made from one analysis result.
 * Header, the safety box (always), the tuned network's schematic, coil and capacitor-bank build
 * data, element stresses, a heater's cold and hot points, the expected bench readings (low
 * voltage first, then full power) with blank columns for what was measured, trip levels, the
 * bench procedure, the re-tune table, plots, the findings of the checks and the deferral to
 * local codes. Sections that do not apply to a design are left out, never printed empty.
 */
public final class TuningSheet {
    /** What the sheet is, printed before the deferral to local codes ({@link Finding#DEFERRAL}). */
    public static final String ESTIMATE = "This sheet is an engineering estimate made by a program from a model of the "
            + "design, not a safety assessment or a certification.";
    /** How many of the most severe findings the safety box repeats. */
    static final int BOX_FINDINGS = 5;
    private static final Color DANGER_RED = new Color(0xb0, 0x10, 0x10);

    private TuningSheet() {
    }

    /** Writes the sheet for {@code r} to {@code pdf} (atomically: a temporary file, then a move). */
    public static void write(AnalysisResult r, Path pdf, Paper paper, SheetInfo info) throws IOException {
        DesignFiles.replaceAtomically(pdf, out -> {
            try (PDDocument doc = build(r, paper, info)) {
                doc.save(out);
            }
        });
    }

    /** The sheet as an open document (the caller closes it). */
    static PDDocument build(AnalysisResult r, Paper paper, SheetInfo info) {
        PDDocument doc = new PDDocument();
        Design d = r.design();
        PDDocumentInformation meta = doc.getDocumentInformation();
        meta.setTitle("Tuning sheet: " + d.name());
        meta.setCreator("Tankwright " + info.toolVersion());
        meta.setSubject("Bench tuning sheet of a resonant inductive design");
        try (PageFlow flow = new PageFlow(doc, paper, "Tuning sheet \u2014 " + d.name())) {
            header(flow, r, info);
            safetyBox(flow, r);
            BuildSections.all(flow, r);
            BenchSections.all(flow, r);
            findings(flow, r);
            notes(flow, r);
            flow.heading("Local codes and licensed practice");
            flow.paragraph(ESTIMATE + " " + Finding.DEFERRAL);
            flow.finish("Tankwright " + info.toolVersion() + " \u00B7 " + d.name() + " \u00B7 " + info.date());
        } catch (RuntimeException e) {
            try {
                doc.close();
            } catch (IOException suppressed) {
                e.addSuppressed(suppressed);
            }
            throw e;
        }
        return doc;
    }

    /** SHA-256 of the design as the text of a current-version design file, in hex. */
    public static String checksum(Design d) {
        try {
            byte[] h = MessageDigest.getInstance("SHA-256").digest(DesignFiles.toJson(d).getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(h);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is missing from this Java runtime", e);
        }
    }

    /** A long hex string in groups of eight, so that it wraps between groups and reads aloud in pieces. */
    static String grouped(String hex) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < hex.length(); i += 8) {
            sb.append(i == 0 ? "" : " ").append(hex, i, Math.min(hex.length(), i + 8));
        }
        return sb.toString();
    }

    private static void header(PageFlow flow, AnalysisResult r, SheetInfo info) {
        Design d = r.design();
        flow.title("Tuning sheet: " + d.name());
        flow.paragraph(Token.of(d.kind()) + ", " + d.compensation().topology().token() + " compensation, designed for "
                + Fmt.build(d.frequency(), Dimension.FREQUENCY), PageFlow.H3, false, 0, PageFlow.INK);
        flow.space(3);
        Table t = new Table(new String[] {"Made", "Tool", "Design file", "SHA-256 of the design (as saved)"},
                new float[] {1.1f, 1.1f, 2.2f, 4.6f});
        t.row(info.date(), "Tankwright " + info.toolVersion(), info.fileName(), grouped(checksum(d)));
        flow.table(t);
        if (d.description() != null && !d.description().isBlank()) {
            flow.note(d.description());
        }
        flow.space(4);
    }

    /** The safety box: never optional, at the top of the first page. */
    private static void safetyBox(PageFlow flow, AnalysisResult r) {
        List<String> lines = new ArrayList<>();
        List<Finding> severe = r.findings().stream()
                .filter(f -> f.severity() == Severity.DANGER || f.severity() == Severity.WARNING)
                .sorted((a, b) -> a.severity().compareTo(b.severity()))
                .limit(BOX_FINDINGS).toList();
        for (Finding f : severe) {
            String action = f.action() == null ? "" : f.action().replace(Finding.DEFERRAL, "").strip();
            lines.add(f.severity().name() + " " + f.id() + ": " + f.message() + (action.isEmpty() ? "" : " \u2014 " + action));
        }
        long more = r.findings().stream().filter(f -> f.severity() == Severity.DANGER || f.severity() == Severity.WARNING)
                .count() - severe.size();
        if (more > 0) {
            lines.add(more + " more danger and warning findings are listed under Findings.");
        }
        if (r.network() == null) {
            lines.add("The analysis did not produce a tuned network for this design, so the checks could not judge "
                    + "its voltages and currents. The cautions below apply all the same.");
        } else if (severe.isEmpty()) {
            lines.add("The checks found no danger or warning for this design. The cautions below still apply.");
        }
        ElementStress highest = null;
        for (ElementStress s : r.stresses()) {
            if (Fmt.has(s.voltagePeak()) && (highest == null || s.voltagePeak() > highest.voltagePeak())) {
                highest = s;
            }
        }
        if (highest != null) {
            lines.add("The highest voltage on any part at the operating point is " + Fmt.reading(highest.voltagePeak(),
                    Dimension.VOLTAGE) + " peak, across " + highest.id() + " (" + highest.role() + ").");
        }
        double energy = 0;
        for (BankReport b : r.banks()) {
            energy += Fmt.has(b.storedEnergy()) ? b.storedEnergy() : 0;
        }
        if (energy > 0) {
            lines.add("The capacitor banks store " + Fmt.reading(energy, Dimension.ENERGY)
                    + " at peak voltage: discharge them and measure before touching.");
        }
        lines.add(ESTIMATE);
        lines.addAll(Checks.cautions());
        flow.box("SAFETY \u2014 read before building or powering", lines, DANGER_RED, DANGER_RED, Color.WHITE);
    }

    private static void findings(PageFlow flow, AnalysisResult r) {
        if (r.findings().isEmpty()) {
            return;
        }
        flow.heading("Findings of the checks");
        Table t = new Table(new String[] {"Severity", "Rule", "Element", "Value", "Limit", "Finding and action", "Source"},
                new float[] {1.05f, 1.3f, 0.9f, 1f, 1f, 4.0f, 1.8f}, false, false, false, true, true);
        for (Finding f : r.findings()) {
            t.row(f.severity().name(), f.id(), f.element(), Fmt.inUnit(f.value(), f.unit()), Fmt.inUnit(f.limit(), f.unit()),
                    f.message() + (f.action() == null || f.action().isBlank() ? "" : " \u2014 " + f.action()), f.source());
        }
        flow.table(t);
    }

    private static void notes(PageFlow flow, AnalysisResult r) {
        List<String> notes = new ArrayList<>(r.notes());
        if (r.network() != null) {
            notes.addAll(r.network().notes());
            if (!r.network().fundamentalValid()) {
                notes.add("The loaded Q is " + Fmt.number(r.network().loadedQ(), Fmt.READING)
                        + ", below about 3: the fundamental-harmonic readings above are rough (common practice).");
            }
        }
        r.coils().forEach(c -> c.notes().forEach(n -> notes.add(c.role() + ": " + n)));
        if (r.coupling() != null) {
            notes.addAll(r.coupling().notes());
        }
        r.banks().forEach(b -> b.notes().forEach(n -> notes.add(b.id() + ": " + n)));
        if (r.heater() != null) {
            notes.addAll(r.heater().notes());
        }
        if (r.network() == null) {
            notes.add("The analysis produced no tuned network for this design, so the schematic, bench readings, "
                    + "re-tune table and netlist are not available.");
        }
        if (notes.isEmpty()) {
            return;
        }
        flow.heading("Notes on the models and their validity");
        flow.list(notes, false);
    }
}
