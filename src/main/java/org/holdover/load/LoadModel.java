package org.holdover.load;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Turns appliances and an optional measured profile into the served hourly load, the coincident running
 * demand and the motor-starting surge.
 *
 * <p>Method. Each served appliance contributes, in every hour its windows, months and day type allow:
 * its mean power (running W × quantity × duty) to the energy, and its full running W and VA (× quantity)
 * to the coincident running demand — every load that may be on in an hour is taken as on. A measured
 * profile adds its hourly energy; the part of it that belongs to appliances marked "in profile" is
 * replaced, for demand, by their full running power: residual = max(profile − their mean power, 0).
 * The surge is the highest running demand of everything else plus the starting demand of the
 * {@code motorsTogether} motor units with the largest starting VA. VA add arithmetically (conservative:
 * the phasor sum is smaller when power factors differ), common practice, no source.
 */
public final class LoadModel {

    private LoadModel() {
    }

    /**
     * @param cal            the year
     * @param appliances     all appliances (only those with {@code served} count)
     * @param profileW       measured profile after scaling, W per hour, or null
     * @param profilePf      power factor of the profile's load, (0, 1]
     * @param motorsTogether motor units assumed to start at the same moment, ≥ 1
     * @param splitPhase     whether the service is 120/240 V split phase
     */
    public static LoadAnalysis analyse(YearCalendar cal, List<Appliance> appliances, double[] profileW,
                                       double profilePf, int motorsTogether, boolean splitPhase) {
        int n = cal.hours();
        if (profileW != null && profileW.length != n) {
            throw new IllegalArgumentException("profile has " + profileW.length + " hours, the year " + n);
        }
        if (!(profilePf > 0 && profilePf <= 1)) {
            throw new IllegalArgumentException("profile power factor must be in (0, 1]");
        }
        if (motorsTogether < 1) {
            throw new IllegalArgumentException("motorsTogether must be >= 1");
        }
        for (Appliance a : appliances) {
            if ((a.leg() == Leg.LINE) == splitPhase) {
                throw new IllegalArgumentException(a.name() + ": leg " + a.leg() + " does not fit a "
                        + (splitPhase ? "split-phase" : "single-phase") + " service");
            }
        }
        double[] profile = profileW == null ? new double[n] : profileW.clone();
        List<StartingMotor> starting = startingSet(appliances, motorsTogether);
        int[] startingUnits = new int[appliances.size()];
        for (StartingMotor s : starting) {
            startingUnits[s.applianceIndex()]++;
        }

        DayGrid energy = new DayGrid();
        DayGrid inProfile = new DayGrid();
        DayGrid runW = new DayGrid();
        DayGrid runVa = new DayGrid();
        DayGrid sRunW = new DayGrid();
        DayGrid sRunVa = new DayGrid();
        DayGrid l1 = new DayGrid();
        DayGrid l2 = new DayGrid();
        DayGrid sL1 = new DayGrid();
        DayGrid sL2 = new DayGrid();
        for (int month = 1; month <= 12; month++) {
            for (int type = 0; type < 2; type++) {
                int row = DayGrid.row(month, type);
                for (int hod = 0; hod < 24; hod++) {
                    double e = 0, ip = 0, rw = 0, rva = 0, srw = 0, srva = 0, a1 = 0, a2 = 0, s1 = 0, s2 = 0;
                    for (int i = 0; i < appliances.size(); i++) {
                        Appliance a = appliances.get(i);
                        if (!a.served() || !a.activeAt(hod, month, type)) {
                            continue;
                        }
                        double mean = a.meanWindowW();
                        if (a.inProfile()) {
                            ip += mean;
                        } else {
                            e += mean;
                        }
                        double w = a.runningW() * a.quantity();
                        double va = a.runningVa() * a.quantity();
                        rw += w;
                        rva += va;
                        a1 += va * a.leg().shareL1();
                        a2 += va * a.leg().shareL2();
                        int k = startingUnits[i];
                        srw += a.runningW() * k;
                        srva += a.runningVa() * k;
                        s1 += a.runningVa() * k * a.leg().shareL1();
                        s2 += a.runningVa() * k * a.leg().shareL2();
                    }
                    energy.set(row, hod, e);
                    inProfile.set(row, hod, ip);
                    runW.set(row, hod, rw);
                    runVa.set(row, hod, rva);
                    sRunW.set(row, hod, srw);
                    sRunVa.set(row, hod, srva);
                    l1.set(row, hod, a1);
                    l2.set(row, hod, a2);
                    sL1.set(row, hod, s1);
                    sL2.set(row, hod, s2);
                }
            }
        }

        double[] loadW = new double[n];
        double[] runningW = new double[n];
        double[] runningVa = new double[n];
        double[] othersW = new double[n];
        double[] othersVa = new double[n];
        double[] legL1 = new double[n];
        double[] legL2 = new double[n];
        double[] othersL1 = new double[n];
        double[] othersL2 = new double[n];
        double legShare = splitPhase ? 0.5 : 0.0;
        for (int h = 0; h < n; h++) {
            double residual = Math.max(profile[h] - inProfile.at(cal, h), 0.0);
            double residualVa = residual / profilePf;
            loadW[h] = profile[h] + energy.at(cal, h);
            runningW[h] = residual + runW.at(cal, h);
            runningVa[h] = residualVa + runVa.at(cal, h);
            othersW[h] = runningW[h] - sRunW.at(cal, h);
            othersVa[h] = runningVa[h] - sRunVa.at(cal, h);
            legL1[h] = residualVa * legShare + l1.at(cal, h);
            legL2[h] = residualVa * legShare + l2.at(cal, h);
            othersL1[h] = legL1[h] - sL1.at(cal, h);
            othersL2[h] = legL2[h] - sL2.at(cal, h);
        }

        double[] monthly = new double[12];
        double total = 0;
        for (int h = 0; h < n; h++) {
            monthly[cal.month(h) - 1] += loadW[h];
            total += loadW[h];
        }
        for (int m = 1; m <= 12; m++) {
            monthly[m - 1] /= cal.daysInMonth(m);
        }
        int worst = Picks.firstNearMax(monthly) + 1;
        int peakLoadHour = argMax(loadW);
        int runWHour = argMax(runningW);
        int runVaHour = argMax(runningVa);
        double startVa = 0, startW = 0, startL1 = 0, startL2 = 0, startS = 0;
        for (StartingMotor s : starting) {
            startVa += s.startVa();
            startW += s.startW();
            startL1 += s.startVa() * s.leg().shareL1();
            startL2 += s.startVa() * s.leg().shareL2();
            startS = Math.max(startS, s.startS());
        }
        double othersPeakW = max(othersW);
        double othersPeakVa = max(othersVa);
        LoadAnalysis.Figures figures = new LoadAnalysis.Figures(
                total / (n / 24.0), monthly, worst, loadW[peakLoadHour], peakLoadHour,
                runningW[runWHour], runWHour, runningVa[runVaHour], runVaHour, max(legL1), max(legL2),
                othersPeakW, othersPeakVa, othersPeakVa + startVa, othersPeakW + startW, startS,
                max(othersL1) + startL1, max(othersL2) + startL2);
        return new LoadAnalysis(cal, appliances, profile, profilePf, energy, inProfile, runW, runVa, sRunW, sRunVa,
                l1, l2, sL1, sL2, loadW, runningW, runningVa, othersW, othersVa, legL1, legL2, othersL1, othersL2,
                starting, figures);
    }

