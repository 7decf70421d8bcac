/**
 * Provenance: where an engine's number comes from (model, published source, validity verdict and
 * notes), one type for every engine package. Depends on nothing of ours.
 */
package org.tankwright.provenance;
