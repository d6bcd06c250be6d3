package org.holdover.solar;

/**
 * The three irradiance components measured (or modelled) on the horizontal, one hour.
 *
 * @param ghiWm2 global horizontal irradiance, W/m², ≥ 0
 * @param dniWm2 direct normal irradiance, W/m², ≥ 0
 * @param dhiWm2 diffuse horizontal irradiance, W/m², ≥ 0
 */
public record HorizontalIrradiance(double ghiWm2, double dniWm2, double dhiWm2) {
    public HorizontalIrradiance {
        if (!(ghiWm2 >= 0 && dniWm2 >= 0 && dhiWm2 >= 0)) {
            throw new IllegalArgumentException("irradiance must be >= 0, got " + ghiWm2 + ", " + dniWm2 + ", " + dhiWm2);
        }
    }
}
