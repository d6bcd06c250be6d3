package org.holdover.inverter;

import java.util.Comparator;
import java.util.List;
import java.util.Objects;

/**
 * A catalog inverter.
 *
 * @param id                 catalog identifier
 * @param description        plain description
 * @param busClassV          nominal DC bus class it is built for (12, 24, 48 V or a high-voltage class), V
 * @param dcMinV             lowest DC input it runs at (its low-voltage cutoff), V
 * @param dcMaxV             highest DC input it accepts, V
 * @param ac                 the AC output
 * @param continuousW        continuous output at 25 °C, W
 * @param continuousVa       continuous output at 25 °C, VA
 * @param perLegVa           continuous VA one leg can carry (split phase; 0 when not split phase)
 * @param surge              short-time ratings, any order
 * @param deratingStartC     ambient above which the continuous rating falls, °C
 * @param deratingPctPerC    how fast it falls, % of rating per °C
 * @param efficiencyPoints   tabulated efficiency, increasing load fraction
 * @param noLoadW            no-load (idle) DC draw while on, W
 * @param topology           how it makes AC from DC
 * @param maxModulationIndex highest modulation index of a transformerless bridge (peak AC ÷ DC), (0, 1.2]
 * @param price              demo price, currency units
 * @param loss               the loss model fitted to the points
 * @param maxInParallel      most identical units its maker allows to run in parallel on one output (1: not built for it)
 * @param units              identical units in parallel that this spec describes (1 for a catalog unit)
 * @param unit               the catalog unit when {@code units > 1}, else null
 */
