package org.holdover.sim;

/**
 * Every hour's flows, for the workbook's hourly sheet. Index {@code t} is hour {@code t} of the period;
 * powers are hour averages in W (equal to the hour's energy in Wh). Accessors return copies. The symbols
 * in brackets are those of the equations in {@link YearSimulation}.
 */
public final class HourlyTrace {

    final double[] storedWh;
    final double[] soc;
    final double[] pvControllerW;
    final double[] pvClippedW;
    final double[] pvToInverterW;
    final double[] pvToBatteryW;
    final double[] pvCurtailedW;
    final double[] batteryToInverterW;
    final double[] batteryChargeW;
    final double[] inverterInputW;
    final double[] inverterOutputW;
    final boolean[] generatorOn;
    final double[] generatorToLoadW;
    final double[] generatorToChargerW;
    final double[] generatorDumpedW;
    final double[] generatorOutputW;
    final double[] fuelL;
    final double[] gridToLoadW;
    final double[] gridToChargerW;
    final double[] chargerToBatteryW;
    final double[] unmetW;
    final double[] batteryAcceptW;
    final double[] inverterDemandW;
    final double[] batteryAvailableW;
    final double[] batteryFirstW;
    final double[] inverterFirstOutputW;
    final double[] generatorInverterShareW;
    final double[] generatorInverterNeedW;
    final double[] generatorBatteryAvailableW;

    HourlyTrace(int n) {
        batteryFirstW = new double[n];
        inverterFirstOutputW = new double[n];
        generatorInverterShareW = new double[n];
        generatorInverterNeedW = new double[n];
        generatorBatteryAvailableW = new double[n];
        batteryAcceptW = new double[n];
        inverterDemandW = new double[n];
        batteryAvailableW = new double[n];
        storedWh = new double[n];
        soc = new double[n];
        pvControllerW = new double[n];
        pvClippedW = new double[n];
        pvToInverterW = new double[n];
        pvToBatteryW = new double[n];
        pvCurtailedW = new double[n];
        batteryToInverterW = new double[n];
        batteryChargeW = new double[n];
        inverterInputW = new double[n];
        inverterOutputW = new double[n];
        generatorOn = new boolean[n];
        generatorToLoadW = new double[n];
        generatorToChargerW = new double[n];
        generatorDumpedW = new double[n];
        generatorOutputW = new double[n];
        fuelL = new double[n];
        gridToLoadW = new double[n];
        gridToChargerW = new double[n];
        chargerToBatteryW = new double[n];
        unmetW = new double[n];
    }

    /** DC power the battery could take each hour (step 4), W. */
    public double[] batteryAcceptW() {
        return batteryAcceptW.clone();
    }

    /** Inverter DC input the whole load would need (step 5; 0 in grid hours), W. */
    public double[] inverterDemandW() {
        return inverterDemandW.clone();
    }

    /** Battery output available above the reserve (step 7; 0 in grid hours), W. */
    public double[] batteryAvailableW() {
        return batteryAvailableW.clone();
    }

    /** Battery output before the generator is considered, d1 (step 8; 0 in grid hours), W. */
    public double[] batteryFirstW() {
        return batteryFirstW.clone();
    }

    /** What the inverter can deliver from PV and the battery above the reserve, t1 (step 10; 0 in grid hours), W. */
    public double[] inverterFirstOutputW() {
        return inverterFirstOutputW.clone();
    }

    /** Generator running: the inverter's share of the load, t2 (load following) or t (cycle charging); else 0, W. */
    public double[] generatorInverterShareW() {
        return generatorInverterShareW.clone();
    }

    /**
     * Generator running: the added DC input the inverter needs for its share, need2 (load following), or its whole DC
     * input D2 (cycle charging); else 0, W.
     */
    public double[] generatorInverterNeedW() {
        return generatorInverterNeedW.clone();
    }

    /** Generator running: battery output allowed, avail2 (load following) or availF (cycle charging); else 0, W. */
    public double[] generatorBatteryAvailableW() {
        return generatorBatteryAvailableW.clone();
    }

    /** Number of hours. */
    public int hours() {
        return soc.length;
    }

    /** Stored energy at the end of each hour [E_t], Wh. */
    public double[] storedWh() {
        return storedWh.clone();
    }

    /** State of charge at the end of each hour [E_t / E_nom], fraction. */
    public double[] soc() {
        return soc.clone();
    }

    /** Controller output to the DC bus [pv], W. */
    public double[] pvControllerW() {
        return pvControllerW.clone();
    }

    /** Controller output lost to its limit [clip], W. */
    public double[] pvClippedW() {
        return pvClippedW.clone();
    }

    /** PV to the inverter [pvInv], W DC. */
    public double[] pvToInverterW() {
        return pvToInverterW.clone();
    }

    /** PV into the battery terminals [pvBat], W DC. */
    public double[] pvToBatteryW() {
        return pvToBatteryW.clone();
    }

    /** PV curtailed [curt], W DC. */
    public double[] pvCurtailedW() {
        return pvCurtailedW.clone();
    }

    /** Battery output to the inverter [dis], W DC. */
    public double[] batteryToInverterW() {
        return batteryToInverterW.clone();
    }

    /** DC power into the battery terminals from PV and charger [batIn], W. */
    public double[] batteryChargeW() {
        return batteryChargeW.clone();
    }

    /** Inverter DC input [invIn], W. */
    public double[] inverterInputW() {
        return inverterInputW.clone();
    }

    /** Inverter AC output [invOut], W. */
    public double[] inverterOutputW() {
        return inverterOutputW.clone();
    }

    /** Whether the generator ran in the hour [on]. */
    public boolean[] generatorOn() {
        return generatorOn.clone();
    }

    /** Generator output to the AC load [genLoad], W. */
    public double[] generatorToLoadW() {
        return generatorToLoadW.clone();
    }

    /** Generator output into the charger [chgIn while running], W AC. */
    public double[] generatorToChargerW() {
        return generatorToChargerW.clone();
    }

    /** Generator output forced by the minimum load and not used [dump], W. */
    public double[] generatorDumpedW() {
        return generatorDumpedW.clone();
    }

    /** Generator output [genOut], W. */
    public double[] generatorOutputW() {
        return generatorOutputW.clone();
    }

    /** Fuel used in the hour [fuel], L. */
    public double[] fuelL() {
        return fuelL.clone();
    }

    /** Grid to the AC load [gridLoad], W. */
    public double[] gridToLoadW() {
        return gridToLoadW.clone();
    }

    /** Grid into the charger [chgIn while the grid is up], W AC. */
    public double[] gridToChargerW() {
        return gridToChargerW.clone();
    }

    /** Charger DC output into the battery [chgOut], W. */
    public double[] chargerToBatteryW() {
        return chargerToBatteryW.clone();
    }

    /** AC load not served [unmet], W. */
    public double[] unmetW() {
        return unmetW.clone();
    }
}
