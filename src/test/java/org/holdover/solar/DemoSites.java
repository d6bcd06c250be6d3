package org.holdover.solar;

/** Invented demo sites and climates for tests (demo data, not measurements). */
final class DemoSites {

    private DemoSites() {
    }

    /** Demo data: a northern inland site. */
    static final Site NORTH_INLAND = new Site(44.5, -72.6, 300, -5);

    /** Demo data: monthly mean daily GHI, kWh/m²/day. */
    static final double[] NORTH_INLAND_GHI = {1.8, 2.8, 3.9, 4.6, 5.3, 5.7, 5.8, 5.0, 4.0, 2.7, 1.7, 1.4};

    /** Demo data: monthly mean air temperature, °C. */
    static final double[] NORTH_INLAND_TEMP = {-8, -6, -1, 6, 13, 18, 21, 19, 15, 8, 2, -5};

    static MonthlyClimate northInlandClimate() {
        return MonthlyClimate.withDefaultTempRange(NORTH_INLAND_GHI, NORTH_INLAND_TEMP);
    }

    private static SunPath path2023;

    /** The 2023 sun path of the demo site (ΔT 69 s, standard-atmosphere refraction), computed once. */
    static synchronized SunPath northInlandPath2023() {
        if (path2023 == null) {
            path2023 = SunPath.compute(NORTH_INLAND, 2023, 69.0,
                    Refraction.standardAtmosphere(NORTH_INLAND.elevationM(), 7.0));
        }
        return path2023;
    }
}
