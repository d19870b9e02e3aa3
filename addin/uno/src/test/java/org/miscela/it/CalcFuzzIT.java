package org.miscela.it;

import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.star.lang.XComponent;
import com.sun.star.sheet.XCellRangeFormula;
import com.sun.star.sheet.XSpreadsheet;
import com.sun.star.sheet.XSpreadsheetDocument;
import com.sun.star.table.XCell;
import com.sun.star.uno.UnoRuntime;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.miscela.core.catalog.ArgumentInfo;
import org.miscela.core.catalog.FunctionCatalog;
import org.miscela.core.catalog.FunctionInfo;
import org.miscela.core.card.TestCards;

/**
 * Generated bad and edge inputs in a real office: every function of the catalogue called with arguments drawn from
 * good and broken cards, wrong ranges, text, blanks, booleans, error cells, huge, tiny and negative numbers, inline
 * arrays of odd shapes and left-out or extra arguments. The office must stay up, and every cell must show a number,
 * a text, or one of the documented error codes: Err:502 (the add-in refused), Err:504 (Calc's own code for a
 * parameter error or an error cell in a range argument), or the error value of an argument, which Calc passes
 * through without calling the add-in. Err:519 (#VALUE!, an unexpected exception in the add-in)
 * or #NUM! (a NaN or infinity returned) would be a defect. The count defaults to 10,000 cells
 * ({@code -Dmiscela.calcfuzz.cells=N}); the seed is fixed so a failure can be replayed.
 */
@ExtendWith(OfficeParameterResolver.class)
class CalcFuzzIT {
    private static final int CELLS = Integer.getInteger("miscela.calcfuzz.cells", 10_000);
    private static final long SEED = Long.getLong("miscela.calcfuzz.seed", 20261201L);
    private static final String[] CARDS = {"card", "tern", "acid", "cov", "vle", "gibhelm", "broken", "junk",
        "$Inputs.A1:C3"};
    /** The first cards of {@link #CARDS} read; the rest do not. */
    private static final int GOOD_CARDS = 6;
    private static final String[] SCALARS = {"0", "1", "0.5", "-1", "1E+300", "-1E+300", "1E-300", "0.3", "45",
        "-300", "20", "25", "2", "3", "99", "\"water\"", "\"Q\"", "\"\"", "\"abc\"", "\"kg\"", "\"mol\"",
        "\"enthalpy\"", "\"orders\"", "\"check\"", "\"density\"", "\"partial volume\"", "TRUE()", "FALSE()",
        "$Inputs.A1", "$Inputs.A2", "$Inputs.A3", "$Inputs.A4", "$Inputs.A5", "NA()", "1/0", "PI()"};
    private static final String[] RANGES = {"$Inputs.B1:B3", "$Inputs.B1:D1", "$Inputs.B1:D3", "$Inputs.A1:A5",
        "$Inputs.E1:E40", "$Inputs.F1:F40", "$Inputs.E1:F40"};

