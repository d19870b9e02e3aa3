package org.miscela.core.card;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.ToDoubleFunction;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.miscela.core.library.CardLibrary;
import org.miscela.reference.Oiml22;

/**
 * Cards whose volume comes from a mixture-density model: the OIML R 22 formula (library card) and the Laliberté–Cooper
 * apparent-volume model. Each property checks the card's analytic partial molar volumes against the published formula
 * evaluated independently (values only), and the identities of partial molar quantities from values.
 */
class DensityModelProperties {
    private static final Card OIML = CardLibrary.find("ethanol + water (OIML R 22)").card();

    /**
     * An invented three-component solution for the identities only (two solutes whose parameters are those of sulfuric
     * acid and sodium hydroxide in Laliberté 2009 as transcribed in the chemicals library; the mixture itself is
     * invented: those two react). Water by Kell 1975.
     */
    static final double[][] SOLUTES = {
        {70.8395152347122, 142.352693909248, 0.68779459618793, 0.00649299683206703, 1667.23864629522},
        {319.020509469838, 528.592358475315, -0.102197896602724, 0.000350420706415566, 765.970470238438}};
    static final double[] MASSES = {98.072, 39.997, 18.015};
    private static final Card TERNARY = CardReader.read(new Object[][] {
        {"Miscela card", 2.0},
        {"source", "invented mixture; apparent-density parameters of Laliberté 2009 (chemicals library transcription)"},
        {"temperature unit", "°C"}, {"density unit", "kg/m³"}, {"molar volume unit", "cm³/mol"},
        {"molar mass unit", "g/mol"},
        {"component", "A", MASSES[0]}, {"component", "B", MASSES[1]}, {"component", "water", MASSES[2]},
        {"solvent", "water"}, {"density model", "water", "Kell 1975"},
        {"apparent density", "A", "Laliberte-Cooper 2004", SOLUTES[0][0], SOLUTES[0][1], SOLUTES[0][2],
            SOLUTES[0][3], SOLUTES[0][4]},
        {"apparent density", "B", "Laliberté–Cooper 2004", SOLUTES[1][0], SOLUTES[1][1], SOLUTES[1][2],
            SOLUTES[1][3], SOLUTES[1][4]},
        {"valid temperature", 0.0, 75.0}, {"valid mole fraction", "A", 0.0, 0.1},
        {"valid mole fraction", "B", 0.0, 0.1}, {"extrapolation", "allow"}});

    /** ρ by the Laliberté–Cooper equations as printed (not the model class): kg/m³, t in °C. */
    static double laliberteCooper(double[] w, double celsius) {
        double t = celsius;
        double water = ((((((-2.8054253e-10 * t + 1.0556302e-7) * t - 4.6170461e-5) * t - 0.0079870401) * t
                + 16.945176) * t + 999.83952) / (1 + 0.01687985 * t));
        double s = w[0] + w[1];
        double v = w[2] / water;
        for (int i = 0; i < 2; i++) {
            double[] c = SOLUTES[i];
            double apparent = (c[0] * s + c[1]) * Math.exp(1e-6 * (t + c[4]) * (t + c[4])) / (s + c[2] + c[3] * t);
            v += w[i] / apparent;
        }
        return 1.0 / v;
    }

    /** The molar volume (cm³/mol) a density formula gives at mole fractions x: M̄/ρ. */
    private static double molarVolume(double[] x, double[] masses, ToDoubleFunction<double[]> density) {
        double m = 0.0;
        for (int k = 0; k < x.length; k++) {
            m += x[k] * masses[k];
        }
        double[] w = new double[x.length];
        for (int k = 0; k < x.length; k++) {
            w[k] = x[k] * masses[k] / m;
        }
        return 1000.0 * m / density.applyAsDouble(w);
    }

