package org.holdover.solar;

import java.util.Objects;

/**
 * Irradiance on the array plane from horizontal components (transposition).
 *
 * <p>Conventions: tilt β from horizontal; azimuths clockwise from north (surface 180° faces south);
 * cos θ = cos θ_z cos β + sin θ_z sin β cos(γ_s − γ).
 * <ul>
 *   <li>beam = DNI · max(0, cos θ), zero when the sun is below the horizon;</li>
 *   <li>sky diffuse: isotropic DHI (1 + cos β)/2, or Hay–Davies DHI [A R_b + (1 − A)(1 + cos β)/2],
 *       A = DNI / G_on, R_b = max(0, cos θ) / max(cos θ_z, cos 89°) (the floor on cos θ_z is our
 *       guard against division near the horizon);</li>
 *   <li>ground = GHI ρ (1 − cos β)/2 (isotropic ground reflection);</li>
 *   <li>reflection loss on the beam only, by the ASHRAE incidence angle modifier.</li>
 * </ul>
 */
public final class PlaneOfArray {

    /** Floor on cos θ_z in R_b: cos 89° (our choice). */
    public static final double MIN_COS_ZENITH = Math.cos(Math.toRadians(89.0));

    private PlaneOfArray() {
    }

    /**
     * One hour's irradiance on the plane.
     *
     * @param sun                       sun position at the hour's midpoint
     * @param horizontal                GHI, DNI and DHI, W/m²
     * @param extraterrestrialNormalWm2 G_on, W/m², &gt; 0 (only Hay–Davies uses it)
     * @param settings                  orientation, sky model, albedo, IAM
     */
    public static PoaIrradiance hour(SunPosition sun, HorizontalIrradiance horizontal, double extraterrestrialNormalWm2,
            PoaSettings settings) {
        Objects.requireNonNull(sun, "sun");
        Objects.requireNonNull(horizontal, "horizontal");
        Objects.requireNonNull(settings, "settings");
        if (!(extraterrestrialNormalWm2 > 0)) {
            throw new IllegalArgumentException("extraterrestrialNormalWm2 must be > 0, got " + extraterrestrialNormalWm2);
        }
        return compute(sun.zenithDeg(), sun.azimuthDeg(), horizontal.ghiWm2(), horizontal.dniWm2(), horizontal.dhiWm2(),
                extraterrestrialNormalWm2, settings);
    }

    static PoaIrradiance compute(double zenithDeg, double sunAzimuthDeg, double ghi, double dni, double dhi,
            double g0n, PoaSettings s) {
        SurfaceOrientation o = s.orientation();
        double cosTheta = SolarGeometry.cosIncidence(zenithDeg, sunAzimuthDeg, o.tiltDeg(), o.azimuthDeg());
        cosTheta = Math.max(-1.0, Math.min(1.0, cosTheta));
        double incidenceDeg = Math.toDegrees(Math.acos(cosTheta));
        boolean sunUp = zenithDeg < 90.0;
        double cosBeta = o.cosTilt();
        double beam = sunUp ? dni * Math.max(0.0, cosTheta) : 0.0;
        double isoView = o.skyViewFactor();
        double sky;
        double a = 0.0;
        double rb = 0.0;
        if (s.skyModel() == SkyModel.HAY_DAVIES && sunUp) {
            a = Math.min(1.0, dni / g0n);
            double cosZ = Math.max(Math.cos(Math.toRadians(zenithDeg)), MIN_COS_ZENITH);
            rb = Math.max(0.0, cosTheta) / cosZ;
            sky = dhi * (a * rb + (1 - a) * isoView);
        } else {
            sky = dhi * isoView;
        }
        double ground = ghi * s.albedo() * (1 - cosBeta) / 2.0;
        double iam = sunUp ? s.iam().atCos(cosTheta) : 0.0;
        double total = beam + sky + ground;
        double effective = beam * iam + sky + ground;
        return new PoaIrradiance(incidenceDeg, beam, iam, sky, ground, total, effective, cosTheta, a, rb);
    }

    /**
     * The plane-of-array irradiance for every hour of a weather year.
     *
     * @param weather  hourly weather
     * @param sunPath  sun positions for the same hours (same length)
     * @param settings orientation, sky model, albedo, IAM
     */
    public static PoaSeries hourly(WeatherYear weather, SunPath sunPath, PoaSettings settings) {
        Objects.requireNonNull(weather, "weather");
        Objects.requireNonNull(sunPath, "sunPath");
        Objects.requireNonNull(settings, "settings");
        if (weather.hours() != sunPath.hours()) {
            throw new IllegalArgumentException("weather has " + weather.hours() + " hours but the sun path "
                    + sunPath.hours() + " (year " + sunPath.year() + ")");
        }
        int n = weather.hours();
        double[] inc = new double[n];
        double[] beam = new double[n];
        double[] iam = new double[n];
        double[] sky = new double[n];
        double[] ground = new double[n];
        double[] total = new double[n];
        double[] eff = new double[n];
        double[] cos = new double[n];
        double[] aniso = new double[n];
        double[] rb = new double[n];
        for (int h = 0; h < n; h++) {
            PoaIrradiance p = compute(sunPath.zenithDeg(h), sunPath.azimuthDeg(h), weather.ghiWm2(h),
                    weather.dniWm2(h), weather.dhiWm2(h), sunPath.extraterrestrialNormalWm2(h), settings);
            inc[h] = p.incidenceDeg();
            beam[h] = p.beamWm2();
            iam[h] = p.iam();
            sky[h] = p.skyDiffuseWm2();
            ground[h] = p.groundWm2();
            total[h] = p.totalWm2();
            eff[h] = p.effectiveWm2();
            cos[h] = p.cosIncidence();
            aniso[h] = p.anisotropyIndex();
            rb[h] = p.beamRatio();
        }
        return new PoaSeries(settings, inc, beam, iam, sky, ground, total, eff, cos, aniso, rb);
    }
}
