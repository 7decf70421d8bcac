package org.tankwright.report;

import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.BankReport;
import org.tankwright.analysis.CoilReport;
import org.tankwright.analysis.ElementStress;
import org.tankwright.analysis.HeaterReport;
import org.tankwright.analysis.ModelValue;
import org.tankwright.analysis.ResistanceValue;
import org.tankwright.analysis.NetworkReport;
import org.tankwright.design.Backing;
import org.tankwright.design.Coil;
import org.tankwright.design.Design;
import org.tankwright.design.Token;
import org.tankwright.design.Wire;
import org.tankwright.units.Dimension;

import java.util.ArrayList;
import java.util.List;

/** The build half of the sheet: the tuned network, the coils, the capacitor banks, the stresses and a heater's points. */
final class BuildSections {
    private BuildSections() {
    }

    static void all(PageFlow flow, AnalysisResult r) {
        if (r.network() != null) {
            network(flow, r);
        }
        for (int i = 0; i < r.coils().size(); i++) {
            coil(flow, r, i);
        }
        banks(flow, r);
        stresses(flow, r);
        if (r.heater() != null) {
            heater(flow, r.heater());
        }
    }

    private static void network(PageFlow flow, AnalysisResult r) {
        NetworkReport n = r.network();
        TunedNetwork net = TunedNetwork.of(r);
        flow.heading("Tuned network");
        NetworkSchematic s = new NetworkSchematic(net);
        flow.figure(flow.width(), s.height(), true, g -> s.paint(g, flow.width()));
        Table parts = new Table(new String[] {"Element", "What it is", "Value"}, new float[] {1f, 4f, 1.6f}, false, false, true);
        for (TunedNetwork.Part p : net.parts()) {
            parts.row(p.name(), p.role(), Fmt.build(p.value(), unit(p.kind())));
        }
        if (net.isLink()) {
            parts.row("k", "coupling between L1 and L2" + (net.reversed() ? " (negative: L2 turned around)" : ""),
                    Fmt.number(net.coupling(), Fmt.BUILD));
            parts.row("M", "mutual inductance", Fmt.build(net.mutual(), Dimension.INDUCTANCE));
        }
        flow.table(parts);
        Table op = new Table(new String[] {"Operating point", "Value", "Operating point", "Value"},
                new float[] {2.4f, 1.4f, 2.4f, 1.4f}, false, true, false, true);
        List<String[]> cells = new ArrayList<>();
        cells.add(new String[] {"Drive frequency", Fmt.build(n.frequency(), Dimension.FREQUENCY)});
        if (Fmt.has(n.busVoltage())) {
            cells.add(new String[] {"DC bus voltage", Fmt.reading(n.busVoltage(), Dimension.VOLTAGE)});
        }
        if (Fmt.has(n.sourceVoltage())) {
            cells.add(new String[] {"Source fundamental (rms)", Fmt.reading(n.sourceVoltage(), Dimension.VOLTAGE)});
        }
        cells.add(new String[] {"Source current (rms)", Fmt.reading(n.sourceCurrent(), Dimension.CURRENT)});
        cells.add(new String[] {"Input impedance", Fmt.reading(n.inputResistance(), Dimension.RESISTANCE) + " "
                + (n.inputReactance() < 0 ? "\u2212" : "+") + " j" + Fmt.reading(Math.abs(n.inputReactance()), Dimension.RESISTANCE)});
        cells.add(new String[] {"Input phase (+ inductive)", Fmt.reading(n.inputPhaseDeg(), Dimension.ANGLE)});
        cells.add(new String[] {"Power from the source", Fmt.reading(n.powerIn(), Dimension.POWER)});
        cells.add(new String[] {r.heater() != null ? "Power into the workpiece" : "Power into the load",
                Fmt.reading(n.powerOut(), Dimension.POWER)});
        cells.add(new String[] {"Efficiency", Fmt.percent(n.efficiency())});
        if (Fmt.has(n.outputVoltage())) {
            cells.add(new String[] {"Output voltage", Fmt.reading(n.outputVoltage(), Dimension.VOLTAGE)});
        }
        cells.add(new String[] {"Loaded Q", Fmt.number(n.loadedQ(), Fmt.READING)});
        if (Fmt.has(n.c1Textbook())) {
            cells.add(new String[] {"C1 textbook (lossless)", Fmt.build(n.c1Textbook(), Dimension.CAPACITANCE)});
        }
        if (Fmt.has(n.c2Textbook())) {
            cells.add(new String[] {"C2 textbook", Fmt.build(n.c2Textbook(), Dimension.CAPACITANCE)});
        }
        if (Fmt.has(n.efficiencyMax())) {
            cells.add(new String[] {"Best efficiency over the load", Fmt.percent(n.efficiencyMax())});
        }
        if (Fmt.has(n.loadOptimal())) {
            cells.add(new String[] {"Load for the best efficiency", Fmt.reading(n.loadOptimal(), Dimension.RESISTANCE)});
        }
        if (Fmt.has(n.turnOffCurrent())) {
            cells.add(new String[] {"Bridge current at turn-off", Fmt.reading(n.turnOffCurrent(), Dimension.CURRENT)});
        }
        if (Fmt.has(n.zvsRequiredCurrent())) {
            cells.add(new String[] {"Current needed for ZVS", Fmt.reading(n.zvsRequiredCurrent(), Dimension.CURRENT)});
        }
        StringBuilder zp = new StringBuilder();
        for (double f : n.zeroPhaseFrequencies()) {
            zp.append(zp.isEmpty() ? "" : ", ").append(Fmt.build(f, Dimension.FREQUENCY));
        }
        cells.add(new String[] {"Zero-phase frequencies" + (n.bifurcated() ? " (split: over-coupled)" : ""),
                zp.isEmpty() ? "none in f/2 to 2f" : zp.toString()});
        for (int i = 0; i < cells.size(); i += 2) {
            String[] a = cells.get(i);
            String[] b = i + 1 < cells.size() ? cells.get(i + 1) : new String[] {"", ""};
            op.row(a[0], a[1], b[0], b[1]);
        }
        flow.table(op);
    }

