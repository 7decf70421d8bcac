/**
 * A generic Monte Carlo tolerance study: named parameters with distributions (uniform within
 * tolerance, normal with tolerance = 3σ) and temperature drift, a model from parameter values
 * to named outcomes, and the outcome distributions, yields against limits, worst samples and
 * tolerance corners. Seeded (Commons Math generators), cancelable, with progress. Knows
 * nothing of capacitors or coils: the caller supplies the model.
 */
package org.tankwright.tolerance;
