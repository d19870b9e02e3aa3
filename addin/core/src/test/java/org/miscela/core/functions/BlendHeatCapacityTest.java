package org.miscela.core.functions;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.miscela.core.card.Card;
import org.miscela.core.card.CardReader;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.HeatCapacitySource;
import org.miscela.core.card.TestCard;
import org.miscela.core.card.TestCards;
import org.miscela.core.model.ApparentHeatCapacity;
import org.miscela.reference.NbsSulfuricAcid;
import org.miscela.testing.Figures;

/**
 * The blend's heat capacity, its partial molar heat capacities and the heat it takes to warm, from each of the three
 * sources a card can give (a solution model, ∂H^E/∂T, the pure liquids alone), checked against an outside
 * implementation of Laliberté's model where one exists and otherwise by identities computed from the functions'
 * values: summability, partials as finite differences of the total, Gibbs–Duhem, and the heating integral.
 */
class BlendHeatCapacityTest {
    static final Card WHOLE = TestCards.card("sulfuric-acid-water-whole-range.tsv");
    static final Card NBS = TestCards.card("sulfuric-acid-water-nbs.tsv");
    /**
     * The invented ternary of TestCard with pure heat capacities and a temperature-dependent excess enthalpy
     * (invented values), so that ∂H^E/∂T is not zero.
     */
    static final Card SLOPED = CardReader.read(TestCard.ternary()
            .row("enthalpy unit", "J/mol")
            .row("heat capacity", "alpha", 112.0)
            .row("heat capacity", "beta", 75.3)
            .row("heat capacity", "gamma", 219.0)
            .row("excess enthalpy A0", "alpha + beta", -800.0, 9.0)
            .row("excess enthalpy A1", "alpha + beta", 300.0, -2.5)
            .row("excess enthalpy reference temperature", "alpha + beta", 298.15)
            .row("excess enthalpy A0", "alpha + gamma", -400.0, -3.0)
            .row("excess enthalpy reference temperature", "alpha + gamma", 298.15)
            .row("excess enthalpy A0", "beta + gamma", 250.0, 1.5)
            .row("excess enthalpy reference temperature", "beta + gamma", 298.15).cells());

    /**
     * Laliberté's apparent heat capacity against the thermo library's own test (CalebBell/thermo,
     * tests/test_electrochem.py, test_Laliberte_heat_capacity_i): sodium chloride at 1.5 °C and w = 0.00398447 with
     * its 2009 parameters gives −2930.7353945880477 J/(kg·K).
     */
    @Test
    void theApparentHeatCapacityIsLaliberteS() {
        ApparentHeatCapacity nacl = new ApparentHeatCapacity(new double[] {-0.0693559668993322, -0.0782134167486952,
            3.84798479408635, -11.2762109247072, 8.73187698542672, 1.81245930472755});
        assertEquals(-2930.7353945880477, 1000.0 * nacl.at(1.5, 1.0 - 0.00398447), 1e-9);
        // its slope in w_w is the derivative of its values (central difference)
        double h = 1e-6;
        double w = 0.7;
        assertEquals((nacl.at(20.0, w + h) - nacl.at(20.0, w - h)) / (2 * h), nacl.slope(20.0, w), 1e-6);
    }

    /**
     * The whole-range card against the heats it was fitted to, per mole of acid at 25 °C: n = 1, 10, 50, 100 from the
     * NBS tables as quoted in a general chemistry text ({@link NbsSulfuricAcid}: −27.8, −66.5, −72.8, −73.7 kJ), and
     * n = 0.5, 1.5, 2, 3 from T. Urbański's heats of dilution to 500 mol water (Chemistry and Technology of
     * Explosives, Vol. 1, Table 16: 14.53, 9.47, 8.28, 6.56 kcal/mol) referred to the NBS value at n = 500
     * (−76.5 kJ): −15.71, −36.88, −41.86, −49.05 kJ. The card states its fit within 0.9 kJ per mole of acid (0.90 at
     * n = 10), so each is checked within 1 kJ.
     */
    @Test
    void theWholeRangeCardReproducesItsSources() {
        double[] n = {0.5, 1, 1.5, 2, 3, 10, 50, 100};
        double[] kj = {-76.5 + 14.53 * 4.184, NbsSulfuricAcid.heatOfSolution(0), -76.5 + 9.47 * 4.184,
            -76.5 + 8.28 * 4.184, -76.5 + 6.56 * 4.184, NbsSulfuricAcid.heatOfSolution(1),
            NbsSulfuricAcid.heatOfSolution(2), NbsSulfuricAcid.heatOfSolution(3)};
        double worst = 0;
        for (int i = 0; i < n.length; i++) {
            double heat = CardFunctions.mixingHeat(WHOLE, new double[] {1, n[i]}, AmountBasis.MOL, 25.0,
                    Extrapolation.ALLOW);
            worst = Math.max(worst, Math.abs(heat - kj[i]));
            assertEquals(kj[i], heat, 1.0, "n = " + n[i]);
        }
        Figures.note(BlendHeatCapacityTest.class, "whole-range H2SO4 card: worst deviation from its 8 source heats "
                + "%.2f kJ per mol acid", worst);
    }

