package org.miscela.core.blend;

import java.util.List;
import org.miscela.core.card.Card;
import org.miscela.core.card.Units;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Numbers;
import org.miscela.core.problem.Problem;

/**
 * What looks odd in the arguments of a call that gives a result: the slips that legitimate input cannot be told apart
 * from, so they are never refused. MIX.EXPLAIN lists them beside the card's own warnings ("OK with n warnings: …");
 * no result changes. Each check names the slip it looks for:
 *
 * <ul>
 *   <li>a percent basis (%vol, mass or mole percent) whose largest value lies between 0 and 1: a fraction typed where
 *       a percent belongs (0.4 for 40 %vol). A strength under 1 %vol is real for low-alcohol products.</li>
 *   <li>a basis temperature given with a basis that is not measured per volume: it is not used, which is harmless,
 *       but it suggests the basis is not the one meant (mass fraction written where %vol was).</li>
 *   <li>amounts in g or mL that add up to less than 1000, a batch of millilitres: kilograms or litres typed with the
 *       unit one step too small. Laboratory batches are real.</li>
 *   <li>a volume correction whose reference temperature is none of the trade's (15 °C, 20 °C, 60 °F) while the
 *       measured one is: the two swapped. A correction to a working temperature is real.</li>
 *   <li>a temperature rise, path or blend heat capacity on a card without an excess heat capacity: the pure
 *       liquids' sum is used, which makes an aqueous acid's rise low. Such a card can be all there is.</li>
 * </ul>
 */
public final class CallWarnings {
    /** Reference temperatures of the trade, K: 15 °C, 20 °C (OIML R 22, ISO 91), 60 °F (API; common practice). */
    private static final double[] USUAL_REFERENCES = {288.15, 293.15, (60.0 - 32.0) * 5.0 / 9.0 + 273.15};
    /** How close, in K, a temperature must be to a usual reference to be taken as that reference. */
    private static final double SAME_TEMPERATURE = 0.01;
    /** Below this total in g or mL a batch is one of millilitres. */
    private static final double SMALL_BATCH = 1000.0;

    private CallWarnings() {
    }

    /**
     * A composition on {@code basisText} (null or blank: mole fraction) whose values are {@code values} (blanks as
     * NaN): warns when the basis is a percent and the largest value lies strictly between 0 and 1.
     */
    public static void percentAsFraction(String basisText, double[] values, List<String> out) {
        CompositionBasis.Kind kind = kind(basisText);
        if (kind == null || kind.maximum() != 100.0) {
            return;
        }
        double largest = Double.NaN;
        for (double v : values) {
            if (!Double.isNaN(v) && (Double.isNaN(largest) || v > largest)) {
                largest = v;
            }
        }
        if (largest > 0.0 && largest < 1.0) {
            String unit = percentUnit(kind);
            out.add(Problem.WARN_PERCENT_AS_FRACTION.format(kind.label(), Numbers.show(largest), unit, unit,
                    Numbers.show(largest * 100.0), unit, Numbers.show(largest * 100.0)));
        }
    }

    /** A basis temperature given ({@code basisTemperature} not NaN) with a basis that does not use it. */
    public static void unusedBasisTemperature(Card card, String basisText, double basisTemperature,
            List<String> out) {
        if (Double.isNaN(basisTemperature)) {
            return;
        }
        CompositionBasis.Kind kind = basisText == null || basisText.trim().isEmpty()
                ? CompositionBasis.Kind.MOLE_FRACTION : kind(basisText);
        if (kind != null && !kind.needsTemperature()) {
            out.add(Problem.WARN_BASIS_TEMPERATURE_UNUSED.format(Numbers.show(basisTemperature),
                    card.units().temperature().symbol(), kind.label()));
        }
    }

    /**
     * Amounts (or a quantity) in {@code unitText} adding up to {@code total}, {@code what} the start of the
     * sentence ("The amounts come to"): warns for g or mL under 1000.
     */
    public static void smallBatch(String what, String unitText, double total, List<String> out) {
        AmountUnit unit;
        try {
            unit = AmountUnit.lookup(unitText);
        } catch (MiscelaException notAUnit) {
            return;
        }
        boolean grams = unit == AmountUnit.G || unit == AmountUnit.G_AIR;
        if ((grams || unit == AmountUnit.ML) && total > 0.0 && total < SMALL_BATCH) {
            out.add(Problem.WARN_SMALL_BATCH.format(what, Numbers.show(total), unit.symbol(),
                    grams ? "under 1 kg" : "under 1 L", grams ? "kg" : "L"));
        }
    }

    /**
     * A volume correction from {@code measured} to {@code reference} (card unit; several measured temperatures for a
     * block): warns when the reference is none of the usual ones and a measured temperature is.
     */
    public static void swappedTemperatures(Card card, double[] measured, double reference, List<String> out) {
        Units.Temperature unit = card.units().temperature();
        if (usual(unit.toKelvin(reference))) {
            return;
        }
        for (double t : measured) {
            if (!Double.isNaN(t) && usual(unit.toKelvin(t))) {
                out.add(Problem.WARN_SWAPPED_TEMPERATURES.format(Numbers.show(reference), unit.symbol(),
                        Numbers.show(t), unit.symbol()));
                return;
            }
        }
    }

    /**
     * A call that warms a blend with its heat capacity (a temperature rise, a path, the blend's heat capacity) on a
     * card that gives no excess heat capacity: said, since the result is then the pure liquids' sum.
     */
    public static void pureHeatCapacity(Card card, List<String> out) {
        if (card.mixture().heatCapacitySource() == org.miscela.core.card.HeatCapacitySource.PURE_LIQUIDS_ONLY) {
            out.add(Problem.WARN_PURE_HEAT_CAPACITY.format());
        }
    }

    private static boolean usual(double kelvin) {
        for (double r : USUAL_REFERENCES) {
            if (Math.abs(kelvin - r) < SAME_TEMPERATURE) {
                return true;
            }
        }
        return false;
    }

    private static CompositionBasis.Kind kind(String text) {
        if (text == null || text.trim().isEmpty()) {
            return null;
        }
        try {
            return CompositionBasis.Kind.lookup(text);
        } catch (MiscelaException notABasis) {
            return null;
        }
    }

    private static String percentUnit(CompositionBasis.Kind kind) {
        switch (kind) {
            case STRENGTH:
                return "%vol";
            case MASS_PERCENT:
                return "% w/w";
            default:
                return "mol %";
        }
    }
}
