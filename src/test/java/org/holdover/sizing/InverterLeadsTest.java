package org.holdover.sizing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.holdover.dc.ConductorSelection;
import org.holdover.inverter.InverterSpec;
import org.junit.jupiter.api.Test;

/**
 * Each inverter's DC leads from the common bus bar when inverters run in parallel, worked by hand for the whole-shop
 * variant (demo data: three 4 kW units, 42 V cutoff, 51.2 V bank, 1.5 m leads, 30 °C, NEC tables).
 */
class InverterLeadsTest {

    @Test
    void threeFourKilowattUnitsEachGetOneAwgOnAOneHundredFiftyAmpFuse() {
        SizingResult r = Sizing.run(Demos.input(ParallelInvertersTest.WHOLE_SHOP));
        InverterSpec stack = r.inverter().spec();
        assertThat(stack.units()).isEqualTo(3);
        InverterLeads leads = r.inverterLeads();
        assertThat(leads).isNotNull();
        assertThat(leads.units()).isEqualTo(3);
        // One unit's rated DC input at its cutoff: 4,000 W × (1 + p0 + k1 + k2) ÷ 42 V, p0 = 28 W ÷ 4,000 W.
        var unit = stack.catalogUnit().loss();
        double amps = 4000 * (1 + 28 / 4000.0 + unit.k1() + unit.k2()) / 42.0;
        assertThat(leads.unitContinuousA()).isCloseTo(amps, within(1e-9 * amps));
        // About 101 A (a 94 % efficient unit at full output): the battery cable carries three of them.
        assertThat(amps).isBetween(98.0, 104.0);
        var sized = (ConductorSelection.Sized) leads.lead();
        // × 1.25 for continuous current (NEC 2023 210.19(A)(1)(a)): about 127 A. NEC 2023 Table 310.16, copper, 75 °C
        // column: 2 AWG 115 A is short, 1 AWG 130 A carries it (30 °C ambient: factor 1.00, Table 310.15(B)(1)(1)).
        assertThat(sized.chosen().ampacity().designCurrentA()).isCloseTo(1.25 * amps, within(1e-9 * amps));
        assertThat(sized.chosen().size().label()).isEqualTo("1 AWG");
        assertThat(sized.chosen().parallelSets()).isEqualTo(1);
        assertThat(sized.chosen().ampacity().allowableAmpacityA()).isEqualTo(130.0);
        // Fuse: the next standard rating at or above ~127 A is 150 A (NEC 2023 240.6(A): …, 125, 150, …); 130 A is not a
        // standard rating, so 240.4(B) lets the next size up protect the conductor.
        assertThat(sized.device().ratingA()).isEqualTo(150.0);
        // Drop: 2 × 1.5 m × 0.154 Ω/kft ÷ 304.8 m/kft (NEC Chapter 9 Table 8, uncoated stranded, 75 °C) × I ÷ 51.2 V.
        double dropPct = 100 * 2 * 1.5 * 0.154 / 304.8 * amps / 51.2;
        assertThat(sized.chosen().voltageDrop().dropPct()).isCloseTo(dropPct, within(0.005));
        // During the motor start each unit draws a third of the current through its own leads: the start current sees
        // one lead's round trip ÷ 3 in series with the battery cable (2 × 1.5 m × 0.154 Ω/kft ÷ 304.8 ÷ 3 ≈ 0.505 mΩ).
        DcDesign dc = r.chosen().banks().stream().filter(b -> b.design() == r.bank()).findFirst().orElseThrow().dc();
        assertThat(dc.leads()).isSameAs(leads);
        assertThat(dc.leadsOhm()).isCloseTo(2 * 1.5 * 0.154 / 304.8 / 3, within(2e-3 * dc.leadsOhm()));
        // Power balance P = V·I, V = V_oc − I·R with R = bank + cable + leads ÷ 3: I = 2P ÷ (V_oc + √(V_oc² − 4PR)).
        double rTotal = dc.bankOhm() + dc.cableOhm() + dc.leadsOhm();
        double voc = dc.openCircuitV();
        double i = 2 * dc.surgeInputW() / (voc + Math.sqrt(voc * voc - 4 * dc.surgeInputW() * rTotal));
        var o = (org.holdover.dc.SurgeResult.Operating) dc.surge();
        assertThat(o.currentA()).isCloseTo(i, within(1e-9 * i));
        assertThat(o.inverterTerminalV()).isCloseTo(voc - i * rTotal, within(1e-9 * voc));
        // The checks are the pinned system's, and they pass.
        assertThat(r.checks()).filteredOn(c -> c.id().startsWith("lead.")).hasSize(3).allSatisfy(c -> assertThat(c.passes()).isTrue());
    }

    @Test
    void aSingleInverterHasNoLeadsFromABusBar() {
        SizingResult r = Demos.farm();
        assertThat(r.inverter().spec().units()).isEqualTo(1);
        assertThat(r.inverterLeads()).isNull();
        assertThat(r.checks()).noneMatch(c -> c.id().startsWith("lead."));
        DcDesign dc = r.chosen().banks().stream().filter(b -> b.design() == r.bank()).findFirst().orElseThrow().dc();
        assertThat(dc.leads()).isNull();
        assertThat(dc.leadsOhm()).isZero();
    }
}
