package org.miscela.reference;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.miscela.core.fit.RedlichKisterFit;
import org.miscela.core.fit.RedlichKisterFitter;

/**
 * Writes the ethanol + water phase-equilibrium test card (cards/ethanol-water-vle.tsv): G^E/RT as Redlich–Kister
 * A0..A{@value #ORDER}, each linear in T about 50 °C, fitted by the add-in's fit engine to G^E/RT = x1·ln γ1 +
 * x2·ln γ2 from two published data sets by modified Raoult's law (γ_i = y_i·p/(x_i·p_i*)): Pemberton and Mash's
 * isotherm at 303.15 K and Rieder and Thompson's isobar at 101.3 kPa. Vapour pressures by Wagner equations: water by
 * W. Wagner and A. Pruß, J. Phys. Chem. Ref. Data 22 (1993) 783 (the IAPWS saturation equation), ethanol by the
 * Wagner 2.5-5 constants of Poling, Prausnitz and O'Connell, The Properties of Gases and Liquids, 5th ed., appendix A
 * (as transcribed in the chemicals library), written on the card for °C and kPa. Run once (argument: the output path); {@code VleCardTest} holds
 * the card to data it was not fitted to.
 */
public final class VleCardFitter {
    static final int ORDER = 3;
    static final double REFERENCE_KELVIN = 323.15;
    /** T_c (K), p_c (Pa), a_1 … (Wagner and Pruß 1993), then the range (K). */
    static final double[] WATER = {647.096, 22.064e6, -7.85951783, 1.84408259, -11.7866497, 22.6807411,
        -15.9618719, 1.80122502, 273.16, 647.096};
    /** T_c (K), p_c (Pa), a, b, c, d (Poling et al., Wagner 2.5-5), then the range (K). */
    static final double[] ETHANOL = {513.92, 6.132e6, -8.68587, 1.17831, -4.8762, 1.588, 159.05, 513.92};

    private VleCardFitter() {
    }

    /** Pa at T (K) by a Wagner equation: exponents 1, 1.5, 3, 3.5, 4, 7.5 (six a) or 1, 1.5, 2.5, 5 (four). */
    static double wagner(double[] c, double kelvin) {
        double[] e = c.length == 10 ? new double[] {1, 1.5, 3, 3.5, 4, 7.5} : new double[] {1, 1.5, 2.5, 5};
        double tau = 1 - kelvin / c[0];
        double sum = 0;
        for (int i = 0; i < e.length; i++) {
            sum += c[2 + i] * Math.pow(tau, e[i]);
        }
        return c[1] * Math.exp(c[0] / kelvin * sum);
    }

    /** Rows of reference/ethanol-water-vle.tsv: set, p (kPa), T (K), x1, y1. */
    static List<String[]> rows() {
        List<String[]> out = new ArrayList<>();
        try (InputStream in = VleCardFitter.class.getResourceAsStream("/reference/ethanol-water-vle.tsv")) {
            for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n")) {
                if (!line.startsWith("#") && !line.isEmpty()) {
                    out.add(line.split("\t", -1));
                }
            }
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
        return out;
    }

    /** The fitted points: x1, T (K) and G^E/RT from the two data sets. */
    static double[][] points() {
        List<double[]> out = new ArrayList<>();
        for (String[] r : rows()) {
            boolean isotherm = r[0].equals("isothermal");
            boolean isobar = r[0].equals("isobaric-rieder");
            if (!isotherm && !isobar) {
                continue;
            }
            double p = 1000 * Double.parseDouble(r[1]);
            double t = Double.parseDouble(r[2]);
            double x1 = Double.parseDouble(r[3]);
            double y1 = Double.parseDouble(r[4]);
            if (x1 <= 0 || x1 >= 1 || y1 <= 0 || y1 >= 1) {
                continue;
            }
            double g1 = y1 * p / (x1 * wagner(ETHANOL, t));
            double g2 = (1 - y1) * p / ((1 - x1) * wagner(WATER, t));
            out.add(new double[] {x1, t, x1 * Math.log(g1) + (1 - x1) * Math.log(g2)});
        }
        return out.toArray(new double[0][]);
    }

    static RedlichKisterFit fit() {
        double[][] pts = points();
        double[] x = new double[pts.length];
        double[] t = new double[pts.length];
        double[] g = new double[pts.length];
        for (int i = 0; i < pts.length; i++) {
            x[i] = pts[i][0];
            t[i] = pts[i][1];
            g[i] = pts[i][2];
        }
        // unweighted: weighting the dilute ends (1/(x1·x2) or its square) or higher orders did not do better
        // against the outside data, and the plain fit is the one a user would make
        return RedlichKisterFitter.excessVolumes(x, t, g, ORDER, 1, REFERENCE_KELVIN, null);
    }

