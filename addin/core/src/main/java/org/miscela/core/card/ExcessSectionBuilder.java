package org.miscela.core.card;

import org.miscela.core.model.ExcessFunction;
import org.miscela.core.model.GeometricModel;
import org.miscela.core.model.RedlichKister;
import org.miscela.core.model.TernaryTerm;
import org.miscela.core.problem.Numbers;
import org.miscela.core.problem.Problem;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Builds one excess-property section of a card ("excess volume" or "excess enthalpy") into an
 * {@link ExcessFunction}: every pair's Redlich–Kister set (a missing pair is an error unless the card says
 * 'missing pairs | ideal'), its coefficient covariance, and the optional ternary terms, in internal units and the
 * card's component order.
 */
final class ExcessSectionBuilder {
    private final ParsedCard.Section rows;
    private final String prefix;
    private final Subjects subjects;
    private final Units.Temperature temperature;
    /** Internal units per card unit of the section's property. */
    private final double factor;

    ExcessSectionBuilder(ParsedCard.Section rows, Subjects subjects, Units.Temperature temperature, double factor) {
        this.rows = rows;
        this.prefix = rows.prefix;
        this.subjects = subjects;
        this.temperature = temperature;
        this.factor = factor;
    }

    ExcessFunction build(GeometricModel model, int asymmetric, boolean missingIdeal) {
        int n = subjects.size();
        // The first row of a pair (or triple), in card order, fixes the order it is written in.
        Map<String, CardRow> orientation = new HashMap<>();
        for (CardRow r : rows.rows()) {
            checkOrder(r, subjects.members(r, CardLabels.subjectSize(r.key)), orientation);
        }
        Map<String, Double> reference = new HashMap<>();
        Map<String, CardRow> referenceRow = new HashMap<>();
        for (CardRow r : rows.reference) {
            String key = Subjects.setKey(subjects.members(r));
            r.atMost(2);
            reference.put(key, temperature.toKelvin(r.number(1)));
            CardRow before = referenceRow.put(key, r);
            if (before != null) {
                throw Problem.DUPLICATE_ROW.raise(r.number, r.label, before.number);
            }
        }
        Map<String, TreeMap<Integer, double[]>> binary = coefficients(rows.binary, 2, true);
        Map<String, TreeMap<Integer, double[]>> ternary = coefficients(rows.ternary, 3, false);
        Map<String, List<CardRow>> covarianceRows = new LinkedHashMap<>();
        for (CardRow r : rows.covariance) {
            covarianceRows.computeIfAbsent(Subjects.setKey(subjects.members(r, 2)), k -> new ArrayList<>()).add(r);
        }
        RedlichKister[][] pairs = new RedlichKister[n][n];
        double[][][][] covariance = new double[n][n][][];
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                String key = Subjects.setKey(i, j);
                TreeMap<Integer, double[]> ks = binary.get(key);
                String pairName = subjects.joined(i, j);
                if (ks == null) {
                    if (referenceRow.containsKey(key)) {
                        throw Problem.MISSING_PAIR_ROW.raise(prefix + CardLabels.REFERENCE_SUFFIX, pairName,
                                prefix + " A0");
                    }
                    if (!missingIdeal) {
                        throw Problem.MISSING_PAIR.raise(prefix, subjects.name(i), subjects.name(j), prefix);
                    }
                    continue;
                }
                double[][] a = withoutGaps(ks, prefix + " A", pairName);
                pairs[i][j] = new RedlichKister(referenceFor(reference, key, a, pairName), a);
                List<CardRow> cov = covarianceRows.remove(key);
                if (cov != null) {
                    covariance[i][j] = covariance(cov, a, pairName);
                }
            }
        }
        for (List<CardRow> orphan : covarianceRows.values()) {
            throw Problem.MISSING_PAIR_ROW.raise(prefix + " covariance", orphan.get(0).text(0).trim(),
                    prefix + " A0");
        }
        List<TernaryTerm> terms = new ArrayList<>();
        for (Map.Entry<String, TreeMap<Integer, double[]>> e : ternary.entrySet()) {
            int[] t = subjects.members(orientation.get(e.getKey()));
            String tripleName = subjects.joined(t);
            double[][] c = withoutGaps(e.getValue(), prefix + " ternary C", tripleName);
            terms.add(new TernaryTerm(t[0], t[1], t[2], referenceFor(reference, e.getKey(), c, tripleName), c));
        }
        for (Map.Entry<String, CardRow> e : referenceRow.entrySet()) {
            if (subjects.members(e.getValue()).length == 3 && !ternary.containsKey(e.getKey())) {
                throw Problem.MISSING_PAIR_ROW.raise(prefix + CardLabels.REFERENCE_SUFFIX,
                        e.getValue().text(0).trim(), prefix + " ternary C0");
            }
        }
        return new ExcessFunction(n, model, asymmetric, pairs, terms, covariance);
    }

    /** The first row of a pair or triple (in card order) fixes its order; later rows must agree. */
    private void checkOrder(CardRow r, int[] p, Map<String, CardRow> orientation) {
        CardRow first = orientation.putIfAbsent(Subjects.setKey(p), r);
        if (first != null && !java.util.Arrays.equals(subjects.members(first), p)) {
            throw Problem.PAIR_ORDER.raise(r.number, r.label, r.text(0).trim(), first.text(0).trim(), first.number);
        }
    }

    /**
     * Coefficient rows of one kind, per pair or triple (keyed by its member set) and index, converted to internal
     * units and, for pairs, to the card's component order (A_k → (−1)^k A_k when written the other way round).
     * Triples keep the order of their first row, so they need no conversion.
     */
    private Map<String, TreeMap<Integer, double[]>> coefficients(TreeMap<Integer, List<CardRow>> byIndex, int size,
            boolean toCardOrder) {
        Map<String, TreeMap<Integer, double[]>> out = new LinkedHashMap<>();
        Map<String, CardRow> seen = new HashMap<>();
        for (Map.Entry<Integer, List<CardRow>> e : byIndex.entrySet()) {
            int k = e.getKey();
            for (CardRow r : e.getValue()) {
                int[] p = subjects.members(r, size);
                String key = Subjects.setKey(p);
                double[] c = r.numbersFrom(1);
                double sign = toCardOrder && p[0] > p[1] && k % 2 == 1 ? -1.0 : 1.0;
                for (int j = 0; j < c.length; j++) {
                    c[j] = temperature.toPerKelvin(c[j] * sign * factor, j);
                }
                out.computeIfAbsent(key, x -> new TreeMap<>()).put(k, c);
                CardRow before = seen.put(key + "/" + k, r);
                if (before != null) {
                    throw Problem.DUPLICATE_ROW.raise(r.number, r.label, before.number);
                }
            }
        }
        return out;
    }

    /** The coefficients 0..last in order; a missing one between them is refused. */
    private static double[][] withoutGaps(TreeMap<Integer, double[]> ks, String label, String subject) {
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
    private double referenceFor(Map<String, Double> reference, String key, double[][] a, String subject) {
        Double tRef = reference.get(key);
        if (tRef != null) {
            return tRef;
        }
        for (double[] row : a) {
            if (row.length > 1) {
                throw Problem.MISSING_PAIR_ROW.raise(prefix + " coefficient", subject,
                        prefix + CardLabels.REFERENCE_SUFFIX);
            }
        }
        return 298.15; // irrelevant: every coefficient is a constant
    }

    /**
     * A pair's coefficient covariance, one row per coefficient in the order a_00, a_01, …, a_10, … (each A_k's
     * temperature terms in turn), converted to the card's component order and to internal units (entry (p, q) is per
     * degree to the power j_p + j_q).
     */
    private double[][] covariance(List<CardRow> rows, double[][] a, String pairName) {
        double squared = factor * factor;
        int size = 0;
        for (double[] row : a) {
            size += row.length;
        }
        int[] k = new int[size]; // the A_k each parameter belongs to
        int[] power = new int[size]; // and its power of the temperature difference
        for (int kk = 0, q = 0; kk < a.length; kk++) {
            for (int j = 0; j < a[kk].length; j++) {
                power[q] = j;
                k[q++] = kk;
            }
        }
        CardRow first = rows.get(0);
        if (rows.size() != size) {
            throw Problem.COVARIANCE_SIZE.raise(first.number, first.label, pairName, size, size, size,
                    rows.size() + " row(s)");
        }
        int[] p = subjects.members(first, 2);
        boolean reversed = p[0] > p[1];
        double[][] c = new double[size][];
        for (int r = 0; r < size; r++) {
            CardRow row = rows.get(r);
            c[r] = row.numbersFrom(1);
            if (c[r].length != size) {
                throw Problem.COVARIANCE_SIZE.raise(row.number, row.label, pairName, size, size, size,
                        c[r].length + " value(s) in this row");
            }
            for (int q = 0; q < size; q++) {
                double sign = reversed && (k[r] + k[q]) % 2 == 1 ? -1.0 : 1.0;
                c[r][q] = temperature.toPerKelvin(c[r][q] * sign * squared, power[r] + power[q]);
            }
        }
        for (int r = 0; r < size; r++) {
            if (c[r][r] < 0) {
                CardRow row = rows.get(r);
                throw Problem.COVARIANCE_NEGATIVE.raise(row.number, row.label, r + 1, Numbers.show(c[r][r]));
            }
            for (int q = 0; q < r; q++) {
                double tolerance = 1e-9 * Math.sqrt(c[r][r] * c[q][q]);
                if (!(Math.abs(c[r][q] - c[q][r]) <= tolerance)) {
                    CardRow row = rows.get(r);
                    int j = power[r] + power[q];
                    throw Problem.COVARIANCE_NOT_SYMMETRIC.raise(row.number, row.label, r + 1, q + 1,
                            Numbers.show(temperature.fromPerKelvin(c[r][q], j) / squared), q + 1, r + 1,
                            Numbers.show(temperature.fromPerKelvin(c[q][r], j) / squared));
                }
            }
        }
        return c;
    }
}
