package org.miscela.core.model;

/**
 * The water's activity in a solution of one strong electrolyte, from the osmotic coefficient of Pitzer's
 * ion-interaction model (K. S. Pitzer, G. Mayorga, "Thermodynamics of Electrolytes. II. Activity and Osmotic
 * Coefficients for Strong Electrolytes with One or Both Ions Univalent", J. Phys. Chem. 77 (1973) 2300–2308):
 *
 * <pre>
 *   φ − 1 = −|z_M·z_X|·A_φ·√I/(1 + b·√I) + m·(2ν_M·ν_X/ν)·(β0 + β1·exp(−α·√I)) + m²·(2(ν_M·ν_X)^1.5/ν)·C^φ
 *   ln a_w = −φ·ν·m·M_w
 * </pre>
 *
 * with m the molality of the salt (mol per kg of water), I = ½·m·(ν_M·z_M² + ν_X·z_X²), ν = ν_M + ν_X, b = 1.2
 * kg^½/mol^½ and α = 2 kg^½/mol^½ (the values of that paper, for salts with at least one univalent ion; 2:2 salts need a
 * further term and are not taken). Each of β0, β1 and C^φ is a function of T (K) with T_r = 298.15 K,
 * p(T) = a0 + a1·(1/T − 1/T_r) + a2·ln(T/T_r) + a3·(T − T_r) + a4·(T² − T_r²) + a5·(1/T² − 1/T_r²), the form in which
 * J. D. Toner and R. S. Sletten (Geochim. Cosmochim. Acta 110 (2013) 84–105) carry the low-temperature parameters of
 * Spencer, Møller and Weare (Geochim. Cosmochim. Acta 54 (1990) 575–590) and Marion and co-workers; terms left out are
 * zero, so a0 alone is a constant and a0 with a3 the linear form of the first temperature derivatives tabulated by
 * Silvester and Pitzer (J. Phys. Chem. 81 (1977) 1822).
 *
 * <p>The Debye–Hückel slope A_φ is the Chebyshev series of S. L. Clegg, J. A. Rard and K. S. Pitzer (J. Chem. Soc.,
 * Faraday Trans. 90 (1994) 1875–1894, appendix II), fitted from 234.15 to 373.15 K, supercooled water included (as
 * transcribed in the pytzer package, debyehueckel.py); outside that range the water's activity is refused. Immutable.
 */
public final class PitzerOsmotic {
    /** The model's name as a card row writes it. */
    public static final String NAME = "Pitzer";
    /** The temperature the parameters refer to, K. */
    public static final double REFERENCE_KELVIN = 298.15;
    /** How many terms each parameter's function of T has at most. */
    public static final int TERMS = 6;
    private static final double B = 1.2;
    private static final double ALPHA = 2.0;
    /** The range of the A_φ series, K. */
    public static final double LOWEST_KELVIN = 234.15;
    public static final double HIGHEST_KELVIN = 373.15;
    /** The coefficients a_0 … a_18 of Clegg, Rard and Pitzer's series (a_0 as printed, halved in use). */
    private static final double[] CHEBYSHEV = {0.797256081240, 0.573389669896e-1, 0.977632177788e-3,
        0.489973732417e-2, -0.313151784342e-2, 0.179145971002e-2, -0.920584241844e-3, 0.443862726879e-3,
        -0.203661129991e-3, 0.900924147948e-4, -0.388189392385e-4, 0.164245088592e-4, -0.686031972567e-5,
        0.283455806377e-5, -0.115641433004e-5, 0.461489672579e-6, -0.177069754948e-6, 0.612464488231e-7,
        -0.175689013085e-7};

    private final int solvent;
    private final int solute;
    private final double waterKilogramPerMol;
    private final int cationCharge;
    private final int anionCharge;
    private final int cations;
    private final int anions;
    private final double iceLimit;
    private final double lowestKelvin;
    private final double highestKelvin;
    /** The terms a0..a5 of β0, β1 and C^φ, in that order. */
    private final double[][] terms;

