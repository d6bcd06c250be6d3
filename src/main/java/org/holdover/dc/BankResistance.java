package org.holdover.dc;

/** Internal resistance of a battery bank built from identical modules. */
public final class BankResistance {

    private BankResistance() {
    }

    /**
     * Series strings of modules, strings in parallel: R = R_module × series ÷ parallel.
     *
     * @param moduleResistanceOhm internal resistance of one module at the temperature and state of charge of
     *                            interest, Ω, ≥ 0
     * @param modulesInSeries     modules per string, ≥ 1
     * @param stringsInParallel   strings, ≥ 1
     * @return bank resistance, Ω
     */
    public static double ofModules(double moduleResistanceOhm, int modulesInSeries, int stringsInParallel) {
        if (!(moduleResistanceOhm >= 0) || !Double.isFinite(moduleResistanceOhm)) {
            throw new IllegalArgumentException("moduleResistanceOhm must be >= 0, got " + moduleResistanceOhm);
        }
        if (modulesInSeries < 1 || stringsInParallel < 1) {
            throw new IllegalArgumentException("series and parallel counts must be >= 1, got "
                    + modulesInSeries + " x " + stringsInParallel);
        }
        return moduleResistanceOhm * modulesInSeries / stringsInParallel;
    }
}
