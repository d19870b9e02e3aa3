package org.miscela.core.card;

import java.util.Arrays;
import java.util.Locale;

/**
 * The units a card states for its numbers. Function arguments and results use the same units, so a sheet reads in
 * the units its card declares. Internally the library works in K, kg/m³, cm³/mol and g/mol.
 */
public final class Units {

    /**
     * Temperature scales: T/K = (t − zero)·factor + offset, so a difference of one degree is {@code factor} kelvin.
     * Every temperature coefficient on a card (per degree to the power j) is per degree of the card's own scale.
     *
     * <p>Kelvin and Celsius are the SI Brochure's (9th edition, 2019, 2.3.1: t/°C = T/K − 273.15). Fahrenheit is
     * NIST SP 811 (2008), B.9: T/K = (t/°F + 459.67)/1.8, so a degree Fahrenheit is 5/9 K exactly; it is computed as
     * (t/°F − 32)·5/9 + 273.15, the same in exact arithmetic, so that a Fahrenheit temperature of a whole Celsius
     * value (104 °F, 40 °C) lands on the same double as the Celsius one. The degree sign may
     * be typed as the ordinal indicator º (U+00BA) or the ring above ˚ (U+02DA), which look alike in most fonts, or as
     * the one-character signs ℃ and ℉.
     */
    public enum Temperature implements Spelled {
        CELSIUS("°C", 0.0, 1.0, 273.15, "°C", "ºC", "˚C", "℃", "degC", "C"),
        KELVIN("K", 0.0, 1.0, 0.0, "K"),
        FAHRENHEIT("°F", 32.0, 5.0 / 9.0, 273.15, "°F", "ºF", "˚F", "℉", "degF", "F");

        private final Scale scale;

        Temperature(String symbol, double zero, double factor, double offset, String... spellings) {
            this.scale = new Scale(symbol, zero, factor, offset, spellings);
        }

        @Override
        public Scale scale() {
            return scale;
        }

        public double toKelvin(double t) {
            return scale.toInternal(t);
        }

        public double fromKelvin(double k) {
            return scale.fromInternal(k);
        }

        /** The unit of a temperature difference on this scale: K for kelvin and Celsius, °F for Fahrenheit. */
        public String degree() {
            return scale.factor == 1.0 ? "K" : scale.symbol;
        }

        /** A difference of {@code d} degrees of this scale, in K. */
        public double differenceToKelvin(double d) {
            return d * scale.factor;
        }

        /** A difference of {@code k} kelvin in degrees of this scale. */
        public double differenceFromKelvin(double k) {
            return k / scale.factor;
        }

        /**
         * A coefficient per degree of this scale to the power {@code power} (of a temperature polynomial, or a heat
         * capacity per degree) in the same per kelvin to that power; unchanged for kelvin and Celsius.
         */
        public double toPerKelvin(double c, int power) {
            return scale.factor == 1.0 ? c : c / Math.pow(scale.factor, power);
        }

        /** The inverse of {@link #toPerKelvin}: a coefficient per K^power in the same per degree^power. */
        public double fromPerKelvin(double c, int power) {
            return scale.factor == 1.0 ? c : c * Math.pow(scale.factor, power);
        }
    }

    /**
     * Density units: the factor to kg/m³. 1 L = 1 dm³ = 10⁻³ m³ and 1 t = 10³ kg (SI Brochure, 9th edition, table 8);
     * the pound is the avoirdupois pound, 0.453 592 37 kg exactly, and the gallon the US liquid gallon,
     * 3.785 411 784 L exactly (NIST SP 811 (2008), B.8; NIST Handbook 44, appendix C), so 1 lb/gal is
     * 0.45359237/0.003785411784 kg/m³ (about 119.826 43).
     */
    public enum Density implements Spelled {
        KG_PER_M3("kg/m³", 1.0, "kg/m³", "kg/m3", "g/L", "g/l", "g/litre", "g/liter"),
        G_PER_CM3("g/cm³", 1000.0, "g/cm³", "g/cm3", "g/mL", "g/ml", "g/cc"),
        KG_PER_L("kg/L", 1000.0, "kg/L", "kg/l", "kg/litre", "kg/liter", "kg/dm³", "kg/dm3", "t/m³", "t/m3"),
        LB_PER_GAL("lb/gal", Definitions.POUND_KG / Definitions.US_GALLON_M3, "lb/gal", "lb/US gal");

        private final Scale scale;

        Density(String symbol, double factor, String... spellings) {
            this.scale = new Scale(symbol, factor, spellings);
        }

        @Override
        public Scale scale() {
            return scale;
        }

        public double toKgPerM3(double v) {
            return v * scale.factor;
        }

