package org.holdover.pv;

/**
 * A module's nameplate ratings at standard test conditions (STC: 1000 W/m², cell 25 °C, AM 1.5).
 *
 * @param powerW maximum power P_mp, W, &gt; 0
 * @param vmpV   voltage at maximum power, V, &gt; 0 and &lt; Voc
 * @param impA   current at maximum power, A, &gt; 0 and &lt; Isc
 * @param vocV   open-circuit voltage, V, &gt; 0
 * @param iscA   short-circuit current, A, &gt; 0
 */
public record StcRatings(double powerW, double vmpV, double impA, double vocV, double iscA) {

    /** Datasheets round; P_mp and V_mp · I_mp must agree within this fraction. */
    static final double POWER_CONSISTENCY = 0.05;

    public StcRatings {
        if (!(powerW > 0 && vmpV > 0 && impA > 0 && vocV > 0 && iscA > 0)) {
            throw new IllegalArgumentException("STC ratings must be > 0");
        }
        if (!(vmpV < vocV)) {
            throw new IllegalArgumentException("vmpV must be below vocV, got " + vmpV + " >= " + vocV);
        }
        if (!(impA < iscA)) {
            throw new IllegalArgumentException("impA must be below iscA, got " + impA + " >= " + iscA);
        }
        if (Math.abs(vmpV * impA - powerW) > POWER_CONSISTENCY * powerW) {
            throw new IllegalArgumentException("powerW " + powerW + " disagrees with vmpV × impA = " + vmpV * impA);
        }
    }
}
