package org.miscela.core.blend;

import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.optim.univariate.UnivariatePointValuePair;
import org.junit.jupiter.api.Test;
import org.miscela.core.functions.CardFunctions;
import org.miscela.core.card.Extrapolation;
import org.miscela.reference.Oiml22;

/** Composition from a measured density. */
class DensityInversionTest {
    private static final Extrapolation E = Extrapolation.AS_CARD;
    private static final double NAN = Double.NaN;

    /**
     * OIML R 22 check values at 20 °C (ethanol-water.md, three decimals) give back their mass fractions: the card's
     * density error 0.011 + 0.0005 kg/m³ over the formula's slope |dρ/dp| there.
     */
    @Test
    void oimlCheckValuesAt20Celsius() {
        double[] rho = {981.848, 968.607, 953.784, 935.145, 913.771, 891.098, 867.611, 843.386, 817.883};
        double worst = 0;
        for (int i = 0; i < rho.length; i++) {
            double p = (i + 1) / 10.0;
            double[] x = DensityInversion.composition(Cards.ETHANOL_WATER, rho[i], 20, 0, null, NAN, NAN, E);
            double card = Compositions.fromMoleFractions(Cards.ETHANOL_WATER, x, CompositionBasis.massFraction(), E)[0];
            double slope = Math.abs(Oiml22.density(p + 1e-4, 20) - Oiml22.density(p - 1e-4, 20)) / 2e-4;
            assertEquals(p, card, 1.01 * (Cards.OIML_DENSITY_TOLERANCE + Cards.OIML_ROUNDING) / slope, "p = " + p);
            worst = Math.max(worst, Math.abs(card - p));
        }
        Figures.note(DensityInversionTest.class, "OIML R 22 densities at 20 °C -> mass fraction: worst %.2e", worst);
    }

    /** Varying water instead of ethanol finds the same composition. */
    @Test
    void eitherComponentMayVary() {
        double[] a = DensityInversion.composition(Cards.ETHANOL_WATER, 913.771, 20, 0, null, NAN, NAN, E);
        double[] b = DensityInversion.composition(Cards.ETHANOL_WATER, 913.771, 20, 1, null, NAN, NAN, E);
        assertEquals(a[0], b[0], 1e-12);
    }

    /** The invented card's density maximum, located on the test side by Commons Math's Brent optimiser. */
    private static UnivariatePointValuePair maximum() {
        return new BrentOptimizer(1e-12, 1e-14).optimize(new MaxEval(500), GoalType.MAXIMIZE,
                new SearchInterval(0, 1), new UnivariateObjectiveFunction(
                        x -> CardFunctions.density(Cards.DENSITY_MAXIMUM, x, 20, E)));
    }

    /** Below the maximum every density occurs twice (invented card): refused, listing both, unless restricted. */
    @Test
    void twoRootsAreRefusedUnlessTheRangeIsRestricted() {
        UnivariatePointValuePair max = maximum();
        assertTrue(max.getValue() > 1030 && max.getPoint() > 0.2 && max.getPoint() < 0.4, max.getPoint() + "");
        double[] roots = DensityInversion.roots(Cards.DENSITY_MAXIMUM, 1020, 20, 0, null, NAN, NAN, E);
        assertEquals(2, roots.length);
        for (double r : roots) {
            assertEquals(1020, CardFunctions.density(Cards.DENSITY_MAXIMUM, r, 20, E), 1e-9);
        }
        MiscelaException ex = AlcoholometryTest.assertRefused(Problem.SEVERAL_DENSITIES, () -> DensityInversion
                .composition(Cards.DENSITY_MAXIMUM, 1020, 20, 0, null, NAN, NAN, E));
        assertTrue(ex.getMessage().contains(Show.number(roots[0])) && ex.getMessage().contains(Show.number(roots[1])),
                ex.getMessage());
        double[] low = DensityInversion.composition(Cards.DENSITY_MAXIMUM, 1020, 20, 0, null, 0, max.getPoint(), E);
        double[] high = DensityInversion.composition(Cards.DENSITY_MAXIMUM, 1020, 20, 0, null, max.getPoint(), 1, E);
        assertEquals(roots[0], low[0], 1e-13);
        assertEquals(roots[1], high[0], 1e-13);
    }

    /**
     * Just below the maximum the two roots lie closer together than one scan cell (1/256): they are still both
     * found, because the cell holding the extremum is split there.
     */
    @Test
    void rootsCloserThanOneCellAreBothFound() {
        UnivariatePointValuePair max = maximum();
        double[] roots = DensityInversion.roots(Cards.DENSITY_MAXIMUM, max.getValue() - 1e-4, 20, 0, null, NAN, NAN,
                E);
        assertEquals(2, roots.length);
        assertTrue(roots[1] - roots[0] < 1.0 / DensityInversion.SCAN_CELLS, (roots[1] - roots[0]) + "");
    }

    /** Above the maximum no composition fits; the message gives the densities the card covers. */
    @Test
    void densityAboveTheMaximumIsRefused() {
        MiscelaException ex = AlcoholometryTest.assertRefused(Problem.DENSITY_NOT_FOUND, () -> DensityInversion
                .composition(Cards.DENSITY_MAXIMUM, 1040, 20, 0, null, NAN, NAN, E));
        assertTrue(ex.getMessage().contains("1000 to 1031"), ex.getMessage());
    }

    /** Three components: vary A, keep B:C = 5:3 (invented card); a density made on that path gives back its point. */
    @Test
    void ternaryAlongADirection() {
        double[] reference = {0.2, 0.5, 0.3};
        double[] point = {0.4, 0.6 * 5 / 8, 0.6 * 3 / 8};
        double rho = CardFunctions.density(Cards.TERNARY, point, 25, E);
        double[] x = DensityInversion.composition(Cards.TERNARY, rho, 25, 0, reference, NAN, NAN, E);
        for (int k = 0; k < 3; k++) {
            assertEquals(point[k], x[k], 1e-12);
        }
    }

    @Test
    void refusals() {
        AlcoholometryTest.assertRefused(Problem.NEEDS_REFERENCE, () -> DensityInversion.composition(Cards.TERNARY,
                900, 25, 0, null, NAN, NAN, E));
        AlcoholometryTest.assertRefused(Problem.NO_PROPORTIONS, () -> DensityInversion.composition(Cards.TERNARY,
                900, 25, 0, new double[] {1, 0, 0}, NAN, NAN, E));
        AlcoholometryTest.assertRefused(Problem.RANGE_HALF, () -> DensityInversion.composition(
                Cards.ETHANOL_WATER, 900, 20, 0, null, 0.1, NAN, E));
        AlcoholometryTest.assertRefused(Problem.BLEND_BAD_RANGE, () -> DensityInversion.composition(
                Cards.ETHANOL_WATER, 900, 20, 0, null, 0.5, 0.2, E));
        AlcoholometryTest.assertRefused(Problem.BLEND_NOT_POSITIVE, () -> DensityInversion.composition(
                Cards.ETHANOL_WATER, -900, 20, 0, null, NAN, NAN, E));
        // invented card: C must be at least 0.1, so a path without C has no valid composition
        AlcoholometryTest.assertRefused(Problem.EMPTY_PATH, () -> DensityInversion.composition(Cards.LIMITED_TERNARY, 900, 20,
                0, new double[] {0.5, 0.5, 0}, NAN, NAN, E));
    }
}
