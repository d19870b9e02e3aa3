package org.miscela.reference;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.miscela.core.card.Card;
import org.miscela.core.card.CardReader;
import org.miscela.core.fit.DeviationMeasure;
import org.miscela.core.fit.RedlichKisterFit;
import org.miscela.core.fit.RedlichKisterFitter;
import org.miscela.core.model.Component;

/**
 * Writes the library's cards of water with an organic liquid or a strong acid at one temperature: Redlich–Kister
 * coefficients fitted by the add-in's own fit engine to a published density table (reference/aqueous-densities.tsv,
 * where each row names its source), minimising density deviations, of the lowest order that meets every point
 * within 0.1 kg/m³ (twice the rounding of a table printed to 0.0001 g/cm³), or else of the order, up to
 * {@value #HIGHEST_ORDER} and four fewer than the points, that meets them best. (A sequential F-test stops too early
 * here: an odd coefficient that does not help ends it before an even one that does.) Water is Tanaka et al. 2001; the other liquid's density is the table's 100 % value or, where the
 * table stops short, the one named in {@link Spec#pureSource}. Run once from the repository root (no argument); the
 * cards go into the library's resources and their rows into its index. {@code LibraryCardsTest} holds each card to
 * an outside value it was not fitted to.
 */
public final class AqueousCardFitter {
    static final int HIGHEST_ORDER = 8;
    static final String CRC = "CRC Handbook 102nd ed. (2021) 'Concentrative Properties of Aqueous Solutions' (20 C)";
    static final double M_WATER = 2 * 1.008 + 15.999;

    /** One card: the liquid, its data set (solute name, temperature, source prefix) and its pure density. */
    static final class Spec {
        final String key;
        final String file;
        final String name;
        final double molarMass;
        final double celsius;
        final String sourcePrefix;
        final String sourceText;
        final double pureDensity;
        final String pureSource;
        final String check;
        /** A further note for the card's users, or "". */
        String note = "";

        Spec withNote(String text) {
            this.note = text;
            return this;
        }

        Spec(String key, String file, String name, double molarMass, double celsius, String sourcePrefix,
                String sourceText, double pureDensity, String pureSource, String check) {
            this.key = key;
            this.file = file;
            this.name = name;
            this.molarMass = molarMass;
            this.celsius = celsius;
            this.sourcePrefix = sourcePrefix;
            this.sourceText = sourceText;
            this.pureDensity = pureDensity;
            this.pureSource = pureSource;
            this.check = check;
        }
    }

    private static final String CRC_TEXT = "CRC Handbook of Chemistry and Physics, 102nd ed. (2021), Concentrative "
            + "Properties of Aqueous Solutions, 20 °C (as transcribed in amosonabike/CRC-Solution-Properties-)";

    /** Molar masses from the CIAAW 2021 abridged standard atomic weights: C 12.011, H 1.008, O 15.999, S 32.06. */
    static final List<Spec> SPECS = List.of(
        new Spec("methanol + water", "methanol-water-crc.tsv", "methanol", 12.011 + 4 * 1.008 + 15.999, 20, CRC,
                CRC_TEXT, Double.NaN, "the table's 100 % value",
                "partial molar volume of methanol at infinite dilution"),
        new Spec("ethylene glycol + water", "ethylene-glycol-water-crc.tsv", "ethylene glycol",
                2 * 12.011 + 6 * 1.008 + 2 * 15.999, 20, CRC, CRC_TEXT, 1.315 / Math.pow(0.25125, 1
                        + Math.pow(1 - 293.15 / 720, 0.21868)) * (2 * 12.011 + 6 * 1.008 + 2 * 15.999),
                "Perry's Chemical Engineers' Handbook, 8th ed., Table 2-32 (DIPPR 105: C1 = 1.315, C2 = 0.25125, "
                        + "C3 = 720 K, C4 = 0.21868) at 20 °C, the table stopping at 60 %",
                "partial molar volume of ethylene glycol at infinite dilution"),
        new Spec("glycerol + water", "glycerol-water-crc.tsv", "glycerol", 3 * 12.011 + 8 * 1.008 + 3 * 15.999, 20,
                CRC, CRC_TEXT, Double.NaN, "the table's 100 % value", "Bosart and Snoddy's 20 °C densities"),
        new Spec("2-propanol + water", "2-propanol-water-crc.tsv", "2-propanol", 3 * 12.011 + 8 * 1.008 + 15.999, 20,
                CRC, CRC_TEXT, Double.NaN, "the table's 100 % value",
                "partial molar volume of 2-propanol at infinite dilution").withNote("Partial molar volumes below 20 %"
                        + " are uncertain: the table has nothing below 1 % or between 20 and 40 %; at infinite dilution "
                        + "the card gives 74.1 cm³/mol for 2-propanol, 2.2 above the 71.93 published for 25 °C."),
        new Spec("acetic acid + water", "acetic-acid-water-crc.tsv", "acetic acid", 2 * 12.011 + 4 * 1.008
                + 2 * 15.999, 20, CRC, CRC_TEXT, Double.NaN, "the table's 100 % value",
                "partial molar volume of acetic acid at infinite dilution"),
        new Spec("sulfuric acid + water, whole range at 20 °C", "sulfuric-acid-water-crc-whole-range.tsv",
                "sulfuric acid", 2 * 1.008 + 32.06 + 4 * 15.999, 20, CRC, CRC_TEXT, Double.NaN,
                "the table's 100 % value", "the Laliberté–Cooper card at 20 °C up to 78 %"),
        new Spec("propylene glycol + water", "propylene-glycol-water-nakanishi.tsv", "propylene glycol",
                3 * 12.011 + 8 * 1.008 + 2 * 15.999, 25, "Nakanishi, Kato, Maruyama",
                "K. Nakanishi, N. Kato, M. Maruyama, J. Phys. Chem. 71 (1967) 814, 25 °C (as transcribed in "
                        + "soeeol/SPIV-PLIF, fluidprop/fluidprop.m)", Double.NaN, "the paper's 100 % value",
                "partial molar volume of propylene glycol at infinite dilution"));

