package org.tankwright.tolerance;

/**
 * One drawn build: its index in the study, temperature, parameter values and outcomes (in the
 * study's order).
 */
public record Sample(int index, double temperatureC, double[] parameters, double[] outcomes) {
}
