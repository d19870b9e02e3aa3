package org.miscela.core.card;

import org.miscela.core.model.Component;
import org.miscela.core.model.ConstantDensity;
import org.miscela.core.model.RedlichKister;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;

/**
 * Textbook identities of partial molar quantities, over random binary cards, each against values computed another
 * way: the partial volumes against differences of the extensive volume in the mole numbers, Gibbs–Duhem from
 * partial volumes at neighbouring compositions, summability of partials from differences, analytic derivatives
 * against finite differences, symmetry under swapping the components, and the pure-component and infinite-dilution
 * limits.
 */
class BinaryMixtureProperties {

    /** A random card: molar masses, constant pure densities, and an RK set of order 0..6 with linear T terms. */
    @Provide
    Arbitrary<Card> cards() {
        Arbitrary<Double> mass = Arbitraries.doubles().between(10, 300);
        Arbitrary<Double> rho = Arbitraries.doubles().between(600, 2000);
        Arbitrary<double[][]> rk = Arbitraries.integers().between(0, 6).flatMap(order -> Arbitraries.doubles()
                .between(-8, 8).array(double[].class).ofSize(2 * (order + 1)).map(v -> {
                    double[][] a = new double[order + 1][2];
                    for (int k = 0; k <= order; k++) {
                        a[k][0] = v[2 * k];
                        a[k][1] = v[2 * k + 1] * 0.01;
                    }
                    return a;
                }));
        return Combinators.combine(mass, mass, rho, rho, rk).as(BinaryMixtureProperties::card);
    }

    static Card card(double m1, double m2, double rho1, double rho2, double[][] a) {
        List<Component> comps = Arrays.asList(new Component("a", m1, new ConstantDensity(rho1)),
                new Component("b", m2, new ConstantDensity(rho2)));
        RedlichKister[][] ex = new RedlichKister[2][2];
        ex[0][1] = new RedlichKister(298.15, a);
        Units units = new Units(Units.Temperature.KELVIN, Units.Density.KG_PER_M3, Units.MolarVolume.CM3_PER_MOL,
                Units.MolarMass.G_PER_MOL);
        return new Card("random", "generated", units, comps, ex,
                new Validity(250, 350, new double[] {0, 0}, new double[] {1, 1}), false);
    }

    /** Swapped card: components in the other order, A_k → (−1)^k A_k. */
    static Card swapped(Card c) {
        List<Component> comps = Arrays.asList(c.components().get(1), c.components().get(0));
        RedlichKister[][] ex = new RedlichKister[2][2];
        ex[0][1] = c.excessVolume(1, 0);
        return new Card("swapped", "generated", c.units(), comps, ex, c.validity(), false);
    }

    /**
     * The rounding scale of V_m and of the partial molar volumes at T: V_1* + V_2* + Σ_k (k+1)·|A_k(T)|, which
     * bounds every term either adds up for x1 in [0, 1] (|x1 − x2| ≤ 1).
     */
    static double scale(Card card, double t) {
        RedlichKister rk = card.excessVolume(0, 1);
        double a = BinaryMixture.of(card).pureMolarVolume(0, t) + BinaryMixture.of(card).pureMolarVolume(1, t);
        for (int k = 0; k <= rk.order(); k++) {
            a += (k + 1) * Math.abs(rk.coefficientAt(k, t));
        }
        return a;
    }

    /**
     * Each partial molar volume against the derivative of the extensive volume N·V_m(n1/N) in n_k at fixed other
     * n_j, from values of V_m alone ({@link PartialsFromValues}: five-point central difference, step 2⁻¹⁰). The
     * rounding bound of one V_m is 64·u·{@link #scale} (a Horner chain of at most 6 steps, the pure volumes'
     * quotients M/ρ, the product with x1·x2 and the sum: fewer than 30 roundings of terms bounded by the scale, with
     * room), and the library's partial adds at most 640·u·scale (its three parts bounded by 1, 3 and 3 scales).
     */
    @Property(tries = 1000)
    void partialsAreDerivativesOfTheExtensiveVolume(@ForAll("cards") Card card,
            @ForAll @DoubleRange(min = 0, max = 1) double x1, @ForAll @DoubleRange(min = 260, max = 340) double t) {
        BinaryMixture m = BinaryMixture.of(card);
        double a = scale(card, t);
        double[] x = {x1, 1 - x1};
        for (int k = 0; k < 2; k++) {
            PartialsFromValues.Estimate d = PartialsFromValues.partial(y -> m.molarVolume(y[0], t), x, k, 0x1p-10,
                    64 * PartialsFromValues.U * a);
            double bound = d.bound + 640 * PartialsFromValues.U * a;
            assertEquals(d.value, m.partialMolarVolume(k, x1, t), bound, "component " + (k + 1) + ", bound " + bound);
        }
    }

