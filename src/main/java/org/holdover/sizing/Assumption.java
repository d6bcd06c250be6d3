package org.holdover.sizing;

/**
 * A value the sizing used, where it came from and why it holds.
 *
 * @param name      what it is
 * @param value     its value (as shown)
 * @param unit      unit
 * @param givenBy   "project" when the user set it, "default" otherwise
 * @param source    the published source, or "common practice, no source", or "from memory"
 */
public record Assumption(String name, double value, String unit, String givenBy, String source) {
}
