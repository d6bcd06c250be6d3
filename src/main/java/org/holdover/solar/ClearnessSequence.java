package org.holdover.solar;

/**
 * How the daily clearness index varies from day to day within each month of a synthetic year.
 */
public sealed interface ClearnessSequence {

    /** Every day of a month has the month's mean clearness index: a smooth, repeatable year. */
    record Uniform() implements ClearnessSequence {
    }

    /**
     * Seeded random day-to-day variation, our own method (not a published one): daily clearness
     * K_d = K̄ (1 + s z_d), where z_d is a first-order autoregressive standard normal sequence
     * z_d = ρ z_{d−1} + √(1 − ρ²) ε_d with ε_d from {@link java.util.Random} seeded with {@code seed}
     * (so runs repeat on every Java platform); each month's z is centred on zero, K_d is held in
     * [{@value SyntheticYear#MIN_DAILY_CLEARNESS}, {@value SyntheticYear#MAX_DAILY_CLEARNESS}], and the
     * month's days are then scaled together (days at the bounds held) so that the month's mean daily
     * irradiation equals the input exactly.
     *
     * @param seed           random seed
     * @param relativeSpread s, the standard deviation of K_d relative to K̄, in [0, 1]; 0.25 is a
     *                       reasonable middle value (our choice, no source)
     * @param lag1           ρ, the day-to-day correlation, in [0, 1); about 0.3 is a reasonable
     *                       value for daily clearness (from memory, unconfirmed)
     */
    record SeededRandom(long seed, double relativeSpread, double lag1) implements ClearnessSequence {
        public SeededRandom {
            if (!(relativeSpread >= 0 && relativeSpread <= 1)) {
                throw new IllegalArgumentException("relativeSpread must be in [0, 1], got " + relativeSpread);
            }
            if (!(lag1 >= 0 && lag1 < 1)) {
                throw new IllegalArgumentException("lag1 must be in [0, 1), got " + lag1);
            }
        }
    }

    static ClearnessSequence uniform() {
        return new Uniform();
    }
}
