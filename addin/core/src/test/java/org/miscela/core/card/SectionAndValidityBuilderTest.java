package org.miscela.core.card;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.miscela.core.model.ExcessFunction;
import org.miscela.core.model.GeometricModel;
import org.miscela.core.model.RedlichKister;
import org.miscela.core.model.TernaryTerm;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;

/**
 * The builders of an excess-property section and of the validity range, fed rows the grammar filed, without the rest
 * of a card. Coefficients, limits and names are invented. Unit factors: 1 m³ = 10⁶ cm³ and T/K = t/°C + 273.15 (the
 * SI definitions).
 */
class SectionAndValidityBuilderTest {
    private static final Subjects ABC = new Subjects(Arrays.asList("alpha", "beta", "gamma"));

    private static ParsedCard rows(Object[]... rows) {
        Object[][] cells = new Object[rows.length + 1][];
        cells[0] = new Object[] {"Miscela card", 2.0};
        System.arraycopy(rows, 0, cells, 1, rows.length);
        return CardGrammar.parse(cells);
    }

    private static ExcessFunction volume(ParsedCard card, double factor, boolean missingIdeal) {
        return new ExcessSectionBuilder(card.section("excess volume"), ABC, Units.Temperature.CELSIUS, factor)
                .build(GeometricModel.MUGGIANU, -1, missingIdeal);
    }

    private static MiscelaException refused(Problem problem, Runnable build) {
        MiscelaException e = assertThrows(MiscelaException.class, build::run);
        assertEquals(problem, e.problem(), e::getMessage);
        return e;
    }

    @Test
    void aPairWrittenTheOtherWayRoundDescribesTheSameMixture() {
        double[] a = {-4.0, 1.5, -0.5, 0.25};
        ParsedCard card = rows(new Object[] {"excess volume A0", "beta + alpha", a[0]},
                new Object[] {"excess volume A1", "beta + alpha", a[1]},
                new Object[] {"excess volume A2", "beta + alpha", a[2]},
                new Object[] {"excess volume A3", "beta + alpha", a[3]});
        ExcessFunction f = volume(card, 1.0, true);
        RedlichKister ab = f.pair(0, 1);
        for (int k = 0; k < a.length; k++) {
            assertEquals(k % 2 == 0 ? a[k] : -a[k], ab.coefficientAt(k, 300.0), "A" + k + " in card order");
        }
        // The series as written, x_b·x_a·Σ A_k (x_b − x_a)^k, evaluated directly.
        double xa = 0.3;
        double xb = 0.7;
        double written = 0.0;
        for (int k = 0; k < a.length; k++) {
            written += a[k] * Math.pow(xb - xa, k);
        }
        written *= xa * xb;
        assertEquals(written, f.value(new double[] {xa, xb, 0.0}, 300.0), 1e-15);
        assertNull(f.pair(0, 2), "missing pairs are ideal when the card says so");
    }

    @Test
    void valuesAreConvertedToInternalUnits() {
        ParsedCard card = rows(new Object[] {"excess volume A0", "alpha + beta", -4e-6, 2e-8},
                new Object[] {"excess volume reference temperature", "alpha + beta", 25.0});
        RedlichKister ab = volume(card, 1e6, true).pair(0, 1);
        assertEquals(298.15, ab.referenceKelvin(), 1e-12);
        assertEquals(-4.0, ab.coefficientAt(0, 298.15), 1e-12);
        assertEquals(-4.0 + 0.02 * 10.0, ab.coefficientAt(0, 308.15), 1e-12);
    }

    @Test
    void aReversedCovarianceChangesTheSignOfOddCrossTerms() {
        // parameters a_00, a_10 (A0 and A1, constant): cov(A0, A1) changes sign with the pair's order, variances not
        ParsedCard card = rows(new Object[] {"excess volume A0", "beta + alpha", -4.0},
                new Object[] {"excess volume A1", "beta + alpha", 1.5},
                new Object[] {"excess volume covariance", "beta + alpha", 0.04, 0.01},
                new Object[] {"excess volume covariance", "beta + alpha", 0.01, 0.09});
        double[][] c = volume(card, 2.0, true).covariance(0, 1);
        assertArrayEquals(new double[] {0.16, -0.04}, c[0], 1e-15);
        assertArrayEquals(new double[] {-0.04, 0.36}, c[1], 1e-15);
    }

    @Test
    void aTernaryTermKeepsTheOrderOfItsFirstRow() {
        ParsedCard card = rows(new Object[] {"excess volume ternary C0", "gamma + alpha + beta", 3.0},
                new Object[] {"excess volume ternary C1", "gamma + alpha + beta", 1.0});
        TernaryTerm t = volume(card, 1.0, true).ternaryTerms().get(0);
        assertArrayEquals(new int[] {2, 0, 1}, new int[] {t.first(), t.second(), t.third()});
        assertEquals(2, t.coefficientCount());
    }

