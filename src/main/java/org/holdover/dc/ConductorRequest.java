package org.holdover.dc;

import java.util.Objects;

/**
 * A two-wire DC circuit to size.
 *
 * @param circuitName        a name to show (user text)
 * @param continuousCurrentA the current the circuit carries continuously, A, &gt; 0 (for a PV source circuit: the
 *                           modules' short-circuit current Isc). Voltage drop is computed at this current.
 * @param factors            code multipliers (see {@link CurrentFactors#CONTINUOUS_LOAD}, {@link CurrentFactors#PV_SOURCE})
 * @param nominalV           nominal circuit voltage, V, &gt; 0; the drop percentage is of this voltage
 * @param oneWayLengthM      one-way route length, m, &gt; 0 (the drop uses twice this: out and back)
 * @param maxVoltageDropPct  largest acceptable drop, percent of {@code nominalV}, in (0, 100)
 * @param installation       ambient, conductor count, insulation and terminal ratings, table family
 * @param maxParallelSets    the most conductors per pole allowed in parallel, ≥ 1 (1 = no paralleling). NEC
 *                           310.10(G) allows paralleling only for 1/0 AWG and larger.
 * @param fineStranded       true for fine-stranded (flexible, finer than Class B/C) conductors: adds the
 *                           terminal note (NEC 110.14) and, for IEC, uses class 5 resistance
 */
public record ConductorRequest(String circuitName, double continuousCurrentA, CurrentFactors factors,
                               double nominalV, double oneWayLengthM, double maxVoltageDropPct,
                               Installation installation, int maxParallelSets, boolean fineStranded) {

    public ConductorRequest {
        Objects.requireNonNull(circuitName, "circuitName");
        Objects.requireNonNull(factors, "factors");
        Objects.requireNonNull(installation, "installation");
        positive("continuousCurrentA", continuousCurrentA);
        positive("nominalV", nominalV);
        positive("oneWayLengthM", oneWayLengthM);
        if (!(maxVoltageDropPct > 0 && maxVoltageDropPct < 100)) {
            throw new IllegalArgumentException("maxVoltageDropPct must be in (0, 100), got " + maxVoltageDropPct);
        }
        if (maxParallelSets < 1) {
            throw new IllegalArgumentException("maxParallelSets must be >= 1, got " + maxParallelSets);
        }
    }

    private static void positive(String name, double v) {
        if (!(v > 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(name + " must be > 0, got " + v);
        }
    }

    /**
     * A continuous-load circuit on NEC 75 °C wiring at 30 °C, no paralleling, standard stranding.
     *
     * @param circuitName        name
     * @param continuousCurrentA continuous current, A
     * @param nominalV           nominal voltage, V
     * @param oneWayLengthM      one-way length, m
     * @param maxVoltageDropPct  drop limit, %
     */
    public static ConductorRequest of(String circuitName, double continuousCurrentA, double nominalV,
                                      double oneWayLengthM, double maxVoltageDropPct) {
        return new ConductorRequest(circuitName, continuousCurrentA, CurrentFactors.CONTINUOUS_LOAD, nominalV,
                oneWayLengthM, maxVoltageDropPct, Installation.nec75(30.0), 1, false);
    }

    /**
     * @param f code multipliers
     * @return a copy with them
     */
    public ConductorRequest withFactors(CurrentFactors f) {
        return new ConductorRequest(circuitName, continuousCurrentA, f, nominalV, oneWayLengthM, maxVoltageDropPct,
                installation, maxParallelSets, fineStranded);
    }

    /**
     * @param i the installation
     * @return a copy with it
     */
    public ConductorRequest withInstallation(Installation i) {
        return new ConductorRequest(circuitName, continuousCurrentA, factors, nominalV, oneWayLengthM,
                maxVoltageDropPct, i, maxParallelSets, fineStranded);
    }

    /**
     * @param sets most conductors per pole, ≥ 1
     * @return a copy allowing that many parallel sets
     */
    public ConductorRequest withMaxParallelSets(int sets) {
        return new ConductorRequest(circuitName, continuousCurrentA, factors, nominalV, oneWayLengthM,
                maxVoltageDropPct, installation, sets, fineStranded);
    }

    /**
     * @param fine true for fine-stranded (flexible) conductors
     * @return a copy with the flag set
     */
    public ConductorRequest withFineStranded(boolean fine) {
        return new ConductorRequest(circuitName, continuousCurrentA, factors, nominalV, oneWayLengthM,
                maxVoltageDropPct, installation, maxParallelSets, fine);
    }

    /**
     * @param lengthM one-way length, m, &gt; 0
     * @return a copy with that length
     */
    public ConductorRequest withOneWayLengthM(double lengthM) {
        return new ConductorRequest(circuitName, continuousCurrentA, factors, nominalV, lengthM, maxVoltageDropPct,
                installation, maxParallelSets, fineStranded);
    }

    /** @return design current = continuous current × design factor, A */
    public double designCurrentA() {
        return continuousCurrentA * factors.designFactor();
    }

    /** @return current to carry after correction and adjustment = continuous × conditions-of-use factor, A */
    public double conditionsOfUseCurrentA() {
        return continuousCurrentA * factors.conditionsOfUseFactor();
    }
}