    static Dimension unit(TunedNetwork.Kind k) {
        return switch (k) {
            case VOLTAGE_SOURCE -> Dimension.VOLTAGE;
            case CURRENT_SOURCE -> Dimension.CURRENT;
            case RESISTOR -> Dimension.RESISTANCE;
            case CAPACITOR -> Dimension.CAPACITANCE;
            case INDUCTOR -> Dimension.INDUCTANCE;
        };
    }

    private static void coil(PageFlow flow, AnalysisResult r, int index) {
        CoilReport c = r.coils().get(index);
        Design d = r.design();
        Coil dc = index == 0 ? d.primary() : d.secondary();
        flow.heading("Coil L" + (index + 1) + ": " + c.role() + (c.label() == null || c.label().isBlank() ? "" : ", " + c.label()));
        Table t = new Table(new String[] {"Build", "Value", "Expected", "Value"}, new float[] {1.6f, 2.6f, 2.0f, 1.6f},
                false, false, false, true);
        List<String[]> build = new ArrayList<>();
        build.add(new String[] {"Shape", c.shape()});
        if (Fmt.has(c.turns())) {
            build.add(new String[] {"Turns", Fmt.number(c.turns(), 4).replaceAll("\\.?0+$", "")});
        }
        if (dc != null) {
            geometry(dc, build);
            if (dc.wire() != null) {
                build.add(new String[] {"Wire", wire(dc.wire())});
            }
            if (dc.backing() != null) {
                build.add(new String[] {"Behind the coil", backing(dc.backing())});
            }
            build.add(new String[] {"Winding temperature", Fmt.reading(dc.temperature(), Dimension.TEMPERATURE)});
        }
        if (Fmt.has(c.turnPitch())) {
            build.add(new String[] {"Turn pitch", Fmt.reading(c.turnPitch(), Dimension.LENGTH)});
        }
        if (Fmt.has(c.wireLength())) {
            build.add(new String[] {"Conductor length (no leads)", Fmt.reading(c.wireLength(), Dimension.LENGTH)});
        }
        if (Fmt.has(c.conductorMass())) {
            build.add(new String[] {"Conductor mass", Fmt.reading(c.conductorMass(), Dimension.MASS)});
        }
        List<String[]> expect = new ArrayList<>();
        expect.add(new String[] {"Inductance L" + (index + 1), Fmt.build(c.inductance(), Dimension.INDUCTANCE)});
        if (Fmt.has(c.apparentInductance())) {
            expect.add(new String[] {"LCR meter at f reads", Fmt.build(c.apparentInductance(), Dimension.INDUCTANCE)});
        }
        if (Fmt.has(c.spread())) {
            expect.add(new String[] {"Spread of the models", Fmt.percent(c.spread())});
        }
        if (Fmt.has(c.resistanceDc())) {
            expect.add(new String[] {"DC resistance", Fmt.reading(c.resistanceDc(), Dimension.RESISTANCE)});
        }
        expect.add(new String[] {"AC resistance at f", Fmt.reading(c.resistanceAc(), Dimension.RESISTANCE)});
        expect.add(new String[] {"Q at f", Fmt.number(c.q(), Fmt.READING)});
        if (Fmt.has(c.selfCapacitance())) {
            expect.add(new String[] {"Self-capacitance", Fmt.reading(c.selfCapacitance(), Dimension.CAPACITANCE)});
        }
        if (Fmt.has(c.selfResonance())) {
            expect.add(new String[] {"Self-resonance (SRF)", Fmt.reading(c.selfResonance(), Dimension.FREQUENCY)});
        }
        if (Fmt.has(c.skinDepth())) {
            expect.add(new String[] {"Skin depth at f", Fmt.reading(c.skinDepth(), Dimension.LENGTH)});
        }
        for (int i = 0; i < Math.max(build.size(), expect.size()); i++) {
            String[] a = i < build.size() ? build.get(i) : new String[] {"", ""};
            String[] b = i < expect.size() ? expect.get(i) : new String[] {"", ""};
            t.row(a[0], a[1], b[0], b[1]);
        }
        flow.table(t);
        List<String> winding = new ArrayList<>();
        winding.add("L" + (index + 1) + " from " + c.inductanceSource() + "; AC resistance from " + c.resistanceModel() + ".");
        if (Fmt.has(c.strandDiameter()) && Fmt.has(c.skinDepth())) {
            winding.add("Litz strands of " + Fmt.reading(c.strandDiameter(), Dimension.LENGTH) + " against a skin depth of "
                    + Fmt.reading(c.skinDepth(), Dimension.LENGTH) + ": keep every strand insulated and the bundle twisted; "
                    + "strip and solder all strands at each end (common practice).");
        }
        if (Fmt.has(c.selfResonance()) && Fmt.has(d.frequency())) {
            winding.add("The operating frequency is " + Fmt.percent(d.frequency() / c.selfResonance())
                    + " of the self-resonance; keep the leads short and apart so the SRF stays where it is.");
        }
        winding.add("Measure L and R at the operating frequency before assembly and compare with the expected column.");
        flow.list(winding, false);
        if (c.models().size() > 1) {
            List<String[]> rows = new ArrayList<>();
            for (ModelValue mv : c.models()) {
                rows.add(modelRow(mv.name(), Fmt.build(mv.value(), Dimension.INDUCTANCE), mv.valid(), mv.source(), mv.note()));
            }
            flow.table(modelTable("Inductance model", rows));
        }
        if (c.resistanceModels().size() > 1) {
            List<String[]> rows = new ArrayList<>();
            for (ResistanceValue rv : c.resistanceModels()) {
                rows.add(modelRow(rv.name(), Fmt.build(rv.resistanceAc(), Dimension.RESISTANCE), rv.valid(), rv.source(), rv.note()));
            }
            flow.table(modelTable("AC resistance model", rows));
        }
    }

