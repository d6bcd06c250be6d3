/**
 * The hourly energy balance over a year and its metrics.
 *
 * <p>Entry points: {@link org.holdover.sim.YearSimulation} (the balance, with its per-hour equations in
 * closed form so the workbook can reproduce them as formulas), {@link org.holdover.sim.OutageWindows}
 * (backup-mode outage placement), {@link org.holdover.sim.GeneratorSizing}, {@link org.holdover.sim.Rainflow}
 * and {@link org.holdover.sim.CycleLifeCurve} (battery wear). Inputs are SI records; results are immutable
 * records. The package does no I/O.
 */
package org.holdover.sim;
