/**
 * The picocli command line: commands, console output and exit codes.
 */
package org.holdover.cli;
