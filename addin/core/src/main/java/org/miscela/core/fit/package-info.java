/**
 * The least-squares engine behind the fit functions: weighted linear least squares by Householder QR with column
 * scaling and iterative refinement, fit statistics, order selection (F-tests, AIC, BIC), Redlich–Kister fits to
 * excess volumes and to densities. Independent of cards except for the
 * component data and unit conversions a density fit needs.
 */
package org.miscela.core.fit;
