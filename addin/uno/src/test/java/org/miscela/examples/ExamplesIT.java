package org.miscela.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
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
import com.sun.star.sheet.CellFlags;
import com.sun.star.sheet.FormulaResult;
import com.sun.star.sheet.XCellRangesQuery;
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
import org.miscela.core.functions.AmountBasis;
import org.miscela.core.card.Card;
import org.miscela.core.functions.CardFunctions;
import org.miscela.core.card.CardReader;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.TestCards;
import org.miscela.core.functions.TemperaturePath;
import org.miscela.core.fit.VleFitter;
import org.miscela.core.functions.FitFunctions;
import org.miscela.core.functions.FitOutput;
import org.miscela.core.functions.FlashPoints;
import org.miscela.core.functions.PhaseFunctions;
import org.miscela.core.functions.PropertyKind;
import org.miscela.core.library.CardLibrary;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Problem;
import org.miscela.core.blend.BlendFunctions;
import org.miscela.core.blend.CompositionBasis;
import org.miscela.it.Office;
import org.miscela.it.OfficeParameterResolver;
import org.miscela.reference.Oiml22;
import org.miscela.testing.Figures;

/**
 * The bundled example workbooks recalculate in the real office with no error cell and every check cell "OK"; the
 * ternary, quote, make-up, lab-fit, acid-dilution and brine-plant workbooks' numbers are the core library's, computed
 * here in the JVM from the card and the inputs read off their sheets; a few are checked against the OIML R 22 formula
 * itself, the acid dilution's heat of mixing against the card format's Redlich-Kister sum, and its paths against
 * identities (each order ends at MIX.TEMPERATURERISE's temperature; with the "cooling" removed the peak is the limit);
 * the brine plant's card block is the library's card, cell by cell, and its recipe against the recipe's definition;
 * the solvent recovery's phase equilibria against Wilson's equation with published parameters, the published
 * azeotrope at 1 atm, the pure liquids' boiling points and a published isobar; the sanitiser strengths' flash points
 * against the core and a published list.
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
        for (String expected : ExampleRunner.EXPECTED) {
            assertTrue(names.contains(expected), "the main job recalculates " + expected + ", found only " + names);
        }
        Path out = Files.createDirectories(Paths.get("target/examples-out"));
        for (Path wb : workbooks) {
            List<String> problems = new ArrayList<>();
            int count = ExampleRunner.run(office, wb, out, line -> Figures.note(ExamplesIT.class, "%s", line),
                    problems::add);
            assertEquals(0, count, wb.getFileName() + " has problem cells:\n" + String.join("\n", problems));
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

    /** Tolerance of the reference card against the OIML R 22 formula (EthanolWaterCardTest), kg/m³. */
    private static final double OIML_DENSITY = 0.011;

    @Test
    void quoteIsTheCoreLibrarysAndOimlsNumbers(Office office) throws Exception {
        XComponent doc = open(office, QuoteWorkbookBuilder.FILE);
        try {
            Card card = CardReader.read(namedRange(doc, "card"));
            XSpreadsheet q = sheet(doc, "Quote");
            double volume = value(q, 1, QuoteWorkbookBuilder.VOLUME_ROW);
            double strength = value(q, 1, QuoteWorkbookBuilder.STRENGTH_ROW);
            double basisT = value(q, 1, QuoteWorkbookBuilder.BASIS_T_ROW);
            double deliveryT = value(q, 1, QuoteWorkbookBuilder.DELIVERY_T_ROW);
            double referenceT = value(q, 1, QuoteWorkbookBuilder.REFERENCE_T_ROW);
            assertEquals(20.0, basisT, 0.0, "the shipped quote states its strength at 20 °C, as OIML R 22 does");
            CompositionBasis pv = BlendFunctions.basis(card, "%vol", basisT, BlendFunctions.DEFAULT_BALANCE);
            double[] ordered = BlendFunctions.binary(card, strength, pv);
            Extrapolation e = Extrapolation.AS_CARD;

            double factor = BlendFunctions.volumeCorrection(card, ordered, pv, deliveryT, referenceT, null, e);
            assertClose(factor, value(q, 1, QuoteWorkbookBuilder.FACTOR_ROW), "MIX.VOLUMEFACTOR");
            assertClose(volume * factor, value(q, 1, QuoteWorkbookBuilder.REFERENCE_VOLUME_ROW),
                    "volume at the reference temperature");
            double basisVolume = volume * BlendFunctions.volumeCorrection(card, ordered, pv, deliveryT, basisT, null,
                    e);
            assertClose(basisVolume, value(q, 1, QuoteWorkbookBuilder.BASIS_VOLUME_ROW), "volume for the recipe");
            double[] kg = BlendFunctions.recipe(card, basisVolume, "L", basisT, ordered, pv, null, "kg", e);
            double[] sheetKg = row(q, 1, QuoteWorkbookBuilder.MASS_ROW, 2);
            double[] tanks = row(q, 1, QuoteWorkbookBuilder.TANK_T_ROW, 2);
            double[] drawn = BlendFunctions.recipe(card, basisVolume, "L", basisT, ordered, pv, tanks, "L", e);
            double[] sheetDrawn = row(q, 1, QuoteWorkbookBuilder.DRAW_ROW, 2);
            for (int k = 0; k < 2; k++) {
                assertClose(kg[k], sheetKg[k], "MIX.RECIPE mass of component " + (k + 1));
                assertClose(drawn[k], sheetDrawn[k], "MIX.RECIPE volume drawn of component " + (k + 1));
            }
            assertTrue(tanks[0] != tanks[1], "the example's tanks are at different temperatures");
            assertTrue(sheetDrawn[0] + sheetDrawn[1] > volume, "the tank volumes exceed the blend: contraction");
            assertClose(BlendFunctions.batch(card, kg, "kg", null, basisT, "contraction", "L", e),
                    value(q, 1, QuoteWorkbookBuilder.CONTRACTION_ROW), "MIX.BATCH contraction");
            assertClose(BlendFunctions.batch(card, kg, "kg", null, basisT, "contraction %", null, e),
                    value(q, 1, QuoteWorkbookBuilder.CONTRACTION_PERCENT_ROW), "MIX.BATCH contraction %");
            assertEquals(volume, value(q, 1, QuoteWorkbookBuilder.DELIVERY_CHECK_ROW), 1e-9 * volume,
                    "the masses make the ordered volume at the delivery temperature");

            // the OIML R 22 formula itself: strength 100·p·ρ(p, 20)/ρ(1, 20) of the recipe's mass fraction, and the
            // volume factor ρ(p, t)/ρ(p, t_ref); the card follows the formula within 0.011 kg/m³, which allows
            // about 0.0005 %vol here and 2.3e-5 in a ratio of two densities
            double p = sheetKg[0] / (sheetKg[0] + sheetKg[1]);
            assertEquals(strength, 100 * p * Oiml22.density(p, 20) / Oiml22.density(1, 20), 0.002,
                    "strength of the recipe by the OIML R 22 formula");
            assertEquals(Oiml22.density(p, deliveryT) / Oiml22.density(p, referenceT), factor, 3e-5,
                    "volume factor by the OIML R 22 formula");
            double[] w = BlendFunctions.convert(card, ordered, pv, CompositionBasis.massFraction(), e);
            assertClose(w[0], value(q, 7, QuoteWorkbookBuilder.MASS_FRACTION_ROW), "MIX.CONVERT mass fraction");
            assertEquals(p, w[0], 1e-9, "the recipe has the ordered composition");

            double[] price = row(q, 1, QuoteWorkbookBuilder.PRICE_ROW, 2);
            double quote = (kg[0] * price[0] + kg[1] * price[1]
                    + value(q, 1, QuoteWorkbookBuilder.CHARGE_RATE_ROW) * volume)
                    * (1 + value(q, 1, QuoteWorkbookBuilder.MARGIN_ROW));
            assertClose(quote, value(q, 1, QuoteWorkbookBuilder.QUOTE_ROW), "quoted price");
        } finally {
            close(doc);
        }
    }

    @Test
    void makeUpIsTheCoreLibrarysNumbers(Office office) throws Exception {
        XComponent doc = open(office, PlantWorkbookBuilder.FILE);
        try {
            Card card = CardReader.read(namedRange(doc, "card"));
            XSpreadsheet m = sheet(doc, "Make-up");
            Extrapolation e = Extrapolation.AS_CARD;
            double tank = value(m, 1, PlantWorkbookBuilder.TANK_T_ROW);
            double working = value(m, 1, PlantWorkbookBuilder.WORKING_ROW);
            double basisT = value(m, 1, PlantWorkbookBuilder.BASIS_T_ROW);
            double rho = value(m, 1, PlantWorkbookBuilder.DENSITY_ROW);
            double sampleT = value(m, 1, PlantWorkbookBuilder.SAMPLE_T_ROW);
            double[] record = row(m, 1, PlantWorkbookBuilder.RECORD_ROW, 2);
            CompositionBasis w = CompositionBasis.massFraction();
            CompositionBasis pv = BlendFunctions.basis(card, "%vol", basisT, BlendFunctions.DEFAULT_BALANCE);

            double labW = BlendFunctions.fromDensity(card, rho, sampleT, 0, null, Double.NaN, Double.NaN, w, e);
            assertClose(labW, value(m, 1, PlantWorkbookBuilder.LAB_W_ROW), "MIX.FROMDENSITY mass fraction");
            assertClose(BlendFunctions.fromDensity(card, rho, sampleT, 0, null, Double.NaN, Double.NaN, pv, e),
                    value(m, 1, PlantWorkbookBuilder.LAB_STRENGTH_ROW), "MIX.FROMDENSITY %vol");
            assertEquals(rho, Oiml22.density(labW, sampleT), OIML_DENSITY,
                    "the OIML R 22 formula gives the reading back at the strength found");
            assertClose(BlendFunctions.convert(card, new double[] {record[0] / (record[0] + record[1]),
                record[1] / (record[0] + record[1])}, w, pv, e)[0],
                    value(m, 1, PlantWorkbookBuilder.RECORD_STRENGTH_ROW), "strength of the batch record");

            double total = record[0] + record[1];
            double[] amounts = {total * labW, total * (1 - labW)};
            double[] sheetAmounts = row(m, 1, PlantWorkbookBuilder.LAB_AMOUNTS_ROW, 2);
            for (int k = 0; k < 2; k++) {
                assertClose(amounts[k], sheetAmounts[k], "amount in the tank, component " + (k + 1));
            }
            assertClose(BlendFunctions.batch(card, amounts, "kg", null, tank, null, null, e),
                    value(m, 1, PlantWorkbookBuilder.VOLUME_NOW_ROW), "MIX.BATCH volume now");
            double target = value(m, 1, PlantWorkbookBuilder.TARGET_ROW);
            double[] goal = BlendFunctions.convert(card, BlendFunctions.binary(card, target, pv), pv, w, e);
            assertClose(goal[0], value(m, 1, PlantWorkbookBuilder.TARGET_W_ROW), "target as a mass fraction");

            double[] least = (double[]) BlendFunctions.adjust(card, amounts, "kg", null, goal, w, tank, null,
                    Double.NaN, null, null, null, e);
            double[] sheetLeast = row(m, 1, PlantWorkbookBuilder.LEAST_ROW, 2);
            for (int k = 0; k < 2; k++) {
                assertClose(least[k], sheetLeast[k], "least addition, component " + (k + 1));
            }
            assertEquals(0.0, sheetLeast[0], 0.0, "a weaker target needs water only");
            double leastVolume = (Double) BlendFunctions.adjust(card, amounts, "kg", null, goal, w, tank, null,
                    Double.NaN, null, "volume", "L", e);
            assertClose(leastVolume, value(m, 1, PlantWorkbookBuilder.LEAST_VOLUME_ROW), "volume after");
            assertTrue(leastVolume > working, "the shipped example shows a target that overfills the tank: "
                    + leastVolume + " L against " + working + " L");

            double[] within = (double[]) BlendFunctions.adjust(card, amounts, "kg", null, goal, w, tank, "within",
                    working, "L", null, null, e);
            double[] sheetWithin = row(m, 1, PlantWorkbookBuilder.WITHIN_ROW, 2);
            for (int k = 0; k < 2; k++) {
                assertClose(within[k], sheetWithin[k], "addition within the working volume, component " + (k + 1));
            }
            double withinVolume = value(m, 1, PlantWorkbookBuilder.WITHIN_VOLUME_ROW);
            assertTrue(withinVolume <= working * (1 + 1e-9), "within keeps to the working volume: " + withinVolume);
            assertEquals(BlendFunctions.adjust(card, amounts, "kg", null, goal, w, tank, "within", working, "L",
                    "summary", null, e), text(m.getCellByPosition(0, PlantWorkbookBuilder.SUMMARY_ROW + 1)),
                    "the summary sentence");
            assertTrue(value(m, 1, PlantWorkbookBuilder.WITHIN_STRENGTH_ROW) > target,
                    "within the working volume the batch stays stronger than the target");

            // keeping only part of the batch lets the least additions fit exactly into the working volume
            double keep = value(m, 1, PlantWorkbookBuilder.KEEP_ROW);
            assertClose(working / leastVolume, keep, "part that can stay");
            double[] kept = {keep * amounts[0], keep * amounts[1]};
            double[] keptAdd = row(m, 1, PlantWorkbookBuilder.KEPT_ADD_ROW, 2);
            assertEquals(keep * least[1], keptAdd[1], 1e-9 * least[1], "the additions scale with the batch");
            assertEquals(working, value(m, 1, PlantWorkbookBuilder.KEPT_VOLUME_ROW), 1e-9 * working,
                    "what stays, adjusted, fills the working volume");
            double[] after = {kept[0] + keptAdd[0], kept[1] + keptAdd[1]};
            assertEquals(target, BlendFunctions.convert(card, new double[] {after[0] / (after[0] + after[1]),
                after[1] / (after[0] + after[1])}, w, pv, e)[0], 1e-9, "what stays reaches the target");

            double last = 0;
            for (int i = 0; i < PlantWorkbookBuilder.TOP_UP_KG.length; i++) {
                int r = PlantWorkbookBuilder.TOP_UP_FIRST + i;
                double added = value(m, PlantWorkbookBuilder.TOP_UP_ADDED, r);
                double exact = BlendFunctions.additionVolume(card, amounts, "kg", null, 1, added, "kg", tank, null,
                        "L", e);
                double first = BlendFunctions.additionVolume(card, amounts, "kg", null, 1, added, "kg", tank,
                        "first order", "L", e);
                assertClose(exact, value(m, PlantWorkbookBuilder.TOP_UP_EXACT, r), "exact top-up, row " + (r + 1));
                assertClose(first, value(m, PlantWorkbookBuilder.TOP_UP_FIRST_ORDER, r), "first order, row "
                        + (r + 1));
                double gap = value(m, PlantWorkbookBuilder.TOP_UP_DIFFERENCE, r);
                assertEquals(first - exact, gap, 1e-9 * Math.abs(exact), "difference, row " + (r + 1));
                assertTrue(Math.abs(gap / exact) > last, "the linear estimate drifts as the top-up grows");
                last = Math.abs(gap / exact);
            }
        } finally {
            close(doc);
        }
    }

    @Test
    void labCardIsTheFitOfTheLabTableAndRefitsOnNewData(Office office) throws Exception {
        XComponent doc = open(office, LabFitWorkbookBuilder.FILE);
        try {
            Card pure = CardReader.readPureComponents(namedRange(doc, "pure"));
            Card card = CardReader.read(namedRange(doc, "card"));
            XSpreadsheet lab = sheet(doc, "Lab");
            XSpreadsheet fit = sheet(doc, "Fit");
            double[][] planned = LabFitWorkbookBuilder.measurements();
            int n = LabFitWorkbookBuilder.POINTS;
            double[] x = new double[n];
            double[] t = new double[n];
            double[] rho = new double[n];
            for (int i = 0; i < n; i++) {
                int r = LabFitWorkbookBuilder.LAB_FIRST + i;
                x[i] = value(lab, LabFitWorkbookBuilder.LAB_X, r);
                t[i] = value(lab, LabFitWorkbookBuilder.LAB_T, r);
                rho[i] = value(lab, LabFitWorkbookBuilder.LAB_DENSITY, r);
                assertEquals(Oiml22.moleFraction(planned[i][0]), x[i], 1e-12, "mole fraction of point " + (i + 1));
                assertEquals(planned[i][2], rho[i], 0.0, "the sheet holds the generated density of point " + (i + 1));
                double noise = rho[i] - Oiml22.density(planned[i][0], t[i]);
                assertTrue(Math.abs(noise) < 5 * LabFitWorkbookBuilder.NOISE, "noise of point " + (i + 1) + ": "
                        + noise);
            }
            assertTrue(text(lab.getCellByPosition(0, LabFitWorkbookBuilder.LAB_FIRST + n)).isEmpty(),
                    "room for new measurements below the data");
            double tRef = value(fit, 1, LabFitWorkbookBuilder.TREF_ROW);
            int order = LabFitWorkbookBuilder.ORDER;
            int orderT = LabFitWorkbookBuilder.ORDER_IN_T;
            Object[][] a = FitFunctions.density(pure, 0, 1, x, rho, t, order, orderT, tRef, null,
                    FitOutput.COEFFICIENTS);
            Object[][] se = FitFunctions.density(pure, 0, 1, x, rho, t, order, orderT, tRef, null,
                    FitOutput.STANDARD_ERRORS);
            XSpreadsheet results = sheet(doc, "Results");
            for (int k = 0; k <= order; k++) {
                int r = LabFitWorkbookBuilder.COEFF_FIRST + k;
                for (int j = 0; j <= orderT; j++) {
                    assertClose((Double) a[k][j], value(results, 1 + j, r), "card coefficient a" + k + j);
                    assertClose((Double) se[k][j], value(results, 3 + j, r), "standard error of a" + k + j);
                }
            }
            Object[][] stats = FitFunctions.density(pure, 0, 1, x, rho, t, order, orderT, tRef, null,
                    FitOutput.STATISTICS);
            int s0 = LabFitWorkbookBuilder.STATS_FIRST;
            assertEquals((double) n, value(fit, 1, s0 + 1), 0.0, "points in the fit");
            double sd = value(fit, 1, s0 + 4);
            assertClose((Double) stats[4][1], sd, "standard deviation of the fit");
            assertTrue(sd > 0.8 * LabFitWorkbookBuilder.NOISE && sd < 1.3 * LabFitWorkbookBuilder.NOISE,
                    "the fit scatters like the noise put in: " + sd);
            Object[][] orders = FitFunctions.density(pure, 0, 1, x, rho, t, LabFitWorkbookBuilder.HIGHEST_ORDER,
                    orderT, tRef, null, FitOutput.ORDERS);
            int selected = LabFitWorkbookBuilder.ORDERS_FIRST + LabFitWorkbookBuilder.HIGHEST_ORDER + 2;
            for (int i = 0; i < 3; i++) {
                assertEquals(orders[LabFitWorkbookBuilder.HIGHEST_ORDER + 2 + i][1], value(fit, 1, selected + i),
                        "order verdict " + (i + 1));
                assertEquals((double) order, value(fit, 1, selected + i), 0.0,
                        "the sheet's note says every verdict picks the card's order (" + (i + 1) + ")");
            }

            XSpreadsheet plot = sheet(doc, "Plot");
            for (int i = 0; i < n; i++) {
                int r = LabFitWorkbookBuilder.PLOT_FIRST + i;
                assertEquals(rho[i] - CardFunctions.density(card, x[i], t[i], Extrapolation.AS_CARD),
                        value(plot, LabFitWorkbookBuilder.PLOT_RESIDUAL, r), 1e-9, "residual of point " + (i + 1));
            }

            double px = value(results, 1, LabFitWorkbookBuilder.POINT_X_ROW);
            double pt = value(results, 1, LabFitWorkbookBuilder.POINT_T_ROW);
            double pw = value(results, 1, LabFitWorkbookBuilder.POINT_W_ROW);
            double[] xx = {px, 1 - px};
            int r0 = LabFitWorkbookBuilder.RESULTS_FIRST;
            double density = value(results, 1, r0);
            double u = value(results, 2, r0);
            assertClose(CardFunctions.density(card, xx, pt, Extrapolation.AS_CARD), density, "density at the point");
            assertClose(CardFunctions.uncertainty(card, "density", -1, xx, pt, Extrapolation.AS_CARD), u,
                    "MIX.UNCERTAINTY of the density");
            assertTrue(Math.abs(density - Oiml22.density(pw, pt)) < 3 * u, "the card fitted to noisy data follows "
                    + "the formula they came from within 3 standard uncertainties: " + density + " against "
                    + Oiml22.density(pw, pt) + ", u = " + u);
            for (int k = 0; k < 2; k++) {
                assertClose(CardFunctions.partialMolarVolume(card, k, xx, pt, Extrapolation.AS_CARD),
                        value(results, 1, r0 + 3 + k), "partial molar volume " + (k + 1));
                assertClose(CardFunctions.uncertainty(card, "partial volume", k, xx, pt, Extrapolation.AS_CARD),
                        value(results, 2, r0 + 3 + k), "uncertainty of the partial molar volume " + (k + 1));
            }
            Object charts = UnoRuntime.queryInterface(XTableChartsSupplier.class, fit).getCharts();
            XNameAccess named = UnoRuntime.queryInterface(XNameAccess.class, charts);
            assertTrue(named.hasByName(LabFitWorkbookBuilder.DATA_CHART) && named.hasByName(
                    LabFitWorkbookBuilder.RESIDUAL_CHART), "both charts are on the Fit sheet");

            // What the Lab sheet's note promises: a half-filled row is refused with a message, a full one refits.
            int next = LabFitWorkbookBuilder.LAB_FIRST + n;
            XCell check = lab.getCellByPosition(1, LabFitWorkbookBuilder.LAB_CHECK_ROW);
            assertEquals("OK", text(check));
            lab.getCellByPosition(LabFitWorkbookBuilder.LAB_W, next).setValue(0.5);
            recalculate(doc);
            assertEquals("Point " + (n + 1) + " has a mole fraction but a blank density; fill it in, or clear the "
                    + "whole point.", text(check));
            assertEquals(504, results.getCellByPosition(1, r0).getError(), "users of the card show Err:504");
            lab.getCellByPosition(LabFitWorkbookBuilder.LAB_T, next).setValue(20.0);
            lab.getCellByPosition(LabFitWorkbookBuilder.LAB_DENSITY, next).setValue(Oiml22.density(0.5, 20) + 1.0);
            recalculate(doc);
            assertEquals("OK", text(check));
            assertEquals(n + 1.0, value(fit, 1, LabFitWorkbookBuilder.FIT_POINTS_ROW), 0.0, "the new point is in");
            assertTrue(value(results, 1, r0) != density, "the card refitted and the result moved");
        } finally {
            close(doc);
        }
    }

    /** How close two independent evaluations of one temperature must agree, K (Brent's tolerances are far finer). */
    private static final double KELVIN = 1e-6;

    @Test
    void acidDilutionIsTheCoreLibrarysNumbersAndKeepsItsIdentities(Office office) throws Exception {
        XComponent doc = open(office, AcidDilutionWorkbookBuilder.FILE);
        try {
            // the card on the sheet is the project's sulfuric acid card, cell by cell (ODF keeps 15 digits)
            Object[][] sheetCard = namedRange(doc, "card");
            Object[][] resource = TestCards.cells(AcidDilutionWorkbookBuilder.CARD);
            assertEquals(resource.length, sheetCard.length, "rows of the card");
            for (int r = 0; r < resource.length; r++) {
                for (int c = 0; c < sheetCard[r].length; c++) {
                    Object want = c < resource[r].length ? resource[r][c] : "";
                    Object got = sheetCard[r][c];
                    if (want instanceof Double) {
                        assertEquals((Double) want, (Double) got, 1e-14 * Math.abs((Double) want),
                                "card cell " + (r + 1) + "/" + (c + 1));
                    } else {
                        assertEquals(want, got, "card cell " + (r + 1) + "/" + (c + 1));
                    }
                }
            }
            assertEquals("OK", text(sheet(doc, "Card").getCellByPosition(1, 4)), "MIX.CHECK of the card");
            Card card = CardReader.read(sheetCard);
            assertEquals(AcidDilutionWorkbookBuilder.ACID, card.components().get(0).name());
            assertEquals(AcidDilutionWorkbookBuilder.WATER, card.components().get(1).name());

            XSpreadsheet d = sheet(doc, "Dilution");
            double waterKg = value(d, 1, AcidDilutionWorkbookBuilder.WATER_ROW);
            double acidKg = value(d, 1, AcidDilutionWorkbookBuilder.ACID_ROW);
            double t = value(d, 1, AcidDilutionWorkbookBuilder.START_ROW);
            double limit = value(d, 1, AcidDilutionWorkbookBuilder.LIMIT_ROW);
            double vessel = value(d, 1, AcidDilutionWorkbookBuilder.VESSEL_ROW);
            double[] kg = {acidKg, waterKg};
            Extrapolation allow = Extrapolation.ALLOW;

            // strength: the definition of a mass percent; mole fraction from the card's molar masses
            assertEquals(100 * acidKg / (acidKg + waterKg), value(d, 1, AcidDilutionWorkbookBuilder.STRENGTH_ROW),
                    1e-12, "% w/w of the batch");
            double molAcid = acidKg * 1000 / card.components().get(0).molarMass();
            double molWater = waterKg * 1000 / card.components().get(1).molarMass();
            double xAcid = molAcid / (molAcid + molWater);
            assertEquals(xAcid, value(d, 1, AcidDilutionWorkbookBuilder.MOLE_FRACTION_ROW), 1e-12,
                    "mole fraction of the acid");
            assertEquals(1.0, value(d, 1, AcidDilutionWorkbookBuilder.INSIDE_ROW), 0.0,
                    "the batch at its start temperature lies inside the card's data");

            // the heat of mixing: the card format's Redlich-Kister sum N x_a x_b sum A_k (x_a - x_b)^k evaluated
            // here from the published coefficients of the resource card (docs/card-format.md), and the core's
            double[] a = new double[3];
            for (Object[] row : resource) {
                for (int k = 0; k < 3; k++) {
                    if (("excess enthalpy A" + k).equals(row[0])) {
                        a[k] = (Double) row[2];
                    }
                }
            }
            double dx = xAcid - (1 - xAcid);
            double byHand = (molAcid + molWater) * xAcid * (1 - xAcid) * (a[0] + a[1] * dx + a[2] * dx * dx);
            double heat = value(d, 1, AcidDilutionWorkbookBuilder.MIXING_HEAT_ROW);
            assertEquals(byHand, heat, 1e-9 * Math.abs(byHand), "MIX.MIXINGHEAT against the Redlich-Kister sum");
            assertClose(CardFunctions.mixingHeat(card, kg, AmountBasis.KG, t, Extrapolation.AS_CARD), heat,
                    "MIX.MIXINGHEAT in kJ");
            assertTrue(heat < 0, "diluting the acid releases heat: " + heat);
            assertClose(CardFunctions.heatCapacity(card, new double[] {xAcid, 1 - xAcid}, t, Extrapolation.AS_CARD,
                    true), value(d, 1, AcidDilutionWorkbookBuilder.HEAT_CAPACITY_ROW), "MIX.HEATCAPACITY per kg");
            double rise = CardFunctions.adiabaticRise(card, kg, AmountBasis.KG, t, allow);
            assertClose(rise, value(d, 1, AcidDilutionWorkbookBuilder.RISE_ROW), "MIX.TEMPERATURERISE in K");

            // both orders: the core's path on the same inputs
            int[] acidIntoWater = {1, 0};
            int[] waterIntoAcid = {0, 1};
            double[] safeKg = {waterKg, acidKg};
            double[] neverKg = {acidKg, waterKg};
            double[] feeds = {t, t};
            int steps = AcidDilutionWorkbookBuilder.STEPS;
            double[] peak = new double[2];
            for (int col = 1; col <= 2; col++) {
                int[] order = col == 1 ? acidIntoWater : waterIntoAcid;
                double[] amounts = col == 1 ? safeKg : neverKg;
                String which = col == 1 ? "acid into water" : "water into acid";
                peak[col - 1] = value(d, col, AcidDilutionWorkbookBuilder.PEAK_ROW);
                assertClose(path(card, order, amounts, feeds, TemperaturePath.Output.PEAK, steps, 0, 0, Double.NaN),
                        peak[col - 1], which + ": peak");
                assertClose(path(card, order, amounts, feeds, TemperaturePath.Output.PEAK_AT, steps, 0, 0,
                        Double.NaN), value(d, col, AcidDilutionWorkbookBuilder.PEAK_AT_ROW), which + ": peak at");
                double end = value(d, col, AcidDilutionWorkbookBuilder.FINAL_ROW);
                assertClose(path(card, order, amounts, feeds, TemperaturePath.Output.FINAL, steps, 0, 0, Double.NaN),
                        end, which + ": final");
                // enthalpy is a function of state: either order ends where MIX.TEMPERATURERISE puts the batch
                assertEquals(t + value(d, 1, AcidDilutionWorkbookBuilder.RISE_ROW), end, KELVIN,
                        which + ": the end of the path is the start plus MIX.TEMPERATURERISE");
                assertTrue(peak[col - 1] >= end - KELVIN, which + ": the peak is at least the end");
            }
            assertTrue(peak[1] > peak[0] + 50, "water into acid peaks far higher: " + peak[1] + " against " + peak[0]);

            // cooling: the core's answer, and the peak with that heat removed is the limit
            double cooling = value(d, 1, AcidDilutionWorkbookBuilder.COOLING_ROW);
            assertClose(path(card, acidIntoWater, safeKg, feeds, TemperaturePath.Output.COOLING, steps, 0, 0, limit),
                    cooling, "cooling at the limit");
            assertTrue(cooling > 0, "the batch rises above the limit without cooling");
            assertEquals(limit, value(d, 1, AcidDilutionWorkbookBuilder.COOLED_PEAK_ROW), KELVIN,
                    "with the cooling removed the peak is the limit");
            assertClose(path(card, acidIntoWater, safeKg, feeds, TemperaturePath.Output.PEAK, steps, 0, cooling,
                    Double.NaN), value(d, 1, AcidDilutionWorkbookBuilder.COOLED_PEAK_ROW), "peak with the cooling");
            assertEquals(cooling / (value(d, 1, AcidDilutionWorkbookBuilder.HOURS_ROW) * 3600),
                    value(d, 1, AcidDilutionWorkbookBuilder.DUTY_ROW), 1e-12 * cooling, "mean duty in kW");

            // the vessel lowers the peak and the cooling needed
            double vesselPeak = value(d, 1, AcidDilutionWorkbookBuilder.VESSEL_PEAK_ROW);
            assertClose(path(card, acidIntoWater, safeKg, feeds, TemperaturePath.Output.PEAK, steps, vessel, 0,
                    Double.NaN), vesselPeak, "peak with the vessel");
            assertTrue(vessel > 0 && vesselPeak < peak[0], "the vessel takes up heat: " + vesselPeak);
            double vesselCooling = value(d, 1, AcidDilutionWorkbookBuilder.VESSEL_COOLING_ROW);
            assertClose(path(card, acidIntoWater, safeKg, feeds, TemperaturePath.Output.COOLING, steps, vessel, 0,
                    limit), vesselCooling, "cooling with the vessel");
            assertTrue(vesselCooling < cooling, "less cooling with the vessel: " + vesselCooling);

            // the paths on sheet Paths, point by point
            XSpreadsheet p = sheet(doc, "Paths");
            int[][] orders = {acidIntoWater, waterIntoAcid, acidIntoWater};
            double[][] amounts = {safeKg, neverKg, safeKg};
            int[] cols = {AcidDilutionWorkbookBuilder.SAFE_COL, AcidDilutionWorkbookBuilder.NEVER_COL,
                AcidDilutionWorkbookBuilder.COOLED_COL};
            double[] removed = {0, 0, cooling};
            for (int i = 0; i < 3; i++) {
                double[][] rows = (double[][]) CardFunctions.temperaturePath(card, orders[i], amounts[i],
                        AmountBasis.KG, feeds, allow, TemperaturePath.Output.PATH, steps, 0, removed[i], false,
                        Double.NaN);
                assertEquals(AcidDilutionWorkbookBuilder.PATH_ROWS, rows.length, "points of path " + (i + 1));
                for (int r = 0; r < rows.length; r++) {
                    int at = AcidDilutionWorkbookBuilder.PATH_FIRST + r;
                    assertClose(rows[r][0], value(p, cols[i], at), "path " + (i + 1) + " amount, row " + (at + 1));
                    assertClose(rows[r][1], value(p, cols[i] + 1, at), "path " + (i + 1) + " °C, row " + (at + 1));
                }
            }

            Object charts = UnoRuntime.queryInterface(XTableChartsSupplier.class, d).getCharts();
            assertTrue(UnoRuntime.queryInterface(XNameAccess.class, charts).hasByName(
                    AcidDilutionWorkbookBuilder.CHART_NAME), "the chart of the paths is on sheet Dilution");
            for (String name : new String[] {"Dilution", "Paths", "Card"}) {
                XCellRangesQuery q = UnoRuntime.queryInterface(XCellRangesQuery.class, sheet(doc, name));
                assertFalse(q.queryFormulaCells(FormulaResult.ERROR).getCells().createEnumeration().hasMoreElements(),
                        "no cell of sheet " + name + " shows an error");
                assertTrue(q.queryContentCells((short) CellFlags.FORMULA).getCells().createEnumeration()
                        .hasMoreElements(), "sheet " + name + " has formulas");
            }
        } finally {
            close(doc);
        }
    }

    @Test
    void brinePlantIsTheLibraryCardAndTheCoreLibrarysNumbers(Office office) throws Exception {
        XComponent doc = open(office, BrinePlantWorkbookBuilder.FILE);
        try {
            // the named block is exactly the array that MIX.LIBRARYCARD places, cell by cell
            CardLibrary.Entry entry = CardLibrary.find(BrinePlantWorkbookBuilder.LIBRARY_NAME);
            Object[][] library = entry.cells();
            Object[][] sheetCard = namedRange(doc, BrinePlantWorkbookBuilder.NAME);
            assertEquals(library.length, sheetCard.length, "rows of the named block");
            for (int r = 0; r < library.length; r++) {
                assertEquals(library[r].length, sheetCard[r].length, "columns of the named block, row " + (r + 1));
                for (int c = 0; c < library[r].length; c++) {
                    assertEquals(library[r][c], sheetCard[r][c], "card cell " + (r + 1) + "/" + (c + 1));
                }
            }
            assertEquals("{=MIX.LIBRARYCARD(\"" + BrinePlantWorkbookBuilder.LIBRARY_NAME + "\")}",
                    UnoRuntime.queryInterface(com.sun.star.sheet.XArrayFormulaRange.class, namedCells(doc,
                            BrinePlantWorkbookBuilder.NAME)).getArrayFormula(),
                    "the named block is exactly one MIX.LIBRARYCARD array formula (the office shows it in braces)");
            XSpreadsheet cardSheet = sheet(doc, "Card");
            Card card = CardReader.read(sheetCard);
            assertEquals("sodium chloride", card.components().get(0).name());
            assertEquals("water", card.components().get(1).name());
            assertTrue(card.source().contains("Laliberté"), card.source());
            assertEquals("Source (the card's own 'source' row): " + card.source(),
                    text(cardSheet.getCellByPosition(0, BrinePlantWorkbookBuilder.SOURCE_ROW)),
                    "the note under the banner reads the card's own source row");
            assertTrue(text(cardSheet.getCellByPosition(0, BrinePlantWorkbookBuilder.OUTSIDE_CHECK_ROW))
                    .endsWith(": " + entry.check()), "the library's outside check for the card");
            assertEquals(CardLibrary.entries().size(), value(cardSheet, 1,
                    BrinePlantWorkbookBuilder.LIBRARY_COUNT_ROW), 0.0, "cards in the library");
            assertEquals("OK", text(cardSheet.getCellByPosition(1, BrinePlantWorkbookBuilder.CHECK_ROW)),
                    "MIX.CHECK of the library card");

            XSpreadsheet m = sheet(doc, "Make-up");
            Extrapolation e = Extrapolation.AS_CARD;
            double strength = value(m, 1, BrinePlantWorkbookBuilder.STRENGTH_ROW);
            double litres = value(m, 1, BrinePlantWorkbookBuilder.VOLUME_ROW);
            double t = value(m, 1, BrinePlantWorkbookBuilder.TEMPERATURE_ROW);
            CompositionBasis pct = BlendFunctions.basis(card, "%w/w", Double.NaN, BlendFunctions.DEFAULT_BALANCE);
            double[] target = BlendFunctions.binary(card, strength, pct);
            double[] kg = BlendFunctions.recipe(card, litres, "L", t, target, pct, null, null, e);
            assertClose(kg[0], value(m, 1, BrinePlantWorkbookBuilder.SALT_ROW), "MIX.RECIPE salt, kg");
            assertClose(kg[1], value(m, 1, BrinePlantWorkbookBuilder.WATER_ROW), "MIX.RECIPE water, kg");
            // the recipe's definition: the masses are in the target's proportion and fill the target volume
            assertEquals(strength, 100 * kg[0] / (kg[0] + kg[1]), 1e-9, "the recipe has the target strength");
            double volume = value(m, 1, BrinePlantWorkbookBuilder.BATCH_VOLUME_ROW);
            assertClose(BlendFunctions.batch(card, kg, "kg", null, t, "volume", "L", e), volume, "MIX.BATCH volume");
            assertEquals(litres, volume, 1e-9 * litres, "the charge dissolves to the target volume");
            double density = value(m, 1, BrinePlantWorkbookBuilder.DENSITY_ROW);
            assertClose(BlendFunctions.batch(card, kg, "kg", null, t, "density", null, e), density,
                    "MIX.BATCH density");
            assertEquals((kg[0] + kg[1]) / (litres / 1000), density, 1e-9 * density, "density is mass over volume");

            // the check by density
            double sampleT = value(m, 1, BrinePlantWorkbookBuilder.SAMPLE_T_ROW);
            double[] x = BlendFunctions.convert(card, target, pct, CompositionBasis.moleFraction(), e);
            double expected = value(m, 1, BrinePlantWorkbookBuilder.EXPECTED_ROW);
            assertClose(CardFunctions.density(card, x, sampleT, e), expected, "MIX.DENSITY of the target");
            assertEquals(strength, BlendFunctions.fromDensity(card, expected, sampleT, 0, null, Double.NaN, Double.NaN,
                    pct, e), 1e-6, "the expected reading gives the target back");
            double reading = value(m, 1, BrinePlantWorkbookBuilder.READING_ROW);
            double implied = value(m, 1, BrinePlantWorkbookBuilder.IMPLIED_ROW);
            assertClose(BlendFunctions.fromDensity(card, reading, sampleT, 0, null, Double.NaN, Double.NaN, pct, e),
                    implied, "MIX.FROMDENSITY of the reading");
            assertTrue(reading < expected && implied < strength, "the shipped reading shows a weak batch: "
                    + implied);
            assertEquals(implied - strength, value(m, 1, BrinePlantWorkbookBuilder.SHORT_ROW), 1e-12, "short by");
            double mass = kg[0] + kg[1];
            double[] now = {mass * implied / 100, mass * (1 - implied / 100)};
            double add = value(m, 1, BrinePlantWorkbookBuilder.ADD_SALT_ROW);
            assertClose(((double[]) BlendFunctions.adjust(card, now, "kg", null, target, pct, t, null, Double.NaN,
                    null, null, null, e))[0], add, "MIX.ADJUST salt to add");
            assertEquals(strength, 100 * (now[0] + add) / (mass + add), 1e-9, "the salt added reaches the target");

            // the table: one MIX.DENSITY array formula per temperature
            for (int k = 0; k < BrinePlantWorkbookBuilder.TABLE_T.length; k++) {
                int c = BrinePlantWorkbookBuilder.STRENGTH_COL + 1 + k;
                double tk = value(m, c, BrinePlantWorkbookBuilder.TABLE_T_ROW);
                for (int i = 0; i < BrinePlantWorkbookBuilder.TABLE_ROWS; i++) {
                    int r = BrinePlantWorkbookBuilder.TABLE_FIRST + i;
                    double w = value(m, BrinePlantWorkbookBuilder.STRENGTH_COL, r);
                    double[] xi = BlendFunctions.convert(card, BlendFunctions.binary(card, w, pct), pct,
                            CompositionBasis.moleFraction(), e);
                    assertClose(CardFunctions.density(card, xi, tk, e), value(m, c, r), "density at " + w + " % w/w, "
                            + tk + " °C");
                }
            }

            // the refusals in words are the core's own
            String pure = text(m.getCellByPosition(0, BrinePlantWorkbookBuilder.PURE_SALT_ROW + 1));
            MiscelaException noPure = assertThrows(MiscelaException.class,
                    () -> CardFunctions.pureDensity(card, 0, t, e));
            assertTrue(pure.contains(noPure.getMessage()) && pure.contains("no pure-liquid density"), pure);
            String strong = text(m.getCellByPosition(0, BrinePlantWorkbookBuilder.TOO_STRONG_ROW + 1));
            double[] tooStrong = BlendFunctions.convert(card, BlendFunctions.binary(card,
                    BrinePlantWorkbookBuilder.TOO_STRONG, pct), pct, CompositionBasis.moleFraction(),
                    Extrapolation.ALLOW);
            MiscelaException outside = assertThrows(MiscelaException.class,
                    () -> CardFunctions.density(card, tooStrong, t, e));
            assertTrue(strong.contains(outside.getMessage()) && strong.contains("outside the card's validity range"),
                    strong);

            // the freezing point: the core's, with the card's osmotic coefficient and with the ideal solution of ions
            double freezing = value(m, 1, BrinePlantWorkbookBuilder.FREEZING_ROW);
            assertClose(PhaseFunctions.freezingPoint(card, -1, x, PhaseFunctions.Activity.CARD, e), freezing,
                    "MIX.FREEZINGPOINT of the target");
            assertClose(PhaseFunctions.freezingPoint(card, -1, x, PhaseFunctions.Activity.IDEAL, e),
                    value(m, 1, BrinePlantWorkbookBuilder.FREEZING_IDEAL_ROW), "the ideal solution of the ions");
            // CRC Handbook, Concentrative Properties of Aqueous Solutions: 23 % w/w NaCl freezes at -20.67 °C
            assertEquals(-20.67, freezing, 0.3, "the batch's freezing point against the CRC table");
            assertEquals(value(m, 1, BrinePlantWorkbookBuilder.ROAD_T_ROW) - freezing,
                    value(m, 1, BrinePlantWorkbookBuilder.MARGIN_ROW), 1e-12, "margin");
            String eutectic = text(m.getCellByPosition(0, BrinePlantWorkbookBuilder.PAST_EUTECTIC_ROW + 1));
            double[] past = BlendFunctions.convert(card, BlendFunctions.binary(card,
                    BrinePlantWorkbookBuilder.PAST_EUTECTIC, pct), pct, CompositionBasis.moleFraction(), e);
            MiscelaException iceLimit = assertThrows(MiscelaException.class, () -> PhaseFunctions.freezingPoint(card,
                    -1, past, PhaseFunctions.Activity.CARD, e));
            assertEquals(Problem.PAST_ICE_LIMIT, iceLimit.problem());
            assertTrue(eutectic.contains(iceLimit.getMessage()), eutectic);

            Object charts = UnoRuntime.queryInterface(XTableChartsSupplier.class, m).getCharts();
            assertTrue(UnoRuntime.queryInterface(XNameAccess.class, charts).hasByName(
                    BrinePlantWorkbookBuilder.CHART_NAME), "the chart of the table is on sheet Make-up");
        } finally {
            close(doc);
        }
    }

    /**
     * The solvent-recovery workbook: both ethanol + water cards are the project's test cards, cell by cell; every
     * phase-equilibrium number is the core's on the Wilson card; against outside values: the activity table at 70 °C
     * against Wilson's equation with Gmehling et al.'s printed Λ12 = 0.154, Λ21 = 0.888 (the card's constants are
     * those Λ written as −T ln Λ, so agreement to 10⁻⁹), the azeotrope against the published 78.17 °C at
     * x1 = 0.8947 (Evans 1916 as cited in reference/ethanol-water-vle.tsv; measured +0.0060 and −0.04 K, asserted
     * within 0.01 and 0.1 K as in VleCardTest), water's end of the T–x–y table against Wagner and Pruß's check value
     * (101.325 kPa at 373.1243 K) and ethanol's against its normal boiling point 351.44 K (CRC Handbook, as the data
     * note copies it; measured 78.29 °C, asserted within 0.2 K), and the published isobar of Rieder and Thompson
     * 1949 on sheet Lab VLE (measured: bubble points within 0.90 K, vapour within 0.033; asserted within 1.0 K and
     * 0.035). The Redlich–Kister card's refusal of the azeotrope is shown in the core's own words. MIX.FITVLE's
     * Wilson parameters equal the core's fit of the same points; the card built from them puts the azeotrope within
     * 0.02 in x1 and 0.2 K of the published one (measured +0.0010 and −0.07 K), and the consistency table is the
     * core's.
     */
    @Test
    void solventRecoveryIsTheCoreLibrarysNumbersAndMeetsPublishedData(Office office) throws Exception {
        XComponent doc = open(office, SolventRecoveryWorkbookBuilder.FILE);
        try {
            Card wilson = sheetCard(doc, SolventRecoveryWorkbookBuilder.WILSON,
                    SolventRecoveryWorkbookBuilder.WILSON_CARD, "Wilson card");
            Card rk = sheetCard(doc, SolventRecoveryWorkbookBuilder.RK, SolventRecoveryWorkbookBuilder.RK_CARD,
                    "RK card");
            Extrapolation e = Extrapolation.AS_CARD;
            XSpreadsheet s = sheet(doc, "Recovery");
            double p = value(s, 1, SolventRecoveryWorkbookBuilder.PRESSURE_ROW);
            assertEquals(101.325, p, 0.0, "the still at 1 atm");

            // the charge: % w/w to x1 by the definition with the card's molar masses, then the core
            double w = value(s, 1, SolventRecoveryWorkbookBuilder.CHARGE_ROW);
            double m1 = wilson.components().get(0).molarMass();
            double m2 = wilson.components().get(1).molarMass();
            double x1 = (w / m1) / (w / m1 + (100 - w) / m2);
            assertEquals(x1, value(s, 1, SolventRecoveryWorkbookBuilder.CHARGE_X_ROW), 1e-12, "x1 of the charge");
            double[] x = {x1, 1 - x1};
            double tb = value(s, 1, SolventRecoveryWorkbookBuilder.CHARGE_T_ROW);
            assertClose(PhaseFunctions.bubblePoint(wilson, x, p, e), tb, "MIX.BUBBLEPOINT of the charge");
            assertEquals(p, PhaseFunctions.bubblePressure(wilson, x, tb, e), 1e-6,
                    "its bubble pressure is the still's");
            double y1 = value(s, 1, SolventRecoveryWorkbookBuilder.CHARGE_Y_ROW);
            assertClose(PhaseFunctions.vapourFraction(wilson, 0, x, tb, e), y1, "first vapour");
            assertTrue(y1 > x1, "the vapour is richer in ethanol below the azeotrope: " + y1);
            assertEquals(100 * y1 * m1 / (y1 * m1 + (1 - y1) * m2), value(s, 1,
                    SolventRecoveryWorkbookBuilder.CHARGE_YW_ROW), 1e-9, "the vapour in % w/w");
            assertClose(PhaseFunctions.relativeVolatility(wilson, 0, 1, x, tb, e), value(s, 1,
                    SolventRecoveryWorkbookBuilder.ALPHA_ROW), "relative volatility");

            // the azeotrope: the core, then the published one
            double ax = value(s, 1, SolventRecoveryWorkbookBuilder.AZ_X_ROW);
            double at = value(s, 1, SolventRecoveryWorkbookBuilder.AZ_T_ROW);
            assertClose(PhaseFunctions.azeotrope(wilson, p, false, e), ax, "MIX.AZEOTROPE x1");
            assertClose(PhaseFunctions.azeotrope(wilson, p, true, e), at, "MIX.AZEOTROPE temperature");
            assertEquals(SolventRecoveryWorkbookBuilder.PUBLISHED_AZEOTROPE_X, value(s, 1,
                    SolventRecoveryWorkbookBuilder.PUB_X_ROW), 0.0, "the published x1 on the sheet");
            assertEquals(SolventRecoveryWorkbookBuilder.PUBLISHED_AZEOTROPE_C, value(s, 1,
                    SolventRecoveryWorkbookBuilder.PUB_T_ROW), 0.0, "the published temperature on the sheet");
            assertEquals(0.8947, ax, 0.01, "azeotrope x1 against the published 0.8947");
            assertEquals(78.17, at, 0.1, "azeotrope temperature against the published 78.17 °C");
            assertEquals(ax - 0.8947, value(s, 1, SolventRecoveryWorkbookBuilder.DEV_X_ROW), 1e-12, "x1 deviation");
            assertEquals(at - 78.17, value(s, 1, SolventRecoveryWorkbookBuilder.DEV_T_ROW), 1e-12, "T deviation");
            assertEquals(ax, value(s, 1, SolventRecoveryWorkbookBuilder.AZ_Y_ROW), 1e-9, "vapour = liquid there");
            MiscelaException several = assertThrows(MiscelaException.class,
                    () -> PhaseFunctions.azeotrope(rk, p, false, e));
            assertEquals(org.miscela.core.problem.Problem.SEVERAL_AZEOTROPES, several.problem());
            String words = text(s.getCellByPosition(0, SolventRecoveryWorkbookBuilder.RK_ROW + 1));
            assertTrue(words.contains(several.getMessage()), "the refusal in the core's words: " + words);

            // table 3: activity, bubble pressure and vapour at one temperature; Wilson's equation by hand at 70 °C
            int first = SolventRecoveryWorkbookBuilder.TABLE_FIRST;
            double t = value(s, SolventRecoveryWorkbookBuilder.ACT_Y, SolventRecoveryWorkbookBuilder.TABLE_INPUT_ROW);
            assertEquals(70.0, t, 0.0, "the activity table at the temperature of the book's parameters");
            double l12 = 0.154;
            double l21 = 0.888;
            for (int i = 0; i < SolventRecoveryWorkbookBuilder.TABLE_ROWS; i++) {
                int r = first + i;
                double xi = value(s, SolventRecoveryWorkbookBuilder.ACT_X, r);
                double[] z = {xi, 1 - xi};
                double g1 = value(s, SolventRecoveryWorkbookBuilder.ACT_G1, r);
                double g2 = value(s, SolventRecoveryWorkbookBuilder.ACT_G2, r);
                assertClose(PhaseFunctions.activityCoefficient(wilson, 0, z, t, e), g1, "γ1 at x1 = " + xi);
                assertClose(PhaseFunctions.activityCoefficient(wilson, 1, z, t, e), g2, "γ2 at x1 = " + xi);
                double c = l12 / (z[0] + l12 * z[1]) - l21 / (z[1] + l21 * z[0]);
                assertEquals(-Math.log(z[0] + l12 * z[1]) + z[1] * c, Math.log(g1), 1e-9, "Wilson ln γ1, x1 = " + xi);
                assertEquals(-Math.log(z[1] + l21 * z[0]) - z[0] * c, Math.log(g2), 1e-9, "Wilson ln γ2, x1 = " + xi);
                assertClose(PhaseFunctions.bubblePressure(wilson, z, t, e), value(s,
                        SolventRecoveryWorkbookBuilder.ACT_P, r), "bubble pressure at x1 = " + xi);
                assertClose(PhaseFunctions.vapourFraction(wilson, 0, z, t, e), value(s,
                        SolventRecoveryWorkbookBuilder.ACT_Y, r), "y1 at x1 = " + xi);

                // table 4: T-x-y at the still's pressure
                assertEquals(xi, value(s, SolventRecoveryWorkbookBuilder.TXY_X, r), 0.0, "the same grid");
                double bubble = value(s, SolventRecoveryWorkbookBuilder.TXY_T, r);
                assertClose(PhaseFunctions.bubblePoint(wilson, z, p, e), bubble, "bubble point at x1 = " + xi);
                assertClose(PhaseFunctions.vapourFraction(wilson, 0, z, bubble, e), value(s,
                        SolventRecoveryWorkbookBuilder.TXY_Y, r), "y1 at the bubble point, x1 = " + xi);
                double dew = value(s, SolventRecoveryWorkbookBuilder.TXY_DEW, r);
                assertClose(PhaseFunctions.dewPoint(wilson, z, p, e), dew, "dew point at y1 = " + xi);
                assertTrue(dew >= bubble - 1e-6, "the dew line lies on or above the bubble line at " + xi);
            }
            assertEquals(373.1243 - 273.15, value(s, SolventRecoveryWorkbookBuilder.TXY_T, first), 2e-4,
                    "water boils at 373.1243 K at 101.325 kPa (Wagner and Pruß's check value)");
            assertEquals(351.44 - 273.15, value(s, SolventRecoveryWorkbookBuilder.TXY_T,
                    first + SolventRecoveryWorkbookBuilder.TABLE_ROWS - 1), 0.2, "ethanol's normal boiling point");

            // the published isobar on sheet Lab VLE, the card's predictions and the deviations
            XSpreadsheet lab = sheet(doc, "Lab VLE");
            List<String[]> rows = SolventRecoveryWorkbookBuilder.dataRows();
            assertTrue(rows.size() >= 30, rows.size() + " points");
            double worstT = 0;
            double worstY = 0;
            for (int i = 0; i < rows.size(); i++) {
                int r = SolventRecoveryWorkbookBuilder.LAB_FIRST + i;
                String[] f = rows.get(i);
                assertTrue(f[4].startsWith("Rieder, R.M.; Thompson, A.R."), f[4]);
                double lx = value(lab, SolventRecoveryWorkbookBuilder.LAB_X, r);
                double ly = value(lab, SolventRecoveryWorkbookBuilder.LAB_Y, r);
                double lt = value(lab, SolventRecoveryWorkbookBuilder.LAB_T, r);
                double lp = value(lab, SolventRecoveryWorkbookBuilder.LAB_P, r);
                assertEquals(Double.parseDouble(f[2]), lx, 0.0, "x1 of point " + (i + 1));
                assertEquals(Double.parseDouble(f[3]), ly, 0.0, "y1 of point " + (i + 1));
                assertEquals(Double.parseDouble(f[1]) - 273.15, lt, 1e-9, "T of point " + (i + 1));
                assertEquals(Double.parseDouble(f[0]), lp, 0.0, "P of point " + (i + 1));
                double[] z = {lx, 1 - lx};
                double pt = value(lab, SolventRecoveryWorkbookBuilder.LAB_T_PRED, r);
                double py = value(lab, SolventRecoveryWorkbookBuilder.LAB_Y_PRED, r);
                assertClose(PhaseFunctions.bubblePoint(wilson, z, lp, e), pt, "bubble point of point " + (i + 1));
                assertClose(PhaseFunctions.vapourFraction(wilson, 0, z, pt, e), py, "y1 of point " + (i + 1));
                assertEquals(pt - lt, value(lab, SolventRecoveryWorkbookBuilder.LAB_DT, r), 1e-12, "ΔT " + (i + 1));
                assertEquals(py - ly, value(lab, SolventRecoveryWorkbookBuilder.LAB_DY, r), 1e-12, "Δy " + (i + 1));
                worstT = Math.max(worstT, Math.abs(pt - lt));
                worstY = Math.max(worstY, Math.abs(py - ly));
            }
            assertTrue(worstT < 1.0, "bubble points within 1.0 K of Rieder and Thompson's: " + worstT);
            assertTrue(worstY < 0.035, "vapour within 0.035 of Rieder and Thompson's: " + worstY);
            int stats = SolventRecoveryWorkbookBuilder.LAB_FIRST + rows.size() + 2;
            assertEquals(worstT, value(lab, SolventRecoveryWorkbookBuilder.LAB_DT, stats + 2), 1e-12, "largest ΔT");
            assertEquals(worstY, value(lab, SolventRecoveryWorkbookBuilder.LAB_DY, stats + 2), 1e-12, "largest Δy");
            // the fit of the data block: MIX.FITVLE's Wilson parameters are the core's fit of the same points
            double[] xs = new double[rows.size()];
            double[] ys = new double[rows.size()];
            double[] ts = new double[rows.size()];
            double[] ps = new double[rows.size()];
            for (int i = 0; i < rows.size(); i++) {
                int r = SolventRecoveryWorkbookBuilder.LAB_FIRST + i;
                xs[i] = value(lab, SolventRecoveryWorkbookBuilder.LAB_X, r);
                ys[i] = value(lab, SolventRecoveryWorkbookBuilder.LAB_Y, r);
                ts[i] = value(lab, SolventRecoveryWorkbookBuilder.LAB_T, r);
                ps[i] = value(lab, SolventRecoveryWorkbookBuilder.LAB_P, r);
            }
            Object[][] core = FitFunctions.vle(wilson, 0, 1, xs, ys, ts, ps, VleFitter.Model.WILSON, -1, 0,
                    Double.NaN, FitFunctions.DEFAULT_NRTL_ALPHA, null, FitOutput.COEFFICIENTS);
            int k = SolventRecoveryWorkbookBuilder.FIT_FIRST_COL;
            for (int j = 0; j < 2; j++) {
                assertClose((Double) core[0][j], value(lab, k + 1 + j, SolventRecoveryWorkbookBuilder.FIT_PARAMETERS_ROW),
                        "fitted Δλ/R " + (j + 1));
            }
            Card fitted = CardReader.read(namedRange(doc, SolventRecoveryWorkbookBuilder.FITTED));
            assertEquals("OK", text(sheet(doc, "Fitted card").getCellByPosition(1, 4)), "MIX.CHECK of card fitted");
            double fx = value(lab, k + 1, SolventRecoveryWorkbookBuilder.FIT_AZ_X_ROW);
            double ft = value(lab, k + 1, SolventRecoveryWorkbookBuilder.FIT_AZ_T_ROW);
            assertClose(PhaseFunctions.azeotrope(fitted, 101.325, false, e), fx, "fitted card's azeotrope");
            // Evans (1916) as cited: 0.8947 and 78.17 °C; a fit to a 1 atm isobar must land near it
            assertEquals(SolventRecoveryWorkbookBuilder.PUBLISHED_AZEOTROPE_X, fx, 0.02, "fitted azeotrope x1");
            assertEquals(SolventRecoveryWorkbookBuilder.PUBLISHED_AZEOTROPE_C, ft, 0.2, "fitted azeotrope T");
            Object[][] consistency = FitFunctions.vle(wilson, 0, 1, xs, ys, ts, ps, VleFitter.Model.WILSON, -1, 0,
                    Double.NaN, FitFunctions.DEFAULT_NRTL_ALPHA, null, FitOutput.CONSISTENCY);
            for (int r = 0; r < consistency.length; r++) {
                XCell cell = lab.getCellByPosition(k + 4, SolventRecoveryWorkbookBuilder.FIT_TABLES_ROW + r);
                if (consistency[r][1] instanceof Double) {
                    assertClose((Double) consistency[r][1], cell.getValue(), "consistency row " + (r + 1));
                } else {
                    assertEquals(consistency[r][1], text(cell), "consistency row " + (r + 1));
                }
            }

            Object charts = UnoRuntime.queryInterface(XTableChartsSupplier.class, s).getCharts();
            assertTrue(UnoRuntime.queryInterface(XNameAccess.class, charts).hasByName(
                    SolventRecoveryWorkbookBuilder.CHART_NAME), "the T-x-y chart is on sheet Recovery");
            for (String name : new String[] {"Recovery", "Lab VLE", "Diagram data", "Wilson card", "RK card",
                "Fitted card"}) {
                XCellRangesQuery q = UnoRuntime.queryInterface(XCellRangesQuery.class, sheet(doc, name));
                assertFalse(q.queryFormulaCells(FormulaResult.ERROR).getCells().createEnumeration().hasMoreElements(),
                        "no cell of sheet " + name + " shows an error");
            }
        } finally {
            close(doc);
        }
    }

    /**
     * The sanitiser workbook: its mole fractions are MIX.CONVERT's on the OIML card (and within 0.001 of the
     * conversion of the published list's strengths with CRC densities at 20 °C that FlashPointTest quotes, itself
     * good to about 0.1 % w/w), its flash points the core's FlashPoints.flashPoint on the VLE card, the card's within 3 K of the
     * published list (Wikipedia "Ethanol" as quoted on DCHAS-L; method not stated, a rough check) and closer to it
     * than the ideal solution; the comparison with the limits follows the limits; the freezing points are the
     * core's MIX.FREEZINGPOINT on the same card (its accuracy against CRC is FreezingPointTest's); the trace re-derives the flash point; MIX.FLASHMINIMUM's refusal is the core's.
     */
    @Test
    void sanitiserStrengthIsTheCoreLibrarysFlashPointsAndMeetsThePublishedList(Office office) throws Exception {
        XComponent doc = open(office, SanitiserStrengthWorkbookBuilder.FILE);
        try {
            Card vle = sheetCard(doc, SanitiserStrengthWorkbookBuilder.VLE, SanitiserStrengthWorkbookBuilder.VLE_CARD,
                    "VLE card");
            Card oiml = CardReader.read(namedRange(doc, SanitiserStrengthWorkbookBuilder.OIML));
            assertEquals("OK", text(sheet(doc, "OIML card").getCellByPosition(1, 3)), "MIX.CHECK of card oiml");
            Extrapolation allow = Extrapolation.ALLOW;
            XSpreadsheet s = sheet(doc, "Strengths");
            // the published list's strengths as mole fractions, converted with CRC densities at 20 °C (FlashPointTest)
            double[] listedX = {0.0330, 0.0703, 0.1132, 0.1634, 0.2237, 0.2983, 0.3935, 0.5200, 0.7004, 0.8567};
            double limit1 = value(s, SanitiserStrengthWorkbookBuilder.LIMIT_COL, SanitiserStrengthWorkbookBuilder.LIMIT_1_ROW);
            double limit2 = value(s, SanitiserStrengthWorkbookBuilder.LIMIT_COL, SanitiserStrengthWorkbookBuilder.LIMIT_2_ROW);
            assertEquals(SanitiserStrengthWorkbookBuilder.LIMIT_1, limit1, 0.0, "example limit 1");
            assertEquals(SanitiserStrengthWorkbookBuilder.LIMIT_2, limit2, 0.0, "example limit 2");
            double worstCard = 0;
            double worstIdeal = 0;
            for (int i = 0; i < SanitiserStrengthWorkbookBuilder.ROWS; i++) {
                int r = SanitiserStrengthWorkbookBuilder.TABLE_FIRST + i;
                double strength = value(s, SanitiserStrengthWorkbookBuilder.STRENGTH, r);
                assertEquals(SanitiserStrengthWorkbookBuilder.STRENGTHS[i], strength, 0.0, "strength " + i);
                double x1 = value(s, SanitiserStrengthWorkbookBuilder.X1, r);
                assertClose(SanitiserStrengthWorkbookBuilder.moleFraction(oiml, strength), x1, "x1 at " + strength);
                assertEquals(listedX[i], x1, 1e-3, "x1 against the CRC-density conversion at " + strength + " % vol");
                double[] z = {x1, 1 - x1};
                double card = value(s, SanitiserStrengthWorkbookBuilder.FP_CARD, r);
                double ideal = value(s, SanitiserStrengthWorkbookBuilder.FP_IDEAL, r);
                assertClose(FlashPoints.flashPoint(vle, z, false, allow), card, "flash point at " + strength);
                assertClose(FlashPoints.flashPoint(vle, z, true, allow), ideal, "ideal flash point at " + strength);
                assertTrue(card < ideal, "γ > 1 lowers the flash point at " + strength + " % vol");
                double published = value(s, SanitiserStrengthWorkbookBuilder.FP_PUBLISHED, r);
                assertEquals(SanitiserStrengthWorkbookBuilder.PUBLISHED[i], published, 0.0, "published " + strength);
                assertEquals(card - published, value(s, SanitiserStrengthWorkbookBuilder.DEVIATION, r), 1e-12,
                        "deviation at " + strength);
                worstCard = Math.max(worstCard, Math.abs(card - published));
                worstIdeal = Math.max(worstIdeal, Math.abs(ideal - published));
                assertEquals(card < 30 ? "extrapolated (< 30 °C)" : "inside 30–100 °C",
                        text(s.getCellByPosition(SanitiserStrengthWorkbookBuilder.RANGE, r)), "range at " + strength);
                String verdict = card < limit1 ? "below limit 1" : card < limit2 ? "from limit 1 to below limit 2"
                        : "at or above limit 2";
                assertEquals(verdict, text(s.getCellByPosition(SanitiserStrengthWorkbookBuilder.VERDICT, r)),
                        "against the limits at " + strength);
                if (strength <= SanitiserStrengthWorkbookBuilder.FREEZING_UP_TO) {
                    assertClose(org.miscela.core.functions.PhaseFunctions.freezingPoint(vle, -1, new double[] {x1,
                        1 - x1}, org.miscela.core.functions.PhaseFunctions.Activity.CARD, allow),
                            value(s, SanitiserStrengthWorkbookBuilder.FREEZING, r), "freezing point at " + strength);
                } else {
                    assertEquals("not estimated above " + SanitiserStrengthWorkbookBuilder.FREEZING_UP_TO + " % vol",
                            text(s.getCellByPosition(SanitiserStrengthWorkbookBuilder.FREEZING, r)));
                }
            }
            // the published list: Wikipedia "Ethanol" as quoted on DCHAS-L, method not stated: a rough check
            assertTrue(worstCard < 3.0, "card within 3 K of the published list: " + worstCard);
            assertTrue(worstIdeal > 10.0 && worstCard < worstIdeal, "the ideal solution is far off: " + worstIdeal);
            // pure ethanol flashes at the card's 13 °C (NFPA 497)
            assertEquals(13.0, FlashPoints.flashPoint(vle, new double[] {1, 0}, false, allow), 1e-8);

            // MIX.FLASHMINIMUM's refusal in the core's words
            MiscelaException none = assertThrows(MiscelaException.class,
                    () -> FlashPoints.minimum(vle, true, false, allow));
            assertEquals(org.miscela.core.problem.Problem.NO_FLASH_MINIMUM, none.problem());
            String words = text(s.getCellByPosition(0, SanitiserStrengthWorkbookBuilder.MINIMUM_ROW + 1));
            assertTrue(words.contains(none.getMessage()), "the refusal in the core's words: " + words);

            // the trace: the core's rows, its flash point the sheet's, the sum 1
            XSpreadsheet t = sheet(doc, "Trace");
            double x = value(t, 1, SanitiserStrengthWorkbookBuilder.TRACE_X_ROW);
            assertClose(SanitiserStrengthWorkbookBuilder.moleFraction(oiml,
                    value(t, 1, SanitiserStrengthWorkbookBuilder.TRACE_STRENGTH_ROW)), x, "trace x1");
            double fp = value(t, 1, SanitiserStrengthWorkbookBuilder.TRACE_T_ROW);
            assertClose(FlashPoints.flashPoint(vle, new double[] {x, 1 - x}, false, allow), fp, "trace flash point");
            Object[][] core = CardFunctions.trace(vle, new double[] {x, 1 - x}, fp, PropertyKind.FLASH, allow);
            int top = SanitiserStrengthWorkbookBuilder.TRACE_TOP;
            boolean sum = false;
            boolean blend = false;
            for (int r = 0; r < core.length; r++) {
                XCell label = t.getCellByPosition(0, top + r);
                assertEquals(core[r][0], text(label), "trace label " + (r + 1));
                XCell cell = t.getCellByPosition(1, top + r);
                if (core[r][1] instanceof Double) {
                    assertClose((Double) core[r][1], cell.getValue(), "trace row " + core[r][0]);
                    if (((String) core[r][0]).startsWith("Le Chatelier sum")) {
                        assertEquals(1.0, cell.getValue(), 1e-9, "Le Chatelier's sum at the flash point");
                        sum = true;
                    }
                    if (((String) core[r][0]).startsWith("flash point of the blend")) {
                        assertClose(fp, cell.getValue(), "the trace's flash point");
                        blend = true;
                    }
                }
            }
            assertTrue(sum && blend, "the trace has the sum and the blend's flash point");

            Object charts = UnoRuntime.queryInterface(XTableChartsSupplier.class, s).getCharts();
            assertTrue(UnoRuntime.queryInterface(XNameAccess.class, charts).hasByName(
                    SanitiserStrengthWorkbookBuilder.CHART_NAME), "the flash point chart is on sheet Strengths");
            for (String name : new String[] {"Strengths", "Trace", "Chart data", "VLE card", "OIML card"}) {
                XCellRangesQuery q = UnoRuntime.queryInterface(XCellRangesQuery.class, sheet(doc, name));
                assertFalse(q.queryFormulaCells(FormulaResult.ERROR).getCells().createEnumeration().hasMoreElements(),
                        "no cell of sheet " + name + " shows an error");
            }
        } finally {
            close(doc);
        }
    }

    /** A card named on a sheet: the test resource, cell by cell (ODF keeps 15 digits), MIX.CHECK "OK", read. */
    private static Card sheetCard(XComponent doc, String name, String resource, String sheetName) throws Exception {
        Object[][] sheetCard = namedRange(doc, name);
        Object[][] cells = TestCards.cells(resource);
        assertEquals(cells.length, sheetCard.length, "rows of card " + name);
        for (int r = 0; r < cells.length; r++) {
            for (int c = 0; c < sheetCard[r].length; c++) {
                Object want = c < cells[r].length ? cells[r][c] : "";
                Object got = sheetCard[r][c];
                if (want instanceof Double) {
                    assertEquals((Double) want, (Double) got, 1e-14 * Math.abs((Double) want),
                            name + " cell " + (r + 1) + "/" + (c + 1));
                } else {
                    assertEquals(want, got, name + " cell " + (r + 1) + "/" + (c + 1));
                }
            }
        }
        assertEquals("OK", text(sheet(doc, sheetName).getCellByPosition(1, 4)), "MIX.CHECK of card " + name);
        Card card = CardReader.read(sheetCard);
        assertEquals("ethanol", card.components().get(0).name());
        assertEquals("water", card.components().get(1).name());
        return card;
    }

    private static double path(Card card, int[] order, double[] amounts, double[] feeds,
            TemperaturePath.Output output, int steps, double vessel, double removed, double limit) {
        return (Double) CardFunctions.temperaturePath(card, order, amounts, AmountBasis.KG, feeds,
                Extrapolation.ALLOW, output, steps, vessel, removed, false, limit);
    }

    static XComponent open(Office office, String file) throws Exception {
        Path wb = ExampleWorkbooks.repoRoot().resolve("examples").resolve(file);
        XComponent doc = office.load(office.stage(wb));
        recalculate(doc);
        return doc;
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

    static Object[][] namedRange(XComponent doc, String name) throws Exception {
        return UnoRuntime.queryInterface(XCellRangeData.class, namedCells(doc, name)).getDataArray();
    }

    static com.sun.star.table.XCellRange namedCells(XComponent doc, String name) throws Exception {
        XPropertySet dp = UnoRuntime.queryInterface(XPropertySet.class, doc);
        Object range = UnoRuntime.queryInterface(XNameAccess.class, dp.getPropertyValue("NamedRanges"))
                .getByName(name);
        return UnoRuntime.queryInterface(XCellRangeReferrer.class, range).getReferredCells();
    }

    static XSpreadsheet sheet(XComponent doc, String name) throws Exception {
        return UnoRuntime.queryInterface(XSpreadsheet.class,
                UnoRuntime.queryInterface(XSpreadsheetDocument.class, doc).getSheets().getByName(name));
    }

    /** A formula cell's numeric result, failing on an error result. */
    static double value(XSpreadsheet s, int c, int r) throws Exception {
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

    static void assertClose(double expected, double actual, String what) {
        assertEquals(expected, actual, RELATIVE * Math.max(1.0, Math.abs(expected)), what);
    }

    static String text(XCell c) {
        return UnoRuntime.queryInterface(XText.class, c).getString();
    }

    static void recalculate(XComponent doc) {
        UnoRuntime.queryInterface(XCalculatable.class, doc).calculateAll();
    }

    static void close(XComponent doc) {
        try {
            UnoRuntime.queryInterface(XCloseable.class, doc).close(true);
        } catch (Exception e) {
            doc.dispose();
        }
    }
}
