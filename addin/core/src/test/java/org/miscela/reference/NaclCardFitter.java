package org.miscela.reference;

import java.io.IOException;
import org.miscela.core.card.Card;
import org.miscela.core.card.CardReader;
import org.miscela.core.model.Component;
import org.miscela.core.fit.DeviationMeasure;
import org.miscela.core.fit.RedlichKisterFit;
import org.miscela.core.fit.RedlichKisterFitter;

/**
 * Writes the sodium chloride + water card (test resource cards/sodium-chloride-water-crc.tsv), fitted by the
 * library's fit engine to the densities of the CRC table after Rogers and Pitzer (1982), {@link RogersPitzerNaCl}:
 * 9 molalities (0.1–5 mol/kg) × 6 temperatures (0–40 °C), 54 points, minimising density deviations.
 *
 * <p>Representation: water by the card's built-in Tanaka 2001 model; NaCl as a hypothetical liquid component of
 * constant density 2165 kg/m³, the crystal's density (from memory; the CRC Handbook lists 2.17 g/cm³). That pure
 * volume is only the reference of the Redlich–Kister expansion: the card is valid for x(NaCl) up to 5 mol/kg, where
 * the excess volume takes up the difference, and it is never evaluated near pure NaCl. The dilute-solution
 * square-root law cannot be followed by a polynomial in x, so A0..A6 (each cubic in t − 25 °C) are needed; the
 * condition number of the scaled design stays below the fit engine's limit. The fit reaches 0.012 kg/m³ (1.2e-5
 * relative) at worst on the table's points. Below 0.1 mol/kg there are no data: the card interpolates to pure water.
 * Run once (argument: the output path); {@code SodiumChlorideCardTest} checks the committed card against the table.
 */
public final class NaclCardFitter {
    static final int ORDER_X = 6;
    static final int ORDER_T = 3;
    static final double REFERENCE_KELVIN = 298.15;
    /** Hypothetical liquid NaCl: the crystal's density, kg/m³ (from memory). */
    static final double NACL_DENSITY = 2165.0;

    private NaclCardFitter() {
    }

    /** The pure components as a card reads them (water by the built-in Tanaka 2001 model). */
    static Component[] components() {
        Object[][] cells = {
            {"Miscela card", 1.0}, {"source", "components only"}, {"temperature unit", "K"},
            {"density unit", "kg/m³"}, {"molar volume unit", "cm³/mol"}, {"molar mass unit", "g/mol"},
            {"valid temperature", 273.15, 313.15},
            {"component", "sodium chloride", RogersPitzerNaCl.M_NACL}, {"component", "water", RogersPitzerNaCl.M_WATER},
            {"density model", "sodium chloride", "constant"}, {"density coefficients", "sodium chloride", NACL_DENSITY},
            {"density model", "water", "Tanaka 2001"}, {"valid mole fraction", "sodium chloride", 0.0, 1.0},
            {"excess volume A0", "sodium chloride + water", 0.0}};
        Card card = CardReader.read(cells);
        return new Component[] {card.components().get(0), card.components().get(1)};
    }

    static RedlichKisterFit fit() {
        int rows = RogersPitzerNaCl.CELSIUS.length;
        int cols = RogersPitzerNaCl.MOLALITY.length;
        double[] x = new double[rows * cols];
        double[] kelvin = new double[x.length];
        double[] rho = new double[x.length];
        for (int i = 0; i < rows; i++) {
            for (int j = 0; j < cols; j++) {
                int p = i * cols + j;
                x[p] = RogersPitzerNaCl.moleFraction(RogersPitzerNaCl.MOLALITY[j]);
                kelvin[p] = RogersPitzerNaCl.CELSIUS[i] + 273.15;
                rho[p] = RogersPitzerNaCl.density(i, j);
            }
        }
        Component[] c = components();
        return RedlichKisterFitter.densities(x, kelvin, rho, c[0], c[1], ORDER_X, ORDER_T, REFERENCE_KELVIN,
                DeviationMeasure.DENSITY, null);
    }

    static String card() {
        double[][] a = fit().coefficients();
        TsvCard b = new TsvCard()
                .row("Miscela card", "1")
                .row("title", "Sodium chloride + water, 0-40 °C, fitted to the CRC table after Rogers and Pitzer")
                .row("source", "Densities: CRC Handbook, Volumetric Properties of Aqueous Sodium Chloride Solutions, "
                        + "after P. S. Z. Rogers, K. S. Pitzer, J. Phys. Chem. Ref. Data 11, 15 (1982), 0.1-5 mol/kg, "
                        + "0-40 C; Redlich-Kister A0..A" + ORDER_X + ", each cubic in (t - 25), least-squares fit to "
                        + "those densities; water: Tanaka et al. 2001; NaCl: hypothetical liquid at the crystal density "
                        + "2165 kg/m3 (from memory), a reference only; molar masses CIAAW 2021 abridged")
                .row("note", "Valid up to 5 mol/kg (x = 0.0826); below 0.1 mol/kg the card interpolates to pure water.")
                .row("temperature unit", "°C")
                .row("density unit", "kg/m³")
                .row("molar volume unit", "cm³/mol")
                .row("molar mass unit", "g/mol")
                .row("component", "sodium chloride", RogersPitzerNaCl.M_NACL)
                .row("component", "water", RogersPitzerNaCl.M_WATER)
                .row("density model", "sodium chloride", "constant")
                .row("density coefficients", "sodium chloride", NACL_DENSITY)
                .row("density model", "water", "Tanaka 2001")
                .row("excess volume reference temperature", "sodium chloride + water", "25");
        for (int k = 0; k < a.length; k++) {
            b.row("excess volume A" + k, "sodium chloride + water", a[k]);
        }
        return b.row("valid temperature", "0", "40")
                .row("valid mole fraction", "sodium chloride", "0", RogersPitzerNaCl.moleFraction(5.0))
                .row("extrapolation", "refuse")
                .text();
    }

    public static void main(String[] args) throws IOException {
        RedlichKisterFit f = fit();
        System.out.println("condition number " + f.leastSquares().conditionNumber());
        TsvCard.write(args[0], card());
    }
}