    @Test
    void aSectionRefusesWhatItCannotBuild() {
        assertEquals("The card gives no excess volume for the pair alpha + beta: add its 'excess volume A0' row "
                + "(write 0 for an ideal pair), or write 'missing pairs | ideal' on the card to treat every pair "
                + "without rows as ideal. A row typed below the card's named range is not part of the card: insert "
                + "rows inside the range, or widen the range (Sheet ▸ Named Ranges and Expressions ▸ Manage).",
                refused(Problem.MISSING_PAIR, () -> volume(rows(), 1.0, false))
                        .getMessage());
        refused(Problem.MISSING_PAIR_ROW, () -> volume(rows(
                new Object[] {"excess volume A0", "alpha + beta", -4.0, 0.01}), 1.0, true));
        refused(Problem.COEFFICIENT_GAP, () -> volume(rows(
                new Object[] {"excess volume A1", "alpha + beta", 1.0}), 1.0, true));
        refused(Problem.PAIR_ORDER, () -> volume(rows(new Object[] {"excess volume A0", "alpha + beta", 1.0},
                new Object[] {"excess volume A1", "beta + alpha", 1.0}), 1.0, true));
        refused(Problem.COVARIANCE_SIZE, () -> volume(rows(new Object[] {"excess volume A0", "alpha + beta", 1.0},
                new Object[] {"excess volume covariance", "alpha + beta", 1.0, 0.0}), 1.0, true));
    }

    private static Validity validity(ParsedCard card, boolean pureOnly) {
        return new ValidityBuilder(card, ABC, Units.Temperature.CELSIUS).validity(pureOnly);
    }

    @Test
    void limitsAreReadPerComponentAndPerPair() {
        Validity v = validity(rows(new Object[] {"valid temperature", 10.0, 40.0},
                new Object[] {"valid mole fraction", "Beta", 0.1, 0.9},
                new Object[] {"valid pair temperature", "gamma + alpha", 15.0, 35.0},
                new Object[] {"valid pair mole fraction", "alpha + beta", 0.0, 0.5}), false);
        assertEquals(283.15, v.lowestKelvin(), 1e-12);
        assertEquals(313.15, v.highestKelvin(), 1e-12);
        assertEquals(0.0, v.lowestFraction(0));
        assertEquals(1.0, v.highestFraction(0));
        assertEquals(0.1, v.lowestFraction(1));
        assertEquals(0.9, v.highestFraction(1));
        Validity.PairLimit t = v.pairLimits().get(0);
        assertArrayEquals(new double[] {2, 0, 288.15, 308.15}, new double[] {t.first(), t.second(), t.lowestKelvin(),
            t.highestKelvin()}, 1e-12);
        Validity.PairLimit x = v.pairLimits().get(1);
        assertArrayEquals(new double[] {0, 1, 0.0, 0.5}, new double[] {x.first(), x.second(), x.lowestRatio(),
            x.highestRatio()});
    }

    @Test
    void rangesMustBeIncreasingAndPhysical() {
        Object[] temperature = {"valid temperature", 10.0, 40.0};
        refused(Problem.NO_COMPOSITION_LIMIT, () -> validity(rows(temperature), false));
        assertEquals(1.0, validity(rows(temperature), true).highestFraction(2), "the pure part needs no limit");
        assertEquals("Card row 2 (valid temperature): the lower limit 40 must be below the upper limit 10.",
                refused(Problem.BAD_RANGE, () -> validity(rows(new Object[] {"valid temperature", 40.0, 10.0}), true))
                        .getMessage());
        refused(Problem.NOT_POSITIVE, () -> validity(rows(new Object[] {"valid temperature", -300.0, 10.0}), true));
        refused(Problem.MOLE_FRACTION_LIMIT, () -> validity(rows(temperature,
                new Object[] {"valid mole fraction", "alpha", 0.2, 1.5}), false));
        refused(Problem.BAD_RANGE, () -> validity(rows(temperature,
                new Object[] {"valid pair mole fraction", "alpha + beta", 0.5, 0.5}), true));
        refused(Problem.BAD_PAIR, () -> validity(rows(temperature,
                new Object[] {"valid pair temperature", "alpha + beta + gamma", 15.0, 35.0}), true));
        refused(Problem.NOT_POSITIVE, () -> validity(rows(temperature,
                new Object[] {"valid pair temperature", "alpha + beta", -274.0, 35.0}), true));
    }
}
