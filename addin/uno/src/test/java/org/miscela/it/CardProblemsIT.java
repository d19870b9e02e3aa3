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
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.miscela.core.card.MalformedCards;
import org.miscela.core.problem.Problem;

/**
 * Every card problem of the error catalogue (docs/errors.md) produced in a real office: each malformed card of the
 * reader's tests sits in a sheet as a named range; MIX.CHECK must show the problem's message and MIX.DENSITY on the
 * same card Err:502.
 */
@ExtendWith(OfficeParameterResolver.class)
class CardProblemsIT {
    /** The cells as a sheet can hold them: a missing row or cell is a blank. */
    private static Object[][] sheetCells(Object[][] cells) {
        if (cells == null || cells.length == 0) {
            return new Object[][] {{""}};
        }
        Object[][] out = new Object[cells.length][];
        for (int r = 0; r < cells.length; r++) {
            Object[] line = cells[r] == null || cells[r].length == 0 ? new Object[] {""} : cells[r].clone();
            for (int c = 0; c < line.length; c++) {
                line[c] = line[c] == null ? "" : line[c];
            }
            out[r] = line;
        }
        return out;
    }

    @Test
    void everyCardProblemShowsInTheSheet(Office office) throws Exception {
        List<MalformedCards.Case> cases = MalformedCards.all();
        XComponent doc = office.newSpreadsheet();
        try {
            XSpreadsheetDocument sd = UnoRuntime.queryInterface(XSpreadsheetDocument.class, doc);
            sd.getSheets().insertNewByName("Cards", (short) 1);
            XSpreadsheet cards = Sheets.sheet(doc, "Cards");
            XSpreadsheet sheet = Sheets.sheet(doc, 0);
            int row = 0;
            for (int i = 0; i < cases.size(); i++) {
                Object[][] cells = sheetCells(cases.get(i).cells);
                Sheets.putCard(doc, cards, "Cards", "malformed_" + i, cells, 0, row);
                row += cells.length + 1;
                Sheets.cell(sheet, 0, i).setFormula("=MIX.CHECK(malformed_" + i + ")");
                Sheets.cell(sheet, 1, i).setFormula("=MIX.DENSITY(malformed_" + i + ";0.5;20)");
            }
            Sheets.recalculate(doc);
            List<String> wrong = new ArrayList<>();
            Set<Problem> shown = EnumSet.noneOf(Problem.class);
            for (int i = 0; i < cases.size(); i++) {
                MalformedCards.Case c = cases.get(i);
                String text = Sheets.text(Sheets.cell(sheet, 0, i));
                XCell density = Sheets.cell(sheet, 1, i);
                if (text.contains(c.fragment) && !text.equals("OK") && density.getError() == 502) {
                    shown.add(c.problem);
                } else {
                    wrong.add(c.what + ": MIX.CHECK shows \"" + text + "\", MIX.DENSITY error " + density.getError());
                }
            }
            assertTrue(wrong.isEmpty(), String.join("\n", wrong));
            assertEquals(EnumSet.range(Problem.CARD_EMPTY, Problem.NO_COMPOSITION_LIMIT), shown,
                    "every card problem shown in a sheet");
            Figures.note(CardProblemsIT.class,
                    "card problems in the sheet: %d malformed cards, %d problems shown by MIX.CHECK",
                    cases.size(), shown.size());
        } finally {
            Sheets.close(doc);
        }
    }
}
