package org.holdover.dc;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

/**
 * Sizes the conductors and the overcurrent device of a two-wire DC circuit.
 *
 * <p>Search order: one set per pole first, sizes ascending; then two sets (sizes eligible for paralleling only),
 * and so on up to the request's maximum. The first candidate that passes ampacity, voltage drop and the device
 * check is chosen, so the answer has the fewest parallel sets and, for that count, the smallest size.
 */
public final class ConductorSizer {

    private final ConductorTables tables;

    /** @param tables the conductor tables (normally {@link ConductorTables#standard()}) */
    public ConductorSizer(ConductorTables tables) {
        this.tables = tables;
    }

    /** A sizer on the bundled tables. */
    public static ConductorSizer standard() {
        return new ConductorSizer(ConductorTables.standard());
    }

    /**
     * @param request the circuit
     * @return the chosen conductor, or why none of the tabulated sizes works
     */
    public ConductorSelection size(ConductorRequest request) {
        Installation inst = request.installation();
        List<ConductorSize> sizes = tables.sizes(inst.system());
        List<CandidateEvaluation> all = new ArrayList<>();
        List<String> notes = notes(request);
        CandidateEvaluation last = null;
        for (int sets = 1; sets <= request.maxParallelSets(); sets++) {
            List<CandidateEvaluation> round = new ArrayList<>();
            for (ConductorSize size : sizes) {
                if (sets > 1 && !parallelAllowed(size)) {
                    continue;
                }
                round.add(evaluate(request, size, sets));
            }
            all.addAll(round);
            if (!round.isEmpty()) {
                last = round.get(round.size() - 1);
            }
            int chosen = firstIndex(round, CandidateEvaluation::passes);
            if (chosen >= 0) {
                int byAmpacity = firstIndex(round, c -> c.ampacity().ok());
                int byDrop = firstIndex(round, c -> c.voltageDrop().ok());
                int byDevice = firstIndex(round, c -> c.ampacity().ok() && c.device().fits());
                ConductorSelection.Governing governing = byDrop > byDevice
                        ? ConductorSelection.Governing.VOLTAGE_DROP
                        : byDevice > byAmpacity
                                ? ConductorSelection.Governing.OVERCURRENT_DEVICE
                                : ConductorSelection.Governing.AMPACITY;
                CandidateEvaluation pick = round.get(chosen);
                if (pick.device() instanceof OvercurrentDevice.Rated r
                        && r.basis() == OvercurrentDevice.Basis.NEXT_SIZE_UP) {
                    notes.add("The device is the next standard size above the conductor ampacity (NEC 240.4(B)); "
                            + "this is not permitted for a branch circuit supplying more than one receptacle for "
                            + "cord-and-plug-connected portable loads.");
                }
                if (pick.parallelSets() > 1) {
                    notes.add(parallelNote(inst.system()));
                }
                if (inst.system() == TableSystem.NEC && inst.terminalTempC() > 60
                        && (ratedDevice(pick).ratingA() <= 100.0 || tables.indexOf(pick.size())
                                <= tables.indexOf(tables.sizeOrThrow(TableSystem.NEC, "1 AWG")))) {
                    notes.add("From memory, NEC 110.14(C)(1)(a): terminations of circuits rated 100 A or less, or "
                            + "marked for 14 to 1 AWG, are 60 °C unless the equipment is listed and marked for "
                            + inst.terminalTempC() + " °C; check the equipment's marking.");
                }
                return new ConductorSelection.Sized(request, pick, governing, round.get(byAmpacity).size(),
                        round.get(byDrop).size(), all, notes);
            }
        }
        return new ConductorSelection.NotSized(request, notSizedReason(request, sizes, last), all, notes);
    }

    /**
     * Evaluates one size and parallel count without choosing: the three checks with every number.
     *
     * @param request      the circuit
     * @param size         a tabulated size of the request's system
     * @param parallelSets conductors per pole, ≥ 1
     */
    public CandidateEvaluation evaluate(ConductorRequest request, ConductorSize size, int parallelSets) {
        Installation inst = request.installation();
        if (size.system() != inst.system()) {
            throw new IllegalArgumentException("size " + size + " is not a " + inst.system() + " size");
        }
        AmpacityStep ampacity = ampacity(request, size, parallelSets);
        VoltageDropStep drop = VoltageDropStep.of(tables, size, parallelSets, request.oneWayLengthM(),
                request.continuousCurrentA(), inst.conductorTempC(),
                request.fineStranded() && inst.system() == TableSystem.IEC, request.nominalV(),
                request.maxVoltageDropPct());
        OvercurrentDevice device = ampacity.allowableAmpacityA() > 0
                ? OvercurrentProtection.select(tables, size, ampacity.designCurrentA(), ampacity.allowableAmpacityA())
                : new OvercurrentDevice.NoneFits(ampacity.designCurrentA(), 0.0,
                        "the conductor has no ampacity in these conditions");
        return new CandidateEvaluation(size, parallelSets, ampacity, drop, device);
    }

