package org.miscela.core;

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
    /** The card format version this reader understands. */
    public static final int FORMAT_VERSION = 1;

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
    static final String EXCESS_REFERENCE = "excess volume reference temperature";
    static final String EXCESS_PREFIX = "excess volume a";
    /** Intervals the validity range is split into when checking a density model stays positive. */
    private static final int DENSITY_SAMPLES = 256;
    private static final Pattern EXCESS_COEFFICIENT = Pattern.compile("excess volume a(\\d{1,2})");

    /** Rows whose values start in column 2. */
    private static final String[] GLOBAL = {TITLE, SOURCE, TEMPERATURE_UNIT, DENSITY_UNIT, MOLAR_VOLUME_UNIT,
        MOLAR_MASS_UNIT, VALID_TEMPERATURE, EXTRAPOLATION};
    /** Rows whose column 2 names a component (or a pair) and whose values follow. */
    private static final String[] KEYED = {COMPONENT, DENSITY_MODEL, DENSITY_REFERENCE, DENSITY_COEFFICIENTS,
        VALID_MOLE_FRACTION, EXCESS_REFERENCE};

    private CardReader() {
    }

    /** Parses a card; throws {@link MiscelaException} naming the first problem found. */
    public static Card read(Object[][] cells) {
        List<Row> rows = rows(cells);
        if (rows.isEmpty()) {
            throw Problem.CARD_EMPTY.raise();
        }
        Row header = rows.get(0);
        if (!header.key.equals(HEADER)) {
            throw Problem.CARD_HEADER.raise(header.number, header.label);
        }
        double version = header.number(0);
        if (version != FORMAT_VERSION) {
            throw Problem.CARD_VERSION.raise(header.number, Numbers.show(version), FORMAT_VERSION);
        }
        header.atMost(1);
        return new Parse(rows.subList(1, rows.size())).card();
    }

    /** The working state of one parse. */
    private static final class Parse {
        final Map<String, Row> global = new HashMap<>();
        /** keyed rows: key → (normalised subject → row), in card order */
        final Map<String, LinkedHashMap<String, Row>> keyed = new HashMap<>();
        /** excess coefficient rows: k → rows */
        final TreeMap<Integer, List<Row>> excessRows = new TreeMap<>();
        final List<Row> excessReferenceRows = new ArrayList<>();
        final List<Component> components = new ArrayList<>();
        Units units;

        Parse(List<Row> rows) {
            for (Row r : rows) {
                sort(r);
            }
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
            Matcher m = EXCESS_COEFFICIENT.matcher(r.key);
            if (m.matches()) {
                excessRows.computeIfAbsent(Integer.parseInt(m.group(1)), k -> new ArrayList<>()).add(r);
                putKeyed(r);
                return;
            }
            for (String k : KEYED) {
                if (r.key.equals(k)) {
                    if (k.equals(EXCESS_REFERENCE)) {
                        excessReferenceRows.add(r);
                    }
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
            units = new Units(unit(TEMPERATURE_UNIT, Units.Temperature.class), unit(DENSITY_UNIT, Units.Density.class),
                    unit(MOLAR_VOLUME_UNIT, Units.MolarVolume.class), unit(MOLAR_MASS_UNIT, Units.MolarMass.class));
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
                components.add(new Component(names.get(i), masses.get(i), density(names.get(i), validity)));
            }
            RedlichKister[][] excess = excess(names);
            boolean allow = extrapolation();
            return new Card(title, source, units, components, excess, validity, allow);
        }

        /** Every keyed row must name a declared component (or, for excess rows, a pair of them). */
        private void checkSubjects(Map<String, Row> componentRows) {
            for (Map.Entry<String, LinkedHashMap<String, Row>> e : keyed.entrySet()) {
                if (e.getKey().equals(COMPONENT) || e.getKey().startsWith(EXCESS_PREFIX)
                        || e.getKey().equals(EXCESS_REFERENCE)) {
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
            if (fractionRows.isEmpty()) {
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
            return new Validity(lo, hi, xLo, xHi);
        }

        private RedlichKister[][] excess(List<String> names) {
            int n = names.size();
            // per unordered pair (i<j): k → coefficients as written for i then j
            Map<Long, TreeMap<Integer, double[]>> coefficients = new HashMap<>();
            Map<Long, Row> orientation = new HashMap<>();
            Map<Long, Double> reference = new HashMap<>();
            Map<Long, Row> referenceRow = new HashMap<>();
            Map<String, Row> seen = new HashMap<>();
            double factor = units.molarVolume().toCm3PerMol(1.0);
            // The first row of a pair, in card order, fixes the order the pair is written in.
            List<Row> pairRows = new ArrayList<>(excessReferenceRows);
            for (List<Row> rs : excessRows.values()) {
                pairRows.addAll(rs);
            }
            pairRows.sort((a, b) -> Integer.compare(a.number, b.number));
            for (Row r : pairRows) {
                checkOrder(r, pair(r, names), names, orientation);
            }
            for (Map.Entry<Integer, List<Row>> e : excessRows.entrySet()) {
                int k = e.getKey();
                for (Row r : e.getValue()) {
                    int[] p = pair(r, names);
                    long key = pairKey(p, n);
                    double[] c = r.numbersFrom(1);
                    double sign = p[0] > p[1] && k % 2 == 1 ? -1.0 : 1.0;
                    for (int j = 0; j < c.length; j++) {
                        c[j] *= sign * factor;
                    }
                    coefficients.computeIfAbsent(key, x -> new TreeMap<>()).put(k, c);
                    Row before = seen.put(key + "/" + k, r);
                    if (before != null) {
                        throw Problem.DUPLICATE_ROW.raise(r.number, r.label, before.number);
                    }
                }
            }
            for (Row r : excessReferenceRows) {
                long key = pairKey(pair(r, names), n);
                r.atMost(2);
                reference.put(key, units.temperature().toKelvin(r.number(1)));
                Row before = referenceRow.put(key, r);
                if (before != null) {
                    throw Problem.DUPLICATE_ROW.raise(r.number, r.label, before.number);
                }
            }
            RedlichKister[][] result = new RedlichKister[n][n];
            for (int i = 0; i < n; i++) {
                for (int j = i + 1; j < n; j++) {
                    long key = (long) i * n + j;
                    TreeMap<Integer, double[]> ks = coefficients.get(key);
                    String pairName = names.get(i) + " + " + names.get(j);
                    if (ks == null) {
                        if (referenceRow.containsKey(key)) {
                            throw Problem.MISSING_PAIR_ROW.raise("excess volume reference temperature", pairName,
                                    "excess volume A0");
                        }
                        throw Problem.MISSING_PAIR.raise(names.get(i), names.get(j));
                    }
                    double[][] a = new double[ks.lastKey() + 1][];
                    boolean temperatureDependent = false;
                    for (int k = 0; k < a.length; k++) {
                        a[k] = ks.get(k);
                        if (a[k] == null) {
                            throw Problem.COEFFICIENT_GAP.raise(ks.ceilingKey(k), pairName, k);
                        }
                        temperatureDependent |= a[k].length > 1;
                    }
                    Double tRef = reference.get(key);
                    if (tRef == null) {
                        if (temperatureDependent) {
                            throw Problem.MISSING_PAIR_ROW.raise("excess volume A", pairName,
                                    "excess volume reference temperature");
                        }
                        tRef = 298.15; // irrelevant: every A_k is a constant
                    }
                    result[i][j] = new RedlichKister(tRef, a);
                }
            }
            return result;
        }

        /** Index of the unordered pair {p[0], p[1]} among n components. */
        private static long pairKey(int[] p, int n) {
            return (long) Math.min(p[0], p[1]) * n + Math.max(p[0], p[1]);
        }

        /** The first row of a pair (in card order) fixes which way round it is written; later rows must agree. */
        private void checkOrder(Row r, int[] p, List<String> names, Map<Long, Row> orientation) {
            Row first = orientation.putIfAbsent(pairKey(p, names.size()), r);
            if (first != null && pair(first, names)[0] != p[0]) {
                throw Problem.PAIR_ORDER.raise(r.number, r.label, r.text(0).trim(), first.text(0).trim(),
                        first.number);
            }
        }

        /** Component indices named by a pair subject "a + b". */
        private int[] pair(Row r, List<String> known) {
            String subject = r.text(0);
            String[] parts = subject.split("\\+", -1);
            if (parts.length != 2 || isBlank(parts[0]) || isBlank(parts[1])) {
                throw Problem.BAD_PAIR.raise(r.number, r.label, subject.trim());
            }
            int[] p = new int[2];
            for (int s = 0; s < 2; s++) {
                p[s] = -1;
                for (int i = 0; i < known.size(); i++) {
                    if (normalise(known.get(i)).equals(normalise(parts[s]))) {
                        p[s] = i;
                    }
                }
                if (p[s] < 0) {
                    throw Problem.UNKNOWN_COMPONENT.raise(r.number, r.label, parts[s].trim());
                }
            }
            if (p[0] == p[1]) {
                throw Problem.BAD_PAIR.raise(r.number, r.label, subject.trim());
            }
            return p;
        }

        private boolean extrapolation() {
            Row r = global.get(EXTRAPOLATION);
            if (r == null) {
                return false;
            }
            r.atMost(1);
            String v = normalise(r.text(0));
            if (v.equals("allow")) {
                return true;
            }
            if (v.equals("refuse")) {
                return false;
            }
            throw Problem.BAD_KEYWORD.raise(r.number, r.label, r.text(0).trim(), "refuse, allow");
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

    /** Lower case, single spaces, no trailing colon: the form labels and names are compared in. */
    static String normalise(String s) {
        String t = s.trim().replaceAll("\\s+", " ").toLowerCase(Locale.ROOT);
        return t.endsWith(":") ? t.substring(0, t.length() - 1).trim() : t;
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
