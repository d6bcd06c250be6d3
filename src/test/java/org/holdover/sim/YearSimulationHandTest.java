package org.holdover.sim;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * Small cases worked by hand: every hour's flows against arithmetic written out here, from the model's
 * stated rules (the class Javadoc of {@link YearSimulation}) and the stated efficiencies. No published
 * source: the arithmetic is the reference. Equipment is demo data.
 */
class YearSimulationHandTest {

    /** The hand arithmetic and the engine differ only by rounding of sums of order 1e4 Wh. */
    private static final double WH = 1e-9;

    private static final ChargeController CONTROLLER = new ChargeController(0.95, 1500);

    // ----------------------------------------------------------------------------------------------------
    // Two days, PV and battery only: a sunny day that fills the bank, then a cloudy day that empties it.
    // ----------------------------------------------------------------------------------------------------

    /** 1 kW inverter, p0 = 1 % (10 W), k1 = 0, k2 = 5 %: Pin(L) = L + 10 + 0.05 L^2 / 1000. */
    private static final InverterLossModel QUADRATIC = new InverterLossModel(1000, 0.01, 0, 0.05);

    /** 5 kWh, floor 20 % (1000 Wh), ceiling 100 %, start 90 % (4500 Wh), 95 % each way, 1 kW limits. */
    private static final BatteryBank BANK = new BatteryBank(5000, 0.2, 1.0, 0.9, 0.95, 0.95, 1000, 1000);

    private static double[] twoDayLoad() {
        double[] l = new double[48];
        for (int t = 0; t < 48; t++) {
            l[t] = t >= 24 || (t >= 8 && t < 16) ? 400 : 200;
        }
        return l;
    }

    private static double[] twoDayPv() {
        double[] g = new double[48];
        for (int t = 8; t < 16; t++) {
            g[t] = 1000;
        }
        return g;
    }

