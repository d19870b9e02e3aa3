package org.miscela.core.card;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.miscela.core.model.ExcessFunction;
import org.miscela.core.model.TernaryTerm;
import org.miscela.core.problem.Numbers;
import org.miscela.core.problem.Problem;

/**
 * How many significant digits each coefficient of a card needs, and whether it is written with fewer. A cell holds a
 * double, so the digits written are those of the value's shortest decimal form (-4.2: 2; a fitted value: 15 to 17).
 * Rounding a value of exponent e to d significant digits moves it by up to ½·10^(e−d+1); its effect on the card's
 * property is that times the property's largest sensitivity to the coefficient over the card's validity range. The
 * property is the density for the excess volume and pure-density coefficients (tolerance {@link #DENSITY_TOLERANCE}),
 * the excess enthalpy for its own coefficients ({@link #ENTHALPY_TOLERANCE}); the tolerance is shared out equally
 * among the property's non-zero coefficients, so all of them rounded together stay within it. A coefficient needs the
 * fewest digits whose rounding stays within its share.
 *
 * <p>A card whose terms do not cancel is taken as written: rounding -4.2 in its last digit moves the excess volume by
 * about as much, relatively, as the coefficient itself, so the card is as accurate as its digits say. The warning is
 * for cancellation: a coefficient written with fewer digits than it needs whose term is more than
 * {@link #CANCELLATION} times the whole contribution of its pair (or ternary term, or the pure density), as in a
 * high-order fit whose terms of 10⁶ add up to 1; and only when such coefficients, rounded in their last written
 * digits all at once, can move the property by more than its tolerance. Sensitivities are taken along each pair's
 * binary mixtures (a triple's triangle for ternary terms; the edges of a component for its density), within the
 * components' and the pair's limits, at {@value #FRACTION_STEPS} + 1 compositions and
 * {@value #TEMPERATURE_STEPS} + 1 temperatures.
 */
final class CardDigits {
    /** The density a card's coefficients must carry: 0.01 kg/m³, the last digit of density tables (common practice). */
    static final double DENSITY_TOLERANCE = 0.01;
    /** The excess enthalpy they must carry: 1 J/mol, below the uncertainty of calorimetric data (common practice). */
    static final double ENTHALPY_TOLERANCE = 1.0;
    /** How many times its whole pair's contribution a term must be to count as cancelling. */
    static final double CANCELLATION = 10.0;
    /** The most significant digits a double holds (17 restore any double exactly). */
    static final int MOST_DIGITS = 17;
    static final int FRACTION_STEPS = 20;
    static final int TEMPERATURE_STEPS = 8;
    private static final int SIMPLEX_STEPS = 12;

    /** What a pair coefficient's term is compared with. */
    private static final String PAIR = "the pair's whole contribution";

    /** The property a coefficient's digits are weighed in. */
    enum Property {
        DENSITY("density"),
        ENTHALPY("excess enthalpy");

        final String word;

        Property(String word) {
            this.word = word;
        }
    }

    /** One coefficient cell and what its digits do. */
    static final class Coefficient {
        final CardRow row;
        /** Index of the value in the row (column = index + 2). */
        final int index;
        final double value;
        final Property property;
        /** What the coefficient's term is part of: "the pair's whole contribution", "the ternary term's", … */
        final String whole;
        /** Largest |∂property/∂coefficient| over the grid, internal units of the property per card unit. */
        final double sensitivity;
        /** How many times the whole it is part of the coefficient's own largest term is. */
        final double cancellation;
        int written;
        int needed;
        /** What rounding in the last written digit can change, internal units of the property. */
        double effect;

        Coefficient(CardRow row, int index, Property property, String whole, double sensitivity, double scale) {
            this.row = row;
            this.index = index;
            this.value = row.number(index);
            this.property = property;
            this.whole = whole;
            this.sensitivity = sensitivity;
            double term = sensitivity * Math.abs(value);
            this.cancellation = term / Math.max(scale, 1e-12 * term);
        }

        int column() {
            return index + 2;
        }

        /** Written with fewer digits than it needs, on a card whose terms cancel. */
        boolean tooShort() {
            return written < needed && cancellation > CANCELLATION;
        }
    }

    private CardDigits() {
    }

