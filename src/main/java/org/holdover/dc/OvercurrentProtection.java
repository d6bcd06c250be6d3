package org.holdover.dc;

import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

/**
 * Chooses an overcurrent-device rating for a conductor.
 *
 * <p>NEC (2023): the smallest 240.6(A) standard rating (fuse-only ratings excluded) at or above the design
 * current; it must not exceed the conductor's allowable ampacity (240.4) unless 240.4(B) allows the next
 * standard size up (ampacity not itself a standard rating, device ≤ 800 A); 240.4(D) caps 14, 12 and 10 AWG
 * copper at 15, 20 and 30 A whatever else applies.
 *
 * <p>IEC: the smallest rating of the bundled list (from memory, see {@code iec-device-ratings.csv}) with
 * Ib ≤ In ≤ Iz (IEC 60364-4-43 433.1, from memory); no next-size-up rule.
 */
public final class OvercurrentProtection {

    /** Comparisons of currents allow this much floating-point slack, A (far below any rating step). */
    public static final double TOLERANCE_A = 1e-9;

    private OvercurrentProtection() {
    }

    /**
     * @param tables             the bundled tables
     * @param size               the conductor size (for 240.4(D))
     * @param designCurrentA     the design current, A, &gt; 0
     * @param allowableAmpacityA the conductor's allowable ampacity (all parallel sets together), A, &gt; 0
     * @return the chosen rating, or why none fits
     */
    public static OvercurrentDevice select(ConductorTables tables, ConductorSize size, double designCurrentA,
                                           double allowableAmpacityA) {
        if (!(designCurrentA > 0) || !(allowableAmpacityA > 0)) {
            throw new IllegalArgumentException("currents must be > 0, got design " + designCurrentA
                    + " A, ampacity " + allowableAmpacityA + " A");
        }
        return size.system() == TableSystem.NEC
                ? necSelect(tables, size, designCurrentA, allowableAmpacityA)
                : iecSelect(tables, designCurrentA, allowableAmpacityA);
    }

    /** @return the NEC 240.6(A) ratings a circuit breaker or fuse may have (fuse-only ratings left out), A */
    public static List<Double> necRatingsA(ConductorTables tables) {
        return tables.necStandardRatings().stream()
                .filter(r -> !r.fuseOnly())
                .map(ConductorTables.StandardRating::ratingA)
                .toList();
    }

    /**
     * @param ratingsA ascending ratings, A
     * @param currentA a current, A
     * @return the smallest rating ≥ currentA, or empty
     */
    public static OptionalDouble nextAtOrAbove(List<Double> ratingsA, double currentA) {
        for (double r : ratingsA) {
            if (r >= currentA - TOLERANCE_A) {
                return OptionalDouble.of(r);
            }
        }
        return OptionalDouble.empty();
    }

    private static OvercurrentDevice necSelect(ConductorTables tables, ConductorSize size, double design,
                                               double ampacity) {
        List<Double> ratings = necRatingsA(tables);
        OptionalDouble next = nextAtOrAbove(ratings, design);
        if (next.isEmpty()) {
            return new OvercurrentDevice.NoneFits(design, ampacity, String.format(Locale.ROOT,
                    "the design current %.1f A exceeds the largest 240.6(A) standard rating, %.0f A",
                    design, ratings.get(ratings.size() - 1)));
        }
        double rating = next.getAsDouble();
        OptionalDouble cap = tables.necSmallConductorLimitA(size);
        if (cap.isPresent() && rating > cap.getAsDouble() + TOLERANCE_A) {
            return new OvercurrentDevice.NoneFits(design, ampacity, String.format(Locale.ROOT,
                    "240.4(D) limits %s copper to %.0f A, but the design current %.1f A needs %.0f A",
                    size.label(), cap.getAsDouble(), design, rating));
        }
        if (rating <= ampacity + TOLERANCE_A) {
            return new OvercurrentDevice.Rated(rating, design, ampacity, OvercurrentDevice.Basis.WITHIN_AMPACITY,
                    "240.4, 240.6(A)");
        }
        boolean ampacityIsStandard = ratings.stream().anyMatch(r -> Math.abs(r - ampacity) <= TOLERANCE_A);
        OptionalDouble aboveAmpacity = nextAtOrAbove(ratings, ampacity);
        if (!ampacityIsStandard && aboveAmpacity.isPresent() && aboveAmpacity.getAsDouble() == rating
                && rating <= ConductorTables.NEXT_SIZE_UP_LIMIT_A) {
            return new OvercurrentDevice.Rated(rating, design, ampacity, OvercurrentDevice.Basis.NEXT_SIZE_UP,
                    "240.4(B), 240.6(A)");
        }
        String why = ampacityIsStandard
                ? "the ampacity is itself a standard rating"
                : rating > ConductorTables.NEXT_SIZE_UP_LIMIT_A
                        ? "240.4(B) stops at 800 A"
                        : "it is more than one standard size above the ampacity";
        return new OvercurrentDevice.NoneFits(design, ampacity, String.format(Locale.ROOT,
                "the smallest standard rating at or above the design current %.1f A is %.0f A, above the "
                        + "conductor ampacity %.1f A, and 240.4(B) does not allow it (%s)",
                design, rating, ampacity, why));
    }

    private static OvercurrentDevice iecSelect(ConductorTables tables, double design, double ampacity) {
        List<Double> ratings = tables.iecDeviceRatingsA();
        OptionalDouble next = nextAtOrAbove(ratings, design);
        if (next.isEmpty()) {
            return new OvercurrentDevice.NoneFits(design, ampacity, String.format(Locale.ROOT,
                    "the design current %.1f A exceeds the largest listed rating, %.0f A",
                    design, ratings.get(ratings.size() - 1)));
        }
        double rating = next.getAsDouble();
        if (rating <= ampacity + TOLERANCE_A) {
            return new OvercurrentDevice.Rated(rating, design, ampacity, OvercurrentDevice.Basis.WITHIN_AMPACITY,
                    "IEC 60364-4-43 433.1: Ib <= In <= Iz");
        }
        return new OvercurrentDevice.NoneFits(design, ampacity, String.format(Locale.ROOT,
                "the smallest listed rating at or above the design current %.1f A is %.0f A, above the "
                        + "current-carrying capacity Iz = %.1f A (IEC 60364-4-43 433.1 needs In <= Iz)",
                design, rating, ampacity));
    }
}
