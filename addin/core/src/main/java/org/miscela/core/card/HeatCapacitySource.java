package org.miscela.core.card;

/**
 * Where a card's blend heat capacity comes from, in the words MIX.TRACE shows. The pure liquids alone mean that the
 * excess heat capacity is taken as zero: said, never assumed silently.
 */
public enum HeatCapacitySource {
    /** A solution heat-capacity model on the card (Laliberté 2009), with the solvent's own heat capacity. */
    SOLUTION_MODEL("the card's solution heat-capacity model (Laliberté 2009) with the solvent's heat capacity"),
    /** Σ x_k Cp_k + ∂H^E/∂T from the card's temperature-dependent excess enthalpy. */
    EXCESS_ENTHALPY_SLOPE("the pure liquids' heat capacities plus ∂H^E/∂T from the card's excess enthalpy"),
    /** Σ x_k Cp_k: no excess heat capacity on the card. */
    PURE_LIQUIDS_ONLY("the pure liquids' heat capacities alone: the card gives no excess heat capacity (its excess "
            + "enthalpy does not vary with temperature and it states no solution model), so it is taken as zero; "
            + "real solutions such as aqueous acids hold less heat than that sum, and a temperature rise comes out low");

    private final String words;

    HeatCapacitySource(String words) {
        this.words = words;
    }

    /** What MIX.TRACE says of it. */
    public String words() {
        return words;
    }
}