    @Test
    void sunnyDayThenCloudyDayEveryHour() {
        SystemDesign design = new SystemDesign(CONTROLLER, QUADRATIC, BANK, Charger.NONE, Optional.empty());
        TracedYear run = YearSimulation.runTraced(design, HourlyConditions.offGrid(twoDayLoad(), twoDayPv()),
                AnalysisOptions.NONE);
        HourlyTrace tr = run.trace();

        double d200 = 200 + 10 + 0.05 * 200 * 200 / 1000;   // 212 W inverter input at 200 W
        double d400 = 400 + 10 + 0.05 * 400 * 400 / 1000;   // 418 W inverter input at 400 W
        double pv = 0.95 * 1000;                              // 950 W controller output (limit 1500 not hit)
        double surplus = pv - d400;                           // 532 W to the battery while it can take it

        double e = 4500;
        for (int t = 0; t < 48; t++) {
            double expInvOut;
            double expDis = 0;
            double expPvBat = 0;
            double expCurt = 0;
            double expUnmet = 0;
            double expInvIn;
            if (t < 8 || (t >= 16 && t < 24)) {
                // Night, 200 W: the battery supplies the inverter's 212 W; E falls by 212 / 0.95.
                expInvOut = 200;
                expInvIn = d200;
                expDis = d200;
                e -= d200 / 0.95;
            } else if (t < 16) {
                // Day, 400 W: PV covers 418 W, the surplus 532 W charges until the ceiling
                // (acceptance = MIN(1000, (5000 - E)/0.95)); the rest is curtailed.
                expInvOut = 400;
                expInvIn = d400;
                double acc = Math.min(1000, (5000 - e) / 0.95);
                expPvBat = Math.min(surplus, acc);
                expCurt = surplus - expPvBat;
                e += 0.95 * expPvBat;
            } else {
                // Cloudy day, 400 W, no PV: 418 W from the battery (440 Wh stored per hour) while it lasts.
                double avail = Math.max(0, (e - 1000) * 0.95);
                if (avail >= d400) {
                    expInvOut = 400;
                    expInvIn = d400;
                    expDis = d400;
                } else {
                    // Partial hour: the inverter delivers the root of 0.05 p^2 + p + (0.01 - avail/1000) = 0.
                    double c = 0.01 - avail / 1000;
                    double p = avail / 1000 > 0.01 ? (-1 + Math.sqrt(1 - 4 * 0.05 * c)) / (2 * 0.05) : 0;
                    expInvOut = 1000 * p;
                    expInvIn = avail;
                    expDis = avail;
                    expUnmet = 400 - expInvOut;
                }
                e -= expDis / 0.95;
            }
            String at = "hour " + t;
            assertThat(tr.inverterOutputW()[t]).as(at).isCloseTo(expInvOut, within(WH));
            assertThat(tr.inverterInputW()[t]).as(at).isCloseTo(expInvIn, within(WH));
            assertThat(tr.batteryToInverterW()[t]).as(at).isCloseTo(expDis, within(WH));
            assertThat(tr.pvToBatteryW()[t]).as(at).isCloseTo(expPvBat, within(WH));
            assertThat(tr.pvCurtailedW()[t]).as(at).isCloseTo(expCurt, within(WH));
            assertThat(tr.unmetW()[t]).as(at).isCloseTo(expUnmet, within(WH));
            assertThat(tr.storedWh()[t]).as(at).isCloseTo(e, within(WH));
        }

        // Landmarks worked separately: end of night one E = 4500 - 8 * 212/0.95 = 2714.7368...;
        // the bank is full from hour 12; the cloudy day starts at 5000 - 8 * 212/0.95 = 3214.7368 Wh, gives
        // five full hours (5 * 440 Wh stored) and in hour 29 exactly (1014.7368 - 1000) * 0.95 = 14 W.
        assertThat(tr.storedWh()[7]).isCloseTo(4500 - 8 * 212 / 0.95, within(WH));
        assertThat(tr.storedWh()[12]).isCloseTo(5000, within(WH));
        assertThat(tr.batteryToInverterW()[29]).isCloseTo(14, within(WH));
        double servedAt29 = 1000 * (-1 + Math.sqrt(1 + 4 * 0.05 * 0.004)) / (2 * 0.05);
        assertThat(tr.inverterOutputW()[29]).isCloseTo(servedAt29, within(WH));
        assertThat(servedAt29).isCloseTo(3.9992, within(0.0001));

        SimulationMetrics m = run.metrics();
        // Unmet: hour 29 (400 - 3.9992) and hours 30-47 (18 x 400).
        assertThat(m.reliability().unmetWh()).isCloseTo(400 - servedAt29 + 18 * 400, within(WH));
        assertThat(m.reliability().unmetHours()).isEqualTo(19);
        assertThat(m.reliability().lossOfLoadProbability()).isCloseTo(19 / 48.0, within(1e-15));
        assertThat(m.battery().lowestSoc()).isCloseTo(0.2, within(1e-12));
        // Curtailed: hour 12 (532 - (5000 - E11)/0.95) + hours 13-15 (3 x 532), E11 = 2714.74 + 4 x 505.4.
        double e11 = 4500 - 8 * 212 / 0.95 + 4 * 0.95 * 532;
        assertThat(m.pv().curtailedWh()).isCloseTo(532 - (5000 - e11) / 0.95 + 3 * 532, within(WH));
        assertThat(m.pv().clippedWh()).isZero();
    }

    @Test
    void chargingForbiddenHoursCurtailTheWholeSurplus() {
        // Same first day with charging forbidden 08-15 (for example a LiFePO4 bank below 0 °C): the 532 W
        // surplus of each of the 8 sunny hours is curtailed and the bank only falls.
        double[] temp = new double[48];
        for (int t = 0; t < 48; t++) {
            temp[t] = t >= 8 && t < 16 ? -5 : 10;
        }
        boolean[] nc = HourlyConditions.chargeForbiddenBelow(temp, 0);
        SystemDesign design = new SystemDesign(CONTROLLER, QUADRATIC, BANK, Charger.NONE, Optional.empty());
        SimulationMetrics m = YearSimulation.run(design,
                HourlyConditions.offGrid(twoDayLoad(), twoDayPv()).withChargeForbidden(nc), AnalysisOptions.NONE);
        assertThat(m.pv().curtailedWh()).isCloseTo(8 * (950 - 418), within(WH));
        assertThat(m.battery().chargeWh()).isZero();
    }