    /**
     * Adds one warning per row with coefficients written too short, in card order, to {@code out}: when the
     * coefficients whose terms cancel, rounded in their last written digits all together, can move the property by
     * more than its tolerance.
     */
    static void warnings(ParsedCard rows, Card card, List<String> out) {
        List<Coefficient> all = coefficients(rows, card);
        for (Property p : Property.values()) {
            double total = 0.0;
            for (Coefficient c : all) {
                total += c.property == p && c.cancellation > CANCELLATION ? c.effect : 0.0;
            }
            if (total <= tolerance(p)) {
                continue;
            }
            Map<CardRow, List<Coefficient>> byRow = new LinkedHashMap<>();
            for (Coefficient c : all) {
                if (c.property == p && c.tooShort()) {
                    byRow.computeIfAbsent(c.row, r -> new ArrayList<>()).add(c);
                }
            }
            for (Map.Entry<CardRow, List<Coefficient>> e : byRow.entrySet()) {
                out.add(warning(card, e.getKey(), e.getValue(), total));
            }
        }
    }

    /** The warning about one row's short coefficients. */
    private static String warning(Card card, CardRow r, List<Coefficient> cs, double total) {
        StringBuilder columns = new StringBuilder();
        StringBuilder written = new StringBuilder();
        StringBuilder needed = new StringBuilder();
        double effect = 0.0;
        double cancellation = 0.0;
        for (int i = 0; i < cs.size(); i++) {
            Coefficient c = cs.get(i);
            String sep = i == 0 ? "" : i == cs.size() - 1 ? " and " : ", ";
            columns.append(sep).append(c.column());
            written.append(sep).append(c.written);
            needed.append(sep).append(c.needed);
            effect += c.effect;
            cancellation = Math.max(cancellation, c.cancellation);
        }
        Coefficient first = cs.get(0);
        boolean one = cs.size() == 1;
        String which = one ? "the coefficient in column " + columns + " is"
                : "the coefficients in columns " + columns + " are";
        written.append(one && first.written == 1 ? " significant digit" : " significant digits");
        Property p = first.property;
        return Problem.WARN_DIGITS.format(r.number, r.label, which, written, needed, p.word,
                inUnit(card, p, tolerance(p)), grouped(cancellation), first.whole, p.word, inUnit(card, p, effect),
                inUnit(card, p, total));
    }

    /** The tolerance of a property, internal units. */
    static double tolerance(Property p) {
        return p == Property.DENSITY ? DENSITY_TOLERANCE : ENTHALPY_TOLERANCE;
    }

    /** The coefficients as a table with a header row (see {@link CardSanity#digits}). */
    static Object[][] table(ParsedCard rows, Card card) {
        List<Coefficient> all = coefficients(rows, card);
        Object[][] out = new Object[all.size() + 1][];
        out[0] = new Object[] {"row", "label", "subject", "column", "value", "digits written", "digits needed",
            "last digit's effect", "in", "cancellation"};
        for (int i = 0; i < all.size(); i++) {
            Coefficient c = all.get(i);
            out[i + 1] = new Object[] {(double) c.row.number, c.row.label, c.row.text(0).trim(), (double) c.column(),
                c.value, (double) c.written, (double) c.needed, inUnitValue(card, c.property, c.effect),
                c.property.word + ", " + unit(card, c.property), c.cancellation};
        }
        return out;
    }

    /** Every non-zero coefficient weighed, with its digits written and needed, in card order of rows and columns. */
    static List<Coefficient> coefficients(ParsedCard rows, Card card) {
        List<Coefficient> all = new ArrayList<>();
        Grid grid = new Grid(card);
        if (card.excessVolume() != null) {
            section(rows, card, grid, CardLabels.EXCESS_VOLUME, Property.DENSITY, card.excessVolume(),
                    card.units().molarVolume().toCm3PerMol(1.0), all);
            pureDensities(rows, card, grid, all);
        }
        if (card.excessEnthalpy() != null) {
            section(rows, card, grid, CardLabels.EXCESS_ENTHALPY, Property.ENTHALPY, card.excessEnthalpy(),
                    card.units().enthalpy().toJoulePerMol(1.0), all);
        }
        for (Property p : Property.values()) {
            int count = 0;
            for (Coefficient c : all) {
                count += c.property == p ? 1 : 0;
            }
            double share = tolerance(p) / Math.max(count, 1);
            for (Coefficient c : all) {
                if (c.property == p) {
                    weigh(c, share);
                }
            }
        }
        all.sort((a, b) -> a.row.number != b.row.number ? Integer.compare(a.row.number, b.row.number)
                : Integer.compare(a.index, b.index));
        return all;
    }

