package org.holdover.load;

/**
 * One motor unit in the set assumed to start at the same moment.
 *
 * @param applianceIndex index of its appliance in the analysed list
 * @param name           appliance name
 * @param runningW       running power of the unit, W
 * @param runningVa      running apparent power of the unit, VA
 * @param directStartVa  locked-rotor demand started direct on line, VA
 * @param startVa        starting demand with its starter, VA
 * @param startW         starting real power, W (start VA × locked-rotor power factor)
 * @param startS         duration of the start, s
 * @param leg            where it is connected
 */
public record StartingMotor(int applianceIndex, String name, double runningW, double runningVa, double directStartVa,
                            double startVa, double startW, double startS, Leg leg) {
}
