package org.miscela.core.blend;

import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.functions.AmountBasis;
import org.miscela.core.functions.CardFunctions;
import org.miscela.core.model.ConventionalMass;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import org.miscela.reference.Oiml22;

/**
 * The trade's units of the blending functions: tonne, pound, US and imperial gallon, the litre's spellings, and
 * conventional mass (weighed in air). Factors are exact definitions: 1 t = 10³ kg and 1 L = 1 dm³ (SI Brochure, 9th
 * edition, 2019, table 8); the avoirdupois pound 0.453 592 37 kg, the US gallon 3.785 411 784 × 10⁻³ m³ and the
 * imperial gallon 4.546 09 × 10⁻³ m³ (NIST SP 811 (2008), appendix B.8). Conventional mass is OIML D 28 (2004),
 * clauses 4 and 5: the mass m_c of a reference of density 8000 kg/m³ that balances the body in air of 1.2 kg/m³, so
 * m (1 − 1.2/ρ) = m_c (1 − 1.2/8000); each expected value below computes that equation itself. Densities are the
 * OIML R 22 formula's (the card's pure liquids are exactly the formula; its mixtures within 0.011 kg/m³).
 */
class TradeUnitsTest {
    private static final Card CARD = Cards.ETHANOL_WATER;
    private static final Extrapolation E = Extrapolation.AS_CARD;
    private static final double NAN = Double.NaN;

    /** m/m_c from OIML D 28's balance equation, written out here. */
    private static double trueOverConventional(double rho) {
        return (1 - 1.2 / 8000) / (1 - 1.2 / rho);
    }

    @Test
    void factorsAreTheDefinitions() {
        assertEquals(453.59237, AmountUnit.LB.toBase(1), 0.0, "NIST SP 811 B.8: 1 lb = 0.453 592 37 kg exactly");
        assertEquals(1e6, AmountUnit.T.toBase(1), 0.0, "SI Brochure table 8: 1 t = 10³ kg");
        assertEquals(3785.411784, AmountUnit.US_GAL.toBase(1), 1e-9, "NIST SP 811 B.8: 3.785 411 784 E-03 m³");
        assertEquals(4546.09, AmountUnit.IMP_GAL.toBase(1), 1e-9, "NIST SP 811 B.8: 4.546 09 E-03 m³");
        assertEquals(1000.0, AmountUnit.L.toBase(1), 0.0);
        String[][] same = {{"t", "tonne", "tonnes"}, {"lb", "lbs"}, {"US gal", "gal", "gal (US)"},
            {"imp gal", "UK gal", "gal (imp)", "gal (UK)"}, {"L", "l", "litre", "liter", "litres", "liters", "dm³"},
            {"mL", "ml", "millilitre", "milliliter", "millilitres", "milliliters", "cm³", "cm3"}, {"m³", "m3"},
            {"kg (conventional)", "kg air"}, {"g (conventional)", "g air"}, {"t (conventional)", "t air"},
            {"lb (conventional)", "lb air"}};
        for (String[] spellings : same) {
            for (String s : spellings) {
                assertEquals(AmountUnit.lookup(spellings[0]), AmountUnit.lookup(" " + s + " "), s);
            }
        }
        assertTrue(AmountUnit.KG_AIR.isConventional() && !AmountUnit.KG.isConventional());
        assertEquals(AmountUnit.KG.toBase(1), AmountUnit.KG_AIR.toBase(1), 0.0);
        assertEquals(AmountUnit.LB.toBase(1), AmountUnit.LB_AIR.toBase(1), 0.0);
    }

