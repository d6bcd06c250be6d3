package org.holdover.testing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Map;
import org.junit.jupiter.api.Test;
import org.opentest4j.AssertionFailedError;
import org.opentest4j.TestAbortedException;

/** Tolerance, cell comparison and the missing-program rule, without external programs. */
class CheckPrimitivesTest {

    private static FormulaCell pair(CellResult cached, CellResult recomputed) {
        return new FormulaCell("S", "A1", "X", cached, recomputed);
    }

    @Test
    void numbersAgreeWithinRelativeOrAbsoluteTolerance() {
        Tolerance t = new Tolerance(1e-9, 1e-9);
        assertThat(t.equal(1e6, 1e6 * (1 + 0.9e-9))).isTrue();
        assertThat(t.equal(1e6, 1e6 * (1 + 1.1e-9))).isFalse();
        assertThat(t.equal(5.55e-17, 0)).isTrue();
        assertThat(t.equal(2e-9, 0)).isFalse();
        assertThat(t.equal(Double.NaN, Double.NaN)).isFalse();
        assertThatThrownBy(() -> new Tolerance(-1, 0)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new Tolerance(0, Double.NaN)).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void valuesOfDifferentKindsNeverAgree() {
        assertThat(pair(new CellResult.Numeric(1), new CellResult.Logical(true)).agrees(Tolerance.DEFAULT)).isFalse();
        assertThat(pair(new CellResult.Numeric(0), new CellResult.Blank()).agrees(Tolerance.DEFAULT)).isFalse();
        assertThat(pair(new CellResult.Text("1"), new CellResult.Numeric(1)).agrees(Tolerance.DEFAULT)).isFalse();
        assertThat(pair(new CellResult.ErrorCode("#N/A"), new CellResult.ErrorCode("#N/A")).agrees(Tolerance.DEFAULT)).isTrue();
        assertThat(pair(new CellResult.ErrorCode("#N/A"), new CellResult.ErrorCode("#VALUE!")).agrees(Tolerance.DEFAULT)).isFalse();
        FormulaCell unevaluated = pair(new CellResult.Unevaluated("x"), new CellResult.Unevaluated("x"));
        assertThat(unevaluated.agrees(Tolerance.DEFAULT)).isFalse();
        assertThat(unevaluated.relativeDifference()).isInfinite();
    }

    @Test
    void relativeDifferenceIsTakenAgainstTheLargerMagnitude() {
        assertThat(pair(new CellResult.Numeric(100), new CellResult.Numeric(99)).relativeDifference()).isEqualTo(0.01);
        assertThat(pair(new CellResult.Numeric(0), new CellResult.Numeric(0)).relativeDifference()).isZero();
        assertThat(pair(new CellResult.Numeric(-2), new CellResult.Numeric(2)).relativeDifference()).isEqualTo(2);
    }

    @Test
    void aMissingProgramSkipsOutsideCiAndFailsOnCi() {
        assertThatThrownBy(() -> ExternalTools.require(false, "tool", "apt-get install -y tool", Map.of()))
                .isInstanceOf(TestAbortedException.class).hasMessageContaining("apt-get install -y tool");
        assertThatThrownBy(() -> ExternalTools.require(false, "tool", "apt-get install -y tool", Map.of("CI", "true")))
                .isInstanceOf(AssertionFailedError.class).hasMessageContaining("apt-get install -y tool");
        ExternalTools.require(true, "tool", "apt-get install -y tool", Map.of("CI", "true"));
    }

    @Test
    void officeInstallCommandNamesTheHeadlessCalcPackage() {
        assertThat(ExternalTools.OFFICE_INSTALL).contains("apt-get install -y").contains("libreoffice-calc-nogui");
    }
}
