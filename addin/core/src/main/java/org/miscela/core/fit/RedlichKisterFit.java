package org.miscela.core.fit;

import org.miscela.core.model.RedlichKister;

/**
 * A fitted Redlich–Kister expansion with its least-squares statistics. Parameter a_kj (the coefficient of
 * (T − T_ref)^j in A_k) is number k·(orderInT + 1) + j of {@link #leastSquares()}, its covariance and its standard
 * errors. Immutable.
 */
public final class RedlichKisterFit {
    private final LeastSquaresFit leastSquares;
    private final int orderInX;
    private final int orderInT;
    private final double referenceKelvin;

    RedlichKisterFit(LeastSquaresFit leastSquares, int orderInX, int orderInT, double referenceKelvin) {
        this.leastSquares = leastSquares;
        this.orderInX = orderInX;
        this.orderInT = orderInT;
        this.referenceKelvin = referenceKelvin;
    }

    /** The fit's statistics, in cm³/mol; parameters numbered as {@link #parameterIndex}. */
    public LeastSquaresFit leastSquares() {
        return leastSquares;
    }

    public int orderInX() {
        return orderInX;
    }

    public int orderInT() {
        return orderInT;
    }

    public double referenceKelvin() {
        return referenceKelvin;
    }

    /** Where a_kj sits among the parameters. */
    public int parameterIndex(int k, int j) {
        if (k < 0 || k > orderInX || j < 0 || j > orderInT) {
            throw new IndexOutOfBoundsException("a_" + k + j + " is not in an expansion of order " + orderInX
                    + " in x and " + orderInT + " in T");
        }
        return k * (orderInT + 1) + j;
    }

    /** a[k][j] in cm³/mol per K^j. */
    public double[][] coefficients() {
        return reshape(leastSquares.coefficients());
    }

    /** Standard errors arranged as {@link #coefficients()}. */
    public double[][] standardErrors() {
        return reshape(leastSquares.standardErrors());
    }

    /** The expansion, for evaluation with the rest of the library. */
    public RedlichKister toRedlichKister() {
        return new RedlichKister(referenceKelvin, coefficients());
    }


    private double[][] reshape(double[] flat) {
        double[][] a = new double[orderInX + 1][orderInT + 1];
        for (int k = 0; k <= orderInX; k++) {
            System.arraycopy(flat, k * (orderInT + 1), a[k], 0, orderInT + 1);
        }
        return a;
    }
}
