package org.holdover.load;

import java.util.Objects;

/**
 * An appliance (or a group of identical units) with when it runs.
 *
 * @param name        label
 * @param quantity    identical units, ≥ 1
 * @param runningW    running power of one unit, W
 * @param powerFactor running power factor, (0, 1]
 * @param dutyInWindow fraction of its window hours it runs on average, (0, 1] (hours per day ÷ window hours)
 * @param hours       24 flags, true where the hour of day (local standard time) is in its windows
 * @param weekdays    runs Monday–Friday
 * @param weekends    runs Saturday and Sunday
 * @param months      12 flags, January first
 * @param served      supplied by the system (critical loads in backup mode; all loads off grid)
 * @param leg         where it is connected
 * @param inProfile   its energy is already in the measured profile (used for demand and surge only)
 * @param motor       starting data, or null when it starts no motor
 */
public record Appliance(String name, int quantity, double runningW, double powerFactor, double dutyInWindow,
                        boolean[] hours, boolean weekdays, boolean weekends, boolean[] months, boolean served,
                        Leg leg, boolean inProfile, Motor motor) {

    public Appliance {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(leg, "leg");
        if (quantity < 1) {
            throw new IllegalArgumentException("quantity must be >= 1, got " + quantity);
        }
        if (!(runningW > 0)) {
            throw new IllegalArgumentException("runningW must be > 0, got " + runningW);
        }
        if (!(powerFactor > 0 && powerFactor <= 1)) {
            throw new IllegalArgumentException("powerFactor must be in (0, 1], got " + powerFactor);
        }
        if (!(dutyInWindow >= 0 && dutyInWindow <= 1)) {
            throw new IllegalArgumentException("dutyInWindow must be in [0, 1], got " + dutyInWindow);
        }
        if (hours.length != 24 || months.length != 12) {
            throw new IllegalArgumentException("hours needs 24 flags and months 12");
        }
        if (!weekdays && !weekends) {
            throw new IllegalArgumentException("an appliance must run on some days");
        }
        hours = hours.clone();
        months = months.clone();
    }

    @Override
    public boolean[] hours() {
        return hours.clone();
    }

    @Override
    public boolean[] months() {
        return months.clone();
    }

    /** Whether it may run in the given hour of day, month (1–12) and day type. */
    public boolean activeAt(int hourOfDay, int month, int dayType) {
        return hours[hourOfDay] && months[month - 1] && (dayType == YearCalendar.WEEKDAY ? weekdays : weekends);
    }

    /** Window hours per day. */
    public int windowHours() {
        int n = 0;
        for (boolean h : hours) {
            if (h) {
                n++;
            }
        }
        return n;
    }

    /** Running apparent power of one unit, VA. */
    public double runningVa() {
        return runningW / powerFactor;
    }

    /** Mean power of all units over a window hour, W (running power × quantity × duty). */
    public double meanWindowW() {
        return runningW * quantity * dutyInWindow;
    }

    /** Energy on a day it runs, Wh. */
    public double dailyEnergyWh() {
        return meanWindowW() * windowHours();
    }
}
