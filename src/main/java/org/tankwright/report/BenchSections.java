package org.tankwright.report;

import org.tankwright.capacitors.Retune;

import org.jfree.chart.JFreeChart;
import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.CoilReport;
import org.tankwright.analysis.EnvelopeReport;
import org.tankwright.analysis.ExposureReport;
import org.tankwright.analysis.NetworkReport;
import org.tankwright.analysis.WorstCase;
import org.tankwright.design.Tolerances;
import org.tankwright.report.BenchReadings.Plan;
import org.tankwright.report.BenchReadings.Reading;
import org.tankwright.units.Dimension;

import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;

/** The bench half of the sheet: expected readings, trip levels, the procedure, the re-tune table, plots and the field estimate. */
final class BenchSections {
    /** Measured-to-design frequency ratios the re-tune table lists. */
    static final double[] RETUNE_RATIOS = {0.90, 0.95, 0.97, 0.99, 1.01, 1.03, 1.05, 1.10};

    /** How many unreachable envelope points the sheet names (the JSON export has them all). */
    static final int UNREACHABLE_SHOWN = 3;

    private BenchSections() {
    }

    static void all(PageFlow flow, AnalysisResult r) {
        if (r.network() != null) {
            Plan plan = BenchReadings.of(r);
            readings(flow, r, plan);
            trips(flow, r.envelope());
            procedure(flow, r, plan);
            retune(flow, r);
        }
        plots(flow, r);
        exposure(flow, r.exposure());
    }

    private static void readings(PageFlow flow, AnalysisResult r, Plan p) {
        flow.heading("Expected bench readings");
        flow.paragraph("Bands: resonant frequency \u00B1" + Fmt.percent(p.frequencyLimit()) + "; power \u00B1"
                + Fmt.percent(p.powerLimit()) + "; voltages, currents and efficiency \u00B1" + Fmt.percent(p.powerLimit() / 2)
                + " (half the power band, since power goes with the square). These are the design's acceptance limits. "
                + "Fill in Measured and Pass/Fail at the bench.");
        String drive = p.currentDriven()
                ? Fmt.reading(p.drive(), Dimension.CURRENT) + " rms of drive current (a sine generator through a series "
                        + "resistor much larger than the tank's resonant impedance)"
                : Fmt.reading(p.drive(), Dimension.VOLTAGE) + " rms sine at the input, from a source that can drive "
                        + (Fmt.has(p.inputImpedance()) ? Fmt.reading(p.inputImpedance(), Dimension.RESISTANCE) : "the input impedance")
                        + " (a power amplifier, or the bridge on a reduced bus)";
        flow.subheading("Step 1: low voltage" + (Fmt.has(p.dummyLoad()) ? " into a dummy load" : ""));
        StringBuilder sb = new StringBuilder("Drive: ").append(drive).append(". ");
        if (Fmt.has(p.dummyLoad())) {
            sb.append("Load: a non-inductive resistor of ").append(Fmt.reading(p.dummyLoad(), Dimension.RESISTANCE))
                    .append(" across the secondary terminals in place of the rectifier and load (the AC equivalent of the load), rated for at least ")
                    .append(Fmt.reading(p.dummyRating() * p.scale() * p.scale() * 2, Dimension.POWER))
                    .append(" at this step and ").append(Fmt.reading(p.dummyRating(), Dimension.POWER)).append(" at full power. ");
        } else if (p.heater()) {
            sb.append("Load: the workpiece, cold, in its place in the work coil. ");
        }
        sb.append("The network is linear, so every voltage and current here is the full-power value times ")
                .append(Fmt.number(p.scale(), Fmt.READING))
                .append(" (the ratio of the drive levels) and every power times its square; frequency and efficiency stay the same. "
                        + "This step keeps every part below ")
                .append(Fmt.reading(BenchReadings.LOW_STEP_PEAK, Dimension.VOLTAGE)).append(" peak.");
        flow.paragraph(sb.toString());
        flow.table(readingTable(p.low(), false));
        flow.subheading("Step 2: full power" + (p.heater() ? ", workpiece cold and then hot" : ""));
        flow.table(readingTable(p.full(), p.heater()));
    }

    private static Table readingTable(List<Reading> rows, boolean hot) {
        Table t = hot
                ? new Table(new String[] {"Reading", "Expected cold", "Expected hot", "Band", "Measured", "Pass/Fail"},
                        new float[] {3f, 1.25f, 1.25f, 0.8f, 1.25f, 0.9f}, false, true, true, true, false, false)
                : new Table(new String[] {"Reading", "Expected", "Band (min to max)", "Measured", "Pass/Fail"},
                        new float[] {3f, 1.2f, 2.2f, 1.3f, 0.9f}, false, true, true, false, false);
        for (Reading x : rows) {
            String exp = format(x.expected(), x.dim());
            if (hot) {
                t.row(x.quantity(), exp, Fmt.has(x.expectedHot()) ? format(x.expectedHot(), x.dim()) : "",
                        "\u00B1" + Fmt.percent(x.band()), "", "");
            } else {
                t.row(x.quantity(), exp, format(x.min(x.expected()), x.dim()) + " to " + format(x.max(x.expected()), x.dim()), "", "");
            }
        }
        return t;
    }