    /** The digits written, the digits needed for the share of the tolerance, and the last written digit's effect. */
    private static void weigh(Coefficient c, double share) {
        c.written = written(c.value);
        int e = exponent(c.value);
        c.needed = MOST_DIGITS;
        for (int d = 1; d <= MOST_DIGITS; d++) {
            if (rounding(e, d) * c.sensitivity <= share) {
                c.needed = d;
                break;
            }
        }
        c.effect = rounding(e, c.written) * c.sensitivity;
    }

    /** The most a value of exponent e moves when rounded to d significant digits. */
    private static double rounding(int e, int d) {
        return 0.5 * Math.pow(10.0, e - d + 1);
    }

    /**
     * The significant digits of the shortest decimal form that reads back as this very double: the fewest d for which
     * the value rounded to d digits is the value again (Double.toString gives an upper bound).
     */
    static int written(double v) {
        if (v == 0.0 || !Double.isFinite(v)) {
            return 1;
        }
        int d = Math.min(new BigDecimal(Double.toString(v)).stripTrailingZeros().precision(), MOST_DIGITS);
        BigDecimal exact = new BigDecimal(v);
        while (d > 1 && exact.round(new MathContext(d - 1, RoundingMode.HALF_EVEN)).doubleValue() == v) {
            d--;
        }
        return d;
    }

    /** The decimal exponent of a non-zero finite value: 6 for 1496316.07, -4 for 0.00092. */
    static int exponent(double v) {
        BigDecimal b = new BigDecimal(Math.abs(v));
        return b.precision() - b.scale() - 1;
    }

    /**
     * The coefficient rows of one excess-property section: each pair's A_k (weighed along the pair's binary mixtures)
     * and each triple's C_m (over its triangle). The largest sensitivity of every A_k's j-th temperature coefficient of
     * a pair comes from one pass over the pair's points, the powers built up by multiplication.
     */
    private static void section(ParsedCard rows, Card card, Grid grid, String prefix, Property property,
            ExcessFunction function, double unit, List<Coefficient> out) {
        ParsedCard.Section section = rows.section(prefix);
        Subjects subjects = new Subjects(names(card));
        Map<String, List<CardRow>> byPair = new LinkedHashMap<>();
        Map<CardRow, Integer> orders = new java.util.HashMap<>();
        for (Map.Entry<Integer, List<CardRow>> e : section.binary.entrySet()) {
            for (CardRow r : e.getValue()) {
                byPair.computeIfAbsent(Subjects.setKey(subjects.members(r, 2)), key -> new ArrayList<>()).add(r);
                orders.put(r, e.getKey());
            }
        }
        for (List<CardRow> pairRows : byPair.values()) {
            int[] pair = subjects.members(pairRows.get(0), 2);
            int p = Math.min(pair[0], pair[1]);
            int q = Math.max(pair[0], pair[1]);
            double tRef = reference(section, subjects, card, pair);
            List<Point> points = grid.edge(p, q);
            int order = 0;
            int terms = 1;
            for (CardRow r : pairRows) {
                order = Math.max(order, orders.get(r));
                terms = Math.max(terms, r.values.length - 1);
            }
            double[][] best = new double[order + 1][terms];
            double scale = 0.0;
            for (Point pt : points) {
                double weight = property == Property.DENSITY ? pt.rho / pt.vm : 1.0;
                scale = Math.max(scale, property == Property.DENSITY ? Math.abs(pt.rho - pt.idealRho)
                        : Math.abs(pt.he));
                double base = pt.x[p] * pt.x[q] * weight;
                double d = Math.abs(pt.x[p] - pt.x[q]);
                double dt = Math.abs(pt.kelvin - tRef);
                double dk = 1.0;
                for (int k = 0; k <= order; k++) {
                    double v = base * dk;
                    for (int t = 0; t < terms; t++) {
                        best[k][t] = Math.max(best[k][t], v);
                        v *= dt;
                    }
                    dk *= d;
                }
            }
            for (CardRow r : pairRows) {
                int k = orders.get(r);
                for (int t = 0; t + 1 < r.values.length; t++) {
                    if (r.number(t + 1) != 0.0) {
                        add(out, new Coefficient(r, t + 1, property, PAIR, best[k][t] * unit, scale));
                    }
                }
            }
        }
        for (Map.Entry<Integer, List<CardRow>> e : section.ternary.entrySet()) {
            int m = e.getKey();
            for (CardRow r : e.getValue()) {
                int[] triple = subjects.members(r, 3);
                double tRef = reference(section, subjects, card, triple);
                int term = term(function, triple);
                List<Point> points = grid.simplex(triple);
                int terms = r.values.length - 1;
                double[] best = new double[Math.max(terms, 1)];
                double scale = 0.0;
                for (Point pt : points) {
                    double weight = property == Property.DENSITY ? pt.rho / pt.vm : 1.0;
                    scale = Math.max(scale, Math.abs(function.ternaryContribution(term, pt.x, pt.kelvin)) * weight);
                    double role = m == 0 ? 1.0 : m == 1 ? pt.x[triple[0]] : pt.x[triple[1]];
                    double v = pt.x[triple[0]] * pt.x[triple[1]] * pt.x[triple[2]] * role * weight;
                    double dt = Math.abs(pt.kelvin - tRef);
                    for (int t = 0; t < terms; t++) {
                        best[t] = Math.max(best[t], v);
                        v *= dt;
                    }
                }
                for (int t = 0; t < terms; t++) {
                    if (r.number(t + 1) != 0.0) {
                        add(out, new Coefficient(r, t + 1, property, "the ternary term's whole contribution",
                                best[t] * unit, scale));
                    }
                }
            }
        }
    }