    /** The OIML card's density is the formula's (to rounding), over its whole range. */
    @Property(tries = 2000)
    void theOimlCardIsTheFormula(@ForAll @DoubleRange(min = 0, max = 1) double p,
            @ForAll @DoubleRange(min = -20, max = 40) double t) {
        double x = Oiml22.moleFraction(p);
        double card = OIML.mixture().density(new double[] {x, 1 - x}, t + 273.15);
        assertEquals(Oiml22.density(p, t), card, 1e-11 * card, "p = " + p + ", t = " + t);
    }

    /** V̄_k of the OIML card against central differences of M̄/ρ with ρ from the OIML formula as transcribed. */
    @Property(tries = 500)
    void oimlPartialsAreThoseOfTheFormula(@ForAll @DoubleRange(min = 0.02, max = 0.98) double x1,
            @ForAll @DoubleRange(min = -20, max = 40) double t) {
        double[] x = {x1, 1 - x1};
        double[] masses = {Oiml22.M_ETHANOL, Oiml22.M_WATER};
        // The formula's terms reach 7·10⁵ kg/m³ (A9) and their absolute sum about 2.6·10⁶, some 3000 times ρ: one
        // evaluation's rounding is then about 3000·u ≈ 4·10⁻¹³ of V, bounded here by 10⁻¹².
        partialsAgree(OIML, x, t, v -> molarVolume(v, masses, w -> Oiml22.density(w[0], t)), 1e-12);
    }

    @Property(tries = 500)
    void apparentVolumePartialsAreThoseOfTheEquations(@ForAll @DoubleRange(min = 0.0, max = 0.08) double a,
            @ForAll @DoubleRange(min = 0.0, max = 0.08) double b, @ForAll @DoubleRange(min = 0, max = 75) double t) {
        double[] x = {a, b, 1 - a - b};
        if (a < 1e-4 || b < 1e-4) {
            return; // the difference step follows the smallest fraction
        }
        partialsAgree(TERNARY, x, t, v -> molarVolume(v, MASSES, w -> laliberteCooper(w, t)), 1e-14);
    }

    /** Summability, Gibbs–Duhem from slopes and from differences of the partials, and the partials themselves. */
    private static void partialsAgree(Card card, double[] x, double t, ToDoubleFunction<double[]> molar,
            double relativeRounding) {
        double kelvin = t + 273.15;
        Mixture m = card.mixture();
        int n = x.length;
        double vm = m.molarVolume(x, kelvin);
        assertEquals(molar.applyAsDouble(x), vm, 1e-11 * vm, "the molar volume is the formula's");
        double sum = 0.0;
        double h = PartialsFromValues.step(x);
        for (int k = 0; k < n; k++) {
            double partial = m.partialMolarVolume(k, x, kelvin);
            sum += x[k] * partial;
            PartialsFromValues.Estimate e = PartialsFromValues.partial(molar, x, k, h, relativeRounding * vm);
            assertEquals(e.value, partial, e.bound + 1e-12 * vm, "V̄_" + k + " at x = " + java.util.Arrays.toString(x));
        }
        assertEquals(vm, sum, 1e-12 * vm, "summability");
        double[] direction = new double[n];
        direction[0] = 1.0;
        direction[n - 1] = -1.0;
        double[] slopes = new double[n];
        m.partialExcessVolumeSlopes(x, kelvin, direction, slopes);
        double gd = 0.0;
        double scale = 0.0;
        double step = 1e-5;
        double[] up = x.clone();
        double[] down = x.clone();
        up[0] += step;
        up[n - 1] -= step;
        down[0] -= step;
        down[n - 1] += step;
        for (int k = 0; k < n; k++) {
            gd += x[k] * slopes[k];
            scale += Math.abs(x[k] * slopes[k]);
            double fd = (m.partialExcessMolarVolume(k, up, kelvin) - m.partialExcessMolarVolume(k, down, kelvin))
                    / (2 * step);
            assertEquals(fd, slopes[k], 1e-5 * (Math.abs(fd) + vm), "dV̄_" + k + " along the direction");
        }
        assertTrue(Math.abs(gd) <= 1e-12 * (scale + vm), "Gibbs–Duhem: Σ x_k dV̄_k = " + gd);
    }
}
