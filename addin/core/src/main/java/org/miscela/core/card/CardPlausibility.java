package org.miscela.core.card;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Iterator;
import java.util.List;
import org.miscela.core.model.Component;
import org.miscela.core.model.PureDensity;
import org.miscela.core.problem.Numbers;
import org.miscela.core.problem.Problem;

/**
 * Plausibility of a card's pure components: values a liquid can have but that common liquids do not, which is how a
 * unit mix-up, a decimal separator typed in the other locale's way or a coefficient written ten times too large shows.
 * Each bound is the range of common liquids; a value outside is a warning, never a refusal (mercury is real).
 *
 * <ul>
 *   <li>Molar mass 2 to 1000 g/mol: from hydrogen (2.016 g/mol) to the heaviest ordinary liquid compounds, such as
 *       triglycerides near 900 g/mol (common practice). A card in kg/mol with its values kept in g/mol reads 1000
 *       times too large.</li>
 *   <li>Pure density 500 to 3000 kg/m³ over the validity range: the liquids of the CRC Handbook of Chemistry and
 *       Physics' density tables at 20–25 °C run from pentane (626 kg/m³) to bromoform (2890 kg/m³); liquefied gases
 *       such as propane (493 kg/m³ under pressure) lie below and mercury (13,534 kg/m³) above (values from memory).
 *       998 kg/m³ typed as 998,2 in a locale that reads the comma as a thousands separator becomes 9982.</li>
 *   <li>Thermal expansion coefficient α = −(dρ/dT)/ρ from −7·10⁻⁴ to 3·10⁻³ per K: water's runs from −6.8·10⁻⁵ at
 *       0 °C to 3.9·10⁻⁴ at 40 °C (negative below its density maximum at 4 °C), ethanol's is 1.1·10⁻³ and diethyl
 *       ether's 1.6·10⁻³ per K at 20 °C (CRC Handbook, from memory); supercooled water's reaches −6.4·10⁻⁴ at
 *       −20 °C by the OIML R 22 formula, whose range starts there. A temperature coefficient ten times too large or
 *       with the wrong sign leaves this range for most liquids.</li>
 *   <li>Molar volume M/ρ from 10 to 1000 cm³/mol, checked when the molar mass and the density are each plausible:
 *       water's 18 cm³/mol is the smallest of common liquids, triglycerides' near 1000 the largest (common
 *       practice).</li>
 * </ul>
 */
final class CardPlausibility {
    static final double LIGHTEST_MOLAR_MASS = 2.0;
    static final double HEAVIEST_MOLAR_MASS = 1000.0;
    static final double LIGHTEST_DENSITY = 500.0;
    static final double HEAVIEST_DENSITY = 3000.0;
    static final double LEAST_EXPANSION = -7e-4;
    static final double MOST_EXPANSION = 3e-3;
    static final double SMALLEST_MOLAR_VOLUME = 10.0;
    static final double LARGEST_MOLAR_VOLUME = 1000.0;
    /** Intervals of the validity range at whose ends the pure liquids are looked at. */
    private static final int SAMPLES = 64;

    private CardPlausibility() {
    }

