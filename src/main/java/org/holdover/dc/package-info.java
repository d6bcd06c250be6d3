/**
 * DC bus voltage choice, conductor and overcurrent-device sizing, and the conductor tables.
 */
package org.holdover.dc;
