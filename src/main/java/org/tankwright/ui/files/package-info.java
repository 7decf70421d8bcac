/**
 * Design files in the window: open, save, recent files, autosave and recovery.
 */
package org.tankwright.ui.files;
