package org.holdover.sizing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Path;
import org.holdover.dc.ConductorSelection;
import org.holdover.dc.SurgeResult;
import org.holdover.project.InputException;
import org.holdover.project.ProjectReader;
import org.junit.jupiter.api.Test;

/** The DC side joined to the sizing: hand calculations on a demo, and a design the start voltage rejects. */
class DcSideTest {

    static SizingResult size(String file) throws InputException {
        return Sizing.run(ProjectAssembler.assemble(ProjectReader.read(Path.of(file), file)));
    }

    static DcDesign chosenDc(SizingResult r) {
        return r.chosen().banks().stream().filter(b -> b.design() == r.bank()).findFirst().orElseThrow().dc();
    }

    @Test
    void startVoltageOfTheFarmShopByHand() throws InputException {
        SizingResult r = size("examples/farm-shop-backup.yaml");
        DcDesign dc = chosenDc(r);
        // Bank: 15 strings of one 51.2 V LiFePO4 module (16 cells), 25 mΩ at 25 °C; depth of discharge 80 % → floor 20 %.
        assertThat(dc.cells()).isEqualTo(16);
        assertThat(dc.socFloor()).isCloseTo(0.2, within(1e-12));
        // Open-circuit voltage table (from memory): LiFePO4 3.220 V at 20 % → 16 × 3.22 = 51.52 V.
        assertThat(dc.openCircuitV()).isCloseTo(51.52, within(1e-9));
        // Resistance factor at 5 °C: halfway between 0 °C (2.0) and 10 °C (1.4) = 1.7 → 0.025 × 1.7 × 1 / 15.
        assertThat(dc.bankOhm()).isCloseTo(0.025 * 1.7 / 15, within(1e-12));
        // Cable: 3/0 AWG, 3 m one way; NEC 2023 Chapter 9 Table 8 stranded 0.0766 Ω/kft at 75 °C → 2 × 3 × 0.0766 / 304.8.
        ConductorSelection.Sized cable = (ConductorSelection.Sized) dc.cable();
        assertThat(cable.chosen().size().label()).isEqualTo("3/0 AWG");
        assertThat(dc.cableOhm()).isCloseTo(2 * 3 * 0.0766 / 304.8, within(1e-12));
        // Power balance V·I = P with V = V_oc − I·R: V = (V_oc + √(V_oc² − 4PR)) / 2.
        double voc = dc.openCircuitV(), rr = dc.bankOhm() + dc.cableOhm(), p = dc.surgeInputW();
        double v = (voc + Math.sqrt(voc * voc - 4 * p * rr)) / 2;
        SurgeResult.Operating o = (SurgeResult.Operating) dc.surge();
        assertThat(o.inverterTerminalV()).isCloseTo(v, within(1e-9));
        assertThat(o.currentA()).isCloseTo(p / v, within(1e-9));
        // The inverter's DC input during the start is its loss model at the surge power.
        assertThat(p).isCloseTo(r.inverter().spec().loss().inputW(r.input().loads().figures().surgeW()), within(1e-9));
        assertThat(r.checks()).anySatisfy(c -> assertThat(c.id()).isEqualTo("dc.surgeV"));
    }

    @Test
    void aTwelveVoltBusWithAOneHorsepowerPumpIsRejectedWithItsFixes() throws InputException {
        SizingResult r = size("examples/variants/cabin-12v-well-pump.yaml");
        assertThat(r.passes()).isFalse();
        assertThat(r.chosen()).isNull();
        String reason = r.buses().get(0).reason();
        assertThat(reason).contains("during the start the inverter sees").contains("below its 10.5 V cutoff");
        assertThat(reason).contains("any one of these would fix it").contains("24 V bus").contains("soft starter");
        // The rejected bank's own numbers: at the floor (50 % DoD) and 0 °C the voltage at the inverter is below 10.5 V.
        BankOption rejected = r.buses().get(0).banks().stream().filter(b -> b.dc() != null).findFirst().orElseThrow();
        SurgeResult.Operating o = (SurgeResult.Operating) rejected.dc().surge();
        assertThat(o.inverterTerminalV()).isLessThan(10.5);
        assertThat(rejected.dc().workingFixes()).isNotEmpty();
    }

    @Test
    void moreStringsNeverLowerTheStartVoltageThroughTheSizing() throws InputException {
        // Monotonicity through the whole chain: the same design with a lower parallel-string cap must not get a
        // higher start voltage (fewer strings, more resistance).
        SizingResult r = size("examples/ridge-cabin-offgrid.yaml");
        DcDesign dc = chosenDc(r);
        SurgeResult.Operating now = (SurgeResult.Operating) dc.surge();
        var one = dc.fixes();
        assertThat(one).isEmpty();
        double fewer = new org.holdover.dc.SurgeInput(dc.openCircuitV(), dc.bankOhm() * r.bank().strings() / (r.bank().strings() - 1),
                dc.cableOhm(), dc.surgeInputW(), r.inverter().spec().dcMinV(), dc.peakLimitA()).totalResistanceOhm();
        SurgeResult less = org.holdover.dc.SurgeVoltage.solve(new org.holdover.dc.SurgeInput(dc.openCircuitV(), fewer - dc.cableOhm(),
                dc.cableOhm(), dc.surgeInputW(), r.inverter().spec().dcMinV(), dc.peakLimitA()));
        assertThat(((SurgeResult.Operating) less).inverterTerminalV()).isLessThan(now.inverterTerminalV());
    }
}