    private static String[] modelRow(String name, String value, boolean valid, String source, String note) {
        return new String[] {name, value, valid ? "yes" : "no", source + (note == null || note.isBlank() ? "" : "; " + note)};
    }

    /** Models of one quantity side by side: name, value, verdict, source and note. */
    private static Table modelTable(String what, List<String[]> rows) {
        Table m = new Table(new String[] {what, "Value", "Valid here", "Source and note"},
                new float[] {1.6f, 1.1f, 0.8f, 4.5f}, false, true, false, false);
        for (String[] r : rows) {
            m.row(r);
        }
        return m;
    }

    private static void geometry(Coil c, List<String[]> rows) {
        String outer = c.shape().planar() ? "Outer size" : "Diameter";
        add(rows, outer, c.diameter(), Dimension.LENGTH);
        add(rows, "Inner size", c.innerDiameter(), Dimension.LENGTH);
        add(rows, "Outer width", c.width(), Dimension.LENGTH);
        add(rows, "Outer height", c.height(), Dimension.LENGTH);
        add(rows, "Inner width", c.innerWidth(), Dimension.LENGTH);
        add(rows, "Inner height", c.innerHeight(), Dimension.LENGTH);
        add(rows, "Winding length", c.length(), Dimension.LENGTH);
        add(rows, "Pitch", c.pitch(), Dimension.LENGTH);
        if (c.layers() != null) {
            rows.add(new String[] {"Layers", String.valueOf(c.layers())});
        }
    }

