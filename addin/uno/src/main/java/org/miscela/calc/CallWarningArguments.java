package org.miscela.calc;

import java.util.ArrayList;
import java.util.List;
import org.miscela.core.blend.CallWarnings;
import org.miscela.core.card.Card;
import org.miscela.core.card.CardSanity;
import org.miscela.core.card.PackedCard;
import org.miscela.core.catalog.ArgumentInfo;
import org.miscela.core.catalog.FunctionInfo;
import org.miscela.core.catalog.IdlType;
import org.miscela.core.functions.CardFunctions;
import org.miscela.core.problem.MiscelaException;

/**
 * What MIX.EXPLAIN says about a call that gives a result: "OK", or "OK with n warnings: …" listing the warnings of
 * the call's card (MIX.CHECK's) and of its arguments ({@link CallWarnings}: a percent written as a fraction, a basis
 * temperature the basis does not use, a batch of millilitres, swapped temperatures). The arguments are found by their
 * names in the function catalogue, so every function with such an argument is looked at, and one added later too.
 */
final class CallWarningArguments {
    /** The names of a composition argument, and of the basis it is written on. */
    private static final String[] COMPOSITIONS = {"moleFraction", "composition", "target", "values"};
    private static final String[] BASES = {"compositionBasis", "basis", "from"};
    /** The names of amounts and of a quantity to make, and of their unit. */
    private static final String[] AMOUNTS = {"amounts", "quantity"};

    private CallWarningArguments() {
    }

    /**
     * "OK", or the warnings about a call that gave a result, with its arguments {@code p} as the method received
     * them: the card's, then the arguments'. A card that cannot be read leaves "OK": only MIX.CHECK gives a result on
     * one, its problem in words.
     */
    static String summary(FunctionInfo f, Object[] p) {
        Card card = card(f, p);
        if (card == null) {
            return CardFunctions.OK;
        }
        List<String> warnings = new ArrayList<>(CardSanity.warnings(PackedCard.cellsOf((Object[][]) p[0]), card));
        warnings.addAll(callWarnings(f, p));
        return CardFunctions.summary(warnings);
    }

    /** The warnings about the arguments alone (none when the call has no card, or one that cannot be read). */
    static List<String> callWarnings(FunctionInfo f, Object[] p) {
        Card card = card(f, p);
        List<String> warnings = new ArrayList<>();
        if (card != null) {
            try {
                callWarnings(f, p, card, warnings);
            } catch (MiscelaException undecodable) {
                // the call succeeded, so its arguments decode; one these checks read differently is left alone
            }
        }
        return warnings;
    }

    /** The call's card, or null when it takes none or the card cannot be read. */
    private static Card card(FunctionInfo f, Object[] p) {
        if (f.arguments().isEmpty() || !f.arguments().get(0).name().equals("card")) {
            return null;
        }
        try {
            return Arguments.card((Object[][]) p[0]);
        } catch (MiscelaException unreadable) {
            return null;
        }
    }

    /** The functions that warm a blend with its heat capacity. */
    private static final java.util.Set<String> WARMING = new java.util.HashSet<>(java.util.Arrays.asList(
            "adiabaticRise", "temperaturePath", "blendHeatCapacity", "partialHeatCapacity"));

    private static void callWarnings(FunctionInfo f, Object[] p, Card card, List<String> out) {
        if (WARMING.contains(f.method())) {
            CallWarnings.pureHeatCapacity(card, out);
        }
        int composition = index(f, COMPOSITIONS);
        int amounts = index(f, AMOUNTS);
        int unit = index(f, "unit");
        // the heat functions name the unit of their amounts 'basis'; there it is no composition basis
        int basis = composition < 0 && amounts >= 0 ? -1 : index(f, BASES);
        if (unit < 0 && amounts >= 0) {
            unit = index(f, "basis");
        }
        if (composition >= 0 && basis >= 0) {
            CallWarnings.percentAsFraction(text(p[basis]), numbers(p[composition]), out);
        }
        int basisTemperature = index(f, "basisTemperature");
        if (basisTemperature >= 0 && basis >= 0) {
            CallWarnings.unusedBasisTemperature(card, text(p[basis]),
                    Arguments.optionalNumber("basis temperature", scalar(p[basisTemperature])), out);
        }
        if (amounts >= 0 && unit >= 0) {
            String u = text(p[unit]);
            String name = f.arguments().get(amounts).displayName();
            CallWarnings.smallBatch(name.equals("quantity") ? "The quantity comes to" : "The " + name + " come to",
                    u == null ? "mol" : u,
                    largestTotal(p[amounts]), out);
        }
        int reference = index(f, "referenceTemperature");
        int measured = index(f, "temperature");
        // a required reference temperature is a correction's target; an optional one (the fits') is a polynomial's T_ref
        if (reference >= 0 && measured >= 0 && f.arguments().get(reference).kind() == IdlType.Kind.RANGE) {
            CallWarnings.swappedTemperatures(card, numbers(p[measured]),
                    Arguments.number("reference temperature", scalar(p[reference])), out);
        }
    }

    /** The position of the first argument of {@code f} with one of the names, or -1. */
    private static int index(FunctionInfo f, String... names) {
        List<ArgumentInfo> a = f.arguments();
        for (String name : names) {
            for (int i = 0; i < a.size(); i++) {
                if (a.get(i).name().equals(name)) {
                    return i;
                }
            }
        }
        return -1;
    }

    /** A single value, given as itself or as a one-cell range; null when left out. */
    private static Object scalar(Object v) {
        Object u = Arguments.unwrap(v);
        return u instanceof Object[][] ? Arguments.value((Object[][]) u) : u;
    }

    private static String text(Object v) {
        Object s = scalar(v);
        return s instanceof String ? (String) s : null;
    }

    /** Every number of a value or range, blanks and texts left out. */
    private static double[] numbers(Object v) {
        Object u = Arguments.unwrap(v);
        Object[][] grid = u instanceof Object[][] ? (Object[][]) u : new Object[][] {{u}};
        List<Double> found = new ArrayList<>();
        for (Object[] row : grid) {
            for (Object c : row) {
                if (c instanceof Number) {
                    found.add(((Number) c).doubleValue());
                }
            }
        }
        double[] out = new double[found.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = found.get(i);
        }
        return out;
    }

    /** The total of a single row or column; the largest row total of a block (one batch per row). */
    private static double largestTotal(Object v) {
        Object u = Arguments.unwrap(v);
        Object[][] grid = u instanceof Object[][] ? (Object[][]) u : new Object[][] {{u}};
        boolean block = grid.length > 1 && grid[0].length > 1;
        double largest = 0.0;
        double all = 0.0;
        for (Object[] row : grid) {
            double total = 0.0;
            for (Object c : row) {
                if (c instanceof Number) {
                    total += ((Number) c).doubleValue();
                }
            }
            largest = Math.max(largest, total);
            all += total;
        }
        return block ? largest : all;
    }
}
