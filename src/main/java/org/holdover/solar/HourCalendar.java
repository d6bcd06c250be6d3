package org.holdover.solar;

/**
 * The calendar of an hourly year: 8,760 hours, or 8,784 in a leap year. Hour index {@code h} covers
 * local standard time [h, h + 1) hours after 1 January 00:00; its midpoint is h + 0.5.
 */
public final class HourCalendar {

    /** Hours in a common year. */
    public static final int HOURS_COMMON_YEAR = 8760;
    /** Hours in a leap year. */
    public static final int HOURS_LEAP_YEAR = 8784;

    private static final int[] DAYS_COMMON = {31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31};

    private final boolean leap;
    private final int[] firstDayOfMonth = new int[13];

    private HourCalendar(boolean leap) {
        this.leap = leap;
        int d = 0;
        for (int m = 0; m < 12; m++) {
            firstDayOfMonth[m] = d;
            d += daysIn(m);
        }
        firstDayOfMonth[12] = d;
    }

    /** The calendar of the given year (leap years by the Gregorian rule). */
    public static HourCalendar ofYear(int year) {
        return new HourCalendar(java.time.Year.isLeap(year));
    }

    /**
     * The calendar for a series of the given length.
     *
     * @param hours 8760 or 8784
     */
    public static HourCalendar ofHours(int hours) {
        if (hours == HOURS_COMMON_YEAR) {
            return new HourCalendar(false);
        }
        if (hours == HOURS_LEAP_YEAR) {
            return new HourCalendar(true);
        }
        throw new IllegalArgumentException("an hourly year has 8760 or 8784 hours, got " + hours);
    }

    public boolean isLeap() {
        return leap;
    }

    public int hours() {
        return days() * 24;
    }

    public int days() {
        return leap ? 366 : 365;
    }

    /** Days in month {@code month0} (0 = January). */
    public int daysIn(int month0) {
        return month0 == 1 && leap ? 29 : DAYS_COMMON[month0];
    }

    /** The 0-based day of the year of hour {@code h}. */
    public int dayIndexOfHour(int h) {
        return h / 24;
    }

    /** The 0-based month (0 = January) of 0-based day {@code dayIndex}. */
    public int monthOfDay(int dayIndex) {
        for (int m = 0; m < 12; m++) {
            if (dayIndex < firstDayOfMonth[m + 1]) {
                return m;
            }
        }
        throw new IllegalArgumentException("day index out of range: " + dayIndex);
    }

    /** The 0-based month (0 = January) of hour {@code h}. */
    public int monthOfHour(int h) {
        return monthOfDay(h / 24);
    }

    /** The 0-based index of the first day of month {@code month0}. */
    public int firstDayOf(int month0) {
        return firstDayOfMonth[month0];
    }

    /**
     * The month-by-month mean daily sum of an hourly series of mean powers: for W/m² in, Wh/m² per day
     * out (each hourly value counts for one hour).
     *
     * @param hourly a series of this calendar's length
     * @return 12 values, January first
     */
    public double[] monthlyMeanDailySum(double[] hourly) {
        checkLength(hourly);
        double[] out = new double[12];
        for (int h = 0; h < hourly.length; h++) {
            out[monthOfHour(h)] += hourly[h];
        }
        for (int m = 0; m < 12; m++) {
            out[m] /= daysIn(m);
        }
        return out;
    }

    /**
     * The month-by-month mean of an hourly series (e.g. air temperature).
     *
     * @param hourly a series of this calendar's length
     * @return 12 values, January first
     */
    public double[] monthlyMean(double[] hourly) {
        double[] sums = monthlyMeanDailySum(hourly);
        for (int m = 0; m < 12; m++) {
            sums[m] /= 24.0;
        }
        return sums;
    }

    void checkLength(double[] hourly) {
        if (hourly.length != hours()) {
            throw new IllegalArgumentException("expected " + hours() + " hourly values, got " + hourly.length);
        }
    }
}