    static String card() {
        double[][] a = fit().coefficients();
        TsvCard b = new TsvCard()
                .row("Miscela card", "2")
                .row("title", "Ethanol + water: activity coefficients and vapour pressures, 30 to 100 °C")
.row("source", "G^E/RT: Redlich-Kister A0..A" + ORDER + ", each linear in T, least-squares fit by "
                        + "Miscela's fit engine to G^E/RT from the VLE data of R. C. Pemberton, C. J. Mash, J. Chem. "
                        + "Thermodyn. 10 (1978), 303.15 K, and R. M. Rieder, A. R. Thompson, Ind. Eng. Chem. 41 (1949) "
                        + "2905, 101.3 kPa, by modified Raoult's law (" + points().length + " points); vapour "
                        + "pressures: water W. Wagner, A. Pruss, J. Phys. Chem. Ref. Data 22 (1993) 783, ethanol the "
                        + "Wagner 2.5-5 constants of B. E. Poling, J. M. Prausnitz, J. P. O'Connell, The Properties of "
                        + "Gases and Liquids, 5th ed. (2001), appendix A; densities: "
                        + "ethanol DIPPR 105 (Perry's Chemical Engineers' Handbook, 8th ed., Table 2-32), water Kell "
                        + "1975; molar masses CIAAW 2021 abridged; flash point of ethanol: NFPA 497 (2008), 13 C, as "
                        + "transcribed")
                .row("note", "Data from 30 °C to the boiling mixtures at 1 atm; no excess volume on this card. Against other "
                        + "data: bubble points at 98.66 kPa up to 1.5 K low below 6 mol % ethanol (Kirschbaum and "
                        + "Gerstner 1939), bubble pressures at 50 °C within 1.5 % (Kurihara et al. 1995).")
                .row("temperature unit", "°C")
                .row("density unit", "kg/m³")
                .row("molar volume unit", "cm³/mol")
                .row("molar mass unit", "g/mol")
                .row("pressure unit", "kPa")
                .row("enthalpy unit", "J/mol")
                .row("component", "ethanol", "46.069")
                .row("component", "water", "18.015")
                .row("density model", "ethanol", "DIPPR 105")
                .row("density coefficients", "ethanol", "1.6288", "0.27469", "514", "0.23178")
                .row("density model", "water", "Kell 1975")
                .row("vapour pressure", prepend("ethanol", "Wagner 2.5-5", wagnerRow(ETHANOL)))
                .row("vapour pressure", prepend("water", "Wagner 3-6", wagnerRow(WATER)))
                .row("excess Gibbs energy reference temperature", "ethanol + water",
                        String.format(Locale.ROOT, "%.2f", REFERENCE_KELVIN - 273.15));
        for (int k = 0; k < a.length; k++) {
            b.row("excess Gibbs energy A" + k, "ethanol + water", a[k]);
        }
        return b.row("flash point", "ethanol", "13", "closed cup (NFPA 497, 2008)")
                .row("flash point", "water", "none")
                .row("valid temperature", "30", "100")
                .row("valid mole fraction", "ethanol", "0", "1")
                .row("extrapolation", "refuse")
                .text();
    }

    private static Object[] prepend(String first, String second, String[] rest) {
        Object[] out = new Object[rest.length + 2];
        out[0] = first;
        out[1] = second;
        System.arraycopy(rest, 0, out, 2, rest.length);
        return out;
    }

    /** T_c in °C and p_c in kPa (exact decimal shifts), the coefficients, and the range in °C. */
    static String[] wagnerRow(double[] c) {
        String[] out = new String[c.length];
        java.math.BigDecimal zero = new java.math.BigDecimal("273.15");
        out[0] = new java.math.BigDecimal(Double.toString(c[0])).subtract(zero).toPlainString();
        out[1] = new java.math.BigDecimal(Double.toString(c[1])).movePointLeft(3).stripTrailingZeros().toPlainString();
        for (int i = 2; i < c.length - 2; i++) {
            out[i] = Double.toString(c[i]);
        }
        out[c.length - 2] = new java.math.BigDecimal(Double.toString(c[c.length - 2])).subtract(zero).toPlainString();
        out[c.length - 1] = new java.math.BigDecimal(Double.toString(c[c.length - 1])).subtract(zero).toPlainString();
        return out;
    }

