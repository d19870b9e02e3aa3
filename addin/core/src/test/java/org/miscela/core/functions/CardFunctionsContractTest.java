package org.miscela.core.functions;

import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.TestCard;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/**
 * The cell functions against identities that relate them and against their documented edges: V̄_k = V_k* + V̄_k^E
 * with V_k* = M_k/ρ_k, V_m = Σ x_k V_k* + V^E, the binary tangent intercepts H̄_1^E = H^E + x2·dH^E/dx1 and
 * H̄_2^E = H^E − x1·dH^E/dx1, the adiabatic temperature of a batch from the first law at constant pressure
 * (Σ n_k Cp_k·ΔT + N·H^E = 0 for constant Cp and H^E), the amount bases (1 kmol = 1000 mol; moles = mass/M), and the
 * edges the catalogue states (zero amounts and fractions allowed, 0 K refused, components numbered from 1, names
 * matched ignoring case). The cards are invented.
 */
class CardFunctionsContractTest {
    private static final Extrapolation E = Extrapolation.AS_CARD;

    private static Problem refusal(Executable call) {
        return assertThrows(MiscelaException.class, call).problem();
    }

    /** Binary, in °C, g/cm³, L/mol, with excess enthalpy in kJ/mol (constant in T) and constant heat capacities. */
    static Card binaryCard() {
        return TestCard.empty().row("Miscela card", 2)
                .row("title", "Contract pair").row("source", "invented values, for tests")
                .row("temperature unit", "°C").row("density unit", "g/cm³").row("molar volume unit", "L/mol")
                .row("molar mass unit", "g/mol").row("enthalpy unit", "kJ/mol").row("valid temperature", 10, 40)
                .row("component", "alpha", 46.07).row("component", "beta", 18.015)
                .row("density model", "alpha", "polynomial").row("density reference temperature", "alpha", 20)
                .row("density coefficients", "alpha", 0.75, -0.015625)
                .row("density model", "beta", "constant").row("density coefficients", "beta", 0.997)
                .row("valid mole fraction", "alpha", 0, 1)
                .row("excess volume A0", "alpha + beta", -0.004).row("excess volume A1", "alpha + beta", 0.0015)
                .row("excess enthalpy A0", "alpha + beta", -3.2).row("excess enthalpy A1", "alpha + beta", 0.9)
                .row("heat capacity", "alpha", 0.112).row("heat capacity", "beta", 0.0753)
                .row("valid pair temperature", "alpha + beta", 10, 30).read();
    }

    @Test
    void volumesRelateAsTheirDefinitionsSay() {
        Card card = binaryCard();
        double t = 25;
        double x1 = 0.3;
        double[] x = {x1, 1 - x1};
        double[] mass = {46.07, 18.015};
        double vm = 0;
        for (int k = 0; k < 2; k++) {
            // M in g/mol over ρ in g/cm³ is cm³/mol; a litre is 1000 cm³
            double pure = mass[k] / CardFunctions.pureDensity(card, k, t, E) / 1000;
            double partial = CardFunctions.partialMolarVolume(card, k, x1, t, E);
            assertEquals(partial - pure, CardFunctions.partialExcessMolarVolume(card, k, x1, t, E), 1e-15, "V̄" + k);
            assertEquals(partial - pure, CardFunctions.partialExcessMolarVolume(card, k, x, t, E), 1e-15, "V̄" + k);
            vm += x[k] * pure;
        }
        vm += CardFunctions.excessMolarVolume(card, x1, t, E);
        assertEquals(vm, CardFunctions.molarVolume(card, x1, t, E), 1e-15);
        assertEquals(vm, CardFunctions.molarVolume(card, x, t, E), 1e-15);
        // ρ = Σ x_k M_k / V_m: g/mol over L/mol is g/L, a thousandth of g/cm³
        assertEquals((x1 * mass[0] + (1 - x1) * mass[1]) / vm / 1000, CardFunctions.density(card, x1, t, E), 1e-14);
    }

