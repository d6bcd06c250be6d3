package org.holdover.sizing;

import java.util.ArrayList;
import java.util.List;
import org.holdover.battery.BankDesign;
import org.holdover.battery.BatteryModule;
import org.holdover.battery.TerminalModel;
import org.holdover.dc.BankResistance;
import org.holdover.dc.ConductorRequest;
import org.holdover.dc.ConductorSelection;
import org.holdover.dc.ConductorSizer;
import org.holdover.dc.ConductorTables;
import org.holdover.dc.CurrentFactors;
import org.holdover.dc.Installation;
import org.holdover.dc.ShortCircuit;
import org.holdover.dc.SurgeFix;
import org.holdover.dc.SurgeFixes;
import org.holdover.dc.SurgeInput;
import org.holdover.dc.SurgeResult;
import org.holdover.dc.SurgeVoltage;
import org.holdover.dc.TableSystem;
import org.holdover.inverter.InverterSpec;
import org.holdover.load.LoadAnalysis;
import org.holdover.load.Motor;
import org.holdover.load.StartingMotor;

/**
 * The DC side of an inverter and a bank: the battery–inverter conductor, the voltage at the inverter during
 * the motor start at the worst case the design allows (lowest state of charge, coldest battery), and the
 * prospective short-circuit current.
 *
 * <p>Worst case: rested open-circuit voltage at the state-of-charge floor (1 − depth of discharge), internal
 * resistance scaled to the coldest battery temperature, cable resistance at the conductor's rated
 * temperature. The inverter's DC input during the start is its loss model at the surge power; the current
 * rises as the voltage falls (power balance solved in closed form).
 */
public final class DcSide {

    /** Most parallel conductor sets per pole considered for a battery cable (common practice, no source). */
    public static final int MAX_CABLE_SETS = 2;
    /** Share of direct-on-line starting demand left by a soft starter, for the fix suggestion. */
    public static final double SOFT_STARTER_SHARE = ProjectAssembler.DEFAULT_SOFT_FACTOR;

    private DcSide() {
    }

    public static DcDesign evaluate(SizingInput in, InverterSpec inv, BankDesign bank, List<Double> higherClasses) {
        WiringRules w = in.wiring();
        BatteryModule m = bank.module();
        LoadAnalysis la = in.loads();
        boolean motors = !la.starting().isEmpty();
        double cableA = inv.loss().inputW(inv.continuousW()) / inv.dcMinV();
        Installation inst = w.system() == TableSystem.NEC ? Installation.nec75(w.ambientC())
                : Installation.iec(w.ambientC(), 2, 90);
        ConductorRequest req = new ConductorRequest("Battery to inverter", cableA, CurrentFactors.CONTINUOUS_LOAD,
                bank.bankNominalV(), w.batteryToInverterM(), w.maxVoltageDropPct(), inst, MAX_CABLE_SETS, w.fineStranded());
        ConductorSelection cable = ConductorSizer.standard().size(req);
        double cableOhm = cable instanceof ConductorSelection.Sized s ? s.chosen().voltageDrop().roundTripResistanceOhm() : 0.0;
        // Inverters in parallel: the battery cable runs to a bus bar and each unit draws its share through its own leads,
        // so the start current sees one lead's resistance ÷ units in series with the cable.
        InverterLeads leads = InverterLeads.size(in, inv, bank.bankNominalV());
        double leadsOhm = leads != null && leads.lead() instanceof ConductorSelection.Sized ls
                ? ls.chosen().voltageDrop().roundTripResistanceOhm() / leads.units() : 0.0;

        double floor = 1.0 - bank.requirement().depthOfDischarge();
        double tempC = bank.requirement().batteryTempC();
        int cells = bank.series() * m.cells();
        double ocv = TerminalModel.ocvCellV(m.chemistry(), floor);
        double rFactor = TerminalModel.resistanceFactor(m.chemistry(), tempC);
        double bankOhm = BankResistance.ofModules(m.internalResistanceOhm() * rFactor, bank.series(), bank.strings());
        LoadAnalysis.Figures f = la.figures();
        double surgeInW = inv.loss().inputW(motors ? f.surgeW() : f.runningPeakW());
        double perString = bank.requirement().surgeS() <= m.surgeS() ? m.maxSurgeA() : m.maxContinuousA();
        double peakLimit = perString * bank.strings();
        SurgeInput input = new SurgeInput(cells * ocv, bankOhm, cableOhm + leadsOhm, surgeInW, inv.dcMinV(), peakLimit);
        SurgeResult surge = SurgeVoltage.solve(input);

        List<SurgeFixes.Evaluation> fixes = List.of();
        if (!surge.passes()) {
            List<SurgeFix> candidates = new ArrayList<>();
            for (double cls : higherClasses) {
                double k = cls / bank.requirement().busClassV();
                candidates.add(new SurgeFix.HigherBusVoltage(fmt(cls) + " V bus (same chemistry, " + fmt(k)
                        + " × the cells in series)", cells * k * ocv, bankOhm * k, inv.dcMinV() * k, peakLimit));
            }
            candidates.add(new SurgeFix.ParallelStrings(bank.strings(), 1));
            if (cable instanceof ConductorSelection.Sized s) {
                for (SurgeFix.HeavierCable h : SurgeFixes.heavierCables(ConductorTables.standard(), s.chosen().size(),
                        s.chosen().parallelSets(), w.batteryToInverterM(), s.chosen().voltageDrop().conductorTempC(),
                        w.fineStranded(), 2)) {
                    candidates.add(h.withFixedOhm(leadsOhm));
                }
                candidates.add(new SurgeFix.ShorterCable(w.batteryToInverterM(), w.batteryToInverterM() / 2, leadsOhm));
            }
            double direct = 0;
            for (StartingMotor sm : la.starting()) {
                Motor mo = la.appliances().get(sm.applianceIndex()).motor();
                if (mo.starter() == Motor.Starter.DIRECT) {
                    direct += sm.startW() * (1 - SOFT_STARTER_SHARE);
                }
            }
            if (motors && direct > 0) {
                double softW = f.surgeW() - direct;
                candidates.add(new SurgeFix.SoftStarter(inv.loss().inputW(softW) / surgeInW));
            }
            fixes = SurgeFixes.evaluate(input, candidates);
        }
        double fullOcv = cells * TerminalModel.ocvCellV(m.chemistry(), 1.0);
        double warmOhm = BankResistance.ofModules(m.internalResistanceOhm(), bank.series(), bank.strings());
        ShortCircuit.Result sc = ShortCircuit.assess(new ShortCircuit.Input(fullOcv, warmOhm, cableOhm,
                ShortCircuit.COMMON_ORDINARY_DEVICE_LIMIT_A, ShortCircuit.COMMON_ORDINARY_DEVICE_LIMIT_A));
        return new DcDesign(cableA, cable, floor, tempC, cells, ocv, m.internalResistanceOhm(), rFactor, bankOhm, cableOhm,
                surgeInW, peakLimit, surge, fixes, sc, leads, leadsOhm);
    }

    private static String fmt(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.format(java.util.Locale.ROOT, "%.2f", v);
    }
}
