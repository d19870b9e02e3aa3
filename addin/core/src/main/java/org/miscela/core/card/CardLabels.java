package org.miscela.core.card;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The labels of the card format (docs/card-format.md), in their normalised form ({@link CardReader#normalise}), and
 * the kind of row each one starts: global (values from column 2), keyed (column 2 names a component or a pair),
 * a row of an excess-property section, or a row a version 1 card may not hold.
 */
final class CardLabels {
    static final String HEADER = "miscela card";
    static final String TITLE = "title";
    static final String SOURCE = "source";
    static final String NOTE = "note";
    static final String TEMPERATURE_UNIT = "temperature unit";
    static final String DENSITY_UNIT = "density unit";
    static final String MOLAR_VOLUME_UNIT = "molar volume unit";
    static final String MOLAR_MASS_UNIT = "molar mass unit";
    static final String VALID_TEMPERATURE = "valid temperature";
    static final String EXTRAPOLATION = "extrapolation";
    static final String COMPONENT = "component";
    static final String COMPONENT_ORDER = "component order";
    static final String DENSITY_MODEL = "density model";
    static final String DENSITY_REFERENCE = "density reference temperature";
    static final String DENSITY_COEFFICIENTS = "density coefficients";
    static final String VALID_MOLE_FRACTION = "valid mole fraction";
    static final String EXCESS_VOLUME = "excess volume";
    static final String EXCESS_ENTHALPY = "excess enthalpy";
    static final String REFERENCE_SUFFIX = " reference temperature";
    static final String MODEL = "multicomponent model";
    static final String MISSING_PAIRS = "missing pairs";
    static final String ENTHALPY_UNIT = "enthalpy unit";
    static final String HEAT_CAPACITY = "heat capacity";
    static final String HEAT_CAPACITY_REFERENCE = "heat capacity reference temperature";
    static final String VALID_PAIR_TEMPERATURE = "valid pair temperature";
    static final String VALID_PAIR_FRACTION = "valid pair mole fraction";
    static final String BASIS_REFERENCE = "basis reference temperature";
    static final String SOLUTION_HEAT_CAPACITY = "solution heat capacity";
    static final String SOLVENT = "solvent";
    static final String BOILING = "boiling temperatures";
    static final String MIXTURE_DENSITY_REFERENCE = "mixture density reference temperature";
    /** 'mixture density T0' … 'mixture density T9': the terms of (T − T_ref)^j, keyed by the w component. */
    static final String MIXTURE_DENSITY_TERM = "mixture density t";
    static final int MIXTURE_DENSITY_TERMS = 10;
    static final String APPARENT_DENSITY = "apparent density";
    static final String CARD_SIZE = "card size";
    static final String EXCESS_GIBBS = "excess gibbs energy";
    static final String PRESSURE_UNIT = "pressure unit";
    static final String VAPOUR_PRESSURE = "vapour pressure";
    static final String FLASH_POINT = "flash point";
    static final String LOWER_FLAMMABLE_LIMIT = "lower flammable limit";
    static final String WILSON = "wilson";
    static final String WILSON_VOLUME = "wilson volume";
    static final String NRTL = "nrtl";
    static final String MELTING_POINT = "melting point";
    static final String FUSION_ENTHALPY = "enthalpy of fusion";
    static final String FUSION_HEAT_CAPACITY = "heat capacity of fusion";
    static final String OSMOTIC = "osmotic coefficient";
    static final String ICE_LIMIT = "ice limit";
    /** The rows of Pitzer's β0, β1 and C^φ, in that order. */
    static final String[] PITZER = {"pitzer beta0", "pitzer beta1", "pitzer cphi"};

    /**
     * Rows of an excess-property section: binary coefficients A0..A99 (group 2), ternary C0..C9 (group 3; only C0..C2
     * exist), the reference temperature (group 4) and the covariance (group 5); group 1 is the section's prefix.
     */
    private static final Pattern SECTION_ROW = Pattern.compile(
            "(excess volume|excess enthalpy|excess gibbs energy) (?:a(\\d{1,2})|ternary c(\\d)|(reference temperature)|"
                    + "(covariance))");

    /** Rows whose values start in column 2. */
    private static final String[] GLOBAL = {TITLE, SOURCE, TEMPERATURE_UNIT, DENSITY_UNIT, MOLAR_VOLUME_UNIT,
        MOLAR_MASS_UNIT, VALID_TEMPERATURE, EXTRAPOLATION, MODEL, MISSING_PAIRS, ENTHALPY_UNIT, COMPONENT_ORDER, BASIS_REFERENCE,
        SOLVENT, MIXTURE_DENSITY_REFERENCE, CARD_SIZE, PRESSURE_UNIT};
    /** Rows whose column 2 names a component (or a pair) and whose values follow. */
    private static final String[] KEYED = {COMPONENT, DENSITY_MODEL, DENSITY_REFERENCE, DENSITY_COEFFICIENTS,
        VALID_MOLE_FRACTION, HEAT_CAPACITY, HEAT_CAPACITY_REFERENCE, VALID_PAIR_TEMPERATURE, VALID_PAIR_FRACTION,
        SOLUTION_HEAT_CAPACITY, BOILING, APPARENT_DENSITY, VAPOUR_PRESSURE, WILSON, WILSON_VOLUME, NRTL, FLASH_POINT,
        LOWER_FLAMMABLE_LIMIT, MELTING_POINT, FUSION_ENTHALPY, FUSION_HEAT_CAPACITY, OSMOTIC, PITZER[0], PITZER[1],
        PITZER[2], ICE_LIMIT};
    /** Labels of version 2 beyond the excess-enthalpy and ternary rows. */
    private static final String[] VERSION_2 = {MODEL, MISSING_PAIRS, ENTHALPY_UNIT, HEAT_CAPACITY,
        EXCESS_VOLUME + " covariance", HEAT_CAPACITY_REFERENCE, VALID_PAIR_TEMPERATURE, VALID_PAIR_FRACTION,
        COMPONENT_ORDER, BASIS_REFERENCE, SOLUTION_HEAT_CAPACITY, SOLVENT, BOILING, MIXTURE_DENSITY_REFERENCE,
        APPARENT_DENSITY, CARD_SIZE, PRESSURE_UNIT, VAPOUR_PRESSURE, WILSON, WILSON_VOLUME, NRTL, FLASH_POINT,
        LOWER_FLAMMABLE_LIMIT, MELTING_POINT, FUSION_ENTHALPY, FUSION_HEAT_CAPACITY, OSMOTIC, PITZER[0], PITZER[1],
        PITZER[2], ICE_LIMIT};
    /** Keyed rows whose subject is a pair "a + b" rather than one component. */
    private static final String[] PAIR_KEYED = {VALID_PAIR_TEMPERATURE, VALID_PAIR_FRACTION, WILSON, NRTL};

    private CardLabels() {
    }

    static boolean isGlobal(String key) {
        return among(key, GLOBAL);
    }

    static boolean isKeyed(String key) {
        return among(key, KEYED) || mixtureDensityTerm(key) >= 0;
    }

    /** j of a 'mixture density Tj' label (0 to 9), or −1 for any other label. */
    static int mixtureDensityTerm(String key) {
        if (key.length() == MIXTURE_DENSITY_TERM.length() + 1 && key.startsWith(MIXTURE_DENSITY_TERM)) {
            char c = key.charAt(key.length() - 1);
            return c >= '0' && c <= '9' ? c - '0' : -1;
        }
        return -1;
    }

    /** Whether the subject of a keyed row is a pair of components rather than one. */
    static boolean isPairKeyed(String key) {
        return among(key, PAIR_KEYED);
    }

    /** Labels added in version 2: a version 1 card promised never to contain them. */
    static boolean isVersion2(String key) {
        return among(key, VERSION_2) || mixtureDensityTerm(key) >= 0 || key.startsWith(EXCESS_ENTHALPY + " ")
                || key.startsWith(EXCESS_GIBBS + " ")
                || key.startsWith(EXCESS_VOLUME + " ternary");
    }

    /** A matcher of the section-row pattern on this key; {@code matches()} tells whether it is one (see groups). */
    static Matcher sectionRow(String key) {
        return SECTION_ROW.matcher(key);
    }

    static boolean isSectionRow(String key) {
        return sectionRow(key).matches();
    }

    /** How many components a section row's subject names: 3 for ternary rows, 2 for A_k rows, 0 (either) else. */
    static int subjectSize(String key) {
        Matcher m = sectionRow(key);
        if (!m.matches()) {
            return 0;
        }
        return m.group(2) != null ? 2 : m.group(3) != null ? 3 : 0;
    }

    private static boolean among(String key, String[] labels) {
        for (String label : labels) {
            if (key.equals(label)) {
                return true;
            }
        }
        return false;
    }
}