    /** Each pure liquid's density coefficients, weighed in the mixture's density along the component's edges. */
    private static void pureDensities(ParsedCard rows, Card card, Grid grid, List<Coefficient> out) {
        double unit = card.units().density().toKgPerM3(1.0);
        for (int i = 0; i < card.componentCount(); i++) {
            String subject = CardReader.normalise(card.components().get(i).name());
            CardRow r = rows.keyed(CardLabels.DENSITY_COEFFICIENTS).get(subject);
            String model = card.components().get(i).density().modelName();
            if (r == null || !(model.equals(org.miscela.core.model.PolynomialDensity.NAME)
                    || model.equals(org.miscela.core.model.ConstantDensity.NAME))) {
                continue; // a handbook form's coefficients or a table are not a polynomial's terms
            }
            CardRow reference = rows.keyed(CardLabels.DENSITY_REFERENCE).get(subject);
            double tRef = reference == null ? 0.0 : card.units().temperature().toKelvin(reference.number(1));
            List<Point> points = new ArrayList<>();
            for (int q = 0; q < card.componentCount(); q++) {
                if (q != i) {
                    points.addAll(grid.edge(i, q));
                }
            }
            // ∂ρ/∂ρ*_i = x_i·V*_i·ρ/(V_m·ρ*_i) at each point; the whole pure density's effect is that times ρ*_i
            double[] weight = new double[points.size()];
            double scale = 0.0;
            for (int n = 0; n < weight.length; n++) {
                Point p = points.get(n);
                double pure = card.components().get(i).density().at(p.kelvin);
                weight[n] = p.x[i] * card.mixture().pureMolarVolume(i, p.kelvin) * p.rho / (p.vm * pure);
                scale = Math.max(scale, weight[n] * pure);
            }
            for (int j = 0; j + 1 < r.values.length; j++) {
                if (r.number(j + 1) == 0.0) {
                    continue;
                }
                double s = 0.0;
                for (int n = 0; n < weight.length; n++) {
                    s = Math.max(s, weight[n] * Math.pow(Math.abs(points.get(n).kelvin - tRef), j));
                }
                add(out, new Coefficient(r, j + 1, Property.DENSITY, "the pure liquid's density", s * unit, scale));
            }
        }
    }

    /** Adds a coefficient whose weighing came out finite (cards with numbers near the limits of a double may not). */
    private static void add(List<Coefficient> out, Coefficient c) {
        if (Double.isFinite(c.sensitivity) && Double.isFinite(c.cancellation) && c.sensitivity > 0.0) {
            out.add(c);
        }
    }

