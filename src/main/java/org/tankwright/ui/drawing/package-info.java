/**
 * The to-scale coil drawing (top and side views) and the geometry it is given.
 */
package org.tankwright.ui.drawing;
