/**
 * Sun position, irradiance on the plane of the array, hourly weather input and a synthetic typical year from monthly means.
 */
package org.holdover.solar;
