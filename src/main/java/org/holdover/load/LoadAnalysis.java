package org.holdover.load;

import java.util.List;

/**
 * The served load over a year and the demands an inverter must meet. All hourly arrays have one value
 * per hour of the calendar year in local standard time. W and VA are hourly means for energy and
 * nameplate running figures for demand.
 *
 * @param calendar           the year
 * @param appliances         the appliances analysed (legs assigned)
 * @param profileW           measured profile after scaling, W (zeros when none)
 * @param profilePowerFactor power factor of the profile's load
 * @param energyGrid         mean power of served appliances that add energy, W, by typical day
 * @param inProfileGrid      mean power of served appliances already in the profile, W
 * @param runningWGrid       running power of served appliances that may be on, W
 * @param runningVaGrid      running VA of served appliances that may be on
 * @param startingRunWGrid   running W of the starting motors, when they may be on
 * @param startingRunVaGrid  running VA of the starting motors, when they may be on
 * @param runningL1VaGrid    running VA on leg 1 (split phase)
 * @param runningL2VaGrid    running VA on leg 2
 * @param startingL1VaGrid   starting motors' running VA on leg 1
 * @param startingL2VaGrid   starting motors' running VA on leg 2
 * @param loadW              served load, hourly mean W
 * @param runningW           coincident running demand each hour, W
 * @param runningVa          coincident running demand each hour, VA
 * @param othersW            running demand of everything but the starting motors, W
 * @param othersVa           the same in VA
 * @param legL1Va            leg-1 running VA (split phase; zeros otherwise)
 * @param legL2Va            leg-2 running VA
 * @param othersL1Va         leg-1 running VA without the starting motors
 * @param othersL2Va         leg-2 running VA without the starting motors
 * @param starting           the motors assumed to start together (largest first)
 * @param figures            the headline numbers
 */
public record LoadAnalysis(
        YearCalendar calendar,
        List<Appliance> appliances,
        double[] profileW,
        double profilePowerFactor,
        DayGrid energyGrid,
        DayGrid inProfileGrid,
        DayGrid runningWGrid,
        DayGrid runningVaGrid,
        DayGrid startingRunWGrid,
        DayGrid startingRunVaGrid,
        DayGrid runningL1VaGrid,
        DayGrid runningL2VaGrid,
        DayGrid startingL1VaGrid,
        DayGrid startingL2VaGrid,
        double[] loadW,
        double[] runningW,
        double[] runningVa,
        double[] othersW,
        double[] othersVa,
        double[] legL1Va,
        double[] legL2Va,
        double[] othersL1Va,
        double[] othersL2Va,
        List<StartingMotor> starting,
        Figures figures) {

    public LoadAnalysis {
        appliances = List.copyOf(appliances);
        starting = List.copyOf(starting);
    }

    /**
     * Headline load figures.
     *
     * @param dailyEnergyWh        year-average served energy per day, Wh
     * @param monthlyDailyEnergyWh mean served energy per day in each month, Wh (January first)
     * @param worstMonth           month (1–12) with the highest energy per day
     * @param peakLoadW            highest hourly mean load, W
     * @param peakLoadHour         hour of the year it occurs
     * @param runningPeakW         coincident running demand, W (highest over the year)
     * @param runningPeakWHour     hour of the year it occurs
     * @param runningPeakVa        coincident running demand, VA
     * @param runningPeakVaHour    hour of the year it occurs
     * @param legL1PeakVa          highest leg-1 running VA (split phase)
     * @param legL2PeakVa          highest leg-2 running VA
     * @param othersPeakW          highest running demand of everything but the starting motors, W
     * @param othersPeakVa         the same in VA
     * @param surgeVa              others' peak VA + starting VA of the starting motors
     * @param surgeW               others' peak W + starting W of the starting motors
     * @param surgeS               duration of the surge, s (longest start in the set)
     * @param surgeL1Va            leg-1 surge VA
     * @param surgeL2Va            leg-2 surge VA
     */
    public record Figures(double dailyEnergyWh, double[] monthlyDailyEnergyWh, int worstMonth, double peakLoadW,
                          int peakLoadHour, double runningPeakW, int runningPeakWHour, double runningPeakVa,
                          int runningPeakVaHour, double legL1PeakVa, double legL2PeakVa, double othersPeakW,
                          double othersPeakVa, double surgeVa, double surgeW, double surgeS, double surgeL1Va,
                          double surgeL2Va) {
    }
}
