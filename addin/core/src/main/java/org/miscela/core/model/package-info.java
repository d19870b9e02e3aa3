/**
 * The numerics of a mixture on plain numbers in internal units (K, cm³/mol, kg/m³, g/mol, J/mol): one pair's
 * temperature-dependent Redlich–Kister series, their combination over every pair by a geometric model (Muggianu,
 * Kohler, Toop) plus ternary terms with analytic gradient, Hessian and temperature slope, pure-liquid density models
 * and heat capacities, a solution's heat capacity by Laliberté's model with its partial molar heat capacities, a
 * blend's boiling curve, and the component record. Nothing here knows of cards, cells or units of display.
 */
package org.miscela.core.model;
