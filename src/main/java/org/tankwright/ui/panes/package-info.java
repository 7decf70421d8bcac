/**
 * The workbench's dockable panes (designs tree, editor area, key figures, component stress, checks, plots) and where they sit by default.
 */
package org.tankwright.ui.panes;
