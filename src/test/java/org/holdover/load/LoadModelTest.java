package org.holdover.load;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.time.DayOfWeek;
import java.time.LocalDate;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Hand-computed load cases: every figure below is worked out in the comments from the appliance data. */
class LoadModelTest {

    private static final double EXACT = 1e-9;
    private static final YearCalendar Y2025 = new YearCalendar(2025);

    static boolean[] window(int from, int to) {
        boolean[] h = new boolean[24];
        int i = from;
        do {
            h[i] = true;
            i = (i + 1) % 24;
        } while (i != to % 24);
        return h;
    }

    static boolean[] allMonths() {
        boolean[] m = new boolean[12];
        Arrays.fill(m, true);
        return m;
    }

    // Lamps: 2 × 100 W, PF 1, 18-22 h, 2 h/day (duty 0.5), leg 1 → mean 100 W in 4 window hours, 400 Wh/day.
    static final Appliance LAMPS = new Appliance("Lamps", 2, 100, 1.0, 0.5, window(18, 22), true, true, allMonths(), true,
            Leg.L1, false, null);
    // Pump: 1000 W, PF 0.8 (1250 VA), 06-08 h, 1 h/day (duty 0.5), weekdays, 240 V; nameplate 30 A × 240 V = 7200 VA,
    // locked-rotor PF 0.5 → 3600 W while starting.
    static final Appliance PUMP = new Appliance("Pump", 1, 1000, 0.8, 0.5, window(6, 8), true, false, allMonths(), true,
            Leg.BOTH, false, new Motor(new LockedRotor.ByNameplateAmps(30, 240), 1.0, Motor.Starter.DIRECT, 1.0, 0.5));
    // Freezer: 200 W, PF 0.8 (250 VA), all day, duty 0.4 → mean 80 W, 1920 Wh/day; start 5 × 250 = 1250 VA; leg 2.
    static final Appliance FREEZER = new Appliance("Freezer", 1, 200, 0.8, 0.4, window(0, 24), true, true, allMonths(), true,
            Leg.L2, false, new Motor(new LockedRotor.ByMultiple(5), 0.5, Motor.Starter.DIRECT, 1.0, 0.5));
    // Dryer: not served (a non-critical load in backup mode): contributes nothing.
    static final Appliance DRYER = new Appliance("Dryer", 1, 3000, 1.0, 0.5, window(10, 14), true, true, allMonths(), false,
            Leg.BOTH, false, new Motor(new LockedRotor.ByMultiple(3), 1.0, Motor.Starter.DIRECT, 1.0, 0.5));

    @Test
    void energyDemandAndSurgeOfAHandCase() {
        LoadAnalysis a = LoadModel.analyse(Y2025, List.of(LAMPS, PUMP, FREEZER, DRYER), null, 0.9, 1, true);
        LoadAnalysis.Figures f = a.figures();
        // 1 Jan 2025 is a Wednesday. Hour 6: pump mean 500 + freezer 80 = 580 W; hour 19: lamps 100 + freezer 80.
        assertThat(a.loadW()[6]).isCloseTo(580, within(EXACT));
        assertThat(a.loadW()[19]).isCloseTo(180, within(EXACT));
        assertThat(a.loadW()[12]).isCloseTo(80, within(EXACT));
        // Saturday 4 Jan, 06 h: no pump.
        assertThat(a.loadW()[3 * 24 + 6]).isCloseTo(80, within(EXACT));
        // Daily energy: weekday 400 + 1000 + 1920 = 3320 Wh, weekend 2320 Wh; mean over the year's days.
        int weekdays = 0, weekends = 0;
        for (LocalDate d = LocalDate.of(2025, 1, 1); d.getYear() == 2025; d = d.plusDays(1)) {
            boolean we = d.getDayOfWeek() == DayOfWeek.SATURDAY || d.getDayOfWeek() == DayOfWeek.SUNDAY;
            weekends += we ? 1 : 0;
            weekdays += we ? 0 : 1;
        }
        assertThat(weekdays).isEqualTo(261);
        assertThat(f.dailyEnergyWh()).isCloseTo((weekdays * 3320.0 + weekends * 2320.0) / 365, within(1e-9));
        // January 2025: 23 weekdays, 8 weekend days.
        assertThat(f.monthlyDailyEnergyWh()[0]).isCloseTo((23 * 3320.0 + 8 * 2320.0) / 31, within(1e-9));
        // Coincident running demand: weekday 06-08 h, pump 1000 + freezer 200 = 1200 W, 1250 + 250 = 1500 VA, first at hour 6.
        assertThat(f.runningPeakW()).isCloseTo(1200, within(EXACT));
        assertThat(f.runningPeakWHour()).isEqualTo(6);
        assertThat(f.runningPeakVa()).isCloseTo(1500, within(EXACT));
        // The starting set is the pump (7200 VA > 1250 VA). Everything else peaks at 18-22 h: lamps 200 + freezer 250 VA.
        assertThat(a.starting()).extracting(StartingMotor::name).containsExactly("Pump");
        assertThat(f.othersPeakVa()).isCloseTo(450, within(EXACT));
        assertThat(f.othersPeakW()).isCloseTo(400, within(EXACT));
        assertThat(f.surgeVa()).isCloseTo(450 + 7200, within(EXACT));
        assertThat(f.surgeW()).isCloseTo(400 + 3600, within(EXACT));
        assertThat(f.surgeS()).isEqualTo(1.0);
        // Legs: pump splits 625 VA to each leg; lamps 200 VA on leg 1; freezer 250 VA on leg 2.
        assertThat(f.legL1PeakVa()).isCloseTo(625, within(EXACT));
        assertThat(f.legL2PeakVa()).isCloseTo(875, within(EXACT));
        // Surge per leg: others (lamps 200 | freezer 250) + half the pump's 7200 VA.
        assertThat(f.surgeL1Va()).isCloseTo(200 + 3600, within(EXACT));
        assertThat(f.surgeL2Va()).isCloseTo(250 + 3600, within(EXACT));
    }