        public double fromKgPerM3(double v) {
            return v / scale.factor;
        }
    }

    /** Molar volume units: the factor to cm³/mol (1 L = 1 dm³ = 10³ cm³, 1 m³ = 10⁶ cm³). */
    public enum MolarVolume implements Spelled {
        CM3_PER_MOL("cm³/mol", 1.0, "cm³/mol", "cm3/mol", "mL/mol", "ml/mol"),
        L_PER_MOL("L/mol", 1000.0, "L/mol", "l/mol", "litre/mol", "liter/mol", "dm³/mol", "dm3/mol"),
        M3_PER_MOL("m³/mol", 1.0e6, "m³/mol", "m3/mol");

        private final Scale scale;

        MolarVolume(String symbol, double factor, String... spellings) {
            this.scale = new Scale(symbol, factor, spellings);
        }

        @Override
        public Scale scale() {
            return scale;
        }

        public double toCm3PerMol(double v) {
            return v * scale.factor;
        }

        public double fromCm3PerMol(double v) {
            return v / scale.factor;
        }
    }

    /** Molar mass units: the factor to g/mol. */
    public enum MolarMass implements Spelled {
        G_PER_MOL("g/mol", 1.0, "g/mol", "kg/kmol"),
        KG_PER_MOL("kg/mol", 1000.0, "kg/mol");

        private final Scale scale;

        MolarMass(String symbol, double factor, String... spellings) {
            this.scale = new Scale(symbol, factor, spellings);
        }

        @Override
        public Scale scale() {
            return scale;
        }

        public double toGramPerMol(double v) {
            return v * scale.factor;
        }

        public double fromGramPerMol(double v) {
            return v / scale.factor;
        }
    }

    /** Molar enthalpy units: the factor to J/mol. Heat capacities are in the same unit per kelvin. */
    public enum MolarEnthalpy implements Spelled {
        J_PER_MOL("J/mol", 1.0, "J/mol"),
        KJ_PER_MOL("kJ/mol", 1000.0, "kJ/mol");

        private final Scale scale;

        MolarEnthalpy(String symbol, double factor, String... spellings) {
            this.scale = new Scale(symbol, factor, spellings);
        }

        @Override
        public Scale scale() {
            return scale;
        }

        /** The energy unit of this molar unit times moles: J or kJ. */
        public String energySymbol() {
            return scale.symbol.substring(0, scale.symbol.indexOf('/'));
        }

        public double toJoulePerMol(double v) {
            return v * scale.factor;
        }

        public double fromJoulePerMol(double v) {
            return v / scale.factor;
        }
    }

    /**
     * Pressure units: the factor to Pa. Exact by definition (SI Brochure 2019; NIST SP 811 (2008), appendix B):
     * 1 atm = 101 325 Pa, 1 bar = 10⁵ Pa, 1 Torr = 101 325/760 Pa, 1 mmHg (conventional, 13.5951 g/cm³ under
     * standard gravity) = 133.322 387 415 Pa, 1 psi = 6 894.757 293 168 Pa (the avoirdupois pound-force per square
     * inch).
     */
    public enum Pressure implements Spelled {
        KPA("kPa", 1e3, "kPa"),
        PA("Pa", 1.0, "Pa"),
        MPA("MPa", 1e6, "MPa"),
        BAR("bar", 1e5, "bar"),
        MBAR("mbar", 100.0, "mbar", "hPa"),
        ATM("atm", 101325.0, "atm"),
        MMHG("mmHg", 133.322387415, "mmHg", "mm Hg"),
        TORR("Torr", 101325.0 / 760.0, "Torr", "torr"),
        PSI("psi", 6894.757293168, "psi", "psia", "lbf/in²", "lbf/in2");

        private final Scale scale;

        Pressure(String symbol, double factor, String... spellings) {
            this.scale = new Scale(symbol, factor, spellings);
        }

        @Override
        public Scale scale() {
            return scale;
        }

        public double toPascal(double v) {
            return v * scale.factor;
        }

        public double fromPascal(double v) {
            return v / scale.factor;
        }
    }

    /** A unit with a display symbol and the spellings a card may use for it. */
    public interface Spelled {
        /** The unit's symbol, spellings, and its factor (and, for a temperature scale, offset) to internal units. */
        Scale scale();

        default String symbol() {
            return scale().symbol;
        }

        default String[] spellings() {
            return scale().spellings.clone();
        }
    }

    /**
     * What every unit enum holds: its display symbol, its spellings, and how a value converts to internal units,
     * internal = (value − zero)·factor + offset. Zero and offset are 0 except for the temperature scales, where a
     * value is a point on the scale rather than an amount.
     */
    public static final class Scale {
        final String symbol;
        final double zero;
        final double factor;
        final double offset;
        final String[] spellings;

