/**
 * Capacitors for resonant tanks: the part model (series R-L-C with tan δ carried over frequency,
 * voltage, current, dissipation and dV/dt ratings), IEC 60063 E-series values, parts catalogues
 * (JSON and CSV), derating rules as data, bank synthesis (n in series × m in parallel plus one
 * trim part, searched exhaustively within bounds) and the bench re-tune arithmetic.
 */
package org.tankwright.capacitors;
