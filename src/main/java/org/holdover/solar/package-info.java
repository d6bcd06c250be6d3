/**
 * Sun position, irradiance on the plane of the array, hourly weather input and a synthetic typical year
 * from monthly means.
 *
 * <ul>
 *   <li>{@link org.holdover.solar.SunPositions} wraps the NREL SPA of the solarpositioning library (the only
 *       class that sees it); {@link org.holdover.solar.SunPath} holds a year of hourly positions at hour
 *       midpoints in local standard time.</li>
 *   <li>{@link org.holdover.solar.SyntheticYear} builds GHI, DNI, DHI and air temperature from 12 monthly
 *       means (Collares-Pereira &amp; Rabl 1979, Erbs et al. 1982), keeping every intermediate.</li>
 *   <li>{@link org.holdover.solar.EpwReader} and {@link org.holdover.solar.WeatherCsvReader} read hourly
 *       weather files and report bad input as {@code org.holdover.project.InputException}.</li>
 *   <li>{@link org.holdover.solar.PlaneOfArray} transposes to the array plane (isotropic or Hay–Davies sky,
 *       ground reflection, ASHRAE incidence angle modifier).</li>
 * </ul>
 * Angles in degrees; azimuths clockwise from north; irradiance W/m² as hourly means; hourly series are
 * 8,760 values (8,784 in a leap year), hour h covering [h, h + 1) local standard time.
 */
package org.holdover.solar;
