/**
 * Editing widgets: the unit-aware quantity field and the section forms built from a design's fields.
 */
package org.tankwright.ui.fields;
