package org.tankwright.analysis;

import java.util.List;

/**
 * A capacitor bank chosen from real parts for one tuned capacitor.
 *
 * @param id                  which capacitor ({@code C1}, {@code C2})
 * @param target              the capacitance the network asked for, F
 * @param capacitance         the bank's real capacitance, F
 * @param esr                 the bank's ESR at the operating frequency, Ω
 * @param esl                 the bank's ESL, H
 * @param seriesCount         parts in series per string
 * @param parallelCount       strings in parallel
 * @param part                the repeated part, in words (value, dielectric, ratings)
 * @param trim                the trim part, in words, or empty
 * @param partCount           total number of parts
 * @param dielectric          the part's dielectric
 * @param class2              whether the dielectric is a class-2 ceramic
 * @param partVoltagePeak     worst part's peak voltage (AC and DC bias), V
 * @param partVoltageRating   the part's derated voltage rating, V (peak)
 * @param partCurrent         worst part's rms current (with unequal sharing), A
 * @param partCurrentRating   the part's derated rms current rating, A
 * @param partLoss            worst part's dissipation, W
 * @param partSrf             the part's self-resonant frequency, Hz
 * @param partDvDt            worst part's dV/dt, V/s
 * @param partDvDtRating      the part's dV/dt rating, V/s (NaN when not given)
 * @param storedEnergy        energy stored in the bank at peak voltage, J
 * @param alternatives        the next best banks and why each loses
 * @param notes               notes (derating rules, sharing)
 */
public record BankReport(String id, double target, double capacitance, double esr, double esl, int seriesCount,
                         int parallelCount, String part, String trim, int partCount, String dielectric,
                         boolean class2, double partVoltagePeak, double partVoltageRating, double partCurrent,
                         double partCurrentRating, double partLoss, double partSrf, double partDvDt,
                         double partDvDtRating, double storedEnergy, List<String> alternatives, List<String> notes) {
}
