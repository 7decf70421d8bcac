/**
 * The workbench window (Swing, FlatLaf): panes that show the AnalysisResult and editors that make new Design values. A face: no physics here.
 */
package org.tankwright.ui;
