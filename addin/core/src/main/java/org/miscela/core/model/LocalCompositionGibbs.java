package org.miscela.core.model;

/**
 * The excess Gibbs energy of a liquid by a local-composition model, for any number of components, as G^E/RT:
 *
 * <ul>
 *   <li><b>Wilson</b> (G. M. Wilson, J. Am. Chem. Soc. 86 (1964) 127): g = −Σ_i x_i ln(Σ_j x_j Λ_ij), with
 *       Λ_ij = (V_j/V_i)·exp(−Δλ_ij/RT), Δλ_ij/R = a_ij + b_ij·T + c_ij·T² (K), Λ_ii = 1;
 *       ln γ_i = 1 − ln(Σ_j x_j Λ_ij) − Σ_k x_k Λ_ki / Σ_j x_j Λ_kj.</li>
 *   <li><b>NRTL</b> (H. Renon, J. M. Prausnitz, AIChE J. 14 (1968) 135): g = Σ_i x_i (Σ_j τ_ji G_ji x_j)/(Σ_k G_ki
 *       x_k), with τ_ij = A_ij + B_ij/T, G_ij = exp(−α_ij τ_ij), τ_ii = 0;
 *       ln γ_i = Σ_j x_j τ_ji G_ji/Σ_k x_k G_ki + Σ_j (x_j G_ij/Σ_k x_k G_kj)(τ_ij − Σ_m x_m τ_mj G_mj/Σ_k x_k G_kj).</li>
 * </ul>
 *
 * The "gradient" {@link #evaluate} gives is ln γ itself, the derivative of the homogeneous n·g(n/N) at n = x, so that
 * {@link ExcessModel#partials} gives ln γ_k exactly. Neither the Hessian nor the temperature slope is used for the
 * Gibbs energy; asking for them is refused. Immutable.
 */
public final class LocalCompositionGibbs implements ExcessModel {
    /** The two models. */
    public enum Kind {
        WILSON("Wilson"), NRTL("NRTL");

        private final String cardName;

        Kind(String cardName) {
            this.cardName = cardName;
        }

        public String cardName() {
            return cardName;
        }
    }

    private final Kind kind;
    private final int n;
    /** Wilson: the molar volumes; unused for NRTL. */
    private final double[] volume;
    /** Wilson: a, b, c of Δλ_ij/R; NRTL: A and B of τ_ij (c unused). [i][j]; NaN-free, zero on the diagonal. */
    private final double[][] a;
    private final double[][] b;
    private final double[][] c;
    /** NRTL: α_ij (symmetric). */
    private final double[][] alpha;
    /** Pairs the card treats as ideal (Λ = 1, τ = 0). */
    private final boolean[][] ideal;

    private LocalCompositionGibbs(Kind kind, double[] volume, double[][] a, double[][] b, double[][] c,
            double[][] alpha, boolean[][] ideal) {
        this.kind = kind;
        this.n = a.length;
        this.volume = volume == null ? null : volume.clone();
        this.a = copy(a);
        this.b = copy(b);
        this.c = copy(c);
        this.alpha = alpha == null ? null : copy(alpha);
        this.ideal = new boolean[n][n];
        for (int i = 0; i < n; i++) {
            this.ideal[i] = ideal[i].clone();
        }
    }

    /** Wilson: molar volumes (any one unit), Δλ_ij/R = a + b·T + c·T² in K, ideal pairs with Λ = 1. */
    public static LocalCompositionGibbs wilson(double[] volume, double[][] a, double[][] b, double[][] c,
            boolean[][] ideal) {
        return new LocalCompositionGibbs(Kind.WILSON, volume, a, b, c, null, ideal);
    }

    /** NRTL: τ_ij = A + B/T (B in K), α_ij symmetric, ideal pairs with τ = 0. */
    public static LocalCompositionGibbs nrtl(double[][] a, double[][] b, double[][] alpha, boolean[][] ideal) {
        return new LocalCompositionGibbs(Kind.NRTL, null, a, b, new double[a.length][a.length], alpha, ideal);
    }

    private static double[][] copy(double[][] m) {
        double[][] out = new double[m.length][];
        for (int i = 0; i < m.length; i++) {
            out[i] = m[i].clone();
        }
        return out;
    }

    public Kind kind() {
        return kind;
    }

    @Override
    public int componentCount() {
        return n;
    }

    @Override
    public boolean temperatureDependent() {
        return true;
    }

    /** Λ_ij (Wilson) at T. */
    public double lambda(int i, int j, double kelvin) {
        if (i == j || ideal[i][j]) {
            return 1.0;
        }
        double dl = a[i][j] + b[i][j] * kelvin + c[i][j] * kelvin * kelvin;
        return volume[j] / volume[i] * Math.exp(-dl / kelvin);
    }

    /** G_ij = exp(−α_ij·τ_ij) (NRTL) at T. */
    public double nrtlG(int i, int j, double kelvin) {
        return Math.exp(-alpha[i][j] * tau(i, j, kelvin));
    }

    /** α_ij (NRTL). */
    public double alpha(int i, int j) {
        return alpha[i][j];
    }

    /** τ_ij (NRTL) at T. */
    public double tau(int i, int j, double kelvin) {
        return i == j || ideal[i][j] ? 0.0 : a[i][j] + b[i][j] / kelvin;
    }

    @Override
    public double evaluate(double[] x, double kelvin, boolean temperatureSlope, double[] gradient,
            double[][] hessian) {
        if (temperatureSlope || hessian != null) {
            throw new UnsupportedOperationException("the local-composition models give G^E/RT and ln γ only");
        }
        return kind == Kind.WILSON ? wilson(x, kelvin, gradient) : nrtl(x, kelvin, gradient);
    }

    private double wilson(double[] x, double kelvin, double[] lnGamma) {
        double[][] l = new double[n][n];
        double[] s = new double[n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                l[i][j] = lambda(i, j, kelvin);
                s[i] += x[j] * l[i][j];
            }
        }
        double g = 0.0;
        for (int i = 0; i < n; i++) {
            if (x[i] != 0.0) {
                g -= x[i] * Math.log(s[i]);
            }
        }
        if (lnGamma != null) {
            for (int i = 0; i < n; i++) {
                double sum = 0.0;
                for (int k = 0; k < n; k++) {
                    sum += x[k] * l[k][i] / s[k];
                }
                lnGamma[i] = 1.0 - Math.log(s[i]) - sum;
            }
        }
        return g;
    }

    private double nrtl(double[] x, double kelvin, double[] lnGamma) {
        double[][] t = new double[n][n];
        double[][] gm = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                t[i][j] = tau(i, j, kelvin);
                gm[i][j] = Math.exp(-alpha[i][j] * t[i][j]);
            }
        }
        // per component j: D_j = Σ_k x_k G_kj and E_j = Σ_m x_m τ_mj G_mj
        double[] d = new double[n];
        double[] e = new double[n];
        for (int j = 0; j < n; j++) {
            for (int k = 0; k < n; k++) {
                d[j] += x[k] * gm[k][j];
                e[j] += x[k] * t[k][j] * gm[k][j];
            }
        }
        double g = 0.0;
        for (int i = 0; i < n; i++) {
            g += x[i] * e[i] / d[i];
        }
        if (lnGamma != null) {
            for (int i = 0; i < n; i++) {
                double v = e[i] / d[i];
                for (int j = 0; j < n; j++) {
                    v += x[j] * gm[i][j] / d[j] * (t[i][j] - e[j] / d[j]);
                }
                lnGamma[i] = v;
            }
        }
        return g;
    }
}