    static String format(double v, Dimension d) {
        return d == Dimension.FRACTION ? Fmt.percent(v) : d == Dimension.FREQUENCY ? Fmt.build(v, d) : Fmt.reading(v, d);
    }

    private static void trips(PageFlow flow, EnvelopeReport e) {
        if (e == null) {
            return;
        }
        flow.heading("Trip levels and the worst of the envelope");
        Table t = new Table(new String[] {"Protection", "Set at"}, new float[] {4f, 1.5f}, false, true);
        addRow(t, "Primary over-current trip (rms)", e.tripCurrent(), Dimension.CURRENT);
        addRow(t, "Output over-voltage trip", e.tripVoltage(), Dimension.VOLTAGE);
        addRow(t, "Primary current with the receiver removed", e.removedReceiverCurrent(), Dimension.CURRENT);
        addRow(t, "Output voltage with the load open", e.openLoadVoltage(), Dimension.VOLTAGE);
        if (!t.isEmpty()) {
            flow.table(t);
        }
        if (!e.worst().isEmpty()) {
            Table w = new Table(new String[] {"Worst over " + e.points() + " envelope points", "Value", "Where"},
                    new float[] {2.6f, 1.2f, 3f}, false, true, false);
            for (WorstCase c : e.worst()) {
                w.row(c.quantity(), Fmt.reading(c.value(), c.dim()), c.at());
            }
            flow.table(w);
        }
        List<String> u = e.unreachable();
        if (!u.isEmpty()) {
            flow.paragraph("The output target cannot be reached at " + u.size() + " envelope point" + (u.size() == 1 ? "" : "s")
                    + ", for example: " + String.join("; ", u.subList(0, Math.min(UNREACHABLE_SHOWN, u.size())))
                    + (u.size() > UNREACHABLE_SHOWN ? "; and " + (u.size() - UNREACHABLE_SHOWN) + " more." : "."));
        }
    }

    private static void addRow(Table t, String what, double v, Dimension d) {
        if (Fmt.has(v)) {
            t.row(what, Fmt.reading(v, d));
        }
    }

    private static void procedure(PageFlow flow, AnalysisResult r, Plan p) {
        NetworkReport n = r.network();
        Tolerances tol = BenchReadings.tolerances(r);
        flow.heading("Bench procedure");
        List<String> steps = new ArrayList<>();
        StringBuilder lc = new StringBuilder("Before assembly, measure each coil and each capacitor bank with an LCR meter "
                + "at or near " + Fmt.build(n.frequency(), Dimension.FREQUENCY) + ": ");
        for (int i = 0; i < r.coils().size(); i++) {
            CoilReport c = r.coils().get(i);
            double meter = Fmt.has(c.apparentInductance()) ? c.apparentInductance() : c.inductance();
            lc.append("L").append(i + 1).append(" should read ").append(Fmt.build(meter, Dimension.INDUCTANCE))
                    .append(" \u00B1").append(Fmt.percent(tol.inductance())).append(" with R about ")
                    .append(Fmt.reading(c.resistanceAc(), Dimension.RESISTANCE)).append("; ");
        }
        TunedNetwork net = TunedNetwork.of(r);
        for (String id : new String[] {"C1", "C2"}) {
            TunedNetwork.Part c = net.part(id);
            if (c != null) {
                lc.append(id).append(" should read ").append(Fmt.build(c.value(), Dimension.CAPACITANCE)).append(" \u00B1")
                        .append(Fmt.percent(tol.capacitance())).append("; ");
            }
        }
        lc.setLength(lc.length() - 2);
        steps.add(lc.append(". Set aside parts outside their band (common practice).").toString());
        if (net.isLink()) {
            double l1 = net.part("L1").value();
            double k = net.coupling();
            steps.add("Measure the coupling with both coils in their nominal places: read L1 with the secondary's terminals "
                    + "open (L1,open) and shorted (L1,short); k = \u221A(1 \u2212 L1,short/L1,open). Expect k = "
                    + Fmt.number(k, Fmt.BUILD) + ", that is L1,short about " + Fmt.build(l1 * (1 - k * k), Dimension.INDUCTANCE)
                    + " for L1,open " + Fmt.build(l1, Dimension.INDUCTANCE) + " (common practice).");
        }
        steps.add("Assemble the network as drawn. With the low-voltage drive of step 1 from a signal source, sweep the "
                + "frequency slowly around " + Fmt.build(n.frequency(), Dimension.FREQUENCY) + " and find where the input "
                + "current and voltage are in phase; expect " + Fmt.build(BenchReadings.resonance(n), Dimension.FREQUENCY) + ". "
                + (!net.isLink() ? "" : n.bifurcated() ? "This design is over-coupled: expect split peaks (zero phase at several frequencies) and "
                        + "do not chase the outer ones. " : "If the coils are closer than designed, the peak splits in two "
                        + "(over-coupling): move them apart and sweep again. ")
                + "If the frequency is off, use the re-tune table before going on.");
        steps.add("Check every reading of step 1 against its band before raising the drive.");
        steps.add("Ramp up in steps (a quarter, half, three quarters, full) while watching the capacitor voltage"
                + (r.stresses().stream().anyMatch(s -> s.id().equals("C1")) ? " (C1 reaches "
                        + Fmt.reading(r.stresses().stream().filter(s -> s.id().equals("C1")).findFirst().get().voltageRms(),
                                Dimension.VOLTAGE) + " rms at full power)" : "")
                + " and the temperature of the capacitors and coils; hold each step until temperatures settle, and stop "
                + "at any reading outside its band or at a trip level.");
        steps.add("At full power fill in the step 2 table" + (r.heater() != null ? ", first with the workpiece cold and again "
                + "when it is hot (the frequency moves as the steel passes its Curie point)" : "") + ".");
        flow.list(steps, true);
    }