    // ----------------------------------------------------------------------------------------------------
    // Generator cases: 1 kW linear inverter (Pin = P + 10), 1 kWh bank, a 2 kW set derated to 1.8 kW,
    // minimum load 30 % (600 W), start state of charge 25 % (reserve 250 Wh), fuel 0.08415 / 0.246.
    // ----------------------------------------------------------------------------------------------------

    private static final InverterLossModel LINEAR = new InverterLossModel(1000, 0.01, 0, 0);

    private static Generator generator(DispatchStrategy strategy) {
        return new Generator(2000, 1800, 0.3, FuelCurve.FROM_MEMORY_DIESEL, strategy, 0.25);
    }

    /** Fuel for one running hour of the 2 kW set at an output in W: 0.08415 * 2 + 0.246 * kW. */
    private static double fuel(double outputW) {
        return 0.08415 * 2 + 0.246 * outputW / 1000;
    }

    @Test
    void loadFollowingEveryHour() {
        // 1 kWh, floor 20 % (200 Wh), start at 30 % (300 Wh), 90 % discharge efficiency.
        BatteryBank bank = new BatteryBank(1000, 0.2, 1.0, 0.3, 0.9, 0.9, 1000, 1000);
        SystemDesign design = new SystemDesign(CONTROLLER, LINEAR, bank, Charger.NONE,
                Optional.of(generator(new DispatchStrategy.LoadFollowing())));
        double[] load = {500, 500, 100, 0, 2500, 500};
        TracedYear run = YearSimulation.runTraced(design, HourlyConditions.offGrid(load, new double[6]),
                AnalysisOptions.NONE);
        HourlyTrace tr = run.trace();

        // h0: need 510; battery above the 250 Wh reserve gives (300-250)*0.9 = 45 W; the inverter delivers
        //     45 - 10 = 35 W; the generator carries 465 W, runs at its 600 W minimum, 135 W dumped.
        // h1: battery at the reserve: inverter gets nothing; generator 500 W, 100 W dumped.
        // h2: generator 100 W, 500 W dumped.
        // h3: no load: the generator stays off; the inverter cannot idle (nothing above the reserve), no
        //     load is lost.
        // h4: 2500 W: generator at its 1800 W limit; the inverter must give 700 W (710 W in); only the
        //     reserve is left: (250-200)*0.9 = 45 W -> 35 W out; unmet 700 - 35 = 665 W.
        // h5: 500 W, battery at the floor: generator 500 W, 100 W dumped.
        boolean[] on = {true, true, true, false, true, true};
        double[] genLoad = {465, 500, 100, 0, 1800, 500};
        double[] dump = {135, 100, 500, 0, 0, 100};
        double[] invOut = {35, 0, 0, 0, 35, 0};
        double[] dis = {45, 0, 0, 0, 45, 0};
        double[] unmet = {0, 0, 0, 0, 665, 0};
        double[] stored = {250, 250, 250, 250, 200, 200};
        for (int t = 0; t < 6; t++) {
            String at = "hour " + t;
            assertThat(tr.generatorOn()[t]).as(at).isEqualTo(on[t]);
            assertThat(tr.generatorToLoadW()[t]).as(at).isCloseTo(genLoad[t], within(WH));
            assertThat(tr.generatorDumpedW()[t]).as(at).isCloseTo(dump[t], within(WH));
            assertThat(tr.generatorOutputW()[t]).as(at).isCloseTo(genLoad[t] + dump[t], within(WH));
            assertThat(tr.generatorToChargerW()[t]).as(at).isZero();
            assertThat(tr.inverterOutputW()[t]).as(at).isCloseTo(invOut[t], within(WH));
            assertThat(tr.batteryToInverterW()[t]).as(at).isCloseTo(dis[t], within(WH));
            assertThat(tr.unmetW()[t]).as(at).isCloseTo(unmet[t], within(WH));
            assertThat(tr.storedWh()[t]).as(at).isCloseTo(stored[t], within(WH));
            assertThat(tr.fuelL()[t]).as(at).isCloseTo(on[t] ? fuel(genLoad[t] + dump[t]) : 0, within(1e-12));
        }
        SimulationMetrics.GeneratorRun g = run.metrics().generator();
        assertThat(g.hours()).isEqualTo(5);
        assertThat(g.starts()).isEqualTo(2);
        // 4 hours at 600 W and one at 1800 W: 4 * (0.1683 + 0.1476) + (0.1683 + 0.4428) = 1.8747 L.
        assertThat(g.fuelL()).isCloseTo(4 * 0.3159 + 0.6111, within(1e-12));
    }

