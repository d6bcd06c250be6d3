/**
 * Candidate systems, the checks each must pass, the choice, and the reasons every rejected candidate failed.
 */
package org.holdover.sizing;
