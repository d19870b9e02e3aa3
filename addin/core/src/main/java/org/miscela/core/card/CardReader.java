package org.miscela.core.card;

import org.miscela.core.model.Component;
import org.miscela.core.model.ConstantDensity;
import org.miscela.core.model.ExcessFunction;
import org.miscela.core.model.GeometricModel;
import org.miscela.core.model.HeatCapacity;
import org.miscela.core.model.PolynomialDensity;
import org.miscela.core.model.PureDensity;
import org.miscela.core.model.RedlichKister;
import org.miscela.core.model.Tanaka2001WaterDensity;
import org.miscela.core.model.TernaryTerm;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Numbers;
import org.miscela.core.problem.Problem;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads a card from the cells of a spreadsheet range (rows of label, then values). Strict: every problem is reported
 * with the row it is in, and nothing is guessed. See docs/card-format.md for the layout.
 *
 * <p>Cells arrive as {@link Double} (numbers and booleans), {@link String} (text; the empty string is a blank cell),
 * {@link Boolean} or null.
 */
public final class CardReader {
    /** The newest card format version this reader understands; it also reads every older one. */
    public static final int FORMAT_VERSION = 2;

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
    /** Intervals the validity range is split into when checking a density model stays positive. */
    private static final int DENSITY_SAMPLES = 256;
    /** Rows of an excess-property section: binary coefficients A0..A99, ternary C0..C2, reference temperature. */
    private static final Pattern SECTION_ROW = Pattern.compile(
            "(excess volume|excess enthalpy) (?:a(\\d{1,2})|ternary c(\\d)|(reference temperature)|(covariance))");

    /** Rows whose values start in column 2. */
    private static final String[] GLOBAL = {TITLE, SOURCE, TEMPERATURE_UNIT, DENSITY_UNIT, MOLAR_VOLUME_UNIT,
        MOLAR_MASS_UNIT, VALID_TEMPERATURE, EXTRAPOLATION, MODEL, MISSING_PAIRS, ENTHALPY_UNIT};
    /** Rows whose column 2 names a component (or a pair) and whose values follow. */
    private static final String[] KEYED = {COMPONENT, DENSITY_MODEL, DENSITY_REFERENCE, DENSITY_COEFFICIENTS,
        VALID_MOLE_FRACTION, HEAT_CAPACITY, HEAT_CAPACITY_REFERENCE, VALID_PAIR_TEMPERATURE, VALID_PAIR_FRACTION};
    /** Labels of version 2 beyond the excess-enthalpy and ternary rows. */
    private static final String[] VERSION_2 = {MODEL, MISSING_PAIRS, ENTHALPY_UNIT, HEAT_CAPACITY,
        EXCESS_VOLUME + " covariance",
        HEAT_CAPACITY_REFERENCE, VALID_PAIR_TEMPERATURE, VALID_PAIR_FRACTION};
    /** Keyed rows whose subject is a pair "a + b" rather than one component. */
    private static final String[] PAIR_KEYED = {VALID_PAIR_TEMPERATURE, VALID_PAIR_FRACTION};

    private CardReader() {
    }

    /** Parses a card; throws {@link MiscelaException} naming the first problem found. */
    public static Card read(Object[][] cells) {
        return read(cells, false);
    }

    /**
     * Parses the pure-component part of a card: like {@link #read}, but pairs without coefficient rows are ideal and
     * the composition limits may be left out. The fit functions read the data they fit against from such a range
     * (the top of a card, whose coefficient rows below hold the fit's array formula, which would otherwise refer to
     * itself).
     */
    public static Card readPureComponents(Object[][] cells) {
        return read(cells, true);
    }

    private static Card read(Object[][] cells, boolean pureOnly) {
        List<Row> rows = rows(cells);
        if (rows.isEmpty()) {
            throw Problem.CARD_EMPTY.raise();
        }
        Row header = rows.get(0);
        if (!header.key.equals(HEADER)) {
            throw Problem.CARD_HEADER.raise(header.number, header.label);
        }
        double version = header.number(0);
        if (version != 1 && version != 2) {
            throw Problem.CARD_VERSION.raise(header.number, Numbers.show(version), FORMAT_VERSION);
        }
        header.atMost(1);
        return new Parse(rows.subList(1, rows.size()), (int) version, pureOnly).card();
    }

    /** The working state of one parse. */
    private static final class Parse {
        final Map<String, Row> global = new HashMap<>();
        /** keyed rows: key → (normalised subject → row), in card order */
        final Map<String, LinkedHashMap<String, Row>> keyed = new HashMap<>();
        /** excess-property sections by prefix ("excess volume", "excess enthalpy") */
        final Map<String, SectionRows> sections = new LinkedHashMap<>();
        final List<Component> components = new ArrayList<>();
        Units units;

