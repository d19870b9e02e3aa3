package org.miscela.core.blend;

import org.miscela.core.problem.Problem;

/**
 * Units of the quantities a batch is measured in: amount of substance, mass or volume. Internally the blending
 * functions work in mol, g and cm³. A volume of a pure component always comes with the temperature it was measured at.
 */
public enum AmountUnit {
    MOL("mol", Dimension.AMOUNT, 1.0, "mol"),
    KMOL("kmol", Dimension.AMOUNT, 1000.0, "kmol"),
    G("g", Dimension.MASS, 1.0, "g"),
    KG("kg", Dimension.MASS, 1000.0, "kg"),
    ML("mL", Dimension.VOLUME, 1.0, "mL", "ml", "cm³", "cm3"),
    L("L", Dimension.VOLUME, 1000.0, "L", "l", "dm³", "dm3"),
    M3("m³", Dimension.VOLUME, 1.0e6, "m³", "m3");

    /** What a unit measures. */
    public enum Dimension {
        AMOUNT("amount of substance"),
        MASS("mass"),
        VOLUME("volume");

        private final String label;

        Dimension(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }

        /** The units of this dimension, for messages. */
        String units() {
            StringBuilder b = new StringBuilder();
            for (AmountUnit u : AmountUnit.values()) {
                if (u.dimension == this) {
                    b.append(b.length() == 0 ? "" : ", ").append(u.symbol);
                }
            }
            return b.toString();
        }
    }

    private final String symbol;
    private final Dimension dimension;
    private final double factor;
    private final String[] spellings;

    AmountUnit(String symbol, Dimension dimension, double factor, String... spellings) {
        this.symbol = symbol;
        this.dimension = dimension;
        this.factor = factor;
        this.spellings = spellings;
    }

    public String symbol() {
        return symbol;
    }

    public Dimension dimension() {
        return dimension;
    }

    /** The value in mol, g or cm³. */
    public double toBase(double v) {
        return v * factor;
    }

    /** A value in mol, g or cm³ expressed in this unit. */
    public double fromBase(double v) {
        return v / factor;
    }

    /** The unit spelled {@code text} (spaces trimmed, case significant as in SI: "mL" and "ml", "L" and "l"). */
    public static AmountUnit lookup(String text) {
        String t = text == null ? "" : text.trim();
        for (AmountUnit u : values()) {
            for (String s : u.spellings) {
                if (s.equals(t)) {
                    return u;
                }
            }
        }
        throw Problem.BLEND_UNKNOWN_UNIT.raise(t, accepted());
    }

    static String accepted() {
        StringBuilder b = new StringBuilder();
        for (AmountUnit u : values()) {
            for (String s : u.spellings) {
                b.append(b.length() == 0 ? "" : ", ").append(s);
            }
        }
        return b.toString();
    }

    /** This unit, checked to measure {@code wanted}; {@code what} names the argument in the message. */
    AmountUnit require(Dimension wanted, String what) {
        if (dimension != wanted) {
            throw Problem.WRONG_DIMENSION.raise(symbol, dimension.label(), what, wanted.label(), wanted.units());
        }
        return this;
    }
}
