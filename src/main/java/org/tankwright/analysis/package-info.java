/**
 * The one analysis pipeline: a Design goes in, one immutable AnalysisResult comes out (coils, coupling, network, tuning, stresses, checks). Every face shows that result and computes no physics of its own.
 */
package org.tankwright.analysis;
