package org.miscela.core.card;

import org.miscela.core.model.Component;
import org.miscela.core.problem.Numbers;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Random;

/**
 * Card ranges for fuzzing, each built from one seed so any case can be replayed: valid cards using every feature of
 * the format (a {@link Blueprint} says what the card holds, so argument generators can aim at it), the same cards
 * mutated cell by cell or row by row, random label soup, and degenerate shapes. Every value is invented.
 */
public final class FuzzCards {
    private FuzzCards() {
    }

    /** How a fuzz card was made. */
    public enum Kind {
        /** A valid card of ordinary numbers. */
        VALID,
        /** A card valid in form whose numbers are extreme: tiny/huge/steep/near-equal. May be refused by design. */
        EXTREME,
        /** A valid card with one to ten random mutations of cells or rows. */
        MUTATED,
        /** Rows of random known and unknown labels with random values. */
        SOUP,
        /** Degenerate ranges: null, empty, one cell, one long row or column, ragged rows. */
        SHAPE
    }

    /** A generated card and what it was meant to hold. */
    public static final class Blueprint {
        public final Kind kind;
        public final long seed;
        /** The cells; for every kind but {@link Kind#SHAPE} rectangular with "" for blanks. */
        public final Object[][] cells;
        /** Component names as written on the card, in card order (for soup and shapes: names it may mention). */
        public final List<String> names;
        public final String temperatureUnit;
        /** The validity range in the card's temperature unit. */
        public final double lowest;
        public final double highest;
        public final boolean volume;
        public final boolean enthalpy;
        public final boolean heatCapacities;
        public final boolean covariance;
        /** Per component: the valid mole fraction limits written on the card (0 and 1 where none). */
        public final double[] lowestFraction;
        public final double[] highestFraction;
        /** What was done to the card, for failure messages. */
        public final String history;

        Blueprint(Kind kind, long seed, Object[][] cells, List<String> names, String temperatureUnit, double lowest,
                double highest, boolean volume, boolean enthalpy, boolean heatCapacities, boolean covariance,
                double[] lowestFraction, double[] highestFraction, String history) {
            this.kind = kind;
            this.seed = seed;
            this.cells = cells;
            this.names = Collections.unmodifiableList(new ArrayList<>(names));
            this.temperatureUnit = temperatureUnit;
            this.lowest = lowest;
            this.highest = highest;
            this.volume = volume;
            this.enthalpy = enthalpy;
            this.heatCapacities = heatCapacities;
            this.covariance = covariance;
            this.lowestFraction = lowestFraction;
            this.highestFraction = highestFraction;
            this.history = history;
        }

        public int componentCount() {
            return names.size();
        }

        /** Whether the temperature unit is a Celsius spelling (absolute zero at −273.15). */
        public boolean celsius() {
            return !"K".equals(temperatureUnit);
        }

        Blueprint with(Kind newKind, Object[][] newCells, String newHistory) {
            return new Blueprint(newKind, seed, newCells, names, temperatureUnit, lowest, highest, volume, enthalpy,
                    heatCapacities, covariance, lowestFraction, highestFraction, newHistory);
        }

        @Override
        public String toString() {
            return kind + " card, seed " + seed + " (" + history + "):\n" + show(cells);
        }
    }

    /** The card of this kind made from this seed. */
    public static Blueprint of(Kind kind, long seed) {
        Random r = new Random(seed);
        switch (kind) {
            case VALID:
                return new Builder(r, seed, false).build();
            case EXTREME:
                return new Builder(r, seed, true).build();
            case MUTATED:
                return mutate(new Builder(r, seed, r.nextInt(4) == 0).build(), r);
            case SOUP:
                return soup(r, seed);
            case SHAPE:
                return shape(r, seed);
            default:
                throw new AssertionError(kind);
        }
    }

    /** A range Calc could pass: rectangular, no null rows, no null cells (blank cells are ""). */
    public static Object[][] rectangular(Object[][] cells) {
        if (cells == null) {
            return new Object[0][];
        }
        int width = 0;
        for (Object[] row : cells) {
            width = Math.max(width, row == null ? 0 : row.length);
        }
        Object[][] out = new Object[cells.length][width];
        for (int i = 0; i < cells.length; i++) {
            for (int c = 0; c < width; c++) {
                Object v = cells[i] != null && c < cells[i].length ? cells[i][c] : "";
                out[i][c] = v == null ? "" : v;
            }
        }
        return out;
    }

