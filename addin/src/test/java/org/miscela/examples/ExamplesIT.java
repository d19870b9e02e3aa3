package org.miscela.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.miscela.examples.TernaryWorkbookBuilder.ADDITION_HEAT_ROW;
import static org.miscela.examples.TernaryWorkbookBuilder.AUDIT_PASS_ROW;
import static org.miscela.examples.TernaryWorkbookBuilder.AUDIT_RESIDUAL_ROW;
import static org.miscela.examples.TernaryWorkbookBuilder.AUDIT_TEMPERATURE_ROW;
import static org.miscela.examples.TernaryWorkbookBuilder.AUDIT_TOLERANCE;
import static org.miscela.examples.TernaryWorkbookBuilder.AUDIT_X_ROW;
import static org.miscela.examples.TernaryWorkbookBuilder.BATCH_DENSITY_ROW;
import static org.miscela.examples.TernaryWorkbookBuilder.BATCH_TEMPERATURE_ROW;
import static org.miscela.examples.TernaryWorkbookBuilder.GRID_DENSITY;
import static org.miscela.examples.TernaryWorkbookBuilder.GRID_EXCESS;
import static org.miscela.examples.TernaryWorkbookBuilder.GRID_FIRST;
import static org.miscela.examples.TernaryWorkbookBuilder.GRID_INSIDE;
import static org.miscela.examples.TernaryWorkbookBuilder.GRID_PARTIAL;
import static org.miscela.examples.TernaryWorkbookBuilder.GRID_ROWS;
import static org.miscela.examples.TernaryWorkbookBuilder.GRID_X;
import static org.miscela.examples.TernaryWorkbookBuilder.MIXING_HEAT_ROW;
import static org.miscela.examples.TernaryWorkbookBuilder.PARTIAL_FIRST;
import static org.miscela.examples.TernaryWorkbookBuilder.PARTIAL_ROWS;
import static org.miscela.examples.TernaryWorkbookBuilder.RECIPE_FIRST;
import static org.miscela.examples.TernaryWorkbookBuilder.RISE_ROW;
import static org.miscela.examples.TernaryWorkbookBuilder.TOP_UP_ROW;
import static org.miscela.examples.TernaryWorkbookBuilder.TRACE_TOP;

import com.sun.star.beans.XPropertySet;
import com.sun.star.container.XNameAccess;
import com.sun.star.lang.XComponent;
import com.sun.star.sheet.FormulaResult;
import com.sun.star.sheet.XCalculatable;
import com.sun.star.sheet.XCellRangeData;
import com.sun.star.sheet.XCellRangeReferrer;
import com.sun.star.sheet.XSpreadsheet;
import com.sun.star.sheet.XSpreadsheetDocument;
import com.sun.star.table.XCell;
import com.sun.star.table.XTableChartsSupplier;
import com.sun.star.text.XText;
import com.sun.star.uno.UnoRuntime;
import com.sun.star.util.XCloseable;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.miscela.core.AmountBasis;
import org.miscela.core.Card;
import org.miscela.core.CardFunctions;
import org.miscela.core.CardReader;
import org.miscela.core.Extrapolation;
import org.miscela.core.PropertyKind;
import org.miscela.it.Office;
import org.miscela.it.OfficeParameterResolver;

/**
 * The bundled example workbooks recalculate in the real office with no error cell and every check cell "OK"; the
 * ternary workbook's numbers are the core library's, computed here in the JVM from the card read off its sheet.
 */
@ExtendWith(OfficeParameterResolver.class)
class ExamplesIT {
    /** Both sides run the same core code on the same inputs: anything but rounding noise is a wiring fault. */
    private static final double RELATIVE = 1e-12;

    @Test
    void everyExampleRecalculatesCleanly(Office office) throws Exception {
        Path root = ExampleWorkbooks.repoRoot();
        List<Path> workbooks = new ArrayList<>();
        try (DirectoryStream<Path> ds = Files.newDirectoryStream(root.resolve("examples"), "*.ods")) {
            ds.forEach(workbooks::add);
        }
        assertFalse(workbooks.isEmpty(), "no example workbooks");
        List<String> names = new ArrayList<>();
        workbooks.forEach(w -> names.add(w.getFileName().toString()));
        assertTrue(names.contains(ExampleWorkbookBuilder.FILE) && names.contains(TernaryWorkbookBuilder.FILE),
                "the main job recalculates both example workbooks, found only " + names);
        Path out = Files.createDirectories(Paths.get("target/examples-out"));
        for (Path wb : workbooks) {
            assertEquals(0, ExampleRunner.run(office, wb, out), wb.getFileName() + " has problem cells");
        }
    }