    /** The binary tangent intercepts, with dH^E/dx1 by a five-point difference (exact for this cubic in x1). */
    @Test
    void partialExcessEnthalpiesAreTangentIntercepts() {
        Card card = binaryCard();
        double t = 25;
        double x1 = 0.35;
        double h = 1e-3;
        double[] at = new double[5];
        for (int i = 0; i < 5; i++) {
            double y = x1 + (i - 2) * h;
            at[i] = CardFunctions.excessEnthalpy(card, new double[] {y, 1 - y}, t, E);
        }
        double slope = (at[0] - 8 * at[1] + 8 * at[3] - at[4]) / (12 * h);
        double[] x = {x1, 1 - x1};
        assertEquals(at[2] + (1 - x1) * slope, CardFunctions.partialExcessEnthalpy(card, 0, x, t, E), 1e-11);
        assertEquals(at[2] - x1 * slope, CardFunctions.partialExcessEnthalpy(card, 1, x, t, E), 1e-11);
    }

    /**
     * With constant heat capacities and an H^E that does not depend on temperature, the adiabatic rise of a batch
     * is ΔT = −N·H^E/Σ n_k Cp_k (first law at constant pressure). Heat released warms the batch, heat absorbed
     * cools it, and a pure liquid stays where it is.
     */
    @Test
    void adiabaticRiseBalancesTheFirstLaw() {
        Card card = binaryCard();
        double[] moles = {0.4, 0.6};
        double he = CardFunctions.excessEnthalpy(card, new double[] {0.4, 0.6}, 20, E);
        assertTrue(he < 0, "the invented card releases heat on mixing");
        double rise = -he / (0.4 * 0.112 + 0.6 * 0.0753);
        assertEquals(rise, CardFunctions.adiabaticRise(card, moles, AmountBasis.MOL, 20, E), 1e-8);
        assertEquals(rise, CardFunctions.adiabaticRise(card, new double[] {0.4 * 46.07, 0.6 * 18.015},
                AmountBasis.G, 20, E), 1e-8);
        assertEquals(0.0, CardFunctions.adiabaticRise(card, new double[] {1, 0}, AmountBasis.MOL, 20, E), 0.0);

        Card absorbing = TestCard.empty().row("Miscela card", 2).row("source", "invented values, for tests")
                .row("temperature unit", "K").row("density unit", "kg/m³").row("molar volume unit", "cm³/mol")
                .row("molar mass unit", "g/mol").row("enthalpy unit", "J/mol").row("valid temperature", 250, 350)
                .row("component", "a", 50).row("component", "b", 60)
                .row("density model", "a", "constant").row("density coefficients", "a", 900)
                .row("density model", "b", "constant").row("density coefficients", "b", 800)
                .row("valid mole fraction", "a", 0, 1).row("excess volume A0", "a + b", 0.5)
                .row("excess enthalpy A0", "a + b", 1200).row("heat capacity", "a", 150)
                .row("heat capacity", "b", 180).read();
        double cooling = -(1200 * 0.25) / (0.5 * 150 + 0.5 * 180);
        assertTrue(cooling < -1, "more than one kelvin, so the search brackets beyond its first step");
        assertEquals(cooling, CardFunctions.adiabaticRise(absorbing, new double[] {2, 2}, AmountBasis.MOL, 300, E),
                1e-8);
    }

    /**
     * A batch whose final temperature leaves the card's range (or a present pair's range) is refused unless
     * extrapolation is allowed; the message gives the temperatures in the card's unit.
     */
    @Test
    void adiabaticRiseRespectsTheValidityRange() {
        Card card = binaryCard();
        double[] moles = {0.4, 0.6};
        double rise = CardFunctions.adiabaticRise(card, moles, AmountBasis.MOL, 20, E);
        // from 28 °C the batch ends above the pair's 30 °C although inside the card's 10..40 °C
        MiscelaException pair = assertThrows(MiscelaException.class,
                () -> CardFunctions.adiabaticRise(card, moles, AmountBasis.MOL, 28, E));
        assertEquals(Problem.OUTSIDE_FINAL_TEMPERATURE, pair.problem());
        assertTrue(pair.getMessage().contains("10 to 40 °C"), pair.getMessage());
        assertEquals(rise, CardFunctions.adiabaticRise(card, moles, AmountBasis.MOL, 28, Extrapolation.ALLOW), 1e-8);
        // a pure liquid at 28 °C stays inside: the pair's range applies only where both are present
        assertEquals(0.0, CardFunctions.adiabaticRise(card, new double[] {0, 1}, AmountBasis.MOL, 28, E), 0.0);
        assertEquals(0.0, CardFunctions.adiabaticRise(card, new double[] {0, 1}, AmountBasis.MOL, 35, E), 0.0);
        assertEquals(0.0, CardFunctions.adiabaticRise(card, new double[] {1, 0}, AmountBasis.MOL, 35, E), 0.0);
    }