public record InverterSpec(String id, String description, double busClassV, double dcMinV, double dcMaxV,
                           AcOutput ac, double continuousW, double continuousVa, double perLegVa,
                           List<SurgeRating> surge, double deratingStartC, double deratingPctPerC,
                           List<EfficiencyPoint> efficiencyPoints, double noLoadW, Topology topology,
                           double maxModulationIndex, double price, LossModel loss, int maxInParallel, int units,
                           InverterSpec unit) {

    /** How the inverter makes AC from DC. */
    public enum Topology {
        /** A low-frequency transformer steps the bridge output up: any battery voltage works. */
        TRANSFORMER,
        /** A DC boost stage raises the battery voltage before the bridge. */
        TRANSFORMERLESS_BOOST,
        /** The bridge switches the battery voltage directly: the battery must exceed the AC peak ÷ modulation index. */
        TRANSFORMERLESS_DIRECT
    }

    public InverterSpec {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(ac, "ac");
        Objects.requireNonNull(topology, "topology");
        Objects.requireNonNull(loss, "loss");
        surge = List.copyOf(surge).stream().sorted(Comparator.comparingDouble(SurgeRating::durationS)).toList();
        efficiencyPoints = List.copyOf(efficiencyPoints);
        if (!(busClassV > 0) || !(dcMinV > 0) || !(dcMaxV > dcMinV)) {
            throw new IllegalArgumentException(id + ": DC window must be 0 < min < max");
        }
        if (!(continuousW > 0) || !(continuousVa >= continuousW)) {
            throw new IllegalArgumentException(id + ": continuous VA must be >= continuous W > 0");
        }
        if (perLegVa < 0 || ac.splitPhase() && !(perLegVa > 0)) {
            throw new IllegalArgumentException(id + ": a split-phase output needs a per-leg rating");
        }
        if (!(maxModulationIndex > 0 && maxModulationIndex <= 1.2)) {
            throw new IllegalArgumentException(id + ": maxModulationIndex must be in (0, 1.2]");
        }
        if (deratingPctPerC < 0) {
            throw new IllegalArgumentException(id + ": derating must be >= 0 %/°C");
        }
        if (maxInParallel < 1 || units < 1 || units > maxInParallel || (units == 1) != (unit == null)) {
            throw new IllegalArgumentException(id + ": units must be 1 to " + maxInParallel + ", with the catalog unit when more than 1");
        }
    }

    /** A catalog unit that does not run in parallel. */
    public InverterSpec(String id, String description, double busClassV, double dcMinV, double dcMaxV,
                        AcOutput ac, double continuousW, double continuousVa, double perLegVa,
                        List<SurgeRating> surge, double deratingStartC, double deratingPctPerC,
                        List<EfficiencyPoint> efficiencyPoints, double noLoadW, Topology topology,
                        double maxModulationIndex, double price, LossModel loss) {
        this(id, description, busClassV, dcMinV, dcMaxV, ac, continuousW, continuousVa, perLegVa, surge, deratingStartC,
                deratingPctPerC, efficiencyPoints, noLoadW, topology, maxModulationIndex, price, loss, 1, 1, null);
    }

    /** A catalog unit that may run with up to {@code maxInParallel} identical units. */
    public InverterSpec(String id, String description, double busClassV, double dcMinV, double dcMaxV,
                        AcOutput ac, double continuousW, double continuousVa, double perLegVa,
                        List<SurgeRating> surge, double deratingStartC, double deratingPctPerC,
                        List<EfficiencyPoint> efficiencyPoints, double noLoadW, Topology topology,
                        double maxModulationIndex, double price, LossModel loss, int maxInParallel) {
        this(id, description, busClassV, dcMinV, dcMaxV, ac, continuousW, continuousVa, perLegVa, surge, deratingStartC,
                deratingPctPerC, efficiencyPoints, noLoadW, topology, maxModulationIndex, price, loss, maxInParallel, 1, null);
    }

    /**
     * {@code n} identical units of this catalog unit in parallel on one AC output, sharing the load equally: every rating
     * (continuous W and VA, per leg, each surge rating), the no-load draw and the price are n times the unit's; the DC
     * window, derating and efficiency per unit of load are the unit's. With equal sharing the loss model of the n units is
     * the unit's with n times the rating: n × (P/n + R·loss(P/(n·R))) = P + n·R·loss(P/(n·R)), so p0, k1 and k2 stay.
     * Every unit is taken to stay on (no unit sleeps at light load), which counts the most no-load draw.
     *
     * @param n units, 1 to {@link #maxInParallel()}
     */
    public InverterSpec inParallel(int n) {
        InverterSpec u = catalogUnit();
        if (n == 1) {
            return u;
        }
        if (n < 1 || n > u.maxInParallel) {
            throw new IllegalArgumentException(u.id + ": " + n + " units in parallel, the catalog allows 1 to " + u.maxInParallel);
        }
        List<SurgeRating> s = u.surge.stream().map(r -> new SurgeRating(r.durationS(), n * r.va())).toList();
        LossModel l = new LossModel(n * u.loss.ratedW(), u.loss.p0(), u.loss.k1(), u.loss.k2());
        return new InverterSpec(u.id, u.description, u.busClassV, u.dcMinV, u.dcMaxV, u.ac, n * u.continuousW,
                n * u.continuousVa, n * u.perLegVa, s, u.deratingStartC, u.deratingPctPerC, u.efficiencyPoints, n * u.noLoadW,
                u.topology, u.maxModulationIndex, n * u.price, l, u.maxInParallel, n, u);
    }

    /** The single catalog unit (this spec when it is one). */
    public InverterSpec catalogUnit() {
        return unit == null ? this : unit;
    }

    /** The id, with the unit count when more than one: "ID" or "2 × ID". */
    public String label() {
        return units == 1 ? id : units + " × " + id;
    }

    /**
     * Fraction of the continuous rating available at an ambient temperature: 1 up to the derating start,
     * then falling linearly, never below 0.
     *
     * @param ambientC ambient around the inverter, °C
     */
    public double deratingFactor(double ambientC) {
        return Math.max(0.0, 1.0 - Math.max(0.0, ambientC - deratingStartC) * deratingPctPerC / 100.0);
    }

    /**
     * VA available for a start of the given duration: the rating of the shortest listed duration that is
     * at least as long (a rating held longer also covers a shorter start); the continuous VA when the
     * start outlasts every listed rating.
     *
     * @param durationS length of the start, s
     */
    public double surgeVa(double durationS) {
        for (SurgeRating s : surge) {
            if (durationS <= s.durationS()) {
                return s.va();
            }
        }
        return continuousVa;
    }

    /**
     * Lowest DC voltage at which a transformerless bridge can still make the full AC peak, V:
     * √2 × V_rms ÷ maximum modulation index. Zero for topologies that boost or use a transformer.
     */
    public double minDcForAcPeakV() {
        return topology == Topology.TRANSFORMERLESS_DIRECT ? ac.peakV() / maxModulationIndex : 0.0;
    }
}
