/**
 * Units: SI constants, the one parser of engineering quantities typed by users and the one formatter that turns numbers into text. Depends on nothing of ours.
 */
package org.tankwright.units;
