package org.holdover.sizing;

import java.util.ArrayList;
import java.util.List;
import org.holdover.dc.ConductorRequest;
import org.holdover.dc.ConductorSelection;
import org.holdover.dc.ConductorSizer;
import org.holdover.dc.CurrentFactors;
import org.holdover.dc.Installation;
import org.holdover.dc.TableSystem;
import org.holdover.pv.ArrayCandidate;

/**
 * The PV-side conductors, per controller: the PV output circuit from the array to the controller and the
 * controller's output circuit to the battery.
 *
 * <p>PV output circuit: the continuous current is the sub-array's short-circuit current (strings × Isc); the
 * code multipliers are 1.25 for the maximum circuit current (NEC 690.8(A)(1)) and 1.25 again for conductor
 * sizing (690.8(B)), 1.5625 in all; the drop is taken at Isc over the string's maximum-power voltage.
 * Controller output circuit: the continuous current is the controller's rated output current (NEC
 * 690.8(A)(3), from memory), × 1.25 for continuous current; the drop is a % of the bank's nominal voltage.
 *
 * @param pvOutput         the array-to-controller conductor
 * @param controllerOutput the controller-to-battery conductor
 * @param controllers      how many identical controllers (and circuits of each kind)
 */
public record PvCircuits(ConductorSelection pvOutput, ConductorSelection controllerOutput, int controllers) {

    /** Default one-way length of the array-to-controller run, m (common practice, no source). */
    public static final double DEFAULT_PV_RUN_M = 15;
    /** Default one-way length of the controller-to-battery run, m (common practice, no source). */
    public static final double DEFAULT_CONTROLLER_RUN_M = 2;

    public static PvCircuits size(SizingInput in, ArrayCandidate c, double bankNominalV) {
        WiringRules w = in.wiring();
        Installation inst = w.system() == TableSystem.NEC ? Installation.nec(w.ambientC(), 2, 90, 75)
                : Installation.iec(w.ambientC(), 2, 90);
        double isc = c.perController().array().arrayIscA();
        ConductorRequest pv = new ConductorRequest("PV output circuit", isc, CurrentFactors.PV_SOURCE,
                c.perController().array().stringVmpStcV(), w.pvToControllerM(), w.maxVoltageDropPct(), inst, 1, false);
        double outA = c.controller().ratedOutputCurrentA();
        Installation batt = w.system() == TableSystem.NEC ? Installation.nec75(w.ambientC()) : Installation.iec(w.ambientC(), 2, 90);
        ConductorRequest out = new ConductorRequest("Controller to battery", outA, CurrentFactors.CONTINUOUS_LOAD, bankNominalV,
                w.batteryToControllerM(), w.maxVoltageDropPct(), batt, 2, w.fineStranded());
        ConductorSizer sizer = ConductorSizer.standard();
        return new PvCircuits(sizer.size(pv), sizer.size(out), c.controllerCount());
    }

    /** The checks of both circuits (a circuit no conductor fits fails with its reason). */
    public List<Check> checks() {
        List<Check> out = new ArrayList<>();
        add(out, "pvc.pv", "PV output circuit", pvOutput);
        add(out, "pvc.out", "Controller-to-battery circuit", controllerOutput);
        return out;
    }

    static void add(List<Check> out, String id, String name, ConductorSelection sel) {
        if (!(sel instanceof ConductorSelection.Sized s)) {
            out.add(new Check(id + ".none", name + ": " + ((ConductorSelection.NotSized) sel).reason(), 0, 1, "",
                    Check.Sense.AT_LEAST, "no conductor in the tables fits"));
            return;
        }
        var a = s.chosen().ampacity();
        var v = s.chosen().voltageDrop();
        boolean nec = s.chosen().size().system() == TableSystem.NEC;
        String size = s.chosen().size().label() + (s.chosen().parallelSets() > 1 ? " × " + s.chosen().parallelSets() : "");
        out.add(new Check(id + ".ampacity", name + " " + size + ": allowable ampacity", a.allowableAmpacityA(),
                Math.max(a.designCurrentA(), a.conditionsOfUseCurrentA()), "A", Check.Sense.AT_LEAST,
                nec ? "NEC 2023 690.8(B) / 210.19(A)(1), Table 310.16 with 310.15(B)(1)(1)" : "IEC 60364-5-52 method C"));
        out.add(new Check(id + ".drop", name + ": voltage drop", v.dropPct(), v.limitPct(), "%", Check.Sense.AT_MOST, "project limit"));
        out.add(new Check(id + ".fuse", name + ": fuse or breaker rating", s.device().ratingA(), a.designCurrentA(), "A",
                Check.Sense.AT_LEAST, nec ? "next standard rating, NEC 2023 240.6(A)" : "IEC 60364-4-43: Ib ≤ In"));
    }
}
