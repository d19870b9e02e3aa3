package org.miscela.core.card;

import org.miscela.core.functions.CardFunctions;
import org.miscela.core.model.ExcessFunction;
import org.miscela.core.model.HeatCapacity;
import org.miscela.core.problem.Problem;

/**
 * Properties of a card's mixture at a composition x (mole fractions in card order, summing to 1) and a temperature,
 * in internal units: K, cm³/mol, kg/m³, g/mol, J/mol. No range checks happen here; {@link CardFunctions} checks
 * arguments and converts units.
 */
public final class Mixture {
    private final Card card;

    Mixture(Card card) {
        this.card = card;
    }

    public int componentCount() {
        return card.componentCount();
    }

    /** V_k* = M_k/ρ_k(T) in cm³/mol. */
    public double pureMolarVolume(int k, double kelvin) {
        return card.components().get(k).molarVolume(kelvin);
    }

    public double excessMolarVolume(double[] x, double kelvin) {
        return volume().value(x, kelvin);
    }

    /** V̄_k^E for every k into {@code out}; returns V^E. */
    public double partialExcessMolarVolumes(double[] x, double kelvin, double[] out) {
        return volume().partials(x, kelvin, false, out);
    }

    public double partialExcessMolarVolume(int k, double[] x, double kelvin) {
        double[] out = new double[x.length];
        partialExcessMolarVolumes(x, kelvin, out);
        return out[k];
    }

    /** dV̄_k along a composition direction (the pure volumes do not depend on composition). */
    public void partialExcessVolumeSlopes(double[] x, double kelvin, double[] direction, double[] out) {
        volume().partialSlopes(x, kelvin, direction, out);
    }

    /** V̄_k = V_k* + V̄_k^E. */
    public double partialMolarVolume(int k, double[] x, double kelvin) {
        return pureMolarVolume(k, kelvin) + partialExcessMolarVolume(k, x, kelvin);
    }

    /** V_m = Σ x_k V_k* + V^E. */
    public double molarVolume(double[] x, double kelvin) {
        double v = excessMolarVolume(x, kelvin);
        for (int k = 0; k < x.length; k++) {
            v += x[k] * pureMolarVolume(k, kelvin);
        }
        return v;
    }

    /** Σ x_k M_k in g/mol. */
    public double meanMolarMass(double[] x) {
        double m = 0.0;
        for (int k = 0; k < x.length; k++) {
            m += x[k] * card.components().get(k).molarMass();
        }
        return m;
    }

    /** ρ = Σ x_k M_k / V_m in kg/m³. */
    public double density(double[] x, double kelvin) {
        return 1000.0 * meanMolarMass(x) / molarVolume(x, kelvin);
    }

    /** H^E in J/mol; the card must hold enthalpy data. */
    public double excessEnthalpy(double[] x, double kelvin) {
        return enthalpy().value(x, kelvin);
    }

    /** H̄_k^E for every k into {@code out}; returns H^E. */
    public double partialExcessEnthalpies(double[] x, double kelvin, double[] out) {
        return enthalpy().partials(x, kelvin, false, out);
    }

    /** Cp^E = ∂H^E/∂T at constant composition, J/(mol·K). */
    public double excessHeatCapacity(double[] x, double kelvin) {
        return enthalpy().evaluate(x, kelvin, true, null, null);
    }

    /** Cp of the mixture, Σ x_k Cp_k + Cp^E, J/(mol·K); every component needs a heat capacity. */
    public double heatCapacity(double[] x, double kelvin) {
        double cp = excessHeatCapacity(x, kelvin);
        for (int k = 0; k < x.length; k++) {
            cp += x[k] * heatCapacity(k).at(kelvin);
        }
        return cp;
    }

    /** The heat capacity of component k; fails with a readable message when the card gives none. */
    public HeatCapacity heatCapacity(int k) {
        HeatCapacity c = card.components().get(k).heatCapacity();
        if (c == null) {
            throw Problem.NO_HEAT_CAPACITY.raise(card.components().get(k).name());
        }
        return c;
    }

    /** The card's excess volume; fails with a readable message when the card describes enthalpy only. */
    public ExcessFunction volume() {
        ExcessFunction v = card.excessVolume();
        if (v == null) {
            throw Problem.NO_VOLUME.raise();
        }
        return v;
    }

    /** The card's excess enthalpy; fails with a readable message when the card has none. */
    public ExcessFunction enthalpy() {
        ExcessFunction h = card.excessEnthalpy();
        if (h == null) {
            throw Problem.NO_ENTHALPY.raise();
        }
        return h;
    }
}
