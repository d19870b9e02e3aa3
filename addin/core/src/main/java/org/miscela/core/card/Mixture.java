package org.miscela.core.card;

import org.miscela.core.functions.CardFunctions;
import org.miscela.core.model.ExcessFunction;
import org.miscela.core.model.ExcessModel;
import org.miscela.core.model.HeatCapacity;
import org.miscela.core.model.SolutionHeatCapacity;
import org.miscela.core.problem.Problem;

/**
 * Properties of a card's mixture at a composition x (mole fractions in card order, summing to 1) and a temperature,
 * in internal units: K, cm³/mol, kg/m³, g/mol, J/mol. No range checks happen here; {@link CardFunctions} checks
 * arguments and converts units.
 */
public final class Mixture {
    private static final org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory GAUSS_LEGENDRE =
            new org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory();

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

    /**
     * Cp of the blend, J/(mol·K): the card's solution heat-capacity model where it states one, otherwise
     * Σ x_k Cp_k + Cp^E with Cp^E = ∂H^E/∂T from the excess enthalpy (zero when the card gives no excess enthalpy or
     * one that does not vary with temperature: {@link #heatCapacitySource} says which). Every component needs a heat
     * capacity (for the solution model, the solvent).
     */
    public double heatCapacity(double[] x, double kelvin) {
        SolutionHeatCapacity solution = card.solutionHeatCapacity();
        int pure = pureComponent(x);
        if (solution != null && pure >= 0) {
            // a pure solute is the card's own liquid, not the solution model's extrapolation to w_w = 0
            return heatCapacity(pure).at(kelvin);
        }
        if (solution != null) {
            return solution.molar(x, kelvin, heatCapacity(solution.solvent()).at(kelvin));
        }
        double cp = card.excessEnthalpy() == null ? 0.0 : excessHeatCapacity(x, kelvin);
        for (int k = 0; k < x.length; k++) {
            cp += x[k] * heatCapacity(k).at(kelvin);
        }
        return cp;
    }

    /** The partial molar heat capacities of the blend, J/(mol·K), into {@code out}; returns the blend's Cp. */
    public double partialHeatCapacities(double[] x, double kelvin, double[] out) {
        SolutionHeatCapacity solution = card.solutionHeatCapacity();
        if (solution != null) {
            double cp = solution.partials(x, kelvin, heatCapacity(solution.solvent()).at(kelvin), out);
            int pure = pureComponent(x);
            if (pure >= 0) {
                out[pure] = heatCapacity(pure).at(kelvin);
                return out[pure];
            }
            return cp;
        }
        if (card.excessEnthalpy() == null) {
            java.util.Arrays.fill(out, 0.0);
        } else {
            enthalpy().partials(x, kelvin, true, out);
        }
        double cp = 0.0;
        for (int k = 0; k < x.length; k++) {
            out[k] += heatCapacity(k).at(kelvin);
            cp += x[k] * out[k];
        }
        return cp;
    }

    /**
     * The heat taken by one mole of the blend warmed from {@code fromKelvin} to {@code toKelvin}, ∫ Cp dT in J/mol:
     * without a solution model exactly Σ x_k ∫Cp_k dT + H^E(x, to) − H^E(x, from); with one, by 16-point
     * Gauss–Legendre quadrature (the model is smooth; over a span of 200 K the quadrature's error is far below the
     * model's own).
     */
    public double heating(double[] x, double fromKelvin, double toKelvin) {
        if (fromKelvin == toKelvin) {
            return 0.0;
        }
        if (card.solutionHeatCapacity() == null) {
            double h = card.excessEnthalpy() == null ? 0.0
                    : excessEnthalpy(x, toKelvin) - excessEnthalpy(x, fromKelvin);
            for (int k = 0; k < x.length; k++) {
                h += x[k] * heatCapacity(k).enthalpyChange(fromKelvin, toKelvin);
            }
            return h;
        }
        if (toKelvin < fromKelvin) {
            return -heating(x, toKelvin, fromKelvin);
        }
        return GAUSS_LEGENDRE.legendre(16, fromKelvin, toKelvin).integrate(t -> heatCapacity(x, t));
    }

    /** The component x is made of alone, or -1 for a mixture. */
    public static int pureComponent(double[] x) {
        for (int k = 0; k < x.length; k++) {
            if (x[k] == 1.0) {
                return k;
            }
        }
        return -1;
    }

    /** Where the blend's heat capacity comes from. */
    public HeatCapacitySource heatCapacitySource() {
        if (card.solutionHeatCapacity() != null) {
            return HeatCapacitySource.SOLUTION_MODEL;
        }
        if (card.excessEnthalpy() != null && card.excessEnthalpy().temperatureDependent()) {
            return HeatCapacitySource.EXCESS_ENTHALPY_SLOPE;
        }
        return HeatCapacitySource.PURE_LIQUIDS_ONLY;
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
    public ExcessModel volume() {
        ExcessModel v = card.volumeModel();
        if (v == null) {
            throw Problem.NO_VOLUME.raise();
        }
        return v;
    }

    /** ln γ_k for every k into {@code out} (the partial molar quantities of G^E/RT); returns G^E/RT. */
    public double logActivityCoefficients(double[] x, double kelvin, double[] out) {
        return gibbs().partials(x, kelvin, false, out);
    }

    /** Component k's vapour pressure in Pa; fails with a readable message when the card gives none. */
    public double vapourPressure(int k, double kelvin) {
        org.miscela.core.model.VapourPressure p = card.vapourPressure(k);
        if (p == null) {
            throw Problem.NO_VAPOUR_PRESSURE.raise(card.components().get(k).name());
        }
        return p.pascal(kelvin);
    }

    /**
     * The bubble pressure p = Σ x_k γ_k p_k* in Pa (modified Raoult's law: an ideal vapour, the liquid's volume
     * neglected), each component's share x_k γ_k p_k* into {@code partial} when it is not null.
     */
    public double bubblePressure(double[] x, double kelvin, double[] partial) {
        double[] lnGamma = new double[x.length];
        logActivityCoefficients(x, kelvin, lnGamma);
        double p = 0.0;
        for (int k = 0; k < x.length; k++) {
            double share = x[k] == 0.0 ? 0.0 : x[k] * Math.exp(lnGamma[k]) * vapourPressure(k, kelvin);
            if (partial != null) {
                partial[k] = share;
            }
            p += share;
        }
        return p;
    }

    /** The card's G^E/RT; fails with a readable message when the card has none. */
    public ExcessModel gibbs() {
        ExcessModel g = card.excessGibbs();
        if (g == null) {
            throw Problem.NO_GIBBS.raise();
        }
        return g;
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
