/**
 * DC bus wiring: the conductor tables (NEC and IEC, loaded once from CSV resources whose comment lines
 * name the source), conductor and overcurrent-device selection for two-wire DC circuits, battery terminal
 * voltage during a motor start (and the fixes that would make it hold), and prospective short-circuit
 * current at the battery.
 *
 * <p>Pure functions of their inputs: no I/O other than reading the bundled tables, no console output.
 * SI units inside with the unit in the name; AWG, kcmil, feet and ohm per 1000 ft are converted at the
 * edges by {@link org.holdover.dc.ConductorUnits}. Every intermediate quantity is in the result records so a
 * workbook can show each step; the tables themselves are exposed as {@link org.holdover.dc.ReferenceTable}s
 * so a workbook can embed them and look values up with INDEX/MATCH.
 */
package org.holdover.dc;