    /** Adds the warnings about each component, in card order, to {@code out}. */
    static void warnings(ParsedCard rows, Card card, List<String> out) {
        Units units = card.units();
        Iterator<CardRow> componentRows = rows.keyed(CardLabels.COMPONENT).values().iterator();
        double lo = card.validity().lowestKelvin();
        double hi = card.validity().highestKelvin();
        int k = -1;
        for (Component c : card.components()) {
            k++;
            CardRow row = componentRows.next();
            String subject = CardReader.normalise(c.name());
            CardRow coefficients = rows.keyed(CardLabels.DENSITY_COEFFICIENTS).get(subject);
            CardRow densityRow = coefficients != null ? coefficients : rows.keyed(CardLabels.DENSITY_MODEL).get(subject);
            boolean plausible = true;
            double m = c.molarMass();
            if (!(m >= LIGHTEST_MOLAR_MASS && m <= HEAVIEST_MOLAR_MASS)) {
                plausible = false;
                out.add(Problem.WARN_MOLAR_MASS.format(row.number, row.label, c.name(), shown(m, 4),
                        Numbers.show(LIGHTEST_MOLAR_MASS), Numbers.show(HEAVIEST_MOLAR_MASS)));
            }
            if (card.hypotheticalPure(k)) {
                continue; // no liquid: the model's limit may lie anywhere
            }
            if (densityRow == null) {
                // a pure liquid of a mixture-density formula: the formula's rows are the ones to look at
                densityRow = rows.keyed(CardLabels.MIXTURE_DENSITY_TERM + "0").values().iterator().next();
            }
            PureDensity d = c.density();
            Span density = new Span();
            Span expansion = new Span();
            double h = (hi - lo) / (SAMPLES * 16.0);
            for (int s = 0; s <= SAMPLES; s++) {
                double t = s == SAMPLES ? hi : lo + (hi - lo) * s / SAMPLES;
                double rho = d.at(t);
                density.see(rho, t);
                if (h > 0.0) {
                    double t1 = Math.max(lo, t - h);
                    double t2 = Math.min(hi, t + h);
                    double alpha = -(d.at(t2) - d.at(t1)) / ((t2 - t1) * rho);
                    if (Double.isFinite(alpha)) {
                        expansion.see(alpha, t);
                    }
                }
            }
            Units.Density du = units.density();
            Units.Temperature tu = units.temperature();
            if (density.outside(LIGHTEST_DENSITY, HEAVIEST_DENSITY)) {
                plausible = false;
                boolean light = density.least < LIGHTEST_DENSITY;
                out.add(Problem.WARN_DENSITY.format(densityRow.number, densityRow.label, c.name(),
                        shown(du.fromKgPerM3(light ? density.least : density.most), 4), du.symbol(),
                        shown(tu.fromKelvin(light ? density.leastAt : density.mostAt), 6), tu.symbol(),
                        shown(du.fromKgPerM3(LIGHTEST_DENSITY), 4), shown(du.fromKgPerM3(HEAVIEST_DENSITY), 4),
                        du.symbol()));
            }
            if (expansion.outside(LEAST_EXPANSION, MOST_EXPANSION)) {
                boolean least = expansion.least < LEAST_EXPANSION;
                double t = least ? expansion.leastAt : expansion.mostAt;
                double alpha = least ? expansion.least : expansion.most;
                out.add(Problem.WARN_EXPANSION.format(densityRow.number, densityRow.label, c.name(),
                        shown(du.fromKgPerM3(-alpha * d.at(t)), 3) + " " + du.symbol(), shown(tu.fromKelvin(t), 6),
                        tu.symbol(), shown(alpha, 3), Numbers.show(LEAST_EXPANSION), Numbers.show(MOST_EXPANSION)));
            }
            if (plausible) {
                double smallest = 1000.0 * m / density.most;
                double largest = 1000.0 * m / density.least;
                if (smallest < SMALLEST_MOLAR_VOLUME || largest > LARGEST_MOLAR_VOLUME) {
                    boolean small = smallest < SMALLEST_MOLAR_VOLUME;
                    out.add(Problem.WARN_MOLAR_VOLUME.format(c.name(), shown(small ? smallest : largest, 4),
                            shown(tu.fromKelvin(small ? density.mostAt : density.leastAt), 6), tu.symbol(),
                            Numbers.show(SMALLEST_MOLAR_VOLUME), Numbers.show(LARGEST_MOLAR_VOLUME), row.number,
                            densityRow.number));
                }
            }
        }
    }

    /** The least and the most of a quantity over the temperatures looked at, and where each was. */
    private static final class Span {
        double least = Double.POSITIVE_INFINITY;
        double most = Double.NEGATIVE_INFINITY;
        double leastAt;
        double mostAt;

        void see(double v, double t) {
            if (v < least) {
                least = v;
                leastAt = t;
            }
            if (v > most) {
                most = v;
                mostAt = t;
            }
        }

        /** Whether any value seen lies outside lo to hi. */
        boolean outside(double lo, double hi) {
            return least < lo || most > hi;
        }
    }

    /** A number rounded to a few significant digits for a message (finite numbers; others as Numbers shows them). */
    static String shown(double v, int digits) {
        if (!Double.isFinite(v) || v == 0.0) {
            return Numbers.show(v);
        }
        return Numbers.show(new BigDecimal(v).round(new MathContext(digits)).doubleValue());
    }
}
