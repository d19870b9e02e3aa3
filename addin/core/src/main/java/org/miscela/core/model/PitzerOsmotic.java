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
 * <p>The Debye–Hückel slope A_φ = ⅓·(2π·N_A·ρ_w)^½·(e²/(4π·ε0·ε_r·k·T))^{3/2} is computed from the static relative
 * permittivity of water by C. G. Malmberg and A. A. Maryott (J. Res. Natl. Bur. Stand. 56 (1956) 1–8),
 * ε_r = 87.740 − 0.40008·t + 9.398·10⁻⁴·t² − 1.410·10⁻⁶·t³ (t in °C, 0–100 °C), and the density of water by Kell 1975
 * ({@link Kell1975WaterDensity}); both are carried a little below 0 °C for the freezing point of a brine. Immutable.
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
    private static final double AVOGADRO = 6.02214076e23;
    private static final double ELEMENTARY_CHARGE = 1.602176634e-19;
    private static final double VACUUM_PERMITTIVITY = 8.8541878128e-12;
    private static final double BOLTZMANN = 1.380649e-23;

    private final int solvent;
    private final int solute;
    private final double waterKilogramPerMol;
    private final int cationCharge;
    private final int anionCharge;
    private final int cations;
    private final int anions;
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
     */
    public PitzerOsmotic(int solvent, int solute, double waterGramPerMol, int cationCharge, int anionCharge,
            double[][] terms, double lowestKelvin, double highestKelvin) {
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
        int g = gcd(cationCharge, anionCharge);
        this.cations = anionCharge / g;
        this.anions = cationCharge / g;
    }

    /** β0 (i = 0), β1 (1) or C^φ (2) at T (K). */
    public double parameter(int i, double kelvin) {
        double[] a = terms[i];
        double r = REFERENCE_KELVIN;
        return a[0] + a[1] * (1.0 / kelvin - 1.0 / r) + a[2] * Math.log(kelvin / r) + a[3] * (kelvin - r)
                + a[4] * (kelvin * kelvin - r * r) + a[5] * (1.0 / (kelvin * kelvin) - 1.0 / (r * r));
    }

    private static int gcd(int a, int b) {
        return b == 0 ? a : gcd(b, a % b);
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

    /** The relative permittivity of liquid water at T (K), Malmberg and Maryott 1956. */
    public static double waterPermittivity(double kelvin) {
        double t = kelvin - 273.15;
        return ((-1.410e-6 * t + 9.398e-4) * t - 0.40008) * t + 87.740;
    }

    /** The Debye–Hückel slope for the osmotic coefficient A_φ at T (K), in kg^½/mol^½. */
    public static double debyeHuckel(double kelvin) {
        double bjerrum = ELEMENTARY_CHARGE * ELEMENTARY_CHARGE
                / (4.0 * Math.PI * VACUUM_PERMITTIVITY * waterPermittivity(kelvin) * BOLTZMANN * kelvin);
        double rho = Kell1975WaterDensity.INSTANCE.at(kelvin);
        return Math.sqrt(2.0 * Math.PI * AVOGADRO * rho) * Math.pow(bjerrum, 1.5) / 3.0;
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
