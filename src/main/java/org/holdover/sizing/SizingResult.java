package org.holdover.sizing;

import java.util.List;
import org.holdover.battery.BankDesign;
import org.holdover.battery.BankRequirement;

/**
 * The outcome of sizing: every inverter and bus class with its checks, and the chosen system.
 *
 * @param input        what was sized
 * @param inverters    every catalog inverter against the demand
 * @param buses        every bus class, lowest first
 * @param chosen       the bus option chosen, or null when none passes
 * @param energy       the energy basis with the chosen inverter (null when none)
 * @param requirement  what the chosen bank was sized for (null when none)
 * @param checks       every check of the chosen system
 * @param advisories   code limits that do not reject the design but must be looked at (fire-code energy limits)
 * @param cecEfficiency     CEC weighted efficiency of the chosen inverter's loss model
 * @param euroEfficiency    European weighted efficiency of the chosen inverter's loss model
 * @param year              the chosen system over a simulated year (null when none was chosen or off grid without PV)
 * @param solar             the PV array and charge controller(s), or null (no solar section, or no system chosen)
 * @param pvCircuits        the PV-side conductors, or null without an array
 * @param search            what the system search found (null when the rules alone were run)
 * @param generator         the chosen engine generator, or null
 * @param inverterLeads     each inverter's leads from the common bus bar when inverters run in parallel, else null
 */
public record SizingResult(SizingInput input, List<InverterAssessment> inverters, List<BusOption> buses,
                           BusOption chosen, EnergyBasis energy, BankRequirement requirement, List<Check> checks,
                           List<Check> advisories, double cecEfficiency, double euroEfficiency,
                           YearCheck year, SolarDesign solar, PvCircuits pvCircuits,
                           SearchResult search, org.holdover.catalog.GeneratorItem generator, InverterLeads inverterLeads) {

    /** A single inverter (no leads from a bus bar). */
    public SizingResult(SizingInput input, List<InverterAssessment> inverters, List<BusOption> buses,
                        BusOption chosen, EnergyBasis energy, BankRequirement requirement, List<Check> checks,
                        List<Check> advisories, double cecEfficiency, double euroEfficiency,
                        YearCheck year, SolarDesign solar, PvCircuits pvCircuits, SearchResult search,
                        org.holdover.catalog.GeneratorItem generator) {
        this(input, inverters, buses, chosen, energy, requirement, checks, advisories, cecEfficiency, euroEfficiency, year, solar,
                pvCircuits, search, generator, null);
    }

    /** Without a generator. */
    public SizingResult(SizingInput input, List<InverterAssessment> inverters, List<BusOption> buses,
                        BusOption chosen, EnergyBasis energy, BankRequirement requirement, List<Check> checks,
                        List<Check> advisories, double cecEfficiency, double euroEfficiency,
                        YearCheck year, SolarDesign solar, PvCircuits pvCircuits, SearchResult search) {
        this(input, inverters, buses, chosen, energy, requirement, checks, advisories, cecEfficiency, euroEfficiency, year, solar,
                pvCircuits, search, null, null);
    }

    public SizingResult {
        inverters = List.copyOf(inverters);
        buses = List.copyOf(buses);
        checks = List.copyOf(checks);
        advisories = List.copyOf(advisories);
    }

    /** A system was found and every check passes. */
    public boolean passes() {
        return chosen != null && checks.stream().allMatch(Check::passes);
    }

    /** Fuel cost of the simulated year at the project's fuel price (0 without a generator or a price). */
    public double fuelCostPerYear() {
        return year == null ? 0 : year.metrics().generator().fuelL() * input.generator().fuelPricePerL();
    }

    /** The chosen bank, or null. */
    public BankDesign bank() {
        return chosen == null ? null : chosen.bank();
    }

    /** The chosen inverter, or null. */
    public InverterAssessment inverter() {
        return chosen == null ? null : chosen.inverter();
    }

    /** The same result with the search's findings. */
    public SizingResult withSearch(SearchResult s) {
        return new SizingResult(input, inverters, buses, chosen, energy, requirement, checks, advisories, cecEfficiency,
                euroEfficiency, year, solar, pvCircuits, s, generator, inverterLeads);
    }
}
