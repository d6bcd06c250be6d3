package org.holdover.dc;

import java.util.Objects;

/**
 * A conductor size as a table lists it.
 *
 * @param label   the size as printed, e.g. {@code "4/0 AWG"}, {@code "250 kcmil"}, {@code "35 mm²"}
 * @param areaMm2 nominal conductor cross-section in mm² (for AWG and kcmil: the NEC Chapter 9 Table 8 area
 *                in circular mils converted with {@link ConductorUnits#circularMilsToMm2(double)}); &gt; 0
 * @param system  the table family the size belongs to
 */
public record ConductorSize(String label, double areaMm2, TableSystem system) {

    public ConductorSize {
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(system, "system");
        if (label.isBlank()) {
            throw new IllegalArgumentException("label must not be blank");
        }
        if (!(areaMm2 > 0) || !Double.isFinite(areaMm2)) {
            throw new IllegalArgumentException("areaMm2 must be > 0, got " + areaMm2);
        }
    }

    /**
     * A metric size, labelled as IEC tables print it ({@code "1.5 mm²"}, {@code "35 mm²"}).
     *
     * @param areaMm2 nominal cross-section in mm², &gt; 0
     */
    public static ConductorSize metric(double areaMm2) {
        String number = areaMm2 == Math.rint(areaMm2)
                ? Long.toString((long) areaMm2)
                : Double.toString(areaMm2);
        return new ConductorSize(number + " mm²", areaMm2, TableSystem.IEC);
    }

    @Override
    public String toString() {
        return label;
    }
}