    /**
     * Gibbs–Duhem from values: x1·[V̄_1(x1 + δ) − V̄_1(x1 − δ)] + x2·[V̄_2(x1 + δ) − V̄_2(x1 − δ)] = 0 to third order
     * in δ = 2⁻²⁶, with the library's partial volumes at the two neighbouring compositions (the series is a
     * polynomial, so it extends past 0 and 1). Bound: 2 × the partial's rounding bound 640·u·scale, plus
     * 2·u·Σ|terms| for the sum; the truncation term (δ³/3)·|x_k V̄_k‴| is below 10⁻¹⁸·scale for third derivatives
     * up to 10⁶·scale (a seventh-degree polynomial in x1 with d = 2x1 − 1 reaches about 10⁵).
     */
    @Property(tries = 2000)
    void gibbsDuhemFromNeighbouringCompositions(@ForAll("cards") Card card,
            @ForAll @DoubleRange(min = 0, max = 1) double x1, @ForAll @DoubleRange(min = 260, max = 340) double t) {
        BinaryMixture m = BinaryMixture.of(card);
        double delta = 0x1p-26;
        double first = x1 * (m.partialMolarVolume(0, x1 + delta, t) - m.partialMolarVolume(0, x1 - delta, t));
        double second = (1 - x1) * (m.partialMolarVolume(1, x1 + delta, t) - m.partialMolarVolume(1, x1 - delta, t));
        double a = scale(card, t);
        double bound = 2 * 640 * PartialsFromValues.U * a + 2 * PartialsFromValues.U * (Math.abs(first)
                + Math.abs(second)) + Math.pow(delta, 3) / 3 * 1e6 * a;
        assertEquals(0.0, first + second, bound, "x1 dV1 + x2 dV2 from values, bound " + bound);
    }

    /**
     * Summability with partial volumes from differences of the extensive volume (not from the library's formula):
     * x1·∂V/∂n1 + x2·∂V/∂n2 = V_m. Euler's theorem makes this hold for any V_m, so it checks the reference partials;
     * with {@link #partialsAreDerivativesOfTheExtensiveVolume} it gives summability of the library's partials.
     */
    @Property(tries = 1000)
    void summabilityOfPartialsFromDifferences(@ForAll("cards") Card card,
            @ForAll @DoubleRange(min = 0, max = 1) double x1, @ForAll @DoubleRange(min = 260, max = 340) double t) {
        BinaryMixture m = BinaryMixture.of(card);
        double delta = 64 * PartialsFromValues.U * scale(card, t);
        double[] x = {x1, 1 - x1};
        double sum = 0;
        double bound = delta;
        for (int k = 0; k < 2; k++) {
            PartialsFromValues.Estimate d = PartialsFromValues.partial(y -> m.molarVolume(y[0], t), x, k, 0x1p-10,
                    delta);
            sum += x[k] * d.value;
            bound += x[k] * d.bound + 2 * PartialsFromValues.U * Math.abs(x[k] * d.value);
        }
        assertEquals(m.molarVolume(x1, t), sum, bound, "bound " + bound);
    }

    /** Each partial molar volume's analytic slope against a central difference of the partial molar volume itself. */
    @Property(tries = 1000)
    void partialSlopesMatchFiniteDifferences(@ForAll("cards") Card card,
            @ForAll @DoubleRange(min = 0.01, max = 0.99) double x1,
            @ForAll @DoubleRange(min = 260, max = 340) double t) {
        BinaryMixture m = BinaryMixture.of(card);
        double h = 1e-5;
        for (int k = 0; k < 2; k++) {
            double fd = (m.partialMolarVolume(k, x1 + h, t) - m.partialMolarVolume(k, x1 - h, t)) / (2 * h);
            double an = m.partialMolarVolumeSlope(k, x1, t);
            assertEquals(fd, an, 1e-5 * (1 + Math.abs(an)), "component " + (k + 1));
        }
    }

    /** V̄_1 − V̄_2 = dV_m/dx1 (tangent construction), checked against a central difference of V_m. */
    @Property(tries = 1000)
    void partialsAreTangentIntercepts(@ForAll("cards") Card card,
            @ForAll @DoubleRange(min = 0.01, max = 0.99) double x1,
            @ForAll @DoubleRange(min = 260, max = 340) double t) {
        BinaryMixture m = BinaryMixture.of(card);
        double h = 1e-5;
        double fd = (m.molarVolume(x1 + h, t) - m.molarVolume(x1 - h, t)) / (2 * h);
        double diff = m.partialMolarVolume(0, x1, t) - m.partialMolarVolume(1, x1, t);
        assertEquals(fd, diff, 1e-6 * (1 + Math.abs(diff)));
    }