        final boolean pureOnly;

        Parse(List<Row> rows, int version, boolean pureOnly) {
            this.pureOnly = pureOnly;
            for (Row r : rows) {
                if (version < 2 && isVersion2(r.key)) {
                    throw Problem.NEEDS_VERSION_2.raise(r.number, r.label);
                }
                sort(r);
            }
        }

        /** Labels added in version 2: a version 1 card promised never to contain them. */
        private static boolean isVersion2(String key) {
            for (String v2 : VERSION_2) {
                if (key.equals(v2)) {
                    return true;
                }
            }
            return key.startsWith(EXCESS_ENTHALPY + " ") || key.startsWith(EXCESS_VOLUME + " ternary");
        }

        private void sort(Row r) {
            if (r.key.isEmpty()) {
                throw Problem.NO_LABEL.raise(r.number);
            }
            if (r.key.equals(NOTE) || r.label.startsWith("#")) {
                return;
            }
            for (String g : GLOBAL) {
                if (r.key.equals(g)) {
                    Row before = global.put(g, r);
                    if (before != null) {
                        throw Problem.DUPLICATE_ROW.raise(r.number, r.label, before.number);
                    }
                    return;
                }
            }
            Matcher m = SECTION_ROW.matcher(r.key);
            if (m.matches()) {
                SectionRows section = sections.computeIfAbsent(m.group(1), SectionRows::new);
                if (m.group(2) != null) {
                    section.binary.computeIfAbsent(Integer.parseInt(m.group(2)), k -> new ArrayList<>()).add(r);
                } else if (m.group(3) != null) {
                    int c = Integer.parseInt(m.group(3));
                    if (c > 2) {
                        throw Problem.UNKNOWN_LABEL.raise(r.number, r.label);
                    }
                    section.ternary.computeIfAbsent(c, k -> new ArrayList<>()).add(r);
                } else if (m.group(5) != null) {
                    // One row per coefficient: the same subject repeats, so these rows are not keyed.
                    section.covariance.add(r);
                    return;
                } else {
                    section.reference.add(r);
                }
                putKeyed(r);
                return;
            }
            for (String k : KEYED) {
                if (r.key.equals(k)) {
                    putKeyed(r);
                    return;
                }
            }
            throw Problem.UNKNOWN_LABEL.raise(r.number, r.label);
        }

        private void putKeyed(Row r) {
            String subject = normalise(r.text(0));
            Row before = keyed.computeIfAbsent(r.key, k -> new LinkedHashMap<>()).put(subject, r);
            if (before != null) {
                throw Problem.DUPLICATE_ROW.raise(r.number, r.label + " | " + r.text(0), before.number);
            }
        }

        Card card() {
            Units.MolarEnthalpy enthalpyUnit = global.containsKey(ENTHALPY_UNIT)
                    ? unit(ENTHALPY_UNIT, Units.MolarEnthalpy.class) : null;
            units = new Units(unit(TEMPERATURE_UNIT, Units.Temperature.class), unit(DENSITY_UNIT, Units.Density.class),
                    unit(MOLAR_VOLUME_UNIT, Units.MolarVolume.class), unit(MOLAR_MASS_UNIT, Units.MolarMass.class),
                    enthalpyUnit);
            String source = required(SOURCE).text(0);
            required(SOURCE).atMost(1);
            Row titleRow = global.get(TITLE);
            String title = titleRow == null ? "" : titleRow.text(0);
            if (titleRow != null) {
                titleRow.atMost(1);
            }
            Map<String, Row> componentRows = keyedRows(COMPONENT);
            List<String> names = new ArrayList<>();
            List<Double> masses = new ArrayList<>();
            for (Row r : componentRows.values()) {
                names.add(r.text(0).trim());
                double mass = r.number(1);
                if (!(mass > 0)) {
                    throw Problem.NOT_POSITIVE.raise(r.number, r.label, "the molar mass", Numbers.show(mass));
                }
                r.atMost(2);
                masses.add(units.molarMass().toGramPerMol(mass));
            }
            if (names.size() < 2) {
                throw Problem.TOO_FEW_COMPONENTS.raise(names.size());
            }
            checkSubjects(componentRows);
            Validity validity = validity(names);
            for (int i = 0; i < names.size(); i++) {
                components.add(new Component(names.get(i), masses.get(i), density(names.get(i), validity),
                        heatCapacity(names.get(i))));
            }
            int[] asymmetric = {-1};
            GeometricModel model = model(names, asymmetric);
            boolean missingIdeal = missingPairsIdeal() || pureOnly;
            // A card may describe enthalpy alone; then the volumetric functions refuse rather than guess.
            boolean enthalpyOnly = sections.containsKey(EXCESS_ENTHALPY) && !sections.containsKey(EXCESS_VOLUME);
            ExcessFunction volume = enthalpyOnly ? null : section(EXCESS_VOLUME, units.molarVolume().toCm3PerMol(1.0),
                    names, model, asymmetric[0], missingIdeal);
            ExcessFunction enthalpy = null;
            if (sections.containsKey(EXCESS_ENTHALPY)) {
                if (enthalpyUnit == null) {
                    throw Problem.MISSING_ROW.raise(ENTHALPY_UNIT);
                }
                enthalpy = section(EXCESS_ENTHALPY, enthalpyUnit.toJoulePerMol(1.0), names, model, asymmetric[0],
                        missingIdeal);
            }
            boolean allow = extrapolation();
            return new Card(title, source, units, components, volume, enthalpy, validity, allow, missingIdeal);
        }

