package org.miscela.core.blend;

import org.miscela.core.problem.Problem;
import java.util.Locale;

/**
 * How a composition is written: one value per component, in card order, on one of seven bases. Immutable.
 *
 * <table>
 * <caption>Bases and what each value means for component k</caption>
 * <tr><th>kind</th><th>value of k</th><th>unit</th><th>needs</th></tr>
 * <tr><td>mole fraction</td><td>n_k / Σ n</td><td>1</td><td>—</td></tr>
 * <tr><td>mass fraction</td><td>m_k / Σ m</td><td>1</td><td>—</td></tr>
 * <tr><td>volume fraction</td><td>n_k V_k*(T) / Σ n_j V_j*(T): volumes of the unmixed pure liquids at T</td><td>1</td>
 * <td>T</td></tr>
 * <tr><td>strength</td><td>100 · n_k V_k*(T) / V(T): volume of pure k before mixing per volume of mixture, both at
 * the reference temperature T (the convention of alcoholometry)</td><td>%vol</td><td>T, balance</td></tr>
 * <tr><td>molarity</td><td>n_k / V(T)</td><td>mol/L</td><td>T, balance</td></tr>
 * <tr><td>mass concentration</td><td>m_k / V(T)</td><td>g/L</td><td>T, balance</td></tr>
 * <tr><td>molality</td><td>n_k / m_s, s the solvent</td><td>mol/kg</td><td>solvent</td></tr>
 * <tr><td>mass percent</td><td>100 · m_k / Σ m ("%w/w", "wt%", "mass %", "% m/m", …)</td><td>%</td><td>—</td></tr>
 * <tr><td>mole percent</td><td>100 · n_k / Σ n ("mol %", "mole %")</td><td>%</td><td>—</td></tr>
 * </table>
 *
 * <p><b>Reference temperature.</b> The bases measured per volume (volume fraction, %vol, mol/L, g/L) hold a
 * temperature. Callers take it from the call when stated, else from the card's 'basis reference temperature' row,
 * else 20 °C, the temperature at which OIML R 22 (1975) defines alcoholic strength by volume; never from the working
 * or measurement temperature.
 *
 * <p><b>Fractions</b> (mole, mass, volume) need every value; they must sum to 1 within 1e-6.
 *
 * <p><b>Concentrations</b> (strength, molarity, mass concentration, molality) are written for every component too,
 * the balance component (solvent) included: its own %vol, mol/L, g/L, or for molality its moles per kg of itself,
 * 1000/M_s. As input, the balance component's entry is implied by the others (it makes up the rest of the volume, or
 * is the kilogram of solvent), so it may be left blank (NaN); when given, it must agree with the value the others imply
 * within 1e-6 relative, otherwise the input is contradictory and refused. So a conversion's output is valid input, and
 * a composition of n components is fixed by the n − 1 values of the other components. For a binary strength that is
 * the familiar single number: the %vol of the alcohol, with water as the balance.
 *
 * <p>The balance component matters only when reading concentrations (and, for molality, also when writing them: it
 * is the solvent). The temperature is in the card's temperature unit.
 */
public final class CompositionBasis {

    /** The seven bases. */
    public enum Kind {
        MOLE_FRACTION("mole fraction", "", false, false, "x", "mole fraction", "mol/mol"),
        MASS_FRACTION("mass fraction", "", false, false, "w", "mass fraction", "g/g", "kg/kg"),
        VOLUME_FRACTION("volume fraction", "", true, false, "phi", "volume fraction"),
        STRENGTH("strength", "%vol", true, true, "%vol", "% vol", "strength", "%v/v", "% v/v", "v/v %"),
        MOLARITY("molarity", "mol/L", true, true, "mol/L", "mol/l", "molarity"),
        MASS_CONCENTRATION("mass concentration", "g/L", true, true, "g/L", "g/l", "mass concentration"),
        MOLALITY("molality", "mol/kg", false, true, "mol/kg", "molality"),
        /** Mass fractions written as percent (0 to 100), in the trade's spellings. */
        MASS_PERCENT("mass percent", "%", false, false, "mass percent", "%w/w", "% w/w", "wt%", "wt %", "mass %",
                "% m/m", "%m/m", "w/w %", "m/m %"),
        /** Mole fractions written as percent (0 to 100). */
        MOLE_PERCENT("mole percent", "%", false, false, "mole percent", "mol %", "mol%", "mole %", "mole%");

        private final String label;
        private final String unit;
        private final boolean needsTemperature;
        private final boolean concentration;
        private final String[] spellings;

        Kind(String label, String unit, boolean needsTemperature, boolean concentration, String... spellings) {
            this.label = label;
            this.unit = unit;
            this.needsTemperature = needsTemperature;
            this.concentration = concentration;
            this.spellings = spellings;
        }

        public String label() {
            return label;
        }

        /** The unit of the values ("" for fractions). */
        public String unit() {
            return unit;
        }

