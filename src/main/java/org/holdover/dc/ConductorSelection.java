package org.holdover.dc;

import java.util.List;
import java.util.Objects;

/** The outcome of sizing one circuit: a conductor that passes every check, or the reason none does. */
public sealed interface ConductorSelection permits ConductorSelection.Sized, ConductorSelection.NotSized {

    /** Which check decided the size. */
    enum Governing {
        /** The smallest size with enough ampacity also met the drop limit and took a standard device. */
        AMPACITY,
        /** A larger size than ampacity needed, to keep the voltage drop within the limit. */
        VOLTAGE_DROP,
        /** A larger size than ampacity needed, so that a standard device rating fits (e.g. 240.4(D)). */
        OVERCURRENT_DEVICE
    }

    /** @return the request */
    ConductorRequest request();

    /** @return every candidate tried, in order (sizes ascending, then more parallel sets) */
    List<CandidateEvaluation> candidates();

    /** @return remarks the installer or inspector should read (assumptions, terminal notes) */
    List<String> notes();

    /**
     * A conductor that passes.
     *
     * @param request               the request
     * @param chosen                the chosen size, sets, checks and device (its device is {@link OvercurrentDevice.Rated})
     * @param governing             which check decided the size
     * @param smallestByAmpacity    smallest size (same sets) with enough ampacity
     * @param smallestByVoltageDrop smallest size (same sets) within the drop limit
     * @param candidates            every candidate tried
     * @param notes                 remarks
     */
    record Sized(ConductorRequest request, CandidateEvaluation chosen, Governing governing,
                 ConductorSize smallestByAmpacity, ConductorSize smallestByVoltageDrop,
                 List<CandidateEvaluation> candidates, List<String> notes) implements ConductorSelection {
        public Sized {
            Objects.requireNonNull(request, "request");
            Objects.requireNonNull(chosen, "chosen");
            Objects.requireNonNull(governing, "governing");
            Objects.requireNonNull(smallestByAmpacity, "smallestByAmpacity");
            Objects.requireNonNull(smallestByVoltageDrop, "smallestByVoltageDrop");
            if (!chosen.passes()) {
                throw new IllegalArgumentException("the chosen candidate does not pass: " + chosen);
            }
            candidates = List.copyOf(candidates);
            notes = List.copyOf(notes);
        }

        /** @return the chosen device */
        public OvercurrentDevice.Rated device() {
            return (OvercurrentDevice.Rated) chosen.device();
        }
    }

    /**
     * No tabulated size (within the allowed parallel sets) passes.
     *
     * @param request    the request
     * @param reason     one or two sentences naming the failing checks with their numbers
     * @param candidates every candidate tried
     * @param notes      remarks
     */
    record NotSized(ConductorRequest request, String reason, List<CandidateEvaluation> candidates,
                    List<String> notes) implements ConductorSelection {
        public NotSized {
            Objects.requireNonNull(request, "request");
            Objects.requireNonNull(reason, "reason");
            candidates = List.copyOf(candidates);
            notes = List.copyOf(notes);
        }
    }
}
