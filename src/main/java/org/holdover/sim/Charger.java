package org.holdover.sim;

/**
 * The battery charger fed from an AC source (the generator, or the grid in backup mode).
 *
 * <p>When the charger is on one leg of a 120/240 V split-phase generator, that leg carries only half the
 * generator's rating: pass {@code min(charger rating, half the derated generator rating)} here (see
 * {@link GeneratorSizing}).
 *
 * @param maxAcInputW largest AC input, W (&ge; 0; 0 means no charger)
 * @param efficiency  AC input to DC output, fraction in (0, 1]
 */
public record Charger(double maxAcInputW, double efficiency) {

    /** No charger: nothing can charge the battery from an AC source. */
    public static final Charger NONE = new Charger(0, 1);

    public Charger {
        Checks.nonNegative("maxAcInputW", maxAcInputW);
        Checks.efficiency("efficiency", efficiency);
    }
}