        /** The component's heat capacity, or null when the card gives none. */
        private HeatCapacity heatCapacity(String name) {
            String subject = normalise(name);
            Row r = keyedRows(HEAT_CAPACITY).get(subject);
            Row reference = keyedRows(HEAT_CAPACITY_REFERENCE).get(subject);
            if (r == null) {
                if (reference != null) {
                    throw Problem.MISSING_PAIR_ROW.raise(HEAT_CAPACITY_REFERENCE, name, HEAT_CAPACITY);
                }
                return null;
            }
            if (units.enthalpy() == null) {
                throw Problem.MISSING_ROW.raise(ENTHALPY_UNIT);
            }
            double[] c = r.numbersFrom(1);
            for (int j = 0; j < c.length; j++) {
                c[j] = units.enthalpy().toJoulePerMol(c[j]);
            }
            double tRef = 298.15; // irrelevant for a constant heat capacity
            if (reference != null) {
                reference.atMost(2);
                tRef = units.temperature().toKelvin(reference.number(1));
            } else if (c.length > 1) {
                throw Problem.MISSING_PAIR_ROW.raise(HEAT_CAPACITY, name, HEAT_CAPACITY_REFERENCE);
            }
            return new HeatCapacity(tRef, c);
        }

        private GeometricModel model(List<String> names, int[] asymmetric) {
            Row r = global.get(MODEL);
            if (r == null) {
                return GeometricModel.MUGGIANU;
            }
            String kind = normalise(r.text(0));
            for (GeometricModel m : GeometricModel.values()) {
                if (kind.equals(normalise(m.cardName()))) {
                    if (m == GeometricModel.TOOP) {
                        r.atMost(2);
                        String a = r.text(1).trim();
                        for (int i = 0; i < names.size(); i++) {
                            if (normalise(names.get(i)).equals(normalise(a))) {
                                asymmetric[0] = i;
                            }
                        }
                        if (asymmetric[0] < 0) {
                            throw Problem.UNKNOWN_COMPONENT.raise(r.number, r.label, a);
                        }
                    } else {
                        r.atMost(1);
                    }
                    return m;
                }
            }
            throw Problem.BAD_KEYWORD.raise(r.number, r.label, r.text(0).trim(), "Muggianu, Kohler, Toop");
        }

        private boolean missingPairsIdeal() {
            return choice(MISSING_PAIRS, "ideal", "refuse");
        }

        /**
         * A global yes/no row: true for the word {@code yes}, false for {@code no} or when the row is absent (both
         * words compared as labels are).
         */
        private boolean choice(String label, String yes, String no) {
            Row r = global.get(label);
            if (r == null) {
                return false;
            }
            r.atMost(1);
            String v = normalise(r.text(0));
            if (v.equals(yes)) {
                return true;
            }
            if (v.equals(no)) {
                return false;
            }
            throw Problem.BAD_KEYWORD.raise(r.number, r.label, r.text(0).trim(), no + ", " + yes);
        }

        /** Every keyed row must name a declared component (or, for excess rows, a pair of them). */
        private void checkSubjects(Map<String, Row> componentRows) {
            for (Map.Entry<String, LinkedHashMap<String, Row>> e : keyed.entrySet()) {
                if (e.getKey().equals(COMPONENT) || SECTION_ROW.matcher(e.getKey()).matches()
                        || java.util.Arrays.asList(PAIR_KEYED).contains(e.getKey())) {
                    continue;
                }
                for (Map.Entry<String, Row> s : e.getValue().entrySet()) {
                    if (!componentRows.containsKey(s.getKey())) {
                        Row r = s.getValue();
                        throw Problem.UNKNOWN_COMPONENT.raise(r.number, r.label, r.text(0).trim());
                    }
                }
            }
        }

