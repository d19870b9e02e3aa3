package org.miscela.core.functions;

/** How amounts of components are given: in moles or in mass. */
public enum AmountBasis {
    MOL("mol", 1.0, false),
    KMOL("kmol", 1000.0, false),
    G("g", 1.0, true),
    KG("kg", 1000.0, true);

    private final String symbol;
    private final double factor;
    private final boolean mass;

    AmountBasis(String symbol, double factor, boolean mass) {
        this.symbol = symbol;
        this.factor = factor;
        this.mass = mass;
    }

    public String symbol() {
        return symbol;
    }

    /** Moles of a component with molar mass {@code gramPerMol}. */
    public double toMoles(double amount, double gramPerMol) {
        return mass ? amount * factor / gramPerMol : amount * factor;
    }

    /** The basis spelled {@code text} (case ignored), or null. */
    public static AmountBasis lookup(String text) {
        String t = text.trim();
        for (AmountBasis b : values()) {
            if (b.symbol.equalsIgnoreCase(t)) {
                return b;
            }
        }
        return null;
    }

    /** The accepted spellings, for messages. */
    public static String accepted() {
        StringBuilder s = new StringBuilder();
        for (AmountBasis b : values()) {
            s.append(s.length() == 0 ? "" : ", ").append(b.symbol);
        }
        return s.toString();
    }
}
