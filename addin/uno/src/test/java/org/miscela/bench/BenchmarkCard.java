package org.miscela.bench;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.BiFunction;
import java.util.function.IntFunction;

/**
 * The benchmark's card: three invented liquids L, M, N (invented values, no real substances) with temperature-
 * dependent polynomial densities, temperature-dependent Redlich–Kister coefficients for every pair and a ternary
 * term; 41 rows × 8 columns, so every call hands the add-in a realistically sized range. It also writes the same
 * density arithmetic as a native inline formula and as a Basic function, reading the same card cells, so the three
 * can be timed side by side and checked against each other.
 */
final class BenchmarkCard {
    static final int COLUMNS = 8;
    static final int COMPONENTS = 3;

    private final List<Object[]> rows = new ArrayList<>();
    /** Card row (0-based) of each component's molar mass, density reference temperature and coefficients. */
    private final int[] molarMassRow = new int[COMPONENTS];
    private final int[] densityReferenceRow = new int[COMPONENTS];
    private final int[] densityRow = new int[COMPONENTS];
    private final int[][] pairs = {{0, 1}, {0, 2}, {1, 2}};
    private final int[] pairReferenceRow = new int[3];
    /** Per pair, the card rows of A0, A1, … */
    private final int[][] pairCoefficientRows = new int[3][];
    private int ternaryReferenceRow;
    private int[] ternaryRows;
    private final double[][] densityCoefficients = {
        {789.3, -0.84, -1.1e-3, 2.0e-6, -3.0e-8, 1.0e-10},
        {998.2, -0.207, -4.8e-3, 1.4e-5, -2.0e-8, 1.0e-11},
        {803.5, -0.79, -9.0e-4, 1.5e-6, -2.0e-8, 5.0e-11}};
    private final double[][][] pairCoefficients = {
        {{-1.05, 3.0e-3, -2.0e-5, 1.0e-7}, {0.32, -1.0e-3, 1.0e-5}, {-0.21, 5.0e-4}, {0.08}},
        {{-0.62, 2.0e-3, 1.0e-5}, {0.11, -4.0e-4}, {-0.05}},
        {{-0.88, 2.5e-3, -1.0e-5}, {0.27, -6.0e-4}, {-0.09, 2.0e-4}}};
    private final double[][] ternaryCoefficients = {{0.45, -2.0e-3}, {0.12}, {-0.08}};

    BenchmarkCard() {
        String[] names = {"L", "M", "N"};
        double[] molarMass = {46.07, 18.015, 60.10};
        row("Miscela card", 2.0);
        row("title", "Benchmark card: three invented liquids L, M, N");
        row("source", "invented values, for benchmarking only: no real substances");
        row("temperature unit", "°C");
        row("density unit", "kg/m³");
        row("molar volume unit", "cm³/mol");
        row("molar mass unit", "g/mol");
        row("valid temperature", 0.0, 60.0);
        row("multicomponent model", "Muggianu");
        for (int i = 0; i < COMPONENTS; i++) {
            molarMassRow[i] = row("component", names[i], molarMass[i]);
        }
        for (int i = 0; i < COMPONENTS; i++) {
            row("density model", names[i], "polynomial");
            densityReferenceRow[i] = row("density reference temperature", names[i], 20.0);
            densityRow[i] = row("density coefficients", names[i], densityCoefficients[i]);
            row("valid mole fraction", names[i], 0.0, 1.0);
        }
        for (int p = 0; p < pairs.length; p++) {
            String pair = names[pairs[p][0]] + " + " + names[pairs[p][1]];
            pairReferenceRow[p] = row("excess volume reference temperature", pair, 25.0);
            pairCoefficientRows[p] = new int[pairCoefficients[p].length];
            for (int k = 0; k < pairCoefficients[p].length; k++) {
                pairCoefficientRows[p][k] = row("excess volume A" + k, pair, pairCoefficients[p][k]);
            }
        }
        ternaryReferenceRow = row("excess volume reference temperature", "L + M + N", 25.0);
        ternaryRows = new int[ternaryCoefficients.length];
        for (int m = 0; m < ternaryCoefficients.length; m++) {
            ternaryRows[m] = row("excess volume ternary C" + m, "L + M + N", ternaryCoefficients[m]);
        }
        row("extrapolation", "refuse");
    }

    private int row(String label, Object... values) {
        List<Object> r = new ArrayList<>();
        r.add(label);
        for (Object v : values) {
            if (v instanceof double[]) {
                for (double d : (double[]) v) {
                    r.add(d);
                }
            } else {
                r.add(v);
            }
        }
        Object[] cells = new Object[COLUMNS];
        Arrays.fill(cells, "");
        for (int i = 0; i < r.size(); i++) {
            cells[i] = r.get(i);
        }
        rows.add(cells);
        return rows.size() - 1;
    }

    /** The card's cells, {@link #COLUMNS} wide (blank cells as empty text). */
    Object[][] cells() {
        return rows.toArray(new Object[0][]);
    }

