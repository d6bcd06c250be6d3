package org.holdover.dc;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The bundled conductor tables, loaded once and immutable. Each table is available both as typed rows (used by
 * the engine) and as the raw {@link ReferenceTable} (for a workbook to embed). Use {@link #standard()}.
 *
 * <p>NEC tables are NFPA 70-2023; IEC tables are IEC 60228 and IEC 60364-5-52:2009. Every CSV names its source
 * in its comment lines.
 */
public final class ConductorTables {

    /** Temperature coefficient of resistance of annealed copper at 20 °C, per °C (NEC Chapter 9 Table 8 note, IEC 60287). */
    public static final double COPPER_ALPHA_20C_PER_C = 0.00393;

    /** The coefficient IEC 60228 Annex B uses for its kt table, per °C at 20 °C (kt = 250 / (230 + t)). */
    public static final double IEC_60228_ALPHA_20C_PER_C = 0.004;

    /** Conductor temperature at which NEC Chapter 9 Table 8 states resistance, °C. */
    public static final double NEC_TABLE8_REFERENCE_C = 75.0;

    /** Conductor temperature at which IEC 60228 states resistance, °C. */
    public static final double IEC_60228_REFERENCE_C = 20.0;

    /** 240.4(B) next-size-up rule applies only to devices up to this rating, A. */
    public static final double NEXT_SIZE_UP_LIMIT_A = 800.0;

    /** The resource names, in the order {@link #referenceTables()} returns them. */
    public static final List<String> TABLE_NAMES = List.of(
            "nec-310-16-copper-ampacity",
            "nec-310-15-b-1-1-ambient-correction",
            "nec-310-15-c-1-adjustment",
            "nec-chapter9-table8-copper-resistance",
            "nec-240-6-a-standard-ratings",
            "nec-240-4-d-small-conductor",
            "iec-60228-copper-resistance",
            "iec-60364-5-52-method-c-copper",
            "iec-60364-5-52-b52-14-ambient",
            "iec-60364-5-52-b52-17-grouping",
            "iec-device-ratings");

    /**
     * One row of NEC Table 310.16 (copper), with the Chapter 9 Table 8 area.
     *
     * @param size        the conductor size
     * @param areaCmil    area in circular mils
     * @param copper60CA  allowable ampacity, 60 °C column, A
     * @param copper75CA  allowable ampacity, 75 °C column, A
     * @param copper90CA  allowable ampacity, 90 °C column, A
     */
    public record NecAmpacityRow(ConductorSize size, double areaCmil, double copper60CA, double copper75CA,
                                 double copper90CA) {
        public NecAmpacityRow {
            Objects.requireNonNull(size, "size");
            if (!(copper60CA > 0 && copper75CA >= copper60CA && copper90CA >= copper75CA)) {
                throw new IllegalArgumentException("ampacities must be > 0 and rise with the column: " + size);
            }
        }

        /**
         * @param columnC 60, 75 or 90
         * @return the ampacity in that column, A
         */
        public double ampacityA(int columnC) {
            return switch (columnC) {
                case 60 -> copper60CA;
                case 75 -> copper75CA;
                case 90 -> copper90CA;
                default -> throw new IllegalArgumentException("NEC column must be 60, 75 or 90 °C, got " + columnC);
            };
        }
    }

    /**
     * One row of NEC Table 310.15(B)(1)(1). A factor is NaN where the table prints a dash.
     *
     * @param ambientFromC lowest whole-degree ambient of the row, °C (−273 for "10 or less")
     * @param ambientToC   highest whole-degree ambient of the row, °C
     * @param factor60C    factor for 60 °C insulation, or NaN
     * @param factor75C    factor for 75 °C insulation, or NaN
     * @param factor90C    factor for 90 °C insulation, or NaN
     */
    public record NecAmbientRow(int ambientFromC, int ambientToC, double factor60C, double factor75C,
                                double factor90C) {
        public NecAmbientRow {
            if (ambientToC < ambientFromC) {
                throw new IllegalArgumentException("empty ambient range " + ambientFromC + ".." + ambientToC);
            }
        }

        /**
         * @param insulationC 60, 75 or 90
         * @return the factor, or empty when the insulation is not permitted at this ambient
         */
        public OptionalDouble factor(int insulationC) {
            double f = switch (insulationC) {
                case 60 -> factor60C;
                case 75 -> factor75C;
                case 90 -> factor90C;
                default -> throw new IllegalArgumentException("NEC column must be 60, 75 or 90 °C, got " + insulationC);
            };
            return Double.isNaN(f) ? OptionalDouble.empty() : OptionalDouble.of(f);
        }
    }

    /**
     * One row of NEC Table 310.15(C)(1).
     *
     * @param conductorsFrom lowest count of current-carrying conductors in the raceway or cable
     * @param conductorsTo   highest count
     * @param factor         adjustment factor (fraction, not percent)
     */
    public record AdjustmentRow(int conductorsFrom, int conductorsTo, double factor) {
        public AdjustmentRow {
            if (conductorsFrom < 1 || conductorsTo < conductorsFrom || !(factor > 0 && factor <= 1)) {
                throw new IllegalArgumentException("bad adjustment row " + conductorsFrom + ".." + conductorsTo);
            }
        }
    }

    /**
     * One row of NEC Chapter 9 Table 8, uncoated copper at 75 °C.
     *
     * @param size                  the conductor size
     * @param areaCmil              area in circular mils
     * @param strands               Class B strand count
     * @param solidOhmPerKft        solid conductor resistance, Ω per 1000 ft, or NaN where the table has none
     * @param strandedOhmPerKft     stranded conductor resistance, Ω per 1000 ft
     */
    public record NecResistanceRow(ConductorSize size, double areaCmil, int strands, double solidOhmPerKft,
                                   double strandedOhmPerKft) {
        public NecResistanceRow {
            Objects.requireNonNull(size, "size");
            if (!(strandedOhmPerKft > 0)) {
                throw new IllegalArgumentException("resistance must be > 0: " + size);
            }
        }

        /** @return stranded resistance at 75 °C in Ω/m */
        public double strandedOhmPerM() {
            return ConductorUnits.ohmPerKftToOhmPerM(strandedOhmPerKft);
        }
    }

    /**
     * One standard ampere rating of NEC 240.6(A).
     *
     * @param ratingA  the rating, A
     * @param fuseOnly true for the additional fuse-only ratings (1, 3, 6, 601 A)
     */
    public record StandardRating(double ratingA, boolean fuseOnly) {
    }

    /**
     * One IEC 60228 row, plain and tinned annealed copper, maximum resistance at 20 °C.
     *
     * @param size                 metric size
     * @param class2OhmPerKm       class 2 (stranded), plain, Ω/km
     * @param class5OhmPerKm       class 5 (flexible), plain, Ω/km
     * @param class2TinnedOhmPerKm class 2, tinned, Ω/km
     * @param class5TinnedOhmPerKm class 5, tinned, Ω/km
     */
    public record IecResistanceRow(ConductorSize size, double class2OhmPerKm, double class5OhmPerKm,
                                   double class2TinnedOhmPerKm, double class5TinnedOhmPerKm) {
        public IecResistanceRow {
            Objects.requireNonNull(size, "size");
        }
    }

    /**
     * One IEC 60364-5-52 method C row, two loaded copper conductors, 30 °C.
     *
     * @param size    metric size
     * @param pvc70CA current-carrying capacity, PVC 70 °C (Table B.52.2), A
     * @param xlpe90CA current-carrying capacity, XLPE/EPR 90 °C (Table B.52.3), A
     */
    public record IecCapacityRow(ConductorSize size, double pvc70CA, double xlpe90CA) {
        public IecCapacityRow {
            Objects.requireNonNull(size, "size");
        }

        /**
         * @param insulationC 70 (PVC) or 90 (XLPE)
         * @return the capacity, A
         */
        public double capacityA(int insulationC) {
            return switch (insulationC) {
                case 70 -> pvc70CA;
                case 90 -> xlpe90CA;
                default -> throw new IllegalArgumentException("IEC insulation must be 70 (PVC) or 90 (XLPE) °C, got "
                        + insulationC);
            };
        }
    }

    /**
     * One row of IEC 60364-5-52 Table B.52.14 (air, base 30 °C). NaN where not tabulated.
     *
     * @param ambientC  ambient air temperature, °C
     * @param pvc70C    factor for PVC, or NaN
     * @param xlpe90C   factor for XLPE/EPR, or NaN
     */
    public record IecAmbientRow(int ambientC, double pvc70C, double xlpe90C) {
        /**
         * @param insulationC 70 or 90
         * @return the factor, or empty when not tabulated
         */
        public OptionalDouble factor(int insulationC) {
            double f = switch (insulationC) {
                case 70 -> pvc70C;
                case 90 -> xlpe90C;
                default -> throw new IllegalArgumentException("IEC insulation must be 70 or 90 °C, got " + insulationC);
            };
            return Double.isNaN(f) ? OptionalDouble.empty() : OptionalDouble.of(f);
        }
    }

    /**
     * One row of IEC 60364-5-52 Table B.52.17, row 1 (bunched).
     *
     * @param circuits number of circuits in the group
     * @param factor   reduction factor
     */
    public record IecGroupingRow(int circuits, double factor) {
    }

    private static final class Holder {
        static final ConductorTables INSTANCE = new ConductorTables();
    }

    private final Map<String, ReferenceTable> raw;
    private final List<NecAmpacityRow> necAmpacity;
    private final List<NecAmbientRow> necAmbient;
    private final List<AdjustmentRow> necAdjustment;
    private final List<NecResistanceRow> necResistance;
    private final List<StandardRating> necRatings;
    private final Map<String, Double> necSmallConductorLimitsA;
    private final List<IecResistanceRow> iecResistance;
    private final List<IecCapacityRow> iecCapacity;
    private final List<IecAmbientRow> iecAmbient;
    private final List<IecGroupingRow> iecGrouping;
    private final List<Double> iecRatingsA;

    private ConductorTables() {
        Map<String, ReferenceTable> m = new LinkedHashMap<>();
        for (String name : TABLE_NAMES) {
            m.put(name, CsvTables.read(name));
        }
        raw = Collections.unmodifiableMap(m);

        ReferenceTable t = m.get("nec-310-16-copper-ampacity");
        List<NecAmpacityRow> amp = new ArrayList<>();
        for (int r = 0; r < t.rows().size(); r++) {
            double cmil = t.number(r, "area_cmil");
            ConductorSize size = new ConductorSize(t.text(r, "size"), ConductorUnits.circularMilsToMm2(cmil),
                    TableSystem.NEC);
            amp.add(new NecAmpacityRow(size, cmil, t.number(r, "copper_60C_A"), t.number(r, "copper_75C_A"),
                    t.number(r, "copper_90C_A")));
        }
        necAmpacity = List.copyOf(amp);

        t = m.get("nec-310-15-b-1-1-ambient-correction");
        List<NecAmbientRow> amb = new ArrayList<>();
        for (int r = 0; r < t.rows().size(); r++) {
            amb.add(new NecAmbientRow((int) t.number(r, "ambient_from_C"), (int) t.number(r, "ambient_to_C"),
                    t.number(r, "factor_60C"), t.number(r, "factor_75C"), t.number(r, "factor_90C")));
        }
        necAmbient = List.copyOf(amb);

        t = m.get("nec-310-15-c-1-adjustment");
        List<AdjustmentRow> adj = new ArrayList<>();
        for (int r = 0; r < t.rows().size(); r++) {
            adj.add(new AdjustmentRow((int) t.number(r, "conductors_from"), (int) t.number(r, "conductors_to"),
                    t.number(r, "factor")));
        }
        necAdjustment = List.copyOf(adj);

        t = m.get("nec-chapter9-table8-copper-resistance");
        List<NecResistanceRow> res = new ArrayList<>();
        for (int r = 0; r < t.rows().size(); r++) {
            String label = t.text(r, "size");
            ConductorSize size = necSizeOrThrow(amp, label);
            double cmil = t.number(r, "area_cmil");
            if (Math.abs(ConductorUnits.circularMilsToMm2(cmil) - size.areaMm2()) > 1e-9) {
                throw new IllegalStateException("Table 8 and Table 310.16 areas differ for " + label);
            }
            res.add(new NecResistanceRow(size, cmil, (int) t.number(r, "strands"),
                    t.number(r, "uncoated_solid_ohm_per_kft"), t.number(r, "uncoated_stranded_ohm_per_kft")));
        }
        if (res.size() != amp.size()) {
            throw new IllegalStateException("Table 8 and Table 310.16 list different sizes");
        }
        necResistance = List.copyOf(res);

        t = m.get("nec-240-6-a-standard-ratings");
        List<StandardRating> ratings = new ArrayList<>();
        for (int r = 0; r < t.rows().size(); r++) {
            ratings.add(new StandardRating(t.number(r, "rating_A"), t.number(r, "fuse_only") != 0));
        }
        necRatings = List.copyOf(ratings);

        t = m.get("nec-240-4-d-small-conductor");
        Map<String, Double> small = new LinkedHashMap<>();
        for (int r = 0; r < t.rows().size(); r++) {
            small.put(t.text(r, "size"), t.number(r, "max_device_A"));
        }
        necSmallConductorLimitsA = Collections.unmodifiableMap(small);

        t = m.get("iec-60228-copper-resistance");
        List<IecResistanceRow> iecRes = new ArrayList<>();
        for (int r = 0; r < t.rows().size(); r++) {
            iecRes.add(new IecResistanceRow(ConductorSize.metric(t.number(r, "area_mm2")),
                    t.number(r, "class2_plain_ohm_per_km"), t.number(r, "class5_plain_ohm_per_km"),
                    t.number(r, "class2_tinned_ohm_per_km"), t.number(r, "class5_tinned_ohm_per_km")));
        }
        iecResistance = List.copyOf(iecRes);

        t = m.get("iec-60364-5-52-method-c-copper");
        List<IecCapacityRow> cap = new ArrayList<>();
        for (int r = 0; r < t.rows().size(); r++) {
            ConductorSize size = ConductorSize.metric(t.number(r, "area_mm2"));
            if (!size.equals(iecRes.get(r).size())) {
                throw new IllegalStateException("IEC resistance and capacity tables list different sizes at row " + r);
            }
            cap.add(new IecCapacityRow(size, t.number(r, "pvc_70C_A"), t.number(r, "xlpe_90C_A")));
        }
        if (cap.size() != iecRes.size()) {
            throw new IllegalStateException("IEC resistance and capacity tables list different sizes");
        }
        iecCapacity = List.copyOf(cap);

        t = m.get("iec-60364-5-52-b52-14-ambient");
        List<IecAmbientRow> iecAmb = new ArrayList<>();
        for (int r = 0; r < t.rows().size(); r++) {
            iecAmb.add(new IecAmbientRow((int) t.number(r, "ambient_C"), t.number(r, "pvc_70C"),
                    t.number(r, "xlpe_90C")));
        }
        iecAmbient = List.copyOf(iecAmb);

        t = m.get("iec-60364-5-52-b52-17-grouping");
        List<IecGroupingRow> grp = new ArrayList<>();
        for (int r = 0; r < t.rows().size(); r++) {
            grp.add(new IecGroupingRow((int) t.number(r, "circuits"), t.number(r, "factor")));
        }
        iecGrouping = List.copyOf(grp);

        t = m.get("iec-device-ratings");
        List<Double> iecR = new ArrayList<>();
        for (int r = 0; r < t.rows().size(); r++) {
            iecR.add(t.number(r, "rating_A"));
        }
        iecRatingsA = List.copyOf(iecR);
    }

    private static ConductorSize necSizeOrThrow(List<NecAmpacityRow> rows, String label) {
        for (NecAmpacityRow row : rows) {
            if (row.size().label().equals(label)) {
                return row.size();
            }
        }
        throw new IllegalStateException("size " + label + " is not in Table 310.16");
    }

    /** @return the tables, loaded on first use */
    public static ConductorTables standard() {
        return Holder.INSTANCE;
    }

    /** @return every bundled table as printed, keyed by resource name, in {@link #TABLE_NAMES} order */
    public Map<String, ReferenceTable> referenceTables() {
        return raw;
    }

    /** @return NEC Table 310.16 copper rows, smallest size first */
    public List<NecAmpacityRow> necAmpacity() {
        return necAmpacity;
    }

    /** @return NEC Table 310.15(B)(1)(1) rows, coldest first */
    public List<NecAmbientRow> necAmbientCorrection() {
        return necAmbient;
    }

    /** @return NEC Table 310.15(C)(1) rows (with a leading 1–3 row of 1.00) */
    public List<AdjustmentRow> necAdjustment() {
        return necAdjustment;
    }

    /** @return NEC Chapter 9 Table 8 copper rows, same sizes and order as {@link #necAmpacity()} */
    public List<NecResistanceRow> necResistance() {
        return necResistance;
    }

    /** @return NEC 240.6(A) ratings including the fuse-only ones, ascending */
    public List<StandardRating> necStandardRatings() {
        return necRatings;
    }

    /** @return NEC 240.4(D) copper limits, A, keyed by size label ("14 AWG" → 15) */
    public Map<String, Double> necSmallConductorLimitsA() {
        return necSmallConductorLimitsA;
    }

    /** @return IEC 60228 rows, smallest first */
    public List<IecResistanceRow> iecResistance() {
        return iecResistance;
    }

    /** @return IEC 60364-5-52 method C rows, same sizes and order as {@link #iecResistance()} */
    public List<IecCapacityRow> iecCapacity() {
        return iecCapacity;
    }

    /** @return IEC 60364-5-52 Table B.52.14 rows, coldest first */
    public List<IecAmbientRow> iecAmbientCorrection() {
        return iecAmbient;
    }

    /** @return IEC 60364-5-52 Table B.52.17 row 1 entries, fewest circuits first */
    public List<IecGroupingRow> iecGrouping() {
        return iecGrouping;
    }

    /** @return device ratings used for the IEC option (from memory, see the CSV header), A, ascending */
    public List<Double> iecDeviceRatingsA() {
        return iecRatingsA;
    }

    /**
     * @param system the table family
     * @return the sizes of that family, smallest first (NEC: 14 AWG … 500 kcmil; IEC: 1.5 … 120 mm²)
     */
    public List<ConductorSize> sizes(TableSystem system) {
        return switch (system) {
            case NEC -> necAmpacity.stream().map(NecAmpacityRow::size).toList();
            case IEC -> iecCapacity.stream().map(IecCapacityRow::size).toList();
        };
    }

    /**
     * @param system the table family
     * @param label  the size label, e.g. {@code "4/0 AWG"} or {@code "35 mm²"}
     * @return the size, or empty when the table has no such size
     */
    public Optional<ConductorSize> size(TableSystem system, String label) {
        return sizes(system).stream().filter(s -> s.label().equals(label)).findFirst();
    }

    /**
     * @param system the table family
     * @param label  the size label
     * @return the size; throws {@link IllegalArgumentException} when there is none
     */
    public ConductorSize sizeOrThrow(TableSystem system, String label) {
        return size(system, label).orElseThrow(
                () -> new IllegalArgumentException("no " + system + " size " + label + "; sizes: " + sizes(system)));
    }

    /**
     * @param size a tabulated size
     * @return its 0-based position in {@link #sizes(TableSystem)} (larger index, larger area)
     */
    public int indexOf(ConductorSize size) {
        int i = sizes(size.system()).indexOf(size);
        if (i < 0) {
            throw new IllegalArgumentException("not a tabulated size: " + size);
        }
        return i;
    }

    /**
     * The NEC ambient correction factor, Table 310.15(B)(1)(1). The table is in whole degrees; a fractional
     * ambient is rounded UP to the next whole degree (conservative).
     *
     * @param ambientC    ambient temperature, °C
     * @param insulationC 60, 75 or 90
     * @return the factor, or empty when the insulation is not permitted at that ambient (or above 80 °C)
     */
    public OptionalDouble necAmbientFactor(double ambientC, int insulationC) {
        int whole = (int) Math.ceil(ambientC);
        for (NecAmbientRow row : necAmbient) {
            if (whole >= row.ambientFromC() && whole <= row.ambientToC()) {
                return row.factor(insulationC);
            }
        }
        return OptionalDouble.empty();
    }

    /**
     * NEC Table 310.15(C)(1) adjustment.
     *
     * @param currentCarryingConductors count in the raceway or cable, ≥ 1
     * @return the factor (1.00 for three or fewer)
     */
    public double necAdjustmentFactor(int currentCarryingConductors) {
        for (AdjustmentRow row : necAdjustment) {
            if (currentCarryingConductors >= row.conductorsFrom() && currentCarryingConductors <= row.conductorsTo()) {
                return row.factor();
            }
        }
        throw new IllegalArgumentException("current-carrying conductors must be >= 1, got " + currentCarryingConductors);
    }

    /**
     * IEC 60364-5-52 Table B.52.14 factor; an ambient between tabulated values uses the next higher row
     * (conservative); below 10 °C the 10 °C row.
     *
     * @param ambientC    ambient air temperature, °C
     * @param insulationC 70 (PVC) or 90 (XLPE)
     * @return the factor, or empty when above the table or not tabulated for that insulation
     */
    public OptionalDouble iecAmbientFactor(double ambientC, int insulationC) {
        for (IecAmbientRow row : iecAmbient) {
            if (ambientC <= row.ambientC()) {
                return row.factor(insulationC);
            }
        }
        return OptionalDouble.empty();
    }

    /**
     * IEC 60364-5-52 Table B.52.17 row 1; a count between tabulated values uses the next higher count.
     *
     * @param circuits circuits in the group, ≥ 1
     * @return the factor, or empty above 20 circuits
     */
    public OptionalDouble iecGroupingFactor(int circuits) {
        if (circuits < 1) {
            throw new IllegalArgumentException("circuits must be >= 1, got " + circuits);
        }
        for (IecGroupingRow row : iecGrouping) {
            if (circuits <= row.circuits()) {
                return OptionalDouble.of(row.factor());
            }
        }
        return OptionalDouble.empty();
    }

    /**
     * Table ampacity (NEC Table 310.16 column, or IEC method C capacity) of one conductor.
     *
     * @param size        a tabulated size
     * @param insulationC NEC: 60, 75 or 90; IEC: 70 or 90
     * @return the ampacity, A
     */
    public double tableAmpacityA(ConductorSize size, int insulationC) {
        int i = indexOf(size);
        return switch (size.system()) {
            case NEC -> necAmpacity.get(i).ampacityA(insulationC);
            case IEC -> iecCapacity.get(i).capacityA(insulationC);
        };
    }

    /**
     * DC resistance of one conductor at its table reference temperature: NEC Table 8 stranded at 75 °C, or
     * IEC 60228 at 20 °C (class 5 when {@code flexible}, else class 2; plain copper).
     *
     * @param size     a tabulated size
     * @param flexible IEC only: true for class 5 (fine-stranded) conductors. NEC Table 8 lists Class B
     *                 stranding only, so it is ignored there.
     * @return resistance in Ω/m at {@link #referenceTemperatureC(TableSystem)}
     */
    public double referenceResistanceOhmPerM(ConductorSize size, boolean flexible) {
        int i = indexOf(size);
        return switch (size.system()) {
            case NEC -> necResistance.get(i).strandedOhmPerM();
            case IEC -> ConductorUnits.ohmPerKmToOhmPerM(flexible
                    ? iecResistance.get(i).class5OhmPerKm()
                    : iecResistance.get(i).class2OhmPerKm());
        };
    }

    /**
     * @param system the table family
     * @return the conductor temperature of its resistance table, °C (NEC 75, IEC 20)
     */
    public static double referenceTemperatureC(TableSystem system) {
        return system == TableSystem.NEC ? NEC_TABLE8_REFERENCE_C : IEC_60228_REFERENCE_C;
    }

    /**
     * @param system the table family
     * @return the temperature coefficient at 20 °C its table uses, per °C (NEC 0.00393, IEC 0.004)
     */
    public static double alpha20PerC(TableSystem system) {
        return system == TableSystem.NEC ? COPPER_ALPHA_20C_PER_C : IEC_60228_ALPHA_20C_PER_C;
    }

    /**
     * Resistance of one conductor at a conductor temperature, scaled from the table's reference temperature with
     * the linear law referred to 20 °C: R(T) = R_ref × (1 + α20 (T − 20)) / (1 + α20 (T_ref − 20)).
     *
     * @param size              a tabulated size
     * @param conductorTempC    conductor temperature, °C (above −200)
     * @param flexible          IEC only: class 5 instead of class 2
     * @return resistance in Ω/m
     */
    public double resistanceOhmPerM(ConductorSize size, double conductorTempC, boolean flexible) {
        return referenceResistanceOhmPerM(size, flexible)
                * temperatureRatio(size.system(), conductorTempC);
    }

    /**
     * R(T) / R(T_ref) for the system's table.
     *
     * @param system         table family (sets α20 and the reference temperature)
     * @param conductorTempC conductor temperature, °C
     * @return the ratio, dimensionless
     */
    public static double temperatureRatio(TableSystem system, double conductorTempC) {
        double alpha = alpha20PerC(system);
        double ratio = (1.0 + alpha * (conductorTempC - 20.0))
                / (1.0 + alpha * (referenceTemperatureC(system) - 20.0));
        if (!(ratio > 0) || !Double.isFinite(conductorTempC)) {
            throw new IllegalArgumentException("conductor temperature out of range: " + conductorTempC + " °C");
        }
        return ratio;
    }

    /**
     * The 240.4(D) limit for a small copper conductor.
     *
     * @param size a size
     * @return the largest permitted device rating, A, or empty when 240.4(D) does not apply
     */
    public OptionalDouble necSmallConductorLimitA(ConductorSize size) {
        if (size.system() != TableSystem.NEC) {
            return OptionalDouble.empty();
        }
        Double limit = necSmallConductorLimitsA.get(size.label());
        return limit == null ? OptionalDouble.empty() : OptionalDouble.of(limit);
    }
}
