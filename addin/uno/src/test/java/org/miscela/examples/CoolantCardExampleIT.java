package org.miscela.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.miscela.examples.ExampleWorkbookBuilder.CARD_CHECK_ROW;
import static org.miscela.examples.ExampleWorkbookBuilder.CARD_TOP;
import static org.miscela.examples.ExampleWorkbookBuilder.TABLE_COL;
import static org.miscela.examples.ExampleWorkbookBuilder.TABLE_FIRST;
import static org.miscela.examples.ExampleWorkbookBuilder.TABLE_ROWS;
import static org.miscela.examples.ExamplesIT.assertClose;
import static org.miscela.examples.ExamplesIT.close;
import static org.miscela.examples.ExamplesIT.namedRange;
import static org.miscela.examples.ExamplesIT.open;
import static org.miscela.examples.ExamplesIT.recalculate;
import static org.miscela.examples.ExamplesIT.sheet;
import static org.miscela.examples.ExamplesIT.text;
import static org.miscela.examples.ExamplesIT.value;

import com.sun.star.beans.XPropertySet;
import com.sun.star.container.XNameAccess;
import com.sun.star.lang.XComponent;
import com.sun.star.sheet.XArrayFormulaRange;
import com.sun.star.sheet.XCellRangeReferrer;
import com.sun.star.sheet.XSpreadsheet;
import com.sun.star.table.XCell;
import com.sun.star.table.XCellRange;
import com.sun.star.table.XTableChartsSupplier;
import com.sun.star.uno.UnoRuntime;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.miscela.core.blend.BlendFunctions;
import org.miscela.core.blend.CompositionBasis;
import org.miscela.core.card.Card;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.functions.CardFunctions;
import org.miscela.core.library.CardLibrary;
import org.miscela.it.Office;
import org.miscela.it.OfficeParameterResolver;

/**
 * examples/coolant-blend.ods: its card is the library's ethylene glycol + water card placed by MIX.LIBRARYCARD, and
 * every number on sheet Blend is the core library's, computed here in the JVM from
 * {@code CardLibrary.find("ethylene glycol").card()} and the inputs read off the sheet; a few identities are checked
 * besides (the volumes poured are the blend plus its contraction, 40 %vol of 2,000 L at 20 °C draws 800 L of glycol
 * at 20 °C, the recipe's masses make the volume ordered). The card answers at 20 °C only, and the sheet shows it:
 * moved to 25 °C or above 60 % w/w, the results become Err:502 and the point check says why.
 */
@ExtendWith(OfficeParameterResolver.class)
class CoolantCardExampleIT {
    private static final Extrapolation E = Extrapolation.AS_CARD;

    private static CardLibrary.Entry entry() {
        return CardLibrary.find(ExampleWorkbookBuilder.LIBRARY_NAME);
    }

    @Test
    void cardIsTheLibrarysEthyleneGlycolCardPlacedByItsFormula(Office office) throws Exception {
        XComponent doc = open(office, ExampleWorkbookBuilder.FILE);
        try {
            Object[][] want = entry().cells();
            Object[][] got = namedRange(doc, "card");
            assertEquals(want.length, got.length, "rows of the named range");
            for (int r = 0; r < want.length; r++) {
                assertEquals(want[r].length, got[r].length, "columns of the named range, row " + (r + 1));
                for (int c = 0; c < want[r].length; c++) {
                    assertEquals(want[r][c], got[r][c], "card cell " + (r + 1) + "/" + (c + 1));
                }
            }
            assertTrue(String.valueOf(want[2][1]).contains("Ethylene glycol"), "the title names the glycol");
            assertTrue(String.valueOf(want[3][0]).equals("source") && String.valueOf(want[3][1]).contains("CRC"),
                    "the card's source row names the CRC Handbook");

            // the named range is exactly the array of one MIX.LIBRARYCARD formula
            XPropertySet dp = UnoRuntime.queryInterface(XPropertySet.class, doc);
            Object named = UnoRuntime.queryInterface(XNameAccess.class, dp.getPropertyValue("NamedRanges"))
                    .getByName("card");
            XCellRange range = UnoRuntime.queryInterface(XCellRangeReferrer.class, named).getReferredCells();
            String formula = UnoRuntime.queryInterface(XArrayFormulaRange.class, range).getArrayFormula()
                    .toUpperCase(Locale.ROOT);
            assertTrue(formula.contains("LIBRARYCARD(\"ETHYLENE GLYCOL\")"), "the card's array formula: " + formula);
            XSpreadsheet cardSheet = sheet(doc, "Card");
            XCell first = cardSheet.getCellByPosition(0, CARD_TOP);
            assertEquals(formula, UnoRuntime.queryInterface(XArrayFormulaRange.class,
                    cardSheet.getCellRangeByName("A" + (CARD_TOP + 1) + ":" + ExampleWorkbooks.col(want[0].length - 1)
                            + (CARD_TOP + want.length))).getArrayFormula().toUpperCase(Locale.ROOT),
                    "the array covers the named range from " + text(first));

            assertEquals(CardFunctions.OK, text(cardSheet.getCellByPosition(1, CARD_CHECK_ROW)), "MIX.CHECK");
            int below = ExampleWorkbookBuilder.accuracyRow();
            assertEquals(entry().accuracy(), text(cardSheet.getCellByPosition(1, below)), "stated accuracy");
            assertEquals(entry().check(), text(cardSheet.getCellByPosition(1, below + 1)), "outside check");
        } finally {
            close(doc);
        }
    }

