package org.tankwright.capacitors;

import org.tankwright.provenance.Provenance;
import java.util.List;

/**
 * A capacitor bank evaluated at its stress. {@code capacitance}, {@code esr} and {@code esl} form
 * the series R-L-C that represents the bank exactly at the operating frequency: feed them back
 * into the network.
 *
 * @param layout           what goes where
 * @param capacitance      nominal capacitance, F
 * @param deviation        capacitance/target − 1
 * @param esr              equivalent series resistance at the operating frequency, Ω
 * @param esl              equivalent series inductance, H
 * @param srf              self-resonant frequency of the equivalent R-L-C, Hz
 * @param tolerance        worst-case capacitance tolerance of the bank, fraction
 * @param tempcoPpmPerK    temperature coefficient of the bank's capacitance, ppm/K
 * @param voltageRms       AC rms across the bank, V (the worse of the given and the one the current implies)
 * @param currentRms       rms current through the bank, A (likewise)
 * @param dissipation      total loss I²·ESR, W
 * @param storedEnergy     ½·C·(DC + AC peak)², J
 * @param price            total price, or null when a part has none
 * @param main             duty of the worst main part
 * @param trim             duty of the trim part, or null
 * @param warnings         flags (class-2 dielectric, balancing resistors, inconsistent stress...)
 * @param provenance       model, source and validity
 */
public record CapacitorBank(BankLayout layout, double capacitance, double deviation, double esr, double esl,
                            double srf, double tolerance, double tempcoPpmPerK, double voltageRms,
                            double currentRms, double dissipation, double storedEnergy, Double price,
                            PartDuty main, PartDuty trim, List<String> warnings, Provenance provenance) {

    public int partCount() {
        return layout.partCount();
    }

    /** The duty with the least margin (main or trim). */
    public PartDuty worstDuty() {
        return trim != null && trim.worstMargin() < main.worstMargin() ? trim : main;
    }

    /**
     * The bank as a tolerance-study parameter: uniform within its tolerance, drifting with its
     * tempco, the tempco scattered as the main part's dielectric does.
     */
    public org.tankwright.tolerance.Parameter toleranceParameter(String name) {
        return org.tankwright.tolerance.Parameter.uniform(name, capacitance, tolerance)
                .withTempcoPpm(tempcoPpmPerK, layout.part().dielectric().tempcoSpreadPpmPerK());
    }

    /** True when every part is within its derated limits. */
    public boolean feasible() {
        return main.withinLimits() && (trim == null || trim.withinLimits());
    }
}
