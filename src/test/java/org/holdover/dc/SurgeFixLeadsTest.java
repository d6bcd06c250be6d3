package org.holdover.dc;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/** A cable fix changes the battery cable only: the inverters' own leads stay in the path (arithmetic by hand). */
class SurgeFixLeadsTest {

    private static final SurgeInput PRESENT = new SurgeInput(52.0, 0.003, 0.004, 12_000, 42.0, 2_000);

    @Test
    void aShorterCableShortensTheCableNotTheLeads() {
        // Path 4.0 mΩ = 1.0 mΩ of leads + 3.0 mΩ of cable; a third of the length: 1.0 + 3.0 ÷ 3 = 2.0 mΩ.
        SurgeInput after = new SurgeFix.ShorterCable(3.0, 1.0, 0.001).apply(PRESENT);
        assertThat(after.cableRoundTripResistanceOhm()).isCloseTo(0.002, within(1e-15));
        // Without leads the whole path shortens: 4.0 ÷ 3.
        assertThat(new SurgeFix.ShorterCable(3.0, 1.0).apply(PRESENT).cableRoundTripResistanceOhm()).isCloseTo(0.004 / 3, within(1e-15));
    }

    @Test
    void aHeavierCableKeepsTheLeads() {
        // A 2.0 mΩ cable on a path with 1.0 mΩ of leads: 3.0 mΩ.
        SurgeInput after = new SurgeFix.HeavierCable("2/0 AWG, 1 set(s)", 0.002).withFixedOhm(0.001).apply(PRESENT);
        assertThat(after.cableRoundTripResistanceOhm()).isCloseTo(0.003, within(1e-15));
        assertThat(new SurgeFix.HeavierCable("2/0 AWG, 1 set(s)", 0.002).apply(PRESENT).cableRoundTripResistanceOhm()).isEqualTo(0.002);
    }
}