    @Test
    void blendSheetIsTheCoreLibrarysNumbersAt20C(Office office) throws Exception {
        XComponent doc = open(office, ExampleWorkbookBuilder.FILE);
        try {
            Card card = entry().card();
            XSpreadsheet s = sheet(doc, "Blend");
            double t = value(s, 1, ExampleWorkbookBuilder.TEMPERATURE_ROW);
            assertEquals(20.0, t, 0.0, "the shipped sheet works at 20 °C, the card's temperature");
            assertEquals(CardFunctions.OK, text(s.getCellByPosition(1, ExampleWorkbookBuilder.POINT_CHECK_ROW)),
                    "MIX.CHECKPOINT at the input point");

            // results at the input point, the composition given in % w/w
            double strength = value(s, 1, ExampleWorkbookBuilder.STRENGTH_ROW);
            CompositionBasis percent = BlendFunctions.basis(card, "%w/w", Double.NaN, BlendFunctions.DEFAULT_BALANCE);
            CompositionBasis pv = BlendFunctions.basis(card, "%vol", 20.0, BlendFunctions.DEFAULT_BALANCE);
            double[] x = BlendFunctions.convert(card, BlendFunctions.binary(card, strength, percent), percent,
                    CompositionBasis.moleFraction(), E);
            double m1 = card.components().get(0).molarMass();
            double m2 = card.components().get(1).molarMass();
            double w = strength / 100;
            assertEquals((w / m1) / (w / m1 + (1 - w) / m2), x[0], 1e-14, "x1 by the definition of a mass fraction");
            assertClose(x[0], value(s, 1, ExampleWorkbookBuilder.MOLE_FRACTION_ROW), "MIX.CONVERT to x");
            assertClose(BlendFunctions.convert(card, x, CompositionBasis.moleFraction(), pv, E)[0],
                    value(s, 1, ExampleWorkbookBuilder.STRENGTH_VOL_ROW), "MIX.CONVERT to %vol");
            double excess = CardFunctions.excessMolarVolume(card, x, t, E);
            assertTrue(excess < 0, "glycol and water contract on mixing on this card: " + excess);
            assertClose(excess, value(s, 1, ExampleWorkbookBuilder.EXCESS_ROW), "MIX.EXCESSVOLUME");
            int[] partialRows = {ExampleWorkbookBuilder.PARTIAL_GLYCOL_ROW, ExampleWorkbookBuilder.PARTIAL_WATER_ROW};
            int[] partialExcessRows = {ExampleWorkbookBuilder.PARTIAL_EXCESS_GLYCOL_ROW,
                ExampleWorkbookBuilder.PARTIAL_EXCESS_WATER_ROW};
            int[] pureRows = {ExampleWorkbookBuilder.PURE_GLYCOL_ROW, ExampleWorkbookBuilder.PURE_WATER_ROW};
            for (int k = 0; k < 2; k++) {
                assertClose(CardFunctions.partialMolarVolume(card, k, x, t, E), value(s, 1, partialRows[k]),
                        "MIX.PARTIALVOLUME " + (k + 1));
                assertClose(CardFunctions.partialExcessMolarVolume(card, k, x, t, E),
                        value(s, 1, partialExcessRows[k]), "MIX.PARTIALEXCESS " + (k + 1));
                assertClose(CardFunctions.pureDensity(card, k, t, E), value(s, 1, pureRows[k]),
                        "MIX.PUREDENSITY " + (k + 1));
            }
            double vm = CardFunctions.molarVolume(card, x, t, E);
            assertClose(vm, value(s, 1, ExampleWorkbookBuilder.MOLAR_VOLUME_ROW), "MIX.MOLARVOLUME");
            assertClose(CardFunctions.density(card, x, t, E), value(s, 1, ExampleWorkbookBuilder.DENSITY_ROW),
                    "MIX.DENSITY");
            assertClose(excess / (vm - excess), value(s, 1, ExampleWorkbookBuilder.CHANGE_ROW), "Vᴱ / ideal volume");

            // equal volumes poured at 20 °C
            double[] poured = {value(s, 1, ExampleWorkbookBuilder.MAKEUP_GLYCOL_ROW),
                value(s, 1, ExampleWorkbookBuilder.MAKEUP_WATER_ROW)};
            assertEquals(poured[0], poured[1], 0.0, "the shipped make-up pours equal volumes");
            double[] at = {t, t};
            double volume = BlendFunctions.batch(card, poured, "L", at, t, "volume", "L", E);
            double contraction = BlendFunctions.batch(card, poured, "L", at, t, "contraction", "L", E);
            assertClose(volume, value(s, 1, ExampleWorkbookBuilder.MAKEUP_VOLUME_ROW), "MIX.BATCH volume");
            assertClose(contraction, value(s, 1, ExampleWorkbookBuilder.MAKEUP_CONTRACTION_ROW),
                    "MIX.BATCH contraction");
            assertTrue(contraction > 0, "the blend is smaller than the volumes poured: " + contraction);
            assertEquals(poured[0] + poured[1], volume + contraction, 1e-9 * volume,
                    "volumes poured = blend + contraction");
            assertClose(BlendFunctions.batch(card, poured, "L", at, t, "contraction %", null, E),
                    value(s, 1, ExampleWorkbookBuilder.MAKEUP_CONTRACTION_PERCENT_ROW), "MIX.BATCH contraction %");
            double phi = poured[0] / (poured[0] + poured[1]);
            CompositionBasis volumeFraction = CompositionBasis.volumeFraction(t);
            double massPercent = BlendFunctions.convert(card, new double[] {phi, 1 - phi}, volumeFraction, percent,
                    E)[0];
            assertClose(massPercent, value(s, 1, ExampleWorkbookBuilder.MAKEUP_MASS_PERCENT_ROW),
                    "MIX.CONVERT volume fraction to % w/w");
            double rho1 = CardFunctions.pureDensity(card, 0, t, E);
            double rho2 = CardFunctions.pureDensity(card, 1, t, E);
            assertEquals(100 * rho1 / (rho1 + rho2), massPercent, 1e-9,
                    "equal volumes: % w/w from the pure densities");
            double makeUpVol = BlendFunctions.convert(card, new double[] {phi, 1 - phi}, volumeFraction,
                    BlendFunctions.basis(card, "%vol", t, BlendFunctions.DEFAULT_BALANCE), E)[0];
            assertClose(makeUpVol, value(s, 1, ExampleWorkbookBuilder.MAKEUP_STRENGTH_ROW), "MIX.CONVERT to %vol");
            assertEquals(100 * poured[0] / volume, makeUpVol, 1e-9, "%vol: glycol poured per volume of blend");

            // a tank of 40 %vol at 20 °C
            double litres = value(s, 1, ExampleWorkbookBuilder.TANK_VOLUME_ROW);
            double ordered = value(s, 1, ExampleWorkbookBuilder.TANK_STRENGTH_ROW);
            double[] target = BlendFunctions.binary(card, ordered, pv);
            double[] kg = BlendFunctions.recipe(card, litres, "L", t, target, pv, null, "kg", E);
            double[] drawn = BlendFunctions.recipe(card, litres, "L", t, target, pv, at, "L", E);
            for (int k = 0; k < 2; k++) {
                assertClose(kg[k], value(s, 1, ExampleWorkbookBuilder.RECIPE_KG_ROW + k), "MIX.RECIPE kg " + (k + 1));
                assertClose(drawn[k], value(s, 1, ExampleWorkbookBuilder.RECIPE_L_ROW + k), "MIX.RECIPE L " + (k + 1));
            }
            assertEquals(litres * ordered / 100, drawn[0], 1e-9 * litres,
                    "at 20 °C, 40 %vol of the blend is the glycol's own volume");
            double recipeContraction = value(s, 1, ExampleWorkbookBuilder.RECIPE_CONTRACTION_ROW);
            assertClose(BlendFunctions.batch(card, kg, "kg", null, t, "contraction", "L", E), recipeContraction,
                    "MIX.BATCH contraction of the recipe");
            assertEquals(drawn[0] + drawn[1] - litres, recipeContraction, 1e-9 * litres,
                    "volumes drawn = blend + contraction");
            double made = value(s, 1, ExampleWorkbookBuilder.RECIPE_VOLUME_CHECK_ROW);
            assertEquals(litres, made, 1e-9 * litres, "the recipe's masses make the volume ordered");
            double working = value(s, 1, ExampleWorkbookBuilder.WORKING_VOLUME_ROW);
            assertEquals(working - made, value(s, 1, ExampleWorkbookBuilder.ROOM_ROW), 1e-9 * working, "room left");
            assertTrue(made < working, "the shipped recipe fits the tank's working volume");

            // density check
            double reading = value(s, 1, ExampleWorkbookBuilder.READING_ROW);
            double found = BlendFunctions.fromDensity(card, reading, t, 0, null, Double.NaN, Double.NaN, pv, E);
            assertClose(found, value(s, 1, ExampleWorkbookBuilder.READ_STRENGTH_ROW), "MIX.FROMDENSITY %vol");
            assertClose(BlendFunctions.fromDensity(card, reading, t, 0, null, Double.NaN, Double.NaN, percent, E),
                    value(s, 1, ExampleWorkbookBuilder.READ_MASS_PERCENT_ROW), "MIX.FROMDENSITY % w/w");
            assertEquals(reading, CardFunctions.density(card, BlendFunctions.convert(card,
                    BlendFunctions.binary(card, found, pv), pv, CompositionBasis.moleFraction(), E), t, E), 1e-6,
                    "the strength found gives the reading back");
            double expected = CardFunctions.density(card, BlendFunctions.convert(card, target, pv,
                    CompositionBasis.moleFraction(), E), t, E);
            assertClose(expected, value(s, 1, ExampleWorkbookBuilder.EXPECTED_DENSITY_ROW), "density of 40 %vol");
            assertEquals(reading - expected, value(s, 1, ExampleWorkbookBuilder.READING_GAP_ROW), 1e-9,
                    "reading minus expected");

            // the table across the card's range
            for (int i = 0; i < TABLE_ROWS; i++) {
                int r = TABLE_FIRST + i;
                double wi = value(s, TABLE_COL, r) / 100;
                assertTrue(wi >= 0 && wi < 0.6, "the table stays inside the card's 60 % w/w: " + wi);
                double xi = value(s, ExampleWorkbookBuilder.TABLE_X, r);
                assertEquals((wi / m1) / (wi / m1 + (1 - wi) / m2), xi, 1e-15, "x1, table row " + (r + 1));
                double[] xs = {xi, 1 - xi};
                String row = ", table row " + (r + 1);
                assertClose(CardFunctions.partialMolarVolume(card, 0, xs, t, E),
                        value(s, ExampleWorkbookBuilder.TABLE_PARTIAL_GLYCOL, r), "V̄ glycol" + row);
                assertClose(CardFunctions.partialMolarVolume(card, 1, xs, t, E),
                        value(s, ExampleWorkbookBuilder.TABLE_PARTIAL_WATER, r), "V̄ water" + row);
                assertClose(CardFunctions.excessMolarVolume(card, xs, t, E),
                        value(s, ExampleWorkbookBuilder.TABLE_EXCESS, r), "Vᴱ" + row);
                assertClose(CardFunctions.partialExcessMolarVolume(card, 0, xs, t, E),
                        value(s, ExampleWorkbookBuilder.TABLE_PARTIAL_EXCESS_GLYCOL, r), "V̄ᴱ glycol" + row);
                assertClose(CardFunctions.partialExcessMolarVolume(card, 1, xs, t, E),
                        value(s, ExampleWorkbookBuilder.TABLE_PARTIAL_EXCESS_WATER, r), "V̄ᴱ water" + row);
                assertClose(CardFunctions.molarVolume(card, xs, t, E),
                        value(s, ExampleWorkbookBuilder.TABLE_MOLAR_VOLUME, r), "Vm" + row);
                assertClose(CardFunctions.density(card, xs, t, E),
                        value(s, ExampleWorkbookBuilder.TABLE_DENSITY, r), "ρ" + row);
            }
            Object charts = UnoRuntime.queryInterface(XTableChartsSupplier.class, s).getCharts();
            XNameAccess names = UnoRuntime.queryInterface(XNameAccess.class, charts);
            assertTrue(names.hasByName("partial-volumes") && names.hasByName("excess-volumes"), "both charts");
        } finally {
            close(doc);
        }
    }

