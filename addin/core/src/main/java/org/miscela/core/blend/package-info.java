/**
 * Composition bases and blending: the jobs of estimators and plant engineers, for cards of any number of
 * components. Pure Java; every evaluation of the card goes through {@link org.miscela.core.functions.CardFunctions}, so the
 * card's validity range, extrapolation rule and physical checks apply as everywhere else.
 *
 * <ul>
 * <li>{@link org.miscela.core.blend.Compositions}: any basis of {@link org.miscela.core.blend.CompositionBasis} in,
 * any out (mole, mass and volume fraction, strength in %vol, mol/L, g/L, mol/kg).</li>
 * <li>{@link org.miscela.core.blend.Batches}: batch totals and contraction; the volume change of an addition.</li>
 * <li>{@link org.miscela.core.blend.Recipes}: what to charge for a target quantity and composition.</li>
 * <li>{@link org.miscela.core.blend.Adjustments}: what to add to an existing batch.</li>
 * <li>{@link org.miscela.core.blend.DensityInversion}: composition from a measured density.</li>
 * <li>{@link org.miscela.core.blend.TemperatureCorrection}: density and volume to a reference temperature.</li>
 * </ul>
 *
 * <p><b>Conventions.</b> Components are numbered from 0 in card order. Temperatures are in the card's temperature
 * unit and densities in its density unit; amounts, masses and volumes carry an {@link org.miscela.core.blend.AmountUnit}
 * (mol, kmol, g, kg, mL, L, m³); concentrations are in mol/L, g/L, mol/kg and %vol. A volume of a pure component is
 * always at a stated temperature. NaN means a blank cell: it is accepted only where a value is implied by the others
 * (the balance component's entry of a concentration) or not needed (the temperature of a component with no volume),
 * and refused everywhere else, never read as zero. Bad arguments, like the card's own refusals, raise a
 * {@link org.miscela.core.problem.MiscelaException} (the blending section of the problem catalogue).
 *
 * <p><b>Caution.</b> Every number here is a model estimate from a card. Where it feeds custody transfer, duty,
 * invoicing or a decision about filling a vessel, defer to calibrated measurement, the prescribed tables and
 * standards, local codes and licensed practice.
 */
package org.miscela.core.blend;
