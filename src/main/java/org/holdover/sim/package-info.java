/**
 * The hourly energy balance over a year and its metrics.
 */
package org.holdover.sim;
