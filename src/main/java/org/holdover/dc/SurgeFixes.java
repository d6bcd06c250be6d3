package org.holdover.dc;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/** Evaluates candidate fixes for a start that drops the inverter below its cutoff. */
public final class SurgeFixes {

    private SurgeFixes() {
    }

    /**
     * What one fix does.
     *
     * @param fix    the fix
     * @param after  the input after the fix
     * @param result the solved start after the fix
     */
    public record Evaluation(SurgeFix fix, SurgeInput after, SurgeResult result) {
        public Evaluation {
            Objects.requireNonNull(fix, "fix");
            Objects.requireNonNull(after, "after");
            Objects.requireNonNull(result, "result");
        }

        /** @return true when the start holds after this fix */
        public boolean passes() {
            return result.passes();
        }
    }

    /**
     * Solves the start once for each candidate, each applied alone to the present situation.
     *
     * @param present    the situation now (it may pass or fail)
     * @param candidates the alternatives to try, in the order to report them
     * @return one evaluation per candidate, same order
     */
    public static List<Evaluation> evaluate(SurgeInput present, List<? extends SurgeFix> candidates) {
        List<Evaluation> out = new ArrayList<>(candidates.size());
        for (SurgeFix fix : candidates) {
            SurgeInput after = fix.apply(present);
            out.add(new Evaluation(fix, after, SurgeVoltage.solve(after)));
        }
        return List.copyOf(out);
    }

    /**
     * Heavier-cable alternatives: the next {@code steps} tabulated sizes above the present one, same parallel
     * count, length and conductor temperature. Fewer are returned at the top of the table.
     *
     * @param tables         the tables
     * @param present        the present size (tabulated)
     * @param parallelSets   conductors per pole, ≥ 1
     * @param oneWayLengthM  one-way length, m
     * @param conductorTempC conductor temperature for resistance, °C
     * @param flexible       IEC class 5 (ignored for NEC)
     * @param steps          how many sizes up, ≥ 1
     * @return the alternatives, one size up first
     */
    public static List<SurgeFix.HeavierCable> heavierCables(ConductorTables tables, ConductorSize present,
                                                            int parallelSets, double oneWayLengthM,
                                                            double conductorTempC, boolean flexible, int steps) {
        if (steps < 1 || parallelSets < 1 || !(oneWayLengthM > 0)) {
            throw new IllegalArgumentException("steps, sets and length must be positive");
        }
        List<ConductorSize> sizes = tables.sizes(present.system());
        int at = tables.indexOf(present);
        List<SurgeFix.HeavierCable> out = new ArrayList<>();
        for (int i = at + 1; i <= at + steps && i < sizes.size(); i++) {
            ConductorSize s = sizes.get(i);
            double r = VoltageDropStep.roundTripResistanceOhm(
                    tables.resistanceOhmPerM(s, conductorTempC, flexible), parallelSets, oneWayLengthM);
            out.add(new SurgeFix.HeavierCable(s.label() + ", " + parallelSets + " set(s)", r));
        }
        return List.copyOf(out);
    }
}