    @Test
    void cycleChargingToASetPointEveryHour() {
        // 1 kWh, floor 20 %, start 30 % (300 Wh), 90 % each way, charge limit 500 W; charger 200 W AC at 90 %;
        // set point 50 % (500 Wh). Hour 4 forbids charging; hour 5 has 1000 W of PV (950 W after the
        // controller).
        BatteryBank bank = new BatteryBank(1000, 0.2, 1.0, 0.3, 0.9, 0.9, 500, 1000);
        SystemDesign design = new SystemDesign(CONTROLLER, LINEAR, bank, new Charger(200, 0.9),
                Optional.of(generator(new DispatchStrategy.CycleCharging(0.5))));
        double[] load = {500, 300, 300, 300, 300, 300};
        double[] pv = {0, 0, 0, 0, 0, 1000};
        boolean[] nc = {false, false, false, false, true, false};
        TracedYear run = YearSimulation.runTraced(design, HourlyConditions.offGrid(load, pv).withChargeForbidden(nc),
                AnalysisOptions.NONE);
        HourlyTrace tr = run.trace();

        // h0: 510 W needed, only 45 W above the reserve: start. The set carries 500 W and the charger 200 W
        //     (acceptance MIN(500, 700/0.9) = 500 W DC is not binding): E = 300 + 0.9 * 0.9 * 200 = 462.
        //     Output 700 W > 600 W minimum.
        // h1: running and E = 462 < 500: keeps running; 300 + 200 = 500 W, 100 W dumped; E = 624.
        // h2: E = 624 >= 500: stops; the battery gives 310 W: E = 624 - 310/0.9.
        // h3: above the reserve (E - 250)*0.9 < 310: starts again; charger 200 W: E += 162.
        // h4: charging forbidden: runs (E < 500) carrying 300 W, 300 W dumped, E unchanged.
        // h5: runs; PV takes the whole 500 W acceptance (450 W curtailed), charger gets nothing; 300 W dumped.
        double e2 = 624 - 310 / 0.9;
        double e3 = e2 + 162;
        boolean[] on = {true, true, false, true, true, true};
        double[] genLoad = {500, 300, 0, 300, 300, 300};
        double[] chg = {200, 200, 0, 200, 0, 0};
        double[] dump = {0, 100, 0, 100, 300, 300};
        double[] dis = {0, 0, 310, 0, 0, 0};
        double[] pvBat = {0, 0, 0, 0, 0, 500};
        double[] curt = {0, 0, 0, 0, 0, 450};
        double[] stored = {462, 624, e2, e3, e3, e3 + 0.9 * 500};
        for (int t = 0; t < 6; t++) {
            String at = "hour " + t;
            assertThat(tr.generatorOn()[t]).as(at).isEqualTo(on[t]);
            assertThat(tr.generatorToLoadW()[t]).as(at).isCloseTo(genLoad[t], within(WH));
            assertThat(tr.generatorToChargerW()[t]).as(at).isCloseTo(chg[t], within(WH));
            assertThat(tr.chargerToBatteryW()[t]).as(at).isCloseTo(0.9 * chg[t], within(WH));
            assertThat(tr.generatorDumpedW()[t]).as(at).isCloseTo(dump[t], within(WH));
            assertThat(tr.batteryToInverterW()[t]).as(at).isCloseTo(dis[t], within(WH));
            assertThat(tr.pvToBatteryW()[t]).as(at).isCloseTo(pvBat[t], within(WH));
            assertThat(tr.pvCurtailedW()[t]).as(at).isCloseTo(curt[t], within(WH));
            assertThat(tr.unmetW()[t]).as(at).isZero();
            assertThat(tr.storedWh()[t]).as(at).isCloseTo(stored[t], within(WH));
            double out = genLoad[t] + chg[t] + dump[t];
            assertThat(tr.fuelL()[t]).as(at).isCloseTo(on[t] ? fuel(out) : 0, within(1e-12));
        }
        assertThat(run.metrics().generator().hours()).isEqualTo(5);
        assertThat(run.metrics().generator().starts()).isEqualTo(2);
    }