        private PureDensity density(String name, Validity validity) {
            String subject = normalise(name);
            Row model = keyedRows(DENSITY_MODEL).get(subject);
            if (model == null) {
                throw Problem.MISSING_DENSITY.raise(name);
            }
            model.atMost(2);
            Row reference = keyedRows(DENSITY_REFERENCE).get(subject);
            Row coefficients = keyedRows(DENSITY_COEFFICIENTS).get(subject);
            String kind = normalise(model.text(1));
            PureDensity d;
            if (kind.equals(ConstantDensity.NAME)) {
                if (reference != null) {
                    throw Problem.MODEL_VALUES.raise(reference.number, reference.label, ConstantDensity.NAME,
                            "no reference temperature", "remove this row");
                }
                if (coefficients == null) {
                    throw Problem.MODEL_VALUES.raise(model.number, model.label, ConstantDensity.NAME,
                            "one value in a 'density coefficients' row", "that row is missing");
                }
                coefficients.atMost(2);
                d = new ConstantDensity(units.density().toKgPerM3(coefficients.number(1)));
            } else if (kind.equals(PolynomialDensity.NAME)) {
                if (reference == null || coefficients == null) {
                    throw Problem.MODEL_VALUES.raise(model.number, model.label, PolynomialDensity.NAME,
                            "a 'density reference temperature' row and a 'density coefficients' row",
                            "one of them is missing");
                }
                reference.atMost(2);
                double tRef = units.temperature().toKelvin(reference.number(1));
                double[] c = coefficients.numbersFrom(1);
                for (int j = 0; j < c.length; j++) {
                    c[j] = units.density().toKgPerM3(c[j]);
                }
                d = new PolynomialDensity(tRef, c);
            } else if (kind.equals(normalise(Tanaka2001WaterDensity.NAME))) {
                Row extra = reference != null ? reference : coefficients;
                if (extra != null) {
                    throw Problem.MODEL_VALUES.raise(extra.number, extra.label, Tanaka2001WaterDensity.NAME,
                            "no coefficients or reference temperature", "remove this row");
                }
                d = Tanaka2001WaterDensity.INSTANCE;
            } else {
                throw Problem.BAD_KEYWORD.raise(model.number, model.label, model.text(1),
                        ConstantDensity.NAME + ", " + PolynomialDensity.NAME + ", " + Tanaka2001WaterDensity.NAME);
            }
            double lo = validity.lowestKelvin();
            double hi = validity.highestKelvin();
            if (lo < d.lowestKelvin() || hi > d.highestKelvin()) {
                throw Problem.MODEL_RANGE.raise(model.number, model.label, d.modelName(),
                        Numbers.show(d.lowestKelvin()), Numbers.show(d.highestKelvin()), Numbers.show(lo),
                        Numbers.show(hi));
            }
            // A polynomial can dip below zero between widely spaced points, so sample the range finely.
            Row cause = coefficients != null ? coefficients : model;
            for (int s = 0; s <= DENSITY_SAMPLES; s++) {
                double t = s == DENSITY_SAMPLES ? hi : lo + (hi - lo) * s / DENSITY_SAMPLES;
                double rho = d.at(t);
                if (!(rho > 0) || Double.isInfinite(rho)) {
                    throw Problem.DENSITY_NOT_POSITIVE.raise(cause.number, cause.label, name, Numbers.show(rho),
                            Numbers.show(t));
                }
            }
            return d;
        }

