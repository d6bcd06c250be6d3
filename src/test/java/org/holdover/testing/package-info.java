/**
 * Test support: checks that the workbooks we write are right in a real spreadsheet application and on
 * paper.
 *
 * <ul>
 *   <li>{@link org.holdover.testing.SpreadsheetRecalc} opens workbooks in LibreOffice Calc (headless, a
 *       fresh throw-away profile, full recalculation forced on load) and compares every formula cell's
 *       cached value with the value the application computes.</li>
 *   <li>{@link org.holdover.testing.PoiRecalc} does the same comparison with the library's own formula
 *       evaluator, in row order, and fills cached values for workbooks that tests build.</li>
 *   <li>{@link org.holdover.testing.SafeFunctions} lists the worksheet functions that give the same result
 *       in both, and finds formulas that use anything else.</li>
 *   <li>{@link org.holdover.testing.PaperRender} prints workbooks to PDF, pages to PNG, and measures
 *       whether a sheet fits its page width.</li>
 *   <li>{@link org.holdover.testing.ExternalTools} finds the external programs; when one is missing a test
 *       is skipped with the install command, or fails when the environment variable {@code CI} is
 *       {@code true}.</li>
 *   <li>{@link org.holdover.testing.Fuzz} and {@link org.holdover.testing.Mutator} fuzz the readers of user
 *       files with mutations of real inputs and a fixed seed; {@link org.holdover.testing.FailingOutputStream}
 *       makes a write fail part way; {@link org.holdover.testing.Leaves} lists every value of a result so
 *       that two runs can be compared value by value.</li>
 * </ul>
 *
 * <p>Everything these classes write goes under {@code target/holdover-testing/} (see
 * {@link org.holdover.testing.Artifacts}).
 */
package org.holdover.testing;