    private static void add(List<String[]> rows, String name, Double v, Dimension d) {
        if (v != null) {
            rows.add(new String[] {name, Fmt.reading(v, d)});
        }
    }

    static String wire(Wire w) {
        String material = w.material() == null ? "copper" : Token.of(w.material());
        String kind = w.kind() == null ? "round" : Token.of(w.kind());
        StringBuilder sb = new StringBuilder();
        switch (kind) {
            case "litz" -> {
                sb.append(material).append(" litz");
                if (w.strands() != null) {
                    sb.append(", ").append(w.strands()).append(" \u00D7 ")
                            .append(w.strandDiameter() == null ? "?" : Fmt.reading(w.strandDiameter(), Dimension.LENGTH))
                            .append(" strands");
                }
            }
            case "tube" -> {
                sb.append(material).append(" tube");
                if (w.diameter() != null) {
                    sb.append(' ').append(Fmt.reading(w.diameter(), Dimension.LENGTH));
                }
                if (w.wall() != null) {
                    sb.append(", wall ").append(Fmt.reading(w.wall(), Dimension.LENGTH));
                }
            }
            case "trace" -> {
                sb.append(material).append(" PCB trace");
                if (w.width() != null) {
                    sb.append(' ').append(Fmt.reading(w.width(), Dimension.LENGTH)).append(" wide");
                }
                if (w.thickness() != null) {
                    sb.append(", ").append(Fmt.reading(w.thickness(), Dimension.LENGTH)).append(" thick");
                }
            }
            default -> {
                sb.append(material).append(" round wire");
                if (w.diameter() != null) {
                    sb.append(' ').append(Fmt.reading(w.diameter(), Dimension.LENGTH));
                }
                if (w.awg() != null) {
                    sb.append(" (AWG ").append(w.awg()).append(')');
                }
            }
        }
        if (w.outerDiameter() != null) {
            sb.append(", ").append(Fmt.reading(w.outerDiameter(), Dimension.LENGTH)).append(" overall");
        }
        return sb.toString();
    }

    private static String backing(Backing b) {
        StringBuilder sb = new StringBuilder(Token.of(b.kind()));
        if (b.muR() != null) {
            sb.append(" \u00B5r ").append(Fmt.number(b.muR(), 3));
        }
        if (b.thickness() != null) {
            sb.append(", ").append(Fmt.reading(b.thickness(), Dimension.LENGTH)).append(" thick");
        }
        if (b.size() != null) {
            sb.append(", ").append(Fmt.reading(b.size(), Dimension.LENGTH)).append(" across");
        }
        if (b.distance() != null) {
            sb.append(", ").append(Fmt.reading(b.distance(), Dimension.LENGTH)).append(" behind the winding");
        }
        return sb.toString();
    }

