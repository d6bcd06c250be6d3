package org.holdover.sizing;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.holdover.battery.BankDesign;
import org.holdover.catalog.GeneratorItem;
import org.holdover.sim.Generator;
import org.holdover.sim.GeneratorSizing;

/**
 * A catalog generator on the chosen system: whether its AC output suits the service, how it connects to the
 * charger, what it must supply ({@link GeneratorSizing}: the charger flat out plus the loads running meanwhile,
 * after altitude derating, with the one-leg limit of a 120 V charger on a 120/240 V set), and the generator the
 * hourly simulation runs.
 */
public final class GeneratorPlan {

    /** Check ids. */
    public static final String RATED = "generator.ratedW";
    public static final String LEG = "generator.legW";

    private GeneratorPlan() {
    }

    /** Why the set's AC output does not suit the service ("" when it does). */
    public static String acMismatch(SizingInput in, GeneratorItem g) {
        List<String> why = new ArrayList<>();
        if (!g.ac().frequenciesHz().contains(in.frequencyHz())) {
            why.add("no " + Sizing.fmt(in.frequencyHz()) + " Hz output");
        }
        if (g.ac().splitPhase()) {
            if (!in.splitPhase() && in.acVoltsRms() != 120.0) {
                why.add("120/240 V split-phase output on a " + Sizing.fmt(in.acVoltsRms()) + " V service");
            }
        } else if (in.splitPhase()) {
            why.add("single-phase output, the service is 120/240 V split phase");
        } else if (g.ac().voltsRms() != in.acVoltsRms()) {
            why.add(Sizing.fmt(g.ac().voltsRms()) + " V output, the service is " + Sizing.fmt(in.acVoltsRms()) + " V");
        }
        return String.join("; ", why);
    }

    /** A 120 V charger (single-phase 120 V service) on a 120/240 V set draws on one leg; otherwise on the full output. */
    public static GeneratorSizing.ChargerConnection connection(SizingInput in, GeneratorItem g) {
        return g.ac().splitPhase() && !in.splitPhase() ? GeneratorSizing.ChargerConnection.ONE_LEG_OF_SPLIT_PHASE
                : GeneratorSizing.ChargerConnection.FULL_OUTPUT;
    }

    /**
     * The charger's largest AC input from the generator, W: the project's figure, or {@link GeneratorRules#CHARGE_RATE_PER_H}
     * of the bank's rated energy per hour within the bank's charge limit, through the charger's efficiency.
     *
     * @param in   the sizing input
     * @param bank the bank
     */
    public static double chargerAcW(SizingInput in, BankDesign bank) {
        if (!Double.isNaN(in.generator().chargerAcW())) {
            return in.generator().chargerAcW();
        }
        double limitW = bank.strings() * bank.module().maxChargeA() * bank.bankNominalV();
        double dcW = Math.min(limitW, GeneratorRules.CHARGE_RATE_PER_H * bank.bankEnergyWh());
        return dcW / YearCheck.GRID_CHARGER_EFFICIENCY;
    }

    /** What the set must supply with this bank's charger. */
    public static GeneratorSizing.Result demand(SizingInput in, GeneratorItem g, BankDesign bank) {
        GeneratorSizing.ChargerConnection c = connection(in, g);
        double loads = in.loads().figures().runningPeakW();
        return GeneratorSizing.size(new GeneratorSizing.Demand(chargerAcW(in, bank), loads,
                c == GeneratorSizing.ChargerConnection.ONE_LEG_OF_SPLIT_PHASE ? loads : 0, c, in.generator().altitudeM(),
                in.generator().derating()));
    }

    /** The set's checks against the demand. */
    public static List<Check> checks(SizingInput in, GeneratorItem g, BankDesign bank) {
        GeneratorSizing.Result r = demand(in, g, bank);
        List<Check> out = new ArrayList<>();
        out.add(new Check(RATED, "Generator rating against the charger and the loads running meanwhile", g.ratedW(),
                r.requiredRatedW(), "W", Check.Sense.AT_LEAST, String.format(Locale.ROOT,
                "(charger %.0f W + coincident running demand %.0f W%s) ÷ altitude factor %.4f (3 %% per 1,000 ft above 500 ft:"
                        + " trade rule, common practice, no standard)", r.totalDemandW() - in.loads().figures().runningPeakW(),
                in.loads().figures().runningPeakW(), r.oneLegGoverns() ? ", one 120 V leg doubled" : "", r.deratingFactor())));
        if (connection(in, g) == GeneratorSizing.ChargerConnection.ONE_LEG_OF_SPLIT_PHASE) {
            out.add(new Check(LEG, "One 120 V leg of the generator against the 120 V charger and loads", g.ratedW() / 2
                    * r.deratingFactor(), r.legDemandW(), "W", Check.Sense.AT_LEAST,
                    "a 120 V charger on a 120/240 V set draws on one leg, which carries at most half the rating"));
        }
        return out;
    }

    /** The generator the hourly simulation runs: the set derated for altitude, dispatched by the project's rules. */
    public static Generator simulated(SizingInput in, GeneratorItem g) {
        double factor = in.generator().derating().factorAt(in.generator().altitudeM());
        return new Generator(g.ratedW(), g.ratedW() * factor, g.minLoadRatio(), g.fuel(), in.generator().strategy(),
                in.generator().startSoc());
    }

    /** The catalog generator with this id. */
    public static GeneratorItem find(SizingInput in, String id) {
        return in.catalog().generators().stream().filter(g -> g.id().equals(id)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no generator " + id + " in the catalog"));
    }
}
