package org.holdover.load;

/**
 * A typical-day table: one value per (month, day type, hour of day), 24 rows × 24 columns. Row
 * {@code (month − 1) × 2 + dayType}, column hour of day. The workbook lays it out the same way and
 * looks hours of the year up in it.
 */
public final class DayGrid {

    /** Rows: 12 months × 2 day types. */
    public static final int ROWS = 24;
    /** Columns: hours of day. */
    public static final int COLUMNS = 24;

    private final double[] cells = new double[ROWS * COLUMNS];

    /** Row index of a month (1–12) and day type. */
    public static int row(int month, int dayType) {
        return (month - 1) * 2 + dayType;
    }

    public double get(int row, int hourOfDay) {
        return cells[row * COLUMNS + hourOfDay];
    }

    void set(int row, int hourOfDay, double value) {
        cells[row * COLUMNS + hourOfDay] = value;
    }

    /** The value for an hour of the year. */
    public double at(YearCalendar cal, int h) {
        return get(row(cal.month(h), cal.dayType(h)), cal.hourOfDay(h));
    }
}
