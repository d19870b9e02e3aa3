package org.miscela.core.model;

/**
 * How the binary Redlich–Kister sets of a card combine into a multicomponent excess property. Each pair i–j
 * contributes x_i·x_j·S_ij(d_ij), S_ij(d) = Σ_k A_k^ij·d^k; the models differ only in d_ij. All three reduce to the
 * binary expansion when only two components are present.
 */
public enum GeometricModel {
    /** Muggianu, Azzaria &amp; Miani (1975): d = x_i − x_j (the symmetric default). */
    MUGGIANU("Muggianu"),
    /** Kohler (1960): the binary at the ratio x_i/(x_i + x_j), so d = (x_i − x_j)/(x_i + x_j). */
    KOHLER("Kohler"),
    /**
     * Toop (1965): one asymmetric component a keeps its own mole fraction in its pairs, so d = x_a − (1 − x_a);
     * pairs without a are taken as in Kohler (the usual extension beyond three components, e.g. Pelton 2001).
     */
    TOOP("Toop");

    private final String cardName;

    GeometricModel(String cardName) {
        this.cardName = cardName;
    }

    /** The name as written on a card. */
    public String cardName() {
        return cardName;
    }
}