    @Test
    void amountsAndTheirBases() {
        Card card = binaryCard();
        assertEquals(1000.0, AmountBasis.KMOL.toMoles(1.0, 18.015), 0.0);
        assertEquals(1000.0 / 18.015, AmountBasis.KG.toMoles(1.0, 18.015), 1e-12);
        assertEquals(2.0 / 18.015, AmountBasis.G.toMoles(2.0, 18.015), 1e-15);
        assertEquals(3.0, AmountBasis.MOL.toMoles(3.0, 18.015), 0.0);
        double[] n = CardFunctions.amountsToMoles(card, new double[] {0.0, 2.0}, AmountBasis.KG, 20, E);
        assertEquals(0.0, n[0], 0.0);
        assertEquals(2000.0 / 18.015, n[1], 1e-10);
        assertEquals(Problem.AMOUNT_ZERO,
                refusal(() -> CardFunctions.amountsToMoles(card, new double[] {0, 0}, AmountBasis.MOL, 20, E)));
        assertEquals(0.0, CardFunctions.additionHeat(card, new double[] {1, 1}, 0, 0.0, AmountBasis.MOL, 20, E),
                0.0);
        assertEquals(AmountBasis.KG, AmountBasis.lookup(" KG "));
        // a pound is a mass like a kilogram; an ounce is no basis (1 lb = 0.45359237 kg exactly, NIST SP 811 B.8)
        assertEquals(AmountBasis.LB, AmountBasis.lookup("lb"));
        assertEquals(null, AmountBasis.lookup("oz"));
        assertEquals("kmol", AmountBasis.KMOL.symbol());
        assertEquals("moles: mol, kmol; masses: g, kg, t, tonne, tonnes, lb, lbs; masses weighed in air (conventional "
                + "mass, OIML D 28): g (conventional), g air, kg (conventional), kg air, t (conventional), t air, "
                + "lb (conventional), lb air", AmountBasis.accepted());
    }

    @Test
    void compositionsAtTheirEdges() {
        Card card = binaryCard();
        double[] pure = CardFunctions.moleFractions(card, new double[] {0.0, 1.0});
        assertEquals(0.0, pure[0], 0.0);
        assertEquals(1.0, pure[1], 0.0);
        double[] close = CardFunctions.moleFractions(card, new double[] {0.3, 0.7 + 0.9e-6});
        assertEquals(1.0, close[0] + close[1], 1e-15);
        assertEquals(0.3 / (1 + 0.9e-6), close[0], 1e-15);
        assertEquals(Problem.COMPOSITION_SUM,
                refusal(() -> CardFunctions.moleFractions(card, new double[] {0.3, 0.7 + 1.1e-6})));
    }

    /** 0 K itself is below what any function accepts, in kelvin or in °C, with or without extrapolation. */
    @Test
    void absoluteZeroIsRefused() {
        Card card = binaryCard();
        assertEquals(Problem.BELOW_ABSOLUTE_ZERO,
                refusal(() -> CardFunctions.density(card, 0.5, -273.15, Extrapolation.ALLOW)));
        assertEquals(Problem.BELOW_ABSOLUTE_ZERO,
                refusal(() -> CardFunctions.isInside(card, new double[] {0.5, 0.5}, -273.15)));
        assertEquals(0.0, CardFunctions.inside(card, new double[] {0.5, 0.5}, 35), 0.0);
        assertEquals(1.0, CardFunctions.inside(card, new double[] {0.5, 0.5}, 30), 0.0);
    }

    /**
     * A pure liquid whose density model reaches zero or goes negative is named in the refusal, before any mixture
     * is formed: 0.75 − 2⁻⁶·(t − 20) g/cm³ is exactly zero at 68 °C and negative above.
     */
    @Test
    void anUnphysicalPureDensityIsNamed() {
        Card card = binaryCard();
        for (double t : new double[] {68, 75}) {
            MiscelaException e = assertThrows(MiscelaException.class,
                    () -> CardFunctions.density(card, 0.5, t, Extrapolation.ALLOW));
            assertEquals(Problem.NON_PHYSICAL, e.problem());
            assertTrue(e.getMessage().contains("density of alpha"), e.getMessage());
            assertEquals(Problem.NON_PHYSICAL,
                    refusal(() -> CardFunctions.pureDensity(card, 0, t, Extrapolation.ALLOW)));
        }
    }