    /** A readable rendering of cells, one row a line, long texts shortened. */
    public static String show(Object[][] cells) {
        if (cells == null) {
            return "null";
        }
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < cells.length && b.length() < 20000; i++) {
            b.append(String.format(Locale.ROOT, "%3d ", i + 1));
            if (cells[i] == null) {
                b.append("null\n");
                continue;
            }
            for (Object v : cells[i]) {
                b.append("| ").append(cell(v)).append(' ');
            }
            b.append('\n');
        }
        return b.toString();
    }

    static String cell(Object v) {
        if (v == null) {
            return "null";
        }
        if (v instanceof String) {
            String s = (String) v;
            return "\"" + (s.length() > 60 ? s.substring(0, 60) + "…(" + s.length() + " chars)" : s) + "\"";
        }
        if (v instanceof Double) {
            return Double.toString((Double) v);
        }
        return v.getClass().getSimpleName() + ":" + v;
    }

    // ------------------------------------------------------------------ values

    /** Component names: distinct however spelled, none with '+' or a trailing colon. */
    private static final String[] NAMES = {"alpha", "beta", "gamma", "water", "ethanol", "Glycerol", "solvent P",
        "solvent Q", "liquid T", "liquid U", "acid S", "Ölsäure", "水", "méthanol", "x", "B", "component 7",
        "2-propanol", "n-hexane", "CCl4", "a b  c", "additive", "delta", "epsilon", "zeta", "eta", "theta", "iota",
        "kappa", "lambda", "mu", "nu", "xi", "omicron", "pi", "rho", "sigma", "tau", "upsilon", "phi", "chi", "psi",
        "omega", "name with a very long tail " + repeat("z", 200)};

    /** Numbers chosen to hit edges: signed zeros, ulps around 0 and 1, subnormals, the largest doubles, NaN, ±∞. */
    static final double[] EDGE_NUMBERS = {0.0, -0.0, 1.0, -1.0, 0.5, 2.0, 1e-15, -1e-15, 1 - 1e-15, 1 + 1e-15,
        Math.nextUp(1.0), Math.nextDown(1.0), Math.nextUp(0.0), -Double.MIN_VALUE, Double.MIN_NORMAL, 1e-308,
        1e-300, 1e300, -1e300, Double.MAX_VALUE, -Double.MAX_VALUE, Double.NaN, Double.POSITIVE_INFINITY,
        Double.NEGATIVE_INFINITY, 273.15, -273.15, -273.16, 0.1, 0.7, 1e6, -1e6, 3.0, 99.0, 100.0, 4.5e15};

    private static final String[] UNITS = {"K", "°C", "degC", "C", "°F", "k", "kg/m³", "kg/m3", "g/L", "g/l",
        "g/cm³", "g/cm3", "g/mL", "g/ml", "cm³/mol", "cm3/mol", "mL/mol", "ml/mol", "L/mol", "l/mol", "dm³/mol",
        "dm3/mol", "m³/mol", "m3/mol", "g/mol", "kg/mol", "J/mol", "kJ/mol", "kj/mol", "lb/ft³", ""};

    private static final String[] WORDS = {"constant", "polynomial", "Tanaka 2001", "TANAKA  2001", "allow",
        "refuse", "ideal", "Muggianu", "Kohler", "Toop", "kohler:", "polynom", "yes", "TRUE", "0.789", "1e5", "NaN",
        "Infinity", "-Infinity", "#N/A", "Err:502", "#VALUE!", "", " ", "\t", "\n", "text", "invented values",
        "\u0000", "%d %s %n", "'0.5", "1,5", "+", "a + a", "+ b", "alpha +", "alpha + beta + gamma + delta",
        "alpha + beta", "beta + alpha", "alpha+gamma", "alpha + beta + gamma", " alpha  +  beta ",
        repeat("long text ", 1000)};

    /** Every label the format knows, and near misses. */
    static final List<String> LABELS;

    static {
        List<String> l = new ArrayList<>(Arrays.asList("Miscela card", "miscela card:", "title", "source", "note",
                "# comment", "#excess volume A3", "temperature unit", "density unit", "molar volume unit",
                "molar mass unit", "valid temperature", "extrapolation", "component", "density model",
                "density reference temperature", "density coefficients", "valid mole fraction",
                "excess volume reference temperature", "excess enthalpy reference temperature",
                "excess volume covariance", "excess enthalpy covariance", "multicomponent model", "missing pairs",
                "enthalpy unit", "heat capacity", "heat capacity reference temperature", "valid pair temperature",
                "valid pair mole fraction", "excess volume ternary C0", "excess volume ternary C1",
                "excess volume ternary C2", "excess volume ternary C3", "excess enthalpy ternary C0",
                "excess enthalpy ternary C2", "excess volume A", "excess volume A-1", "excess volume A007",
                "excess volume A100", "excess  volume   A1", "EXCESS VOLUME A1:", "excess heat capacity A0",
                "Density Model:", "components", "component order", "", " ", "  #", "%s", "\u0000"));
        for (int k = 0; k <= 99; k += k < 12 ? 1 : 29) {
            l.add("excess volume A" + k);
            l.add("excess enthalpy A" + k);
        }
        l.add("excess volume A99");
        l.add("excess volume A0" + "5");
        LABELS = Collections.unmodifiableList(l);
    }

    static String repeat(String s, int times) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < times; i++) {
            b.append(s);
        }
        return b.toString();
    }

    /** Any cell value: an edge number, an ordinary number, a word, a unit, a label, a name, a boolean or null. */
    static Object soupCell(Random r, List<String> names, boolean withNullAndBoolean) {
        int pick = r.nextInt(100);
        if (pick < 25) {
            return EDGE_NUMBERS[r.nextInt(EDGE_NUMBERS.length)];
        }
        if (pick < 45) {
            return r.nextGaussian() * Math.pow(10, r.nextInt(41) - 20);
        }
        if (pick < 55) {
            return (double) (r.nextInt(241) - 120);
        }
        if (pick < 68) {
            return WORDS[r.nextInt(WORDS.length)];
        }
        if (pick < 75) {
            return UNITS[r.nextInt(UNITS.length)];
        }
        if (pick < 80) {
            return LABELS.get(r.nextInt(LABELS.size()));
        }
        if (pick < 90 && !names.isEmpty()) {
            String a = names.get(r.nextInt(names.size()));
            if (r.nextBoolean()) {
                return spellName(a, r);
            }
            String b = names.get(r.nextInt(names.size()));
            return r.nextBoolean() ? a + " + " + b : a + " + " + b + " + " + names.get(r.nextInt(names.size()));
        }
        if (pick < 95) {
            return "";
        }
        if (withNullAndBoolean) {
            return r.nextBoolean() ? (Object) r.nextBoolean() : null;
        }
        return r.nextBoolean() ? 1.0 : 0.0; // Calc passes a logical cell as a number
    }

    /** The same label as the reader compares it: case, runs of spaces and a trailing colon varied. */
    static String spellLabel(String label, Random r) {
        if (label.trim().isEmpty()) {
            return label;
        }
        switch (r.nextInt(10)) {
            case 0:
                return label.toUpperCase(Locale.ROOT);
            case 1:
                return label.replace(" ", "   ");
            case 2:
                return label + ":";
            case 3:
                return "  " + label.substring(0, 1).toUpperCase(Locale.ROOT) + label.substring(1) + " :  ";
            default:
                return label;
        }
    }

    /** A name as a keyed row may write it: case and spaces around it varied (the reader normalises both). */
    static String spellName(String name, Random r) {
        switch (r.nextInt(8)) {
            case 0:
                return name.toUpperCase(Locale.ROOT);
            case 1:
                return " " + name + "  ";
            default:
                return name;
        }
    }

    // ------------------------------------------------------------------ valid cards

    /** Builds one valid card; with {@code extreme} its numbers go to the edges of what the format accepts. */
    private static final class Builder {
        final Random r;
        final long seed;
        final boolean extreme;
        final List<Object[]> rows = new ArrayList<>();
        final List<String> names = new ArrayList<>();
        final StringBuilder history = new StringBuilder();
        String temperatureUnit;
        double lowestK;
        double highestK;
        boolean tanakaAllowed;
        double densityFactor;
        double volumeFactor;
        double massFactor;
        double enthalpyFactor;
        /** Whether every pair with coefficients got covariance rows (the uncertainty needs all of them). */
        boolean coverAll = true;

        Builder(Random r, long seed, boolean extreme) {
            this.r = r;
            this.seed = seed;
            this.extreme = extreme;
        }

        /** A temperature in K written in the card's unit. */
        double t(double kelvin) {
            return "K".equals(temperatureUnit) ? kelvin : kelvin - 273.15;
        }

        void row(Object... cells) {
            rows.add(cells);
        }

        String label(String l) {
            return spellLabel(l, r);
        }

        String pairName(int i, int j) {
            String sep = r.nextInt(4) == 0 ? "+" : r.nextInt(3) == 0 ? "  +   " : " + ";
            return spellName(names.get(i), r) + sep + spellName(names.get(j), r);
        }

        Blueprint build() {
            int n = pickComponentCount();
            List<String> pool = new ArrayList<>(Arrays.asList(NAMES));
            Collections.shuffle(pool, r);
            names.addAll(pool.subList(0, n));
            boolean model = r.nextInt(4) == 0;
            boolean missingIdeal = r.nextInt(5) == 0;
            boolean ternary = n >= 3 && r.nextInt(3) == 0;
            boolean enthalpy = r.nextInt(3) == 0;
            boolean enthalpyOnly = enthalpy && r.nextInt(4) == 0;
            boolean volume = !enthalpyOnly;
            boolean heat = enthalpy && r.nextBoolean();
            boolean covariance = volume && r.nextInt(4) == 0;
            boolean pairLimits = r.nextInt(5) == 0;
            boolean phase = r.nextInt(3) == 0;
            boolean v2 = model || missingIdeal || ternary || enthalpy || covariance || pairLimits || phase
                    || r.nextBoolean();
            history.append(String.format(Locale.ROOT, "n=%d%s%s%s%s%s%s%s%s", n, v2 ? " v2" : " v1",
                    missingIdeal ? " missing-ideal" : "", ternary ? " ternary" : "", enthalpy ? " enthalpy" : "",
                    enthalpyOnly ? "-only" : "", heat ? " heat-capacities" : "", covariance ? " covariance" : "",
                    pairLimits ? " pair-limits" : "") + (phase ? " phase-equilibrium" : ""));

            temperatureUnit = new String[] {"K", "°C", "degC", "C"}[r.nextInt(4)];
            pickTemperatureRange();
            String densityUnit = pickDensityUnit();
            String volumeUnit = pickVolumeUnit();
            String massUnit = r.nextInt(4) == 0 ? "kg/mol" : "g/mol";
            massFactor = massUnit.equals("g/mol") ? 1.0 : 1000.0;
            String enthalpyUnit = r.nextBoolean() ? "J/mol" : "kJ/mol";
            enthalpyFactor = enthalpyUnit.equals("J/mol") ? 1.0 : 1000.0;

            row(label("Miscela card"), v2 ? 2.0 : 1.0);
            List<Object[]> header = new ArrayList<>(rows);
            rows.clear();
            if (r.nextBoolean()) {
                row(label("title"), "fuzz card " + seed + " (invented)");
            }
            row(label("source"), "invented values, generated for fuzzing");
            row(label("temperature unit"), temperatureUnit);
            row(label("density unit"), densityUnit);
            row(label("molar volume unit"), volumeUnit);
            row(label("molar mass unit"), massUnit);
            row(label("valid temperature"), t(lowestK), t(highestK));
            if (enthalpy || (v2 && r.nextInt(6) == 0)) {
                row(label("enthalpy unit"), enthalpyUnit);
            }
            int extrapolation = r.nextInt(3);
            if (extrapolation > 0) {
                row(label("extrapolation"), extrapolation == 1 ? "allow" : "refuse");
            }
            int asymmetric = -1;
            if (model) {
                int m = r.nextInt(3);
                if (m == 2) {
                    asymmetric = r.nextInt(n);
                    row(label("multicomponent model"), spellLabel("Toop", r), spellName(names.get(asymmetric), r));
                } else {
                    row(label("multicomponent model"), spellLabel(m == 0 ? "Muggianu" : "Kohler", r));
                }
            }
            if (missingIdeal) {
                row(label("missing pairs"), "ideal");
            } else if (v2 && r.nextInt(8) == 0) {
                row(label("missing pairs"), "refuse");
            }
            for (int i = 0; i < n; i++) {
                row(label("component"), names.get(i), molarMass() / massFactor);
                density(i);
                if (heat) {
                    heatCapacity(i);
                }
            }
            if (v2 && r.nextInt(5) == 0) {
                Object[] order = new Object[n + 1];
                order[0] = label("component order");
                for (int i = 0; i < n; i++) {
                    order[i + 1] = spellName(names.get(i), r);
                }
                rows.add(order);
                history.append(" component-order");
            }
            double[] xLo = new double[n];
            double[] xHi = new double[n];
            fractionLimits(xLo, xHi);
            boolean[] reversed = new boolean[n * n];
            for (int i = 0; i < n; i++) {
                for (int j = i + 1; j < n; j++) {
                    reversed[i * n + j] = r.nextBoolean();
                }
            }
            // With missing pairs ideal a section may end up without rows; the card then holds what was written.
            boolean volumeRows = volume && section("excess volume", 5.0 / volumeFactor, missingIdeal, covariance,
                    reversed);
            boolean enthalpyRows = enthalpy && section("excess enthalpy", 3000.0 / enthalpyFactor, missingIdeal,
                    false, reversed);
            if (ternary) {
                int[] p = distinct(n, 3);
                if (volume) {
                    ternary("excess volume", p, 2.0 / volumeFactor);
                    volumeRows = true;
                }
                if (enthalpy) {
                    ternary("excess enthalpy", p, 1000.0 / enthalpyFactor);
                    enthalpyRows = true;
                }
            }
            boolean gibbsRows = false;
            if (phase) {
                // G^E/RT and Antoine vapour pressures of some 10 to 100 (pressure unit) mid-range
                gibbsRows = section("excess gibbs energy", 1.5, missingIdeal, false, reversed);
                row(label("pressure unit"), new String[] {"kPa", "bar", "atm", "mmHg"}[r.nextInt(4)]);
                double mid = t((lowestK + highestK) / 2);
                for (int i = 0; i < n; i++) {
                    double b = 1400 + 400 * r.nextDouble();
                    double c = 280 - mid;
                    row(label("vapour pressure"), names.get(i), "Antoine", 1 + r.nextDouble() + b / 280, b, c);
                }
                // flash points mid-range, or none (a liquid that does not flash), for most of the phase cards
                for (int i = 0; i < n && r.nextInt(4) > 0; i++) {
                    if (r.nextInt(4) == 0) {
                        row(label("flash point"), names.get(i), "none");
                    } else {
                        double span = highestK - lowestK;
                        row(label("flash point"), names.get(i), t(lowestK + span * (0.2 + 0.6 * r.nextDouble())),
                                "closed cup (invented)");
                    }
                }
            }
            enthalpy = enthalpyRows;
            // a card without volume rows but with enthalpy or Gibbs rows describes no volume
            volume = volumeRows || !(enthalpyRows || gibbsRows);
            covariance &= volumeRows && coverAll;
            if (pairLimits) {
                pairLimits(n);
            }
            for (int k = r.nextInt(3); k > 0; k--) {
                rows.add(r.nextBoolean() ? new Object[] {label("note"), WORDS[r.nextInt(WORDS.length)], 1.0}
                        : new Object[] {"# " + LABELS.get(r.nextInt(LABELS.size())), soupCell(r, names, false)});
            }
            if (r.nextBoolean()) {
                shuffleKeepingComponentOrder();
                history.append(" shuffled");
            }
            for (int k = r.nextInt(3); k > 0; k--) {
                rows.add(r.nextInt(rows.size() + 1), new Object[0]);
            }
            List<Object[]> all = new ArrayList<>();
            for (int k = r.nextInt(5) == 0 ? 1 + r.nextInt(2) : 0; k > 0; k--) {
                all.add(new Object[] {""});
            }
            all.addAll(header);
            all.addAll(rows);
            int pad = r.nextInt(4) == 0 ? 1 + r.nextInt(3) : 0;
            Object[][] cells = pad(all, pad);
            history.append(extreme ? " extreme" : "");
            return new Blueprint(extreme ? Kind.EXTREME : Kind.VALID, seed, cells, names, temperatureUnit,
                    t(lowestK), t(highestK), volume, enthalpy, heat, covariance, xLo, xHi, history.toString());
        }

        /**
         * Rows in random order, except that component rows keep their relative order (it is the components' order),
         * and so do covariance rows (one per coefficient, in order).
         */
        void shuffleKeepingComponentOrder() {
            List<Object[]> ordered = new ArrayList<>();
            for (Object[] row : rows) {
                if (keepsOrder(row)) {
                    ordered.add(row);
                }
            }
            Collections.shuffle(rows, r);
            int next = 0;
            for (int i = 0; i < rows.size(); i++) {
                if (keepsOrder(rows.get(i))) {
                    rows.set(i, ordered.get(next++));
                }
            }
        }

        private boolean keepsOrder(Object[] row) {
            String key = CardReader.normalise((String) row[0]);
            return key.equals("component") || key.endsWith(" covariance");
        }

        int pickComponentCount() {
            int p = r.nextInt(100);
            return p < 60 ? 2 : p < 85 ? 3 : p < 93 ? 4 : p < 98 ? 5 + r.nextInt(2) : 7 + r.nextInt(6);
        }

        void pickTemperatureRange() {
            int kind = r.nextInt(extreme ? 6 : 3);
            if (kind == 0) {
                lowestK = 273.15 + 1e-6 + 30 * r.nextDouble();
                highestK = lowestK + 0.01 + (313.15 - 1e-6 - lowestK - 0.01) * r.nextDouble();
                tanakaAllowed = true;
            } else if (kind == 3) {
                lowestK = 250 + 100 * r.nextDouble();
                highestK = lowestK + 1e-9 * lowestK * (1 + r.nextInt(100)); // a range of a few ulps to ~1e-7 K
                tanakaAllowed = false;
            } else if (kind == 4) {
                lowestK = 1e-3 + r.nextDouble();
                highestK = 1000 + 1e4 * r.nextDouble();
                tanakaAllowed = false;
            } else {
                lowestK = 200 + 150 * r.nextDouble();
                highestK = lowestK + 1 + 100 * r.nextDouble();
                tanakaAllowed = lowestK >= 273.15 && highestK <= 313.15;
            }
            if (!(t(lowestK) < t(highestK))) {
                highestK = lowestK + 1; // the unit conversion merged the limits
            }
        }

        String pickDensityUnit() {
            String[] kgm3 = {"kg/m³", "kg/m3", "g/L", "g/l"};
            String[] gcm3 = {"g/cm³", "g/cm3", "g/mL", "g/ml"};
            boolean grams = r.nextInt(3) == 0;
            densityFactor = grams ? 1000.0 : 1.0;
            return grams ? gcm3[r.nextInt(4)] : kgm3[r.nextInt(4)];
        }

        String pickVolumeUnit() {
            int u = r.nextInt(6);
            volumeFactor = u < 4 ? 1.0 : u == 4 ? 1000.0 : 1e6;
            String[] cm3 = {"cm³/mol", "cm3/mol", "mL/mol", "ml/mol"};
            return u < 4 ? cm3[u] : u == 4 ? (r.nextBoolean() ? "L/mol" : "dm3/mol") : "m³/mol";
        }

        double molarMass() {
            if (extreme && r.nextInt(3) == 0) {
                double[] edge = {1e-300, Double.MIN_VALUE, 1e300, Double.MAX_VALUE / 1000, 18.015, 18.015 + 1e-13};
                return edge[r.nextInt(edge.length)];
            }
            return 2 + 400 * r.nextDouble();
        }

        void density(int i) {
            String name = spellName(names.get(i), r);
            int kind = r.nextInt(tanakaAllowed ? 3 : 2);
            if (lowestK < 200 || highestK > 400) {
                kind = 0; // a polynomial over thousands of kelvin would cross zero
            }
            if (kind == 2) {
                row(label("density model"), name, r.nextBoolean() ? "Tanaka 2001" : "tanaka  2001");
                return;
            }
            if (kind == 0) {
                row(label("density model"), name, spellLabel("constant", r));
                double rho = 600 + 1300 * r.nextDouble();
                if (extreme && r.nextInt(3) == 0) {
                    double[] edge = {1e-300, Double.MIN_VALUE * 1e10, 1e300, 1e-20, 999.97 + 1e-12};
                    rho = edge[r.nextInt(edge.length)];
                }
                row(label("density coefficients"), name, rho / densityFactor);
                return;
            }
            row(label("density model"), name, spellLabel("polynomial", r));
            double mid = (lowestK + highestK) / 2;
            row(label("density reference temperature"), name, t(mid));
            int degree = extreme ? r.nextInt(8) : r.nextInt(3);
            Object[] c = new Object[3 + degree + 1];
            c[0] = label("density coefficients");
            c[1] = name;
            double c0 = 600 + 1300 * r.nextDouble();
            c[2] = c0 / densityFactor;
            double half = (highestK - lowestK) / 2;
            for (int j = 1; j <= degree; j++) {
                // Each term at most c0/(2·degree) across the range, so the polynomial stays above c0/2 > 0;
                // extreme cards put nearly all of that into the steepest terms.
                double bound = c0 / (2.0 * degree) / Math.pow(half, j);
                double share = extreme ? 0.999999 : 0.5 * r.nextDouble();
                c[2 + j] = (r.nextBoolean() ? 1 : -1) * share * bound / densityFactor;
            }
            row(c);
        }

        void heatCapacity(int i) {
            String name = spellName(names.get(i), r);
            double c0 = (50 + 250 * r.nextDouble()) / enthalpyFactor;
            if (r.nextBoolean()) {
                row(label("heat capacity"), name, c0);
            } else {
                row(label("heat capacity"), name, c0, (0.2 * r.nextDouble() - 0.1) / enthalpyFactor);
                row(label("heat capacity reference temperature"), name, t((lowestK + highestK) / 2));
            }
        }

        void fractionLimits(double[] xLo, double[] xHi) {
            int n = names.size();
            Arrays.fill(xHi, 1.0);
            boolean any = false;
            for (int i = 0; i < n; i++) {
                if (r.nextInt(3) == 0 || (i == n - 1 && !any)) {
                    double lo = r.nextBoolean() ? 0.0 : 0.3 * r.nextDouble();
                    double hi = r.nextBoolean() ? 1.0 : 0.7 + 0.3 * r.nextDouble();
                    if (extreme && r.nextBoolean()) {
                        lo = r.nextBoolean() ? 1e-15 : 0.0;
                        hi = r.nextBoolean() ? 1 - 1e-15 : Math.nextDown(1.0);
                    }
                    row(label("valid mole fraction"), spellName(names.get(i), r), lo, hi);
                    xLo[i] = lo;
                    xHi[i] = hi;
                    any = true;
                }
            }
        }

        /** Every pair's coefficient rows (some left out when missing pairs are ideal), a reference, covariance. */
        boolean section(String prefix, double scale, boolean missingIdeal, boolean covariance, boolean[] reversed) {
            int n = names.size();
            boolean written = false;
            for (int i = 0; i < n; i++) {
                for (int j = i + 1; j < n; j++) {
                    if (missingIdeal && r.nextInt(3) == 0) {
                        continue;
                    }
                    written = true;
                    boolean rev = reversed[i * n + j];
                    int order = pickOrder();
                    int[] terms = new int[order + 1];
                    List<Double> all = new ArrayList<>();
                    boolean dependent = false;
                    for (int k = 0; k <= order; k++) {
                        terms[k] = r.nextInt(4) == 0 ? 1 + r.nextInt(4) : 1;
                        dependent |= terms[k] > 1;
                        Object[] row = new Object[2 + terms[k]];
                        row[0] = label(prefix + " A" + k);
                        row[1] = rev ? pairName(j, i) : pairName(i, j);
                        for (int q = 0; q < terms[k]; q++) {
                            double v = coefficient(scale, k, q);
                            row[2 + q] = v;
                            all.add(v);
                        }
                        row(row);
                    }
                    if (dependent || r.nextInt(4) == 0) {
                        row(label(prefix + " reference temperature"), rev ? pairName(j, i) : pairName(i, j),
                                t(lowestK + (highestK - lowestK) * r.nextDouble()));
                    }
                    if (covariance && all.size() <= MAX_COVARIANCE) {
                        covariance(prefix, rev ? pairName(j, i) : pairName(i, j), all);
                    } else {
                        coverAll = false;
                    }
                }
            }
            return written;
        }

        /**
         * Mostly low orders as fitted cards have them; A5..A20 sometimes, A21..A99 on cards of two or three
         * components, and at most A6 on cards of seven or more (whose many pairs would otherwise make huge cards).
         */
        int pickOrder() {
            int p = r.nextInt(100);
            int n = names.size();
            if (n >= 7) {
                return r.nextInt(7);
            }
            return p < 90 ? r.nextInt(5) : p < 98 || n > 3 ? 5 + r.nextInt(16) : 21 + r.nextInt(79);
        }

        double coefficient(double scale, int k, int q) {
            double v = scale * (2 * r.nextDouble() - 1) / (1 + k) / Math.pow(100, q);
            if (extreme && r.nextInt(4) == 0) {
                double[] edge = {1e-300, -1e-300, 1e250, -1e250, Double.MIN_VALUE, 1e15, -1e15, 0.0, -0.0};
                v = edge[r.nextInt(edge.length)];
            }
            return v;
        }

        /** A symmetric positive semi-definite covariance: variances from the coefficients, correlation 0.3. */
        void covariance(String prefix, String subject, List<Double> coefficients) {
            int p = coefficients.size();
            double[] sd = new double[p];
            for (int q = 0; q < p; q++) {
                sd[q] = 1e-3 * Math.abs(coefficients.get(q)) + 1e-6 / volumeFactor;
            }
            for (int a = 0; a < p; a++) {
                Object[] row = new Object[2 + p];
                row[0] = label(prefix + " covariance");
                row[1] = subject;
                for (int b = 0; b < p; b++) {
                    // sd[a]·sd[b] is computed the same way for (a, b) and (b, a), so the matrix is exactly symmetric.
                    row[2 + b] = (a == b ? 1.0 : 0.3) * (Math.min(sd[a], sd[b]) * Math.max(sd[a], sd[b]));
                }
                row(row);
            }
        }

        void ternary(String prefix, int[] p, double scale) {
            String subject = spellName(names.get(p[0]), r) + " + " + spellName(names.get(p[1]), r) + " + "
                    + spellName(names.get(p[2]), r);
            boolean dependent = false;
            for (int m = 0, count = 1 + r.nextInt(3); m < count; m++) {
                int terms = r.nextInt(3) == 0 ? 2 : 1;
                dependent |= terms > 1;
                Object[] row = new Object[2 + terms];
                row[0] = label(prefix + " ternary C" + m);
                row[1] = subject;
                for (int q = 0; q < terms; q++) {
                    row[2 + q] = coefficient(scale, m, q);
                }
                row(row);
            }
            if (dependent) {
                row(label(prefix + " reference temperature"), subject, t((lowestK + highestK) / 2));
            }
        }

        void pairLimits(int n) {
            int[] p = distinct(n, 2);
            if (r.nextBoolean()) {
                double lo = lowestK + (highestK - lowestK) * 0.3 * r.nextDouble();
                double hi = highestK - (highestK - lowestK) * 0.3 * r.nextDouble();
                if (t(lo) < t(hi)) {
                    row(label("valid pair temperature"), pairName(p[0], p[1]), t(lo), t(hi));
                }
            } else {
                double lo = 0.4 * r.nextDouble();
                row(label("valid pair mole fraction"), pairName(p[0], p[1]), lo, lo + 0.1 + 0.5 * r.nextDouble());
            }
        }

        int[] distinct(int n, int count) {
            List<Integer> all = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                all.add(i);
            }
            Collections.shuffle(all, r);
            int[] out = new int[count];
            for (int i = 0; i < count; i++) {
                out[i] = all.get(i);
            }
            return out;
        }
    }

    /** Pairs with more coefficients get no covariance rows: P rows of P values grow the card quadratically. */
    private static final int MAX_COVARIANCE = 24;

    /** Rows padded with "" to one width, plus {@code extra} blank columns. */
    static Object[][] pad(List<Object[]> rows, int extra) {
        int width = 1;
        for (Object[] row : rows) {
            width = Math.max(width, row.length);
        }
        width += extra;
        Object[][] out = new Object[rows.size()][width];
        for (int i = 0; i < out.length; i++) {
            Object[] row = rows.get(i);
            for (int c = 0; c < width; c++) {
                out[i][c] = c < row.length && row[c] != null ? row[c] : "";
            }
        }
        return out;
    }

    // ------------------------------------------------------------------ malformed cards

    /** One to ten random edits of cells or rows of a valid card. */
    static Blueprint mutate(Blueprint valid, Random r) {
        List<Object[]> rows = new ArrayList<>();
        for (Object[] row : valid.cells) {
            rows.add(row.clone());
        }
        StringBuilder h = new StringBuilder(valid.history).append("; mutations:");
        int count = r.nextInt(3) > 0 ? 1 : 2 + r.nextInt(9);
        for (int m = 0; m < count; m++) {
            int i = r.nextInt(rows.size());
            Object[] row = rows.get(i);
            int c = r.nextInt(row.length + 1);
            switch (r.nextInt(16)) {
                case 0: case 1: case 2: case 3: {
                    Object v = soupCell(r, valid.names, false);
                    rows.set(i, set(row, c, v));
                    h.append(" cell(").append(i + 1).append(',').append(c + 1).append(")=").append(cell(v));
                    break;
                }
                case 4: {
                    rows.set(i, set(row, c, ""));
                    h.append(" blank(").append(i + 1).append(',').append(c + 1).append(')');
                    break;
                }
                case 5: {
                    Object v = c < row.length ? row[c] : "";
                    Object swapped = v instanceof Double ? Double.toString((Double) v)
                            : v instanceof String ? TestCards.cell((String) v) : v;
                    rows.set(i, set(row, c, swapped));
                    h.append(" retype(").append(i + 1).append(',').append(c + 1).append(')');
                    break;
                }
                case 6: {
                    if (rows.size() > 1) {
                        rows.remove(i);
                        h.append(" delete-row ").append(i + 1);
                    }
                    break;
                }
                case 7: {
                    rows.add(r.nextInt(rows.size() + 1), row.clone());
                    h.append(" duplicate-row ").append(i + 1);
                    break;
                }
                case 8: {
                    int j = r.nextInt(rows.size());
                    rows.set(i, rows.get(j));
                    rows.set(j, row);
                    h.append(" swap-rows ").append(i + 1).append(',').append(j + 1);
                    break;
                }
                case 9: {
                    Object[] soup = soupRow(r, valid.names);
                    rows.add(r.nextInt(rows.size() + 1), soup);
                    h.append(" insert-row ").append(cell(soup[0]));
                    break;
                }
                case 10: {
                    Object[] shorter = Arrays.copyOf(row, Math.max(0, row.length - 1 - r.nextInt(2)));
                    rows.set(i, shorter);
                    h.append(" truncate-row ").append(i + 1);
                    break;
                }
                case 11: {
                    Object[] longer = Arrays.copyOf(row, row.length + 1 + r.nextInt(3));
                    for (int k = row.length; k < longer.length; k++) {
                        longer[k] = soupCell(r, valid.names, false);
                    }
                    rows.set(i, longer);
                    h.append(" extend-row ").append(i + 1);
                    break;
                }
                case 12: {
                    String l = LABELS.get(r.nextInt(LABELS.size()));
                    rows.set(i, set(row, 0, spellLabel(l, r)));
                    h.append(" relabel ").append(i + 1).append('=').append(cell(l));
                    break;
                }
                case 13: {
                    Object[] shifted = new Object[row.length + 1];
                    shifted[0] = "";
                    System.arraycopy(row, 0, shifted, 1, row.length);
                    rows.set(i, shifted);
                    h.append(" shift-right ").append(i + 1);
                    break;
                }
                case 14: {
                    Object v = EDGE_NUMBERS[r.nextInt(EDGE_NUMBERS.length)];
                    int numberCell = firstNumber(row, r);
                    rows.set(i, set(row, numberCell < 0 ? c : numberCell, v));
                    h.append(" number(").append(i + 1).append(")=").append(cell(v));
                    break;
                }
                default: {
                    rows.set(i, new Object[0]);
                    h.append(" clear-row ").append(i + 1);
                    break;
                }
            }
        }
        if (r.nextInt(50) == 0) {
            h.append(" transposed");
            return valid.with(Kind.MUTATED, transpose(pad(rows, 0)), h.toString());
        }
        return valid.with(Kind.MUTATED, pad(rows, 0), h.toString());
    }

    private static int firstNumber(Object[] row, Random r) {
        List<Integer> numbers = new ArrayList<>();
        for (int c = 0; c < row.length; c++) {
            if (row[c] instanceof Double) {
                numbers.add(c);
            }
        }
        return numbers.isEmpty() ? -1 : numbers.get(r.nextInt(numbers.size()));
    }

    private static Object[] set(Object[] row, int c, Object v) {
        Object[] out = Arrays.copyOf(row, Math.max(row.length, c + 1));
        out[c] = v;
        return out;
    }

    static Object[][] transpose(Object[][] cells) {
        int w = cells.length == 0 ? 0 : cells[0].length;
        Object[][] out = new Object[w][cells.length];
        for (int i = 0; i < cells.length; i++) {
            for (int c = 0; c < w; c++) {
                out[c][i] = cells[i][c];
            }
        }
        return out;
    }

    static Object[] soupRow(Random r, List<String> names) {
        Object[] row = new Object[1 + r.nextInt(7)];
        row[0] = spellLabel(LABELS.get(r.nextInt(LABELS.size())), r);
        for (int c = 1; c < row.length; c++) {
            row[c] = soupCell(r, names, false);
        }
        return row;
    }

    /** Rows of random labels, subjects and values, usually under a valid header. */
    static Blueprint soup(Random r, long seed) {
        List<String> names = new ArrayList<>(Arrays.asList(NAMES).subList(0, 2 + r.nextInt(4)));
        List<Object[]> rows = new ArrayList<>();
        if (r.nextInt(5) > 0) {
            rows.add(new Object[] {"Miscela card", r.nextBoolean() ? 2.0 : 1.0});
        }
        for (int k = r.nextInt(40); k > 0; k--) {
            rows.add(soupRow(r, names));
        }
        double lo = 280;
        double hi = 320;
        return new Blueprint(Kind.SOUP, seed, pad(rows, 0), names, "K", lo, hi, true, true, true, true,
                new double[names.size()], ones(names.size()), "label soup");
    }

    private static double[] ones(int n) {
        double[] x = new double[n];
        Arrays.fill(x, 1.0);
        return x;
    }

    /** Degenerate ranges; ragged ones only reach the reader (Calc's ranges are rectangular). */
    static Blueprint shape(Random r, long seed) {
        List<String> names = Arrays.asList("alpha", "beta");
        Object[][] cells;
        String what;
        switch (r.nextInt(10)) {
            case 0:
                cells = null;
                what = "null";
                break;
            case 1:
                cells = new Object[0][];
                what = "no rows";
                break;
            case 2:
                cells = new Object[][] {{}};
                what = "one empty row";
                break;
            case 3:
                cells = new Object[][] {null, {"Miscela card", 1.0}, null};
                what = "null rows";
                break;
            case 4:
                cells = new Object[][] {{soupCell(r, names, true)}};
                what = "one cell";
                break;
            case 5: {
                Object[] row = new Object[1 + r.nextInt(1000)];
                for (int c = 0; c < row.length; c++) {
                    row[c] = soupCell(r, names, true);
                }
                cells = new Object[][] {row};
                what = "one long row";
                break;
            }
            case 6: {
                cells = new Object[1 + r.nextInt(1000)][];
                for (int i = 0; i < cells.length; i++) {
                    cells[i] = new Object[] {soupCell(r, names, true)};
                }
                what = "one long column";
                break;
            }
            case 7: {
                Blueprint valid = new Builder(r, seed, false).build();
                cells = new Object[valid.cells.length][];
                for (int i = 0; i < cells.length; i++) {
                    int keep = r.nextInt(valid.cells[i].length + 1);
                    cells[i] = r.nextInt(10) == 0 ? null : Arrays.copyOf(valid.cells[i], keep);
                }
                return valid.with(Kind.SHAPE, cells, valid.history + "; ragged");
            }
            case 8: {
                Blueprint valid = new Builder(r, seed, false).build();
                cells = new Object[valid.cells.length][];
                for (int i = 0; i < cells.length; i++) {
                    cells[i] = valid.cells[i].clone();
                    for (int c = 0; c < cells[i].length; c++) {
                        if ("".equals(cells[i][c])) {
                            cells[i][c] = r.nextBoolean() ? null : "   ";
                        } else if (cells[i][c] instanceof Double && r.nextInt(20) == 0) {
                            cells[i][c] = ((Double) cells[i][c]) == 1.0 ? (Object) Boolean.TRUE : cells[i][c];
                        }
                    }
                }
                return valid.with(Kind.SHAPE, cells, valid.history + "; blanks as null and spaces");
            }
            default: {
                Blueprint valid = new Builder(r, seed, false).build();
                List<Object[]> rows = new ArrayList<>(Arrays.asList(valid.cells));
                return valid.with(Kind.SHAPE, pad(rows, 20 + r.nextInt(100)), valid.history + "; very wide");
            }
        }
        return new Blueprint(Kind.SHAPE, seed, cells, names, "K", 280, 320, true, false, false, false,
                new double[2], ones(2), what);
    }
}