    private static void banks(PageFlow flow, AnalysisResult r) {
        if (r.banks().isEmpty()) {
            return;
        }
        flow.heading("Capacitor banks: build list");
        for (BankReport b : r.banks()) {
            BankDrawing drawing = new BankDrawing(b);
            flow.ensure(PageFlow.lineHeight(PageFlow.H3) + 8 + drawing.height());
            flow.subheading(b.id() + ": " + Fmt.build(b.capacitance(), Dimension.CAPACITANCE) + " from "
                    + b.partCount() + " parts");
            flow.figure(flow.width(), drawing.height(), false, g -> drawing.paint(g, flow.width()));
            Table t = new Table(new String[] {"Bank", "Value", "Worst part", "Value", "Rating", "Margin"},
                    new float[] {1.5f, 1.4f, 1.6f, 1.2f, 1.2f, 0.9f}, false, true, false, true, true, true);
            t.row("Target C", Fmt.build(b.target(), Dimension.CAPACITANCE), "Peak voltage",
                    Fmt.reading(b.partVoltagePeak(), Dimension.VOLTAGE), Fmt.reading(b.partVoltageRating(), Dimension.VOLTAGE),
                    margin(b.partVoltagePeak(), b.partVoltageRating()));
            t.row("Real C", Fmt.build(b.capacitance(), Dimension.CAPACITANCE), "rms current",
                    Fmt.reading(b.partCurrent(), Dimension.CURRENT), Fmt.reading(b.partCurrentRating(), Dimension.CURRENT),
                    margin(b.partCurrent(), b.partCurrentRating()));
            t.row("Deviation", Fmt.percent(b.capacitance() / b.target() - 1), "dV/dt",
                    Fmt.reading(b.partDvDt(), Dimension.VOLTAGE_RATE),
                    Fmt.has(b.partDvDtRating()) ? Fmt.reading(b.partDvDtRating(), Dimension.VOLTAGE_RATE) : "not given",
                    margin(b.partDvDt(), b.partDvDtRating()));
            t.row("ESR at f", Fmt.reading(b.esr(), Dimension.RESISTANCE), "Loss", Fmt.reading(b.partLoss(), Dimension.POWER), "", "");
            t.row("ESL", Fmt.reading(b.esl(), Dimension.INDUCTANCE), "Part SRF", Fmt.reading(b.partSrf(), Dimension.FREQUENCY), "", "");
            t.row("Stored energy", Fmt.reading(b.storedEnergy(), Dimension.ENERGY), "Dielectric",
                    b.dielectric() + (b.class2() ? " (class 2)" : ""), "", "");
            flow.table(t);
            List<String> items = new ArrayList<>();
            items.add("Arrangement: " + b.seriesCount() + " in series per string, " + b.parallelCount()
                    + " strings in parallel; part: " + b.part() + (b.trim() == null || b.trim().isBlank() ? "" : "; trim: " + b.trim()) + ".");
            items.addAll(b.notes());
            if (!b.alternatives().isEmpty()) {
                items.add("Next best: " + String.join("; ", b.alternatives()));
            }
            flow.list(items, false);
        }
    }

    /** Headroom to a rating as a percentage, or blank when there is no rating. */
    static String margin(double value, double rating) {
        return Fmt.has(value) && Fmt.has(rating) && rating > 0 ? Fmt.percent(1 - value / rating) : "";
    }

    private static void stresses(PageFlow flow, AnalysisResult r) {
        if (r.stresses().isEmpty()) {
            return;
        }
        boolean envelope = r.stresses().stream().anyMatch(s -> Fmt.has(s.worstVoltagePeak()) || Fmt.has(s.worstCurrentRms()));
        flow.heading("Element stresses at the operating point" + (envelope ? " and over the envelope" : ""));
        Table t = envelope
                ? new Table(new String[] {"Element", "V rms", "V peak", "I rms", "Loss", "Worst V peak", "Worst I rms", "Worst at", "Margin"},
                        new float[] {1.6f, 1f, 1f, 1f, 0.9f, 1.05f, 1.05f, 1.9f, 0.85f}, false, true, true, true, true, true, true, false, true)
                : new Table(new String[] {"Element", "V rms", "V peak", "I rms", "I peak", "Loss", "Margin"},
                        new float[] {2.4f, 1f, 1f, 1f, 1f, 1f, 0.9f}, false, true, true, true, true, true, true);
        for (ElementStress s : r.stresses()) {
            String name = s.id() + " " + s.role();
            String loss = Fmt.has(s.loss()) ? Fmt.reading(s.loss(), Dimension.POWER) : "";
            String margin = Fmt.has(s.margin()) ? Fmt.percent(s.margin()) : "";
            if (envelope) {
                t.row(name, Fmt.reading(s.voltageRms(), Dimension.VOLTAGE), Fmt.reading(s.voltagePeak(), Dimension.VOLTAGE),
                        Fmt.reading(s.currentRms(), Dimension.CURRENT), loss,
                        Fmt.has(s.worstVoltagePeak()) ? Fmt.reading(s.worstVoltagePeak(), Dimension.VOLTAGE) : "",
                        Fmt.has(s.worstCurrentRms()) ? Fmt.reading(s.worstCurrentRms(), Dimension.CURRENT) : "",
                        s.worstAt(), margin);
            } else {
                t.row(name, Fmt.reading(s.voltageRms(), Dimension.VOLTAGE), Fmt.reading(s.voltagePeak(), Dimension.VOLTAGE),
                        Fmt.reading(s.currentRms(), Dimension.CURRENT), Fmt.reading(s.currentPeak(), Dimension.CURRENT), loss, margin);
            }
        }
        flow.table(t);
    }

