/**
 * Candidate systems, the checks each must pass, the choice, and the reasons every rejected candidate failed.
 *
 * <ul>
 *   <li>{@link org.holdover.sizing.ProjectAssembler} turns a project into a {@link org.holdover.sizing.SizingInput};
 *       {@link org.holdover.sizing.SolarAssembler} does the solar section (weather file or synthetic year, sun path,
 *       defaults as assumptions) into a {@link org.holdover.sizing.SolarSetup}.</li>
 *   <li>{@link org.holdover.sizing.Sizing} chooses inverter, bus and bank; then {@link org.holdover.sizing.PvSizing}
 *       sizes the PV array and charge controller(s) for that bank into a {@link org.holdover.sizing.SolarDesign}, whose
 *       checks join the result's.</li>
 * </ul>
 */
package org.holdover.sizing;
