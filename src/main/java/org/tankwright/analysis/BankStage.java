package org.tankwright.analysis;

import org.tankwright.capacitors.BankRequest;
import org.tankwright.capacitors.BankSearchResult;
import org.tankwright.capacitors.BankStress;
import org.tankwright.capacitors.BankSynthesis;
import org.tankwright.capacitors.CapacitorBank;
import org.tankwright.capacitors.CapacitorPart;
import org.tankwright.capacitors.Catalogue;
import org.tankwright.capacitors.CatalogueReader;
import org.tankwright.capacitors.PartDuty;
import org.tankwright.design.CapacitorSettings;
import org.tankwright.design.Design;
import org.tankwright.units.Dimension;
import org.tankwright.units.Quantities;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/** Real capacitor banks for the tuned capacitors, chosen from a parts catalogue for the stress the network predicts. */
final class BankStage {
    private static final Catalogue DEMO = CatalogueReader.demo();

    private BankStage() {
    }

    /** The synthesised bank and its report, or a report-less note when no bank satisfies the limits. */
    record Chosen(CapacitorBank bank, BankReport report, String note) {
    }

    static boolean enabled(Design d) {
        CapacitorSettings s = d.capacitors();
        return s == null || s.synthesize() == null || s.synthesize();
    }

    static Catalogue catalogue(Design d) {
        CapacitorSettings s = d.capacitors();
        if (s == null || s.catalogue() == null) {
            return DEMO;
        }
        try {
            return CatalogueReader.read(Path.of(s.catalogue()));
        } catch (IOException | IllegalArgumentException e) {
            throw new AnalysisException("$.capacitors.catalogue: " + s.catalogue() + " cannot be read: " + e.getMessage(), true);
        }
    }

    static double maxDeviation(Design d) {
        return d.capacitors() == null ? 0.02 : d.capacitors().maxDeviation();
    }

    /**
     * Chooses a bank for capacitor {@code id} of capacitance {@code target} that survives the given rms stress
     * (the worst over the envelope when known); the report gives each part's duty at the operating point,
     * whose rms voltage and current are {@code vNominal} and {@code iNominal}, so that the checks can scale it
     * to the envelope's worst point themselves.
     */
    static Chosen choose(String id, double target, double vRms, double iRms, double vNominal, double iNominal,
                         double dcBias, double f, Design d) {
        BankStress stress = BankStress.sinusoidal(vRms, iRms, dcBias, f);
        BankRequest req = BankRequest.of(target, maxDeviation(d), stress);
        // Tank capacitors carry the full circulating current: only dielectrics suited to resonant tanks
        // (polypropylene film, C0G/NP0, mica) are considered (common practice).
        List<CapacitorPart> suited = catalogue(d).parts().stream().filter(p -> p.dielectric().suitsResonantTank()).toList();
        BankSearchResult res = BankSynthesis.search(req, suited);
        if (res.banks().isEmpty()) {
            return new Chosen(null, null, id + ": no bank of the catalogue's parts reaches "
                    + Quantities.format(target, Dimension.CAPACITANCE, 4) + " within the limits (" + res.bounds()
                    + "); " + String.join("; ", res.verdicts()));
        }
        CapacitorBank b = res.best();
        PartDuty w = b.worstDuty();
        double kv = vRms > 0 ? Math.min(1, vNominal / vRms) : 1;
        double ki = iRms > 0 ? Math.min(1, iNominal / iRms) : 1;
        CapacitorPart part = b.layout().part();
        List<String> alternatives = new ArrayList<>();
        for (int i = 1; i < res.banks().size() && i <= 3; i++) {
            String why = i < res.verdicts().size() ? res.verdicts().get(i) : "";
            alternatives.add(res.banks().get(i).layout().describe() + (why.isEmpty() ? "" : ": " + why));
        }
        String partText = part.id() + " — " + part.description();
        String trim = b.layout().trim() == null ? "" : b.layout().trim().id() + " — " + b.layout().trim().description()
                + " (" + b.layout().trimPosition().key() + ")";
        BankReport report = new BankReport(id, target, b.capacitance(), b.esr(), b.esl(), b.layout().series(),
                b.layout().parallel(), partText, trim, b.partCount(), part.dielectric().description(),
                part.dielectric().isClass2(), w.dcVoltage() + (w.peakVoltage() - w.dcVoltage()) * kv,
                finiteOrNaN(w.peakVoltageLimit()), w.currentRms() * ki, finiteOrNaN(w.currentLimit()),
                w.dissipation() * ki * ki, w.srf(), w.dvdt() * kv, finiteOrNaN(w.dvdtLimit()), b.storedEnergy() * kv * kv,
                List.copyOf(alternatives),
                List.copyOf(b.warnings()));
        return new Chosen(b, report, null);
    }

    /** A limit the part does not state is infinite in the capacitor model and NaN (unknown) in the report. */
    private static double finiteOrNaN(double v) {
        return Double.isFinite(v) ? v : Double.NaN;
    }
}
