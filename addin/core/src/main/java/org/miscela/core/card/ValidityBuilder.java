package org.miscela.core.card;

import org.miscela.core.problem.Numbers;
import org.miscela.core.problem.Problem;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;

/**
 * Reads a card's validity range: the 'valid temperature' row, each component's 'valid mole fraction' row, and the
 * per-pair limits of temperature and of the pair's mole-fraction ratio. Every range must be increasing; temperatures
 * must lie above 0 K and fractions within 0..1.
 */
final class ValidityBuilder {
    private final ParsedCard rows;
    private final Subjects subjects;
    private final Units.Temperature temperature;

    ValidityBuilder(ParsedCard rows, Subjects subjects, Units.Temperature temperature) {
        this.rows = rows;
        this.subjects = subjects;
        this.temperature = temperature;
    }

    /** @param pureOnly whether the card may leave out every composition limit (its pure part is read alone) */
    Validity validity(boolean pureOnly) {
        CardRow t = rows.required(CardLabels.VALID_TEMPERATURE);
        t.atMost(2);
        double[] kelvin = temperatures(t, 0);
        int n = subjects.size();
        double[] xLo = new double[n];
        double[] xHi = new double[n];
        Arrays.fill(xHi, 1.0);
        Map<String, CardRow> fractionRows = rows.keyed(CardLabels.VALID_MOLE_FRACTION);
        if (fractionRows.isEmpty() && !pureOnly) {
            throw Problem.NO_COMPOSITION_LIMIT.raise();
        }
        for (int i = 0; i < n; i++) {
            CardRow r = fractionRows.get(CardReader.normalise(subjects.name(i)));
            if (r == null) {
                continue;
            }
            r.atMost(3);
            double[] x = fractions(r);
            xLo[i] = x[0];
            xHi[i] = x[1];
        }
        List<Validity.PairLimit> pairLimits = new ArrayList<>();
        for (CardRow r : rows.keyed(CardLabels.VALID_PAIR_TEMPERATURE).values()) {
            int[] p = subjects.pair(r);
            r.atMost(3);
            double[] k = temperatures(r, 1);
            pairLimits.add(new Validity.PairLimit(p[0], p[1], k[0], k[1], Double.NaN, Double.NaN));
        }
        for (CardRow r : rows.keyed(CardLabels.VALID_PAIR_FRACTION).values()) {
            int[] p = subjects.pair(r);
            r.atMost(3);
            double[] x = fractions(r);
            pairLimits.add(new Validity.PairLimit(p[0], p[1], Double.NaN, Double.NaN, x[0], x[1]));
        }
        return new Validity(kelvin[0], kelvin[1], xLo, xHi, pairLimits);
    }

    /** A temperature range in values {@code first} and {@code first + 1}, in kelvin: increasing, above 0 K. */
    private double[] temperatures(CardRow r, int first) {
        double lo = temperature.toKelvin(r.number(first));
        double hi = temperature.toKelvin(r.number(first + 1));
        if (!(lo < hi)) {
            throw Problem.BAD_RANGE.raise(r.number, r.label, Numbers.show(r.number(first)),
                    Numbers.show(r.number(first + 1)));
        }
        if (!(lo > 0)) {
            throw Problem.NOT_POSITIVE.raise(r.number, r.label, "the lower limit, in kelvin,",
                    Numbers.show(lo) + " K");
        }
        return new double[] {lo, hi};
    }

    /** A mole-fraction range in values 1 and 2: increasing, within 0..1. */
    private static double[] fractions(CardRow r) {
        double a = r.number(1);
        double b = r.number(2);
        if (a < 0 || b > 1) {
            throw Problem.MOLE_FRACTION_LIMIT.raise(r.number, r.label, Numbers.show(a), Numbers.show(b));
        }
        if (!(a < b)) {
            throw Problem.BAD_RANGE.raise(r.number, r.label, Numbers.show(a), Numbers.show(b));
        }
        return new double[] {a, b};
    }
}
