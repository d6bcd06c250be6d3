package org.holdover.sizing;

import java.util.List;

/**
 * What the system search found.
 *
 * @param chosen        the least-cost system that passes every check and the simulated year, or null
 * @param alternatives  the next best systems of other families (inverter, battery module, PV module and controller),
 *                      least cost first
 * @param frontier      simulated systems no other simulated system beats on both cost and unmet energy, least cost first
 *                      (systems that fail a design check are included, marked, to show what the checks buy)
 * @param rejected      each family left out, with the check that failed
 * @param sensitivity   the chosen system under more load and a poorer solar year
 * @param stats         how much work the search did
 * @param unmetLimitWh  unmet energy the project accepts over the year, Wh
 * @param simulated     whether candidates were checked against a simulated year (not off grid without PV)
 * @param objective     what the search minimised
 */
public record SearchResult(Evaluated chosen, List<Evaluated> alternatives, List<Evaluated> frontier, List<Rejection> rejected,
                           List<Sensitivity> sensitivity, Stats stats, double unmetLimitWh, boolean simulated,
                           Objective objective) {

    /** Whether the search may have added a generator (a generator's id appears in some family). */
    public boolean generatorsSearched() {
        return java.util.stream.Stream.concat(java.util.stream.Stream.concat(java.util.stream.Stream.ofNullable(chosen),
                alternatives.stream()), frontier.stream()).anyMatch(e -> e.candidate().pin().generatorId() != null)
                || rejected.stream().anyMatch(r -> r.family().contains(", generator "));
    }

    public SearchResult {
        alternatives = List.copyOf(alternatives);
        frontier = List.copyOf(frontier);
        rejected = List.copyOf(rejected);
        sensitivity = List.copyOf(sensitivity);
    }

    /**
     * One candidate system and its price.
     *
     * @param pin        the components
     * @param family     the family it belongs to (bus, inverter, battery module, PV module and controller), in words
     * @param inverterPrice demo price of one inverter (the pin says how many run in parallel)
     * @param bankModules battery modules in the bank
     * @param bankModulePrice demo price of one battery module
     * @param pvModules  PV modules (0 without PV)
     * @param pvModulePrice demo price of one PV module
     * @param controllers charge controllers (0 without PV)
     * @param controllerPrice demo price of one controller
     * @param bankKwh    rated bank energy, kWh
     * @param pvKw       PV array STC power, kW
     * @param lowestMargin the smallest margin of the candidate's cheap checks, fraction (NaN when not known)
     * @param generatorPrice demo price of the generator (0 without one)
     */
    public record Candidate(SystemPin pin, String family, double inverterPrice, int bankModules, double bankModulePrice,
                            int pvModules, double pvModulePrice, int controllers, double controllerPrice, double bankKwh,
                            double pvKw, double lowestMargin, double generatorPrice) {

        /** Demo capital cost: inverters + battery modules + PV modules + controllers + generator. */
        public double cost() {
            return pin.inverters() * inverterPrice + bankModules * bankModulePrice + pvModules * pvModulePrice + controllers * controllerPrice
                    + generatorPrice;
        }

        /** The components in a few words. */
        public String describe() {
            String s = String.format(java.util.Locale.ROOT, "%s V bus, %s, %d × %s (%d strings, %.1f kWh)", fmt(pin.busClassV()),
                    (pin.inverters() > 1 ? pin.inverters() + " × " : "") + pin.inverterId(), bankModules, pin.batteryModuleId(), pin.strings(), bankKwh);
            if (pin.pv() != null) {
                SystemPin.PvPin p = pin.pv();
                s += String.format(java.util.Locale.ROOT, ", %d × %s (%d per string, %d strings on each of %d × %s; %.1f kW)", pvModules,
                        p.moduleId(), p.modulesPerString(), p.stringsPerController(), p.controllers(), p.controllerId(), pvKw);
            }
            if (pin.generatorId() != null) {
                s += ", generator " + pin.generatorId();
            }
            return s;
        }
    }

    /**
     * A candidate after the simulated year.
     *
     * @param candidate   the system
     * @param unmetWh     energy left unmet over the year, Wh (NaN when not simulated)
     * @param unmetHours  hours with unmet energy
     * @param lowestSoc   lowest state of charge, fraction (NaN when not simulated)
     * @param passes      passes every check and the simulated year
     * @param designNote  "" for a system that passes the design checks; otherwise which one it fails (frontier only)
     * @param lifeYears   battery life used for replacements, years (NaN when the objective is capital cost)
     * @param objective   what the search minimises: the capital cost, or the lifetime cost with replacements and fuel
     * @param fuelCostPerYear the generator's fuel over the simulated year × the project's fuel price (0 without a
     *                    generator or a price; NaN when not simulated)
     */
    public record Evaluated(Candidate candidate, double unmetWh, int unmetHours, double lowestSoc, boolean passes,
                            String designNote, double lifeYears, double objective, double fuelCostPerYear) {
    }

    /** A family left out and why. */
    public record Rejection(String family, String reason) {
    }

    /**
     * The chosen system under a changed assumption.
     *
     * @param label      what changed
     * @param changePct  by how much, %
     * @param unmetWh    unmet energy of the simulated year, Wh (NaN when not simulated)
     * @param limitWh    unmet energy accepted, Wh
     * @param passes     whether the system still passes
     * @param detail     the checks that fail, or what held
     */
    public record Sensitivity(String label, double changePct, double unmetWh, double limitWh, boolean passes, String detail) {
    }

    /**
     * @param families        component families considered
     * @param cheapChecks     component checks evaluated (inverters, banks at each string count, PV layouts)
     * @param candidates      whole systems passing every cheap check
     * @param simulated       candidates simulated over a year
     * @param pruned          candidates known to fail without simulating (a larger one of the same family failed)
     * @param cheapMillis     time spent on the cheap checks, ms
     * @param simMillis       time spent simulating, ms
     * @param stoppedEarly    the search was stopped before it finished (the result is the best found so far)
     */
    public record Stats(int families, long cheapChecks, long candidates, long simulated, long pruned, double cheapMillis,
                        double simMillis, boolean stoppedEarly) {
    }

    static String fmt(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.valueOf(v);
    }

    /**
     * What the search minimises.
     *
     * @param horizonYears  0: the capital cost; otherwise the lifetime cost over this many years: capital + the battery
     *                      modules bought again each time the bank's life (from the simulated year) runs out before the
     *                      horizon, each discounted to today, + the generator's fuel each year (the simulated year's
     *                      fuel × the fuel price) discounted to today
     * @param discountRate  discount rate per year, fraction
     */
    public record Objective(double horizonYears, double discountRate) {
        public static final Objective CAPITAL = new Objective(0, 0);

        public Objective {
            if (!(horizonYears >= 0 && horizonYears <= 100) || !(discountRate >= 0 && discountRate <= 1)) {
                throw new IllegalArgumentException("horizon 0–100 years and discount rate 0–1 expected");
            }
        }

        public boolean lifetime() {
            return horizonYears > 0;
        }

        /** Replacements before the horizon: ⌈horizon ÷ life⌉ − 1 (none when the life reaches the horizon). */
        public int replacements(double lifeYears) {
            if (!lifetime() || !(lifeYears > 0)) {
                return 0;
            }
            return Math.max(0, (int) Math.ceil(horizonYears / lifeYears - 1e-9) - 1);
        }

        /** Present value of the replacements of a bank costing {@code bankPrice}: Σ price ÷ (1 + r)^(k × life). */
        public double replacementCost(double bankPrice, double lifeYears) {
            int n = replacements(lifeYears);
            double sum = 0;
            for (int k = 1; k <= n; k++) {
                sum += bankPrice / Math.pow(1 + discountRate, k * lifeYears);
            }
            return sum;
        }

        /** The objective of a candidate whose battery lasts {@code lifeYears} (no running cost). */
        public double of(Candidate c, double lifeYears) {
            return of(c, lifeYears, 0);
        }

        /**
         * The objective of a candidate whose battery lasts {@code lifeYears} and that spends {@code costPerYear} on
         * fuel each year (capital cost alone when the objective is capital).
         */
        public double of(Candidate c, double lifeYears, double costPerYear) {
            if (!lifetime()) {
                return c.cost();
            }
            return c.cost() + replacementCost(c.bankModules() * c.bankModulePrice(), lifeYears) + costPerYear * annuityFactor();
        }

        /**
         * Present value of 1 a year at the end of each year over the horizon: (1 − (1 + r)^−H) ÷ r, or H without
         * discounting (the ordinary annuity factor of engineering economics; common practice).
         */
        public double annuityFactor() {
            return discountRate == 0 ? horizonYears : (1 - Math.pow(1 + discountRate, -horizonYears)) / discountRate;
        }
    }
}