        private Validity validity(List<String> names) {
            Row t = required(VALID_TEMPERATURE);
            t.atMost(2);
            double lo = units.temperature().toKelvin(t.number(0));
            double hi = units.temperature().toKelvin(t.number(1));
            if (!(lo < hi)) {
                throw Problem.BAD_RANGE.raise(t.number, t.label, Numbers.show(t.number(0)), Numbers.show(t.number(1)));
            }
            if (!(lo > 0)) {
                throw Problem.NOT_POSITIVE.raise(t.number, t.label, "the lower limit, in kelvin,",
                        Numbers.show(lo) + " K");
            }
            double[] xLo = new double[names.size()];
            double[] xHi = new double[names.size()];
            java.util.Arrays.fill(xHi, 1.0);
            Map<String, Row> fractionRows = keyedRows(VALID_MOLE_FRACTION);
            if (fractionRows.isEmpty() && !pureOnly) {
                throw Problem.NO_COMPOSITION_LIMIT.raise();
            }
            for (int i = 0; i < names.size(); i++) {
                Row r = fractionRows.get(normalise(names.get(i)));
                if (r == null) {
                    continue;
                }
                r.atMost(3);
                double a = r.number(1);
                double b = r.number(2);
                if (a < 0 || b > 1) {
                    throw Problem.MOLE_FRACTION_LIMIT.raise(r.number, r.label, Numbers.show(a), Numbers.show(b));
                }
                if (!(a < b)) {
                    throw Problem.BAD_RANGE.raise(r.number, r.label, Numbers.show(a), Numbers.show(b));
                }
                xLo[i] = a;
                xHi[i] = b;
            }
            List<Validity.PairLimit> pairLimits = new ArrayList<>();
            for (Row r : keyedRows(VALID_PAIR_TEMPERATURE).values()) {
                int[] p = pair(r, names);
                r.atMost(3);
                double a = units.temperature().toKelvin(r.number(1));
                double b = units.temperature().toKelvin(r.number(2));
                if (!(a < b)) {
                    throw Problem.BAD_RANGE.raise(r.number, r.label, Numbers.show(r.number(1)),
                            Numbers.show(r.number(2)));
                }
                if (!(a > 0)) {
                    throw Problem.NOT_POSITIVE.raise(r.number, r.label, "the lower limit, in kelvin,",
                            Numbers.show(a) + " K");
                }
                pairLimits.add(new Validity.PairLimit(p[0], p[1], a, b, Double.NaN, Double.NaN));
            }
            for (Row r : keyedRows(VALID_PAIR_FRACTION).values()) {
                int[] p = pair(r, names);
                r.atMost(3);
                double a = r.number(1);
                double b = r.number(2);
                if (a < 0 || b > 1) {
                    throw Problem.MOLE_FRACTION_LIMIT.raise(r.number, r.label, Numbers.show(a), Numbers.show(b));
                }
                if (!(a < b)) {
                    throw Problem.BAD_RANGE.raise(r.number, r.label, Numbers.show(a), Numbers.show(b));
                }
                pairLimits.add(new Validity.PairLimit(p[0], p[1], Double.NaN, Double.NaN, a, b));
            }
            return new Validity(lo, hi, xLo, xHi, pairLimits);
        }

        /**
         * One excess-property section: every pair's Redlich–Kister set (a missing pair is an error unless the card
         * says 'missing pairs | ideal') and the optional ternary terms.
         */
        private ExcessFunction section(String prefix, double factor, List<String> names, GeometricModel model,
                int asymmetric, boolean missingIdeal) {
            SectionRows rows = sections.getOrDefault(prefix, new SectionRows(prefix));
            int n = names.size();
            // The first row of a pair (or triple), in card order, fixes the order it is written in.
            List<Row> all = new ArrayList<>(rows.reference);
            all.addAll(rows.covariance);
            rows.binary.values().forEach(all::addAll);
            rows.ternary.values().forEach(all::addAll);
            all.sort((a, b) -> Integer.compare(a.number, b.number));
            Map<String, Row> orientation = new HashMap<>();
            for (Row r : all) {
                checkOrder(r, members(r, names, sizeOf(r)), names, orientation);
            }
            Map<String, Double> reference = new HashMap<>();
            Map<String, Row> referenceRow = new HashMap<>();
            for (Row r : rows.reference) {
                String key = setKey(members(r, names), n);
                r.atMost(2);
                reference.put(key, units.temperature().toKelvin(r.number(1)));
                Row before = referenceRow.put(key, r);
                if (before != null) {
                    throw Problem.DUPLICATE_ROW.raise(r.number, r.label, before.number);
                }
            }
            Map<String, TreeMap<Integer, double[]>> binary = coefficients(rows.binary, names, 2, factor, true);
            Map<String, TreeMap<Integer, double[]>> ternary = coefficients(rows.ternary, names, 3, factor, false);
            Map<String, List<Row>> covarianceRows = new LinkedHashMap<>();
            for (Row r : rows.covariance) {
                covarianceRows.computeIfAbsent(setKey(members(r, names, 2), n), k -> new ArrayList<>()).add(r);
            }
            RedlichKister[][] pairs = new RedlichKister[n][n];
            double[][][][] covariance = new double[n][n][][];
            for (int i = 0; i < n; i++) {
                for (int j = i + 1; j < n; j++) {
                    String key = setKey(new int[] {i, j}, n);
                    TreeMap<Integer, double[]> ks = binary.get(key);
                    String pairName = names.get(i) + " + " + names.get(j);
                    if (ks == null) {
                        if (referenceRow.containsKey(key)) {
                            throw Problem.MISSING_PAIR_ROW.raise(prefix + REFERENCE_SUFFIX, pairName, prefix + " A0");
                        }
                        if (!missingIdeal) {
                            throw Problem.MISSING_PAIR.raise(prefix, names.get(i), names.get(j), prefix);
                        }
                        continue;
                    }
                    double[][] a = withoutGaps(ks, prefix + " A", pairName);
                    pairs[i][j] = new RedlichKister(referenceFor(reference, key, a, prefix, pairName), a);
                    List<Row> cov = covarianceRows.remove(key);
                    if (cov != null) {
                        covariance[i][j] = covariance(cov, a, factor * factor, pairName, names);
                    }
                }
            }
            for (List<Row> orphan : covarianceRows.values()) {
                throw Problem.MISSING_PAIR_ROW.raise(prefix + " covariance", orphan.get(0).text(0).trim(),
                        prefix + " A0");
            }
            List<TernaryTerm> terms = new ArrayList<>();
            for (Map.Entry<String, TreeMap<Integer, double[]>> e : ternary.entrySet()) {
                Row first = orientation.get(e.getKey());
                int[] t = members(first, names);
                String tripleName = names.get(t[0]) + " + " + names.get(t[1]) + " + " + names.get(t[2]);
                double[][] c = withoutGaps(e.getValue(), prefix + " ternary C", tripleName);
                terms.add(new TernaryTerm(t[0], t[1], t[2], referenceFor(reference, e.getKey(), c, prefix,
                        tripleName), c));
            }
            for (Map.Entry<String, Row> e : referenceRow.entrySet()) {
                if (members(e.getValue(), names).length == 3 && !ternary.containsKey(e.getKey())) {
                    throw Problem.MISSING_PAIR_ROW.raise(prefix + REFERENCE_SUFFIX, e.getValue().text(0).trim(),
                            prefix + " ternary C0");
                }
            }
            return new ExcessFunction(n, model, asymmetric, pairs, terms, covariance);
        }