    /**
     * True when the size may be run in parallel: NEC 310.10(G) 1/0 AWG and larger. IEC: any size (IEC
     * 60364-5-52 523.7 sets conditions on equal current sharing rather than a minimum size; from memory).
     *
     * @param size a tabulated size
     * @return whether more than one set per pole is allowed
     */
    public boolean parallelAllowed(ConductorSize size) {
        if (size.system() == TableSystem.IEC) {
            return true;
        }
        ConductorSize smallest = tables.sizeOrThrow(TableSystem.NEC, "1/0 AWG");
        return tables.indexOf(size) >= tables.indexOf(smallest);
    }

    private AmpacityStep ampacity(ConductorRequest request, ConductorSize size, int sets) {
        Installation inst = request.installation();
        double design = request.designCurrentA();
        int ins = inst.insulationTempC();
        double table = tables.tableAmpacityA(size, ins);
        if (inst.system() == TableSystem.NEC) {
            int term = inst.terminalTempC();
            double terminal = tables.tableAmpacityA(size, term);
            double ka = tables.necAmbientFactor(inst.ambientC(), ins).orElse(0.0);
            double kadj = tables.necAdjustmentFactor(inst.currentCarryingConductors());
            double conditions = request.conditionsOfUseCurrentA();
            double corrected = sets * table * ka * kadj;
            double uncorrected = sets * Math.min(table, terminal);
            double allowable = Math.min(corrected, uncorrected);
            double required = ka * kadj > 0 ? conditions / (ka * kadj * sets) : Double.POSITIVE_INFINITY;
            boolean ok = uncorrected >= design - OvercurrentProtection.TOLERANCE_A
                    && corrected >= conditions - OvercurrentProtection.TOLERANCE_A;
            return new AmpacityStep(design, conditions, ins, table, term, terminal, ka, kadj, sets, corrected,
                    uncorrected, allowable, required, ok);
        }
        double ka = tables.iecAmbientFactor(inst.ambientC(), ins).orElse(0.0);
        int circuits = (inst.currentCarryingConductors() + 1) / 2;
        double kg = tables.iecGroupingFactor(circuits).orElse(0.0);
        double corrected = sets * table * ka * kg;
        double required = ka * kg > 0 ? design / (ka * kg * sets) : Double.POSITIVE_INFINITY;
        boolean ok = corrected >= design - OvercurrentProtection.TOLERANCE_A;
        return new AmpacityStep(design, design, ins, table, ins, table, ka, kg, sets, corrected, corrected,
                corrected, required, ok);
    }

    private List<String> notes(ConductorRequest request) {
        Installation inst = request.installation();
        List<String> notes = new ArrayList<>();
        if (inst.system() == TableSystem.NEC) {
            notes.add(String.format(Locale.ROOT, "Resistance is NEC Chapter 9 Table 8 (uncoated stranded copper, "
                    + "75 °C) scaled to a conductor temperature of %.0f °C with alpha = 0.00393 per °C at 20 °C.%s",
                    inst.conductorTempC(), conductorTempReason(inst)));
            notes.add("Terminations: the uncorrected ampacity is taken at the lower of the insulation ("
                    + inst.insulationTempC() + " °C) and terminal (" + inst.terminalTempC() + " °C) columns "
                    + "(NEC 110.14(C)).");
            if (tables.necAmbientFactor(inst.ambientC(), inst.insulationTempC()).isEmpty()) {
                notes.add(String.format(Locale.ROOT, "Table 310.15(B)(1)(1) does not permit %d °C insulation at "
                        + "%.1f °C ambient.", inst.insulationTempC(), inst.ambientC()));
            }
            if (request.fineStranded()) {
                notes.add("Fine-stranded conductors (finer than Class B or C) need connectors and terminals "
                        + "identified for that conductor class (NEC 110.14, since the 2011 edition; read in a "
                        + "2012 technical bulletin and a code forum, not in the code text). Table 8 resistance is "
                        + "for Class B stranding; use the cable maker's figure if it differs.");
            }
        } else {
            notes.add(String.format(Locale.ROOT, "Resistance is IEC 60228 %s plain copper at 20 °C scaled to %.0f °C "
                    + "with alpha = 0.004 per °C (IEC 60228 Annex B).%s",
                    request.fineStranded() ? "class 5" : "class 2", inst.conductorTempC(), conductorTempReason(inst)));
            notes.add(String.format(Locale.ROOT, "Current-carrying capacity: IEC 60364-5-52 method C, two loaded "
                    + "conductors; %d current-carrying conductors counted as %d circuit(s) for Table B.52.17 row 1 "
                    + "(bunched).", inst.currentCarryingConductors(), (inst.currentCarryingConductors() + 1) / 2));
            notes.add("Device ratings for the IEC option are a from-memory list (IEC 60269-1 preferred values). "
                    + "The condition I2 <= 1.45 Iz (IEC 60364-4-43 433.1) is not checked: for gG fuses it needs "
                    + "In <= 0.906 Iz.");
            if (tables.iecAmbientFactor(inst.ambientC(), inst.insulationTempC()).isEmpty()) {
                notes.add(String.format(Locale.ROOT, "Table B.52.14 gives no factor for %d °C insulation at "
                        + "%.1f °C ambient.", inst.insulationTempC(), inst.ambientC()));
            }
            if (request.fineStranded()) {
                notes.add("Fine-stranded (class 5) conductors need terminals suited to them (ferrules or lugs "
                        + "rated for class 5): common practice, no source.");
            }
        }
        return notes;
    }

