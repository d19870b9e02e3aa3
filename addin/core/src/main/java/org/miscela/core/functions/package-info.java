/**
 * The arithmetic of each cell function in the card's units, with every argument and the validity range checked:
 * volumes, densities, partial molar and excess properties, heats and heat capacities, the temperature rise and its
 * path along an order of addition, validity tests, the audit trace, the propagated
 * uncertainty of a card's coefficients, and the fits to lab data. One static method per cell function; the UNO
 * adapter only decodes arguments, calls one of these and encodes the result.
 */
package org.miscela.core.functions;
