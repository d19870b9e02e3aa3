package org.miscela.core.blend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import org.miscela.core.card.Card;
import org.miscela.core.functions.CardFunctions;
import org.miscela.core.card.Extrapolation;

/**
 * Properties of the blending functions over random compositions: round trips between every pair of bases, recipes
 * that mix back to their targets, least additions that meet their targets, closest compositions that no other
 * reachable composition beats, and densities that give back their compositions. Every case is built from one
 * random seed so a failure can be replayed; the ternary card is invented.
 */
class BlendProperties {
    private static final Extrapolation E = Extrapolation.AS_CARD;
    private static final CompositionBasis.Kind[] KINDS = CompositionBasis.Kind.values();
    /** Worst residual seen per property, written after the run for the record. */
    private static final java.util.Map<String, double[]> WORST = new java.util.concurrent.ConcurrentSkipListMap<>();

    private static void record(String what, double residual) {
        double r = Math.abs(residual);
        WORST.compute(what, (k, v) -> v == null ? new double[] {r, 1} : new double[] {Math.max(v[0], r), v[1] + 1});
    }

    @net.jqwik.api.lifecycle.AfterContainer
    static void report() throws java.io.IOException {
        StringBuilder b = new StringBuilder("property\tcases\tworst residual\n");
        WORST.forEach((k, v) -> b.append(String.format(java.util.Locale.ROOT, "%s\t%.0f\t%.3g%n", k, v[1], v[0])));
        java.nio.file.Path out = java.nio.file.Paths.get("target", "blend-property-residuals.txt");
        java.nio.file.Files.createDirectories(out.getParent());
        java.nio.file.Files.write(out, b.toString().getBytes(java.nio.charset.StandardCharsets.UTF_8));
    }

    /** A random composition with every mole fraction at least {@code floor}. */
    static double[] composition(Random r, int n, double floor) {
        double[] x = new double[n];
        double sum = 0;
        for (int k = 0; k < n; k++) {
            x[k] = -Math.log(1 - r.nextDouble());
            sum += x[k];
        }
        for (int k = 0; k < n; k++) {
            x[k] = floor + (1 - n * floor) * x[k] / sum;
        }
        return x;
    }

    static CompositionBasis basis(CompositionBasis.Kind kind, Random r, double lowT, double highT, int balance) {
        return CompositionBasis.of(kind, lowT + (highT - lowT) * r.nextDouble(), balance);
    }

    static double largestDifference(double[] a, double[] b) {
        double worst = 0;
        for (int k = 0; k < a.length; k++) {
            worst = Math.max(worst, Math.abs(a[k] - b[k]));
        }
        return worst;
    }

    /** x → A → B → x for all 49 pairs; also with the balance entry left blank. Residual in mole fraction. */
    private static void roundTrips(Card card, String name, double[] x, Random r, double lowT, double highT) {
        int balance = r.nextInt(card.componentCount());
        for (CompositionBasis.Kind a : KINDS) {
            CompositionBasis from = basis(a, r, lowT, highT, balance);
            double[] written = Compositions.fromMoleFractions(card, x, from, E);
            for (CompositionBasis.Kind b : KINDS) {
                CompositionBasis to = basis(b, r, lowT, highT, balance);
                double[] converted = Compositions.convert(card, written, from, to, E);
                double[] back = Compositions.toMoleFractions(card, converted, to, E);
                double residual = largestDifference(back, x);
                record(name + ": " + a.label() + " -> " + b.label() + " -> mole fraction", residual);
                assertTrue(residual <= 1e-10, a + " -> " + b + ": " + residual);
                if (a.isConcentration()) {
                    double[] blank = written.clone();
                    blank[balance] = Double.NaN;
                    double[] again = Compositions.convert(card, blank, from, to, E);
                    assertTrue(largestDifference(again, converted) <= 1e-9 * (1 + largestAbs(converted)),
                            a + " with a blank balance");
                }
            }
        }
    }

    private static double largestAbs(double[] v) {
        double m = 0;
        for (double d : v) {
            m = Math.max(m, Math.abs(d));
        }
        return m;
    }

    @Property(tries = 60)
    void roundTripsOnTheTernaryCard(@ForAll long seed) {
        Random r = new Random(seed);
        roundTrips(Cards.TERNARY, "ternary (invented)", composition(r, 3, 0.01), r, 5, 45);
    }

    @Property(tries = 40)
    void roundTripsOnTheEthanolWaterCard(@ForAll long seed) {
        Random r = new Random(seed);
        roundTrips(Cards.ETHANOL_WATER, "ethanol + water", composition(r, 2, 0.01), r, 0, 40);
    }

    @Property(tries = 20)
    void roundTripsOnTheSodiumChlorideCard(@ForAll long seed) {
        Random r = new Random(seed);
        double salt = 0.08 * r.nextDouble();
        roundTrips(Cards.SODIUM_CHLORIDE, "NaCl + water", new double[] {salt, 1 - salt}, r, 0, 40);
    }

