package org.miscela.core.card;

import java.util.Arrays;
import java.util.Locale;

/**
 * The units a card states for its numbers. Function arguments and results use the same units, so a sheet reads in
 * the units its card declares. Internally the library works in K, kg/m³, cm³/mol and g/mol.
 */
public final class Units {

    /** Temperature scales: the offset to kelvin (a temperature difference is the same in both). */
    public enum Temperature implements Spelled {
        CELSIUS("°C", 273.15, "°C", "degC", "C"),
        KELVIN("K", 0.0, "K");

        private final Scale scale;

        Temperature(String symbol, double offset, String... spellings) {
            this.scale = new Scale(symbol, offset, spellings);
        }

        @Override
        public Scale scale() {
            return scale;
        }

        public double toKelvin(double t) {
            return t + scale.factor;
        }

        public double fromKelvin(double k) {
            return k - scale.factor;
        }
    }

    /** Density units: the factor to kg/m³. */
    public enum Density implements Spelled {
        KG_PER_M3("kg/m³", 1.0, "kg/m³", "kg/m3", "g/L", "g/l"),
        G_PER_CM3("g/cm³", 1000.0, "g/cm³", "g/cm3", "g/mL", "g/ml");

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

    /** Molar volume units: the factor to cm³/mol. */
    public enum MolarVolume implements Spelled {
        CM3_PER_MOL("cm³/mol", 1.0, "cm³/mol", "cm3/mol", "mL/mol", "ml/mol"),
        L_PER_MOL("L/mol", 1000.0, "L/mol", "l/mol", "dm³/mol", "dm3/mol"),
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
        G_PER_MOL("g/mol", 1.0, "g/mol"),
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

    /** A unit with a display symbol and the spellings a card may use for it. */
    public interface Spelled {
        /** The unit's symbol, spellings and its factor (or, for a temperature scale, its offset) to internal units. */
        Scale scale();

        default String symbol() {
            return scale().symbol;
        }

        default String[] spellings() {
            return scale().spellings.clone();
        }
    }

    /** What every unit enum holds: its display symbol, its factor (or offset) to internal units, its spellings. */
    public static final class Scale {
        final String symbol;
        final double factor;
        final String[] spellings;

        Scale(String symbol, double factor, String[] spellings) {
            this.symbol = symbol;
            this.factor = factor;
            this.spellings = spellings;
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
            for (String s : e.spellings()) {
                if (s.equals(t)) {
                    return e;
                }
            }
        }
        return null;
    }

    /** All accepted spellings, for messages. */
    static <E extends Enum<E> & Spelled> String accepted(Class<E> type) {
        StringBuilder b = new StringBuilder();
        for (E e : type.getEnumConstants()) {
            for (String s : e.spellings()) {
                if (b.length() > 0) {
                    b.append(", ");
                }
                b.append(s);
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