    @Test
    void everyCellIsANumberATextOrADocumentedError(Office office) throws Exception {
        XComponent doc = office.newSpreadsheet();
        try {
            XSpreadsheetDocument sd = UnoRuntime.queryInterface(XSpreadsheetDocument.class, doc);
            sd.getSheets().insertNewByName("Inputs", (short) 1);
            sd.getSheets().insertNewByName("Cards", (short) 2);
            XSpreadsheet inputs = Sheets.sheet(doc, "Inputs");
            // A1 blank, A2 text, A3 a number as text, A4 an error, A5 a boolean; B1:D3 a 3×3 block; E/F columns data.
            Sheets.put(inputs, 0, 1, "ethanol");
            Sheets.put(inputs, 0, 2, "0.4");
            Sheets.cell(inputs, 0, 3).setFormula("=1/0");
            Sheets.cell(inputs, 0, 4).setFormula("=TRUE()");
            double[][] block = {{0.2, 0.5, 0.3}, {0.1, 0.1, 0.8}, {0.6, 0.2, 0.2}};
            for (int r = 0; r < 3; r++) {
                for (int c = 0; c < 3; c++) {
                    Sheets.cell(inputs, 1 + c, r).setValue(block[r][c]);
                }
            }
            for (int r = 0; r < 40; r++) {
                Sheets.cell(inputs, 4, r).setValue((r + 0.5) / 40);
                if (r % 7 != 3) {
                    Sheets.cell(inputs, 5, r).setValue(-1.0 + 0.01 * r);
                }
            }
            XSpreadsheet cards = Sheets.sheet(doc, "Cards");
            String[][] named = {{"card", "ethanol-water-oiml.tsv"}, {"tern", "ternary-invented.tsv"},
                {"acid", "sulfuric-acid-water-nbs.tsv"}, {"cov", "ethanol-water-covariance.tsv"},
                {"vle", "ethanol-water-vle.tsv"}, {"gibhelm", "invented-gibbs-helmholtz.tsv"},
                {"broken", "broken-unit.tsv"}, {"ice", "ethanol-water-vle-ice.tsv"}, {"brine", "library:NaCl"}};
            int row = 0;
            for (String[] c : named) {
                Object[][] cells = TestCards.cells(c[1]);
                Sheets.putCard(doc, cards, "Cards", c[0], cells, 0, row);
                row += cells.length + 2;
            }
            Sheets.putCard(doc, cards, "Cards", "junk", new Object[][] {{"not a card", 1.0}, {"", "x"}}, 0, row);

            Random random = new Random(SEED);
            List<FunctionInfo> functions = FunctionCatalog.functions();
            String[][] formulas = new String[CELLS][1];
            for (int i = 0; i < CELLS; i++) {
                formulas[i][0] = formula(functions.get(random.nextInt(functions.size())), random);
            }
            XSpreadsheet sheet = Sheets.sheet(doc, 0);
            long start = System.nanoTime();
            UnoRuntime.queryInterface(XCellRangeFormula.class, sheet.getCellRangeByPosition(0, 0, 0, CELLS - 1))
                    .setFormulaArray(formulas);
            Sheets.recalculate(doc);
            double seconds = (System.nanoTime() - start) / 1e9;

            Map<String, Integer> outcomes = new TreeMap<>();
            List<String> defects = new ArrayList<>();
            // the functions that gave a number or a text (an answer, not a refusal) in at least one cell
            java.util.Set<String> answered = new java.util.TreeSet<>();
            for (int i = 0; i < CELLS; i++) {
                XCell cell = Sheets.cell(sheet, 0, i);
                int error = cell.getError();
                String kind;
                if (error == 502 || error == 504) {
                    kind = "Err:" + error;
                } else if (passedThrough(formulas[i][0], error)) {
                    kind = "Err:" + error + " of an argument, passed through";
                } else if (error != 0) {
                    kind = "Err:" + error + " (undocumented)";
                    if (defects.size() < 20) {
                        defects.add(formulas[i][0] + " → Err:" + error);
                    }
                } else if (resultType(cell) == com.sun.star.sheet.FormulaResult.STRING) {
                    kind = "text";
                } else {
                    double v = cell.getValue();
                    kind = Double.isFinite(v) ? "number" : "non-finite number";
                    if (!Double.isFinite(v) && defects.size() < 20) {
                        defects.add(formulas[i][0] + " → " + v);
                    }
                }
                outcomes.merge(kind, 1, Integer::sum);
                if (kind.equals("number") || kind.equals("text")) {
                    answered.add(formulas[i][0].substring(1, formulas[i][0].indexOf('(')));
                }
            }
            // The office is still up and computing after all of it.
            XCell probe = Sheets.cell(sheet, 2, 0);
            probe.setFormula("=MIX.DENSITY(card;0.3;20)");
            assertEquals(908.667, probe.getValue(), 0.001, "the office still answers after the run");
            Figures.note(CalcFuzzIT.class, "Calc fuzz: %d cells (seed %d) recalculated in %.1f s: %s", CELLS, SEED,
                    seconds, outcomes);
            assertTrue(defects.isEmpty(), "cells with undocumented outcomes:\n" + String.join("\n", defects));
            // good calls: a share of all cells answers, and, counted per function so that the check keeps its meaning
            // as the catalogue grows, two functions in three answer somewhere (the fits, whose random data rarely
            // fit, and the blending functions with many arguments may not)
            java.util.Set<String> silent = new java.util.TreeSet<>();
            for (FunctionInfo f : functions) {
                if (!answered.contains(f.displayName())) {
                    silent.add(f.displayName());
                }
            }
            Figures.note(CalcFuzzIT.class, "functions that answered in no cell: %s", silent);
            assertTrue(outcomes.getOrDefault("number", 0) + outcomes.getOrDefault("text", 0) > CELLS / 20
                    && answered.size() >= functions.size() * 2 / 3, "the generator must also produce good calls: "
                    + answered.size() + " of " + functions.size() + " functions answered somewhere; silent: " + silent
                    + "; " + outcomes);
        } finally {
            Sheets.close(doc);
        }
    }

