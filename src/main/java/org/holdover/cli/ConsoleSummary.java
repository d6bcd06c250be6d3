package org.holdover.cli;

import java.io.PrintWriter;
import java.util.Locale;
import org.holdover.battery.BankDesign;
import org.holdover.load.LoadAnalysis;
import org.holdover.project.Problem;
import org.holdover.report.Cautions;
import org.holdover.sizing.BusOption;
import org.holdover.sizing.Check;
import org.holdover.sizing.PvOption;
import org.holdover.sizing.SolarDesign;
import org.holdover.sizing.SizingResult;

/** The short console summary of a sizing. Presents the engine's numbers; computes none. */
final class ConsoleSummary {

    private ConsoleSummary() {
    }

    static void print(SizingResult r, PrintWriter out, PrintWriter err) {
        for (Problem w : r.input().warnings()) {
            err.println("warning: " + w.oneLine());
        }
        err.flush();
        LoadAnalysis.Figures f = r.input().loads().figures();
        out.println(r.input().name());
        out.printf(Locale.ROOT, "  loads: %,.0f Wh/day served (year mean); running demand %,.0f W / %,.0f VA", f.dailyEnergyWh(),
                f.runningPeakW(), f.runningPeakVa());
        if (!r.input().loads().starting().isEmpty()) {
            out.printf(Locale.ROOT, "; surge %,.0f VA for %.1f s", f.surgeVa(), f.surgeS());
        }
        out.println();
        if (r.chosen() == null) {
            out.println("  NO SYSTEM in the catalog passes every check:");
            for (BusOption b : r.buses()) {
                out.printf(Locale.ROOT, "    %4.0f V bus: %s%n", b.busClassV(), b.reason());
            }
            search(r, out);
        } else {
            BankDesign b = r.bank();
            out.printf(Locale.ROOT, "  bus: %.0f V    inverter: %s (%s)%n", r.chosen().busClassV(), r.inverter().spec().label(),
                    r.inverter().spec().description());
            out.printf(Locale.ROOT, "  battery: %d × %s (%d in series × %d strings), %.1f kWh rated at %.1f V%n",
                    b.modules(), b.module().id(), b.series(), b.strings(), b.bankEnergyWh() / 1000.0, b.bankNominalV());
            out.printf(Locale.ROOT, "  battery must deliver %,.0f Wh DC over %.0f h (inverter %.1f %% efficient over it, idle draw included)%n",
                    r.energy().energyDcWh(), r.energy().dischargeHours(), 100 * r.energy().effectiveEfficiency());
            pv(r, out);
            generator(r, out);
            for (BusOption o : r.buses()) {
                if (o != r.chosen()) {
                    out.printf(Locale.ROOT, "    %4.0f V bus: %s%n", o.busClassV(), o.reason());
                }
            }
            out.println("  checks:");
            for (Check c : r.checks()) {
                out.printf(Locale.ROOT, "    %-4s %-72s %12s %s %-14s %s%n", c.passes() ? "pass" : "FAIL",
                        c.label(), num(c.value()), c.sense() == Check.Sense.AT_LEAST ? ">=" : "<=",
                        num(c.limit()) + " " + c.unit(), Double.isFinite(c.margin())
                                ? String.format(Locale.ROOT, "(margin %+.0f %%)", 100 * c.margin()) : "");
            }
            if (r.year() != null) {
                out.println("  year: " + r.year().comparison(r.bank()));
                out.println("  " + r.year().life());
            }
            search(r, out);
            for (Check c : r.advisories()) {
                if (!c.passes()) {
                    out.printf(Locale.ROOT, "  limit to look at: %s %s %s %s %s %s (%s)%n", c.label(), num(c.value()),
                            c.unit(), c.sense() == Check.Sense.AT_MOST ? "above" : "below", num(c.limit()), c.unit(), c.basis());
                }
            }
        }
        out.println(Cautions.SHORT);
    }

