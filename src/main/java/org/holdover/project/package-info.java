/**
 * The project file: its model (records, SI units), reading YAML or JSON with Jackson, and validation that reports every problem with its file, line, column and field path.
 */
package org.holdover.project;
