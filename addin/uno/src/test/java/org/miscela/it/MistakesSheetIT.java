package org.miscela.it;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.star.beans.PropertyValue;
import com.sun.star.frame.XStorable;
import com.sun.star.lang.XComponent;
import com.sun.star.uno.UnoRuntime;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.miscela.testing.Figures;

/**
 * The mistakes sheet (sheets/mistakes.fods: one row per ordinary mistake, with what the add-in does about it now)
 * saved as .xls (Excel 97), closed and reopened in an office with the extension installed: after a full
 * recalculation every row passes again, as it does in the .fods (SpreadsheetChecksIT). Before the functions had a
 * CompatibilityName, Calc stored their calls in .xls as macro names and every MIX cell reopened as #MACRO?; the sheet's
 * last row fails then. FileFormatRoundTripIT compares the values of .ods, .xlsx and .xls round trips cell by cell.
 */
@ExtendWith(OfficeParameterResolver.class)
class MistakesSheetIT {
    @Test
    void savedAsXlsAndReopenedEveryRowStillPasses(Office office) throws Exception {
        Path sheet = Paths.get("src/test/resources/sheets/mistakes.fods");
        Path xls = office.scratch("mistakes.xls");
        XComponent doc = office.load(office.stage(sheet));
        int before;
        try {
            Sheets.recalculate(doc);
            before = SpreadsheetChecksIT.checkCount(doc);
            assertEquals(List.of(), SpreadsheetChecksIT.failingRows(doc, sheet.toString()), "before saving");
            UnoRuntime.queryInterface(XStorable.class, doc).storeToURL(xls.toUri().toString(),
                    new PropertyValue[] {Office.property("FilterName", "MS Excel 97")});
        } finally {
            Sheets.close(doc);
        }
        assertTrue(Files.size(xls) > 0, "nothing written to " + xls);
        XComponent reopened = office.load(xls);
        try {
            Sheets.recalculate(reopened);
            assertEquals(before, SpreadsheetChecksIT.checkCount(reopened), "the checks counted after reopening");
            List<String> failing = SpreadsheetChecksIT.failingRows(reopened, xls.toString());
            Figures.note(MistakesSheetIT.class, "mistakes sheet saved as .xls and reopened: %d checks, %d failing",
                    before, failing.size());
            assertEquals(0, failing.size(), String.join("\n", failing));
        } finally {
            Sheets.close(reopened);
        }
    }
}
