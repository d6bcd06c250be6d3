package org.holdover.dc;

/** Which family of conductor tables and overcurrent rules a sizing follows. */
public enum TableSystem {
    /** NFPA 70 (National Electrical Code) 2023: AWG and kcmil sizes, Table 310.16, Chapter 9 Table 8, 240.6(A). */
    NEC,
    /** IEC 60228 and IEC 60364-5-52: metric sizes in mm², method C current-carrying capacities. */
    IEC
}
