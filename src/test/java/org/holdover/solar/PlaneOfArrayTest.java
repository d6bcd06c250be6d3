package org.holdover.solar;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/** Transposition against the Hay–Davies test vector (REFERENCES.md §9c, D: recomputed here). */
class PlaneOfArrayTest {

    /** REFERENCES.md prints the vector to 3 decimals (W/m²): half a unit in the last place. */
    private static final double THREE_DECIMALS = 0.5e-3;
    private static final double SAME_FORMULA = 1e-9;

    // §9c inputs: β 30°, surface azimuth 180°, sun zenith 30°, sun azimuth 180°, DNI 800, DHI 100,
    // G_on 1367, ρ 0.2.
    private static final SunPosition SUN = new SunPosition(30.0, 180.0);
    private static final double DNI = 800;
    private static final double DHI = 100;
    private static final double G0N = 1367;
    private static final double GHI = DHI + DNI * Math.cos(Math.toRadians(30));
    private static final SurfaceOrientation SURFACE = new SurfaceOrientation(30.0, 180.0);

    @Test
    void hayDaviesVector() {
        // Formula, typed out here (Hay & Davies 1980; D&B §2.16; REFERENCES.md §9c).
        double cosTheta = 1.0;
        double rb = cosTheta / Math.cos(Math.toRadians(30));
        double a = DNI / G0N;
        double skyByHand = DHI * (a * rb + (1 - a) * (1 + Math.cos(Math.toRadians(30))) / 2);
        double groundByHand = GHI * 0.2 * (1 - Math.cos(Math.toRadians(30))) / 2;
        double beamByHand = DNI * cosTheta;

        PoaIrradiance p = PlaneOfArray.hour(SUN, new HorizontalIrradiance(GHI, DNI, DHI), G0N,
                new PoaSettings(SURFACE, SkyModel.HAY_DAVIES, 0.2, IncidenceAngleModifier.none()));
        assertThat(p.skyDiffuseWm2()).isCloseTo(skyByHand, within(SAME_FORMULA));
        assertThat(p.groundWm2()).isCloseTo(groundByHand, within(SAME_FORMULA));
        assertThat(p.beamWm2()).isCloseTo(beamByHand, within(SAME_FORMULA));

        // The printed vector: GHI 792.820, beam 800.000, sky 106.275, ground 10.622, POA 916.897.
        assertThat(GHI).isCloseTo(792.820, within(THREE_DECIMALS));
        assertThat(p.beamWm2()).isCloseTo(800.000, within(THREE_DECIMALS));
        assertThat(p.skyDiffuseWm2()).isCloseTo(106.275, within(THREE_DECIMALS));
        assertThat(p.groundWm2()).isCloseTo(10.622, within(THREE_DECIMALS));
        assertThat(p.totalWm2()).isCloseTo(916.897, within(THREE_DECIMALS));
        assertThat(p.incidenceDeg()).isCloseTo(0.0, within(1e-6));
    }

    @Test
    void isotropicVector() {
        PoaIrradiance p = PlaneOfArray.hour(SUN, new HorizontalIrradiance(GHI, DNI, DHI), G0N,
                new PoaSettings(SURFACE, SkyModel.ISOTROPIC, 0.2, IncidenceAngleModifier.none()));
        // REFERENCES.md §9c: isotropic sky 93.301 (D, = 100 (1 + cos 30°)/2).
        assertThat(p.skyDiffuseWm2()).isCloseTo(DHI * (1 + Math.cos(Math.toRadians(30))) / 2, within(SAME_FORMULA));
        assertThat(p.skyDiffuseWm2()).isCloseTo(93.301, within(THREE_DECIMALS));
    }

    @Test
    void hayDaviesWithNoBeamIsIsotropic() {
        // A = 0 when DNI = 0: the model reduces to the isotropic sky (Hay & Davies 1980 by construction).
        SunPosition sun = new SunPosition(60, 120);
        PoaSettings hd = new PoaSettings(SURFACE, SkyModel.HAY_DAVIES, 0.2, IncidenceAngleModifier.none());
        PoaSettings iso = new PoaSettings(SURFACE, SkyModel.ISOTROPIC, 0.2, IncidenceAngleModifier.none());
        assertThat(PlaneOfArray.hour(sun, new HorizontalIrradiance(150, 0, 150), G0N, hd).skyDiffuseWm2())
                .isCloseTo(PlaneOfArray.hour(sun, new HorizontalIrradiance(150, 0, 150), G0N, iso).skyDiffuseWm2(), within(SAME_FORMULA));
    }

    @Test
    void ashraeModifier() {
        // Souka & Safwat (1966) / ASHRAE 93-77 form: IAM = 1 − b0 (1/cos θ − 1); at 60°, 1/cos = 2 → 1 − b0.
        IncidenceAngleModifier iam = new IncidenceAngleModifier(0.05);
        assertThat(iam.atAngle(0)).isCloseTo(1.0, within(SAME_FORMULA));
        assertThat(iam.atAngle(60)).isCloseTo(0.95, within(SAME_FORMULA));
        // Zero where 1/cos θ − 1 = 1/b0, i.e. cos θ = b0 / (1 + b0), and beyond.
        double zeroAt = Math.toDegrees(Math.acos(0.05 / 1.05));
        assertThat(iam.atAngle(zeroAt - 0.01)).isPositive();
        assertThat(iam.atAngle(zeroAt + 0.01)).isZero();
        assertThat(iam.atAngle(120)).isZero();
    }

    @Test
    void modifierAppliesToTheBeamOnly() {
        SunPosition sun = new SunPosition(50, 120);
        PoaSettings with = new PoaSettings(SURFACE, SkyModel.HAY_DAVIES, 0.2, IncidenceAngleModifier.ashraeDefault());
        PoaIrradiance p = PlaneOfArray.hour(sun, new HorizontalIrradiance(500, 600, 120), G0N, with);
        assertThat(p.effectiveWm2()).isCloseTo(p.beamWm2() * p.iam() + p.skyDiffuseWm2() + p.groundWm2(),
                within(SAME_FORMULA));
        assertThat(p.iam()).isCloseTo(IncidenceAngleModifier.ashraeDefault().atAngle(p.incidenceDeg()), within(SAME_FORMULA));
        assertThat(p.effectiveWm2()).isLessThan(p.totalWm2());
    }

    @Test
    void sunBehindThePlaneGivesNoBeam() {
        PoaIrradiance p = PlaneOfArray.hour(new SunPosition(70, 0), new HorizontalIrradiance(200, 300, 100), G0N, PoaSettings.defaults(SURFACE));
        assertThat(p.incidenceDeg()).isGreaterThan(90);
        assertThat(p.beamWm2()).isZero();
        assertThat(p.iam()).isZero();
    }

    @Test
    void horizontalPlaneReceivesTheGlobalHorizontal() {
        // Energy conservation for β = 0: beam + isotropic sky + no ground = DNI cos θz + DHI = GHI.
        SunPosition sun = new SunPosition(40, 150);
        double dni = 700;
        double dhi = 110;
        double ghi = dhi + dni * Math.cos(Math.toRadians(40));
        PoaIrradiance p = PlaneOfArray.hour(sun, new HorizontalIrradiance(ghi, dni, dhi), G0N,
                new PoaSettings(new SurfaceOrientation(0, 180), SkyModel.HAY_DAVIES, 0.2, IncidenceAngleModifier.none()));
        assertThat(p.totalWm2()).isCloseTo(ghi, within(1e-9));
    }
}