    /** T_ref of a pair's or triple's polynomials in K (any value when the card gives none: its coefficients are constant). */
    private static double reference(ParsedCard.Section section, Subjects subjects, Card card, int[] members) {
        String key = Subjects.setKey(members);
        for (CardRow r : section.reference) {
            if (Subjects.setKey(subjects.members(r)).equals(key)) {
                return card.units().temperature().toKelvin(r.number(1));
            }
        }
        return card.validity().lowestKelvin();
    }

    /** The index of the ternary term of these members in the excess function. */
    private static int term(ExcessFunction function, int[] members) {
        String key = Subjects.setKey(members);
        List<TernaryTerm> terms = function.ternaryTerms();
        for (int t = 0; t < terms.size(); t++) {
            TernaryTerm term = terms.get(t);
            if (Subjects.setKey(term.first(), term.second(), term.third()).equals(key)) {
                return t;
            }
        }
        throw new IllegalStateException("no ternary term " + key);
    }

    private static List<String> names(Card card) {
        List<String> names = new ArrayList<>();
        for (org.miscela.core.model.Component c : card.components()) {
            names.add(c.name());
        }
        return names;
    }

    /** A value of a property in the card's unit for it, with the unit: "0.37 kg/m³", "1.2 kJ/mol". */
    private static String inUnit(Card card, Property property, double internal) {
        return CardPlausibility.shown(inUnitValue(card, property, internal), 2) + " " + unit(card, property);
    }

    /** A value of a property in the card's unit for it. */
    private static double inUnitValue(Card card, Property property, double internal) {
        return property == Property.DENSITY ? card.units().density().fromKgPerM3(internal)
                : card.units().enthalpy().fromJoulePerMol(internal);
    }

    /** The card's unit of a property. */
    private static String unit(Card card, Property property) {
        return property == Property.DENSITY ? card.units().density().symbol() : card.units().enthalpy().symbol();
    }

    /** A large factor in words: two significant digits, thousands separated (300,000). */
    private static String grouped(double v) {
        double r = Double.parseDouble(CardPlausibility.shown(v, 2));
        return r >= 1e15 ? Numbers.show(r) : String.format(Locale.ROOT, "%,d", (long) r);
    }

    /** A point of the mixture where sensitivities are taken, with the card's values there (internal units). */
    static final class Point {
        final double[] x;
        final double kelvin;
        final double rho;
        final double vm;
        final double idealRho;
        final double he;

        Point(double[] x, double kelvin, double rho, double vm, double idealRho, double he) {
            this.x = x;
            this.kelvin = kelvin;
            this.rho = rho;
            this.vm = vm;
            this.idealRho = idealRho;
            this.he = he;
        }
    }

    /** The compositions and temperatures the sensitivities are taken at, inside the card's validity range. */
    static final class Grid {
        private final Card card;
        private final Map<String, List<Point>> edges = new LinkedHashMap<>();

        Grid(Card card) {
            this.card = card;
        }

        /** Points along the binary mixtures of p and q (every other component absent). */
        List<Point> edge(int p, int q) {
            return edges.computeIfAbsent(p + "-" + q, key -> {
                Validity v = card.validity();
                double lo = Math.max(v.lowestFraction(p), 1.0 - v.highestFraction(q));
                double hi = Math.min(v.highestFraction(p), 1.0 - v.lowestFraction(q));
                double tLo = v.lowestKelvin();
                double tHi = v.highestKelvin();
                for (Validity.PairLimit l : v.pairLimits()) {
                    boolean forward = l.first() == p && l.second() == q;
                    boolean backward = l.first() == q && l.second() == p;
                    if (!forward && !backward) {
                        continue;
                    }
                    if (l.hasRatio()) {
                        lo = Math.max(lo, forward ? l.lowestRatio() : 1.0 - l.highestRatio());
                        hi = Math.min(hi, forward ? l.highestRatio() : 1.0 - l.lowestRatio());
                    }
                    if (l.hasTemperature()) {
                        tLo = Math.max(tLo, l.lowestKelvin());
                        tHi = Math.min(tHi, l.highestKelvin());
                    }
                }
                List<Point> points = new ArrayList<>();
                if (!(lo <= hi) || !(tLo <= tHi)) {
                    return points;
                }
                int[] pairs = {pairIndex(card.excessVolume(), p, q), pairIndex(card.excessEnthalpy(), p, q)};
                for (int a = 0; a <= FRACTION_STEPS; a++) {
                    double s = a == FRACTION_STEPS ? hi : lo + (hi - lo) * a / FRACTION_STEPS;
                    double[] x = new double[card.componentCount()];
                    x[p] = s;
                    x[q] = 1.0 - s;
                    temperatures(x, tLo, tHi, pairs, points);
                }
                return points;
            });
        }