    private static OvercurrentDevice.Rated ratedDevice(CandidateEvaluation passing) {
        return (OvercurrentDevice.Rated) passing.device();
    }

    private static String conductorTempReason(Installation inst) {
        return inst.conductorTempC() == Math.max(inst.insulationTempC(), inst.ambientC())
                ? " That is the insulation rating: a conductor loaded to its ampacity reaches it, so the drop is "
                        + "not underestimated; a lightly loaded conductor runs cooler and drops less."
                : " (conductor temperature given by the caller).";
    }

    private static String parallelNote(TableSystem system) {
        return system == TableSystem.NEC
                ? "Parallel sets (NEC 310.10(G), 1/0 AWG and larger): same length, material, size, insulation and "
                        + "termination in every set; each set is assumed in its own raceway or cable."
                : "Parallel conductors must share current equally (same length, size and route); each set is "
                        + "assumed in its own cable. From memory: IEC 60364-5-52 523.7.";
    }

    private String notSizedReason(ConductorRequest request, List<ConductorSize> sizes, CandidateEvaluation last) {
        ConductorSize largest = sizes.get(sizes.size() - 1);
        if (last == null) {
            return "no tabulated size could be evaluated";
        }
        List<String> failing = new ArrayList<>();
        AmpacityStep a = last.ampacity();
        if (!a.ok()) {
            failing.add(String.format(Locale.ROOT, "ampacity %.1f A (uncorrected limit %.1f A) against a design "
                    + "current of %.1f A and %.1f A after correction", a.correctedAmpacityA(), a.uncorrectedLimitA(),
                    a.designCurrentA(), a.conditionsOfUseCurrentA()));
        }
        VoltageDropStep d = last.voltageDrop();
        if (!d.ok()) {
            failing.add(String.format(Locale.ROOT, "voltage drop %.2f %% against a limit of %.2f %%",
                    d.dropPct(), d.limitPct()));
        }
        if (!last.device().fits() && last.device() instanceof OvercurrentDevice.NoneFits n) {
            failing.add("overcurrent device: " + n.reason());
        }
        return String.format(Locale.ROOT, "No %s size up to %s with up to %d set(s) per pole passes; "
                + "the largest (%s, %d set(s)) fails on %s.", request.installation().system(), largest.label(),
                request.maxParallelSets(), last.size().label(), last.parallelSets(), String.join("; ", failing));
    }

    private static int firstIndex(List<CandidateEvaluation> list,
                                  java.util.function.Predicate<CandidateEvaluation> test) {
        for (int i = 0; i < list.size(); i++) {
            if (test.test(list.get(i))) {
                return i;
            }
        }
        return -1;
    }

    /**
     * @param inst an installation
     * @return the ambient factor its table gives (NEC 310.15(B)(1)(1) or IEC B.52.14), or empty when the
     *         insulation is not permitted at that ambient
     */
    public OptionalDouble ambientFactor(Installation inst) {
        return inst.system() == TableSystem.NEC
                ? tables.necAmbientFactor(inst.ambientC(), inst.insulationTempC())
                : tables.iecAmbientFactor(inst.ambientC(), inst.insulationTempC());
    }
}
