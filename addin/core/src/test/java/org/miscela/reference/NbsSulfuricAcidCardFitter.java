package org.miscela.reference;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Paths;
import java.util.Locale;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.QRDecomposition;

/**
 * Writes the sulfuric acid + water enthalpy card (test resource cards/sulfuric-acid-water-nbs.tsv): Redlich–Kister
 * A0..A2 of H^E = x1·x2·Σ A_k (x1 − x2)^k (x1 = acid) fitted by least squares (Householder QR) to the NBS integral
 * heats of solution for n = 1, 10, 50 and 100 mol water per mol acid. More dilute solutions (n = 500, 1000) follow
 * the square-root law of electrolytes, which a short polynomial cannot follow, so the card's validity stops at
 * n = 100. Run once; {@code SulfuricAcidEnthalpyTest} checks the committed card against the table.
 */
public final class NbsSulfuricAcidCardFitter {
    static final int POINTS = 4;
    static final int ORDER = 2;

    private NbsSulfuricAcidCardFitter() {
    }

    /** A0..A2 in kJ/mol. */
    static double[] fit() {
        double[][] design = new double[POINTS][ORDER + 1];
        double[] y = new double[POINTS];
        for (int i = 0; i < POINTS; i++) {
            double n = NbsSulfuricAcid.WATER_PER_ACID[i];
            double x1 = 1 / (1 + n);
            double d = 2 * x1 - 1;
            for (int k = 0; k <= ORDER; k++) {
                design[i][k] = x1 * (1 - x1) * Math.pow(d, k);
            }
            y[i] = NbsSulfuricAcid.heatOfSolution(i) / (1 + n); // H^E per mole of solution
        }
        return new QRDecomposition(new Array2DRowRealMatrix(design)).getSolver().solve(new ArrayRealVector(y))
                .toArray();
    }

    public static void main(String[] args) throws IOException {
        double[] a = fit();
        StringBuilder b = new StringBuilder();
        row(b, "Miscela card", "2");
        row(b, "title", "Sulfuric acid + water at 25 °C: heat of mixing");
        row(b, "source", "H^E: Redlich-Kister A0..A2 least-squares fit to the integral heats of solution of the NBS "
                + "tables (Wagman et al., J. Phys. Chem. Ref. Data 11, Suppl. 2, 1982) for 1 to 100 mol water per mol "
                + "acid at 298.15 K; acid density: CRC Handbook, 1.8305 g/cm3 at 20 C; water: Tanaka et al. 2001; "
                + "heat capacities from memory");
        row(b, "note", "No excess volume data: this card gives enthalpies, not volumes or densities.");
        row(b, "note", "Heat capacities (NBS values, from memory): H2SO4(l) 138.9, H2O(l) 75.29 J/(mol K).");
        row(b, "temperature unit", "°C");
        row(b, "density unit", "kg/m³");
        row(b, "molar volume unit", "cm³/mol");
        row(b, "molar mass unit", "g/mol");
        row(b, "enthalpy unit", "kJ/mol");
        row(b, "valid temperature", "24.5", "25.5");
        row(b, "component", "sulfuric acid", "98.072");
        row(b, "component", "water", "18.015");
        row(b, "density model", "sulfuric acid", "constant");
        row(b, "density coefficients", "sulfuric acid", "1830.5");
        row(b, "density model", "water", "Tanaka 2001");
        row(b, "heat capacity", "sulfuric acid", "0.1389");
        row(b, "heat capacity", "water", "0.07529");
        row(b, "valid mole fraction", "sulfuric acid", fmt(1 / 101.0), "0.5");
        for (int k = 0; k <= ORDER; k++) {
            row(b, "excess enthalpy A" + k, "sulfuric acid + water", fmt(a[k]));
        }
        Files.write(Paths.get("src/test/resources/cards/sulfuric-acid-water-nbs.tsv"),
                b.toString().getBytes(StandardCharsets.UTF_8));
        System.out.println(b);
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.10g", v);
    }

    private static void row(StringBuilder b, String... cells) {
        b.append(String.join("\t", cells)).append('\n');
    }
}