    @Test
    void theSheetRefusesOutsideTheCardsRange(Office office) throws Exception {
        XComponent doc = open(office, ExampleWorkbookBuilder.FILE);
        try {
            Card card = entry().card();
            XSpreadsheet s = sheet(doc, "Blend");
            XCell temperature = s.getCellByPosition(1, ExampleWorkbookBuilder.TEMPERATURE_ROW);
            XCell strength = s.getCellByPosition(1, ExampleWorkbookBuilder.STRENGTH_ROW);
            XCell density = s.getCellByPosition(1, ExampleWorkbookBuilder.DENSITY_ROW);
            XCell check = s.getCellByPosition(1, ExampleWorkbookBuilder.POINT_CHECK_ROW);
            CompositionBasis percent = BlendFunctions.basis(card, "%w/w", Double.NaN, BlendFunctions.DEFAULT_BALANCE);
            double[] x = BlendFunctions.convert(card, BlendFunctions.binary(card, strength.getValue(), percent),
                    percent, CompositionBasis.moleFraction(), E);

            // 25 °C is outside 19.5..20.5 °C: refused, and the point check gives the core's words
            temperature.setValue(25.0);
            recalculate(doc);
            assertEquals(502, density.getError(), "MIX.DENSITY at 25 °C");
            assertEquals(502, s.getCellByPosition(ExampleWorkbookBuilder.TABLE_DENSITY, TABLE_FIRST).getError(),
                    "the table at 25 °C");
            String words = CardFunctions.check(card, x, 25.0, E);
            assertNotEquals(CardFunctions.OK, words);
            assertTrue(words.contains("outside"), words);
            assertEquals(words, text(check), "MIX.CHECKPOINT at 25 °C");

            // inside the tolerance near 20 °C the card answers, with Tanaka's water at that temperature
            temperature.setValue(20.4);
            recalculate(doc);
            assertEquals(0, density.getError(), "MIX.DENSITY at 20.4 °C");
            assertClose(CardFunctions.density(card, x, 20.4, E), density.getValue(), "MIX.DENSITY at 20.4 °C");

            // more glycol than the card's 60 % w/w: refused
            temperature.setValue(20.0);
            strength.setValue(65.0);
            recalculate(doc);
            assertEquals(502, density.getError(), "MIX.DENSITY at 65 % w/w");
            assertTrue(text(check).contains("outside"), text(check));
            assertFalse(CardFunctions.isInside(card, BlendFunctions.convert(card, BlendFunctions.binary(card, 65.0,
                    percent), percent, CompositionBasis.moleFraction(), Extrapolation.ALLOW), 20.0),
                    "65 % w/w is outside the card");
        } finally {
            close(doc);
        }
    }
}
