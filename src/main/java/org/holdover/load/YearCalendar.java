package org.holdover.load;

import java.time.DayOfWeek;
import java.time.LocalDate;
import java.time.Year;

/**
 * The hours of one calendar year in local standard time: for each hour of the year its month, day type
 * (weekday or weekend) and hour of day. 8,760 hours, or 8,784 in a leap year.
 */
public final class YearCalendar {

    /** Day type index of Monday–Friday. */
    public static final int WEEKDAY = 0;
    /** Day type index of Saturday and Sunday. */
    public static final int WEEKEND = 1;

    private final int year;
    private final int hours;
    private final byte[] month;     // 1..12
    private final byte[] dayType;   // WEEKDAY or WEEKEND
    private final byte[] hourOfDay; // 0..23
    private final int[] daysInMonth = new int[12];

    /** @param year the calendar year, e.g. 2025 */
    public YearCalendar(int year) {
        this.year = year;
        this.hours = Year.isLeap(year) ? 8784 : 8760;
        month = new byte[hours];
        dayType = new byte[hours];
        hourOfDay = new byte[hours];
        LocalDate d = LocalDate.of(year, 1, 1);
        int h = 0;
        while (d.getYear() == year) {
            byte m = (byte) d.getMonthValue();
            byte t = (byte) (d.getDayOfWeek() == DayOfWeek.SATURDAY || d.getDayOfWeek() == DayOfWeek.SUNDAY ? WEEKEND : WEEKDAY);
            daysInMonth[m - 1]++;
            for (int i = 0; i < 24; i++, h++) {
                month[h] = m;
                dayType[h] = t;
                hourOfDay[h] = (byte) i;
            }
            d = d.plusDays(1);
        }
    }

    public int year() {
        return year;
    }

    /** Number of hours in the year (8,760 or 8,784). */
    public int hours() {
        return hours;
    }

    /** Month 1–12 of hour {@code h} (0-based hour of the year). */
    public int month(int h) {
        return month[h];
    }

    /** {@link #WEEKDAY} or {@link #WEEKEND} for hour {@code h}. */
    public int dayType(int h) {
        return dayType[h];
    }

    /** Hour of day 0–23 of hour {@code h}. */
    public int hourOfDay(int h) {
        return hourOfDay[h];
    }

    /** Days in month {@code m} (1–12). */
    public int daysInMonth(int m) {
        return daysInMonth[m - 1];
    }

    /** The date of hour {@code h}. */
    public LocalDate date(int h) {
        return LocalDate.ofYearDay(year, h / 24 + 1);
    }
}