    private AqueousCardFitter() {
    }

    /** (mass fraction, density kg/m³) of a spec's data set, in the table's order. */
    static double[][] data(Spec s) {
        List<double[]> out = new ArrayList<>();
        try (InputStream in = AqueousCardFitter.class.getResourceAsStream("/reference/aqueous-densities.tsv")) {
            for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n")) {
                String[] f = line.split("\t", -1);
                if (line.startsWith("#") || f.length < 5 || !f[0].equals(s.name) || !f[4].startsWith(s.sourcePrefix)
                        || Double.parseDouble(f[2]) != s.celsius) {
                    continue;
                }
                out.add(new double[] {Double.parseDouble(f[1]) / 100, 1000 * Double.parseDouble(f[3])});
            }
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
        return out.toArray(new double[0][]);
    }

    static double moleFraction(Spec s, double w) {
        double n = w / s.molarMass;
        return n / (n + (1 - w) / M_WATER);
    }

    /** The pure liquid's density: the data's 100 % point, or the spec's own. */
    static double pureDensity(Spec s) {
        if (!Double.isNaN(s.pureDensity)) {
            return s.pureDensity;
        }
        for (double[] p : data(s)) {
            if (p[0] == 1.0) {
                return p[1];
            }
        }
        throw new IllegalStateException(s.key + ": no 100 % point");
    }

    static Component[] components(Spec s) {
        Object[][] cells = {
            {"Miscela card", 1.0}, {"source", "components only"}, {"temperature unit", "°C"},
            {"density unit", "kg/m³"}, {"molar volume unit", "cm³/mol"}, {"molar mass unit", "g/mol"},
            {"valid temperature", 0.0, 40.0}, {"component", s.name, s.molarMass}, {"component", "water", M_WATER},
            {"density model", s.name, "constant"}, {"density coefficients", s.name, pureDensity(s)},
            {"density model", "water", "Tanaka 2001"}, {"valid mole fraction", s.name, 0.0, 1.0},
            {"excess volume A0", s.name + " + water", 0.0}};
        Card card = CardReader.read(cells);
        return new Component[] {card.components().get(0), card.components().get(1)};
    }

    static RedlichKisterFit fit(Spec s, int order) {
        List<double[]> points = new ArrayList<>();
        for (double[] p : data(s)) {
            if (p[0] > 0 && p[0] < 1) {
                points.add(p);
            }
        }
        double[] x = new double[points.size()];
        double[] rho = new double[points.size()];
        for (int i = 0; i < x.length; i++) {
            x[i] = moleFraction(s, points.get(i)[0]);
            rho[i] = points.get(i)[1];
        }
        Component[] c = components(s);
        return RedlichKisterFitter.densities(x, rho, c[0], c[1], s.celsius + 273.15, order, DeviationMeasure.DENSITY,
                null);
    }

