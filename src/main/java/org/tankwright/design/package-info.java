/**
 * The design document: immutable records of a design (coils, placement, compensation, source, load, capacitor banks, heater workpiece, studies), read from and written to our JSON format with validation, migration of older versions and atomic saving. Engine: no user-interface imports.
 */
package org.tankwright.design;
