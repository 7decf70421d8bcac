package org.tankwright.checks;

import org.tankwright.analysis.AnalysisResult;
import org.tankwright.analysis.ExposureReport;
import org.tankwright.design.Enums.ExposureSet;
import org.tankwright.design.Enums.Population;
import org.tankwright.design.Safety;
import org.tankwright.units.Dimension;

import java.util.List;

import static org.tankwright.checks.Read.finite;
import static org.tankwright.checks.Read.q;

/** Rules on the magnetic field near the coils (a screening estimate, not a compliance assessment). */
final class ExposureRules {
    private ExposureRules() {
    }

    static ExposureSet set(AnalysisResult r) {
        Safety s = r.design() == null ? null : r.design().safety();
        return s == null || s.exposure() == null ? ExposureSet.ICNIRP_2010 : s.exposure();
    }

    static Population population(AnalysisResult r) {
        Safety s = r.design() == null ? null : r.design().safety();
        return s == null || s.population() == null ? Population.PUBLIC : s.population();
    }

    /** An exposure report with a usable estimate, or null. */
    static ExposureReport estimate(AnalysisResult r) {
        ExposureReport e = r.exposure();
        return e == null || !finite(e.bRms()) || !finite(e.frequency()) || e.frequency() <= 0 ? null : e;
    }

    private static String microtesla(double t) {
        return q(t, Dimension.FLUX_DENSITY);
    }

    /** TW-F01: flux density at the screening distance against the chosen reference level. */
    static final class ReferenceLevel extends BaseRule {
        ReferenceLevel() {
            super("TW-F01", "magnetic field at the screening distance",
                    "ICNIRP reference levels (2010 nerve stimulation, 2020 heating above 100 kHz, or 1998), as chosen");
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            ExposureReport e = estimate(r);
            if (e == null) {
                return;
            }
            ExposureSet set = set(r);
            Population pop = population(r);
            Limits.ReferenceLevel level = Limits.magneticReference(set, pop, e.frequency());
            if (!finite(level.tesla())) {
                add(out, Severity.NOTICE, e.bRms(), Double.NaN, "T", "$.safety.exposure",
                        "No reference level of the chosen set covers " + q(e.frequency(), Dimension.FREQUENCY)
                                + "; the field was not screened.",
                        "Choose a reference-level set that covers the operating frequency.");
                return;
            }
            if (e.bRms() <= level.tesla()) {
                return;
            }
            Limits.ReferenceLevel pub = Limits.magneticReference(set, Population.PUBLIC, e.frequency());
            Limits.ReferenceLevel wrk = Limits.magneticReference(set, Population.WORKER, e.frequency());
            double safe = e.distance() * Math.cbrt(e.bRms() / level.tesla()); // far field of a dipole falls as 1/d³
            out.add(Finding.of(id(), Severity.WARNING, e.bRms(), level.tesla(), "T", level.source(),
                    "$.safety.field_distance_m",
                    "Screening estimate: about " + microtesla(e.bRms()) + " rms at " + q(e.distance(), Dimension.LENGTH)
                            + " from the coils (" + e.method() + "), above the " + (pop == Population.WORKER ? "occupational" : "general-public")
                            + " reference level of " + microtesla(level.tesla()) + " at " + q(e.frequency(), Dimension.FREQUENCY)
                            + " (general public " + microtesla(pub.tesla()) + ", workers " + microtesla(wrk.tesla())
                            + "). A reference level is a screening value: exceeding it calls for an assessment against "
                            + "the basic restrictions, it does not prove harm.",
                    "Keep people farther than about " + q(safe, Dimension.LENGTH) + " from the coils while it runs "
                            + "(the far field falls as 1/d³), reduce the ampere-turns or add shielding, and measure the "
                            + "field with a calibrated meter before use."));
        }
    }

    /** TW-F02: the field at the screening distance exceeds the general-public level: implanted devices. */
    static final class ImplantedDevices extends BaseRule {
        ImplantedDevices() {
            super("TW-F02", "implanted medical devices",
                    "EN 50527-1 (implants are presumed unaffected below the general-public reference levels; from memory)");
        }

        @Override
        public void check(AnalysisResult r, List<Finding> out) {
            ExposureReport e = estimate(r);
            if (e == null) {
                return;
            }
            Limits.ReferenceLevel pub = Limits.magneticReference(set(r), Population.PUBLIC, e.frequency());
            if (!finite(pub.tesla()) || e.bRms() <= pub.tesla()) {
                return;
            }
            add(out, Severity.CAUTION, e.bRms(), pub.tesla(), "T", "$.safety.field_distance_m",
                    "At " + q(e.distance(), Dimension.LENGTH) + " the field (about " + microtesla(e.bRms())
                            + ") exceeds the general-public reference level (" + microtesla(pub.tesla()) + "), below "
                            + "which active implants (pacemakers, defibrillators, neurostimulators, insulin pumps) are "
                            + "presumed unaffected. Closer to the coils the field is far higher.",
                    "Mark the area, and keep people with active implanted medical devices away from the running coils; "
                            + "they should follow their implant maker's and physician's distance advice.");
        }
    }
}
