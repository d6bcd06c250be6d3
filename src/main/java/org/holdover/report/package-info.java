/**
 * The Excel workbook (Apache POI): one class per sheet and the formula helpers. Presents engine results; computes nothing of its own.
 */
package org.holdover.report;