    /** The largest |ρ(card) − ρ(table)| of a fit of this order over the data's points, kg/m³. */
    static double largestDeviation(Spec s, int order) {
        Card card = CardReader.read(cells(card(s, order)));
        double worst = 0;
        for (double[] p : data(s)) {
            if (p[0] > 0 && p[0] < 1) {
                double x = moleFraction(s, p[0]);
                worst = Math.max(worst, Math.abs(card.mixture().density(new double[] {x, 1 - x}, s.celsius + 273.15)
                        - p[1]));
            }
        }
        return worst;
    }

    static int order(Spec s) {
        int highest = Math.min(HIGHEST_ORDER, data(s).length - 4);
        int best = 0;
        for (int m = 0; m <= highest; m++) {
            double d = largestDeviation(s, m);
            if (d <= 0.1) {
                return m;
            }
            if (d < largestDeviation(s, best)) {
                best = m;
            }
        }
        return best;
    }

    static Object[][] cells(String tsv) {
        List<Object[]> rows = new ArrayList<>();
        for (String line : tsv.split("\n")) {
            String[] f = line.split("\t", -1);
            Object[] r = new Object[f.length];
            for (int i = 0; i < f.length; i++) {
                try {
                    r[i] = Double.valueOf(f[i]);
                } catch (NumberFormatException e) {
                    r[i] = f[i];
                }
            }
            rows.add(r);
        }
        return rows.toArray(new Object[0][]);
    }

    /** The highest mass fraction of the data set (the card's validity stops there). */
    static double highestFraction(Spec s) {
        double w = 0;
        for (double[] p : data(s)) {
            w = Math.max(w, p[0]);
        }
        return w;
    }

    static String card(Spec s) {
        int order = order(s);
        return card(s, order, largestDeviation(s, order));
    }

    static String card(Spec s, int order) {
        return card(s, order, Double.NaN);
    }

    private static String card(Spec s, int order, double worst) {
        double[][] a = fit(s, order).coefficients();
        double wMax = highestFraction(s);
        String t = String.format(Locale.ROOT, "%.0f", s.celsius);
        // version 2: MIX.LIBRARYCARD adds a 'card size' row, a version 2 row
        TsvCard b = new TsvCard()
                .row("Miscela card", "2")
                .row("title", String.format(Locale.ROOT, "%s + water at %s °C, densities 0 to %.0f %% w/w",
                        Character.toUpperCase(s.name.charAt(0)) + s.name.substring(1), t, 100 * wMax))
                .row("source", "Densities: " + s.sourceText + ", " + data(s).length + " points; Redlich-Kister A0..A"
                        + order + " least-squares fit to them by Miscela's fit engine, "
                        + String.format(Locale.ROOT, "largest deviation %.2f kg/m3", worst) + "; "
                        + s.name + ": " + s.pureSource + "; water: Tanaka et al., Metrologia 38 (2001) 301; molar "
                        + "masses from the CIAAW 2021 abridged standard atomic weights")
                .row("note", "Data at " + t + " °C only: the temperature range is a tolerance for readings near "
                        + t + " °C, with constant coefficients and pure densities." + (s.note.isEmpty() ? ""
                                : " " + s.note))
                .row("temperature unit", "°C")
                .row("density unit", "kg/m³")
                .row("molar volume unit", "cm³/mol")
                .row("molar mass unit", "g/mol")
                .row("component", s.name, round(s.molarMass))
                .row("component", "water", round(M_WATER))
                .row("density model", s.name, "constant")
                .row("density coefficients", s.name, pureDensity(s))
                .row("density model", "water", "Tanaka 2001");
        for (int k = 0; k < a.length; k++) {
            b.row("excess volume A" + k, s.name + " + water", a[k][0]);
        }
        return b.row("valid temperature", String.format(Locale.ROOT, "%.1f", s.celsius - 0.5),
                        String.format(Locale.ROOT, "%.1f", s.celsius + 0.5))
                // rounded up, so the table's last strength itself is inside
                .row("valid mole fraction", s.name, "0", Math.ceil(moleFraction(s, wMax) * 1e9) / 1e9)
                .row("extrapolation", "refuse")
                .text();
    }

    private static String round(double v) {
        return String.format(Locale.ROOT, "%.3f", v);
    }

    public static void main(String[] args) throws IOException {
        Path library = Path.of("addin/core/src/main/resources/org/miscela/core/library");
        for (Spec s : SPECS) {
            int order = order(s);
            System.out.printf("%s: %d points, order %d, largest deviation %.3f kg/m³%n", s.key, data(s).length, order,
                    largestDeviation(s, order));
            TsvCard.write(library.resolve(s.file).toString(), card(s));
        }
    }
}