    /** Ambiguous or unknown spellings are refused with the list, grouped by what they measure. */
    @Test
    void unknownSpellingsAreRefusedWithTheList() {
        for (String s : new String[] {"gallon", "GAL", "Litre", "oz", "kg conventional", "imperial gallon"}) {
            MiscelaException e = assertThrows(MiscelaException.class, () -> AmountUnit.lookup(s), s);
            assertEquals(Problem.BLEND_UNKNOWN_UNIT, e.problem());
            assertTrue(e.getMessage().contains("masses: g, kg, t, tonne, tonnes, lb, lbs; masses weighed in air "
                    + "(conventional mass, OIML D 28): g (conventional), g air, kg (conventional), kg air,"),
                    e.getMessage());
            assertTrue(e.getMessage().contains("US gal, gal, gal (US), imp gal, UK gal, gal (imp), gal (UK)."),
                    e.getMessage());
        }
        MiscelaException dimension = assertThrows(MiscelaException.class, () -> BlendFunctions.batch(CARD,
                new double[] {50, 50}, "g", null, 20, "mass", "gal", E));
        assertEquals("US gal is a unit of volume, but the mass needs a unit of mass (g, kg, t, lb, g (conventional), "
                + "kg (conventional), t (conventional), lb (conventional)).", dimension.getMessage());
    }

    /**
     * One US gallon of 40 %vol at 20 °C holds 0.4 gal = 1514.1647136 mL of ethanol measured at 20 °C (definition of
     * %vol, OIML R 22); its mass is that times ρ(1, 20 °C), in pounds divided by 453.592 37.
     */
    @Test
    void aRecipeInGallonsAndPounds() {
        CompositionBasis strength = BlendFunctions.basis(CARD, "%vol", 20, BlendFunctions.DEFAULT_BALANCE);
        double[] fortyPercent = {40, NAN};
        double[] ml = BlendFunctions.recipe(CARD, 1, "gal", 20, fortyPercent, strength, new double[] {20}, "mL", E);
        assertEquals(0.4 * 3785.411784, ml[0], 1e-9);
        double[] usGal = BlendFunctions.recipe(CARD, 1, "US gal", 20, fortyPercent, strength, new double[] {20},
                "gal", E);
        assertEquals(0.4, usGal[0], 1e-12);
        double[] lb = BlendFunctions.recipe(CARD, 1, "gal", 20, fortyPercent, strength, null, "lb", E);
        assertEquals(0.4 * 3785.411784 * Oiml22.density(1, 20) / 1000 / 453.59237, lb[0], 1e-12);
        // the same recipe in litres, in kg: only the numbers change
        double[] kg = BlendFunctions.recipe(CARD, 3.785411784, "L", 20, fortyPercent, strength, null, null, E);
        assertEquals(kg[1] / 0.45359237, lb[1], 1e-12);
        // 100 imperial gallons at 40 %vol hold 40 imperial gallons of ethanol, 181.8436 L
        double[] imp = BlendFunctions.recipe(CARD, 100, "imp gal", 20, fortyPercent, strength, new double[] {20},
                "L", E);
        assertEquals(40 * 4.54609, imp[0], 1e-9);
        Figures.note(TradeUnitsTest.class, "1 US gal of 40 %%vol at 20 °C: %.6f lb ethanol, %.6f lb water", lb[0], lb[1]);
    }

    /** Tonnes and pounds of a batch give the totals their kilograms give. */
    @Test
    void aBatchInTonnesAndPounds() {
        double kgVolume = BlendFunctions.batch(CARD, new double[] {400, 600}, "kg", null, 20, "volume", "m³", E);
        assertEquals(kgVolume, BlendFunctions.batch(CARD, new double[] {0.4, 0.6}, "t", null, 20, "volume", "m³", E),
                1e-15);
        assertEquals(kgVolume, BlendFunctions.batch(CARD, new double[] {400 / 0.45359237, 600 / 0.45359237}, "lb",
                null, 20, "volume", "m³", E), 1e-14);
        assertEquals(1000 / 0.45359237, BlendFunctions.batch(CARD, new double[] {0.4, 0.6}, "tonne", null, 20, "mass",
                "lbs", E), 1e-9);
        assertEquals(kgVolume * 1000 / 3.785411784, BlendFunctions.batch(CARD, new double[] {0.4, 0.6}, "t", null,
                20, "volume", "gal", E), 1e-9);
    }