    static Appliance onLine(Appliance a) {
        return new Appliance(a.name(), a.quantity(), a.runningW(), a.powerFactor(), a.dutyInWindow(), a.hours(), a.weekdays(),
                a.weekends(), a.months(), a.served(), Leg.LINE, a.inProfile(), a.motor());
    }

    @Test
    void legsMustFitTheService() {
        org.assertj.core.api.Assertions.assertThatThrownBy(
                () -> LoadModel.analyse(Y2025, List.of(LAMPS), null, 0.9, 1, false))
                .isInstanceOf(IllegalArgumentException.class);
        org.assertj.core.api.Assertions.assertThatThrownBy(
                () -> LoadModel.analyse(Y2025, List.of(onLine(LAMPS)), null, 0.9, 1, true))
                .isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void twoMotorsStartingTogether() {
        LoadAnalysis a = LoadModel.analyse(Y2025, List.of(onLine(LAMPS), onLine(PUMP), onLine(FREEZER)), null, 0.9, 2, false);
        // Both motors start: others = lamps at 18-22 (200 VA, 200 W); start 7200 + 1250 VA, 3600 + 625 W; longest 1 s.
        assertThat(a.starting()).extracting(StartingMotor::name).containsExactly("Pump", "Freezer");
        assertThat(a.figures().surgeVa()).isCloseTo(200 + 7200 + 1250, within(EXACT));
        assertThat(a.figures().surgeW()).isCloseTo(200 + 3600 + 625, within(EXACT));
        assertThat(a.figures().legL1PeakVa()).as("single phase: no legs").isZero();
    }

    @Test
    void aMeasuredProfileReplacesTheMeanOfAppliancesAlreadyInIt() {
        Appliance freezerInProfile = new Appliance("Freezer", 1, 200, 0.8, 0.4, window(0, 24), true, true, allMonths(), true,
                Leg.LINE, true, FREEZER.motor());
        double[] profile = new double[Y2025.hours()];
        Arrays.fill(profile, 300.0);
        LoadAnalysis a = LoadModel.analyse(Y2025, List.of(onLine(LAMPS), onLine(PUMP), freezerInProfile), profile, 0.9, 1, false);
        // Energy: the profile (300 W, freezer inside) + lamps and pump means; the freezer's 80 W is not added again.
        assertThat(a.loadW()[6]).isCloseTo(300 + 500, within(EXACT));
        assertThat(a.loadW()[12]).isCloseTo(300, within(EXACT));
        // Demand at hour 6: residual 300 − 80 = 220 W, plus every load that may run at full power: 1000 + 200.
        assertThat(a.runningW()[6]).isCloseTo(220 + 1000 + 200, within(EXACT));
        assertThat(a.runningVa()[6]).isCloseTo(220 / 0.9 + 1250 + 250, within(EXACT));
    }

    @Test
    void softStarterAndCodeLetter() {
        // 1 hp, code letter G: top of range 6.3 kVA/hp → 6300 VA; a soft starter leaving 50 % → 3150 VA.
        Motor m = new Motor(new LockedRotor.ByCodeLetter(1, NemaCodeLetter.G), 2, Motor.Starter.SOFT, 0.5, 0.4);
        assertThat(m.startVa(900)).isCloseTo(3150, within(EXACT));
        assertThat(m.startW(900)).isCloseTo(1260, within(EXACT));
    }
}