    int rowCount() {
        return rows.size();
    }

    /**
     * The card's density in kg/m³ at the composition and temperature given as expressions, as one arithmetic
     * expression over card cells; {@code cell.apply(row, column)} (0-based) names a card cell in the target language,
     * {@code x.apply(i)} the mole fraction of component i and {@code t} the temperature in °C. The arithmetic is the
     * card format's: polynomial densities about their reference temperature, each pair's A_k(T) polynomial times
     * x_i·x_j·(x_i − x_j)^k (Muggianu: the binary form applied to the ternary mole fractions), the ternary term
     * x_L·x_M·x_N·(C0 + C1·x_L + C2·x_M), and ρ = Σ x_i·M_i / (Σ x_i·M_i/ρ_i + V^E), with 1000 for g/cm³ to kg/m³.
     */
    String densityExpression(BiFunction<Integer, Integer, String> cell, IntFunction<String> x, String t) {
        StringBuilder mass = new StringBuilder();
        StringBuilder ideal = new StringBuilder();
        for (int i = 0; i < COMPONENTS; i++) {
            String m = cell.apply(molarMassRow[i], 2);
            String dt = "(" + t + "-" + cell.apply(densityReferenceRow[i], 2) + ")";
            String rho = horner(cell, densityRow[i], densityCoefficients[i].length, dt);
            mass.append(i > 0 ? "+" : "").append(x.apply(i)).append("*").append(m);
            ideal.append(i > 0 ? "+" : "").append(x.apply(i)).append("*").append(m).append("/").append(rho);
        }
        StringBuilder excess = new StringBuilder();
        for (int p = 0; p < pairs.length; p++) {
            String xi = x.apply(pairs[p][0]);
            String xj = x.apply(pairs[p][1]);
            String dt = "(" + t + "-" + cell.apply(pairReferenceRow[p], 2) + ")";
            String d = "(" + xi + "-" + xj + ")";
            // A0 + d·(A1 + d·(A2 + …)), each A_k a Horner polynomial in (T − T_ref)
            StringBuilder series = new StringBuilder();
            int orders = pairCoefficientRows[p].length;
            for (int k = 0; k < orders; k++) {
                String a = horner(cell, pairCoefficientRows[p][k], pairCoefficients[p][k].length, dt);
                series.append(k > 0 ? "+" + d + "*(" : "").append(a);
            }
            for (int k = 1; k < orders; k++) {
                series.append(")");
            }
            excess.append(p > 0 ? "+" : "").append(xi).append("*").append(xj).append("*(").append(series).append(")");
        }
        String dtt = "(" + t + "-" + cell.apply(ternaryReferenceRow, 2) + ")";
        excess.append("+").append(x.apply(0)).append("*").append(x.apply(1)).append("*").append(x.apply(2))
                .append("*(").append(horner(cell, ternaryRows[0], ternaryCoefficients[0].length, dtt))
                .append("+").append(horner(cell, ternaryRows[1], ternaryCoefficients[1].length, dtt)).append("*")
                .append(x.apply(0)).append("+").append(horner(cell, ternaryRows[2], ternaryCoefficients[2].length, dtt))
                .append("*").append(x.apply(1)).append(")");
        return "1000*(" + mass + ")/(1000*(" + ideal + ")+" + excess + ")";
    }

    /** c0 + v·(c1 + v·(c2 + …)) over the values of a card row, starting in column 3 (index 2). */
    private static String horner(BiFunction<Integer, Integer, String> cell, int row, int count, String v) {
        StringBuilder s = new StringBuilder();
        for (int j = 0; j < count; j++) {
            s.append(j > 0 ? "+" + v + "*(" : "(").append(cell.apply(row, 2 + j));
        }
        for (int j = 1; j < count; j++) {
            s.append(")");
        }
        return s.append(")").toString();
    }

    /** The density as a native Calc formula for data row {@code row} (1-based): x in A:C, temperature in D. */
    String nativeFormula(String cardSheet, int row) {
        return "=" + densityExpression((r, c) -> "$" + cardSheet + ".$" + (char) ('A' + c) + "$" + (r + 1),
                i -> String.valueOf((char) ('A' + i)) + row, "D" + row);
    }

    /** A Basic module with the function {@code name(card, x1, x2, x3, t)} computing the same density from the card. */
    String basicModule(String name) {
        String body = densityExpression((r, c) -> "card(" + (r + 1) + ", " + (c + 1) + ")", i -> "x" + (i + 1), "t");
        StringBuilder s = new StringBuilder();
        s.append("REM The benchmark card's density, the same arithmetic as the native inline formula.\n");
        s.append("Function ").append(name).append("(card, x1, x2, x3, t) As Double\n");
        // Calc passes a range as a 1-based two-dimensional array
        s.append("    ").append(name).append(" = ").append(body).append("\n");
        s.append("End Function\n");
        return s.toString();
    }
}
