package org.holdover.solar;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** Builds weather-file texts for the reader tests (demo data). */
final class WeatherFixtures {

    private WeatherFixtures() {
    }

    static final String EPW_FLAGS = "?9?9?9?9E0?9?9?9*9*9?9?9?9*_?9?9*9*9*9*_*9*9";

    /** Demo data: GHI of hour h, W/m², a plain daytime bump. */
    static double ghi(int h) {
        int k = h % 24;
        return k >= 7 && k <= 16 ? 100.0 + 10 * k : 0.0;
    }

    static double dni(int h) {
        return ghi(h) > 0 ? 200.0 + (h % 24) : 0.0;
    }

    static double dhi(int h) {
        return ghi(h) > 0 ? 50.0 + (h % 24) : 0.0;
    }

    static double air(int h) {
        return -5.0 + (h % 24) * 0.5 + (h / 24) * 0.01;
    }

    /** The lines of a complete EPW file (8 header lines + one row per hour). */
    static List<String> epwLines(boolean leap) {
        List<String> lines = new ArrayList<>();
        lines.add("LOCATION,Demo Town,XX,Demoland,demo data,000000,44.50,-72.60,-5.0,300.0");
        lines.add("DESIGN CONDITIONS,0");
        lines.add("TYPICAL/EXTREME PERIODS,0");
        lines.add("GROUND TEMPERATURES,0");
        lines.add("HOLIDAYS/DAYLIGHT SAVINGS," + (leap ? "Yes" : "No") + ",0,0,0");
        lines.add("COMMENTS 1,demo data for reader tests");
        lines.add("COMMENTS 2,");
        lines.add("DATA PERIODS,1,1,Data,Sunday, 1/ 1,12/31");
        HourCalendar cal = HourCalendar.ofHours(leap ? 8784 : 8760);
        for (int h = 0; h < cal.hours(); h++) {
            int day = cal.dayIndexOfHour(h);
            int m = cal.monthOfDay(day);
            int dom = day - cal.firstDayOf(m) + 1;
            lines.add(String.format(Locale.ROOT,
                    "%d,%d,%d,%d,60,%s,%.1f,-8.0,80,101325,0,1415,250,%.0f,%.0f,%.0f,0,0,0,0,180,3.0,5,5,16.0,77777,9,"
                            + "999999999,0,0.0,0,88,0.2,0.0,0.0",
                    leap ? 2024 : 2023, m + 1, dom, h % 24 + 1, EPW_FLAGS, air(h), ghi(h), dni(h), dhi(h)));
        }
        return lines;
    }

    /** The lines of a complete weather CSV: 2 comment lines, the header, then one row per hour. */
    static List<String> csvLines(int hours) {
        List<String> lines = new ArrayList<>();
        lines.add("# demo data: reader test, local standard time UTC-5");
        lines.add("# irradiance W/m2, air degC");
        lines.add(WeatherCsvReader.HEADER);
        for (int h = 0; h < hours; h++) {
            lines.add(String.format(Locale.ROOT, "%d,%.0f,%.0f,%.0f,%.2f", h, ghi(h), dni(h), dhi(h), air(h)));
        }
        return lines;
    }

    static String text(List<String> lines) {
        return String.join("\n", lines) + "\n";
    }
}