    @Test
    void backupModeGridHoursRechargeThroughTheCharger() {
        // 1 kWh, floor 20 %, start 50 %, 90 % each way, charge limit 300 W; charger 250 W AC at 80 %;
        // linear inverter. Grid up, up, down, down, up; 400 W load; a 500 W array output in hour 1 only
        // (475 W after the controller).
        BatteryBank bank = new BatteryBank(1000, 0.2, 1.0, 0.5, 0.9, 0.9, 300, 1000);
        SystemDesign design = new SystemDesign(CONTROLLER, LINEAR, bank, new Charger(250, 0.8), Optional.empty());
        double[] load = {400, 400, 400, 400, 400};
        double[] pv = {0, 500, 0, 0, 0};
        boolean[] grid = {true, true, false, false, true};
        TracedYear run = YearSimulation.runTraced(design, HourlyConditions.offGrid(load, pv).withGridAvailable(grid),
                AnalysisOptions.NONE);
        HourlyTrace tr = run.trace();

        // h0: grid carries 400 W; charger MIN(250, 300/0.8) = 250 W AC -> 200 W DC; E = 500 + 180 = 680.
        // h1: PV 475 W, acceptance MIN(300, 320/0.9) = 300 W: PV 300 W in, 175 W curtailed, charger 0;
        //     E = 680 + 270 = 950.
        // h2: outage: inverter needs 410 W, battery gives it: E = 950 - 410/0.9.
        // h3: battery has (E - 200) * 0.9 = 265 W: inverter delivers 255 W, 145 W unmet; E = 200.
        // h4: grid back: charger 250 W AC (acceptance 300 W DC): E = 200 + 180 = 380.
        double e2 = 950 - 410 / 0.9;
        double[] gridLoad = {400, 400, 0, 0, 400};
        double[] gridChg = {250, 0, 0, 0, 250};
        double[] pvBat = {0, 300, 0, 0, 0};
        double[] curt = {0, 175, 0, 0, 0};
        double[] dis = {0, 0, 410, (e2 - 200) * 0.9, 0};
        double[] invOut = {0, 0, 400, (e2 - 200) * 0.9 - 10, 0};
        double[] unmet = {0, 0, 0, 400 - ((e2 - 200) * 0.9 - 10), 0};
        double[] stored = {680, 950, e2, 200, 380};
        for (int t = 0; t < 5; t++) {
            String at = "hour " + t;
            assertThat(tr.gridToLoadW()[t]).as(at).isCloseTo(gridLoad[t], within(WH));
            assertThat(tr.gridToChargerW()[t]).as(at).isCloseTo(gridChg[t], within(WH));
            assertThat(tr.pvToBatteryW()[t]).as(at).isCloseTo(pvBat[t], within(WH));
            assertThat(tr.pvCurtailedW()[t]).as(at).isCloseTo(curt[t], within(WH));
            assertThat(tr.batteryToInverterW()[t]).as(at).isCloseTo(dis[t], within(WH));
            assertThat(tr.inverterOutputW()[t]).as(at).isCloseTo(invOut[t], within(WH));
            assertThat(tr.unmetW()[t]).as(at).isCloseTo(unmet[t], within(WH));
            assertThat(tr.storedWh()[t]).as(at).isCloseTo(stored[t], within(WH));
        }
        assertThat(dis[3]).isCloseTo(265, within(WH));
        SimulationMetrics m = run.metrics();
        assertThat(m.grid().toLoadWh()).isCloseTo(1200, within(WH));
        assertThat(m.grid().toChargerWh()).isCloseTo(500, within(WH));
        assertThat(m.reliability().unmetHours()).isEqualTo(1);
        assertThat(m.reliability().unmetWh()).isCloseTo(145, within(WH));
    }

