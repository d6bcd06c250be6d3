package org.holdover.pv;

import java.util.Objects;

/**
 * Identical modules wired as {@code strings} parallel strings of {@code modulesPerString} in series.
 *
 * @param module           the module
 * @param modulesPerString modules in series per string, ≥ 1
 * @param strings          strings in parallel, ≥ 1
 */
public record PvArray(PvModule module, int modulesPerString, int strings) {

    public PvArray {
        Objects.requireNonNull(module, "module");
        if (modulesPerString < 1 || modulesPerString > 100) {
            throw new IllegalArgumentException("modulesPerString must be in [1, 100], got " + modulesPerString);
        }
        if (strings < 1 || strings > 1000) {
            throw new IllegalArgumentException("strings must be in [1, 1000], got " + strings);
        }
    }

    public int moduleCount() {
        return modulesPerString * strings;
    }

    /** Nameplate (STC) power, W. */
    public double stcPowerW() {
        return module.stc().powerW() * moduleCount();
    }

    /** Total module area, m². */
    public double areaM2() {
        return module.areaM2() * moduleCount();
    }

    /** String open-circuit voltage at STC, V. */
    public double stringVocStcV() {
        return module.stc().vocV() * modulesPerString;
    }

    /** String maximum-power voltage at STC, V. */
    public double stringVmpStcV() {
        return module.stc().vmpV() * modulesPerString;
    }

    /** Array short-circuit current at STC (all strings), A. */
    public double arrayIscA() {
        return module.stc().iscA() * strings;
    }
}
