/**
 * The window's document model: open designs with their undo lists and latest results, the
 * workspace of open designs, and field paths into the design records. Swing-free except for
 * publishing on the event thread.
 */
package org.tankwright.ui.model;