    private static void heater(PageFlow flow, HeaterReport h) {
        flow.heading("Heater: cold and hot operating points");
        HeaterReport.HeaterPoint c = h.cold();
        HeaterReport.HeaterPoint t = h.hot();
        Table tb = new Table(new String[] {"Quantity", "Cold", "Hot"}, new float[] {3f, 1.5f, 1.5f}, false, true, true);
        tb.row("Workpiece temperature", Fmt.reading(c.temperature(), Dimension.TEMPERATURE), Fmt.reading(t.temperature(), Dimension.TEMPERATURE));
        tb.row("Relative permeability used", Fmt.number(c.muR(), Fmt.READING), Fmt.number(t.muR(), Fmt.READING));
        tb.row("Resistivity", Fmt.reading(c.resistivity(), Dimension.RESISTIVITY), Fmt.reading(t.resistivity(), Dimension.RESISTIVITY));
        tb.row("Reference depth", Fmt.reading(c.referenceDepth(), Dimension.LENGTH), Fmt.reading(t.referenceDepth(), Dimension.LENGTH));
        tb.row("Workpiece resistance in the coil", Fmt.reading(c.workResistance(), Dimension.RESISTANCE), Fmt.reading(t.workResistance(), Dimension.RESISTANCE));
        tb.row("Loaded coil inductance", Fmt.build(c.inductance(), Dimension.INDUCTANCE), Fmt.build(t.inductance(), Dimension.INDUCTANCE));
        tb.row("Resonant frequency", Fmt.build(c.resonantFrequency(), Dimension.FREQUENCY), Fmt.build(t.resonantFrequency(), Dimension.FREQUENCY));
        tb.row("Power into the workpiece", Fmt.reading(c.power(), Dimension.POWER), Fmt.reading(t.power(), Dimension.POWER));
        tb.row("Work-coil loss", Fmt.reading(c.coilLoss(), Dimension.POWER), Fmt.reading(t.coilLoss(), Dimension.POWER));
        tb.row("Coil efficiency", Fmt.percent(c.coilEfficiency()), Fmt.percent(t.coilEfficiency()));
        tb.row("Work-coil current", Fmt.reading(c.coilCurrent(), Dimension.CURRENT), Fmt.reading(t.coilCurrent(), Dimension.CURRENT));
        tb.row("Tank capacitor voltage", Fmt.reading(c.capacitorVoltage(), Dimension.VOLTAGE), Fmt.reading(t.capacitorVoltage(), Dimension.VOLTAGE));
        tb.row("Tank capacitor current", Fmt.reading(c.capacitorCurrent(), Dimension.CURRENT), Fmt.reading(t.capacitorCurrent(), Dimension.CURRENT));
        tb.row("Field at the workpiece surface", Fmt.reading(c.surfaceField(), Dimension.FIELD_STRENGTH), Fmt.reading(t.surfaceField(), Dimension.FIELD_STRENGTH));
        flow.table(tb);
        Table more = new Table(new String[] {"Heater", "Value"}, new float[] {3f, 3f}, false, true);
        more.row("Driver frequency range, cold to hot", Fmt.build(h.frequencyMin(), Dimension.FREQUENCY) + " to "
                + Fmt.build(h.frequencyMax(), Dimension.FREQUENCY));
        more.row("Frequencies where the workpiece is several reference depths thick", Fmt.reading(h.adviceMin(), Dimension.FREQUENCY)
                + " to " + Fmt.reading(h.adviceMax(), Dimension.FREQUENCY));
        more.row("Workpiece mass", Fmt.reading(h.workpieceMass(), Dimension.MASS));
        more.row("Heating time, cold to hot (estimate)", Fmt.reading(h.heatingTime(), Dimension.TIME));
        more.row("Coolant flow the work coil needs", Fmt.has(h.coolantFlow()) ? Fmt.reading(h.coolantFlow(), Dimension.VOLUME_FLOW)
                : "none: the coil is not a tube (air-cooled)");
        flow.table(more);
    }
}
