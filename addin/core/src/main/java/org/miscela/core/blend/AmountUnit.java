package org.miscela.core.blend;

import org.miscela.core.card.Units;
import org.miscela.core.card.Units.Definitions;
import org.miscela.core.problem.Problem;

/**
 * Units of the quantities a batch is measured in: amount of substance, mass or volume. Internally the blending
 * functions work in mol, g and cm³. A volume of a pure component always comes with the temperature it was measured at.
 *
 * <p>Factors: 1 t = 10⁶ g, 1 L = 1 dm³ = 10³ cm³, 1 m³ = 10⁶ cm³ (SI Brochure, 9th edition, tables 8 and 5); the
 * avoirdupois pound 453.592 37 g, the US liquid gallon 3 785.411 784 cm³ and the imperial (UK) gallon 4 546.09 cm³,
 * all exact (NIST SP 811 (2008), B.8). "gal" alone is the US gallon.
 *
 * <p>Masses weighed in air may be given, and asked for, as <b>conventional mass</b> (OIML D 28): "kg (conventional)"
 * or "kg air", and the same for g, t and lb. Such a mass needs the density of what was weighed, so it comes with a
 * temperature like a volume: a pure component's at its storage temperature (or the batch's when none is given), a
 * mixture's at its own temperature; see {@link org.miscela.core.model.ConventionalMass}.
 */
public enum AmountUnit implements Units.Spelled {
    MOL("mol", Dimension.AMOUNT, false, 1.0, "mol"),
    KMOL("kmol", Dimension.AMOUNT, false, 1000.0, "kmol"),
    G("g", Dimension.MASS, false, 1.0, "g"),
    KG("kg", Dimension.MASS, false, 1000.0, "kg"),
    T("t", Dimension.MASS, false, 1.0e6, "t", "tonne", "tonnes"),
    LB("lb", Dimension.MASS, false, Definitions.POUND_KG * 1000.0, "lb", "lbs"),
    G_AIR("g (conventional)", Dimension.MASS, true, 1.0, "g (conventional)", "g air"),
    KG_AIR("kg (conventional)", Dimension.MASS, true, 1000.0, "kg (conventional)", "kg air"),
    T_AIR("t (conventional)", Dimension.MASS, true, 1.0e6, "t (conventional)", "t air"),
    LB_AIR("lb (conventional)", Dimension.MASS, true, Definitions.POUND_KG * 1000.0, "lb (conventional)", "lb air"),
    ML("mL", Dimension.VOLUME, false, 1.0, "mL", "ml", "millilitre", "milliliter", "millilitres", "milliliters",
            "cm³", "cm3"),
    L("L", Dimension.VOLUME, false, 1000.0, "L", "l", "litre", "liter", "litres", "liters", "dm³", "dm3"),
    M3("m³", Dimension.VOLUME, false, 1.0e6, "m³", "m3"),
    US_GAL("US gal", Dimension.VOLUME, false, Definitions.US_GALLON_M3 * 1.0e6, "US gal", "gal", "gal (US)"),
    IMP_GAL("imp gal", Dimension.VOLUME, false, Definitions.IMPERIAL_GALLON_M3 * 1.0e6, "imp gal", "UK gal",
            "gal (imp)", "gal (UK)");

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
            return symbols(true);
        }

        /** The units of this dimension but the conventional masses, for messages. */
        String trueUnits() {
            return symbols(false);
        }

        private String symbols(boolean withConventional) {
            StringBuilder b = new StringBuilder();
            for (AmountUnit u : AmountUnit.values()) {
                if (u.dimension == this && (withConventional || !u.conventional)) {
                    b.append(b.length() == 0 ? "" : ", ").append(u.symbol());
                }
            }
            return b.toString();
        }
    }

    private final Dimension dimension;
    private final boolean conventional;
    private final Units.Scale scale;

    AmountUnit(String symbol, Dimension dimension, boolean conventional, double factor, String... spellings) {
        this.dimension = dimension;
        this.conventional = conventional;
        this.scale = new Units.Scale(symbol, factor, spellings);
    }

    @Override
    public Units.Scale scale() {
        return scale;
    }

    public Dimension dimension() {
        return dimension;
    }

    /** Whether this is a conventional mass (weighed in air, OIML D 28), which converts with a density. */
    public boolean isConventional() {
        return conventional;
    }

    /** Whether a value in this unit needs a temperature: a volume's, or the weighing's for a conventional mass. */
    public boolean needsTemperature() {
        return dimension == Dimension.VOLUME || conventional;
    }

    /** What values in this unit are, for a message saying they need a temperature: "volumes", "a volume". */
    String needingTemperature(boolean plural) {
        if (conventional) {
            return plural ? "masses weighed in air (conventional mass)" : "a mass weighed in air (conventional mass)";
        }
        return plural ? "volumes" : "a volume";
    }

    /** The value in mol, g or cm³ (for a conventional mass: g of conventional mass). */
    public double toBase(double v) {
        return v * scale.factor();
    }

    /** A value in mol, g or cm³ (for a conventional mass: g of conventional mass) expressed in this unit. */
    public double fromBase(double v) {
        return v / scale.factor();
    }

    /** The unit spelled {@code text} (spaces trimmed, case significant as in SI: "mL" and "ml", "L" and "l"). */
    public static AmountUnit lookup(String text) {
        String t = text == null ? "" : text.trim();
        for (AmountUnit u : values()) {
            if (u.scale.spells(t)) {
                return u;
            }
        }
        throw Problem.BLEND_UNKNOWN_UNIT.raise(t, accepted());
    }

    /** The accepted spellings for a message, by dimension: moles; masses; masses weighed in air; volumes. */
    static String accepted() {
        return "amounts: " + group(Dimension.AMOUNT, false) + "; masses: " + group(Dimension.MASS, false)
                + "; masses weighed in air (conventional mass, OIML D 28): " + group(Dimension.MASS, true)
                + "; volumes: " + group(Dimension.VOLUME, false);
    }

    private static String group(Dimension d, boolean conventional) {
        StringBuilder b = new StringBuilder();
        for (AmountUnit u : values()) {
            if (u.dimension == d && u.conventional == conventional) {
                for (String s : u.spellings()) {
                    b.append(b.length() == 0 ? "" : ", ").append(s);
                }
            }
        }
        return b.toString();
    }

    /** This unit, checked to measure {@code wanted}; {@code what} names the argument in the message. */
    AmountUnit require(Dimension wanted, String what) {
        if (dimension != wanted) {
            throw Problem.WRONG_DIMENSION.raise(symbol(), dimension.label(), what, wanted.label(), wanted.units());
        }
        return this;
    }
}
