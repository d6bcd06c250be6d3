package org.holdover.dc;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;

/** The raw tables a workbook will embed: provenance present, immutable, and lookups that agree with the engine. */
class ReferenceTableTest {

    private static final ConductorTables TABLES = ConductorTables.standard();

    @Test
    void everyBundledTableNamesItsSource() {
        Map<String, ReferenceTable> raw = TABLES.referenceTables();
        assertThat(raw.keySet()).containsExactlyElementsOf(ConductorTables.TABLE_NAMES);
        for (ReferenceTable t : raw.values()) {
            assertThat(t.source()).as(t.name()).isNotEmpty();
            String first = t.source().get(0);
            assertThat(first).as(t.name()).containsAnyOf("NFPA 70", "IEC 60228", "IEC 60364", "FROM MEMORY");
            if (t.name().startsWith("nec-")) {
                assertThat(first).as(t.name()).contains("2023");
            }
            assertThat(t.rows()).as(t.name()).isNotEmpty();
        }
        assertThat(raw.get("iec-device-ratings").source().get(0)).startsWith("FROM MEMORY");
    }

    @Test
    void tablesAreImmutable() {
        ReferenceTable t = TABLES.referenceTables().get("nec-310-16-copper-ampacity");
        assertThatThrownBy(() -> t.rows().get(0).set(0, new ReferenceTable.Blank()))
                .isInstanceOf(UnsupportedOperationException.class);
        assertThatThrownBy(() -> TABLES.necAmpacity().remove(0)).isInstanceOf(UnsupportedOperationException.class);
        assertThatThrownBy(() -> TABLES.referenceTables().clear()).isInstanceOf(UnsupportedOperationException.class);
    }

    /**
     * What a workbook formula would do — INDEX(factor_75C, MATCH(CEILING(t), ambient_from_C, 1)) — must give the
     * engine's factor for every whole-degree ambient in the table's range.
     */
    @Test
    void approximateMatchOnTheRawNecAmbientTableAgreesWithTheEngine() {
        ReferenceTable t = TABLES.referenceTables().get("nec-310-15-b-1-1-ambient-correction");
        for (int ambient = -30; ambient <= 80; ambient++) {
            int row = -1;
            for (int r = 0; r < t.rows().size(); r++) {
                if (t.number(r, "ambient_from_C") <= ambient) {
                    row = r; // approximate MATCH: last key ≤ the value
                }
            }
            for (int col : new int[] {60, 75, 90}) {
                double raw = t.number(row, "factor_" + col + "C");
                OptionalDouble engine = TABLES.necAmbientFactor(ambient, col);
                if (Double.isNaN(raw)) {
                    assertThat(engine).as("%d °C, %d °C insulation", ambient, col).isEmpty();
                } else {
                    assertThat(engine).as("%d °C, %d °C insulation", ambient, col).hasValue(raw);
                }
            }
        }
    }

    @Test
    void rawCellsKeepTheirKinds() {
        ReferenceTable t = TABLES.referenceTables().get("nec-310-16-copper-ampacity");
        assertThat(t.columns()).containsExactly("size", "area_cmil", "copper_60C_A", "copper_75C_A", "copper_90C_A");
        assertThat(t.rows().get(0).get(0)).isEqualTo(new ReferenceTable.Text("14 AWG"));
        assertThat(t.rows().get(0).get(2)).isEqualTo(new ReferenceTable.Number(15));
        ReferenceTable amb = TABLES.referenceTables().get("nec-310-15-b-1-1-ambient-correction");
        assertThat(amb.rows().get(amb.rows().size() - 1).get(amb.column("factor_60C")))
                .isInstanceOf(ReferenceTable.Blank.class);
        assertThatThrownBy(() -> new ReferenceTable("x", List.of(), List.of("a", "b"),
                List.of(List.of(new ReferenceTable.Blank())))).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void sizesAreOrderedByArea() {
        for (TableSystem system : TableSystem.values()) {
            List<ConductorSize> sizes = TABLES.sizes(system);
            for (int i = 1; i < sizes.size(); i++) {
                assertThat(sizes.get(i).areaMm2()).isGreaterThan(sizes.get(i - 1).areaMm2());
            }
        }
        assertThat(TABLES.sizes(TableSystem.NEC)).hasSize(18);
        assertThat(TABLES.sizes(TableSystem.IEC)).hasSize(12);
    }
}
