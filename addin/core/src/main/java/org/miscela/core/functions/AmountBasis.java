package org.miscela.core.functions;

import org.miscela.core.card.Units.Definitions;

/**
 * How amounts of components are given to the heat functions: in moles or in mass (1 t = 10⁶ g, SI Brochure; the
 * avoirdupois pound 453.592 37 g exactly, NIST SP 811 (2008), B.8), or as conventional mass, weighed in air (OIML D 28:
 * the pure liquid's density at the batch's temperature turns it into a true mass). Spellings as for the blending
 * functions' units, case ignored.
 */
public enum AmountBasis {
    MOL("mol", 1.0, false, false),
    KMOL("kmol", 1000.0, false, false),
    G("g", 1.0, true, false),
    KG("kg", 1000.0, true, false),
    T("t", 1.0e6, true, false, "tonne", "tonnes"),
    LB("lb", Definitions.POUND_KG * 1000.0, true, false, "lbs"),
    G_AIR("g (conventional)", 1.0, true, true, "g air"),
    KG_AIR("kg (conventional)", 1000.0, true, true, "kg air"),
    T_AIR("t (conventional)", 1.0e6, true, true, "t air"),
    LB_AIR("lb (conventional)", Definitions.POUND_KG * 1000.0, true, true, "lb air");

    private final String symbol;
    private final double factor;
    private final boolean mass;
    private final boolean conventional;
    private final String[] others;

    AmountBasis(String symbol, double factor, boolean mass, boolean conventional, String... others) {
        this.symbol = symbol;
        this.factor = factor;
        this.mass = mass;
        this.conventional = conventional;
        this.others = others;
    }

    public String symbol() {
        return symbol;
    }

    /** Whether the amounts are conventional masses, which need each pure liquid's density to convert. */
    public boolean isConventional() {
        return conventional;
    }

    /** Moles of a component with molar mass {@code gramPerMol} (true mass, or moles, only). */
    public double toMoles(double amount, double gramPerMol) {
        return mass ? amount * factor / gramPerMol : amount * factor;
    }

    /**
     * Moles of a component with molar mass {@code gramPerMol} weighed in air, whose true mass is {@code
     * trueMassPerConventional} times its conventional mass (1 for every other basis).
     */
    public double toMoles(double amount, double gramPerMol, double trueMassPerConventional) {
        return toMoles(amount, gramPerMol) * (conventional ? trueMassPerConventional : 1.0);
    }

    /** The basis spelled {@code text} (case ignored), or null. */
    public static AmountBasis lookup(String text) {
        String t = text.trim();
        for (AmountBasis b : values()) {
            if (b.symbol.equalsIgnoreCase(t)) {
                return b;
            }
            for (String s : b.others) {
                if (s.equalsIgnoreCase(t)) {
                    return b;
                }
            }
        }
        return null;
    }

    /** The accepted spellings, for messages: moles, masses, and masses weighed in air. */
    public static String accepted() {
        return "moles: " + spellings(false, false) + "; masses: " + spellings(true, false)
                + "; masses weighed in air (conventional mass, OIML D 28): " + spellings(true, true);
    }

    /** The true-mass bases, for messages. */
    static String trueMasses() {
        StringBuilder s = new StringBuilder();
        for (AmountBasis b : values()) {
            if (b.mass && !b.conventional) {
                s.append(s.length() == 0 ? "" : ", ").append(b.symbol);
            }
        }
        return s.toString();
    }

    private static String spellings(boolean mass, boolean conventional) {
        StringBuilder s = new StringBuilder();
        for (AmountBasis b : values()) {
            if (b.mass == mass && b.conventional == conventional) {
                s.append(s.length() == 0 ? "" : ", ").append(b.symbol);
                for (String o : b.others) {
                    s.append(", ").append(o);
                }
            }
        }
        return s.toString();
    }
}