    /** The {@code count} served motor units with the largest starting VA (ties: list order). */
    static List<StartingMotor> startingSet(List<Appliance> appliances, int count) {
        List<StartingMotor> units = new ArrayList<>();
        for (int i = 0; i < appliances.size(); i++) {
            Appliance a = appliances.get(i);
            if (!a.served() || a.motor() == null) {
                continue;
            }
            Motor m = a.motor();
            double runVa = a.runningVa();
            for (int u = 0; u < a.quantity(); u++) {
                units.add(new StartingMotor(i, a.name(), a.runningW(), runVa, m.lockedRotor().directStartVa(runVa),
                        m.startVa(runVa), m.startW(runVa), m.startS(), a.leg()));
            }
        }
        units.sort(Comparator.comparingDouble(StartingMotor::startVa).reversed()
                .thenComparingInt(StartingMotor::applianceIndex));
        return units.subList(0, Math.min(count, units.size()));
    }

    private static int argMax(double[] v) {
        int best = 0;
        for (int i = 1; i < v.length; i++) {
            if (v[i] > v[best]) {
                best = i;
            }
        }
        return best;
    }

    private static double max(double[] v) {
        double m = Double.NEGATIVE_INFINITY;
        for (double x : v) {
            m = Math.max(m, x);
        }
        return m;
    }
}