    @Test
    void hoursBelowThresholdsAndEquivalentCycles() {
        // The two-day case: SoC ends below 50 % once the stored energy is under 2500 Wh. From hour 24 it
        // falls 440 Wh per hour from 3214.74: below 2500 from hour 25 (2774.7 -> 2334.7), and stays there to
        // hour 47: 23 hours. Below 20 % + 1e-9: never strictly below the floor by more than rounding.
        SystemDesign design = new SystemDesign(CONTROLLER, QUADRATIC, BANK, Charger.NONE, Optional.empty());
        SimulationMetrics m = YearSimulation.run(design, HourlyConditions.offGrid(twoDayLoad(), twoDayPv()),
                new AnalysisOptions(List.of(0.5, 0.2 - 1e-9), Optional.empty()));
        assertThat(m.battery().hoursBelow()).containsExactly(new SocThresholdHours(0.5, 23),
                new SocThresholdHours(0.2 - 1e-9, 0));
        // Throughput: 16 night hours at 212 W, 5 hours at 418 W and 14 W in hour 29.
        double out = 16 * 212 + 5 * 418 + 14;
        assertThat(m.battery().dischargeWh()).isCloseTo(out, within(WH));
        assertThat(m.battery().equivalentFullCycles()).isCloseTo(out / 5000, within(1e-15));
    }

    @Test
    void batteryLifeScalesTheDamageOfAShortPeriodToAYear() {
        // The two days are 48/8760 of a year: damage per year = Miner's sum of the two days * 8760/48.
        // Cycles: rainflow of the state-of-charge series (initial 0.9, then each hour), as counted by the
        // public Rainflow API. Calendar life 15 years; demo curve.
        CycleLifeCurve curve = new CycleLifeCurve(new double[] {0.1, 1.0}, new double[] {10000, 1000});
        SystemDesign design = new SystemDesign(CONTROLLER, QUADRATIC, BANK, Charger.NONE, Optional.empty());
        TracedYear run = YearSimulation.runTraced(design, HourlyConditions.offGrid(twoDayLoad(), twoDayPv()),
                new AnalysisOptions(List.of(), Optional.of(new BatteryAging(curve, 15))));
        double[] history = new double[49];
        history[0] = 0.9;
        System.arraycopy(run.trace().soc(), 0, history, 1, 48);
        double perYear = Rainflow.minerDamage(history, curve, YearSimulation.RAINFLOW_GATE_SOC) * 8760 / 48;
        // By hand: turning points 0.9 (start), 0.54295 (end of night one), 1.0 (full from hour 12), 0.2
        // (floor): halves 0.357, 0.457, 0.8. With N = 1000 * DoD^-1: damage per half = 0.5 * DoD / 1000.
        double e7 = (4500 - 8 * 212 / 0.95) / 5000;
        double byHand = 0.5 * ((0.9 - e7) + (1.0 - e7) + (1.0 - 0.2)) / 1000 * 8760 / 48;
        BatteryLife life = run.metrics().battery().life().orElseThrow();
        assertThat(life.cycleDamagePerYear()).isCloseTo(perYear, within(1e-12));
        assertThat(life.cycleDamagePerYear()).isCloseTo(byHand, within(1e-9));
        assertThat(life.cycleLifeYears()).isCloseTo(1 / byHand, within(1e-6));
        assertThat(life.limitedBy())
                .isEqualTo(1 / byHand < 15 ? BatteryLife.Limit.CYCLING : BatteryLife.Limit.CALENDAR);
    }
}
