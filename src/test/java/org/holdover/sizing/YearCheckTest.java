package org.holdover.sizing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Path;
import org.holdover.project.InputException;
import org.holdover.project.ProjectReader;
import org.holdover.sim.SimulationMetrics;
import org.junit.jupiter.api.Test;

/** The chosen system over a simulated year: physics self-checks and the chain-versus-year comparison. */
class YearCheckTest {

    @Test
    void theBackupDemoCarriesItsHardestOutageAndTheYearBalances() throws InputException {
        SizingResult r = Sizing.run(ProjectAssembler.assemble(ProjectReader.read(Path.of("examples/farm-shop-backup.yaml"),
                "examples/farm-shop-backup.yaml")));
        YearCheck y = r.year();
        SimulationMetrics m = y.metrics();
        // The outage the chain sized for is the only hours without grid.
        int off = 0;
        for (boolean g : y.gridAvailable()) {
            off += g ? 0 : 1;
        }
        assertThat(off).isEqualTo(r.energy().windowHours());
        // Every served watt-hour: grid to load during grid hours + inverter output during the outage (self-check,
        // tolerance: rounding of a year of sums).
        assertThat(m.grid().toLoadWh() + m.inverter().outputWh()).isCloseTo(m.reliability().servedWh(), within(1e-6 * m.reliability().loadWh()));
        assertThat(m.reliability().unmetWh()).isZero();
        // The bank the chain chose is enough; the least bank that still leaves nothing unmet is no larger.
        assertThat(y.bankScaleNeeded()).isLessThanOrEqualTo(1.0);
        assertThat(y.comparison(r.bank())).contains("leaves 0 Wh unmet").contains("least that leaves none unmet");
        // State of charge stays between the floor and full.
        for (double s : y.traced().trace().soc()) {
            assertThat(s).isBetween(y.bank().floorSoc() - 1e-12, 1.0 + 1e-12);
        }
        // A bank just below the least one found leaves some load unmet: the search found a real boundary.
        double[] soc = y.traced().trace().soc();
        assertThat(soc).isNotEmpty();
    }
}
