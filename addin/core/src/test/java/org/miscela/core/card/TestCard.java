package org.miscela.core.card;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Builds card ranges for tests, row by row, the way Calc hands them over: a rectangular array whose numbers are
 * {@link Double} and whose blank cells are empty strings. Row numbers are 1-based and count blank rows, as the
 * reader's messages do.
 *
 * <p>The base card's values are invented for tests; they describe no real substance.
 */
public final class TestCard {
    private final List<Object[]> rows = new ArrayList<>();

    /** An empty builder. */
    public static TestCard empty() {
        return new TestCard();
    }

    /**
     * A valid two-component card (invented values). Rows:
     * 1 header, 2 title, 3 source, 4-7 units, 8 valid temperature, 9 extrapolation, 10-11 components,
     * 12-15 density models and coefficients, 16 valid mole fraction, 17-19 excess volume A0..A2.
     */
    static TestCard base() {
        return empty()
                .row("Miscela card", 1)
                .row("title", "Test pair")
                .row("source", "invented values, for tests")
                .row("temperature unit", "K")
                .row("density unit", "kg/m³")
                .row("molar volume unit", "cm³/mol")
                .row("molar mass unit", "g/mol")
                .row("valid temperature", 288.15, 308.15)
                .row("extrapolation", "refuse")
                .row("component", "alpha", 46.07)
                .row("component", "beta", 18.015)
                .row("density model", "alpha", "constant")
                .row("density coefficients", "alpha", 789.3)
                .row("density model", "beta", "constant")
                .row("density coefficients", "beta", 997.0)
                .row("valid mole fraction", "alpha", 0, 1)
                .row("excess volume A0", "alpha + beta", -4.0)
                .row("excess volume A1", "alpha + beta", 1.5)
                .row("excess volume A2", "alpha + beta", -0.5);
    }

    /**
     * The base card with a third component, gamma (invented values), in card format version 2 so rows of the
     * multicomponent features may be added. Rows 1-19 as in {@link #base}, then
     * 20 component gamma, 21-22 its density, 23 excess volume A0 alpha + gamma, 24 excess volume A0 beta + gamma.
     */
    public static TestCard ternary() {
        return base().set(1, "Miscela card", 2)
                .row("component", "gamma", 92.09)
                .row("density model", "gamma", "constant")
                .row("density coefficients", "gamma", 1261.0)
                .row("excess volume A0", "alpha + gamma", -1.2)
                .row("excess volume A0", "beta + gamma", -0.8);
    }

    /**
     * Water first (the built-in Tanaka et al. 2001 formula), then "ethanol" (a constant 789.3 kg/m³), with invented
     * coefficients, over 10 to 30 °C: a sort by column 2 puts ethanol's rows first and changes what x1 is. With
     * {@code statedOrder} the card is version 2 with the row 'component order | water | ethanol' (row 11).
     */
    public static TestCard waterThenEthanol(boolean statedOrder) {
        TestCard c = empty().row("Miscela card", statedOrder ? 2 : 1).row("title", "Water + ethanol (invented)")
                .row("source", "invented values, for tests").row("temperature unit", "°C")
                .row("density unit", "kg/m³").row("molar volume unit", "cm³/mol").row("molar mass unit", "g/mol")
                .row("valid temperature", 10, 30).row("component", "water", 18.015).row("component", "ethanol", 46.07);
        if (statedOrder) {
            c.row("component order", "water", "ethanol");
        }
        return c.row("density model", "water", "Tanaka 2001").row("density model", "ethanol", "constant")
                .row("density coefficients", "ethanol", 789.3).row("valid mole fraction", "water", 0, 1)
                .row("excess volume A0", "water + ethanol", -4.2).row("excess volume A1", "water + ethanol", 0.9);
    }

    /** Appends a row. */
    public TestCard row(Object... cells) {
        rows.add(cells(cells));
        return this;
    }

    /** Replaces row {@code number} (1-based). */
    public TestCard set(int number, Object... cells) {
        rows.set(number - 1, cells(cells));
        return this;
    }

    /** Blanks row {@code number} (1-based), keeping the numbering of the rows below. */
    public TestCard blank(int number) {
        rows.set(number - 1, new Object[0]);
        return this;
    }

    /** Inserts a row so that it becomes row {@code number}. */
    TestCard insert(int number, Object... cells) {
        rows.add(number - 1, cells(cells));
        return this;
    }

    /** The range as a rectangle padded with empty strings, at least {@code width} columns wide. */
    Object[][] cells(int width) {
        int w = width;
        for (Object[] r : rows) {
            w = Math.max(w, r.length);
        }
        Object[][] out = new Object[rows.size()][];
        for (int i = 0; i < out.length; i++) {
            Object[] r = Arrays.copyOf(rows.get(i), w);
            for (int c = rows.get(i).length; c < w; c++) {
                r[c] = "";
            }
            out[i] = r;
        }
        return out;
    }

    public Object[][] cells() {
        return cells(0);
    }

    public Card read() {
        return CardReader.read(cells());
    }

    /** The card's pure components alone, as the density fit reads them. */
    public Card readPure() {
        return CardReader.readPureComponents(cells());
    }

    private static Object[] cells(Object[] in) {
        Object[] out = new Object[in.length];
        for (int i = 0; i < in.length; i++) {
            out[i] = in[i] instanceof Number ? (Object) ((Number) in[i]).doubleValue() : in[i];
        }
        return out;
    }
}