    @Test
    void ternaryGridAndBatchAreTheCoreLibrarysNumbers(Office office) throws Exception {
        XComponent doc = openTernary(office);
        try {
            Card card = CardReader.read(namedRange(doc, "card"));
            assertEquals(3, card.componentCount());

            XSpreadsheet grid = sheet(doc, "Grid");
            double t = grid.getCellRangeByName(TernaryWorkbookBuilder.GRID_TEMPERATURE_CELL).getCellByPosition(0, 0)
                    .getValue();
            assertEquals(sheet(doc, "Overview").getCellByPosition(1, TernaryWorkbookBuilder.OVERVIEW_TEMPERATURE_ROW)
                    .getValue(), t, 0.0, "the grid takes the Overview's temperature");
            int inside = 0;
            for (int i = 0; i < GRID_ROWS; i++) {
                int r = GRID_FIRST + i;
                double[] x = row(grid, GRID_X, r, 3);
                assertEquals(1.0, x[0] + x[1] + x[2], 1e-12, "grid row " + (r + 1) + " sums to 1");
                assertClose(CardFunctions.density(card, x, t, Extrapolation.ALLOW), value(grid, GRID_DENSITY, r),
                        "density, grid row " + (r + 1));
                assertClose(CardFunctions.excessMolarVolume(card, x, t, Extrapolation.ALLOW),
                        value(grid, GRID_EXCESS, r), "excess volume, grid row " + (r + 1));
                double in = CardFunctions.inside(card, x, t);
                assertEquals(in, value(grid, GRID_INSIDE, r), 0.0, "MIX.INSIDE, grid row " + (r + 1));
                inside += (int) in;
            }
            // the grid is meant to show both sides of the card's limits
            assertTrue(inside > 0 && inside < GRID_ROWS, inside + " of " + GRID_ROWS + " points inside");
            for (int i = 0; i < PARTIAL_ROWS; i++) {
                int r = PARTIAL_FIRST + i;
                double[] x = row(grid, GRID_X, r, 3);
                assertEquals(0.1, x[2], 1e-15, "the partial volumes run along x(glycerol) = 0.1");
                for (int k = 0; k < 3; k++) {
                    assertClose(CardFunctions.partialMolarVolume(card, k, x, t, Extrapolation.AS_CARD),
                            value(grid, GRID_PARTIAL + k, r), "partial molar volume " + (k + 1) + ", grid row "
                            + (r + 1));
                }
            }

            XSpreadsheet batch = sheet(doc, "Batch");
            double start = value(batch, 1, BATCH_TEMPERATURE_ROW);
            double[] kg = column(batch, 1, RECIPE_FIRST, 3);
            double[] x = column(batch, 4, RECIPE_FIRST, 3);
            double added = value(batch, 1, TOP_UP_ROW);
            double heat = CardFunctions.mixingHeat(card, kg, AmountBasis.KG, start, Extrapolation.AS_CARD);
            assertTrue(heat < 0, "mixing releases heat on this card: " + heat);
            assertClose(heat, value(batch, 1, MIXING_HEAT_ROW), "MIX.MIXINGHEAT in kJ");
            double rise = CardFunctions.adiabaticRise(card, kg, AmountBasis.KG, start, Extrapolation.AS_CARD);
            assertTrue(rise > 0, "released heat warms the batch: " + rise);
            assertClose(rise, value(batch, 1, RISE_ROW), "MIX.TEMPERATURERISE in K");
            assertClose(CardFunctions.additionHeat(card, kg, 1, added, AmountBasis.KG, start, Extrapolation.AS_CARD),
                    value(batch, 1, ADDITION_HEAT_ROW), "MIX.ADDITIONHEAT of the water top-up in kJ");
            assertClose(CardFunctions.density(card, x, start, Extrapolation.AS_CARD),
                    value(batch, 1, BATCH_DENSITY_ROW), "density of the batch");

            Object charts = UnoRuntime.queryInterface(XTableChartsSupplier.class, sheet(doc, "Overview")).getCharts();
            assertTrue(UnoRuntime.queryInterface(XNameAccess.class, charts).hasByName(
                    TernaryWorkbookBuilder.CHART_NAME), "the triangle chart is on the Overview");
        } finally {
            close(doc);
        }
    }