    private static int resultType(XCell cell) throws Exception {
        return (Integer) UnoRuntime.queryInterface(com.sun.star.beans.XPropertySet.class, cell)
                .getPropertyValue("FormulaResultType2");
    }

    /**
     * Calc's own rule: an argument that is an error value (here #DIV/0!, code 532, from 1/0 or the error cell A4,
     * and #N/A, code 32767, from NA()) makes the call show that error without calling the add-in.
     */
    private static boolean passedThrough(String formula, int error) {
        return (error == 532 && (formula.contains("1/0") || formula.contains("$Inputs.A4")))
                || (error == 32767 && formula.contains("NA()"));
    }

    /** A call of f with arguments drawn at random; sometimes an argument too few or too many. */
    private static String formula(FunctionInfo f, Random r) {
        List<ArgumentInfo> args = f.arguments();
        int count = args.size();
        int shape = r.nextInt(20);
        if (shape == 0) {
            count = Math.max(0, count - 1 - r.nextInt(2));
        } else if (shape == 1) {
            count = count + 1;
        } else {
            int required = 0;
            for (ArgumentInfo a : args) {
                required += a.optional() ? 0 : 1;
            }
            count = required + r.nextInt(count - required + 1);
        }
        StringBuilder b = new StringBuilder("=").append(f.displayName()).append('(');
        String chosen = "";
        for (int i = 0; i < count; i++) {
            if (i > 0) {
                b.append(';');
            }
            String name = i < args.size() ? args.get(i).name() : "extra";
            if (name.equals("card") || name.equals("pure")) {
                chosen = card(f, r);
                b.append(chosen);
            } else if (chosen.equals("brine") && name.equals("moleFraction") && r.nextBoolean()) {
                // a brine below its eutectic (the library card's ice limit is 0.0856), so that some calls answer
                b.append(String.format(Locale.ROOT, "%.4f", 0.08 * r.nextDouble()));
            } else {
                b.append(argument(name, r));
            }
        }
        return b.append(')').toString();
    }

    /**
     * The card argument: mostly one of the cards that read, and for a function that needs what only some cards hold
     * (phase equilibrium, heats) usually one of those, so that a share of its calls can succeed.
     */
    private static String card(FunctionInfo f, Random r) {
        int pick = r.nextInt(10);
        if (pick < 5 && f.errors().contains(org.miscela.core.problem.Problem.NO_FUSION_DATA)) {
            return pick < 3 ? "ice" : "brine"; // the vle card with the melting rows of ice; the library's NaCl card
        }
        if (pick < 5 && f.errors().contains(org.miscela.core.problem.Problem.NO_GIBBS)
                && f.errors().contains(org.miscela.core.problem.Problem.NO_ENTHALPY)) {
            return "gibhelm";
        }
        if (pick < 5 && f.errors().contains(org.miscela.core.problem.Problem.NO_GIBBS)
                || pick < 5 && f.errors().contains(org.miscela.core.problem.Problem.NO_PRESSURE_UNIT)) {
            return "vle";
        }
        if (pick < 4 && f.errors().contains(org.miscela.core.problem.Problem.NO_ENTHALPY)) {
            return "acid";
        }
        return pick < 8 ? CARDS[r.nextInt(GOOD_CARDS)] : CARDS[r.nextInt(CARDS.length)];
    }

