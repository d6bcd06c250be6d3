package org.holdover.sizing;

import java.util.List;
import org.holdover.dc.ConductorSelection;
import org.holdover.dc.ShortCircuit;
import org.holdover.dc.SurgeFixes;
import org.holdover.dc.SurgeResult;

/**
 * The DC side of one inverter and bank: the battery–inverter conductor and its fuse, the voltage at the
 * inverter while the motors start at the worst state of charge and temperature the design allows, and
 * the battery's prospective short-circuit current.
 *
 * @param cableCurrentA    inverter's rated continuous DC input at its cutoff, A (the circuit's continuous current)
 * @param cable            the battery–inverter conductor selection
 * @param socFloor         lowest state of charge the design allows (1 − depth of discharge)
 * @param tempC            coldest battery temperature, °C
 * @param cells            cells in series in the bank
 * @param ocvCellV         rested cell voltage at the floor, V
 * @param moduleOhm        module internal resistance at 25 °C, Ω
 * @param resistanceFactor internal-resistance factor at the cold temperature
 * @param bankOhm          bank internal resistance at the cold temperature, Ω
 * @param cableOhm         cable round-trip resistance at the conductor temperature, Ω (0 when no conductor fits)
 * @param surgeInputW      inverter DC input during the start, W
 * @param peakLimitA       bank peak-current limit for the start, A
 * @param surge            the operating point during the start (or collapse)
 * @param fixes            what each candidate fix would give, when the start fails
 * @param shortCircuit     prospective short-circuit current at full charge, 25 °C
 * @param leads            each inverter's leads from the common bus bar (inverters in parallel), or null
 * @param leadsOhm         the leads as the whole start current sees them: one lead's round trip ÷ units, Ω (0 without)
 */
public record DcDesign(double cableCurrentA, ConductorSelection cable, double socFloor, double tempC, int cells,
                       double ocvCellV, double moduleOhm, double resistanceFactor, double bankOhm, double cableOhm,
                       double surgeInputW, double peakLimitA, SurgeResult surge, List<SurgeFixes.Evaluation> fixes,
                       ShortCircuit.Result shortCircuit, InverterLeads leads, double leadsOhm) {

    public DcDesign {
        fixes = List.copyOf(fixes);
    }

    /** Bank open-circuit voltage at the floor, V. */
    public double openCircuitV() {
        return cells * ocvCellV;
    }

    /** V_oc² − 4·P·R of the start, R = bank + battery cable + the inverters' leads: negative when the bank cannot deliver. */
    public double startDiscriminant() {
        return openCircuitV() * openCircuitV() - 4.0 * surgeInputW * (bankOhm + cableOhm + leadsOhm);
    }

    /** A conductor was found for the battery–inverter circuit. */
    public boolean cableSized() {
        return cable instanceof ConductorSelection.Sized;
    }

    /** The fixes that would make the start work on their own, in words, with the voltage each gives. */
    public List<String> workingFixes() {
        List<String> out = new java.util.ArrayList<>();
        for (SurgeFixes.Evaluation e : fixes) {
            if (e.result().passes() && e.result() instanceof SurgeResult.Operating o) {
                out.add(String.format(java.util.Locale.ROOT, "%s (%.1f V)", describe(e.fix()), o.inverterTerminalV()));
            }
        }
        return out;
    }

    /** A fix in plain words. */
    public static String describe(org.holdover.dc.SurgeFix f) {
        if (f instanceof org.holdover.dc.SurgeFix.HigherBusVoltage h) {
            return "a " + h.label().replaceFirst(" \\(.*", "");
        }
        if (f instanceof org.holdover.dc.SurgeFix.ParallelStrings p) {
            return "one more parallel string (" + (p.presentStrings() + p.addedStrings()) + " in all)";
        }
        if (f instanceof org.holdover.dc.SurgeFix.HeavierCable h) {
            return "a heavier cable, " + h.label();
        }
        if (f instanceof org.holdover.dc.SurgeFix.ShorterCable c) {
            return String.format(java.util.Locale.ROOT, "a shorter cable, %.1f m instead of %.1f m", c.newLengthM(), c.presentLengthM());
        }
        if (f instanceof org.holdover.dc.SurgeFix.SoftStarter st) {
            return String.format(java.util.Locale.ROOT, "a soft starter on the motor (start power × %.2f)", st.surgePowerRatio());
        }
        return f.toString();
    }

    /** Why this DC side does not work ("" when it does). */
    public String problem() {
        if (!cableSized()) {
            return "no conductor carries the battery–inverter current: " + ((ConductorSelection.NotSized) cable).reason();
        }
        if (surge instanceof SurgeResult.Collapse c) {
            return String.format(java.util.Locale.ROOT, "the battery cannot deliver the %.0f W start at any voltage (at most %.0f W)",
                    surgeInputW, c.maxDeliverablePowerW());
        }
        SurgeResult.Operating o = (SurgeResult.Operating) surge;
        if (!o.aboveCutoff()) {
            return String.format(java.util.Locale.ROOT, "during the start the inverter sees %.1f V, below its %.1f V cutoff",
                    o.inverterTerminalV(), o.input().lowVoltageCutoffV());
        }
        if (!o.withinCurrentLimit()) {
            return String.format(java.util.Locale.ROOT, "the start draws %.0f A, above the bank's %.0f A peak limit",
                    o.currentA(), peakLimitA);
        }
        return "";
    }
}