    /**
     * OIML D 28's definition for three materials: a steel weight of 8000 kg/m³ has m = m_c exactly; clause 5 says
     * m_c deviates from m by about −3·10⁻⁴ for aluminium (2700 kg/m³) and +10⁻⁴ for platinum (21 450 kg/m³, from
     * memory; −2.94·10⁻⁴ and +0.94·10⁻⁴ by the definition); water at 20 °C, 998.2 kg/m³: 1.2/998.2 = 0.001 202 164,
     * m/m_c = 0.99985/0.998 797 836 = 1.001 053.
     */
    @Test
    void conventionalMassFollowsOimlD28() {
        assertEquals(1.0, ConventionalMass.trueMassPerConventional(8000), 0.0);
        assertEquals(-3e-4, 1 / ConventionalMass.trueMassPerConventional(2700) - 1, 0.1e-4);
        assertEquals(1e-4, 1 / ConventionalMass.trueMassPerConventional(21450) - 1, 0.1e-4);
        double water = ConventionalMass.trueMassPerConventional(998.2);
        assertEquals((1 - 0.00015) / (1 - 0.001202163895), water, 1e-12);
        assertEquals(1.001053, water, 5e-7);
        assertEquals(trueOverConventional(998.2), water, 1e-15);
    }

    /**
     * 50 g of each weighed in air at 20 °C are 50·m/m_c of each: ethanol 50 × 1.001371 g (ρ 789.239), water
     * 50 × 1.001053 g (ρ 998.201); the batch's total mass and volume follow from those true masses.
     */
    @Test
    void aBatchWeighedInAir() {
        double ethanol = 50 * trueOverConventional(Oiml22.density(1, 20));
        double water = 50 * trueOverConventional(Oiml22.density(0, 20));
        assertEquals(50.0686, ethanol, 1e-4);
        assertEquals(50.0527, water, 1e-4);
        double[] air = {50, 50};
        assertEquals(ethanol + water, BlendFunctions.batch(CARD, air, "g (conventional)", null, 20, "mass", "g", E),
                1e-9);
        double trueVolume = BlendFunctions.batch(CARD, new double[] {ethanol, water}, "g", null, 20, "volume", "mL",
                E);
        assertEquals(trueVolume, BlendFunctions.batch(CARD, air, "g air", null, 20, "volume", "mL", E), 1e-9);
        // weighed in tanks at 25 °C instead: the pure densities there
        double warm = 50 * trueOverConventional(Oiml22.density(1, 25)) + 50 * trueOverConventional(Oiml22.density(0,
                25));
        assertEquals(warm, BlendFunctions.batch(CARD, air, "g air", new double[] {25}, 20, "mass", "g", E), 1e-9);
        // and what the batch itself weighs in air: its density at 20 °C, OIML at the batch's mass fraction
        double p = ethanol / (ethanol + water);
        double mixture = Oiml22.density(p, 20);
        double conventional = (ethanol + water) / trueOverConventional(mixture);
        double tolerance = (ethanol + water) * 1.2 * Cards.OIML_DENSITY_TOLERANCE / (mixture * mixture);
        assertEquals(conventional, BlendFunctions.batch(CARD, air, "g air", null, 20, "mass", "g (conventional)", E),
                tolerance + 1e-12);
    }

