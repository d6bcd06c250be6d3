/**
 * PV modules and arrays, cell temperature, string voltage checks and charge controllers.
 */
package org.holdover.pv;
