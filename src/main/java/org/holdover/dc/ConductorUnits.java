package org.holdover.dc;

/**
 * Conversions at the edges: American Wire Gauge, circular mils, kcmil, feet, ohm per 1000 ft, Fahrenheit.
 * Inside the engine everything is SI (mm², m, Ω/m, °C).
 */
public final class ConductorUnits {

    /** One foot in metres (exact, international foot). */
    public static final double METRES_PER_FOOT = 0.3048;

    /** One inch in millimetres (exact). */
    public static final double MM_PER_INCH = 25.4;

    /** One circular mil in mm²: the area of a circle one thousandth of an inch across, π/4 × (0.0254 mm)². */
    public static final double MM2_PER_CIRCULAR_MIL = Math.PI / 4.0 * (MM_PER_INCH / 1000.0) * (MM_PER_INCH / 1000.0);

    /**
     * Multiply a resistance in ohm per 1000 ft (NEC Chapter 9 Table 8) by this to get ohm per metre:
     * 1 / (1000 × 0.3048 m) = 1 / 304.8 m.
     */
    public static final double OHM_PER_M_PER_OHM_PER_KFT = 1.0 / (1000.0 * METRES_PER_FOOT);

    /** AWG diameter law (ASTM B258): 36 AWG is 0.005 in across and 4/0 (written 0000, gauge −3) 0.46 in. */
    private static final double AWG_36_DIAMETER_MM = 0.005 * MM_PER_INCH;
    private static final double AWG_RATIO_BASE = 92.0;
    private static final double AWG_STEPS = 39.0;

    private ConductorUnits() {
    }

    /**
     * Diameter of a solid round wire of the given gauge by the AWG law d = 0.127 mm × 92^((36 − n)/39).
     *
     * @param gauge AWG number; 1/0, 2/0, 3/0, 4/0 are 0, −1, −2, −3
     * @return diameter in mm
     */
    public static double awgDiameterMm(int gauge) {
        if (gauge < -3 || gauge > 40) {
            throw new IllegalArgumentException("gauge must be in -3 (4/0) .. 40, got " + gauge);
        }
        return AWG_36_DIAMETER_MM * Math.pow(AWG_RATIO_BASE, (36 - gauge) / AWG_STEPS);
    }

    /**
     * Cross-section of a solid round wire of the given gauge (the AWG law; stranded conductors of the same
     * gauge have the same nominal area to within a fraction of a percent, see NEC Chapter 9 Table 8).
     *
     * @param gauge AWG number; 1/0 to 4/0 are 0 to −3
     * @return area in mm²
     */
    public static double awgAreaMm2(int gauge) {
        double d = awgDiameterMm(gauge);
        return Math.PI / 4.0 * d * d;
    }

    /**
     * Parses an AWG label such as {@code "4"}, {@code "4 AWG"}, {@code "2/0"} or {@code "2/0 AWG"} to its gauge
     * number (1/0 → 0, 2/0 → −1, 3/0 → −2, 4/0 → −3).
     */
    public static int parseAwg(String label) {
        String s = label.trim();
        if (s.toUpperCase(java.util.Locale.ROOT).endsWith("AWG")) {
            s = s.substring(0, s.length() - 3).trim();
        }
        if (s.endsWith("/0")) {
            int zeros = Integer.parseInt(s.substring(0, s.length() - 2));
            if (zeros < 1 || zeros > 4) {
                throw new IllegalArgumentException("AWG must be 1/0 .. 4/0, got " + label);
            }
            return 1 - zeros;
        }
        return Integer.parseInt(s);
    }

    /**
     * @param circularMils area in circular mils, ≥ 0
     * @return area in mm²
     */
    public static double circularMilsToMm2(double circularMils) {
        return circularMils * MM2_PER_CIRCULAR_MIL;
    }

    /**
     * @param kcmil area in thousands of circular mils (MCM), ≥ 0
     * @return area in mm²
     */
    public static double kcmilToMm2(double kcmil) {
        return circularMilsToMm2(kcmil * 1000.0);
    }

    /**
     * @param areaMm2 area in mm²
     * @return area in kcmil
     */
    public static double mm2ToKcmil(double areaMm2) {
        return areaMm2 / MM2_PER_CIRCULAR_MIL / 1000.0;
    }

    /**
     * @param ohmPerKft resistance in ohm per 1000 ft
     * @return ohm per metre
     */
    public static double ohmPerKftToOhmPerM(double ohmPerKft) {
        return ohmPerKft * OHM_PER_M_PER_OHM_PER_KFT;
    }

    /**
     * @param ohmPerKm resistance in ohm per km (= mΩ/m, as IEC 60228 prints it)
     * @return ohm per metre
     */
    public static double ohmPerKmToOhmPerM(double ohmPerKm) {
        return ohmPerKm / 1000.0;
    }

    /**
     * @param feet length in feet
     * @return metres
     */
    public static double feetToMetres(double feet) {
        return feet * METRES_PER_FOOT;
    }

    /**
     * @param metres length in metres
     * @return feet
     */
    public static double metresToFeet(double metres) {
        return metres / METRES_PER_FOOT;
    }

    /**
     * @param fahrenheit temperature in °F
     * @return °C
     */
    public static double fahrenheitToCelsius(double fahrenheit) {
        return (fahrenheit - 32.0) * 5.0 / 9.0;
    }
}