    /**
     * Conventional masses do not add up: the mixed batch weighed in air shows more than its ingredients weighed in
     * air, by 1.2 kg/m³ times the contraction (divided by 1 − 1.2/8000), since it displaces less air: Σ m_c,k =
     * (m − 1.2·Σ V_k)/(1 − 1.2/8000) against (m − 1.2·V)/(1 − 1.2/8000).
     */
    @Test
    void theBatchWeighsMoreInAirThanItsIngredientsByTheContraction() {
        double[] grams = {500, 500};
        double sumOfParts = BlendFunctions.recipe(CARD, 1, "kg", 20, new double[] {0.5, 0.5},
                CompositionBasis.massFraction(), null, "g (conventional)", E)[0]
                + BlendFunctions.recipe(CARD, 1, "kg", 20, new double[] {0.5, 0.5}, CompositionBasis.massFraction(),
                        null, "g (conventional)", E)[1];
        double whole = BlendFunctions.batch(CARD, grams, "g", null, 20, "mass", "g (conventional)", E);
        double contraction = BlendFunctions.batch(CARD, grams, "g", null, 20, "contraction", "m³", E);
        assertEquals(1.2 * contraction * 1000 / (1 - 1.2 / 8000), whole - sumOfParts, 1e-9);
        assertTrue(whole - sumOfParts > 0.04, "about 48 mg per kg: " + (whole - sumOfParts));
    }

    /**
     * A recipe for 1 kg weighed in air of p = 0.5 at 20 °C: the true kilogram is m/m_c(ρ(0.5, 20 °C)) = 1.00116 kg,
     * half of it each; asked for in conventional kg, each component is its true mass over its own m/m_c.
     */
    @Test
    void aRecipeWeighedInAir() {
        CompositionBasis mass = CompositionBasis.massFraction();
        double[] half = {0.5, 0.5};
        double[] kg = BlendFunctions.recipe(CARD, 1, "kg (conventional)", 20, half, mass, null, "kg", E);
        double total = trueOverConventional(Oiml22.density(0.5, 20));
        double tolerance = 1.2 * Cards.OIML_DENSITY_TOLERANCE / (913.771 * 913.771);
        assertEquals(total / 2, kg[0], tolerance);
        assertEquals(total / 2, kg[1], tolerance);
        double[] air = BlendFunctions.recipe(CARD, 1, "kg", 20, half, mass, new double[] {15, 25}, "kg air", E);
        assertEquals(0.5 / trueOverConventional(Oiml22.density(1, 15)), air[0], 1e-12);
        assertEquals(0.5 / trueOverConventional(Oiml22.density(0, 25)), air[1], 1e-12);
        double[] atRecipeTemperature = BlendFunctions.recipe(CARD, 1, "kg", 20, half, mass, null, "lb air", E);
        assertEquals(0.5 / trueOverConventional(Oiml22.density(1, 20)) / 0.45359237, atRecipeTemperature[0], 1e-12);
    }

    /**
     * 500 g + 500 g weighed in air brought to a (true) mass fraction of 0.4 with additions weighed in air: the true
     * masses are e = 500·m/m_c(ethanol), w = 500·m/m_c(water); water to add e/0.4 − e − w (true), shown as
     * conventional mass through water's own m/m_c. Made up to exactly 2 kg weighed in air, the batch weighs 2 kg in
     * air.
     */
    @Test
    void anAdjustmentWeighedInAir() {
        double e = 500 * trueOverConventional(Oiml22.density(1, 20));
        double w = 500 * trueOverConventional(Oiml22.density(0, 20));
        double addTrue = e / 0.4 - e - w;
        CompositionBasis mass = CompositionBasis.massFraction();
        double[] add = (double[]) BlendFunctions.adjust(CARD, new double[] {500, 500}, "g air", null,
                new double[] {0.4, 0.6}, mass, 20, null, NAN, null, null, "g air", E);
        assertEquals(0, add[0], 1e-9);
        assertEquals(addTrue / trueOverConventional(Oiml22.density(0, 20)), add[1], 1e-9);
        double[] made = (double[]) BlendFunctions.adjust(CARD, new double[] {500, 500}, "g air", null,
                new double[] {0.4, 0.6}, mass, 20, "make up", 2, "kg (conventional)", null, "g", E);
        double[] after = {e + made[0], w + made[1]};
        assertEquals(2000, BlendFunctions.batch(CARD, after, "g", null, 20, "mass", "g (conventional)", E), 1e-9);
    }

