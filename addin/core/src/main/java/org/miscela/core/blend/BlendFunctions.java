package org.miscela.core.blend;

import org.miscela.core.problem.Problem;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;

/**
 * The blending cell functions' arithmetic, with arguments as a sheet gives them: bases and units as text,
 * components 0-based, NaN for a blank cell. Each returns numbers in the card's units (or the unit asked for).
 *
 * <p>Compositions on a concentration basis (%vol, mol/L, g/L, mol/kg) name a balance component, the one that makes
 * up the rest; when none is named it is the card's last component (list the solvent last). For a card of two
 * components a single number stands for the first component's value: on a fraction basis the second is the rest,
 * on a concentration basis the second is the balance.
 *
 * <p>Model estimates: where results feed custody transfer, invoicing, duty or filling decisions, defer to calibrated
 * measurement, the prescribed tables, local codes and licensed practice.
 */
public final class BlendFunctions {
    /** Balance left out: the card's last component. */
    public static final int DEFAULT_BALANCE = -1;

    private BlendFunctions() {
    }

    /**
     * The basis spelled {@code text}, at its reference temperature t (card unit), with a balance. A NaN t means the
     * call left it out: a basis measured per volume then takes the card's basis reference temperature (20 °C unless
     * the card states another, OIML R 22), never a working or measurement temperature.
     */
    public static CompositionBasis basis(Card card, String text, double t, int balance) {
        CompositionBasis.Kind kind = CompositionBasis.Kind.lookup(text);
        int b = balance == DEFAULT_BALANCE ? card.componentCount() - 1 : balance;
        double at = kind.needsTemperature() ? (Double.isNaN(t) ? card.basisReferenceTemperature() : t) : Double.NaN;
        return CompositionBasis.of(kind, at, kind.isConcentration() ? b : -1);
    }

    /**
     * A trace table ({@code CardFunctions.trace}) with the composition bases' rows appended: the card's basis
     * reference temperature and where it comes from (its row, or the 20 °C default of OIML R 22), the basis the
     * composition was read on ({@code basis} null for mole fractions) and, for a basis measured per volume, the
     * temperature it was read at. Appended last, so a trace laid out for the rows before keeps them in place.
     */
    public static Object[][] traced(Card card, Object[][] trace, CompositionBasis basis) {
        java.util.List<Object[]> out = new java.util.ArrayList<>(java.util.Arrays.asList(trace));
        String unit = card.units().temperature().symbol();
        out.add(new Object[] {"basis reference temperature [" + unit + "]", card.basisReferenceTemperature()});
        out.add(new Object[] {"basis reference from", card.statesBasisReference()
                ? "the card's 'basis reference temperature' row" : "default: 20 °C (OIML R 22)"});
        out.add(new Object[] {"composition basis", basis == null ? "mole fraction" : basis.kind().label()});
        if (basis != null && basis.kind().needsTemperature()) {
            out.add(new Object[] {"composition basis temperature [" + unit + "]", basis.temperature()});
        }
        return out.toArray(new Object[0][]);
    }

    /** The full composition a single number stands for on a two-component card (see the class comment). */
    public static double[] binary(Card card, double first, CompositionBasis basis) {
        if (card.componentCount() != 2) {
            throw Problem.LENGTH.raise(basis.plural(), 1, card.componentCount(), Checks.names(card));
        }
        if (basis.kind().isConcentration()) {
            double[] v = {Double.NaN, Double.NaN};
            v[basis.balance() == 0 ? 1 : 0] = first;
            return v;
        }
        double whole = basis.kind().maximum();
        return new double[] {first, whole - first};
    }

    /** A composition from one basis to another (each with its own temperature). */
    public static double[] convert(Card card, double[] values, CompositionBasis from, CompositionBasis to,
            Extrapolation e) {
        return Compositions.convert(card, values, from, to, e);
    }

