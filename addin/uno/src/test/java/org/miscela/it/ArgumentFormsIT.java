package org.miscela.it;

import org.miscela.testing.Figures;
import static org.junit.jupiter.api.Assertions.assertEquals;

import com.sun.star.beans.PropertyValue;
import com.sun.star.container.XIndexAccess;
import com.sun.star.lang.XComponent;
import com.sun.star.sheet.FunctionArgument;
import com.sun.star.sheet.XSpreadsheet;
import com.sun.star.uno.UnoRuntime;
import java.nio.file.Paths;
import java.util.LinkedHashMap;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * What Calc passes to an add-in parameter of each IDL type, and which types its Function Wizard shows as optional:
 * the facts behind the catalogue's choice of types (DEVELOPERS.md, "Platform facts"). The bridge probe's
 * PROBE.STRING, PROBE.DOUBLE, PROBE.CELLS and PROBE.ANY (benchmark module, never shipped) return in words what
 * arrived: the Java type and value of each cell, or Calc's error code when Calc did not call the function.
 */
class ArgumentFormsIT {

    @Test
    void eachParameterTypeReceivesTheseForms() throws Exception {
        // the sheet: A1 a number, A2 a text, A3 empty, A4 a number formula, A5 a text formula, A6 TRUE, A7 ="",
        // A8:A9 a number and a text; the formulas go down column C in this order, so PROBE.STRING(A8:A9) stands in
        // row 8 (a range given to a string or double parameter is intersected with the formula's row: A8's 1) and
        // PROBE.DOUBLE(A8:A9) in row 22 (no intersection: #VALUE!, Err:519)
        Map<String, String> expected = new LinkedHashMap<>();
        String[] forms = {"A1", "A2", "A3", "A4", "A5", "A6", "A7", "A8:A9", "3", "\"t\"", "1/3", "{4}", "{1;2}",
            ""};
        String[][] shown = {
            // string
            {"text '2.5'", "text 'water'", "text ''", "text '2'", "text 'ab'", "text '1'", "text ''", "text '1'",
                "text '3'", "text 't'", "text '0.333333333333333'", "text '4'", "text '1'", "Err:504"},
            // double
            {"number 2.5", "Err:519", "number 0.0", "number 2.0", "Err:519", "number 1.0", "Err:519", "Err:519",
                "number 3.0", "Err:519", "number 0.3333333333333333", "number 4.0", "number 1.0", "Err:504"},
            // sequence< sequence< any > >
            {"1x1 number 2.5", "1x1 text 'water'", "1x1 number 0.0", "1x1 number 2.0", "1x1 text 'ab'",
                "1x1 number 1.0", "1x1 text ''", "2x1 number 1.0 text 'x'", "1x1 number 3.0", "1x1 text 't'",
                "1x1 number 0.3333333333333333", "1x1 number 4.0", "1x2 number 1.0 number 2.0", "Err:504"},
            // any
            {"number 2.5", "text 'water'", "number 0.0", "number 2.0", "text 'ab'", "number 1.0", "text ''",
                "range 2x1 number 1.0 text 'x'", "number 3.0", "text 't'", "number 0.3333333333333333",
                "range 1x1 number 4.0", "range 1x2 number 1.0 number 2.0", "void"}};
        String[] functions = {"PROBE.STRING", "PROBE.DOUBLE", "PROBE.CELLS", "PROBE.ANY"};
        for (int f = 0; f < functions.length; f++) {
            for (int i = 0; i < forms.length; i++) {
                expected.put("=" + functions[f] + "(" + forms[i] + ")", shown[f][i]);
            }
        }
        Map<String, String> seen;
        Office office = Office.start(Paths.get(System.getProperty("miscela.probe.oxt")));
        try {
            XComponent doc = office.newSpreadsheet();
            try {
                XSpreadsheet sheet = Sheets.sheet(doc, 0);
                Sheets.cell(sheet, 0, 0).setValue(2.5);
                Sheets.cell(sheet, 0, 1).setFormula("water");
                Sheets.cell(sheet, 0, 3).setFormula("=1+1");
                Sheets.cell(sheet, 0, 4).setFormula("=\"ab\"");
                Sheets.cell(sheet, 0, 5).setFormula("=TRUE()");
                Sheets.cell(sheet, 0, 6).setFormula("=\"\"");
                Sheets.cell(sheet, 0, 7).setValue(1);
                Sheets.cell(sheet, 0, 8).setFormula("x");
                seen = Sheets.results(doc, sheet, 2, expected.keySet(),
                    c -> c.getError() != 0 ? "Err:" + c.getError() : Sheets.text(c));
            } finally {
                Sheets.close(doc);
            }
            Figures.note(ArgumentFormsIT.class, "%s", "what each parameter type receives: " + seen);
            assertEquals(expected, seen);

            Map<String, String> optional = new LinkedHashMap<>();
            XIndexAccess all = UnoRuntime.queryInterface(XIndexAccess.class,
                    office.service("com.sun.star.sheet.FunctionDescriptions"));
            for (int i = 0; i < all.getCount(); i++) {
                String name = null;
                FunctionArgument[] args = null;
                for (PropertyValue p : (PropertyValue[]) all.getByIndex(i)) {
                    if ("Name".equals(p.Name)) {
                        name = (String) p.Value;
                    } else if ("Arguments".equals(p.Name)) {
                        Object v = p.Value instanceof com.sun.star.uno.Any ? ((com.sun.star.uno.Any) p.Value).getObject()
                                : p.Value;
                        args = v instanceof FunctionArgument[] ? (FunctionArgument[]) v : null;
                    }
                }
                if (java.util.Arrays.asList(functions).contains(name)) {
                    optional.put(name, args.length == 1 && args[0].IsOptional ? "optional" : "required");
                }
            }
            Map<String, String> expectedOptional = new LinkedHashMap<>();
            expectedOptional.put("PROBE.STRING", "required");
            expectedOptional.put("PROBE.DOUBLE", "required");
            expectedOptional.put("PROBE.CELLS", "required");
            expectedOptional.put("PROBE.ANY", "optional");
            Figures.note(ArgumentFormsIT.class, "%s", "the wizard's optional flag per parameter type: " + optional);
            assertEquals(new java.util.TreeMap<>(expectedOptional), new java.util.TreeMap<>(optional));
        } finally {
            office.dispose();
        }
    }
}