    private static void search(SizingResult r, PrintWriter out) {
        org.holdover.sizing.SearchResult s = r.search();
        if (s == null) {
            return;
        }
        var st = s.stats();
        out.printf(Locale.ROOT, "  search: %,d component checks, %,d systems passing them, %,d simulated years, %,d skipped"
                        + " (a larger system of the family failed)%s%n", st.cheapChecks(), st.candidates(), st.simulated(),
                st.pruned(), st.stoppedEarly() ? "; STOPPED EARLY: the best system found so far" : "");
        boolean life = s.objective().lifetime();
        out.println(life ? String.format(Locale.ROOT, "    objective: lifetime cost over %.0f years at %.1f %% a year (demo prices;"
                + " battery replaced at the end of its simulated life, a generator's fuel at the project's price)",
                s.objective().horizonYears(), 100 * s.objective().discountRate())
                : "    objective: capital cost (demo prices; inverters, battery modules, PV modules, controllers, generator)");
        java.util.List<org.holdover.sizing.SearchResult.Evaluated> rows = new java.util.ArrayList<>();
        if (s.chosen() != null) {
            rows.add(s.chosen());
        }
        rows.addAll(s.alternatives());
        for (int i = 0; i < rows.size(); i++) {
            var e = rows.get(i);
            out.printf(Locale.ROOT, "    %-7s %,9.0f  %s%s%n", i == 0 && s.chosen() != null ? "chosen" : "next", e.objective(),
                    e.candidate().describe(), life ? String.format(Locale.ROOT, "; capital %,.0f, battery life %.1f years%s",
                            e.candidate().cost(), e.lifeYears(), e.fuelCostPerYear() > 0
                                    ? String.format(Locale.ROOT, ", fuel %,.0f a year", e.fuelCostPerYear()) : "") : "");
        }
        int shown = 0;
        for (var j : s.rejected()) {
            if (shown++ == 6) {
                out.printf(Locale.ROOT, "    … %d more families left out (the workbook's Alternatives sheet lists them all)%n",
                        s.rejected().size() - 6);
                break;
            }
            out.printf(Locale.ROOT, "    left out %s: %s%n", j.family(), j.reason());
        }
        for (var c : s.sensitivity()) {
            out.printf(Locale.ROOT, "    %s %.0f %%: %s — %s%n", c.label().toLowerCase(Locale.ROOT), c.changePct(),
                    c.passes() ? "still passes" : "FAILS", c.detail());
        }
    }

    private static final String[] MONTHS = {"January", "February", "March", "April", "May", "June", "July", "August",
        "September", "October", "November", "December"};

    /** The generator line: the set, and what it did over the simulated year. */
    private static void generator(SizingResult r, PrintWriter out) {
        if (r.generator() == null) {
            if (r.input().generator().allowed()) {
                out.println("  generator: none (allowed, but the least-cost passing system needs none)");
            }
            return;
        }
        var g = r.generator();
        out.printf(Locale.ROOT, "  generator: %s (%s), %,.0f W rated%n", g.id(), g.description(), g.ratedW());
        if (r.year() != null) {
            var run = r.year().metrics().generator();
            double price = r.input().generator().fuelPricePerL();
            out.printf(Locale.ROOT, "  generator over the simulated year: %,d h running, %,d starts, %,.0f L of fuel%s, %,.0f Wh"
                            + " (%,.0f Wh to the loads, %,.0f Wh to the charger, %,.0f Wh dumped)%n", run.hours(), run.starts(),
                    run.fuelL(), price > 0 ? String.format(Locale.ROOT, " (%,.0f at %.2f per litre)", r.fuelCostPerYear(), price) : "",
                    run.outputWh(), run.toLoadWh(), run.toChargerWh(), run.dumpedWh());
        }
    }

    private static void pv(SizingResult r, PrintWriter out) {
        SolarDesign sd = r.solar();
        if (sd == null) {
            out.println("  PV: not sized, the project has no solar section (PV is optional)");
            return;
        }
        PvOption o = sd.chosen();
        if (o == null) {
            out.println("  PV: none could be sized: " + sd.reason());
            return;
        }
        out.printf(Locale.ROOT, "  PV: %d × %s (%d per string × %d strings) on %d × %s, %,.0f W STC, tilt %.0f°%n",
                o.modules(), o.module().id(), o.candidate().modulesPerString(), o.candidate().stringsPerController(),
                o.candidate().controllerCount(), o.controller().id(), o.candidate().totalStcW(), o.tiltDeg());
        int m = o.sizing().worstMonth();
        out.printf(Locale.ROOT, "  PV sized by %s: %s needs %,.0f W (%.2f h/day of full sun on the array); %s%n",
                sd.method() == SolarDesign.Method.WORST_MONTH ? "the worst month" : "the refill after the hardest outage",
                MONTHS[m], o.sizing().requiredStcW(), o.peakSunHours()[m], sd.setup().resource());
    }

    private static String num(double v) {
        return Math.abs(v) >= 100 ? String.format(Locale.ROOT, "%,.0f", v) : String.format(Locale.ROOT, "%.2f", v);
    }
}