    /** Λ12 = 0.154 and Λ21 = 0.888 at 343.15 K: Gmehling et al. 2012, problem P05.01a (ethanol + water). */
    static final double[] WILSON_LAMBDA = {0.154, 0.888};
    static final double WILSON_KELVIN = 343.15;

    /**
     * The same liquids by Wilson's model with the parameters of J. Gmehling, B. Kolbe, M. Kleiber, J. Rarey, Chemical
     * Thermodynamics for Process Simulation (Wiley-VCH 2012), problem P05.01a: Λ12 = 0.154 and Λ21 = 0.888 at 70 °C,
     * written as Δλ/R = −T·ln Λ with equal Wilson volumes (so Λ = exp(−Δλ/RT): the temperature dependence is this
     * card's assumption, the book gives Λ at 70 °C only); vapour pressures and densities as on the card above.
     */
    static String wilsonCard() {
        StringBuilder b = new StringBuilder();
        for (String line : card().split("\n")) {
            String label = line.split("\t", -1)[0];
            if (label.startsWith("excess Gibbs energy")) {
                continue;
            }
            if (label.equals("title")) {
                line = "title\tEthanol + water by Wilson's model: activity coefficients and vapour pressures, 30 to 100 °C";
            } else if (label.equals("source")) {
                line = "source\tWilson: J. Gmehling, B. Kolbe, M. Kleiber, J. Rarey, Chemical Thermodynamics for Process "
                        + "Simulation (Wiley-VCH 2012), problem P05.01a, Lambda12 = 0.154 and Lambda21 = 0.888 at 70 C, "
                        + "written as dlambda/R = -T ln Lambda with equal Wilson volumes (an assumption of this card: the "
                        + "book gives 70 C only)" + line.substring(line.indexOf("; vapour pressures"));
            } else if (label.equals("note")) {
                line = "note\tThe temperature dependence of Lambda is assumed, not published.";
            }
            b.append(line).append('\n');
            if (label.equals("density model") && line.contains("water")) {
                TsvCard w = new TsvCard()
                        .row("Wilson", "ethanol + water", -WILSON_KELVIN * Math.log(WILSON_LAMBDA[0]),
                                -WILSON_KELVIN * Math.log(WILSON_LAMBDA[1]))
                        .row("Wilson volume", "ethanol", "1")
                        .row("Wilson volume", "water", "1");
                b.append(w.text());
            }
        }
        return b.toString();
    }

    /**
     * The same card with the melting of ice (for the freezing point): melting point 0 °C (the ice point, common
     * practice), enthalpy of fusion 6010 J/mol (CRC Handbook, table Enthalpy of Fusion, as transcribed in the chemicals
     * library), heat capacity of fusion 38.25 J/(mol·K) (liquid water 76.02 J/(mol·K), IAPWS-95, from memory, minus
     * ice 37.77 J/(mol·K), IAPWS R10-06). Below 30 °C its G^E/RT rows are extrapolated.
     */
    static String iceCard() {
        StringBuilder b = new StringBuilder();
        for (String line : card().split("\n")) {
            String label = line.split("\t", -1)[0];
            if (label.equals("title")) {
                line = "title\tEthanol + water: activity coefficients and vapour pressures, 30 to 100 °C, with the "
                        + "melting of ice";
            } else if (label.equals("source")) {
                line += "; ice: melting point 0 °C (common practice, the ice point), enthalpy of fusion 6010 J/mol (CRC "
                        + "Handbook of Chemistry and Physics, table Enthalpy of Fusion, as transcribed in the chemicals "
                        + "library), heat capacity of fusion 38.25 J/(mol K) = Cp of liquid water 76.02 J/(mol K) "
                        + "(IAPWS-95, from memory) minus Cp of ice 37.77 J/(mol K) (IAPWS R10-06, 2096.78 J/(kg K) at "
                        + "the triple point)";
            } else if (label.equals("note")) {
                line = "note\tBelow 30 °C the G^E/RT rows are extrapolated (linear in T): freezing points need "
                        + "extrapolation allowed. " + line.substring("note\t".length());
            } else if (label.equals("valid temperature")) {
                b.append("melting point\twater\t0\n").append("enthalpy of fusion\twater\t6010\n")
                        .append("heat capacity of fusion\twater\t38.25\n");
            }
            b.append(line).append('\n');
        }
        return b.toString();
    }

    public static void main(String[] args) throws IOException {
        System.out.println(points().length + " points; coefficients " + java.util.Arrays.deepToString(
                fit().coefficients()));
        TsvCard.write(args[0], card());
        TsvCard.write(args[1], wilsonCard());
        if (args.length > 2) {
            TsvCard.write(args[2], iceCard());
        }
    }
}