    /**
     * One total of the batch made of {@code amounts}, brought to temperature t: "volume" (default), "mass",
     * "moles", "density" (card unit), "pure volume" (Σ of the unmixed pure volumes at t), "contraction" (pure
     * volume − volume) or "contraction %"; volumes, masses and moles in {@code resultUnit} (L, kg, mol by default).
     */
    public static double batch(Card card, double[] amounts, String unit, double[] storageTemperatures, double t,
            String result, String resultUnit, Extrapolation e) {
        BatchTotals b = Batches.totals(card, amounts(card, amounts, unit, storageTemperatures, t), t, e);
        String r = result == null ? "volume" : result.trim().toLowerCase(java.util.Locale.ROOT);
        switch (r) {
            case "volume":
                return b.volume(unit(resultUnit, AmountUnit.L, AmountUnit.Dimension.VOLUME, "volume"));
            case "pure volume":
                return b.pureVolume(unit(resultUnit, AmountUnit.L, AmountUnit.Dimension.VOLUME, "pure volume"));
            case "contraction":
                return b.contraction(unit(resultUnit, AmountUnit.L, AmountUnit.Dimension.VOLUME, "contraction"));
            case "contraction %":
                return b.contractionPercent();
            case "mass":
                return b.mass(unit(resultUnit, AmountUnit.KG, AmountUnit.Dimension.MASS, "mass"));
            case "moles":
                return b.totalMoles(unit(resultUnit, AmountUnit.MOL, AmountUnit.Dimension.AMOUNT, "moles"));
            case "density":
                return b.density();
            default:
                throw Problem.UNKNOWN_RESULT.raise(result.trim(),
                        "volume, mass, moles, density, pure volume, contraction, contraction %");
        }
    }

    /**
     * What to charge of each component to make {@code quantity} (a volume at t, a mass, or moles; a conventional mass
     * is weighed at t) of the target composition: amounts in {@code resultUnit} (kg by default; a volume unit gives
     * each pure liquid's volume at its storage temperature, which {@code storageTemperatures} then must give; a
     * conventional mass is each weighed at its storage temperature, or at t when none is given).
     */
    public static double[] recipe(Card card, double quantity, String unit, double t, double[] composition,
            CompositionBasis basis, double[] storageTemperatures, String resultUnit, Extrapolation e) {
        AmountUnit u = AmountUnit.lookup(unit);
        Quantity target = Quantity.of(quantity, u, t);
        AmountUnit out = resultUnit == null ? AmountUnit.KG : AmountUnit.lookup(resultUnit);
        double[] storage = perComponent(card, storageTemperatures);
        if (out.isConventional()) {
            storage = weighedAt(card, storage, t);
        } else if (out.dimension() != AmountUnit.Dimension.VOLUME) {
            storage = null;
        } else if (storage == null) {
            throw Problem.NO_STORAGE_TEMPERATURES.raise(out.needingTemperature(true));
        }
        return Recipes.forTarget(card, target, composition, basis, storage, e).amounts(out);
    }

    /**
     * How much of each component to add to the batch to reach the target composition: "least" additions (the
     * default), "within" a ceiling quantity (the closest composition when the target does not fit), or "make up" to
     * exactly that quantity. Returns the additions in {@code resultUnit} (kg by default), or with result "volume" the
     * resulting batch volume in L at t, or with "summary" a sentence saying whether the target is reached. Masses
     * weighed in air (conventional mass) are weighed at t: the batch's amounts, the limit (the mixture's density at t)
     * and the additions (each pure component's) alike.
     */
    public static Object adjust(Card card, double[] amounts, String unit, double[] storageTemperatures,
            double[] target, CompositionBasis basis, double t, String mode, double limit, String limitUnit,
            String result, String resultUnit, Extrapolation e) {
        Amounts batch = amounts(card, amounts, unit, storageTemperatures, t);
        String m = mode == null ? "least" : mode.trim().toLowerCase(java.util.Locale.ROOT);
        String r = result == null ? "additions" : result.trim().toLowerCase(java.util.Locale.ROOT);
        double[] storage = perComponent(card, storageTemperatures);
        if (r.equals("additions") && resultUnit != null && AmountUnit.lookup(resultUnit).isConventional()) {
            storage = weighedAt(card, storage, t);
        }
        Adjustment a;
        switch (m) {
            case "least":
                a = Adjustments.leastAdditions(card, batch, target, basis, t, storage, e);
                break;
            case "within":
            case "make up":
                if (Double.isNaN(limit) || limitUnit == null) {
                    throw Problem.BLANK_ARGUMENT.raise("limit and its unit (needed for '" + m + "')");
                }
                Quantity q = Quantity.of(limit, AmountUnit.lookup(limitUnit), t);
                a = m.equals("within") ? Adjustments.within(card, batch, target, basis, q, t, storage, e)
                        : Adjustments.makeUpTo(card, batch, target, basis, q, t, storage, e);
                break;
            default:
                throw Problem.UNKNOWN_RESULT.raise(mode.trim(), "least, within, make up");
        }
        switch (r) {
            case "additions":
                return a.additions().amounts(resultUnit == null ? AmountUnit.KG : AmountUnit.lookup(resultUnit));
            case "volume":
                return a.result().volume(unit(resultUnit, AmountUnit.L, AmountUnit.Dimension.VOLUME, "volume"));
            case "summary":
                return a.summary();
            default:
                throw Problem.UNKNOWN_RESULT.raise(result.trim(), "additions, volume, summary");
        }
    }