    @Property(tries = 1000)
    void swappingComponentsChangesNothing(@ForAll("cards") Card card,
            @ForAll @DoubleRange(min = 0, max = 1) double x1, @ForAll @DoubleRange(min = 260, max = 340) double t) {
        BinaryMixture m = BinaryMixture.of(card);
        BinaryMixture s = BinaryMixture.of(swapped(card));
        double x2 = 1 - x1;
        double tol = 1e-12 * (1 + Math.abs(m.molarVolume(x1, t)));
        assertEquals(m.excessMolarVolume(x1, t), s.excessMolarVolume(x2, t), tol);
        assertEquals(m.partialMolarVolume(0, x1, t), s.partialMolarVolume(1, x2, t), 1e-10 * (1
                + Math.abs(m.partialMolarVolume(0, x1, t))));
        assertEquals(m.partialMolarVolume(1, x1, t), s.partialMolarVolume(0, x2, t), 1e-10 * (1
                + Math.abs(m.partialMolarVolume(1, x1, t))));
        assertEquals(m.density(x1, t), s.density(x2, t), 1e-12 * m.density(x1, t));
    }

    /**
     * V^E through the mixture is the card's binary expansion x1·x2·Σ A_k (x1 − x2)^k evaluated on its own, and the
     * density is its definition ρ = 1000·(x1·M1 + x2·M2)/V_m (g/mol over cm³/mol, in kg/m³).
     */
    @Property(tries = 500)
    void excessVolumeAndDensityFollowTheirDefinitions(@ForAll("cards") Card card,
            @ForAll @DoubleRange(min = 0, max = 1) double x1, @ForAll @DoubleRange(min = 260, max = 340) double t) {
        BinaryMixture m = BinaryMixture.of(card);
        double a = scale(card, t);
        assertEquals(card.excessVolume(0, 1).value(x1, t), m.excessMolarVolume(x1, t), 64 * PartialsFromValues.U * a);
        double mass = x1 * card.components().get(0).molarMass() + (1 - x1) * card.components().get(1).molarMass();
        assertEquals(mass, m.meanMolarMass(x1), 4 * PartialsFromValues.U * mass);
        double rho = 1000 * mass / m.molarVolume(x1, t);
        assertEquals(rho, m.density(x1, t), 8 * PartialsFromValues.U * rho);
    }

    /** At a pure corner the excess volume vanishes and the pure component's partial volume is its molar volume. */
    @Property(tries = 500)
    void pureCorners(@ForAll("cards") Card card, @ForAll @DoubleRange(min = 260, max = 340) double t) {
        BinaryMixture m = BinaryMixture.of(card);
        assertEquals(0.0, m.excessMolarVolume(0, t), 0.0);
        assertEquals(0.0, m.excessMolarVolume(1, t), 0.0);
        assertEquals(m.pureMolarVolume(0, t), m.partialMolarVolume(0, 1, t), 1e-12 * m.pureMolarVolume(0, t));
        assertEquals(m.pureMolarVolume(1, t), m.partialMolarVolume(1, 0, t), 1e-12 * m.pureMolarVolume(1, t));
    }

    /** Infinite dilution: V̄_1^E(x1 → 0) = Σ A_k (−1)^k and V̄_2^E(x1 → 1) = Σ A_k (the RK limits). */
    @Property(tries = 500)
    void infiniteDilution(@ForAll("cards") Card card, @ForAll @DoubleRange(min = 260, max = 340) double t) {
        BinaryMixture m = BinaryMixture.of(card);
        RedlichKister rk = card.excessVolume(0, 1);
        double alternating = 0;
        double plain = 0;
        for (int k = 0; k <= rk.order(); k++) {
            double a = rk.coefficientAt(k, t);
            alternating += k % 2 == 0 ? a : -a;
            plain += a;
        }
        assertEquals(alternating, m.partialExcessMolarVolume(0, 0, t), 1e-12 * (1 + Math.abs(alternating)));
        assertEquals(plain, m.partialExcessMolarVolume(1, 1, t), 1e-12 * (1 + Math.abs(plain)));
    }

    /** The analytic slope of V^E against a central difference. */
    @Property(tries = 1000)
    void excessSlopeMatchesFiniteDifference(@ForAll("cards") Card card,
            @ForAll @DoubleRange(min = 0.01, max = 0.99) double x1,
            @ForAll @DoubleRange(min = 260, max = 340) double t) {
        RedlichKister rk = card.excessVolume(0, 1);
        double[] e = new double[3];
        rk.evaluate(x1, t, e);
        double h = 1e-5;
        double fd = (rk.value(x1 + h, t) - rk.value(x1 - h, t)) / (2 * h);
        assertEquals(fd, e[1], 1e-6 * (1 + Math.abs(e[1])));
    }
}
