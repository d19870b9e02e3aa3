package org.miscela.reference;

/**
 * Density of ethanol + water by the formula of OIML R 22 (1975), International Alcoholometric Tables, also in Council
 * Directive 76/766/EEC, Annex (OJ L 262, 27.9.1976). p = mass fraction of ethanol (0–1), t in °C (−20 to +40),
 * ρ in kg/m³. Coefficients as transcribed in the project's reference notes (ethanol-water.md).
 */
public final class Oiml22 {
    private static final double[] A = {9.982012300e2, -1.929769495e2, 3.891238958e2, -1.668103923e3, 1.352215441e4,
        -8.829278388e4, 3.062874042e5, -6.138381234e5, 7.470172998e5, -5.478461354e5, 2.234460334e5,
        -3.903285426e4};
    private static final double[] B = {-2.0618513e-1, -5.2682542e-3, 3.6130013e-5, -3.8957702e-7, 7.1693540e-9,
        -9.9739231e-11};
    private static final double[][] C = {
        {1.693443461530087e-1, -1.046914743455169e1, 7.196353469546523e1, -7.047478054272792e2,
            3.924090430035045e3, -1.210164659068747e4, 2.248646550400788e4, -2.605562982188164e4,
            1.852373922069467e4, -7.420201433430137e3, 1.285617841998974e3},
        {-1.193013005057010e-2, 2.517399633803461e-1, -2.170575700536993, 1.353034988843029e1,
            -5.029988758547014e1, 1.096355666577570e2, -1.422753946421155e2, 1.080435942856230e2,
            -4.414153236817392e1, 7.442971530188783},
        {-6.802995733503803e-4, 1.876837790289664e-2, -2.002561813734156e-1, 1.022992966719220,
            -2.895696483903638, 4.810060584300675, -4.672147440794683, 2.458043105903461,
            -5.411227621436812e-1},
        {4.075376675622027e-6, -8.763058573471110e-6, 6.515031360099368e-6, -1.515784836987210e-6},
        {-2.788074354782409e-8, 1.345612883493354e-8}};

    /** Molar masses used with these tables (IUPAC 1997 atomic weights), g/mol. */
    public static final double M_ETHANOL = 46.06844;
    public static final double M_WATER = 18.01528;

    private Oiml22() {
    }

    /** ρ(p, t) in kg/m³. */
    public static double density(double p, double t) {
        double dt = t - 20.0;
        double rho = A[0];
        double pk = 1.0;
        for (int k = 1; k < A.length; k++) {
            pk *= p;
            rho += A[k] * pk;
        }
        double ti = 1.0;
        for (int i = 0; i < B.length; i++) {
            ti *= dt;
            rho += B[i] * ti;
        }
        ti = 1.0;
        for (int i = 0; i < C.length; i++) {
            ti *= dt;
            double pp = 1.0;
            for (int k = 0; k < C[i].length; k++) {
                pp *= p;
                rho += C[i][k] * pp * ti;
            }
        }
        return rho;
    }

    /**
     * Pure-component densities ρ(1, t) and ρ(0, t) are polynomials in (t − 20) of degree 6; their coefficients
     * follow from the formula without any fitting. Index j multiplies (t − 20)^j.
     */
    public static double[] pureEthanolPolynomial() {
        double[] c = new double[7];
        for (double a : A) {
            c[0] += a;
        }
        for (int i = 0; i < B.length; i++) {
            c[i + 1] += B[i];
        }
        for (int i = 0; i < C.length; i++) {
            for (double v : C[i]) {
                c[i + 1] += v;
            }
        }
        return c;
    }

    public static double[] pureWaterPolynomial() {
        double[] c = new double[7];
        c[0] = A[0];
        for (int i = 0; i < B.length; i++) {
            c[i + 1] = B[i];
        }
        return c;
    }

    /** Mole fraction of ethanol from its mass fraction. */
    public static double moleFraction(double p) {
        double n1 = p / M_ETHANOL;
        double n2 = (1.0 - p) / M_WATER;
        return n1 / (n1 + n2);
    }

    /** Mass fraction of ethanol from its mole fraction. */
    public static double massFraction(double x) {
        double m1 = x * M_ETHANOL;
        return m1 / (m1 + (1.0 - x) * M_WATER);
    }
}