    /** Where each card's heat capacity comes from, and that a card without an excess heat capacity says so. */
    @Test
    void eachCardSaysWhereItsHeatCapacityComesFrom() {
        assertEquals(HeatCapacitySource.SOLUTION_MODEL, WHOLE.mixture().heatCapacitySource());
        assertEquals(HeatCapacitySource.EXCESS_ENTHALPY_SLOPE, SLOPED.mixture().heatCapacitySource());
        assertEquals(HeatCapacitySource.PURE_LIQUIDS_ONLY, NBS.mixture().heatCapacitySource());
        Object[][] trace = CardFunctions.trace(NBS, new double[] {0.2, 0.8}, 25.0, PropertyKind.ENTHALPY,
                Extrapolation.AS_CARD);
        assertEquals(HeatCapacitySource.PURE_LIQUIDS_ONLY.words(), row(trace, "blend heat capacity source"));
        assertTrue(HeatCapacitySource.PURE_LIQUIDS_ONLY.words().contains("taken as zero"));
        assertEquals(HeatCapacitySource.SOLUTION_MODEL.words(), row(CardFunctions.trace(WHOLE,
                new double[] {0.2, 0.8}, 25.0, PropertyKind.ENTHALPY, Extrapolation.AS_CARD),
                "blend heat capacity source"));
    }

    private static Object row(Object[][] trace, String label) {
        for (Object[] r : trace) {
            if (r[0].equals(label)) {
                return r[1];
            }
        }
        throw new AssertionError("no trace row " + label);
    }

    /**
     * Summability (Σ x_k·C̄p_k = Cp), each partial as the finite difference of the total heat capacity N·Cp by n_k,
     * and Gibbs–Duhem (Σ x_k·dC̄p_k = 0 along any change of composition), each computed from the values the
     * functions return, for the solution model and for ∂H^E/∂T.
     */
    @Test
    void partialHeatCapacitiesAddUpAndAreTheSlopesOfTheTotal() {
        check(WHOLE, new double[] {0.05, 0.95}, 298.15, new double[] {1.0, -1.0});
        check(WHOLE, new double[] {0.3, 0.7}, 310.0, new double[] {1.0, -1.0});
        check(SLOPED, new double[] {0.2, 0.5, 0.3}, 300.0, new double[] {1.0, -0.5, -0.5});
        check(SLOPED, new double[] {0.6, 0.1, 0.3}, 290.0, new double[] {-0.2, 1.0, -0.8});
    }

    private static void check(Card card, double[] x, double kelvin, double[] direction) {
        int n = x.length;
        double[] partial = new double[n];
        double cp = card.mixture().partialHeatCapacities(x, kelvin, partial);
        assertEquals(cp, card.mixture().heatCapacity(x, kelvin), 1e-9 * Math.abs(cp));
        double sum = 0.0;
        for (int k = 0; k < n; k++) {
            sum += x[k] * partial[k];
        }
        assertEquals(cp, sum, 1e-9 * Math.abs(cp), "summability");
        double h = 1e-5;
        for (int k = 0; k < n; k++) {
            double slope = (total(card, x, k, h, kelvin) - total(card, x, k, -h, kelvin)) / (2 * h);
            assertEquals(slope, partial[k], 1e-6 * Math.abs(cp), "∂(N·Cp)/∂n_" + k);
        }
        double e = 1e-5;
        double[] up = new double[n];
        double[] down = new double[n];
        double[] before = new double[n];
        double[] after = new double[n];
        for (int k = 0; k < n; k++) {
            up[k] = x[k] + e * direction[k];
            down[k] = x[k] - e * direction[k];
        }
        card.mixture().partialHeatCapacities(down, kelvin, before);
        card.mixture().partialHeatCapacities(up, kelvin, after);
        double gibbsDuhem = 0.0;
        for (int k = 0; k < n; k++) {
            gibbsDuhem += x[k] * (after[k] - before[k]) / (2 * e);
        }
        assertEquals(0.0, gibbsDuhem, 1e-5 * Math.abs(cp), "Gibbs–Duhem");
    }

