package org.holdover.project;

import java.util.List;

/**
 * A project file as the user wrote it, before defaults are applied. Fields the user may leave out are
 * boxed and may be {@code null}; {@link ProjectValidator} reports every problem with its location, and
 * the sizing layer turns a valid input into engine records. Units are SI unless the name says otherwise
 * ({@code Pct} is a percentage, 0–100).
 *
 * @param name        the project's name, shown on every sheet
 * @param mode        backup (grid present, outages bridged) or off-grid
 * @param site        where the system is installed
 * @param loads       what the system must supply
 * @param backup      backup-mode settings (outage to bridge); required in backup mode
 * @param offGrid     off-grid settings (days of autonomy); required in off-grid mode
 * @param battery     battery preferences (chemistry, depth of discharge, end of life)
 * @param catalog     {@code builtin} or the path of a user catalog file
 * @param rules       design rules (margins, limits)
 * @param wiring      cable runs, for the DC-side checks
 * @param solar       the solar resource and PV array (optional)
 * @param notes       free text carried into the workbook as text
 * @param generator optional engine generator: whether the system search may add one from the catalog, and how it runs
 */
public record ProjectInput(
        String name,
        Mode mode,
        SiteInput site,
        LoadsInput loads,
        BackupInput backup,
        OffGridInput offGrid,
        BatteryInput battery,
        String catalog,
        RulesInput rules,
        WiringInput wiring,
        SolarInput solar,
        List<String> notes,
        GeneratorInput generator) {

    /** What the system is for. */
    public enum Mode { BACKUP, OFF_GRID }

    /**
     * @param latitudeDeg     degrees, north positive, −90…90
     * @param longitudeDeg    degrees, east positive, −180…180
     * @param elevationM      metres above sea level
     * @param utcOffsetHours  the site's standard-time offset from UTC in hours (no daylight saving)
     * @param timeZone        an IANA zone such as America/Denver, used to read clock-time profiles
     * @param year            the calendar year of the hourly series (weekdays, leap year)
     * @param ac              the AC system the inverter must supply
     * @param batteryAmbientC temperatures where the battery sits
     * @param inverterAmbientC design ambient around the inverter, °C
     * @param recordLowC      record low air temperature, °C
     * @param designHighC     design high air temperature, °C
     */
    public record SiteInput(
            Double latitudeDeg,
            Double longitudeDeg,
            Double elevationM,
            Double utcOffsetHours,
            String timeZone,
            Integer year,
            AcInput ac,
            BatteryAmbientInput batteryAmbientC,
            Double inverterAmbientC,
            Double recordLowC,
            Double designHighC) {
    }

    /**
     * @param voltsRms    line-to-line RMS voltage of the service (240 for 120/240 V split phase)
     * @param frequencyHz 50 or 60
     * @param wiring      single (one hot and neutral) or split-phase (two 120 V legs, 240 V between them)
     */
    public record AcInput(Double voltsRms, Double frequencyHz, AcWiring wiring) {
    }

    /** How the AC output is wired. */
    public enum AcWiring { SINGLE, SPLIT_PHASE }

    /**
     * @param coldest the coldest the battery gets during discharge, °C (capacity and voltage sag)
     * @param design  the typical battery temperature, °C
     */
    public record BatteryAmbientInput(Double coldest, Double design) {
    }

    /**
     * @param profile    an hourly load profile file (optional)
     * @param appliances the appliance list
     */
    public record LoadsInput(ProfileInput profile, List<ApplianceInput> appliances) {
    }

    /**
     * @param file        path of a CSV profile, relative to the project file
     * @param powerFactor power factor of the profile's load, 0–1
     * @param critical    whether the profile is of critical (backed-up) loads
     * @param maxGapHours gaps up to this many hours are filled by linear interpolation (with a warning)
     * @param scale       multiplier applied to every value (e.g. 1.1 for 10 % growth)
     */
    public record ProfileInput(String file, Double powerFactor, Boolean critical, Integer maxGapHours, Double scale) {
    }

    /**
     * One appliance (or a group of identical ones).
     *
     * @param name        label
     * @param quantity    how many identical units
     * @param watts       running power of one unit, W
     * @param powerFactor running power factor, 0–1
     * @param hoursPerDay running hours per day within its time windows (or give dutyCycle)
     * @param dutyCycle   fraction of the time within its windows that it runs, 0–1
     * @param hours       time-of-day windows such as "06-20" or "22-06" (local standard time)
     * @param days        which days it runs
     * @param months      months it runs (1–12); empty or null for all
     * @param critical    kept on during a grid outage (backup mode)
     * @param leg         for split-phase service: L1, L2, L1L2 (240 V) or AUTO
     * @param inProfile   its energy is already in the measured profile (used only for demand and surge)
     * @param motor       motor data, when it has a motor that starts
     */
    public record ApplianceInput(
            String name,
            Integer quantity,
            Double watts,
            Double powerFactor,
            Double hoursPerDay,
            Double dutyCycle,
            List<String> hours,
            DaySet days,
            List<Integer> months,
            Boolean critical,
            Leg leg,
            Boolean inProfile,
            MotorInput motor) {
    }

    /** Days of the week an appliance runs. */
    public enum DaySet { ALL, WEEKDAYS, WEEKENDS }

    /** Where a load is connected on a split-phase service. */
    public enum Leg { L1, L2, L1L2, AUTO }

    /**
     * Motor starting data. Give one of: horsepower with codeLetter; lockedRotorAmps (with volts); or
     * startMultiple. Nameplate data win over defaults.
     *
     * @param horsepower             rated output, hp
     * @param codeLetter             NEMA MG 1 locked-rotor code letter (A–V)
     * @param lockedRotorAmps        nameplate locked-rotor current, A
     * @param volts                  voltage the locked-rotor current is stated at, V
     * @param startMultiple          locked-rotor VA as a multiple of running VA
     * @param startSeconds           how long the start lasts, s
     * @param starter                direct-on-line, soft starter or variable-frequency drive
     * @param starterFactor          fraction of the direct-on-line locked-rotor demand the starter leaves
     * @param lockedRotorPowerFactor power factor while starting, 0–1
     */
    public record MotorInput(
            Double horsepower,
            String codeLetter,
            Double lockedRotorAmps,
            Double volts,
            Double startMultiple,
            Double startSeconds,
            Starter starter,
            Double starterFactor,
            Double lockedRotorPowerFactor) {
    }

    /** How a motor is started. */
    public enum Starter { DIRECT, SOFT, VFD }

    /**
     * @param outageHours the outage the battery must bridge, h
     */
    public record BackupInput(Double outageHours) {
    }

    /**
     * @param autonomyDays days the battery alone must carry the loads
     */
    public record OffGridInput(Double autonomyDays) {
    }

    /**
     * @param chemistry            restrict the bank to one chemistry (null: consider all in the catalog)
     * @param maxDepthOfDischargePct deepest discharge allowed, % (null: the chemistry's default)
     * @param endOfLifeCapacityPct capacity at end of life as % of new (null: the chemistry's default)
     * @param location             where the bank is installed, for the fire-code energy limits
     */
    public record BatteryInput(String chemistry, Double maxDepthOfDischargePct, Double endOfLifeCapacityPct,
                               BatteryLocation location) {
    }

    /** Where a residential battery bank is placed (fire-code location classes). */
    public enum BatteryLocation { UTILITY_SPACE, GARAGE, OUTDOORS, DETACHED_BUILDING }

    /**
     * @param inverterMargin         continuous rating ≥ this × coincident running demand
     * @param maxBatteryCurrentA     largest continuous battery current accepted when choosing the bus, A
     * @param motorsStartingTogether how many motors may start at the same moment (largest first)
     * @param maxParallelStrings     cap on parallel battery strings (null: chemistry default)
     * @param busVoltageV            consider only this DC bus voltage class, V (null: choose)
     * @param maxUnmetPct            unmet energy the simulated year may leave, % of the served energy (default 0)
     * @param alternatives           next best systems the search shows (default 3)
     * @param loadGrowthPct          load growth the chosen system is tried against, % (default 10)
     * @param poorerSolarPct         shortfall of the solar resource the chosen system is tried against, % (default 10)
     * @param costHorizonYears       when given, the search minimises the lifetime cost over this many years (battery
     *                               replacements included) instead of the capital cost
     * @param discountRatePct        discount rate for the lifetime cost, % per year (default 0)
     * @param maxInvertersInParallel most identical inverters in parallel the sizing may use (default 4; each unit's
     *                               catalog limit applies too)
     */
    public record RulesInput(Double inverterMargin, Double maxBatteryCurrentA, Integer motorsStartingTogether,
                             Integer maxParallelStrings, Double busVoltageV, Double maxUnmetPct, Integer alternatives,
                             Double loadGrowthPct, Double poorerSolarPct, Double costHorizonYears, Double discountRatePct,
                             Integer maxInvertersInParallel) {
    }

    /**
     * @param batteryToInverterM   one-way cable length between battery and inverter, m
     * @param batteryToControllerM one-way cable length between battery and charge controller, m
     * @param pvToControllerM      one-way length of the PV output circuit to the controller, m
     * @param busBarToInverterM    one-way length of each inverter's own leads from the common DC bus bar (inverters in
     *                             parallel), m
     * @param maxVoltageDropPct    voltage-drop limit for DC circuits, %
     * @param conductorAmbientC    ambient around the conductors, °C
     * @param standard             conductor tables: nec (AWG, NFPA 70) or iec (mm², IEC 60228 / 60364-5-52)
     * @param fineStranded         battery cables are fine-stranded (flexible) conductors
     */
    public record WiringInput(Double batteryToInverterM, Double batteryToControllerM, Double pvToControllerM,
                              Double maxVoltageDropPct, Double conductorAmbientC, ConductorStandard standard,
                              Boolean fineStranded, Double busBarToInverterM) {
    }

    /** Which conductor tables to use. */
    public enum ConductorStandard { NEC, IEC }

    /**
     * The solar resource and the PV array. Give monthly means from an atlas, or an hourly weather file.
     *
     * @param monthlyGhiKwhM2Day mean daily global horizontal irradiation by month, kWh/m²/day (12 values)
     * @param monthlyAirTempC    mean air temperature by month, °C (12 values)
     * @param weatherFile        an hourly weather file (EPW, or CSV with the documented header), relative path
     * @param clearnessSeed      seed of the day-to-day clearness sequence (null: every day of a month alike)
     * @param tiltDeg            array tilt from horizontal, ° (null: chosen to favour the worst month)
     * @param azimuthDeg         array azimuth, ° clockwise from north (null: facing the equator)
     * @param albedo             ground reflectance, 0–1
     * @param controller         charge controller type to use: mppt or pwm (null: either)
     * @param refillDays         backup: days to refill the bank after an outage while carrying the loads
     * @param systemVoltageLimitV  the code's maximum PV system voltage, V (default 600: NEC 690.7, one- and two-family
     *                             dwellings; 1000 V for other buildings)
     */
    public record SolarInput(List<Double> monthlyGhiKwhM2Day, List<Double> monthlyAirTempC, String weatherFile,
                             Integer clearnessSeed, Double tiltDeg, Double azimuthDeg, Double albedo, String controller,
                             Double refillDays, Double systemVoltageLimitV) {
    }

    /** Whether the system search may add a generator. */
    public enum GeneratorUse { ALLOWED, NEVER }

    /** How a running generator is dispatched. */
    public enum GeneratorStrategy { LOAD_FOLLOWING, CYCLE_CHARGING }

    /**
     * The optional {@code generator:} section. The site altitude for derating is {@code site.elevationM}.
     *
     * @param use            allowed (default when the section is present) or never
     * @param strategy       load-following or cycle-charging (default cycle-charging)
     * @param startSocPct    the generator starts rather than let the battery fall below this state of charge, %
     * @param setPointSocPct cycle charging: a running generator stops once the state of charge reaches this, %
     * @param chargerAcW     the battery charger's largest AC input from the generator, W (default from the bank)
     * @param fuelPricePerL  fuel price, currency per litre (for the fuel cost; default 0: not costed)
     */
    public record GeneratorInput(GeneratorUse use, GeneratorStrategy strategy, Double startSocPct, Double setPointSocPct,
                                 Double chargerAcW, Double fuelPricePerL) {
    }
}
