package org.holdover.report;

import java.util.List;

/** The safety cautions shown in the workbook and on the console. */
public final class Cautions {

    private Cautions() {
    }

    /** One line each. */
    public static final List<String> LINES = List.of(
            "This is a sizing calculation, not an installation design. A qualified, licensed installer must design and install the system; local electrical, building and fire codes and the authority having jurisdiction govern over anything here.",
            "Follow each manufacturer's installation instructions and ratings; where they differ from this workbook, they win. The built-in catalog is invented demo data.",
            "DC arcs do not self-extinguish the way AC arcs do: use overcurrent devices and disconnects rated for DC at the system voltage, and never open a DC circuit under load with a device not rated to do so.",
            "A battery can deliver thousands of amperes into a short circuit. Put overcurrent protection and a disconnect as close to the battery terminals as practical, rated to interrupt the battery's prospective short-circuit current.",
            "Batteries can burn or release gas: lead-acid batteries give off hydrogen when charging (ventilate); lithium batteries can go into thermal runaway. Keep to the makers' temperature limits and the code limits on stored energy by location.",
            "Size conductors for the currents shown here with the code's correction factors and voltage-drop limits; check every terminal's temperature rating and that terminals are listed for fine-stranded cable where it is used.",
            "Backup systems must be connected through a listed transfer switch or interlock so they cannot feed the utility grid during an outage.");

    /** Short form for the console. */
    public static final String SHORT = "Cautions: DC arcs, battery short-circuit current, fire and gas; protect and disconnect at the battery;"
            + " qualified installer; makers' instructions; local codes govern.";
}
