package org.miscela.core.card;

import java.util.List;
import org.miscela.core.model.ExcessFunction;
import org.miscela.core.model.ExcessModel;
import org.miscela.core.problem.Problem;

/**
 * MIX.CHECK's Gibbs–Helmholtz check: on a card with both a temperature-dependent G^E/RT (any model) and an excess
 * enthalpy, H^E = −T²·∂(G^E/T)/∂T = −R·T²·∂g/∂T (g = G^E/RT) should hold. The implied H^E is taken by a central
 * difference of g in T (step 10⁻³ of the validity range, at least 0.01 K: the model's own rounding, below 10⁻¹² in g,
 * moves it by less than 10⁻⁵ J/mol, and the truncation is of order the step squared) and compared with the card's H^E
 * on a grid: 11 temperatures over the validity range (the central difference inside it) times, for each pair, the
 * binary compositions x = 0.1, 0.2, …, 0.9 inside the card's composition limits. The worst mismatch is a warning when
 * it exceeds both 20 J/mol and 10 % of the largest |H^E| on the grid (our choice: G^E fitted to phase-equilibrium data
 * fixes its temperature slope only roughly, so smaller disagreements are common and tell nothing).
 */
final class CardGibbsHelmholtz {
    /** The gas constant, J/(mol·K) (2019 SI, exact). */
    private static final double R = 8.314462618;
    static final double ABSOLUTE_J_PER_MOL = 20.0;
    static final double RELATIVE = 0.10;
    private static final int TEMPERATURES = 11;

    private CardGibbsHelmholtz() {
    }

    static void warnings(Card card, List<String> out) {
        ExcessModel g = card.excessGibbs();
        ExcessFunction h = card.excessEnthalpy();
        if (g == null || h == null || !g.temperatureDependent()) {
            return;
        }
        Validity v = card.validity();
        double lo = v.lowestKelvin();
        double hi = v.highestKelvin();
        if (!(hi > lo) || !Double.isFinite(hi - lo)) {
            return;
        }
        double step = Math.max(0.01, 1e-3 * (hi - lo));
        int n = card.componentCount();
        double worst = -1.0;
        double worstImplied = 0.0;
        double worstCard = 0.0;
        double worstKelvin = 0.0;
        double[] worstX = null;
        double largest = 0.0;
        int points = 0;
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                for (int s = 1; s <= 9; s++) {
                    double[] x = new double[n];
                    x[i] = s / 10.0;
                    x[j] = 1.0 - x[i];
                    if (!v.containsFraction(i, x[i]) || !v.containsFraction(j, x[j])) {
                        continue;
                    }
                    for (int k = 0; k < TEMPERATURES; k++) {
                        double t = lo + step + (hi - lo - 2 * step) * k / (TEMPERATURES - 1);
                        double slope = (g.value(x, t + step) - g.value(x, t - step)) / (2 * step);
                        double implied = -R * t * t * slope;
                        double stated = h.value(x, t);
                        if (!Double.isFinite(implied) || !Double.isFinite(stated)) {
                            continue;
                        }
                        points++;
                        largest = Math.max(largest, Math.abs(stated));
                        double d = Math.abs(implied - stated);
                        if (d > worst) {
                            worst = d;
                            worstImplied = implied;
                            worstCard = stated;
                            worstKelvin = t;
                            worstX = x;
                        }
                    }
                }
            }
        }
        if (points == 0 || !(worst > ABSOLUTE_J_PER_MOL) || !(worst > RELATIVE * largest)) {
            return;
        }
        Units u = card.units();
        Units.MolarEnthalpy e = u.enthalpy();
        Units.Temperature tu = u.temperature();
        StringBuilder composition = new StringBuilder();
        for (int k = 0; k < n; k++) {
            if (worstX[k] != 0.0) {
                composition.append(composition.length() == 0 ? "" : ", ").append(card.components().get(k).name())
                        .append(' ').append(CardPlausibility.shown(worstX[k], 3));
            }
        }
        out.add(Problem.WARN_GIBBS_HELMHOLTZ.format(CardPlausibility.shown(e.fromJoulePerMol(worstImplied), 4),
                e.symbol(), CardPlausibility.shown(e.fromJoulePerMol(worstCard), 4), e.symbol(),
                CardPlausibility.shown(tu.fromKelvin(worstKelvin), 5), tu.symbol(), composition,
                CardPlausibility.shown(e.fromJoulePerMol(worst), 4), e.symbol(), points));
    }
}
