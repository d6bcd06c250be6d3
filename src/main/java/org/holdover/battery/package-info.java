/**
 * Battery chemistries, modules and banks (series x parallel), usable capacity (depth of discharge, temperature, rate, aging), terminal voltage and cycle life.
 */
package org.holdover.battery;