    @Test
    void componentsByNumberAndName() {
        Card card = binaryCard();
        assertEquals(0, CardFunctions.componentByNumber(card, 1));
        assertEquals(1, CardFunctions.componentByNumber(card, 2));
        for (double bad : new double[] {0, 3, 1.5, -1}) {
            assertEquals(Problem.UNKNOWN_COMPONENT_ARG, refusal(() -> CardFunctions.componentByNumber(card, bad)),
                    "component number " + bad);
        }
        assertEquals(0, CardFunctions.componentByName(card, "alpha"));
        assertEquals(1, CardFunctions.componentByName(card, " BETA "));
        MiscelaException unknown = assertThrows(MiscelaException.class,
                () -> CardFunctions.componentByName(card, "gamma"));
        assertEquals(Problem.UNKNOWN_COMPONENT_ARG, unknown.problem());
        assertTrue(unknown.getMessage().contains("from 1 to 2 or one of the names: alpha, beta."),
                unknown.getMessage());
        assertEquals(CardFunctions.OK, CardFunctions.check(card, Double.NaN, Double.NaN, E));
        assertEquals(Problem.MOLE_FRACTION_OUTSIDE_UNIT.format("1.5"), CardFunctions.check(card, 1.5, 20, E));
    }

    /**
     * The standard uncertainty of a density is (ρ/V_m)·u(V^E) (ρ = M/V_m with M fixed), in the card's density unit;
     * the others in its molar volume unit. The card is the covariance test card in g/cm³ and L/mol.
     */
    @Test
    void uncertaintiesComeInTheCardsUnits() {
        Object[][] cells = org.miscela.core.card.TestCards.cells("ethanol-water-covariance.tsv");
        Card inKgM3 = org.miscela.core.card.CardReader.read(cells);
        double[] x = {0.4, 0.6};
        double uVe = CardFunctions.uncertainty(inKgM3, "excess volume", -1, x, 20, E);
        double uRho = CardFunctions.uncertainty(inKgM3, "density", -1, x, 20, E);
        double rho = CardFunctions.density(inKgM3, x, 20, E);
        double vm = CardFunctions.molarVolume(inKgM3, x, 20, E);
        assertEquals(rho / vm * uVe, uRho, 1e-12 * uRho);
        assertEquals(uVe, CardFunctions.uncertainty(inKgM3, "molar volume", -1, x, 20, E), 1e-15);
        assertEquals(Problem.ARG_BLANK, refusal(() -> CardFunctions.uncertainty(inKgM3, "partial volume", -1, x, 20,
                E)));
        assertTrue(CardFunctions.uncertainty(inKgM3, "partial volume", 0, x, 20, E) > 0);

        // the same relation in g/cm³ and cm³/mol (units whose factors differ), on an invented binary card with a
        // covariance for A0 and A1
        Card other = TestCard.empty().row("Miscela card", 2).row("source", "invented values, for tests")
                .row("temperature unit", "°C").row("density unit", "g/cm³").row("molar volume unit", "cm³/mol")
                .row("molar mass unit", "g/mol").row("valid temperature", 10, 40)
                .row("component", "a", 46.07).row("component", "b", 18.015)
                .row("density model", "a", "constant").row("density coefficients", "a", 0.79)
                .row("density model", "b", "constant").row("density coefficients", "b", 0.997)
                .row("valid mole fraction", "a", 0, 1)
                .row("excess volume A0", "a + b", -4.0).row("excess volume A1", "a + b", 1.0)
                .row("excess volume covariance", "a + b", 4e-4, 1e-4)
                .row("excess volume covariance", "a + b", 1e-4, 9e-4).read();
        double u2 = CardFunctions.uncertainty(other, "excess volume", -1, x, 20, E);
        double g0 = 0.4 * 0.6;
        double g1 = g0 * (0.4 - 0.6);
        assertEquals(Math.sqrt(g0 * g0 * 4e-4 + 2 * g0 * g1 * 1e-4 + g1 * g1 * 9e-4), u2, 1e-12 * u2,
                "u(V^E)² = gᵀCg with g = (x1·x2, x1·x2·(x1 − x2)), in cm³/mol");
        double expected = CardFunctions.density(other, x, 20, E) / CardFunctions.molarVolume(other, x, 20, E) * u2;
        assertEquals(expected, CardFunctions.uncertainty(other, "density", -1, x, 20, E), 1e-12 * expected,
                "u(ρ) in g/cm³");
    }
}
