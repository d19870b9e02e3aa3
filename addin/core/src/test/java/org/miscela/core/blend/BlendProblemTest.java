package org.miscela.core.blend;

import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumMap;
import java.util.EnumSet;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;
import org.miscela.core.card.Card;
import org.miscela.core.card.CardReader;
import org.miscela.core.problem.Catalogue;
import org.miscela.core.card.Extrapolation;

/**
 * Every message of the blending section of {@link Problem} can occur: one call per problem that raises it, its text fully filled in.
 * The messages are written to target/figures/ for the record. Two cards here are invented for the purpose.
 */
class BlendProblemTest {
    private static final Extrapolation E = Extrapolation.AS_CARD;
    private static final double NAN = Double.NaN;
    private static final Card EW = Cards.ETHANOL_WATER;
    private static final CompositionBasis MASS = CompositionBasis.massFraction();

    /** Problems only a broken card could raise and that no test card reaches; kept as fallbacks. */
    private static final EnumSet<Problem> FALLBACKS = EnumSet.of(Problem.NO_COMPOSITION);

    /**
     * Invented: R (60 g/mol) and S (18 g/mol), both 1000 kg/m³, V^E = −40·x_R·x_S cm³/mol. S's partial molar volume
     * turns negative above x_R = 0.67, so the molarity of R passes a maximum (about 17.97 mol/L) and 17 mol/L occurs
     * at two compositions.
     */
    static final Card MOLARITY_MAXIMUM = binary(-40.0);
    /** Invented: the same pair with V^E = −300·x_R·x_S, whose molar volume is negative mid-range (not physical). */
    static final Card NOT_PHYSICAL = binary(-300.0);

    static Card binary(double a0) {
        return CardReader.read(new Object[][] {{"Miscela card", 1.0}, {"source", "invented values, for tests"},
            {"temperature unit", "°C"}, {"density unit", "kg/m³"}, {"molar volume unit", "cm³/mol"},
            {"molar mass unit", "g/mol"}, {"valid temperature", 10.0, 30.0}, {"component", "R", 60.0},
            {"component", "S", 18.0}, {"density model", "R", "constant"}, {"density coefficients", "R", 1000.0},
            {"density model", "S", "constant"}, {"density coefficients", "S", 1000.0},
            {"valid mole fraction", "R", 0.0, 1.0}, {"excess volume A0", "R + S", a0}, {"extrapolation", "allow"}});
    }