    private static String argument(String name, Random r) {
        int pick = r.nextInt(10);
        if (name.equals("card") || name.equals("pure")) {
            return pick < 8 ? CARDS[r.nextInt(GOOD_CARDS)] : CARDS[r.nextInt(CARDS.length)];
        }
        if (pick == 0) {
            return ""; // left out
        }
        if ((name.equals("compositionBasis") || name.equals("basisTemperature")) && pick < 7) {
            // the trailing basis arguments: mostly left out or plausible, so that the calls before them still succeed
            return plausible(name, r);
        }
        if (pick == 1) {
            return RANGES[r.nextInt(RANGES.length)];
        }
        if (pick == 2) {
            return inlineArray(r);
        }
        if (pick < 7) {
            return plausible(name, r);
        }
        return SCALARS[r.nextInt(SCALARS.length)];
    }

    /** A value of the right kind for the argument, so that a share of the calls succeed. */
    private static String plausible(String name, Random r) {
        switch (name) {
            case "moleFraction":
            case "vapourComposition":
                return r.nextBoolean() ? String.format(Locale.ROOT, "%.3f", r.nextDouble())
                        : String.format(Locale.ROOT, "{%.2f;%.2f;%.2f}", 0.2, 0.5, 0.3);
            case "temperature":
                // 10 to 40 °C: inside the volumetric cards' ranges, and the phase-equilibrium card's from 30 °C
                return String.format(Locale.ROOT, "%.1f", 10 + 30 * r.nextDouble());
            case "pressure":
                return r.nextBoolean() ? "101.325" : "50";
            case "component":
            case "reference":
                return Integer.toString(1 + r.nextInt(3));
            case "find":
                return r.nextBoolean() ? "\"chloride\"" : "\"water\"";
            case "name":
                return r.nextBoolean() ? "\"NaCl\"" : "\"glycerol\"";
            case "compositionBasis":
                return new String[] {"", "\"mole fraction\"", "\"x\"", "\"mass fraction\""}[r.nextInt(4)];
            case "basisTemperature":
                return r.nextBoolean() ? "" : "20";
            case "amounts":
                return r.nextBoolean() ? "{1;10}" : "{2;5;1}";
            case "added":
            case "values":
            case "composition":
            case "target":
                return String.format(Locale.ROOT, "%.2f", 0.05 + 0.5 * r.nextDouble());
            case "unit":
            case "resultUnit":
                return r.nextBoolean() ? "\"kg\"" : "\"L\"";
            case "from":
            case "to":
            case "basis":
                return r.nextBoolean() ? "\"mass fraction\"" : "\"mole fraction\"";
            case "charges":
                return "{1;2}";
            case "referenceTemperature":
            case "targetTemperature":
                return "20";
            case "order":
            case "orderInTemperature":
                return Integer.toString(r.nextInt(4));
            case "excessVolume":
            case "density":
            case "response":
                return "$Inputs.F1:F40";
            case "design":
                return "$Inputs.E1:E40";
            default:
                return SCALARS[r.nextInt(SCALARS.length)];
        }
    }

    private static String inlineArray(Random r) {
        int rows = 1 + r.nextInt(3);
        int cols = 1 + r.nextInt(4);
        StringBuilder b = new StringBuilder("{");
        for (int i = 0; i < rows; i++) {
            for (int j = 0; j < cols; j++) {
                if (j > 0) {
                    b.append(';');
                }
                int k = r.nextInt(8);
                b.append(k == 0 ? "\"t\"" : k == 1 ? "-1" : k == 2 ? "1E+200" : String.format(Locale.ROOT, "%.2f",
                        r.nextDouble()));
            }
            if (i < rows - 1) {
                b.append('|');
            }
        }
        return b.append('}').toString();
    }
}
