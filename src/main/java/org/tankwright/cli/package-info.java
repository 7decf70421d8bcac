/**
 * The command-line face (picocli): one class per command, exit codes 0 success, 2 usage error, 3 invalid input file, 4 computation refused, 5 danger found by the checks.
 */
package org.tankwright.cli;