        public boolean needsTemperature() {
            return needsTemperature;
        }

        /** The largest value one component can have: 100 for percents and strength, 1 for fractions, else ∞. */
        public double maximum() {
            switch (this) {
                case MOLE_FRACTION:
                case MASS_FRACTION:
                case VOLUME_FRACTION:
                    return 1.0;
                case MASS_PERCENT:
                case MOLE_PERCENT:
                case STRENGTH:
                    return 100.0;
                default:
                    return Double.POSITIVE_INFINITY;
            }
        }

        /** 100 for the percent kinds (their values are fractions × 100), 1 otherwise. */
        double scale() {
            return this == MASS_PERCENT || this == MOLE_PERCENT ? 100.0 : 1.0;
        }

        /** Whether one component is the balance (or solvent) rather than every value being given. */
        public boolean isConcentration() {
            return concentration;
        }

        /** The kind spelled {@code text} (spaces trimmed, case ignored). */
        public static Kind lookup(String text) {
            String t = text == null ? "" : text.trim();
            for (Kind k : values()) {
                for (String s : k.spellings) {
                    if (s.equalsIgnoreCase(t)) {
                        return k;
                    }
                }
            }
            throw Problem.BLEND_UNKNOWN_BASIS.raise(t, accepted());
        }

        static String accepted() {
            StringBuilder b = new StringBuilder();
            for (Kind k : values()) {
                for (String s : k.spellings) {
                    b.append(b.length() == 0 ? "" : ", ").append(s);
                }
            }
            return b.toString();
        }
    }

    /** The balance (solvent) is not named. */
    static final int NO_BALANCE = -1;

    private final Kind kind;
    private final double temperature;
    private final int balance;

    private CompositionBasis(Kind kind, double temperature, int balance) {
        this.kind = kind;
        this.temperature = temperature;
        this.balance = balance;
    }

    public static CompositionBasis moleFraction() {
        return new CompositionBasis(Kind.MOLE_FRACTION, Double.NaN, NO_BALANCE);
    }

    public static CompositionBasis massFraction() {
        return new CompositionBasis(Kind.MASS_FRACTION, Double.NaN, NO_BALANCE);
    }

    /** Volume fractions of the pure liquids before mixing, each at the temperature t. */
    public static CompositionBasis volumeFraction(double t) {
        return new CompositionBasis(Kind.VOLUME_FRACTION, Checks.temperature(t, "temperature of the volume fractions"),
                NO_BALANCE);
    }

    /** %vol at the reference temperature t; {@code balance} (0-based) makes up the rest when reading. */
    public static CompositionBasis strength(double t, int balance) {
        return new CompositionBasis(Kind.STRENGTH, Checks.temperature(t, "reference temperature of the strength"),
                balance);
    }

    /** mol/L of mixture at t; {@code balance} (0-based) makes up the rest when reading. */
    public static CompositionBasis molarity(double t, int balance) {
        return new CompositionBasis(Kind.MOLARITY, Checks.temperature(t, "temperature of the molarities"), balance);
    }

    /** g/L of mixture at t; {@code balance} (0-based) makes up the rest when reading. */
    public static CompositionBasis massConcentration(double t, int balance) {
        return new CompositionBasis(Kind.MASS_CONCENTRATION,
                Checks.temperature(t, "temperature of the mass concentrations"), balance);
    }

    /** mol per kg of the solvent (0-based index). */
    public static CompositionBasis molality(int solvent) {
        return new CompositionBasis(Kind.MOLALITY, Double.NaN, solvent);
    }

    /**
     * Any basis from its kind: t is read only for kinds that need a temperature, and the balance only for
     * concentrations (pass {@code -1} when none is named; reading a concentration then fails with a message).
     */
    public static CompositionBasis of(Kind kind, double t, int balance) {
        double temperature = kind.needsTemperature() ? Checks.temperature(t, "temperature of the " + kind.label())
                : Double.NaN;
        return new CompositionBasis(kind, temperature, kind.isConcentration() ? balance : NO_BALANCE);
    }

    public Kind kind() {
        return kind;
    }

    /** The temperature in the card's unit, NaN for bases that need none. */
    public double temperature() {
        return temperature;
    }

    /** The balance (solvent) component, 0-based, or −1 when none is named. */
    public int balance() {
        return balance;
    }

    /** Plural label for messages: "mole fractions", "molarities". */
    String plural() {
        if (kind == Kind.MASS_PERCENT || kind == Kind.MOLE_PERCENT) {
            return kind.label() + "s";
        }
        return kind == Kind.STRENGTH ? "strengths (%vol)" : kind.label().replace("ity", "itie") + "s";
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%s%s%s", kind.label(),
                kind.needsTemperature() ? " at " + Show.number(temperature) : "",
                balance >= 0 ? ", balance component " + (balance + 1) : "");
    }
}
