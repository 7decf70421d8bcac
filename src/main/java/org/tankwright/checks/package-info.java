/**
 * Design-rule and safety checks: small, separate rules that run over an analysis result and
 * return findings with a severity, the value, the limit and its source, the element concerned and
 * what to do. {@link org.tankwright.checks.Checks#run} runs them all; every limit table lives in
 * {@link org.tankwright.checks.Limits} with its source; {@code docs/safety.md} describes each rule.
 * Engine: no user-interface imports.
 */
package org.tankwright.checks;
