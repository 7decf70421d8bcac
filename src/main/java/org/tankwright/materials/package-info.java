/**
 * Materials: conductor metals (copper per IEC 60028, aluminium per IEC 60889) with resistivity
 * against temperature, wire sizes (AWG per ASTM B258) and the conductor kinds a coil is wound from
 * (solid round wire, litz, tube, PCB trace). Values only; no model of a coil lives here.
 */
package org.tankwright.materials;
