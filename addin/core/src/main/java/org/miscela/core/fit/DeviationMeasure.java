package org.miscela.core.fit;

/** What a fit to measured densities makes small. */
public enum DeviationMeasure {
    /** Σ w·(ΔV^E)²: each density is converted to V^E and fitted as it is. */
    EXCESS_VOLUME,
    /**
     * Σ w·(Δρ)² to first order: each point's weight is multiplied by (ρ/V_m)², since δρ = −(ρ/V_m)·δV^E. Suits
     * densities measured with one uncertainty; the residual standard deviation is then close to kg/m³.
     */
    DENSITY
}
