/**
 * Design-rule and safety checks: small, separate rules that run over an analysis result and
 * return findings with a severity, the value, the limit and its source, the element concerned and
 * what to do. Engine: no user-interface imports.
 */
package org.tankwright.checks;
