package org.tankwright.circuit;

/**
 * The stress on one element at an operating point: rms and peak voltage and current, the loss in
 * its series resistance and any DC bias (peak voltage = √2·rms + |bias|).
 */
public record ElementStress(String name, double vRms, double vPeak, double iRms, double iPeak, double loss,
                            double dcBias) {
}
