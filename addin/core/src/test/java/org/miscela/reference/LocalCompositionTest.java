package org.miscela.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.miscela.core.card.Card;
import org.miscela.core.card.CardReader;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.functions.PhaseFunctions;

/**
 * Wilson's and the NRTL model on cards against published worked examples: J. Gmehling, B. Kolbe, M. Kleiber, J. Rarey,
 * Chemical Thermodynamics for Process Simulation (Wiley-VCH 2012), problems P05.01a/b (ethanol + water at 70 °C) and
 * 05.09 (acetone + chloroform + methanol, the DDBST temperature-dependent Wilson form), and H. C. Van Ness and J. M.
 * Smith, Introduction to Chemical Engineering Thermodynamics, 4th ed. (1987), 2-propanol + water: parameters and
 * activity coefficients as transcribed in the thermo library's tests and documentation (CalebBell/thermo). Each card's
 * densities are invented (marked so): they play no part in γ.
 */
class LocalCompositionTest {
    private static Card card(String[] names, double[][] extra, Object[]... rows) {
        List<Object[]> cells = new ArrayList<>();
        cells.add(new Object[] {"Miscela card", 2.0});
        cells.add(new Object[] {"source", "activity parameters from the publications named in the test; densities "
                + "invented values"});
        cells.add(new Object[] {"temperature unit", "K"});
        cells.add(new Object[] {"density unit", "kg/m³"});
        cells.add(new Object[] {"molar volume unit", "cm³/mol"});
        cells.add(new Object[] {"molar mass unit", "g/mol"});
        cells.add(new Object[] {"valid temperature", 300.0, 360.0});
        for (int k = 0; k < names.length; k++) {
            cells.add(new Object[] {"component", names[k], extra[k][0]});
            cells.add(new Object[] {"density model", names[k], "constant"});
            cells.add(new Object[] {"density coefficients", names[k], extra[k][1]});
        }
        cells.add(new Object[] {"valid mole fraction", names[0], 0.0, 1.0});
        for (Object[] r : rows) {
            cells.add(r);
        }
        return CardReader.read(cells.toArray(new Object[0][]));
    }

    private static final double[][] TWO = {{46.07, 789.0}, {18.015, 997.0}};

    /** P05.01a: Λ12 = 0.154, Λ21 = 0.888 at 343.15 K, i.e. Δλ/R = −T·ln Λ with equal volumes; x1 = 0.252. */
    @Test
    void wilsonEthanolWater() {
        double t = 343.15;
        Card c = card(new String[] {"ethanol", "water"}, TWO,
                new Object[] {"Wilson", "ethanol + water", -t * Math.log(0.154), -t * Math.log(0.888)},
                new Object[] {"Wilson volume", "ethanol", 1.0}, new Object[] {"Wilson volume", "water", 1.0});
        double[] x = {0.252, 0.748};
        assertEquals(1.8814926, PhaseFunctions.activityCoefficient(c, 0, x, t, Extrapolation.AS_CARD), 1e-7);
        assertEquals(1.1655775, PhaseFunctions.activityCoefficient(c, 1, x, t, Extrapolation.AS_CARD), 1e-7);
    }

    /** P05.01b: τ12 = −0.178, τ21 = 1.963, α = 0.2974; x1 = 0.252. */
    @Test
    void nrtlEthanolWater() {
        Card c = card(new String[] {"ethanol", "water"}, TWO,
                new Object[] {"NRTL", "ethanol + water", -0.178, 1.963, 0.2974});
        double[] x = {0.252, 0.748};
        assertEquals(1.9363184, PhaseFunctions.activityCoefficient(c, 0, x, 343.15, Extrapolation.AS_CARD), 1e-7);
        assertEquals(1.1537610, PhaseFunctions.activityCoefficient(c, 1, x, 343.15, Extrapolation.AS_CARD), 1e-7);
        // the pair written the other way round means the same
        Card swapped = card(new String[] {"ethanol", "water"}, TWO,
                new Object[] {"NRTL", "water + ethanol", 1.963, -0.178, 0.2974});
        assertEquals(1.9363184, PhaseFunctions.activityCoefficient(swapped, 0, x, 343.15, Extrapolation.AS_CARD),
                1e-7);
    }

    /**
     * Van Ness and Smith: a12 = 437.98, a21 = 1238.0 cal/mol (written on the card as a/R with R = 1.98720 cal/(mol·K),
     * in K), V1 = 76.92, V2 = 18.07 cm³/mol; at 353.15 K and x1 = 0.25 the book prints γ1 = 2.1244 and γ2 = 1.1904.
     */
    @Test
    void wilsonPropanolWater() {
        double r = 1.98720;
        Card c = card(new String[] {"2-propanol", "water"}, new double[][] {{60.1, 785.0}, {18.015, 997.0}},
                new Object[] {"Wilson", "2-propanol + water", 437.98 / r, 1238.0 / r},
                new Object[] {"Wilson volume", "2-propanol", 76.92}, new Object[] {"Wilson volume", "water", 18.07});
        double[] x = {0.25, 0.75};
        assertEquals(2.1244, PhaseFunctions.activityCoefficient(c, 0, x, 353.15, Extrapolation.AS_CARD), 0.0005);
        assertEquals(1.1904, PhaseFunctions.activityCoefficient(c, 1, x, 353.15, Extrapolation.AS_CARD), 0.0005);
    }

    /**
     * 05.09, three components at 331.42 K, Δλ_ij/R = a_ij + b_ij·T + c_ij·T², V = 74.04, 80.67, 40.73 cm³/mol; at
     * x = (0.229, 0.175, 0.596) γ = (1.2233934, 1.1009459, 1.2052899) (the book's solution prints 1.223, 1.101, 1.205).
     */
    @Test
    void wilsonTernary() {
        String[] n = {"acetone", "chloroform", "methanol"};
        Card c = card(n, new double[][] {{58.08, 784.0}, {119.38, 1480.0}, {32.04, 791.0}},
                new Object[] {"Wilson", "acetone + chloroform", 375.2835, -3.78434, 7.91073e-3, -1722.58, 6.405502,
                    -7.47788e-3},
                new Object[] {"Wilson", "acetone + methanol", 31.1208, -0.67704, 8.68371e-4, 747.217, -0.256645,
                    -1.24796e-3},
                new Object[] {"Wilson", "chloroform + methanol", -1140.79, 2.59359, 3.1e-5, 3596.17, -6.2234, 3e-5},
                new Object[] {"Wilson volume", "acetone", 74.04}, new Object[] {"Wilson volume", "chloroform", 80.67},
                new Object[] {"Wilson volume", "methanol", 40.73});
        double[] x = {0.229, 0.175, 0.596};
        double[] expected = {1.2233934, 1.1009459, 1.2052899};
        for (int k = 0; k < 3; k++) {
            assertEquals(expected[k], PhaseFunctions.activityCoefficient(c, k, x, 331.42, Extrapolation.AS_CARD),
                    1e-6, n[k]);
        }
    }
}
