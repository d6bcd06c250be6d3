package org.holdover.pv;

import org.holdover.solar.ClearnessSequence;
import org.holdover.solar.MonthlyClimate;
import org.holdover.solar.PlaneOfArray;
import org.holdover.solar.PoaSeries;
import org.holdover.solar.PoaSettings;
import org.holdover.solar.Refraction;
import org.holdover.solar.Site;
import org.holdover.solar.SunPath;
import org.holdover.solar.SurfaceOrientation;
import org.holdover.solar.SyntheticYear;

/** A demo site's synthetic year, shared by the pv tests (demo data). */
final class DemoYear {

    private DemoYear() {
    }

    /** Demo data: a northern inland site. */
    static final Site SITE = new Site(44.5, -72.6, 300, -5);
    /** Demo data: monthly mean daily GHI, kWh/m²/day. */
    static final double[] GHI = {1.8, 2.8, 3.9, 4.6, 5.3, 5.7, 5.8, 5.0, 4.0, 2.7, 1.7, 1.4};
    /** Demo data: monthly mean air temperature, °C. */
    static final double[] TEMP = {-8, -6, -1, 6, 13, 18, 21, 19, 15, 8, 2, -5};

    private static SunPath path;
    private static SyntheticYear year;

    static synchronized SunPath sunPath() {
        if (path == null) {
            path = SunPath.compute(SITE, 2023, 69.0, Refraction.standardAtmosphere(SITE.elevationM(), 7.0));
        }
        return path;
    }

    /** The synthetic year with a seeded random clearness sequence. */
    static synchronized SyntheticYear year() {
        if (year == null) {
            year = SyntheticYear.generate(sunPath(), MonthlyClimate.withDefaultTempRange(GHI, TEMP),
                    new ClearnessSequence.SeededRandom(42L, 0.3, 0.3));
        }
        return year;
    }

    static PoaSeries poa(double tiltDeg) {
        return PlaneOfArray.hourly(year().weather(), sunPath(), PoaSettings.defaults(new SurfaceOrientation(tiltDeg, 180)));
    }
}
