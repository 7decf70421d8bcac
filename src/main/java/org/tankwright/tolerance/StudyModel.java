package org.tankwright.tolerance;

/**
 * The model a study samples: parameter values in, outcomes out. Arrays follow the order the
 * study declares; the model writes every outcome and must not keep the arrays. Called from one
 * thread; it should not allocate (it runs for every sample).
 */
@FunctionalInterface
public interface StudyModel {
    void evaluate(double[] parameters, double[] outcomes);
}
