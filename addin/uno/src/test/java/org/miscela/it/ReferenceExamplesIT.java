package org.miscela.it;

import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.star.lang.XComponent;
import com.sun.star.sheet.XSpreadsheet;
import com.sun.star.sheet.XSpreadsheetDocument;
import com.sun.star.table.XCell;
import com.sun.star.uno.UnoRuntime;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.miscela.core.catalog.FunctionCatalog;
import org.miscela.core.catalog.FunctionInfo;
import org.miscela.core.card.TestCards;

/**
 * Every worked example of the function reference (docs/functions.md, from the catalogue) entered in a real office
 * with the example cards: the value Calc shows must be the one the reference prints, to the digits printed.
 */
@ExtendWith(OfficeParameterResolver.class)
class ReferenceExamplesIT {
    /** The cards the examples name, as listed in the reference's introduction. */
    static final String[][] CARDS = {{"card", "ethanol-water-oiml.tsv"}, {"tern", "ternary-invented.tsv"},
        {"acid", "sulfuric-acid-water-nbs.tsv"}, {"cov", "ethanol-water-covariance.tsv"},
        {"vle", "ethanol-water-vle.tsv"}, {"vlw", "ethanol-water-wilson.tsv"},
        {"gibhelm", "invented-gibbs-helmholtz.tsv"}, {"fmin", "invented-flash-minimum.tsv"},
        {"ice", "ethanol-water-vle-ice.tsv"}};

    @Test
    void everyExampleShowsItsPrintedValue(Office office) throws Exception {
        XComponent doc = office.newSpreadsheet();
        try {
            XSpreadsheetDocument sd = UnoRuntime.queryInterface(XSpreadsheetDocument.class, doc);
            sd.getSheets().insertNewByName("Cards", (short) 1);
            XSpreadsheet cards = Sheets.sheet(doc, "Cards");
            int row = 0;
            for (String[] c : CARDS) {
                Object[][] cells = TestCards.cells(c[1]);
                Sheets.putCard(doc, cards, "Cards", c[0], cells, 0, row);
                row += cells.length + 2;
            }
            XSpreadsheet sheet = Sheets.sheet(doc, 0);
            List<FunctionInfo> all = FunctionCatalog.functions();
            for (int i = 0; i < all.size(); i++) {
                Sheets.cell(sheet, 0, i).setFormula(all.get(i).example());
            }
            Sheets.recalculate(doc);
            List<String> wrong = new ArrayList<>();
            for (int i = 0; i < all.size(); i++) {
                FunctionInfo f = all.get(i);
                XCell cell = Sheets.cell(sheet, 0, i);
                String shown = cell.getError() != 0 ? "Err:" + cell.getError() : Sheets.text(cell);
                Figures.note(ReferenceExamplesIT.class, "%s: %s → %s (value %s)", f.displayName(), f.example(), shown,
                        Double.toString(cell.getValue()));
                if (!matches(f.exampleResult(), cell)) {
                    wrong.add(f.displayName() + ": the reference prints " + f.exampleResult() + ", Calc shows "
                            + shown + " (" + cell.getValue() + ")");
                }
            }
            assertTrue(wrong.isEmpty(), String.join("\n", wrong));
            assertEquals(all.size(), all.stream().filter(f -> !f.exampleResult().isEmpty()).count(),
                    "every function's example has its result printed");
        } finally {
            Sheets.close(doc);
        }
    }

    /** A number printed with d decimals matches a value within half a unit of the last digit; text must begin the cell. */
    static boolean matches(String printed, XCell cell) {
        if (printed.isEmpty() || cell.getError() != 0) {
            return false;
        }
        String p = printed.replace('−', '-');
        try {
            double expected = Double.parseDouble(p);
            int dot = p.indexOf('.');
            int decimals = dot < 0 ? 0 : p.length() - dot - 1;
            return Math.abs(cell.getValue() - expected) <= 0.5 * Math.pow(10, -decimals) + 1e-12;
        } catch (NumberFormatException text) {
            return Sheets.text(cell).startsWith(printed);
        }
    }
}