    /** An addition weighed in air: 10 g (conventional) of ethanol is 10·m/m_c(ethanol, 20 °C) g, true. */
    @Test
    void anAdditionWeighedInAir() {
        double ethanol = 10 * trueOverConventional(Oiml22.density(1, 20));
        double batch = 50 * trueOverConventional(Oiml22.density(1, 20));
        double water = 50 * trueOverConventional(Oiml22.density(0, 20));
        double exact = BlendFunctions.additionVolume(CARD, new double[] {batch, water}, "g", null, 0, ethanol, "g",
                20, null, "mL", E);
        assertEquals(exact, BlendFunctions.additionVolume(CARD, new double[] {50, 50}, "g air", null, 0, 10, "g air",
                20, null, "mL", E), 1e-9);
    }

    /**
     * The heat functions take the same masses: 1 kg of acid and 1 kg of water weighed in air at 25 °C are their true
     * masses times m/m_c at each pure density there.
     */
    @Test
    void heatsOfAmountsWeighedInAir() {
        Card acid = org.miscela.core.card.TestCards.card("sulfuric-acid-water-nbs.tsv");
        double rhoAcid = CardFunctions.pureDensity(acid, 0, 25, E) * densityToKgPerM3(acid);
        double rhoWater = CardFunctions.pureDensity(acid, 1, 25, E) * densityToKgPerM3(acid);
        double[] air = {1, 1};
        double[] trueKg = {trueOverConventional(rhoAcid), trueOverConventional(rhoWater)};
        assertEquals(CardFunctions.mixingHeat(acid, trueKg, AmountBasis.KG, 25, E),
                CardFunctions.mixingHeat(acid, air, AmountBasis.lookup("KG (conventional)"), 25, E), 1e-9);
        assertEquals(CardFunctions.mixingHeat(acid, new double[] {1 / 0.45359237, 1 / 0.45359237}, AmountBasis.LB,
                25, E), CardFunctions.mixingHeat(acid, new double[] {1, 1}, AmountBasis.KG, 25, E), 1e-9);
        assertEquals(CardFunctions.mixingHeat(acid, new double[] {1, 1}, AmountBasis.T, 25, E),
                1000 * CardFunctions.mixingHeat(acid, new double[] {1, 1}, AmountBasis.KG, 25, E), 1e-6);
    }

    private static double densityToKgPerM3(Card card) {
        return card.units().density().toKgPerM3(1.0);
    }

    /** Nothing lighter than air can be weighed in it; the refusal names the component, its density and the way out. */
    @Test
    void aBodyLighterThanAirIsRefused() {
        MiscelaException e = assertThrows(MiscelaException.class, () -> BlendFunctions.batch(Cards.LIGHTER_THAN_AIR,
                new double[] {1, 1}, "kg air", null, 20, null, null, E));
        assertEquals(Problem.LIGHTER_THAN_AIR, e.problem());
        assertEquals("The density of R is 1.1 kg/m³ at 20 °C, not above the 1.2 kg/m³ of air that conventional mass "
                + "assumes, so a mass weighed in air cannot be turned into a true mass; give true masses (g, kg, t, "
                + "lb).", e.getMessage());
        // a true mass of the same is fine, and so is a conventional mass of the other component alone
        BlendFunctions.batch(Cards.LIGHTER_THAN_AIR, new double[] {1, 1}, "kg", null, 20, null, null, E);
        BlendFunctions.batch(Cards.LIGHTER_THAN_AIR, new double[] {0, 1}, "kg air", null, 20, null, null, E);
        MiscelaException heat = assertThrows(MiscelaException.class, () -> CardFunctions.amountsToMoles(
                Cards.LIGHTER_THAN_AIR, new double[] {1, 1}, AmountBasis.KG_AIR, 20, E));
        assertEquals(Problem.LIGHTER_THAN_AIR, heat.problem());
    }
}
