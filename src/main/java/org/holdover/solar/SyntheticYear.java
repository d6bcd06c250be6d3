package org.holdover.solar;

import java.util.Objects;
import java.util.Random;

/**
 * A synthetic hourly year built from monthly means, with every intermediate quantity kept so that a
 * workbook can show the chain.
 *
 * <h2>Method</h2>
 * <ol>
 *   <li>Daily extraterrestrial irradiation H_o on the horizontal ({@link SolarGeometry#dailyExtraterrestrialWhM2}),
 *       its monthly mean, and the monthly mean clearness index K̄ = H̄ / mean(H_o).</li>
 *   <li>Daily clearness K_d: K̄ every day, or a seeded random sequence ({@link ClearnessSequence});
 *       in both cases the month's mean daily irradiation equals the input exactly. Daily irradiation
 *       H_d = K_d · H_o,d.</li>
 *   <li>Hourly global irradiation by the Collares-Pereira and Rabl (1979) ratio r_t at the hour
 *       angle of the hour's midpoint ({@link HourlyShare#collaresPereiraRabl}), set to 0 for hours
 *       whose midpoint has the sun below the horizon (SPA position), then renormalised so that the
 *       day's hours sum exactly to H_d.</li>
 *   <li>Hourly clearness k_t = GHI / (G_on cos θ_z) and the diffuse fraction by Erbs et al. (1982)
 *       ({@link DiffuseFraction#erbs}).</li>
 *   <li>DNI = (GHI − DHI) / cos θ_z. Guard near the horizon (our choice, no source): when the zenith
 *       at the hour's midpoint exceeds {@value #HORIZON_GUARD_ZENITH_DEG}°, all of the hour's
 *       irradiance is taken as diffuse (DNI = 0); DNI is also capped at G_on, the excess staying in
 *       DHI. GHI = DHI + DNI cos θ_z holds in every hour.</li>
 *   <li>Air temperature: the month's mean plus a cosine daily swing of the month's range, peaking at
 *       15:00 local standard time (shape and peak hour: common practice, no source). The swing
 *       averages to zero over each day, so monthly means are reproduced exactly; months meet with a
 *       step at midnight.</li>
 * </ol>
 */
public final class SyntheticYear {

    /** Largest accepted monthly mean clearness index K̄ (our plausibility limit; long-term monthly
     * means above about 0.75 are rare: from memory). */
    public static final double MAX_MONTHLY_CLEARNESS = 0.80;
    /** Bounds on a day's clearness index in the random sequence (our choice, no source). */
    public static final double MIN_DAILY_CLEARNESS = 0.03;
    /** Upper bound on a day's clearness index in the random sequence (our choice, no source). */
    public static final double MAX_DAILY_CLEARNESS = 0.85;
    /** Above this zenith angle at an hour's midpoint, the hour's irradiance is all diffuse (our choice). */
    public static final double HORIZON_GUARD_ZENITH_DEG = 85.0;
    /** Hour of the daily maximum air temperature, local standard time (common practice, no source). */
    public static final double DAILY_MAX_TEMP_HOUR = 15.0;

    private final WeatherYear weather;
    private final SunPath sunPath;
    private final double[] monthlyExtraterrestrialWhM2PerDay;
    private final double[] monthlyClearness;
    private final double[] dailyExtraterrestrialWhM2;
    private final double[] dailySunsetHourAngleDeg;
    private final double[] dailyClearness;
    private final double[] dailyGhiWhM2;
    private final double[] hourlyShare;
    private final double[] hourlyClearness;
    private final double[] diffuseFraction;

    private SyntheticYear(WeatherYear weather, SunPath sunPath, double[] monthlyH0, double[] monthlyK,
            double[] dailyH0, double[] dailyWs, double[] dailyK, double[] dailyH, double[] share, double[] kt,
            double[] fd) {
        this.weather = weather;
        this.sunPath = sunPath;
        this.monthlyExtraterrestrialWhM2PerDay = monthlyH0;
        this.monthlyClearness = monthlyK;
        this.dailyExtraterrestrialWhM2 = dailyH0;
        this.dailySunsetHourAngleDeg = dailyWs;
        this.dailyClearness = dailyK;
        this.dailyGhiWhM2 = dailyH;
        this.hourlyShare = share;
        this.hourlyClearness = kt;
        this.diffuseFraction = fd;
    }

