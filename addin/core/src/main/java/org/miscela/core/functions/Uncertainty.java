package org.miscela.core.functions;

import org.miscela.core.card.Card;
import org.miscela.core.model.ExcessFunction;
import org.miscela.core.model.RedlichKister;
import org.miscela.core.model.TernaryTerm;
import org.miscela.core.problem.Problem;
import java.util.Collections;

/**
 * Standard uncertainty of the volumetric results from the coefficient covariances a card holds, by linear
 * propagation (GUM, JCGM 100:2008, eq. 13): u²(Q) = gᵀ·C·g per pair, g = ∂Q/∂a, the pairs taken as uncorrelated.
 * V^E, V_m and every V̄_k are linear in the coefficients, so g is exact; the density's is to first order. The pure
 * liquids' densities are taken as exact. Internal units.
 */
final class Uncertainty {
    private Uncertainty() {
    }

    /** What to propagate to. */
    enum Quantity {
        EXCESS_VOLUME("excess volume"),
        MOLAR_VOLUME("molar volume"),
        PARTIAL_VOLUME("partial volume"),
        DENSITY("density");

        final String word;

        Quantity(String word) {
            this.word = word;
        }

        static Quantity lookup(String text) {
            for (Quantity q : values()) {
                if (q.word.equalsIgnoreCase(text.trim())) {
                    return q;
                }
            }
            throw Problem.UNKNOWN_QUANTITY.raise(text.trim(), "density, excess volume, molar volume, partial volume");
        }
    }

    /**
     * u(Q) at (x, T) in internal units (cm³/mol, or kg/m³ for the density).
     *
     * @param component the component of a partial volume (ignored otherwise)
     */
    static double of(Card card, Quantity quantity, int component, double[] x, double kelvin) {
        card.mixture().volume();
        if (card.densityModel() != null) {
            throw Problem.NO_MODEL_COVARIANCE.raise(card.densityModel().modelName());
        }
        ExcessFunction f = card.excessVolume();
        int n = card.componentCount();
        double scale = 1.0;
        if (quantity == Quantity.DENSITY) {
            // ρ = M/V_m, so ∂ρ/∂a = −(ρ/V_m)·∂V^E/∂a.
            scale = -card.mixture().density(x, kelvin) / card.mixture().molarVolume(x, kelvin);
        }
        double variance = 0.0;
        double[] partials = new double[n];
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                RedlichKister rk = f.pair(i, j);
                if (rk == null) {
                    continue;
                }
                double[][] c = f.covariance(i, j);
                if (c == null) {
                    throw Problem.NO_COVARIANCE.raise(card.components().get(i).name() + " + "
                            + card.components().get(j).name());
                }
                double[] g = gradient(f, i, j, rk, quantity, component, x, kelvin, partials);
                for (int p = 0; p < g.length; p++) {
                    for (int q = 0; q < g.length; q++) {
                        variance += g[p] * scale * c[p][q] * g[q] * scale;
                    }
                }
            }
        }
        return Math.sqrt(Math.max(variance, 0.0));
    }

    /**
     * ∂Q/∂a_kj for pair i–j: Q evaluated with that pair alone and a unit coefficient, which is exact because Q is
     * linear in the coefficients (the pair's term in the chosen geometric model).
     */
    private static double[] gradient(ExcessFunction f, int i, int j, RedlichKister rk, Quantity quantity,
            int component, double[] x, double kelvin, double[] partials) {
        int n = f.componentCount();
        int size = 0;
        for (int k = 0; k <= rk.order(); k++) {
            size += rk.temperatureTerms(k);
        }
        double[] g = new double[size];
        int p = 0;
        for (int k = 0; k <= rk.order(); k++) {
            for (int t = 0; t < rk.temperatureTerms(k); t++) {
                double[][] unit = new double[k + 1][];
                for (int kk = 0; kk <= k; kk++) {
                    unit[kk] = new double[kk == k ? t + 1 : 1];
                }
                unit[k][t] = 1.0;
                RedlichKister[][] only = new RedlichKister[n][n];
                only[i][j] = new RedlichKister(rk.referenceKelvin(), unit);
                ExcessFunction basis = new ExcessFunction(n, f.model(), f.asymmetricComponent(), only,
                        Collections.<TernaryTerm>emptyList());
                double value = basis.partials(x, kelvin, false, partials);
                g[p++] = quantity == Quantity.PARTIAL_VOLUME ? partials[component] : value;
            }
        }
        return g;
    }
}