    /**
     * The volume change at t when {@code added} (in {@code addedUnit}) of component k is stirred into the batch:
     * "exact" (the difference of the totals, default), "first order" (partial molar volume × amount) or
     * "difference" (first order − exact), in {@code resultUnit} (L by default).
     */
    public static double additionVolume(Card card, double[] amounts, String unit, double[] storageTemperatures,
            int component, double added, String addedUnit, double t, String result, String resultUnit,
            Extrapolation e) {
        Amounts batch = amounts(card, amounts, unit, storageTemperatures, t);
        AmountUnit au = AmountUnit.lookup(addedUnit == null ? unit : addedUnit);
        double addedAt = storageTemperatures == null ? t
                : storageTemperatures.length == 1 ? storageTemperatures[0] : storageTemperatures[component];
        AdditionVolume v = Batches.addition(card, batch, component, Quantity.of(added, au, addedAt), t, e);
        AmountUnit out = unit(resultUnit, AmountUnit.L, AmountUnit.Dimension.VOLUME, "volume change");
        String r = result == null ? "exact" : result.trim().toLowerCase(java.util.Locale.ROOT);
        switch (r) {
            case "exact":
                return v.exact(out);
            case "first order":
                return v.firstOrder(out);
            case "difference":
                return v.linearError(out);
            default:
                throw Problem.UNKNOWN_RESULT.raise(result.trim(), "exact, first order, difference");
        }
    }

    /**
     * The composition at which the card's density equals {@code density} at t, as the value of component k on the
     * output basis; the varied component is k, the others keep the reference's ratios (none needed for a binary).
     */
    public static double fromDensity(Card card, double density, double t, int component, double[] reference,
            double from, double to, CompositionBasis out, Extrapolation e) {
        double[] x = DensityInversion.composition(card, density, t, component, reference, from, to, e);
        return Compositions.fromMoleFractions(card, x, out, e)[component];
    }

    /**
     * Temperature correction of a blend of the given composition from t to tRef: "factor" V(tRef)/V(t) (default),
     * "density" at t, or "reference density" at tRef (card unit).
     */
    public static double volumeCorrection(Card card, double[] composition, CompositionBasis basis, double t,
            double tRef, String result, Extrapolation e) {
        TemperatureCorrection c = TemperatureCorrection.between(card, composition, basis, t, tRef, e);
        String r = result == null ? "factor" : result.trim().toLowerCase(java.util.Locale.ROOT);
        switch (r) {
            case "factor":
                return c.volumeFactor();
            case "density":
                return c.density();
            case "reference density":
                return c.referenceDensity();
            default:
                throw Problem.UNKNOWN_RESULT.raise(result.trim(), "factor, density, reference density");
        }
    }

    /** Temperatures one per component; a single value stands for all. */
    private static double[] perComponent(Card card, double[] temperatures) {
        if (temperatures == null || temperatures.length != 1) {
            return temperatures;
        }
        double[] t = new double[card.componentCount()];
        java.util.Arrays.fill(t, temperatures[0]);
        return t;
    }

    /**
     * The batch's amounts: volumes at their storage temperatures (which must be given); conventional masses weighed at
     * their storage temperatures, or at the batch's temperature t when none are given.
     */
    private static Amounts amounts(Card card, double[] values, String unit, double[] storageTemperatures, double t) {
        AmountUnit u = AmountUnit.lookup(unit == null ? "" : unit);
        double[] storage = perComponent(card, storageTemperatures);
        if (u.isConventional()) {
            return Amounts.of(values, u, weighedAt(card, storage, t));
        }
        return u.dimension() == AmountUnit.Dimension.VOLUME ? Amounts.of(values, u, storage) : Amounts.of(values, u);
    }

    /** Where each pure component is weighed: at its storage temperature, or at t for all when none are given. */
    private static double[] weighedAt(Card card, double[] storage, double t) {
        return storage != null ? storage : perComponent(card, new double[] {t});
    }

    private static AmountUnit unit(String text, AmountUnit absent, AmountUnit.Dimension dimension, String what) {
        if (text == null) {
            return absent;
        }
        return AmountUnit.lookup(text).require(dimension, what);
    }
}