    /** N·Cp of one mole of blend x with n_k changed by dn. */
    private static double total(Card card, double[] x, int k, double dn, double kelvin) {
        double[] moles = x.clone();
        moles[k] += dn;
        double sum = 0.0;
        for (double v : moles) {
            sum += v;
        }
        double[] z = new double[moles.length];
        for (int j = 0; j < z.length; j++) {
            z[j] = moles[j] / sum;
        }
        return sum * card.mixture().heatCapacity(z, kelvin);
    }

    /** The heat to warm the blend is the integral of its heat capacity (Simpson's rule on 2000 intervals). */
    @Test
    void theHeatToWarmTheBlendIsTheIntegralOfItsHeatCapacity() {
        for (Card card : new Card[] {WHOLE, SLOPED, NBS}) {
            double[] x = card.componentCount() == 2 ? new double[] {0.25, 0.75} : new double[] {0.2, 0.5, 0.3};
            double from = 298.15;
            double to = 380.0;
            int m = 2000;
            double step = (to - from) / m;
            double s = 0.0;
            for (int i = 0; i <= m; i++) {
                double w = i == 0 || i == m ? 1 : i % 2 == 1 ? 4 : 2;
                s += w * card.mixture().heatCapacity(x, from + i * step);
            }
            double simpson = s * step / 3;
            assertEquals(simpson, card.mixture().heating(x, from, to), 1e-7 * Math.abs(simpson), card.title());
        }
    }

    /**
     * A pure liquid is a valid point for the heat functions whatever compositions the card's data cover, and its heat
     * capacity is the card's own: the NBS card covers x_acid ≥ 0.0099, yet acid stirred into pure water is the
     * heat of solution (NBS: −66.5 kJ for 1 mol in 10 mol water), and pure water's heat capacity is its row.
     */
    @Test
    void pureLiquidsAreValidPointsForHeats() {
        double heat = CardFunctions.additionHeat(NBS, new double[] {0, 10}, 0, 1, AmountBasis.MOL, 25.0,
                Extrapolation.AS_CARD);
        assertEquals(NbsSulfuricAcid.heatOfSolution(1), heat, 2 * NbsSulfuricAcid.RESOLUTION);
        assertEquals(0.0, CardFunctions.mixingHeat(NBS, new double[] {0, 10}, AmountBasis.MOL, 25.0,
                Extrapolation.AS_CARD));
        assertEquals(0.07529, CardFunctions.heatCapacity(NBS, new double[] {0, 1}, 25.0, Extrapolation.AS_CARD,
                false), 1e-12);
        // the pure acid on the whole-range card is the CRC's 138.9 J/(mol·K), not the solution model's w_w = 0 value
        assertEquals(0.1389, CardFunctions.heatCapacity(WHOLE, new double[] {1, 0}, 25.0, Extrapolation.AS_CARD,
                false), 1e-12);
        assertEquals(0.0, CardFunctions.adiabaticRise(NBS, new double[] {0, 10}, AmountBasis.MOL, 25.0,
                Extrapolation.AS_CARD));
    }

    /**
     * Per kg: the molar heat capacity divided by the mean molar mass. Pure water on the whole-range card is the
     * IAPWS-97 value of Laliberté's table, 4181.9 J/(kg·K) at 25 °C, within its fit (0.07 %).
     */
    @Test
    void perKilogram() {
        double perKg = CardFunctions.heatCapacity(WHOLE, new double[] {0, 1}, 25.0, Extrapolation.AS_CARD, true);
        assertEquals(4.1819, perKg, 4.1819 * 7e-4);
        double[] x = {0.2, 0.8};
        double molar = CardFunctions.heatCapacity(WHOLE, x, 25.0, Extrapolation.AS_CARD, false);
        double mean = 0.2 * 98.072 + 0.8 * 18.015;
        assertEquals(molar / mean * 1000, CardFunctions.heatCapacity(WHOLE, x, 25.0, Extrapolation.AS_CARD, true),
                1e-12);
        Figures.note(BlendHeatCapacityTest.class, "H2SO4 + water, x = 0.2 (57.6 %% w/w) at 25 °C: %.4f kJ/(kg·K) "
                + "from Laliberté 2009; the pure liquids' sum gives %.4f", molar / mean * 1000,
                CardFunctions.heatCapacity(NBS, x, 25.0, Extrapolation.AS_CARD, true));
    }
}