    private static void retune(PageFlow flow, AnalysisResult r) {
        TunedNetwork net = TunedNetwork.of(r);
        List<String> ids = new ArrayList<>();
        for (String id : new String[] {"C1", "C2"}) {
            if (net.part(id) != null && net.part(id).value() > 0) {
                ids.add(id);
            }
        }
        if (ids.isEmpty()) {
            return;
        }
        double f = net.frequency();
        flow.heading("Re-tune table");
        flow.paragraph("Measure each tank's own resonance at low voltage" + (net.isLink()
                ? " with the other coil in place and its terminals open" : "") + ". A tank that resonates at f_meas "
                + "with capacitance C needs C_needed = C\u00B7(f_meas/f_design)\u00B2 to resonate at f_design = "
                + Fmt.build(f, Dimension.FREQUENCY) + ". Add the difference in parallel; to lower C, remove parts or add "
                + "the series part shown.");
        List<String> headers = new ArrayList<>(List.of("Measured frequency"));
        List<Float> widths = new ArrayList<>(List.of(1.3f));
        for (String id : ids) {
            headers.add(id + " needed");
            headers.add(id + " change");
            widths.add(1.1f);
            widths.add(2.4f);
        }
        float[] w = new float[widths.size()];
        boolean[] numeric = new boolean[widths.size()];
        for (int i = 0; i < w.length; i++) {
            w[i] = widths.get(i);
            numeric[i] = i == 0 || i % 2 == 1;
        }
        Table t = new Table(headers.toArray(String[]::new), w, numeric);
        for (double ratio : RETUNE_RATIOS) {
            double fm = f * ratio;
            List<String> row = new ArrayList<>();
            row.add(Fmt.build(fm, Dimension.FREQUENCY));
            for (String id : ids) {
                double c = net.part(id).value();
                Retune.Result rt = Retune.fromMeasuredFrequency(f, c, fm, List.of());
                double needed = rt.capacitanceNeeded();
                row.add(Fmt.build(needed, Dimension.CAPACITANCE));
                row.add(needed >= c ? "add " + Fmt.reading(needed - c, Dimension.CAPACITANCE) + " in parallel"
                        : "remove " + Fmt.reading(c - needed, Dimension.CAPACITANCE) + ", or add "
                                + Fmt.reading(rt.seriesCapacitance(), Dimension.CAPACITANCE) + " in series");
            }
            t.row(row.toArray(String[]::new));
        }
        flow.table(t);
    }

    private static void plots(PageFlow flow, AnalysisResult r) {
        List<JFreeChart> charts = SheetPlots.charts(r);
        if (charts.isEmpty()) {
            return;
        }
        float w = flow.width();
        float h = Math.min(210f, w * 0.42f);
        flow.ensure(h + 40);
        flow.heading("Plots");
        for (JFreeChart c : charts) {
            flow.figure(w, h, true, g -> c.draw(g, new Rectangle2D.Double(0, 0, w, h)));
        }
    }

    private static void exposure(PageFlow flow, ExposureReport e) {
        if (e == null) {
            return;
        }
        flow.heading("Field near the coils (screening estimate)");
        flow.paragraph("Flux density " + Fmt.reading(e.bRms(), Dimension.FLUX_DENSITY) + " rms at "
                + Fmt.reading(e.distance(), Dimension.LENGTH) + " from the coils' centre at "
                + Fmt.build(e.frequency(), Dimension.FREQUENCY) + " (" + e.method() + "). A screening estimate, not a "
                + "measurement: compare with the reference levels that apply where the device is used, and measure.");
    }
}
