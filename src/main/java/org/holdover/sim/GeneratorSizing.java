package org.holdover.sim;

import java.util.Objects;

/**
 * How large a generator must be to run the battery charger flat out while it carries the loads that run
 * during charging. Ratings are real power, W (a set rated in kVA must be converted by its power factor
 * first).
 */
public final class GeneratorSizing {

    private GeneratorSizing() {
    }

    /**
     * Linear altitude derating: {@code factor = 1 - MAX(0, altitude - threshold) * fractionPerM}, never below 0.
     *
     * @param thresholdM   altitude up to which no derating applies, m (&ge; 0)
     * @param fractionPerM lost fraction of the rating per metre above the threshold (&ge; 0)
     */
    public record AltitudeDerating(double thresholdM, double fractionPerM) {

        /**
         * 3 % per 1,000 ft (304.8 m) above 500 ft (152.4 m), for naturally aspirated spark-ignition and
         * diesel engines. Trade rule as printed in an agricultural-engineering text on engine power
         * (progressivegardening.com, "Altitude", with a worked example for a 225 hp engine at 4,500 ft);
         * common practice rather than a standard. Turbocharged sets derate less: use the maker's curve.
         */
        public static final AltitudeDerating TRADE_RULE = new AltitudeDerating(152.4, 0.03 / 304.8);

        public AltitudeDerating {
            Checks.nonNegative("thresholdM", thresholdM);
            Checks.nonNegative("fractionPerM", fractionPerM);
        }

        /**
         * @param altitudeM site altitude, m
         * @return available fraction of the rating, in [0, 1]
         */
        public double factorAt(double altitudeM) {
            Checks.finite("altitudeM", altitudeM);
            return Math.max(0, 1 - Math.max(0, altitudeM - thresholdM) * fractionPerM);
        }
    }

    /** How the charger is connected to the generator. */
    public enum ChargerConnection {
        /** The charger draws on the generator's full output (single-voltage set, or a 240 V charger). */
        FULL_OUTPUT,
        /**
         * A 120 V charger on one leg of a 120/240 V split-phase set: that leg carries at most half the
         * set's rating.
         */
        ONE_LEG_OF_SPLIT_PHASE
    }

    /**
     * What the generator must supply.
     *
     * @param chargerAcInputW     the charger's largest AC input, W (&ge; 0)
     * @param loadsWhileChargingW all AC loads the generator carries while the charger runs, W (&ge; 0)
     * @param loadsOnChargerLegW  of those, the ones on the charger's leg (one-leg connection only), W, in
     *                            [0, loadsWhileChargingW]
     * @param connection          how the charger is connected
     * @param altitudeM           site altitude, m
     * @param derating            altitude derating rule
     */
    public record Demand(double chargerAcInputW, double loadsWhileChargingW, double loadsOnChargerLegW,
                         ChargerConnection connection, double altitudeM, AltitudeDerating derating) {
        public Demand {
            Checks.nonNegative("chargerAcInputW", chargerAcInputW);
            Checks.nonNegative("loadsWhileChargingW", loadsWhileChargingW);
            Checks.nonNegative("loadsOnChargerLegW", loadsOnChargerLegW);
            if (loadsOnChargerLegW > loadsWhileChargingW) {
                throw new IllegalArgumentException("loadsOnChargerLegW must be <= loadsWhileChargingW, got "
                        + loadsOnChargerLegW + " > " + loadsWhileChargingW);
            }
            Objects.requireNonNull(connection, "connection");
            Checks.finite("altitudeM", altitudeM);
            Objects.requireNonNull(derating, "derating");
        }
    }

    /**
     * The sizing.
     *
     * @param totalDemandW     charger plus all loads while charging, W
     * @param legDemandW       charger plus the loads on its leg, W (0 for a full-output connection)
     * @param requiredOutputW  output the set must have at the site: totalDemandW, or 2 * legDemandW when
     *                         that is larger (one-leg connection), W
     * @param deratingFactor   available fraction of the nameplate at the site altitude
     * @param requiredRatedW   nameplate rating needed: requiredOutputW / deratingFactor, W (infinite when
     *                         the factor is 0)
     * @param oneLegGoverns    true when the half-rating leg, not the total, sets the size
     */
    public record Result(double totalDemandW, double legDemandW, double requiredOutputW, double deratingFactor,
                         double requiredRatedW, boolean oneLegGoverns) {
    }

    /**
     * Sizes the generator.
     *
     * @param demand what it must supply
     * @return the required rating and how it was reached
     */
    public static Result size(Demand demand) {
        double total = demand.chargerAcInputW() + demand.loadsWhileChargingW();
        double leg = demand.connection() == ChargerConnection.ONE_LEG_OF_SPLIT_PHASE
                ? demand.chargerAcInputW() + demand.loadsOnChargerLegW() : 0;
        boolean legGoverns = 2 * leg > total;
        double required = legGoverns ? 2 * leg : total;
        double factor = demand.derating().factorAt(demand.altitudeM());
        double rated = factor > 0 ? required / factor : Double.POSITIVE_INFINITY;
        return new Result(total, leg, required, factor, rated, legGoverns);
    }
}
