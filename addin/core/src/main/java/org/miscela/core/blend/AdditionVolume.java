package org.miscela.core.blend;

/**
 * The volume change of a batch at one temperature when an amount of one component is stirred in: exactly, as the
 * difference of the two batches' volumes, and to first order, as the partial molar volume of that component in the
 * batch before the addition times the moles added. Their difference is of second order in the addition; it shows
 * when the linear estimate is good enough. Immutable; volumes in cm³ inside.
 *
 * <p>Model estimates: where they feed custody transfer or filling decisions, defer to calibrated measurement, local
 * codes and licensed practice.
 */
public final class AdditionVolume {
    private final org.miscela.core.card.Card card;
    private final int component;
    private final double exact;
    private final double firstOrder;
    private final double pureVolume;
    private final double moles;

    /** @param pureVolume NaN when the component's pure liquid is only a model limit (a dissolved salt) */
    AdditionVolume(org.miscela.core.card.Card card, int component, double exact, double firstOrder,
            double pureVolume, double moles) {
        this.card = card;
        this.component = component;
        this.exact = exact;
        this.firstOrder = firstOrder;
        this.pureVolume = pureVolume;
        this.moles = moles;
    }

    /** V(after) − V(before), both at the batch temperature. */
    public double exact(AmountUnit unit) {
        return unit.require(AmountUnit.Dimension.VOLUME, "volume change").fromBase(exact);
    }

    /** V̄_k(before)·Δn_k at the batch temperature. */
    public double firstOrder(AmountUnit unit) {
        return unit.require(AmountUnit.Dimension.VOLUME, "volume change").fromBase(firstOrder);
    }

    /** First order minus exact. */
    public double linearError(AmountUnit unit) {
        return unit.require(AmountUnit.Dimension.VOLUME, "volume change").fromBase(firstOrder - exact);
    }

    /** (first order − exact)/exact. */
    public double relativeLinearError() {
        return (firstOrder - exact) / exact;
    }

    /** The volume the added component had as a pure liquid at the batch temperature, Δn_k·V_k*(T). */
    public double pureVolume(AmountUnit unit) {
        card.requireRealPure(component);
        return unit.require(AmountUnit.Dimension.VOLUME, "volume of the addition").fromBase(pureVolume);
    }

    /** The moles added. */
    public double moles(AmountUnit unit) {
        return unit.require(AmountUnit.Dimension.AMOUNT, "amount added").fromBase(moles);
    }
}
