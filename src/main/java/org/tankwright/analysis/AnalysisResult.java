package org.tankwright.analysis;

import org.tankwright.checks.Finding;
import org.tankwright.design.Design;

import java.util.List;

/**
 * Everything one run of the pipeline found for one design, immutable. Every face (window,
 * command line, sheet) shows this and computes nothing of its own. Sections that do not apply
 * to the design's kind are null (coupling for a tank, heater for a link).
 *
 * @param design       the design that was analysed
 * @param coils        the primary (tank, work) coil first, then the secondary
 * @param coupling     coupling of a link, else null
 * @param network      the tuned network at its operating point
 * @param stresses     one row per element
 * @param envelope     the operating envelope, or null when the design sets none
 * @param banks        capacitor banks chosen from real parts (may be empty)
 * @param heater       a heater's cold and hot points, else null
 * @param exposure     the field-exposure screening estimate, or null
 * @param findings     design-rule and safety findings, most severe first
 * @param notes        pipeline notes (what was refused or approximated)
 * @param computeNanos how long the analysis took
 */
public record AnalysisResult(Design design, List<CoilReport> coils, CouplingReport coupling, NetworkReport network,
                             List<ElementStress> stresses, EnvelopeReport envelope, List<BankReport> banks,
                             HeaterReport heater, ExposureReport exposure, List<Finding> findings,
                             List<String> notes, long computeNanos) {
}