    /**
     * A recipe's charge, drawn by volume at the storage temperatures and mixed, gives back the target quantity and
     * composition (1e-9 relative).
     */
    @Property(tries = 300)
    void recipesMixBackToTheirTargets(@ForAll long seed) {
        Random r = new Random(seed);
        Card card = Cards.TERNARY;
        double[] x = composition(r, 3, 0.0);
        CompositionBasis basis = basis(KINDS[r.nextInt(KINDS.length)], r, 5, 45, r.nextInt(3));
        double[] target = Compositions.fromMoleFractions(card, x, basis, E);
        double t = 5 + 40 * r.nextDouble();
        AmountUnit[] units = AmountUnit.values();
        AmountUnit unit = units[r.nextInt(units.length)];
        double size = Math.exp(10 * r.nextDouble() - 5);
        Quantity quantity = Quantity.of(size, unit, t);
        double[] storage = {5 + 40 * r.nextDouble(), 5 + 40 * r.nextDouble(), 5 + 40 * r.nextDouble()};
        Charge c = Recipes.forTarget(card, quantity, target, basis, storage, E);
        BatchTotals b = Batches.totals(card, c.asAmounts(AmountUnit.L), t, E);
        double got;
        switch (unit.dimension()) {
            case AMOUNT:
                got = b.totalMoles(unit);
                break;
            case MASS:
                got = b.mass(unit);
                break;
            default:
                got = b.volume(unit);
        }
        record("recipe -> batch totals: target quantity, relative", (got - size) / size);
        assertEquals(size, got, 1e-9 * size);
        double[] back = Compositions.fromMoleFractions(card, b.moleFractions(), basis, E);
        for (int k = 0; k < 3; k++) {
            record("recipe -> batch totals: target composition, relative", (back[k] - target[k])
                    / Math.max(largestAbs(target), 1e-300));
            assertEquals(target[k], back[k], 1e-9 * largestAbs(target));
        }
    }

    /** Least additions: none negative, one zero, and the target met. */
    @Property(tries = 500)
    void leastAdditionsMeetTheTarget(@ForAll long seed) {
        Random r = new Random(seed);
        double[] batch = composition(r, 3, 0.0);
        double[] target = composition(r, 3, 0.001);
        Adjustment a = Adjustments.leastAdditions(Cards.TERNARY, Amounts.of(batch, AmountUnit.KMOL), target,
                CompositionBasis.moleFraction(), 25, null, E);
        double[] added = a.additions().amounts(AmountUnit.KMOL);
        double smallest = Double.POSITIVE_INFINITY;
        for (double d : added) {
            assertTrue(d >= 0, "negative addition " + d);
            smallest = Math.min(smallest, d);
        }
        assertEquals(0, smallest, 1e-12);
        assertTrue(a.reached());
        record("least additions: |x - target|", a.largestDeviation());
        assertTrue(a.largestDeviation() <= 1e-12, "" + a.largestDeviation());
    }

    /**
     * The closest composition at a final total N′ is reachable (y ≥ n/N′, Σ y = 1) and no randomly drawn reachable
     * composition at that total is closer to the target; an exactly reachable target is met.
     */
    @Property(tries = 200)
    void closestCompositionIsClosest(@ForAll long seed) {
        Random r = new Random(seed);
        int n = 2 + r.nextInt(4);
        double[] moles = composition(r, n, 0.0);
        if (r.nextBoolean()) {
            moles[r.nextInt(n)] = 0;
        }
        double[] target = composition(r, n, 0.0);
        target[r.nextInt(n)] = 0;
        double current = Checks.sum(moles);
        double total = current * (1 + 5 * r.nextDouble());
        double[] after = Adjustments.closest(moles, target, total);
        double sum = Checks.sum(after);
        assertEquals(total, sum, 1e-12 * total);
        double best = 0;
        for (int k = 0; k < n; k++) {
            assertTrue(after[k] >= moles[k], "removed " + k);
            best += Math.pow(after[k] / sum - target[k], 2);
        }
        for (int trial = 0; trial < 200; trial++) {
            double[] share = composition(r, n, 0.0);
            if (trial % 2 == 0) {
                share[r.nextInt(n)] = 0;
                share = Checks.normalised(share);
            }
            double other = 0;
            for (int k = 0; k < n; k++) {
                other += Math.pow((moles[k] + (total - current) * share[k]) / total - target[k], 2);
            }
            record("closest composition: other minus best squared distance (negative = beaten)",
                    Math.min(0, other - best));
            assertTrue(other >= best - 1e-15, "beaten by " + java.util.Arrays.toString(share));
        }
    }

    /** ρ(x, t) read back through the density inversion gives x (ethanol + water, 0–40 °C). */
    @Property(tries = 200)
    void densitiesGiveBackTheirCompositions(@ForAll long seed) {
        Random r = new Random(seed);
        double x1 = r.nextDouble();
        double t = 40 * r.nextDouble();
        double rho = CardFunctions.density(Cards.ETHANOL_WATER, x1, t, E);
        double[] x = DensityInversion.composition(Cards.ETHANOL_WATER, rho, t, 0, null, Double.NaN, Double.NaN, E);
        record("density -> composition (ethanol + water): |x1 - x1|", x[0] - x1);
        assertEquals(x1, x[0], 1e-10);
    }
}