    /**
     * The monthly mean clearness index K̄ implied by the climate at the site, without building the
     * year: lets a caller reject implausible input (K̄ above {@link #MAX_MONTHLY_CLEARNESS}, or
     * irradiation in a month of polar night) before calling {@link #generate}.
     *
     * @return 12 values; {@code NaN} for a month with no extraterrestrial irradiation
     */
    public static double[] monthlyClearness(Site site, int year, MonthlyClimate climate) {
        HourCalendar cal = HourCalendar.ofYear(year);
        double[] ghi = climate.ghiKwhM2PerDay();
        double[] k = new double[12];
        for (int m = 0; m < 12; m++) {
            double h0 = 0;
            for (int d = cal.firstDayOf(m); d < cal.firstDayOf(m) + cal.daysIn(m); d++) {
                h0 += SolarGeometry.dailyExtraterrestrialWhM2(site.latitudeDeg(), d + 1);
            }
            h0 /= cal.daysIn(m);
            k[m] = h0 > 0 ? ghi[m] * 1000.0 / h0 : Double.NaN;
        }
        return k;
    }

    /**
     * Builds the synthetic year.
     *
     * @param sunPath  the hourly sun positions of the wanted site and year
     * @param climate  monthly means
     * @param sequence how daily clearness varies within a month
     * @throws IllegalArgumentException when a month's K̄ exceeds {@link #MAX_MONTHLY_CLEARNESS} or a
     *                                  month with irradiation has no extraterrestrial irradiation
     */
    public static SyntheticYear generate(SunPath sunPath, MonthlyClimate climate, ClearnessSequence sequence) {
        Objects.requireNonNull(sunPath, "sunPath");
        Objects.requireNonNull(climate, "climate");
        Objects.requireNonNull(sequence, "sequence");
        Site site = sunPath.site();
        HourCalendar cal = sunPath.calendar();
        int days = cal.days();
        int hours = cal.hours();
        double lat = site.latitudeDeg();
        double[] ghiMonthWh = climate.ghiKwhM2PerDay();
        for (int m = 0; m < 12; m++) {
            ghiMonthWh[m] *= 1000.0;
        }

        double[] dailyH0 = new double[days];
        double[] dailyWs = new double[days];
        for (int d = 0; d < days; d++) {
            dailyH0[d] = SolarGeometry.dailyExtraterrestrialWhM2(lat, d + 1);
            dailyWs[d] = SolarGeometry.sunsetHourAngleDeg(lat, SolarGeometry.declinationDeg(d + 1));
        }
        double[] monthlyH0 = new double[12];
        double[] monthlyK = new double[12];
        for (int m = 0; m < 12; m++) {
            double sum = 0;
            for (int d = cal.firstDayOf(m); d < cal.firstDayOf(m) + cal.daysIn(m); d++) {
                sum += dailyH0[d];
            }
            monthlyH0[m] = sum / cal.daysIn(m);
            if (monthlyH0[m] <= 0) {
                if (ghiMonthWh[m] > 0) {
                    throw new IllegalArgumentException("month " + (m + 1) + " has no extraterrestrial irradiation"
                            + " at latitude " + lat + " but " + ghiMonthWh[m] / 1000 + " kWh/m²/day was given");
                }
                monthlyK[m] = 0;
            } else {
                monthlyK[m] = ghiMonthWh[m] / monthlyH0[m];
            }
            if (monthlyK[m] > MAX_MONTHLY_CLEARNESS) {
                throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                        "month %d: %.3f kWh/m²/day gives a mean clearness index of %.3f, above the plausible %.2f",
                        m + 1, ghiMonthWh[m] / 1000, monthlyK[m], MAX_MONTHLY_CLEARNESS));
            }
        }

        double[] dailyK = dailyClearness(cal, monthlyK, dailyH0, ghiMonthWh, sequence);
        double[] dailyH = new double[days];
        for (int d = 0; d < days; d++) {
            dailyH[d] = dailyK[d] * dailyH0[d];
        }

        double[] ghi = new double[hours];
        double[] dni = new double[hours];
        double[] dhi = new double[hours];
        double[] temp = new double[hours];
        double[] share = new double[hours];
        double[] kt = new double[hours];
        double[] fd = new double[hours];
        double[] tMean = climate.airTempC();
        double[] tRange = climate.dailyTempRangeC();
        double cosGuard = Math.cos(Math.toRadians(HORIZON_GUARD_ZENITH_DEG));

        for (int d = 0; d < days; d++) {
            int h0 = d * 24;
            double sum = 0;
            for (int k = 0; k < 24; k++) {
                int h = h0 + k;
                double w = sunPath.zenithDeg(h) < 90.0
                        ? HourlyShare.collaresPereiraRabl(sunPath.hourAngleDeg(h), dailyWs[d]) : 0.0;
                share[h] = w;
                sum += w;
            }
            if (sum <= 0 && dailyH[d] > 0) {
                // The day has extraterrestrial irradiation but no hour midpoint inside the CPR window:
                // fall back to the extraterrestrial horizontal profile, else the hour of highest sun.
                for (int k = 0; k < 24; k++) {
                    share[h0 + k] = sunPath.extraterrestrialHorizontalWm2(h0 + k);
                    sum += share[h0 + k];
                }
                if (sum <= 0) {
                    int best = h0;
                    for (int k = 1; k < 24; k++) {
                        if (sunPath.zenithDeg(h0 + k) < sunPath.zenithDeg(best)) {
                            best = h0 + k;
                        }
                    }
                    share[best] = 1.0;
                    sum = 1.0;
                }
            }
            for (int k = 0; k < 24; k++) {
                int h = h0 + k;
                share[h] = sum > 0 ? share[h] / sum : 0.0;
                double g = dailyH[d] * share[h];
                ghi[h] = g;
                double cosZ = Math.cos(Math.toRadians(sunPath.zenithDeg(h)));
                double g0n = sunPath.extraterrestrialNormalWm2(h);
                double i0 = g0n * Math.max(0.0, cosZ);
                if (g <= 0) {
                    kt[h] = 0;
                    fd[h] = 0;
                    continue;
                }
                kt[h] = i0 > 0 ? g / i0 : 0.0;
                if (cosZ < cosGuard) {
                    fd[h] = 1.0;
                    dhi[h] = g;
                    dni[h] = 0.0;
                } else {
                    fd[h] = DiffuseFraction.erbs(kt[h]);
                    double beamHorizontal = g * (1.0 - fd[h]);
                    double n = Math.min(beamHorizontal / cosZ, g0n);
                    dni[h] = n;
                    dhi[h] = Math.max(0.0, g - n * cosZ);
                }
            }
        }
        for (int h = 0; h < hours; h++) {
            int m = cal.monthOfHour(h);
            double hourOfDay = (h % 24) + 0.5;
            temp[h] = tMean[m] + tRange[m] / 2.0 * Math.cos(2 * Math.PI * (hourOfDay - DAILY_MAX_TEMP_HOUR) / 24.0);
        }
        String description = "synthetic year from monthly means, " + describe(sequence);
        WeatherYear weather = new WeatherYear(description, ghi, dni, dhi, temp);
        return new SyntheticYear(weather, sunPath, monthlyH0, monthlyK, dailyH0, dailyWs, dailyK, dailyH, share, kt, fd);
    }

    private static String describe(ClearnessSequence s) {
        if (s instanceof ClearnessSequence.SeededRandom r) {
            return "random daily clearness (seed " + r.seed() + ", spread " + r.relativeSpread() + ", lag-1 " + r.lag1() + ")";
        }
        return "uniform daily clearness";
    }

    private static double[] dailyClearness(HourCalendar cal, double[] monthlyK, double[] dailyH0,
            double[] ghiMonthWh, ClearnessSequence sequence) {
        double[] k = new double[cal.days()];
        if (sequence instanceof ClearnessSequence.SeededRandom r) {
            Random random = new Random(r.seed());
            double rho = r.lag1();
            double innov = Math.sqrt(1 - rho * rho);
            double z = 0;
            double[] zs = new double[cal.days()];
            for (int d = 0; d < cal.days(); d++) {
                double e = random.nextGaussian();
                z = d == 0 ? e : rho * z + innov * e;
                zs[d] = z;
            }
            for (int m = 0; m < 12; m++) {
                int first = cal.firstDayOf(m);
                int n = cal.daysIn(m);
                double mean = 0;
                for (int d = first; d < first + n; d++) {
                    mean += zs[d];
                }
                mean /= n;
                double lo = Math.min(MIN_DAILY_CLEARNESS, monthlyK[m]);
                for (int d = first; d < first + n; d++) {
                    k[d] = clamp(monthlyK[m] * (1 + r.relativeSpread() * (zs[d] - mean)), lo, MAX_DAILY_CLEARNESS);
                }
                fitMonth(k, dailyH0, first, n, ghiMonthWh[m] * n, lo, m);
            }
        } else {
            for (int m = 0; m < 12; m++) {
                int first = cal.firstDayOf(m);
                int n = cal.daysIn(m);
                for (int d = first; d < first + n; d++) {
                    k[d] = monthlyK[m];
                }
                fitMonth(k, dailyH0, first, n, ghiMonthWh[m] * n, 0.0, m);
            }
        }
        return k;
    }

    /** Scales the month's free days so that Σ K_d H_o,d equals the target, holding days at the bounds. */
    private static void fitMonth(double[] k, double[] h0, int first, int n, double targetWh, double lo, int month) {
        boolean[] held = new boolean[n];
        for (int iter = 0; iter < 100; iter++) {
            double fixed = 0;
            double free = 0;
            for (int i = 0; i < n; i++) {
                double e = k[first + i] * h0[first + i];
                if (held[i]) {
                    fixed += e;
                } else {
                    free += e;
                }
            }
            double residual = targetWh - fixed;
            if (free <= 0) {
                if (Math.abs(residual) <= 1e-9 * Math.max(1.0, targetWh)) {
                    return;
                }
                throw new IllegalArgumentException("month " + (month + 1)
                        + ": cannot reach the mean irradiation within the daily clearness bounds");
            }
            double f = residual / free;
            boolean newlyHeld = false;
            for (int i = 0; i < n; i++) {
                if (held[i]) {
                    continue;
                }
                double v = k[first + i] * f;
                if (v > MAX_DAILY_CLEARNESS) {
                    v = MAX_DAILY_CLEARNESS;
                    held[i] = true;
                    newlyHeld = true;
                } else if (v < lo) {
                    v = lo;
                    held[i] = true;
                    newlyHeld = true;
                }
                k[first + i] = v;
            }
            if (!newlyHeld) {
                return;
            }
        }
        throw new IllegalStateException("daily clearness fit did not settle in month " + (month + 1));
    }

    private static double clamp(double v, double lo, double hi) {
        return Math.max(lo, Math.min(hi, v));
    }

    /** The hourly weather. */
    public WeatherYear weather() {
        return weather;
    }

    /** The sun path the year was built on. */
    public SunPath sunPath() {
        return sunPath;
    }

    /** Monthly mean daily extraterrestrial horizontal irradiation, Wh/m²/day. */
    public double[] monthlyExtraterrestrialWhM2PerDay() {
        return monthlyExtraterrestrialWhM2PerDay.clone();
    }

    /** Monthly mean clearness index K̄ = H̄ / H̄_o. */
    public double[] monthlyClearness() {
        return monthlyClearness.clone();
    }

    /** Daily extraterrestrial horizontal irradiation H_o, Wh/m², one value per day. */
    public double[] dailyExtraterrestrialWhM2() {
        return dailyExtraterrestrialWhM2.clone();
    }

    /** Daily sunset hour angle ω_s, degrees. */
    public double[] dailySunsetHourAngleDeg() {
        return dailySunsetHourAngleDeg.clone();
    }

    /** Daily clearness index K_d. */
    public double[] dailyClearness() {
        return dailyClearness.clone();
    }

    /** Daily global horizontal irradiation H_d, Wh/m². */
    public double[] dailyGhiWhM2() {
        return dailyGhiWhM2.clone();
    }

    /** Each hour's renormalised share of its day's irradiation (sums to 1 over a day with sun). */
    public double[] hourlyShare() {
        return hourlyShare.clone();
    }

    /** Hourly clearness index k_t = GHI / (G_on cos θ_z); 0 in hours without irradiation. */
    public double[] hourlyClearness() {
        return hourlyClearness.clone();
    }

    /** Hourly diffuse fraction DHI / GHI (Erbs, or 1 under the horizon guard); 0 in hours without irradiation. */
    public double[] diffuseFraction() {
        return diffuseFraction.clone();
    }
}
