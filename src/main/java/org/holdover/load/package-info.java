/**
 * Appliances and motor loads, hourly load profiles (8,760 or 8,784 values in local standard time), interval-data import, load analysis and motor-starting surge.
 */
package org.holdover.load;