    @Test
    void ternaryAuditRederivesTheTraceAndCatchesADifference(Office office) throws Exception {
        XComponent doc = openTernary(office);
        try {
            Card card = CardReader.read(namedRange(doc, "card"));
            XSpreadsheet audit = sheet(doc, "Audit");
            double[] x = column(audit, 1, AUDIT_X_ROW, 3);
            double t = value(audit, 1, AUDIT_TEMPERATURE_ROW);
            Object[][] trace = CardFunctions.trace(card, x, t, PropertyKind.VOLUME, Extrapolation.AS_CARD);
            for (int i = 0; i < trace.length; i++) {
                XCell label = audit.getCellByPosition(0, TRACE_TOP + i);
                assertEquals(trace[i][0], text(label), "trace label in row " + (TRACE_TOP + i + 1));
                XCell v = audit.getCellByPosition(1, TRACE_TOP + i);
                if (trace[i][1] instanceof Double) {
                    assertEquals((Double) trace[i][1], v.getValue(), 0.0, trace[i][0] + "");
                } else {
                    assertEquals(trace[i][1], text(v), trace[i][0] + "");
                }
            }
            assertPasses(audit, "at the shipped composition");

            // another composition and temperature inside the card's limits
            double[] other = {0.2, 0.5, 0.3};
            for (int k = 0; k < 3; k++) {
                audit.getCellByPosition(1, AUDIT_X_ROW + k).setValue(other[k]);
            }
            audit.getCellByPosition(1, AUDIT_TEMPERATURE_ROW).setValue(8.0);
            recalculate(doc);
            assertPasses(audit, "at (0.2, 0.5, 0.3) and 8 °C");

            // the pass cell must notice a hand value that is off by one part in a billion
            int waterDensity = handRow(audit, "pure density: water [kg/m³]");
            XCell hand = audit.getCellByPosition(4, waterDensity);
            hand.setValue(hand.getValue() * (1 + 1e-9));
            recalculate(doc);
            assertEquals(0.0, audit.getCellByPosition(1, AUDIT_PASS_ROW).getValue(), "pass cell after the change");
            assertTrue(audit.getCellByPosition(1, AUDIT_RESIDUAL_ROW).getValue() > 0.9e-9,
                    "the largest residual shows the change");
        } finally {
            close(doc);
        }
    }

    private static void assertPasses(XSpreadsheet audit, String where) throws Exception {
        XCell residual = audit.getCellByPosition(1, AUDIT_RESIDUAL_ROW);
        XCell pass = audit.getCellByPosition(1, AUDIT_PASS_ROW);
        assertEquals(0, residual.getError(), "largest residual " + where + " is a number");
        assertTrue(residual.getValue() <= AUDIT_TOLERANCE, "largest residual " + where + ": " + residual.getValue());
        assertEquals(FormulaResult.VALUE, UnoRuntime.queryInterface(XPropertySet.class, pass)
                .getPropertyValue("FormulaResultType2"), "pass cell " + where + " holds a value");
        assertEquals(1.0, pass.getValue(), "pass cell " + where);
        assertEquals("TRUE", text(pass), "pass cell " + where + " as shown");
    }

    /** The row (0-based) of the audit's re-derivation of one quantity, found by its label in column D. */
    private static int handRow(XSpreadsheet audit, String quantity) throws Exception {
        for (int r = TRACE_TOP; r < TRACE_TOP + 80; r++) {
            if (quantity.equals(text(audit.getCellByPosition(3, r)))) {
                return r;
            }
        }
        throw new AssertionError("no re-derivation of " + quantity);
    }

    private static XComponent openTernary(Office office) throws Exception {
        Path wb = ExampleWorkbooks.repoRoot().resolve("examples").resolve(TernaryWorkbookBuilder.FILE);
        XComponent doc = office.load(office.stage(wb));
        recalculate(doc);
        return doc;
    }

    private static Object[][] namedRange(XComponent doc, String name) throws Exception {
        XPropertySet dp = UnoRuntime.queryInterface(XPropertySet.class, doc);
        Object range = UnoRuntime.queryInterface(XNameAccess.class, dp.getPropertyValue("NamedRanges"))
                .getByName(name);
        return UnoRuntime.queryInterface(XCellRangeData.class, UnoRuntime.queryInterface(XCellRangeReferrer.class,
                range).getReferredCells()).getDataArray();
    }

    private static XSpreadsheet sheet(XComponent doc, String name) throws Exception {
        return UnoRuntime.queryInterface(XSpreadsheet.class,
                UnoRuntime.queryInterface(XSpreadsheetDocument.class, doc).getSheets().getByName(name));
    }

    /** A formula cell's numeric result, failing on an error result. */
    private static double value(XSpreadsheet s, int c, int r) throws Exception {
        XCell cell = s.getCellByPosition(c, r);
        assertEquals(0, cell.getError(), "cell " + (char) ('A' + c) + (r + 1) + " has no error");
        return cell.getValue();
    }

    private static double[] row(XSpreadsheet s, int c, int r, int n) throws Exception {
        double[] v = new double[n];
        for (int k = 0; k < n; k++) {
            v[k] = value(s, c + k, r);
        }
        return v;
    }

    private static double[] column(XSpreadsheet s, int c, int r, int n) throws Exception {
        double[] v = new double[n];
        for (int k = 0; k < n; k++) {
            v[k] = value(s, c, r + k);
        }
        return v;
    }

    private static void assertClose(double expected, double actual, String what) {
        assertEquals(expected, actual, RELATIVE * Math.max(1.0, Math.abs(expected)), what);
    }

    private static String text(XCell c) {
        return UnoRuntime.queryInterface(XText.class, c).getString();
    }

    private static void recalculate(XComponent doc) {
        UnoRuntime.queryInterface(XCalculatable.class, doc).calculateAll();
    }

    private static void close(XComponent doc) {
        try {
            UnoRuntime.queryInterface(XCloseable.class, doc).close(true);
        } catch (Exception e) {
            doc.dispose();
        }
    }
}
