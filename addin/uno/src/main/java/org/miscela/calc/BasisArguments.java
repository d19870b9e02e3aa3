package org.miscela.calc;

import org.miscela.core.blend.BlendFunctions;
import org.miscela.core.blend.CompositionBasis;
import org.miscela.core.blend.Compositions;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;

/**
 * The optional trailing basis of the property functions (MIX.DENSITY, MIX.EXCESSVOLUME, …): the composition argument
 * is read on that basis and turned into mole fractions before the card is evaluated. Left out, the basis is the mole
 * fraction and the composition is read exactly as before. A basis measured per volume is read at the basis
 * temperature, left out the card's basis reference temperature (20 °C unless the card states another); a concentration
 * basis has the card's last component as its balance, whose own entry may be left blank only in the lone-number form.
 */
final class BasisArguments {
    private BasisArguments() {
    }

    /** The basis the two trailing arguments name, or null for the mole fraction (left out or spelled so). */
    static CompositionBasis basis(Card card, Object basis, Object basisTemperature) {
        String text = Arguments.text("basis", basis, null);
        double t = Arguments.optionalNumber("basis temperature", basisTemperature);
        if (text == null || text.trim().isEmpty()) {
            return null;
        }
        CompositionBasis b = BlendFunctions.basis(card, text, t, BlendFunctions.DEFAULT_BALANCE);
        return b.kind() == CompositionBasis.Kind.MOLE_FRACTION ? null : b;
    }

    /** Like {@link CompositionArguments#overCompositions}, each composition read on {@code basis} (null: mole fraction). */
    static Object overCompositions(Card card, Object[][] composition, Object[][] temperature, CompositionBasis basis,
            Extrapolation e, CompositionArguments.RowFunction f) {
        if (basis == null) {
            return CompositionArguments.overCompositions(card, composition, temperature, f);
        }
        return CompositionArguments.overCompositions(card, composition, temperature,
                v -> BlendFunctions.binary(card, v, basis),
                (k, values, t) -> f.at(k, Compositions.toMoleFractions(k, values, basis, e), t));
    }

    /** Like {@link CompositionArguments#singleComposition}, read on {@code basis} (null: mole fraction). */
    static double[] singleComposition(Card card, String what, Object[][] grid, CompositionBasis basis,
            Extrapolation e) {
        if (basis == null) {
            return CompositionArguments.singleComposition(card, what, grid);
        }
        double[] values = card.componentCount() == 2 && Arguments.nonEmpty(grid) && grid.length == 1
                && grid[0].length == 1 ? BlendFunctions.binary(card, Arguments.single(what, grid), basis)
                : CompositionArguments.singleComposition(card, what, grid);
        return Compositions.toMoleFractions(card, values, basis, e);
    }
}
