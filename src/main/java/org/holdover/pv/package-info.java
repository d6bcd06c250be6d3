/**
 * PV modules and arrays, cell temperature, string voltage checks, charge controllers and array sizing.
 *
 * <ul>
 *   <li>{@link org.holdover.pv.PvModule}, {@link org.holdover.pv.PvArray}, {@link org.holdover.pv.DcLosses},
 *       {@link org.holdover.pv.ArrayDcSeries}: hourly DC power with the NOCT cell temperature.</li>
 *   <li>{@link org.holdover.pv.Nec690}, {@link org.holdover.pv.StringWindow}, {@link org.holdover.pv.ArrayChecks}:
 *       NEC 690.7 voltage and 690.8 current rules, each result a {@link org.holdover.pv.Check} with its margin.</li>
 *   <li>{@link org.holdover.pv.ControllerSimulation}: MPPT clipping and PWM loss hour by hour.</li>
 *   <li>{@link org.holdover.pv.WorstMonthSizing}, {@link org.holdover.pv.BackupRefillSizing},
 *       {@link org.holdover.pv.TiltSearch}, {@link org.holdover.pv.ArrayChooser}: how big, at which tilt,
 *       wired how.</li>
 * </ul>
 */
package org.holdover.pv;