    private static Map<Problem, Executable> cases() {
        Map<Problem, Executable> m = new EnumMap<>(Problem.class);
        Amounts half = Amounts.of(new double[] {500, 500}, AmountUnit.G);
        m.put(Problem.BLANK_ARGUMENT, () -> CompositionBasis.volumeFraction(NAN));
        m.put(Problem.UNKNOWN_RESULT, () -> BlendFunctions.batch(EW, new double[] {1, 1}, "mol", null, 20,
                "weight", null, E));
        m.put(Problem.ARGUMENT_NOT_FINITE, () -> CompositionBasis.molarity(Double.POSITIVE_INFINITY, 1));
        m.put(Problem.BLEND_NOT_POSITIVE, () -> Quantity.of(-1, AmountUnit.G));
        m.put(Problem.NO_SUCH_COMPONENT, () -> Compositions.toMoleFractions(EW, new double[] {1, NAN},
                CompositionBasis.molality(4), E));
        m.put(Problem.LENGTH, () -> Compositions.toMoleFractions(EW, new double[] {1},
                CompositionBasis.moleFraction(), E));
        m.put(Problem.BLANK_VALUE, () -> Compositions.toMoleFractions(EW, new double[] {NAN, 0.5}, MASS, E));
        m.put(Problem.VALUE_NOT_FINITE, () -> Compositions.toMoleFractions(EW,
                new double[] {Double.POSITIVE_INFINITY, NAN}, CompositionBasis.molarity(20, 1), E));
        m.put(Problem.VALUE_NEGATIVE, () -> Compositions.toMoleFractions(EW, new double[] {-1, NAN},
                CompositionBasis.molarity(20, 1), E));
        m.put(Problem.VALUE_OUT_OF_RANGE, () -> Compositions.toMoleFractions(EW, new double[] {140, -40},
                CompositionBasis.of(CompositionBasis.Kind.MASS_PERCENT, NAN, -1), E));
        m.put(Problem.BLEND_UNKNOWN_UNIT, () -> AmountUnit.lookup("gallon"));
        m.put(Problem.WRONG_DIMENSION, () -> Batches.totals(EW, half, 20, E).mass(AmountUnit.L));
        m.put(Problem.BLEND_UNKNOWN_BASIS, () -> CompositionBasis.Kind.lookup("ppm"));
        m.put(Problem.FRACTION_SUM, () -> Compositions.toMoleFractions(EW, new double[] {0.5, 0.6}, MASS, E));
        m.put(Problem.NEEDS_BALANCE, () -> Compositions.toMoleFractions(EW, new double[] {5, NAN},
                CompositionBasis.of(CompositionBasis.Kind.MOLARITY, 20, -1), E));
        m.put(Problem.NEEDS_SOLVENT, () -> Compositions.toMoleFractions(EW, new double[] {5, NAN},
                CompositionBasis.of(CompositionBasis.Kind.MOLALITY, NAN, -1), E));
        m.put(Problem.NO_SOLVENT, () -> Compositions.fromMoleFractions(EW, new double[] {1, 0},
                CompositionBasis.molality(1), E));
        // water's own molality is 1000/18.01528 = 55.508 mol/kg
        m.put(Problem.BALANCE_DISAGREES, () -> Compositions.toMoleFractions(EW, new double[] {1, 50},
                CompositionBasis.molality(1), E));
        // pure ethanol at 20 °C holds 789.239/46.06844 = 17.13 mol/L, so 30 mol/L is out of reach
        m.put(Problem.TOO_CONCENTRATED, () -> Compositions.toMoleFractions(EW, new double[] {30, NAN},
                CompositionBasis.molarity(20, 1), E));
        m.put(Problem.SEVERAL_COMPOSITIONS, () -> Compositions.toMoleFractions(MOLARITY_MAXIMUM,
                new double[] {17, NAN}, CompositionBasis.molarity(20, 1), E));
        m.put(Problem.NEEDS_TEMPERATURES, () -> Amounts.of(new double[] {1, 2}, AmountUnit.L));
        m.put(Problem.NEEDS_TEMPERATURE, () -> Quantity.of(1, AmountUnit.L));
        m.put(Problem.NO_STORAGE_TEMPERATURES, () -> Recipes.forTarget(EW, Quantity.of(1, AmountUnit.KG),
                new double[] {0.5, 0.5}, MASS, null, E).amounts(AmountUnit.L));
        m.put(Problem.LIGHTER_THAN_AIR, () -> Batches.totals(Cards.LIGHTER_THAN_AIR, Amounts.of(new double[] {1, 1},
                AmountUnit.KG_AIR, new double[] {20, 20}), 20, E));
        m.put(Problem.BLEND_AMOUNT_ZERO, () -> Batches.totals(EW, Amounts.of(new double[] {0, 0}, AmountUnit.G), 20,
                E));
        m.put(Problem.BLEND_AMOUNT_TOO_LARGE, () -> Batches.totals(EW, Amounts.of(new double[] {1e308, 1e308},
                AmountUnit.KG), 20, E));
        m.put(Problem.NEEDS_REMOVAL, () -> Adjustments.leastAdditions(EW, half, new double[] {1, 0}, MASS, 20,
                null, E));
        m.put(Problem.LIMIT_BELOW_BATCH, () -> Adjustments.within(EW, half, new double[] {0.4, 0.6}, MASS,
                Quantity.of(0.5, AmountUnit.L, 20), 20, null, E));
        // from pure R towards x = (0.5, 0.5) the invented card's volume turns negative
        m.put(Problem.LIMIT_UNREACHABLE, () -> Adjustments.within(NOT_PHYSICAL,
                Amounts.of(new double[] {1, 0}, AmountUnit.MOL), new double[] {0.5, 0.5},
                CompositionBasis.moleFraction(), Quantity.of(1, AmountUnit.L, 20), 20, null, E));
        m.put(Problem.NEEDS_REFERENCE, () -> DensityInversion.composition(Cards.TERNARY, 900, 25, 0, null, NAN,
                NAN, E));
        m.put(Problem.NO_PROPORTIONS, () -> DensityInversion.composition(Cards.TERNARY, 900, 25, 0,
                new double[] {1, 0, 0}, NAN, NAN, E));
        m.put(Problem.RANGE_HALF, () -> DensityInversion.composition(EW, 900, 20, 0, null, 0.1, NAN, E));
        m.put(Problem.BLEND_BAD_RANGE, () -> DensityInversion.composition(EW, 900, 20, 0, null, 0.5, 0.2, E));
        m.put(Problem.EMPTY_PATH, () -> DensityInversion.composition(Cards.LIMITED_TERNARY, 900, 20, 0,
                new double[] {0.5, 0.5, 0}, NAN, NAN, E));
        m.put(Problem.DENSITY_NOT_FOUND, () -> DensityInversion.composition(EW, 1200, 20, 0, null, NAN, NAN, E));
        m.put(Problem.SEVERAL_DENSITIES, () -> DensityInversion.composition(Cards.DENSITY_MAXIMUM, 1020, 20, 0,
                null, NAN, NAN, E));
        return m;
    }