        /**
         * A pair's coefficient covariance, one row per coefficient in the order a_00, a_01, …, a_10, … (each A_k's
         * temperature terms in turn), converted to the card's component order and to internal units.
         */
        private double[][] covariance(List<Row> rows, double[][] a, double factor, String pairName,
                List<String> names) {
            int size = 0;
            for (double[] row : a) {
                size += row.length;
            }
            int[] k = new int[size]; // the A_k each parameter belongs to
            for (int kk = 0, q = 0; kk < a.length; kk++) {
                for (int j = 0; j < a[kk].length; j++) {
                    k[q++] = kk;
                }
            }
            Row first = rows.get(0);
            if (rows.size() != size) {
                throw Problem.COVARIANCE_SIZE.raise(first.number, first.label, pairName, size, size, size,
                        rows.size() + " row(s)");
            }
            int[] p = members(first, names, 2);
            boolean reversed = p[0] > p[1];
            double[][] c = new double[size][];
            for (int r = 0; r < size; r++) {
                Row row = rows.get(r);
                c[r] = row.numbersFrom(1);
                if (c[r].length != size) {
                    throw Problem.COVARIANCE_SIZE.raise(row.number, row.label, pairName, size, size, size,
                            c[r].length + " value(s) in this row");
                }
                for (int q = 0; q < size; q++) {
                    double sign = reversed && (k[r] + k[q]) % 2 == 1 ? -1.0 : 1.0;
                    c[r][q] *= sign * factor;
                }
            }
            for (int r = 0; r < size; r++) {
                if (c[r][r] < 0) {
                    Row row = rows.get(r);
                    throw Problem.COVARIANCE_NEGATIVE.raise(row.number, row.label, r + 1, Numbers.show(c[r][r]));
                }
                for (int q = 0; q < r; q++) {
                    double tolerance = 1e-9 * Math.sqrt(c[r][r] * c[q][q]);
                    if (!(Math.abs(c[r][q] - c[q][r]) <= tolerance)) {
                        Row row = rows.get(r);
                        throw Problem.COVARIANCE_NOT_SYMMETRIC.raise(row.number, row.label, r + 1, q + 1,
                                Numbers.show(c[r][q] / factor), q + 1, r + 1, Numbers.show(c[q][r] / factor));
                    }
                }
            }
            return c;
        }

        /**
         * Coefficient rows of one kind, per pair or triple (keyed by its member set) and index, converted to internal
         * units and, for pairs, to the card's component order (A_k → (−1)^k A_k when written the other way round).
         * Triples keep the order of their first row, so they need no conversion.
         */
        private Map<String, TreeMap<Integer, double[]>> coefficients(TreeMap<Integer, List<Row>> byIndex,
                List<String> names, int size, double factor, boolean toCardOrder) {
            Map<String, TreeMap<Integer, double[]>> out = new LinkedHashMap<>();
            Map<String, Row> seen = new HashMap<>();
            for (Map.Entry<Integer, List<Row>> e : byIndex.entrySet()) {
                int k = e.getKey();
                for (Row r : e.getValue()) {
                    int[] p = members(r, names, size);
                    String key = setKey(p, names.size());
                    double[] c = r.numbersFrom(1);
                    double sign = toCardOrder && p[0] > p[1] && k % 2 == 1 ? -1.0 : 1.0;
                    for (int j = 0; j < c.length; j++) {
                        c[j] *= sign * factor;
                    }
                    out.computeIfAbsent(key, x -> new TreeMap<>()).put(k, c);
                    Row before = seen.put(key + "/" + k, r);
                    if (before != null) {
                        throw Problem.DUPLICATE_ROW.raise(r.number, r.label, before.number);
                    }
                }
            }
            return out;
        }

