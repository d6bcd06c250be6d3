package org.holdover.sizing;

import java.nio.file.Path;
import org.holdover.project.InputException;
import org.holdover.project.ProjectReader;

/** The two demo projects, sized once per test run (demo data). */
final class Demos {

    static final String CABIN = "examples/ridge-cabin-offgrid.yaml";
    static final String FARM = "examples/farm-shop-backup.yaml";

    private static SizingResult cabin;
    private static SizingResult farm;

    private Demos() {
    }

    static synchronized SizingResult cabin() {
        if (cabin == null) {
            cabin = size(CABIN);
        }
        return cabin;
    }

    private static SizingResult farmRules;

    /** The farm sized by the rules alone (no system search): the PV sizing chain's own choice. */
    static synchronized SizingResult farmRules() {
        if (farmRules == null) {
            farmRules = Sizing.rules(input(FARM), null);
        }
        return farmRules;
    }

    static synchronized SizingResult farm() {
        if (farm == null) {
            farm = size(FARM);
        }
        return farm;
    }

    static SizingInput input(String file) {
        try {
            return ProjectAssembler.assemble(ProjectReader.read(Path.of(file), file));
        } catch (InputException e) {
            throw new IllegalStateException(e);
        }
    }

    static SizingResult size(String file) {
        return Sizing.run(input(file));
    }

    /** The same input with another solar setup. */
    static SizingInput withSolar(SizingInput in, SolarSetup s) {
        return new SizingInput(in.name(), in.mode(), in.acVoltsRms(), in.frequencyHz(), in.splitPhase(), in.inverterAmbientC(),
                in.batteryColdestC(), in.inverterMargin(), in.maxBatteryCurrentA(), in.maxParallelRule(), in.chemistry(),
                in.depthOfDischarge(), in.endOfLife(), in.location(), in.outageHours(), in.autonomyDays(), in.loads(),
                in.catalog(), in.assumptions(), in.warnings(), in.notes(), in.measuredW(), in.profileScale(),
                in.profileServed(), in.wiring(), in.maxUnmetFraction(), in.batteryDesignC(), s);
    }

    /** The setup with another record low (and tilt, null to search). */
    static SolarSetup withRecordLow(SolarSetup s, double recordLowC, Double tiltDeg) {
        double[] tilts = tiltDeg == null ? s.tiltsDeg() : new double[] {tiltDeg};
        return new SolarSetup(s.site(), s.year(), s.weather(), s.sunPath(), s.resource(), s.monthlyGhiKwhM2Day(),
                s.monthlyAirTempC(), tiltDeg, tilts, s.settings(), s.losses(), s.controllerType(), s.refillDays(), recordLowC,
                s.designHighC(), s.designIrradianceWm2(), s.systemVoltageLimitV(), s.maxControllers());
    }
}
