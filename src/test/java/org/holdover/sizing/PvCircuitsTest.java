package org.holdover.sizing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.holdover.dc.ConductorSelection;
import org.junit.jupiter.api.Test;

/** The PV-side conductors of the cabin demo, by hand from the tables (demo data; IEC tables, 30 °C ambient). */
class PvCircuitsTest {

    /** IEC 60228 class 2 copper at 20 °C, Ω/m (REFERENCES.md §3b), taken to 90 °C by kt = 250 / (230 + t). */
    static double iecOhmPerM(double r20OhmPerKm, double tempC) {
        return r20OhmPerKm / 1000 * (230 + tempC) / 250;
    }

    @Test
    void pvOutputCircuitOfTheCabinByHand() {
        SizingResult r = Demos.cabin();
        PvCircuits c = r.pvCircuits();
        assertThat(c).isNotNull();
        var cand = r.solar().chosen().candidate();
        // 2 strings of 3 DEMO-PV-330-60 (Isc 10.30 A, Vmp 33.9 V) on one controller (demo catalog).
        assertThat(cand.perController().array().strings()).isEqualTo(2);
        assertThat(cand.perController().array().modulesPerString()).isEqualTo(3);
        ConductorSelection.Sized pv = (ConductorSelection.Sized) c.pvOutput();
        // NEC 690.8(A)(1) and (B): 1.25 × 1.25 × Isc = 1.5625 × 20.6 A = 32.19 A.
        assertThat(pv.chosen().ampacity().designCurrentA()).isCloseTo(1.5625 * 2 * 10.30, within(1e-9));
        // 6 mm² carries it (58 A, IEC 60364-5-52 Table B.52.3 method C XLPE) but drops too much over 15 m:
        // 20.6 A × 2 × 15 m × 3.08 Ω/km at 90 °C / (3 × 33.9 V) = 2.40 % > 2 %; 10 mm² (1.83 Ω/km) → 1.42 %.
        double drop6 = 100 * 20.6 * 2 * 15 * iecOhmPerM(3.08, 90) / (3 * 33.9);
        assertThat(drop6).isGreaterThan(2.0);
        assertThat(pv.chosen().size().label()).isEqualTo("10 mm²");
        double drop10 = 100 * 20.6 * 2 * 15 * iecOhmPerM(1.83, 90) / (3 * 33.9);
        assertThat(pv.chosen().voltageDrop().dropPct()).isCloseTo(drop10, within(1e-9));
        // Table B.52.3 (XLPE, method C, two loaded conductors): 10 mm² = 80 A at 30 °C (factor 1.00, Table B.52.14).
        assertThat(pv.chosen().ampacity().allowableAmpacityA()).isCloseTo(80, within(1e-9));
        // Next IEC 60269 rating at or above 32.19 A: 40 A.
        assertThat(pv.device().ratingA()).isEqualTo(40);
    }

    @Test
    void controllerToBatteryCircuitOfTheCabinByHand() {
        SizingResult r = Demos.cabin();
        ConductorSelection.Sized out = (ConductorSelection.Sized) r.pvCircuits().controllerOutput();
        double ratedA = r.solar().chosen().candidate().controller().ratedOutputCurrentA();
        assertThat(ratedA).isEqualTo(60); // DEMO-MPPT-150-60 (demo catalog)
        // Continuous current × 1.25 = 75 A: 6 mm² (58 A) is too small, 10 mm² (80 A) carries it.
        assertThat(out.chosen().ampacity().designCurrentA()).isCloseTo(75, within(1e-9));
        assertThat(out.chosen().size().label()).isEqualTo("10 mm²");
        // Drop at 60 A over 2 m one way on the 51.2 V bank: 60 × 4 m × 2.342 mΩ/m / 51.2 V = 1.10 %.
        assertThat(out.chosen().voltageDrop().dropPct())
                .isCloseTo(100 * 60 * 2 * 2 * iecOhmPerM(1.83, 90) / 51.2, within(1e-9));
        assertThat(out.device().ratingA()).isEqualTo(80);
        // Both circuits join the checks, and all pass.
        assertThat(r.checks()).filteredOn(k -> k.id().startsWith("pvc.")).hasSize(6).allSatisfy(k -> assertThat(k.passes()).isTrue());
    }

    @Test
    void aLongerPvRunNeverGetsAThinnerConductor() {
        SizingInput in = Demos.input(Demos.CABIN);
        var cand = Sizing.run(in).solar().chosen().candidate();
        double last = 0;
        for (double m : new double[] {5, 15, 30, 60, 120}) {
            WiringRules w = in.wiring();
            SizingInput longer = in.withWiring(new WiringRules(w.batteryToInverterM(), w.batteryToControllerM(), m,
                    w.maxVoltageDropPct(), w.ambientC(), w.system(), w.fineStranded(), w.busVoltageV()));
            var sel = PvCircuits.size(longer, cand, 51.2).pvOutput();
            assertThat(sel).isInstanceOf(ConductorSelection.Sized.class);
            double area = ((ConductorSelection.Sized) sel).chosen().size().areaMm2();
            assertThat(area).isGreaterThanOrEqualTo(last);
            last = area;
        }
    }
}