        private double[][] withoutGaps(TreeMap<Integer, double[]> ks, String label, String subject) {
            double[][] a = new double[ks.lastKey() + 1][];
            for (int k = 0; k < a.length; k++) {
                a[k] = ks.get(k);
                if (a[k] == null) {
                    throw Problem.COEFFICIENT_GAP.raise(label + ks.ceilingKey(k), subject, label + k);
                }
            }
            return a;
        }

        /** The reference temperature of a set, required when any coefficient depends on temperature. */
        private double referenceFor(Map<String, Double> reference, String key, double[][] a, String prefix,
                String subject) {
            Double tRef = reference.get(key);
            if (tRef != null) {
                return tRef;
            }
            for (double[] row : a) {
                if (row.length > 1) {
                    throw Problem.MISSING_PAIR_ROW.raise(prefix + " coefficient", subject, prefix + REFERENCE_SUFFIX);
                }
            }
            return 298.15; // irrelevant: every coefficient is a constant
        }

        /** How many components a section row's subject names: 3 for ternary rows, 2 for A_k rows, either for others. */
        private static int sizeOf(Row r) {
            Matcher m = SECTION_ROW.matcher(r.key);
            if (!m.matches()) {
                return 0;
            }
            return m.group(2) != null ? 2 : m.group(3) != null ? 3 : 0;
        }

        /** A key for the set {p...} among n components, independent of the order written. */
        private static String setKey(int[] p, int n) {
            int[] q = p.clone();
            java.util.Arrays.sort(q);
            return java.util.Arrays.toString(q);
        }

        /** The first row of a pair or triple (in card order) fixes its order; later rows must agree. */
        private void checkOrder(Row r, int[] p, List<String> names, Map<String, Row> orientation) {
            Row first = orientation.putIfAbsent(setKey(p, names.size()), r);
            if (first != null && !java.util.Arrays.equals(members(first, names), p)) {
                throw Problem.PAIR_ORDER.raise(r.number, r.label, r.text(0).trim(), first.text(0).trim(),
                        first.number);
            }
        }

        /** Component indices named by a pair subject "a + b". */
        private int[] pair(Row r, List<String> known) {
            int[] p = members(r, known);
            if (p.length != 2) {
                throw Problem.BAD_PAIR.raise(r.number, r.label, r.text(0).trim());
            }
            return p;
        }

        /** Component indices named by a subject "a + b" or "a + b + c", all different. */
        private int[] members(Row r, List<String> known) {
            return members(r, known, 0);
        }

        /**
         * Component indices named by a subject of {@code size} members (2 or 3; 0 accepts either), all different.
         * Ternary rows take three; everything else two.
         */
        private int[] members(Row r, List<String> known, int size) {
            String subject = r.text(0);
            String[] parts = subject.split("\\+", -1);
            boolean triple = size == 3 || (size == 0 && parts.length == 3);
            Problem bad = triple ? Problem.BAD_TRIPLE : Problem.BAD_PAIR;
            boolean blank = parts.length != (triple ? 3 : 2);
            for (String part : parts) {
                blank |= isBlank(part);
            }
            if (blank) {
                throw bad.raise(r.number, r.label, subject.trim());
            }
            int[] p = new int[parts.length];
            for (int s = 0; s < parts.length; s++) {
                p[s] = -1;
                for (int i = 0; i < known.size(); i++) {
                    if (normalise(known.get(i)).equals(normalise(parts[s]))) {
                        p[s] = i;
                    }
                }
                if (p[s] < 0) {
                    throw Problem.UNKNOWN_COMPONENT.raise(r.number, r.label, parts[s].trim());
                }
                for (int q = 0; q < s; q++) {
                    if (p[q] == p[s]) {
                        throw bad.raise(r.number, r.label, subject.trim());
                    }
                }
            }
            return p;
        }

        private boolean extrapolation() {
            return choice(EXTRAPOLATION, "allow", "refuse");
        }

        private <E extends Enum<E> & Units.Spelled> E unit(String label, Class<E> type) {
            Row r = required(label);
            r.atMost(1);
            E e = Units.lookup(type, r.text(0));
            if (e == null) {
                throw Problem.UNKNOWN_UNIT.raise(r.number, r.label, r.text(0).trim(), Units.accepted(type));
            }
            return e;
        }

