package org.holdover.sim;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * The hour-by-hour energy balance of a PV, battery, inverter (and optional generator or grid) system over a
 * period, usually one year.
 *
 * <h2>Model</h2>
 * Every flow is constant within its hour (hour averages), so a power in W is also that hour's energy in Wh.
 * The battery is an energy store {@code E} (Wh) between a floor and a ceiling. The inverter is on in every
 * hour without grid, so its no-load loss is drawn every such hour. The generator is on the AC bus beside the
 * inverter: while running it carries part or all of the AC load, and under cycle charging it also feeds the
 * charger. In backup mode, an hour with the grid available is carried by the grid; the inverter is then in
 * pass-through and draws nothing from the DC bus, PV only charges the battery (no export, no PV to the
 * load) and the charger tops the battery up from the grid.
 *
 * <p><b>Unmet load</b> is counted on the AC side: the hour's AC load less what the inverter, the generator
 * and the grid delivered. When the DC bus (PV plus what the battery may give) cannot supply the inverter's
 * full input for the hour, the inverter is taken to deliver, for the whole hour, the largest constant output
 * that the available DC input sustains: the closed-form inverse of the quadratic loss model
 * ({@link InverterLossModel#outputW}), and nothing if that input does not even cover its no-load loss (the
 * DC energy drawn is then lost as no-load loss before the inverter trips). Why this choice rather than
 * serving nothing: it keeps every flow a continuous, non-decreasing function of the energy available, so a
 * larger battery or more PV can never lose load, it charges the loss model at the power actually delivered,
 * and it is the same rule whether or not a generator makes up the rest. Serving nothing would throw away
 * energy the battery still holds and make the unmet energy jump with the last watt-hour.
 *
 * <h2>Per-hour equations, in the order evaluated</h2>
 * Symbols: {@code L} AC load, {@code G} PV array DC output, {@code grid} and {@code nc} (charging
 * forbidden) the hour's flags, {@code E} the stored energy at the end of the previous hour
 * ({@code E = s0 * E_nom} before hour 0), {@code on'} whether the generator ran in the previous hour (false
 * before hour 0). Parameters: {@code eta_cc, P_cc} controller efficiency and output limit; inverter
 * {@code P_r, p0, k1, k2}; battery {@code E_nom, s_lo, s_hi, eta_c, eta_d, P_c, P_d}; charger
 * {@code P_chg, eta_chg}; generator {@code P_gen} (rating), {@code P_av} (available), {@code m} (minimum
 * load ratio), {@code F0, F1}, {@code s_start}, and {@code s_set} under cycle charging. Constants:
 * <pre>
 *   E_lo  = s_lo * E_nom          E_hi = s_hi * E_nom
 *   E_res = MAX(E_lo, s_start * E_nom) with a generator, else E_lo   (the generator's reserve)
 *   E_set = s_set * E_nom         P_min = MIN(m * P_gen, P_av)
 *   Pin(x)  = x + P_r*(p0 + k1*x/P_r + k2*(x/P_r)^2)                  inverter DC input for AC output x
 *   Pout(y) = IF(y/P_r - p0 &lt;= 0, 0,
 *                P_r * 2u / ((1+k1) + SQRT((1+k1)^2 + 4*k2*u)))  with u = y/P_r - p0   (inverse of Pin)
 * </pre>
 * Each hour:
 * <pre>
 *  1  pvAvail = eta_cc * G
 *  2  pv      = MIN(pvAvail, P_cc)                      controller output to the DC bus
 *  3  clip    = pvAvail - pv
 *  4  acc     = IF(nc, 0, MAX(0, MIN(P_c, (E_hi - E) / eta_c)))    DC power the battery can take
 *
 *  Grid hour (grid = TRUE):
 *  5g gridLoad = L;  on = FALSE;  pvInv = dis = invIn = invOut = unmet = 0
 *  6g pvBat  = MIN(pv, acc);  curt = pv - pvBat
 *  7g chgIn  = MIN(P_chg, (acc - pvBat) / eta_chg)      grid into the charger, AC
 *
 *  Hour without grid:
 *  5  D      = Pin(L)                                    inverter input for the whole load
 *  6  pvInv0 = MIN(pv, D);  R = D - pvInv0;  S = pv - pvInv0
 *  7  avail1 = MIN(P_d, MAX(0, (E - E_res) * eta_d))      battery output above the reserve
 *  8  d1     = MIN(R, avail1);  R1 = R - d1               R1 &gt; 0: the DC bus falls short
 *  9  A1     = pvInv0 + d1
 * 10  t1     = IF(R1 &gt; 0, MIN(L, Pout(A1)), L)           what the inverter can deliver from A1
 * 11  on     = hasGenerator AND (L - t1 &gt; 0  OR  (cycleCharging AND on' AND E &lt; E_set))
 *
 *  a) on = FALSE (also every hour without a generator):
 *     pvInv = pvInv0;  dis = d1;  invIn = A1;  invOut = t1;  unmet = L - t1
 *     pvBat = MIN(S, acc);  curt = S - pvBat;  chgIn = genLoad = genOut = dump = 0
 *
 *  b) on = TRUE, load following (here S = 0, so pvBat = curt = chgIn = 0, pvInv = pvInv0):
 *     genLoad = MIN(P_av, L - t1)
 *     t2      = L - genLoad                               inverter's share once the generator is at its limit
 *     need2   = IF(t2 &gt; t1, MAX(0, Pin(t2) - A1), 0)
 *     avail2  = MIN(P_d - d1, MAX(0, (MIN(E, E_res) - E_lo) * eta_d))   the reserve, only for what the
 *                                                                      generator cannot carry
 *     d2      = MIN(need2, avail2)
 *     invOut  = IF(d2 &gt;= need2, t2, MIN(t2, Pout(A1 + d2)));  unmet = t2 - invOut
 *     dis = d1 + d2;  invIn = A1 + d2
 *     dump    = MAX(0, P_min - genLoad);  genOut = genLoad + dump
 *
 *  c) on = TRUE, cycle charging (the battery is not discharged while the generator can carry the load):
 *     genLoad = MIN(P_av, L);  t = L - genLoad
 *     D2      = IF(t &gt; 0, Pin(t), 0);  pvInv = MIN(pv, D2);  rem = D2 - pvInv
 *     availF  = MIN(P_d, MAX(0, (E - E_lo) * eta_d))
 *     dis     = MIN(rem, availF);  invIn = pvInv + dis
 *     invOut  = IF(rem &lt;= availF, t, MIN(t, Pout(invIn)));  unmet = t - invOut
 *     pvBat   = MIN(pv - pvInv, acc);  curt = pv - pvInv - pvBat
 *     chgIn   = MIN(P_chg, P_av - genLoad, (acc - pvBat) / eta_chg)      generator into the charger, AC
 *     dump    = MAX(0, P_min - genLoad - chgIn);  genOut = genLoad + chgIn + dump
 *
 *  Every hour:
 * 12  chgOut = eta_chg * chgIn;  batIn = pvBat + chgOut
 * 13  E_new  = E + eta_c * batIn - dis / eta_d;   soc = E_new / E_nom
 * 14  fuel   = IF(on, F0 * P_gen/1000 + F1 * genOut/1000, 0)        L
 * 15  start  = on AND NOT on'
 * </pre>
 * The hour's balance closes: {@code G + genOut + gridLoad + chgIn(grid) = (L - unmet) + (G - pv) + curt +
 * (invIn - invOut) + (1 - eta_chg)*chgIn + dump + (1 - eta_c)*batIn + (1/eta_d - 1)*dis + (E_new - E)}.
 *
 * <h2>Metrics</h2>
 * Sums of the hourly values, plus: loss-of-load probability = hours with unmet &gt; 0 / hours; unmet energy
 * fraction = unmet Wh / load Wh; lowest state of charge and hours below thresholds over the end-of-hour
 * values; equivalent full cycles = battery DC output / nominal energy; battery life by rainflow counting
 * (ASTM E1049-85 §5.4.4) of the state-of-charge series (the initial value, then each end-of-hour value;
 * reversals up to {@link #RAINFLOW_GATE_SOC} dropped first), each range taken as a depth of discharge,
 * Miner's rule against the cycle-life curve, scaled to one year (8,760 and 8,784 hours are one year; other
 * lengths count as hours / 8,760 years), and calendar life.
 *
 * <p>{@link #run} computes the metrics without allocating per hour (a fixed 256-value block feeds the
 * state-of-charge statistics); {@link #runTraced} also records every hour. Both run the same code, so their
 * metrics are identical. The code computes {@code x / eta} as {@code x * (1 / eta)}: a spreadsheet that
 * divides agrees to rounding (about 1e-16 relative per operation).
 */
public final class YearSimulation {

    /**
     * Hysteresis gate for rainflow counting of the state of charge, fraction of nominal energy: reversals of
     * 1e-6 or less (0.01 Wh on a 10 kWh bank) are dropped before counting. They are rounding noise (a bank
     * held at a floor or reserve wiggles by a few units in the last place) or wear too small to matter, and
     * counting them would cost a logarithm and an exponential each.
     */
    public static final double RAINFLOW_GATE_SOC = 1e-6;

    private static final int SOC_BLOCK = 256;

    private YearSimulation() {
    }

    /**
     * Simulates the period and returns its metrics only.
     *
     * @param design     the equipment
     * @param conditions the hourly inputs
     * @param options    thresholds and battery aging
     * @return the metrics
     */
    public static SimulationMetrics run(SystemDesign design, HourlyConditions conditions, AnalysisOptions options) {
        return simulate(design, conditions, options, null);
    }

    /**
     * Simulates the period and returns its metrics and every hour's flows.
     *
     * @param design     the equipment
     * @param conditions the hourly inputs
     * @param options    thresholds and battery aging
     * @return metrics and trace
     */
    public static TracedYear runTraced(SystemDesign design, HourlyConditions conditions, AnalysisOptions options) {
        HourlyTrace trace = new HourlyTrace(conditions.hours());
        SimulationMetrics m = simulate(design, conditions, options, trace);
        return new TracedYear(m, trace);
    }

    /** Miner's-rule damage accumulated as the rainflow counter closes ranges. */
    private static final class DamageCounter extends RainflowCounter {
        private final CycleLifeCurve curve;
        private double damage;

        DamageCounter(CycleLifeCurve curve) {
            super(RAINFLOW_GATE_SOC);
            this.curve = curve;
        }

        @Override
        void cycle(double from, double to, double count) {
            double range = Math.abs(to - from);
            if (range > 0) {
                damage += count * curve.damagePerCycle(range);
            }
        }
    }

    /** Minimum of two finite values (the loop's inputs are validated finite; no NaN or signed-zero rules). */
    private static double min(double a, double b) {
        return a < b ? a : b;
    }

    /** Maximum of two finite values. */
    private static double max(double a, double b) {
        return a > b ? a : b;
    }

    /**
     * Statistics of the end-of-hour state of charge, fed in blocks from outside the hourly loop's body so
     * that body stays small: hours below each threshold and the rainflow damage.
     */
    private static final class SocStatistics {
        final double[] block = new double[SOC_BLOCK];
        int fill;
        final double[] thresholds;
        final int[] below;
        final DamageCounter damage;

        SocStatistics(double[] thresholds, DamageCounter damage) {
            this.thresholds = thresholds;
            this.below = new int[thresholds.length];
            this.damage = damage;
        }

        void flush() {
            for (int k = 0; k < thresholds.length; k++) {
                double th = thresholds[k];
                int count = 0;
                for (int i = 0; i < fill; i++) {
                    if (block[i] < th) {
                        count++;
                    }
                }
                below[k] += count;
            }
            if (damage != null) {
                damage.pushAll(block, fill);
            }
            fill = 0;
        }
    }

    private static SimulationMetrics simulate(SystemDesign design, HourlyConditions in, AnalysisOptions options,
                                              HourlyTrace tr) {
        Objects.requireNonNull(design, "design");
        Objects.requireNonNull(in, "conditions");
        Objects.requireNonNull(options, "options");
        final double[] load = in.loadW;
        final double[] pvArray = in.pvArrayW;
        final boolean[] noCharge = in.chargeForbidden;
        final boolean[] gridUp = in.gridAvailable;
        final int n = load.length;

        final double etaCc = design.controller().efficiency();
        final double pCc = design.controller().outputLimitW();
        final InverterLossModel inv = design.inverter();
        final double pr = inv.ratedW();
        final double p0 = inv.noLoadLossPu();
        final double k1 = inv.linearLossPu();
        final double k2 = inv.quadraticLossPu();
        final double b = 1 + k1;
        final BatteryBank bat = design.battery();
        final double eNom = bat.nominalEnergyWh();
        final double eLo = bat.floorSoc() * eNom;
        final double eHi = bat.ceilingSoc() * eNom;
        final double etaC = bat.chargeEfficiency();
        final double etaD = bat.dischargeEfficiency();
        final double pC = bat.maxChargeW();
        final double pD = bat.maxDischargeW();
        final double pChg = design.charger().maxAcInputW();
        final double etaChg = design.charger().efficiency();
        // Reciprocals: multiplications keep the hour-to-hour dependency chain through E short.
        final double rEtaC = 1 / etaC;
        final double rEtaD = 1 / etaD;
        final double rEtaChg = 1 / etaChg;
        final double rPr = 1 / pr;
        final double rENom = 1 / eNom;

        final Optional<Generator> gen = design.generator();
        final boolean hasGen = gen.isPresent();
        final double pGen = hasGen ? gen.get().ratedW() : 0;
        final double pAv = hasGen ? gen.get().availableW() : 0;
        final double pMin = hasGen ? Math.min(gen.get().minLoadRatio() * pGen, pAv) : 0;
        final double f0 = hasGen ? gen.get().fuel().noLoadLPerHPerRatedKw() : 0;
        final double f1 = hasGen ? gen.get().fuel().slopeLPerKwh() : 0;
        final boolean cycleCharging = hasGen && gen.get().strategy() instanceof DispatchStrategy.CycleCharging;
        final double eSet = cycleCharging
                ? ((DispatchStrategy.CycleCharging) gen.get().strategy()).setPointSoc() * eNom : 0;
        final double eRes = hasGen ? Math.max(eLo, gen.get().startSoc() * eNom) : eLo;

        final double[] thresholds = new double[options.socThresholds().size()];
        for (int i = 0; i < thresholds.length; i++) {
            thresholds[i] = options.socThresholds().get(i);
        }
        final DamageCounter damage = options.aging().map(a -> new DamageCounter(a.cycleLife())).orElse(null);
        final SocStatistics stats = thresholds.length > 0 || damage != null
                ? new SocStatistics(thresholds, damage) : null;
        final double[] socBlock = stats != null ? stats.block : null;
        double lowestSoc = Double.POSITIVE_INFINITY;

        double e = bat.initialSoc() * eNom;
        boolean prevOn = false;
        // The state of charge goes to the rainflow counter in blocks, outside the hourly loop's body, which
        // keeps that body small (one array per run, not per hour).
        if (damage != null) {
            damage.push(e / eNom);
        }

        double sumLoad = 0;
        double sumServed = 0;
        double sumUnmet = 0;
        int unmetHours = 0;
        double sumPvArray = 0;
        double sumPv = 0;
        double sumClip = 0;
        double sumCurt = 0;
        double sumInvIn = 0;
        double sumInvOut = 0;
        double sumBatIn = 0;
        double sumDis = 0;
        int genHours = 0;
        int genStarts = 0;
        double sumFuel = 0;
        double sumGenOut = 0;
        double sumGenLoad = 0;
        double sumGenChg = 0;
        double sumDump = 0;
        double sumGridLoad = 0;
        double sumGridChg = 0;
        double soc = e / eNom;

        // Hours run in blocks: the inner loop carries no call, and the state-of-charge statistics are fed once
        // per block.
        for (int blockStart = 0; blockStart < n; blockStart += SOC_BLOCK) {
            final int blockEnd = Math.min(n, blockStart + SOC_BLOCK);
            for (int t = blockStart; t < blockEnd; t++) {
                final double l = load[t];
                final double g = pvArray[t];
                // 1-4
                final double pvAvail = etaCc * g;
                final double pv = min(pvAvail, pCc);
                final double clip = pvAvail - pv;
                final double acc = noCharge[t] ? 0 : max(0, min(pC, (eHi - e) * rEtaC));

                boolean on = false;
                double pvInv;
                double pvBat;
                double curt;
                double dis;
                double invIn;
                double invOut;
                double unmet;
                double chgIn = 0;
                double genLoad = 0;
                double dump = 0;
                double gridLoad = 0;
                double demand = 0;
                double available = 0;
                double first = 0;
                double firstOut = 0;
                double share = 0;
                double need = 0;
                double availOn = 0;
                if (gridUp[t]) {
                    gridLoad = l;
                    pvInv = 0;
                    dis = 0;
                    invIn = 0;
                    invOut = 0;
                    unmet = 0;
                    pvBat = min(pv, acc);
                    curt = pv - pvBat;
                    chgIn = min(pChg, (acc - pvBat) * rEtaChg);
                } else {
                    final double x = l * rPr;
                    final double d = l + pr * (p0 + k1 * x + k2 * x * x);
                    final double pvInv0 = min(pv, d);
                    final double r = d - pvInv0;
                    final double s = pv - pvInv0;
                    final double avail1 = min(pD, max(0, (e - eRes) * etaD));
                    demand = d;
                    available = avail1;
                    final double d1 = min(r, avail1);
                    final double r1 = r - d1;
                    final double a1 = pvInv0 + d1;
                    final double t1 = r1 > 0 ? min(l, InverterLossModel.outputW(a1, pr, p0, b, k2)) : l;
                    first = d1;
                    firstOut = t1;
                    on = hasGen && (l - t1 > 0 || (cycleCharging && prevOn && e < eSet));
                    if (!on) {
                        pvInv = pvInv0;
                        dis = d1;
                        invIn = a1;
                        invOut = t1;
                        unmet = l - t1;
                        pvBat = min(s, acc);
                        curt = s - pvBat;
                    } else if (!cycleCharging) {
                        genLoad = min(pAv, l - t1);
                        final double t2 = l - genLoad;
                        double need2 = 0;
                        if (t2 > t1) {
                            final double x2 = t2 * rPr;
                            need2 = max(0, t2 + pr * (p0 + k1 * x2 + k2 * x2 * x2) - a1);
                        }
                        final double avail2 = min(pD - d1, max(0, (min(e, eRes) - eLo) * etaD));
                        final double d2 = min(need2, avail2);
                        share = t2;
                        need = need2;
                        availOn = avail2;
                        invOut = d2 >= need2 ? t2 : min(t2, InverterLossModel.outputW(a1 + d2, pr, p0, b, k2));
                        unmet = t2 - invOut;
                        pvInv = pvInv0;
                        dis = d1 + d2;
                        invIn = a1 + d2;
                        pvBat = 0;
                        curt = s;
                        dump = max(0, pMin - genLoad);
                    } else {
                        genLoad = min(pAv, l);
                        final double tInv = l - genLoad;
                        double d2 = 0;
                        if (tInv > 0) {
                            final double x2 = tInv * rPr;
                            d2 = tInv + pr * (p0 + k1 * x2 + k2 * x2 * x2);
                        }
                        pvInv = min(pv, d2);
                        final double rem = d2 - pvInv;
                        final double availF = min(pD, max(0, (e - eLo) * etaD));
                        final boolean covered = rem <= availF;
                        share = tInv;
                        need = d2;
                        availOn = availF;
                        dis = covered ? rem : availF;
                        invIn = pvInv + dis;
                        invOut = covered ? tInv : min(tInv, InverterLossModel.outputW(invIn, pr, p0, b, k2));
                        unmet = tInv - invOut;
                        pvBat = min(pv - pvInv, acc);
                        curt = pv - pvInv - pvBat;
                        chgIn = min(pChg, min(pAv - genLoad, (acc - pvBat) * rEtaChg));
                        dump = max(0, pMin - genLoad - chgIn);
                    }
                }
                // 12-15
                final double chgOut = etaChg * chgIn;
                final double batIn = pvBat + chgOut;
                e = e + etaC * batIn - dis * rEtaD;
                soc = e * rENom;
                double genOut = 0;
                double fuel = 0;
                if (on) {
                    genOut = genLoad + chgIn + dump;
                    fuel = f0 * (pGen / 1000) + f1 * (genOut / 1000);
                    genHours++;
                    if (!prevOn) {
                        genStarts++;
                    }
                }
                prevOn = on;

                sumLoad += l;
                sumServed += l - unmet;
                if (unmet > 0) {
                    sumUnmet += unmet;
                    unmetHours++;
                }
                sumPvArray += g;
                sumPv += pv;
                sumClip += clip;
                sumCurt += curt;
                sumInvIn += invIn;
                sumInvOut += invOut;
                sumBatIn += batIn;
                sumDis += dis;
                if (on) {
                    sumFuel += fuel;
                    sumGenOut += genOut;
                    sumGenLoad += genLoad;
                    sumDump += dump;
                    sumGenChg += chgIn;
                } else if (gridLoad > 0 || chgIn > 0) {
                    sumGridLoad += gridLoad;
                    sumGridChg += chgIn;
                }
                if (soc < lowestSoc) {
                    lowestSoc = soc;
                }
                if (socBlock != null) {
                    socBlock[t - blockStart] = soc;
                }
                if (tr != null) {
                    tr.storedWh[t] = e;
                    tr.soc[t] = soc;
                    tr.pvControllerW[t] = pv;
                    tr.pvClippedW[t] = clip;
                    tr.pvToInverterW[t] = pvInv;
                    tr.pvToBatteryW[t] = pvBat;
                    tr.pvCurtailedW[t] = curt;
                    tr.batteryToInverterW[t] = dis;
                    tr.batteryChargeW[t] = batIn;
                    tr.inverterInputW[t] = invIn;
                    tr.inverterOutputW[t] = invOut;
                    tr.generatorOn[t] = on;
                    tr.generatorToLoadW[t] = genLoad;
                    tr.generatorToChargerW[t] = on ? chgIn : 0;
                    tr.generatorDumpedW[t] = dump;
                    tr.generatorOutputW[t] = genOut;
                    tr.fuelL[t] = fuel;
                    tr.gridToLoadW[t] = gridLoad;
                    tr.gridToChargerW[t] = on ? 0 : chgIn;
                    tr.chargerToBatteryW[t] = chgOut;
                    tr.unmetW[t] = unmet;
                    tr.batteryAcceptW[t] = acc;
                    tr.inverterDemandW[t] = demand;
                    tr.batteryAvailableW[t] = available;
                    tr.batteryFirstW[t] = first;
                    tr.inverterFirstOutputW[t] = firstOut;
                    tr.generatorInverterShareW[t] = share;
                    tr.generatorInverterNeedW[t] = need;
                    tr.generatorBatteryAvailableW[t] = availOn;
                }
            }
            if (socBlock != null) {
                stats.fill = blockEnd - blockStart;
                stats.flush();
            }
        }

        List<SocThresholdHours> hoursBelow = new ArrayList<>(thresholds.length);
        for (int i = 0; i < thresholds.length; i++) {
            hoursBelow.add(new SocThresholdHours(thresholds[i], stats.below[i]));
        }
        Optional<BatteryLife> life = Optional.empty();
        if (damage != null) {
            damage.finish();
            double years = n == 8784 ? 1.0 : n / 8760.0;
            life = Optional.of(BatteryLife.of(damage.damage / years, options.aging().get().calendarLifeYears()));
        }
        var reliability = new SimulationMetrics.Reliability(sumLoad, sumServed, sumUnmet, unmetHours,
                (double) unmetHours / n, sumLoad > 0 ? Math.min(1, sumUnmet / sumLoad) : 0);
        var pvm = new SimulationMetrics.Pv(sumPvArray, sumPv, sumClip, sumCurt);
        var invm = new SimulationMetrics.Inverter(sumInvIn, sumInvOut, sumInvIn - sumInvOut);
        var batm = new SimulationMetrics.Battery(lowestSoc, soc, hoursBelow, sumBatIn, sumDis, sumDis / eNom, life);
        var genm = new SimulationMetrics.GeneratorRun(genHours, genStarts, sumFuel, sumGenOut, sumGenLoad,
                sumGenChg, sumDump);
        var gridm = new SimulationMetrics.Grid(sumGridLoad, sumGridChg);
        return new SimulationMetrics(n, reliability, pvm, invm, batm, genm, gridm);
    }
}
