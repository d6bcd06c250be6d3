/**
 * Inverter ratings, the loss model and efficiency curve, surge capability and the DC input window.
 */
package org.holdover.inverter;