        private Row required(String label) {
            Row r = global.get(label);
            if (r == null) {
                throw Problem.MISSING_ROW.raise(label);
            }
            return r;
        }

        private Map<String, Row> keyedRows(String key) {
            Map<String, Row> m = keyed.get(key);
            return m == null ? new LinkedHashMap<>() : m;
        }
    }

    // --- rows and cells

    private static List<Row> rows(Object[][] cells) {
        List<Row> rows = new ArrayList<>();
        if (cells == null) {
            return rows;
        }
        for (int i = 0; i < cells.length; i++) {
            Object[] line = cells[i] == null ? new Object[0] : cells[i];
            int last = line.length - 1;
            while (last >= 0 && isBlank(line[last])) {
                last--;
            }
            if (last < 0) {
                continue;
            }
            Object[] values = new Object[last];
            for (int c = 1; c <= last; c++) {
                values[c - 1] = normaliseCell(line[c]);
            }
            Object labelCell = normaliseCell(line[0]);
            String label = labelCell == null ? "" : labelCell instanceof Double ? Numbers.show((Double) labelCell)
                    : ((String) labelCell).trim();
            rows.add(new Row(i + 1, label, values));
        }
        return rows;
    }

    static boolean isBlank(Object o) {
        return o == null || (o instanceof String && ((String) o).trim().isEmpty());
    }

    /** null for blank, Double for numbers and booleans, String otherwise. */
    private static Object normaliseCell(Object o) {
        if (isBlank(o)) {
            return null;
        }
        if (o instanceof Number) {
            return ((Number) o).doubleValue();
        }
        if (o instanceof Boolean) {
            return ((Boolean) o) ? 1.0 : 0.0;
        }
        return o.toString();
    }

    /** Runs of white space, compiled once: a parse normalises every label and, per keyed row, every name. */
    private static final Pattern WHITE_SPACE = Pattern.compile("\\s+");

    /** Lower case, single spaces, no trailing colon: the form labels and names are compared in. */
    static String normalise(String s) {
        String t = WHITE_SPACE.matcher(s.trim()).replaceAll(" ").toLowerCase(Locale.ROOT);
        return t.endsWith(":") ? t.substring(0, t.length() - 1).trim() : t;
    }

    /** The rows of one excess-property section, sorted by kind as they are read. */
    private static final class SectionRows {
        final String prefix;
        final TreeMap<Integer, List<Row>> binary = new TreeMap<>();
        final TreeMap<Integer, List<Row>> ternary = new TreeMap<>();
        final List<Row> reference = new ArrayList<>();
        final List<Row> covariance = new ArrayList<>();

        SectionRows(String prefix) {
            this.prefix = prefix;
        }
    }

    /** One non-blank row of the card: its 1-based row number, label and the cells after the label. */
    private static final class Row {
        final int number;
        final String label;
        final String key;
        final Object[] values;

        Row(int number, String label, Object[] values) {
            this.number = number;
            this.label = label;
            this.key = normalise(label);
            this.values = values;
        }

        /** Column number (1-based, within the card range) of value i. */
        private int column(int i) {
            return i + 2;
        }

        String text(int i) {
            Object v = i < values.length ? values[i] : null;
            if (v == null) {
                throw Problem.MISSING_VALUE.raise(number, label, column(i));
            }
            if (v instanceof Double) {
                throw Problem.NOT_TEXT.raise(number, label, column(i), Numbers.show((Double) v));
            }
            return (String) v;
        }

        double number(int i) {
            Object v = i < values.length ? values[i] : null;
            if (v == null) {
                throw Problem.MISSING_VALUE.raise(number, label, column(i));
            }
            if (!(v instanceof Double)) {
                throw Problem.NOT_A_NUMBER.raise(number, label, column(i), ((String) v).trim());
            }
            double d = (Double) v;
            if (Double.isNaN(d) || Double.isInfinite(d)) {
                throw Problem.NOT_FINITE.raise(number, label, column(i));
            }
            return d;
        }

        /** All values from index i to the last non-blank one; at least one. */
        double[] numbersFrom(int i) {
            int n = Math.max(values.length - i, 1);
            double[] out = new double[n];
            for (int j = 0; j < n; j++) {
                out[j] = number(i + j);
            }
            return out;
        }

        /** Fails when a value follows the first {@code n}. */
        void atMost(int n) {
            if (values.length > n) {
                while (values[n] == null) {
                    n++; // the last value is never blank, so this stops
                }
                Object v = values[n];
                throw Problem.EXTRA_VALUE.raise(number, label, column(n), v instanceof Double
                        ? Numbers.show((Double) v) : String.valueOf(v));
            }
        }
    }
}