        /** Points inside the triangle of three components (none absent), each within its own limits. */
        List<Point> simplex(int[] t) {
            Validity v = card.validity();
            List<Point> points = new ArrayList<>();
            for (int a = 1; a < SIMPLEX_STEPS; a++) {
                for (int b = 1; a + b < SIMPLEX_STEPS; b++) {
                    double[] x = new double[card.componentCount()];
                    x[t[0]] = a / (double) SIMPLEX_STEPS;
                    x[t[1]] = b / (double) SIMPLEX_STEPS;
                    x[t[2]] = 1.0 - x[t[0]] - x[t[1]];
                    boolean inside = true;
                    for (int m : t) {
                        inside &= v.containsFraction(m, x[m]);
                    }
                    if (inside) {
                        temperatures(x, v.lowestKelvin(), v.highestKelvin(), null, points);
                    }
                }
            }
            return points;
        }

        /**
         * The index of the pair of p and q in an excess function, −1 when it has none (a pair treated as ideal), −2
         * when there is no function. On the pair's binary mixtures the other pairs and the ternary terms vanish, so
         * the pair's own contribution is the whole excess quantity there, under every multicomponent model.
         */
        private static int pairIndex(ExcessFunction f, int p, int q) {
            if (f == null) {
                return -2;
            }
            for (int i = 0; i < f.pairCount(); i++) {
                if (Math.min(f.pairFirst(i), f.pairSecond(i)) == p && Math.max(f.pairFirst(i), f.pairSecond(i)) == q) {
                    return i;
                }
            }
            return -1;
        }

        /** An excess quantity at x: the pair's own contribution on its binary mixtures ({@code pair} ≥ −1), else all. */
        private static double excess(ExcessFunction f, int pair, double[] x, double kelvin) {
            return pair >= 0 ? f.pairContribution(pair, x, kelvin) : pair == -1 ? 0.0 : f.value(x, kelvin);
        }

        /**
         * The composition at every temperature of the grid where the card's values are finite and physical;
         * {@code pairs} the volume's and the enthalpy's pair index on a binary edge, null inside a triangle.
         */
        private void temperatures(double[] x, double tLo, double tHi, int[] pairs, List<Point> out) {
            Mixture mixture = card.mixture();
            for (int b = 0; b <= TEMPERATURE_STEPS; b++) {
                double kelvin = b == TEMPERATURE_STEPS ? tHi : tLo + (tHi - tLo) * b / TEMPERATURE_STEPS;
                double rho = Double.NaN;
                double vm = Double.NaN;
                double ideal = Double.NaN;
                if (card.excessVolume() != null) {
                    double excess = pairs == null ? mixture.excessMolarVolume(x, kelvin)
                            : excess(card.excessVolume(), pairs[0], x, kelvin);
                    double pure = 0.0;
                    for (int k = 0; k < x.length; k++) {
                        pure += x[k] == 0.0 ? 0.0 : x[k] * mixture.pureMolarVolume(k, kelvin);
                    }
                    vm = pure + excess;
                    rho = 1000.0 * mixture.meanMolarMass(x) / vm;
                    ideal = 1000.0 * mixture.meanMolarMass(x) / pure;
                    if (!(vm > 0.0 && rho > 0.0) || !Double.isFinite(vm) || !Double.isFinite(rho)
                            || !Double.isFinite(ideal)) {
                        continue;
                    }
                }
                double he = card.excessEnthalpy() == null ? Double.NaN : pairs == null
                        ? mixture.excessEnthalpy(x, kelvin) : excess(card.excessEnthalpy(), pairs[1], x, kelvin);
                if (card.excessEnthalpy() != null && !Double.isFinite(he)) {
                    continue;
                }
                out.add(new Point(x, kelvin, rho, vm, ideal, he));
            }
        }
    }
}