        /** A unit whose value converts by a factor alone. */
        public Scale(String symbol, double factor, String[] spellings) {
            this(symbol, 0.0, factor, 0.0, spellings);
        }

        Scale(String symbol, double zero, double factor, double offset, String[] spellings) {
            this.symbol = symbol;
            this.zero = zero;
            this.factor = factor;
            this.offset = offset;
            this.spellings = spellings;
        }

        /** (value − zero)·factor + offset; for a unit without zero and offset, exactly value·factor. */
        double toInternal(double v) {
            return zero == 0.0 && offset == 0.0 ? v * factor : (v - zero) * factor + offset;
        }

        /** The inverse of {@link #toInternal}. */
        double fromInternal(double v) {
            return zero == 0.0 && offset == 0.0 ? v / factor : (v - offset) / factor + zero;
        }

        /** Whether {@code text} is one of the spellings, exactly. */
        public boolean spells(String text) {
            for (String s : spellings) {
                if (s.equals(text)) {
                    return true;
                }
            }
            return false;
        }

        /** Internal units per unit of this one (per degree, for a temperature scale). */
        public double factor() {
            return factor;
        }
    }

    /** Exact definitions of the trade's units, shared by density, mass and volume units (NIST SP 811 (2008), B.8). */
    public static final class Definitions {
        /** The avoirdupois pound in kg, exact. */
        public static final double POUND_KG = 0.45359237;
        /** The US liquid gallon in m³ (231 in³), exact. */
        public static final double US_GALLON_M3 = 3.785411784e-3;
        /** The imperial gallon in m³, exact. */
        public static final double IMPERIAL_GALLON_M3 = 4.54609e-3;

        private Definitions() {
        }
    }

    private final Temperature temperature;
    private final Density density;
    private final MolarVolume molarVolume;
    private final MolarMass molarMass;
    private final MolarEnthalpy enthalpy;

    /** Units of a card without enthalpy data. */
    public Units(Temperature temperature, Density density, MolarVolume molarVolume, MolarMass molarMass) {
        this(temperature, density, molarVolume, molarMass, null);
    }

    /** @param enthalpy null when the card holds no enthalpy data */
    public Units(Temperature temperature, Density density, MolarVolume molarVolume, MolarMass molarMass,
            MolarEnthalpy enthalpy) {
        this.temperature = temperature;
        this.density = density;
        this.molarVolume = molarVolume;
        this.molarMass = molarMass;
        this.enthalpy = enthalpy;
    }

    public Temperature temperature() {
        return temperature;
    }

    public Density density() {
        return density;
    }

    public MolarVolume molarVolume() {
        return molarVolume;
    }

    public MolarMass molarMass() {
        return molarMass;
    }

    /** The enthalpy unit, or null when the card states none (and so holds no enthalpy data). */
    public MolarEnthalpy enthalpy() {
        return enthalpy;
    }

    /** Finds the constant whose spelling matches {@code text} exactly (after trimming), or null. */
    static <E extends Enum<E> & Spelled> E lookup(Class<E> type, String text) {
        String t = text.trim();
        for (E e : type.getEnumConstants()) {
            if (e.scale().spells(t)) {
                return e;
            }
        }
        return null;
    }

    /** All accepted spellings, for messages. */
    static <E extends Enum<E> & Spelled> String accepted(Class<E> type) {
        return Units.accepted(type.getEnumConstants());
    }

    /**
     * The accepted spellings of these units, grouped by unit for a message: "K; °C (or ºC, degC, C); …", each unit's
     * symbol first and its other spellings in brackets.
     */
    public static String accepted(Spelled... units) {
        StringBuilder b = new StringBuilder();
        for (Spelled u : units) {
            b.append(b.length() == 0 ? "" : "; ").append(u.symbol());
            String others = "";
            for (String s : u.spellings()) {
                if (!s.equals(u.symbol())) {
                    others += (others.isEmpty() ? "" : ", ") + s;
                }
            }
            if (!others.isEmpty()) {
                b.append(" (or ").append(others).append(')');
            }
        }
        return b.toString();
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%s, %s, %s, %s%s", temperature.symbol(), density.symbol(),
                molarVolume.symbol(), molarMass.symbol(), enthalpy == null ? "" : ", " + enthalpy.symbol());
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof Units)) {
            return false;
        }
        Units u = (Units) o;
        return u.temperature == temperature && u.density == density && u.molarVolume == molarVolume
                && u.molarMass == molarMass && u.enthalpy == enthalpy;
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(new Object[] {temperature, density, molarVolume, molarMass, enthalpy});
    }
}