    /**
     * @param solvent the water's component index
     * @param solute the salt's component index
     * @param waterGramPerMol the water's molar mass
     * @param cationCharge z_M, 1 to 3
     * @param anionCharge |z_X|, 1 to 3; not both above 1
     * @param terms the terms a0, a1, … (one to six) of β0, β1 and C^φ, in that order
     * @param lowestKelvin the lowest temperature the parameters hold for, K, or NaN (the card's range then)
     * @param highestKelvin the highest, K, or NaN
     * @param iceLimit the salt's mole fraction past which ice is no longer known to crystallise first (the eutectic,
     *     or the strongest brine of the data)
     */
    public PitzerOsmotic(int solvent, int solute, double waterGramPerMol, int cationCharge, int anionCharge,
            double[][] terms, double lowestKelvin, double highestKelvin, double iceLimit) {
        this.iceLimit = iceLimit;
        this.lowestKelvin = lowestKelvin;
        this.highestKelvin = highestKelvin;
        if (cationCharge < 1 || anionCharge < 1 || cationCharge > 3 || anionCharge > 3
                || (cationCharge > 1 && anionCharge > 1)) {
            throw new IllegalArgumentException("charges 1 to 3 with at least one univalent ion");
        }
        if (terms.length != 3) {
            throw new IllegalArgumentException("the terms of β0, β1 and C^φ");
        }
        this.terms = new double[3][TERMS];
        for (int i = 0; i < 3; i++) {
            if (terms[i].length < 1 || terms[i].length > TERMS) {
                throw new IllegalArgumentException("one to six terms");
            }
            System.arraycopy(terms[i], 0, this.terms[i], 0, terms[i].length);
        }
        this.solvent = solvent;
        this.solute = solute;
        this.waterKilogramPerMol = waterGramPerMol / 1000.0;
        this.cationCharge = cationCharge;
        this.anionCharge = anionCharge;
        // one ion is univalent, so a formula unit holds |z_X| cations and z_M anions
        this.cations = anionCharge;
        this.anions = cationCharge;
    }

    /** β0 (i = 0), β1 (1) or C^φ (2) at T (K). */
    public double parameter(int i, double kelvin) {
        double[] a = terms[i];
        double r = REFERENCE_KELVIN;
        return a[0] + a[1] * (1.0 / kelvin - 1.0 / r) + a[2] * Math.log(kelvin / r) + a[3] * (kelvin - r)
                + a[4] * (kelvin * kelvin - r * r) + a[5] * (1.0 / (kelvin * kelvin) - 1.0 / (r * r));
    }

    /** Whether the row states its own temperature range (else the card's holds). */
    public boolean hasRange() {
        return !Double.isNaN(lowestKelvin);
    }

    public double lowestKelvin() {
        return lowestKelvin;
    }

    public double highestKelvin() {
        return highestKelvin;
    }

    /** The salt's mole fraction past which ice is no longer known to form first. */
    public double iceLimit() {
        return iceLimit;
    }

    public int solvent() {
        return solvent;
    }

    public int solute() {
        return solute;
    }

    /** ν, the ions one formula unit gives. */
    public int ions() {
        return cations + anions;
    }

    /**
     * The Debye–Hückel slope for the osmotic coefficient A_φ at T (K), in kg^½/mol^½: Σ a_i·T_i(X) over the Chebyshev
     * polynomials T_i, X = (2T − 607.3)/139, the first coefficient halved as usual; NaN outside 234.15 to 373.15 K.
     */
    public static double debyeHuckel(double kelvin) {
        if (!(kelvin >= LOWEST_KELVIN && kelvin <= HIGHEST_KELVIN)) {
            return Double.NaN;
        }
        double x = (2.0 * kelvin - 607.3) / 139.0;
        double previous = 1.0;
        double current = x;
        double sum = CHEBYSHEV[0] / 2.0 + CHEBYSHEV[1] * x;
        for (int i = 2; i < CHEBYSHEV.length; i++) {
            double next = 2.0 * x * current - previous;
            sum += CHEBYSHEV[i] * next;
            previous = current;
            current = next;
        }
        return sum;
    }

    /** The osmotic coefficient φ at molality m (mol/kg) and T (K). */
    public double osmoticCoefficient(double molality, double kelvin) {
        double b0 = parameter(0, kelvin);
        double b1 = parameter(1, kelvin);
        double c = parameter(2, kelvin);
        double nu = cations + anions;
        double ionic = 0.5 * molality * (cations * cationCharge * cationCharge + anions * anionCharge * anionCharge);
        double root = Math.sqrt(ionic);
        double product = (double) cations * anions;
        return 1.0 - cationCharge * anionCharge * debyeHuckel(kelvin) * root / (1.0 + B * root)
                + molality * (2.0 * product / nu) * (b0 + b1 * Math.exp(-ALPHA * root))
                + molality * molality * (2.0 * Math.pow(product, 1.5) / nu) * c;
    }

    /** The salt's molality (mol per kg of water) in a liquid of mole fractions x (the card's components). */
    public double molality(double[] x) {
        return x[solute] / (x[solvent] * waterKilogramPerMol);
    }

    /** ln a_w = −φ·ν·m·M_w at mole fractions x and T (K); 0 for pure water. */
    public double lnWaterActivity(double[] x, double kelvin) {
        double m = molality(x);
        return m == 0.0 ? 0.0 : -osmoticCoefficient(m, kelvin) * ions() * m * waterKilogramPerMol;
    }

    /** ln a_w of the ideal solution of the ions, ln(x_w counted with each formula unit as ν ions). */
    public double lnIdealWaterActivity(double[] x) {
        return -Math.log1p(ions() * x[solute] / x[solvent]);
    }
}
