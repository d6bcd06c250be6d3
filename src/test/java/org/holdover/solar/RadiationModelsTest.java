package org.holdover.solar;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;

/** Diffuse fraction and hourly-share models against their published formulas and check values. */
class RadiationModelsTest {

    /** REFERENCES.md prints the check values to 5 decimals: half a unit in the last place. */
    private static final double FIVE_DECIMALS = 0.5e-5;
    /** Printed to 4 decimals (declination, ωs): half a unit in the last place. */
    private static final double FOUR_DECIMALS = 0.5e-4;
    /** Our engine against the same formula typed out independently here: rounding only. */
    private static final double SAME_FORMULA = 1e-12;

    /** Erbs et al. (1982) correlation, typed out independently of the engine. */
    private static double erbsByHand(double kt) {
        if (kt <= 0.22) {
            return 1.0 - 0.09 * kt;
        }
        if (kt <= 0.80) {
            return 0.9511 - 0.1604 * kt + 4.388 * kt * kt - 16.638 * Math.pow(kt, 3) + 12.336 * Math.pow(kt, 4);
        }
        return 0.165;
    }

    @ParameterizedTest
    @CsvFileSource(resources = "erbs-check-values.csv")
    void erbsCheckValues(double kt, double printed) {
        // Erbs, Klein & Duffie (1982), Solar Energy 28(4):293-302; REFERENCES.md §9a (D: recomputed here).
        double expected = erbsByHand(kt);
        assertThat(DiffuseFraction.erbs(kt)).isCloseTo(expected, within(SAME_FORMULA));
        assertThat(expected).isCloseTo(printed, within(FIVE_DECIMALS));
    }

    @Test
    void erbsBranchesAreTheLinearAndConstantOnesJustInsideTheBoundaries() {
        // REFERENCES.md §9a: the correlation is not continuous at 0.22 and 0.80, so pin the branches.
        assertThat(DiffuseFraction.erbs(0.22)).isCloseTo(1.0 - 0.09 * 0.22, within(SAME_FORMULA));
        assertThat(DiffuseFraction.erbs(0.8000001)).isEqualTo(0.165);
        assertThatThrownBy(() -> DiffuseFraction.erbs(-0.1)).isInstanceOf(IllegalArgumentException.class);
    }

    @ParameterizedTest
    @CsvFileSource(resources = "hourly-share-vectors.csv")
    void collaresPereiraRablAndLiuJordanVectors(double lat, int n, double omega, double delta, double ws, double a,
            double b, double rt, double rd) {
        // Duffie & Beckman §1.6 (Cooper declination) and §2.13 (CPR 1979, Liu & Jordan 1960); REFERENCES.md §9b, D.
        double deltaByHand = 23.45 * Math.sin(Math.toRadians(360.0 * (284 + n) / 365.0));
        double wsByHand = Math.toDegrees(Math.acos(-Math.tan(Math.toRadians(lat)) * Math.tan(Math.toRadians(deltaByHand))));
        double wsRad = Math.toRadians(wsByHand);
        double aByHand = 0.409 + 0.5016 * Math.sin(wsRad - Math.toRadians(60));
        double bByHand = 0.6609 - 0.4767 * Math.sin(wsRad - Math.toRadians(60));
        double rdByHand = Math.PI / 24 * (Math.cos(Math.toRadians(omega)) - Math.cos(wsRad))
                / (Math.sin(wsRad) - wsRad * Math.cos(wsRad));
        double rtByHand = (aByHand + bByHand * Math.cos(Math.toRadians(omega))) * rdByHand;

        assertThat(SolarGeometry.declinationDeg(n)).isCloseTo(deltaByHand, within(SAME_FORMULA));
        assertThat(SolarGeometry.sunsetHourAngleDeg(lat, deltaByHand)).isCloseTo(wsByHand, within(SAME_FORMULA));
        assertThat(HourlyShare.cprA(wsByHand)).isCloseTo(aByHand, within(SAME_FORMULA));
        assertThat(HourlyShare.cprB(wsByHand)).isCloseTo(bByHand, within(SAME_FORMULA));
        assertThat(HourlyShare.collaresPereiraRabl(omega, wsByHand)).isCloseTo(rtByHand, within(SAME_FORMULA));
        assertThat(HourlyShare.liuJordan(omega, wsByHand)).isCloseTo(rdByHand, within(SAME_FORMULA));

        assertThat(deltaByHand).isCloseTo(delta, within(FOUR_DECIMALS));
        assertThat(wsByHand).isCloseTo(ws, within(FOUR_DECIMALS));
        assertThat(aByHand).isCloseTo(a, within(FIVE_DECIMALS));
        assertThat(bByHand).isCloseTo(b, within(FIVE_DECIMALS));
        assertThat(rtByHand).isCloseTo(rt, within(FIVE_DECIMALS));
        assertThat(rdByHand).isCloseTo(rd, within(FIVE_DECIMALS));
    }

    @Test
    void sharesVanishOutsideDaylightAndIntegrateToAboutOne() {
        double ws = 100.4912;
        assertThat(HourlyShare.collaresPereiraRabl(-105, ws)).isZero();
        assertThat(HourlyShare.liuJordan(105, ws)).isZero();
        // The ratios are densities over the day: summed over the 24 hour midpoints they come close to 1
        // (Duffie & Beckman §2.13 note they do not sum exactly to 1; within 2 % is our stated tolerance).
        double sumT = 0;
        double sumD = 0;
        for (int k = 0; k < 24; k++) {
            double w = 15.0 * (k + 0.5 - 12);
            sumT += HourlyShare.collaresPereiraRabl(w, ws);
            sumD += HourlyShare.liuJordan(w, ws);
        }
        assertThat(sumT).isCloseTo(1.0, within(0.02));
        assertThat(sumD).isCloseTo(1.0, within(0.02));
    }
}
