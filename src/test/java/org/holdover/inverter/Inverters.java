package org.holdover.inverter;

import java.util.List;

/** Inverter specs for tests. */
final class Inverters {

    private Inverters() {
    }

    static final List<EfficiencyPoint> POINTS = List.of(new EfficiencyPoint(0.1, 0.88), new EfficiencyPoint(0.2, 0.92),
            new EfficiencyPoint(0.5, 0.94), new EfficiencyPoint(1.0, 0.93));

    static InverterSpec spec(InverterSpec.Topology topology, double rms, double modulation) {
        return new InverterSpec("T", "test", 384, 300, 460, new AcOutput(rms, List.of(50.0), false), 5000, 5000, 0,
                List.of(new SurgeRating(5, 10000), new SurgeRating(0.2, 15000)), 25, 1.5, POINTS, 30, topology, modulation,
                0, LossModel.fit(5000, 30, POINTS));
    }
}
