package org.miscela.it;

import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;

import com.sun.star.lang.XComponent;
import com.sun.star.table.XCell;
import java.nio.file.Paths;
import java.util.LinkedHashMap;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * Which Calc error code each exception a Java add-in method throws becomes, declared in the IDL or not: the bridge
 * probe's PROBE.FAILDECLARED and PROBE.FAILUNDECLARED (benchmark module, never shipped) throw the kind asked for.
 * The add-in's error model (DEVELOPERS.md, docs/errors.md) rests on these codes: IllegalArgumentException is
 * Err:502, NoConvergenceException Err:523, any other exception #VALUE! (Err:519), a Java subclass of the UNO
 * RuntimeException (as the add-in's UnexpectedFailure) too.
 */
class UnoExceptionCodesIT {
    /** Calc's codes (formula/errorcodes.hxx, as ERRORTYPE and XCell.getError give them). */
    private static final int ILLEGAL_ARGUMENT = 502;
    private static final int NO_CONVERGENCE = 523;
    private static final int NO_VALUE = 519;

    @Test
    void eachExceptionShowsItsCode() throws Exception {
        Map<String, Integer> expected = new LinkedHashMap<>();
        expected.put("=PROBE.FAILDECLARED(1)", NO_CONVERGENCE);
        expected.put("=PROBE.FAILDECLARED(2)", ILLEGAL_ARGUMENT);
        expected.put("=PROBE.FAILDECLARED(3)", NO_VALUE);
        expected.put("=PROBE.FAILDECLARED(4)", NO_VALUE);
        expected.put("=PROBE.FAILUNDECLARED(1)", NO_CONVERGENCE);
        expected.put("=PROBE.FAILUNDECLARED(2)", ILLEGAL_ARGUMENT);
        expected.put("=PROBE.FAILUNDECLARED(3)", NO_VALUE);
        expected.put("=PROBE.FAILUNDECLARED(4)", NO_VALUE);
        // a Java subclass of the UNO RuntimeException, as the add-in's UnexpectedFailure is
        expected.put("=PROBE.FAILUNDECLARED(5)", NO_VALUE);
        expected.put("=PROBE.FAILUNDECLARED(0)", 0);
        Map<String, Integer> shown;
        Office office = Office.start(Paths.get(System.getProperty("miscela.probe.oxt")));
        try {
            XComponent doc = office.newSpreadsheet();
            try {
                shown = Sheets.results(doc, Sheets.sheet(doc, 0), 0, expected.keySet(), XCell::getError);
            } finally {
                Sheets.close(doc);
            }
        } finally {
            office.dispose();
        }
        Figures.note(UnoExceptionCodesIT.class, "%s", "Calc's error code per exception: " + shown);
        assertEquals(expected, shown);
    }
}
