package org.miscela.core.card;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Rewrites a card in °C as the same card in °F, following docs/card-format.md's rules and nothing of the reader: every
 * absolute temperature t becomes 1.8·t + 32 (NIST SP 811 (2008), B.9: t/°F = 1.8·t/°C + 32), and every coefficient
 * per degree to the power j (density and Redlich–Kister polynomials, ternary terms) is multiplied by (5/9)^j, a heat
 * capacity's by (5/9)^(j+1), a covariance entry by (5/9)^(j_p + j_q), since one degree Fahrenheit is 5/9 K. The
 * card then describes the same mixture, which {@code FahrenheitCardTest} checks through every function.
 *
 * <p>{@code main} writes test resources made this way (ethanol-water-oiml-fahrenheit.tsv, from the OIML card):
 * {@code java … FahrenheitCards ethanol-water-oiml.tsv <out.tsv> "<title>" "<words added to the source>"}.
 */
public final class FahrenheitCards {
    /** K per °F, exact. */
    static final double DEGREE = 5.0 / 9.0;

    private FahrenheitCards() {
    }

    /** t/°F from t/°C. */
    public static double fahrenheit(double celsius) {
        return 1.8 * celsius + 32.0;
    }

    /** The card in °C given as cells, written in °F (a new array; strings and layout kept). */
    public static Object[][] convert(Object[][] celsius) {
        Object[][] out = new Object[celsius.length][];
        // the power of (T − T_ref) of each coefficient of each excess set, for its covariance rows
        Map<String, TreeMap<Integer, Integer>> terms = new HashMap<>();
        for (Object[] row : celsius) {
            String label = label(row);
            if (label.matches("excess (volume|enthalpy) a\\d+")) {
                int k = Integer.parseInt(label.substring(label.lastIndexOf(" a") + 2));
                terms.computeIfAbsent(section(label) + "/" + pair(row), x -> new TreeMap<>()).put(k,
                        row.length - 2);
            }
        }
        Map<String, Integer> covarianceRow = new HashMap<>();
        for (int r = 0; r < celsius.length; r++) {
            Object[] row = celsius[r].clone();
            out[r] = row;
            String label = label(row);
            if (label.equals("temperature unit")) {
                if (!"°C".equals(row[1])) {
                    throw new IllegalArgumentException("not a card in °C: " + row[1]);
                }
                row[1] = "°F";
            } else if (label.equals("valid temperature")) {
                temperatures(row, 1);
            } else if (label.equals("valid pair temperature") || label.endsWith("reference temperature")) {
                temperatures(row, 2);
            } else if (label.equals("density coefficients") || label.matches("excess (volume|enthalpy) a\\d+")
                    || label.matches("excess (volume|enthalpy) ternary c\\d+")) {
                perDegree(row, 0);
            } else if (label.equals("heat capacity")) {
                perDegree(row, 1);
            } else if (label.matches("excess (volume|enthalpy) covariance")) {
                String key = section(label) + "/" + pair(row);
                int p = covarianceRow.merge(key, 1, Integer::sum) - 1;
                List<Integer> power = powers(terms.get(key));
                for (int q = 0; q < row.length - 2; q++) {
                    row[q + 2] = (Double) row[q + 2] * Math.pow(DEGREE, power.get(p) + power.get(q));
                }
            }
        }
        return out;
    }

    private static void temperatures(Object[] row, int first) {
        for (int i = first; i < row.length; i++) {
            if (row[i] instanceof Double) {
                row[i] = fahrenheit((Double) row[i]);
            }
        }
    }

    /** Value j (from column 2) times (5/9)^(j + extra). */
    private static void perDegree(Object[] row, int extra) {
        for (int i = 2; i < row.length; i++) {
            if (row[i] instanceof Double) {
                row[i] = (Double) row[i] * Math.pow(DEGREE, i - 2 + extra);
            }
        }
    }

    /** j of each parameter a_kj of a set, in the covariance's order a_00, a_01, …, a_10, …. */
    private static List<Integer> powers(TreeMap<Integer, Integer> countPerK) {
        List<Integer> out = new ArrayList<>();
        for (int count : countPerK.values()) {
            for (int j = 0; j < count; j++) {
                out.add(j);
            }
        }
        return out;
    }

    private static String label(Object[] row) {
        return row.length == 0 ? "" : String.valueOf(row[0]).trim().toLowerCase(java.util.Locale.ROOT);
    }

    private static String section(String label) {
        return label.startsWith("excess volume") ? "volume" : "enthalpy";
    }

    /** A pair's members as a set, whichever way round it is written. */
    private static String pair(Object[] row) {
        String[] members = String.valueOf(row[1]).toLowerCase(java.util.Locale.ROOT).split("\\+");
        for (int i = 0; i < members.length; i++) {
            members[i] = members[i].trim();
        }
        java.util.Arrays.sort(members);
        return String.join("+", members);
    }

    /** Writes the card as tab-separated rows, numbers as Java prints a double (they read back exactly). */
    static String tsv(Object[][] cells) {
        StringBuilder b = new StringBuilder();
        for (Object[] row : cells) {
            for (int i = 0; i < row.length; i++) {
                b.append(i == 0 ? "" : "\t").append(row[i] instanceof Double ? number((Double) row[i]) : row[i]);
            }
            b.append('\n');
        }
        return b.toString();
    }

    private static String number(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v) : Double.toString(v);
    }

    /** args: source resource, output file, title of the new card, words to append to its source. */
    public static void main(String[] args) throws IOException {
        Object[][] cells = convert(TestCards.cells(args[0]));
        for (Object[] row : cells) {
            if (label(row).equals("title")) {
                row[1] = args[2];
            } else if (label(row).equals("source")) {
                row[1] = row[1] + args[3];
            }
        }
        Files.write(Paths.get(args[1]), tsv(cells).getBytes(StandardCharsets.UTF_8));
    }
}
