package org.holdover.pv;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * A module's temperature coefficients, each a fraction of its STC value per °C of cell temperature
 * (a datasheet's −0.35 %/°C is −0.0035).
 *
 * @param pmaxPerC coefficient of maximum power, in (−0.01, 0)
 * @param vocPerC  coefficient of open-circuit voltage, in (−0.01, 0), when the datasheet gives it;
 *                 without it the cold-voltage check falls back to NEC Table 690.7(A)
 * @param iscPerC  coefficient of short-circuit current, in [0, 0.002], when given
 * @param vmpPerC  coefficient of maximum-power voltage, in (−0.01, 0), when given
 */
public record TemperatureCoefficients(double pmaxPerC, OptionalDouble vocPerC, OptionalDouble iscPerC,
        OptionalDouble vmpPerC) {

    /**
     * Isc coefficient assumed when the datasheet gives none, +0.05 %/°C, typical of crystalline silicon
     * (common practice, no source).
     */
    public static final double TYPICAL_ISC_PER_C = 0.0005;
    /**
     * Voc coefficient assumed for hourly modelling only (never for the code voltage check) when the
     * datasheet gives none, −0.30 %/°C, typical of crystalline silicon (common practice, no source).
     */
    public static final double TYPICAL_VOC_PER_C = -0.0030;

    public TemperatureCoefficients {
        Objects.requireNonNull(vocPerC, "vocPerC");
        Objects.requireNonNull(iscPerC, "iscPerC");
        Objects.requireNonNull(vmpPerC, "vmpPerC");
        if (!(pmaxPerC > -0.01 && pmaxPerC < 0)) {
            throw new IllegalArgumentException("pmaxPerC must be in (-0.01, 0), got " + pmaxPerC);
        }
        if (vocPerC.isPresent() && !(vocPerC.getAsDouble() > -0.01 && vocPerC.getAsDouble() < 0)) {
            throw new IllegalArgumentException("vocPerC must be in (-0.01, 0), got " + vocPerC.getAsDouble());
        }
        if (iscPerC.isPresent() && !(iscPerC.getAsDouble() >= 0 && iscPerC.getAsDouble() <= 0.002)) {
            throw new IllegalArgumentException("iscPerC must be in [0, 0.002], got " + iscPerC.getAsDouble());
        }
        if (vmpPerC.isPresent() && !(vmpPerC.getAsDouble() > -0.01 && vmpPerC.getAsDouble() < 0)) {
            throw new IllegalArgumentException("vmpPerC must be in (-0.01, 0), got " + vmpPerC.getAsDouble());
        }
    }

    /** All three common coefficients given; V_mp's derived. */
    public static TemperatureCoefficients of(double pmaxPerC, double vocPerC, double iscPerC) {
        return new TemperatureCoefficients(pmaxPerC, OptionalDouble.of(vocPerC), OptionalDouble.of(iscPerC),
                OptionalDouble.empty());
    }

    /** Only the power coefficient given. */
    public static TemperatureCoefficients powerOnly(double pmaxPerC) {
        return new TemperatureCoefficients(pmaxPerC, OptionalDouble.empty(), OptionalDouble.empty(),
                OptionalDouble.empty());
    }

    /** The Isc coefficient used in modelling: the datasheet's, else {@link #TYPICAL_ISC_PER_C}. */
    public double iscPerCForModelling() {
        return iscPerC.orElse(TYPICAL_ISC_PER_C);
    }

    /** The Voc coefficient used in hourly modelling: the datasheet's, else {@link #TYPICAL_VOC_PER_C}. */
    public double vocPerCForModelling() {
        return vocPerC.orElse(TYPICAL_VOC_PER_C);
    }

    /**
     * The V_mp coefficient used: the datasheet's, else P_max's minus I_sc's, since P = V · I and I_mp
     * follows I_sc (common practice, no source). Larger in magnitude than P_max's, so the hot-voltage
     * check errs on the safe side.
     */
    public double vmpPerCForModelling() {
        return vmpPerC.orElse(pmaxPerC - iscPerCForModelling());
    }
}