    @Test
    void everyProblemCanOccur() {
        Map<Problem, Executable> cases = cases();
        EnumSet<Problem> covered = EnumSet.copyOf(cases.keySet());
        covered.addAll(FALLBACKS);
        assertEquals(EnumSet.copyOf(Problem.of(Problem.Section.BLEND)), covered, "a problem without a case");
        StringBuilder b = new StringBuilder();
        cases.forEach((problem, call) -> {
            MiscelaException ex = assertThrows(MiscelaException.class, call, problem.name());
            assertEquals(problem, ex.problem(), ex.getMessage());
            assertTrue(Catalogue.isInstance(problem.pattern(), ex.getMessage()), "the test's matcher: " + ex.getMessage());
            assertFalse(ex.getMessage().matches("(?s).*%[sdf].*"), "unfilled placeholder: " + ex.getMessage());
            assertFalse(ex.getMessage().contains("null") || ex.getMessage().contains("NaN"), ex.getMessage());
            b.append(problem).append(": ").append(ex.getMessage()).append('\n');
        });
        Figures.write("figures/BlendProblemTest.txt", b.toString());
    }

    /**
     * Molarities whose moles per litre add up beyond the double range (found by the error catalogue's sheet, 1E+308
     * mol/L of two components) are too concentrated; they were refused as "The mole fractions sum to 0".
     */
    @Test
    void molaritiesBeyondTheDoubleRangeAreTooConcentrated() {
        MiscelaException ex = assertThrows(MiscelaException.class, () -> Compositions.toMoleFractions(Cards.TERNARY,
                new double[] {1e308, 1e308, NAN}, CompositionBasis.molarity(20, 2), E));
        assertEquals(Problem.TOO_CONCENTRATED, ex.problem(), ex.getMessage());
        assertTrue(ex.getMessage().contains("reach only 0 %"), ex.getMessage());
    }

    /** The pair's two compositions at 17 mol/L are each a true root (checked with the forward conversion). */
    @Test
    void severalCompositionsAreRealRoots() {
        MiscelaException ex = assertThrows(MiscelaException.class, () -> Compositions.toMoleFractions(MOLARITY_MAXIMUM,
                new double[] {17, NAN}, CompositionBasis.molarity(20, 1), E));
        assertTrue(ex.getMessage().contains("2 compositions"), ex.getMessage());
        String list = ex.getMessage().replaceAll(".*mole fraction of S: ([^)]*)\\).*", "$1");
        for (String s : list.split("; ")) {
            double xs = Double.parseDouble(s);
            double c = Compositions.fromMoleFractions(MOLARITY_MAXIMUM, new double[] {1 - xs, xs},
                    CompositionBasis.molarity(20, 1), E)[0];
            assertEquals(17, c, 1e-6);
        }
    }
}
