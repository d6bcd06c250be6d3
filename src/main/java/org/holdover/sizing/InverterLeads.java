package org.holdover.sizing;

import java.util.ArrayList;
import java.util.List;
import org.holdover.dc.ConductorRequest;
import org.holdover.dc.ConductorSelection;
import org.holdover.dc.ConductorSizer;
import org.holdover.dc.CurrentFactors;
import org.holdover.dc.Installation;
import org.holdover.dc.TableSystem;
import org.holdover.inverter.InverterSpec;

/**
 * Each inverter's own DC leads when identical inverters run in parallel: the battery cable runs to a common DC bus
 * bar and every unit has its own conductor and overcurrent device from the bar. Like the battery cable, a lead carries
 * its unit's rated DC input at the unit's low-voltage cutoff (the most it can draw continuously), × 1.25 for
 * continuous current; the drop is a % of the bank's nominal voltage over the lead alone (the battery cable's drop is
 * checked on its own).
 *
 * @param lead           one unit's lead (all units are alike)
 * @param units          how many units (and leads)
 * @param unitContinuousA one unit's rated DC input at its cutoff, A
 */
public record InverterLeads(ConductorSelection lead, int units, double unitContinuousA) {

    /** Default one-way length of each unit's leads from the bus bar, m (common practice, no source). */
    public static final double DEFAULT_LEAD_M = 1.5;

    /** The leads of units in parallel, or null for a single inverter (the battery cable runs to it directly). */
    public static InverterLeads size(SizingInput in, InverterSpec inverters, double bankNominalV) {
        if (inverters.units() == 1) {
            return null;
        }
        InverterSpec unit = inverters.catalogUnit();
        double a = unit.loss().inputW(unit.continuousW()) / unit.dcMinV();
        WiringRules w = in.wiring();
        Installation inst = w.system() == TableSystem.NEC ? Installation.nec75(w.ambientC()) : Installation.iec(w.ambientC(), 2, 90);
        ConductorRequest req = new ConductorRequest("Bus bar to each inverter", a, CurrentFactors.CONTINUOUS_LOAD, bankNominalV,
                w.busBarToInverterM(), w.maxVoltageDropPct(), inst, DcSide.MAX_CABLE_SETS, w.fineStranded());
        return new InverterLeads(ConductorSizer.standard().size(req), inverters.units(), a);
    }

    /** The lead's checks (ampacity, drop, fuse; a lead no conductor fits fails with its reason). */
    public List<Check> checks() {
        List<Check> out = new ArrayList<>();
        PvCircuits.add(out, "lead", "Each inverter's lead from the bus bar", lead);
        return out;
    }
}
