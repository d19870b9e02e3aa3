package org.miscela.calc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.sun.star.lang.IllegalArgumentException;
import com.sun.star.uno.Any;
import org.junit.jupiter.api.Test;
import org.miscela.core.catalog.FunctionCatalog;
import org.miscela.core.functions.CardFunctions;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.card.TestCards;
import org.miscela.core.problem.Catalogue;

/** The UNO adapter in a plain JVM: argument decoding, array results, blanks and error mapping. */
class MixtureAddInTest {
    private static final Object[][] CARD = TestCards.cells("ethanol-water-oiml.tsv");
    private final MixtureAddIn addIn = new MixtureAddIn();

    private static Object[][] one(Object v) {
        return new Object[][] {{v}};
    }

    @Test
    void scalarArgumentsGiveOneNumber() throws Exception {
        Object r = addIn.mixtureDensity(CARD, one(0.3), one(20.0), Any.VOID, Any.VOID, Any.VOID);
        double expected = CardFunctions.density(TestCards.card("ethanol-water-oiml.tsv"), 0.3, 20,
                Extrapolation.AS_CARD);
        assertEquals(expected, (Double) r, 0.0);
    }

    /**
     * A library card placed by MIX.LIBRARYCARD is an ordinary card: MIX.DENSITY of 30 % w/w ethanol at 20 °C on the
     * OIML R 22 card is the standard's 953.78 kg/m³ (its Table I, 953.784 by its formula); the same block with its
     * last column or row cut off, as a too small array block leaves it, is refused instead of read short.
     */
    @Test
    void aPlacedLibraryCardIsACardAndACutOneIsRefused() throws Exception {
        Object[][] oiml = (Object[][]) ((Any) addIn.libraryCard(one("ethanol + water (OIML R 22)"))).getObject();
        Object r = addIn.mixtureDensity(oiml, one(30.0), one(20.0), Any.VOID, "%w/w", Any.VOID);
        assertEquals(953.784, (Double) r, 0.0005);
        Object[][] narrower = new Object[oiml.length][];
        for (int i = 0; i < oiml.length; i++) {
            narrower[i] = java.util.Arrays.copyOf(oiml[i], oiml[i].length - 1);
        }
        com.sun.star.lang.IllegalArgumentException e = assertThrows(com.sun.star.lang.IllegalArgumentException.class,
                () -> addIn.mixtureDensity(narrower, one(30.0), one(20.0), Any.VOID, "%w/w", Any.VOID));
        assertTrue(e.getMessage().contains("cuts a card short"), e.getMessage());
        Object[][] shorter = java.util.Arrays.copyOf(oiml, oiml.length - 1);
        assertThrows(com.sun.star.lang.IllegalArgumentException.class,
                () -> addIn.mixtureDensity(shorter, one(30.0), one(20.0), Any.VOID, "%w/w", Any.VOID));
        Object[][] list = (Object[][]) ((Any) addIn.libraryList(" CHLORIDE ")).getObject();
        assertEquals("name", list[0][0]);
        assertEquals("sodium chloride + water", list[1][0]);
        for (int i = 1; i < list.length; i++) {
            assertTrue(((String) list[i][0]).contains("chloride") || ((String) list[i][4]).toLowerCase().contains(
                    "chloride"), String.valueOf(list[i][0]));
        }
        assertThrows(com.sun.star.lang.IllegalArgumentException.class, () -> addIn.libraryCard(one("brine")));
    }

    @Test
    void aColumnGivesAColumnAndBlanksStayBlank() throws Exception {
        Object[][] xs = {{0.1}, {""}, {0.5}};
        Object r = addIn.excessMolarVolume(CARD, xs, one(20.0), Any.VOID, Any.VOID, Any.VOID);
        Object[][] grid = (Object[][]) ((Any) r).getObject();
        assertEquals(3, grid.length);
        assertTrue(grid[0][0] instanceof Double);
        assertEquals("", grid[1][0]);
        assertEquals((Double) addIn.excessMolarVolume(CARD, one(0.5), one(20.0), Any.VOID, Any.VOID, Any.VOID), (Double) grid[2][0], 0.0);
    }

    @Test
    void temperatureColumnPairsWithCompositionColumn() throws Exception {
        Object[][] xs = {{0.2}, {0.2}};
        Object[][] ts = {{10.0}, {30.0}};
        Object[][] grid = (Object[][]) ((Any) addIn.mixtureDensity(CARD, xs, ts, Any.VOID, Any.VOID, Any.VOID)).getObject();
        assertTrue((Double) grid[0][0] > (Double) grid[1][0], "density falls with temperature");
    }

    @Test
    void mismatchedShapesAreRefused() {
        Object[][] xs = {{0.2}, {0.3}};
        Object[][] ts = {{10.0}, {20.0}, {30.0}};
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> addIn.mixtureDensity(CARD, xs, ts, Any.VOID, Any.VOID, Any.VOID));
        assertTrue(e.getMessage().contains("same shape"), e.getMessage());
    }

    @Test
    void componentByNumberOrName() throws Exception {
        Object byNumber = addIn.partialMolarVolume(CARD, one(2.0), one(0.4), one(25.0), Any.VOID, Any.VOID, Any.VOID);
        Object byName = addIn.partialMolarVolume(CARD, one("Water"), one(0.4), one(25.0), Any.VOID, Any.VOID, Any.VOID);
        assertEquals((Double) byNumber, (Double) byName, 0.0);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> addIn.partialMolarVolume(CARD, one(3.0), one(0.4), one(25.0), Any.VOID, Any.VOID, Any.VOID));
        assertTrue(e.getMessage().contains("ethanol, water"), e.getMessage());
    }

    @Test
    void outsideTheValidityRangeIsRefusedUnlessAllowed() throws Exception {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> addIn.mixtureDensity(CARD, one(0.4), one(45.0), Any.VOID, Any.VOID, Any.VOID));
        assertTrue(e.getMessage().contains("0 to 40 °C"), e.getMessage());
        assertTrue((Double) addIn.mixtureDensity(CARD, one(0.4), one(45.0), Boolean.TRUE, Any.VOID, Any.VOID) > 0);
        assertTrue(addIn.checkPoint(CARD, one(0.4), one(45.0), Any.VOID, Any.VOID, Any.VOID).contains("outside"));
        assertEquals("OK", addIn.checkPoint(CARD, one(0.4), one(45.0), 1.0, Any.VOID, Any.VOID));
    }

    @Test
    void textWhereANumberBelongs() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> addIn.mixtureDensity(CARD, one("abc"), one(20.0), Any.VOID, Any.VOID, Any.VOID));
        assertTrue(e.getMessage().contains("mole fraction"), e.getMessage());
    }

    @Test
    void infoReportsTheBuildVersionAndCountsEachDistinctCardOnce() throws Exception {
        // the build passes its own version (the pom's) to the tests: MIX.INFO must report that one
        assertEquals(System.getProperty("miscela.version"), addIn.addInInfo(null));
        assertEquals(FunctionCatalog.VERSION, addIn.addInInfo(" Version "));
        Object[][] fresh = TestCards.cells("ethanol-water-oiml.tsv");
        fresh[1] = new Object[] {"title", "a title no other test uses " + System.nanoTime()};
        double before = (Double) addIn.addInInfo("card reads");
        for (int i = 0; i < 50; i++) {
            addIn.mixtureDensity(fresh, one(0.3), one(20.0), null, Any.VOID, Any.VOID);
        }
        assertEquals(before + 1, (Double) addIn.addInInfo("card reads"), "fifty calls on one new card parse it once");
        assertTrue((Double) addIn.addInInfo("cards kept") >= 1);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> addIn.addInInfo("colour"));
        assertEquals("The item \"colour\" is not recognised; use one of: version, card reads, cards kept, last failure.",
                e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> addIn.addInInfo(3.0));
    }

    @Test
    void checkCardReportsTheFirstProblem() {
        assertEquals("OK", addIn.checkCard(CARD, Any.VOID));
        assertEquals("OK", addIn.checkCard(CARD, "warnings"), "no warning to list");
        Object[][] broken = CARD.clone();
        broken[3] = new Object[] {"temperature unit", "°R"};
        String message = (String) addIn.checkCard(broken, Any.VOID);
        assertTrue(message.startsWith("Card row 4 (temperature unit)"), message);
        assertEquals(message, addIn.checkCard(broken, "warnings"), "an unreadable card has its problem, not warnings");
        assertThrows(IllegalArgumentException.class, () -> addIn.mixtureDensity(broken, one(0.4), one(20.0),
                Any.VOID, Any.VOID, Any.VOID));
    }

    /** A card that reads with a warning: MIX.CHECK says so in words or as a column; the other functions compute. */
    @Test
    void checkCardWarnsAndListsWithoutChangingResults() throws Exception {
        Object[][] heavy = CARD.clone();
        int row = rowOf(heavy, "component", "ethanol");
        heavy[row] = new Object[] {"component", "ethanol", 46068.44}; // g/mol values under kg/mol, as if
        String summary = (String) addIn.checkCard(heavy, Any.VOID);
        assertTrue(summary.startsWith("OK with 1 warning: Card row " + (row + 1) + " (component): the molar mass of "
                + "ethanol comes to 46070 g/mol"), summary);
        Object[][] list = (Object[][]) ((Any) addIn.checkCard(heavy, " Warnings ")).getObject();
        assertEquals(1, list.length);
        assertEquals(summary, "OK with 1 warning: " + list[0][0]);
        assertEquals("Problem.WARN_MOLAR_MASS", Catalogue.entryOf((String) list[0][0]));
        // the warning changes no result: the density is the mean molar mass over the molar volume as before
        double x = 0.3;
        double v = (Double) addIn.mixtureMolarVolume(heavy, one(x), one(20.0), Any.VOID, Any.VOID, Any.VOID);
        assertEquals((x * 46068.44 + (1 - x) * 18.01528) / v * 1000,
                (Double) addIn.mixtureDensity(heavy, one(x), one(20.0), Any.VOID, Any.VOID, Any.VOID), 1e-9);
    }

    @Test
    void checkCardGivesTheExtentEvenOfAnUnreadableCardAndRefusesAnUnknownResultInWords() {
        Object[][] spare = java.util.Arrays.copyOf(CARD, CARD.length + 5);
        for (int i = CARD.length; i < spare.length; i++) {
            spare[i] = new Object[] {"", ""};
        }
        String extent = (String) addIn.checkCard(spare, "extent");
        assertEquals("Problem.CHECK_EXTENT_SPARE", Catalogue.entryOf(extent), extent);
        assertTrue(extent.contains("Rows " + (CARD.length + 1) + " to " + (CARD.length + 5) + " are blank"), extent);
        Object[][] broken = CARD.clone();
        broken[3] = new Object[] {"temperature unit", "°F"};
        assertEquals("Problem.CHECK_EXTENT_TIGHT", Catalogue.entryOf((String) addIn.checkCard(broken, "extent")));
        String unknown = (String) addIn.checkCard(CARD, "colour");
        assertEquals("The result \"colour\" is not recognised; use one of: summary, warnings, extent, digits.", unknown);
        assertEquals("Problem.UNKNOWN_FIT_OUTPUT", Catalogue.entryOf((String) addIn.checkCard(CARD, 2.0)));
    }

    @Test
    void checkCardDigitsIsATableWithAHeaderRow() {
        Object[][] table = (Object[][]) ((Any) addIn.checkCard(CARD, "digits")).getObject();
        assertEquals("digits written", table[0][5]);
        assertTrue(table.length > 10, "every non-zero coefficient of the OIML card has a row");
        for (int i = 1; i < table.length; i++) {
            assertTrue((Double) table[i][5] >= (Double) table[i][6], "the fitted card carries the digits it needs: "
                    + java.util.Arrays.toString(table[i]));
        }
    }

    /** The index of the row with this label and subject. */
    private static int rowOf(Object[][] cells, String label, String subject) {
        for (int i = 0; i < cells.length; i++) {
            if (cells[i].length > 1 && label.equals(cells[i][0]) && subject.equals(cells[i][1])) {
                return i;
            }
        }
        throw new AssertionError("no row " + label + " | " + subject);
    }

    // --- compositions of any size (ternary test card, invented values)

    private static final Object[][] TERNARY = TestCards.cells("ternary-invented.tsv");
    private static final org.miscela.core.card.Card TERNARY_CARD = TestCards.card("ternary-invented.tsv");
    private static final double[] X = {0.2, 0.5, 0.3};

    private static double core(double[] x, double t) {
        return CardFunctions.density(TERNARY_CARD, x, t, Extrapolation.AS_CARD);
    }

    @Test
    void aRowOrAColumnIsOneComposition() throws Exception {
        Object row = addIn.mixtureDensity(TERNARY, new Object[][] {{0.2, 0.5, 0.3}}, one(20.0), Any.VOID, Any.VOID, Any.VOID);
        Object column = addIn.mixtureDensity(TERNARY, new Object[][] {{0.2}, {0.5}, {0.3}}, one(20.0), Any.VOID, Any.VOID, Any.VOID);
        assertEquals(core(X, 20), (Double) row, 0.0);
        assertEquals(core(X, 20), (Double) column, 0.0);
    }

    @Test
    void aBlockGivesAColumnWithBlankLinesBlank() throws Exception {
        Object[][] block = {{0.2, 0.5, 0.3}, {"", "", ""}, {0.1, 0.1, 0.8}, {0.3, 0.3, 0.4}};
        Object[][] ts = {{20.0}, {20.0}, {25.0}, {""}};
        Object[][] grid = (Object[][]) ((Any) addIn.mixtureDensity(TERNARY, block, ts, Boolean.TRUE, Any.VOID, Any.VOID)).getObject();
        assertEquals(4, grid.length);
        assertEquals(1, grid[0].length);
        assertEquals(core(X, 20), (Double) grid[0][0], 0.0);
        assertEquals("", grid[1][0]);
        assertEquals(CardFunctions.density(TERNARY_CARD, new double[] {0.1, 0.1, 0.8}, 25, Extrapolation.ALLOW),
                (Double) grid[2][0], 0.0);
        assertEquals("", grid[3][0], "a blank temperature gives a blank result");
    }

    @Test
    void aPartlyBlankLineIsRefusedWithItsName() {
        Object[][] block = {{0.2, 0.5, 0.3}, {0.2, "", 0.8}};
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> addIn.mixtureDensity(TERNARY, block, one(20.0), Any.VOID, Any.VOID, Any.VOID));
        assertTrue(e.getMessage().contains("composition of Q in line 2"), e.getMessage());
    }

    @Test
    void shapesThatFitNoCompositionAreRefused() {
        IllegalArgumentException single = assertThrows(IllegalArgumentException.class,
                () -> addIn.mixtureDensity(TERNARY, one(0.3), one(20.0), Any.VOID, Any.VOID, Any.VOID));
        assertTrue(single.getMessage().contains("this card has 3"), single.getMessage());
        IllegalArgumentException wide = assertThrows(IllegalArgumentException.class,
                () -> addIn.mixtureDensity(TERNARY, new Object[][] {{0.2, 0.5}, {0.3, 0.1}}, one(20.0), Any.VOID, Any.VOID, Any.VOID));
        assertTrue(wide.getMessage().contains("2×2"), wide.getMessage());
        IllegalArgumentException sum = assertThrows(IllegalArgumentException.class,
                () -> addIn.mixtureDensity(TERNARY, new Object[][] {{0.2, 0.5, 0.2}}, one(20.0), Any.VOID, Any.VOID, Any.VOID));
        assertTrue(sum.getMessage().contains("sum to 0.9"), sum.getMessage());
        IllegalArgumentException temperatures = assertThrows(IllegalArgumentException.class,
                () -> addIn.mixtureDensity(TERNARY, new Object[][] {{0.2, 0.5, 0.3}, {0.2, 0.5, 0.3}},
                        new Object[][] {{20.0, 25.0}}, Any.VOID, Any.VOID, Any.VOID));
        assertTrue(temperatures.getMessage().contains("temperature"), temperatures.getMessage());
    }

    /** For a binary card a two-column block holds compositions, anything else x1 values. */
    @Test
    void binaryCardsTakeX1OrTwoColumnBlocks() throws Exception {
        Object[][] block = {{0.3, 0.7}, {0.6, 0.4}};
        Object[][] grid = (Object[][]) ((Any) addIn.mixtureDensity(CARD, block, one(20.0), Any.VOID, Any.VOID, Any.VOID)).getObject();
        assertEquals(2, grid.length);
        assertEquals((Double) addIn.mixtureDensity(CARD, one(0.6), one(20.0), Any.VOID, Any.VOID, Any.VOID), (Double) grid[1][0], 0.0);
        Object[][] x1 = {{0.3, 0.6, 0.9}};
        Object[][] row = (Object[][]) ((Any) addIn.mixtureDensity(CARD, x1, one(20.0), Any.VOID, Any.VOID, Any.VOID)).getObject();
        assertEquals(3, row[0].length, "a row of three x1 values gives a row of three results");
    }

    @Test
    void heatFunctionsTakeAmountsAndABasis() throws Exception {
        Object[][] batch = {{2.0, 5.0, 1.0}};
        double mol = (Double) addIn.mixingHeat(TERNARY, batch, one(25.0), Any.VOID, Any.VOID);
        double kmol = (Double) addIn.mixingHeat(TERNARY, batch, one(25.0), "kmol", Any.VOID);
        assertEquals(mol * 1000, kmol, 1e-9 * Math.abs(kmol));
        assertEquals(CardFunctions.mixingHeat(TERNARY_CARD, new double[] {2, 5, 1}, org.miscela.core.functions.AmountBasis.MOL,
                25, Extrapolation.AS_CARD), mol, 0.0);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> addIn.mixingHeat(TERNARY, batch, one(25.0), "oz", Any.VOID));
        assertEquals("The amount basis \"oz\" is not recognised; use one of: moles: mol, kmol; masses: g, kg, t, "
                + "tonne, tonnes, lb, lbs; masses weighed in air (conventional mass, OIML D 28): g (conventional), "
                + "g air, kg (conventional), kg air, t (conventional), t air, lb (conventional), lb air.",
                e.getMessage());
        // pounds and tonnes are masses like kilograms (1 lb = 0.45359237 kg exactly, NIST SP 811 B.8)
        double kg = (Double) addIn.mixingHeat(TERNARY, new Object[][] {{0.45359237, 1.0, 1.0}}, one(25.0), "kg",
                Any.VOID);
        double mixed = (Double) addIn.mixingHeat(TERNARY, new Object[][] {{1.0, 1 / 0.45359237, 1 / 0.45359237}},
                one(25.0), "lb", Any.VOID);
        assertEquals(kg, mixed, 1e-9 * Math.abs(kg));
        assertEquals(1000 * kg, (Double) addIn.mixingHeat(TERNARY, new Object[][] {{0.45359237, 1.0, 1.0}},
                one(25.0), " Tonne ", Any.VOID), 1e-9 * Math.abs(1000 * kg));
        double added = (Double) addIn.additionHeat(TERNARY, batch, one("Q"), one(1.0), one(25.0), Any.VOID, Any.VOID);
        double direct = CardFunctions.mixingHeat(TERNARY_CARD, new double[] {2, 6, 1},
                org.miscela.core.functions.AmountBasis.MOL, 25, Extrapolation.AS_CARD) - mol;
        assertEquals(direct, added, 1e-9 * Math.abs(direct));
        double rise = (Double) addIn.adiabaticRise(TERNARY, batch, one(25.0), Any.VOID, Any.VOID, Any.VOID);
        assertTrue(rise > 0, "exothermic mixing warms the batch");
    }

    /**
     * The heat-capacity functions and the temperature path through the interface: the whole-range sulfuric acid card
     * (Laliberté 2009 solution heat capacity), its path's end equal to the batch's rise, a path as two columns.
     */
    @Test
    void heatCapacitiesAndTheTemperaturePath() throws Exception {
        Object[][] acid = TestCards.cells("sulfuric-acid-water-whole-range.tsv");
        double cp = (Double) addIn.blendHeatCapacity(acid, one(0.2), one(25.0), Any.VOID, Any.VOID, Any.VOID,
                Any.VOID);
        assertEquals(CardFunctions.heatCapacity(TestCards.card("sulfuric-acid-water-whole-range.tsv"),
                new double[] {0.2, 0.8}, 25.0, Extrapolation.AS_CARD, false), cp, 1e-15);
        double perKg = (Double) addIn.blendHeatCapacity(acid, one(0.2), one(25.0), Any.VOID, Any.VOID, Any.VOID,
                "kg");
        assertEquals(cp / (0.2 * 98.072 + 0.8 * 18.015) * 1000, perKg, 1e-12);
        double water = (Double) addIn.partialHeatCapacity(acid, one("water"), one(0.2), one(25.0), Any.VOID,
                Any.VOID, Any.VOID, Any.VOID);
        double sulfuric = (Double) addIn.partialHeatCapacity(acid, one(1.0), one(0.2), one(25.0), Any.VOID,
                Any.VOID, Any.VOID, Any.VOID);
        assertEquals(cp, 0.2 * sulfuric + 0.8 * water, 1e-12, "summability through the interface");
        Object[][] charges = {{"water"}, {"sulfuric acid"}};
        Object[][] amounts = {{10.0}, {1.0}};
        Object[][] path = (Object[][]) ((Any) addIn.temperaturePath(acid, charges, amounts, one(25.0), "mol",
                Boolean.TRUE, Any.VOID, 4.0, Any.VOID, Any.VOID, Any.VOID, Any.VOID)).getObject();
        assertEquals(5, path.length);
        assertEquals(2, path[0].length);
        double rise = (Double) addIn.adiabaticRise(acid, new Object[][] {{1.0, 10.0}}, one(25.0), "mol",
                Boolean.TRUE, Any.VOID);
        assertEquals(25.0 + rise, (Double) path[4][1], 1e-7);
        assertEquals(25.0 + rise, (Double) addIn.temperaturePath(acid, charges, amounts, one(25.0), "mol",
                Boolean.TRUE, "final", Any.VOID, Any.VOID, Any.VOID, Any.VOID, Any.VOID), 1e-7);
        IllegalArgumentException steps = assertThrows(IllegalArgumentException.class, () -> addIn.temperaturePath(
                acid, charges, amounts, one(25.0), "mol", Boolean.TRUE, Any.VOID, 0.0, Any.VOID, Any.VOID, Any.VOID,
                Any.VOID));
        assertEquals("Problem.PATH_STEPS", Catalogue.entryOf(steps.getMessage()), steps.getMessage());
        IllegalArgumentException lengths = assertThrows(IllegalArgumentException.class, () -> addIn.temperaturePath(
                acid, charges, new Object[][] {{1.0}}, one(25.0), "mol", Boolean.TRUE, Any.VOID, Any.VOID, Any.VOID,
                Any.VOID, Any.VOID, Any.VOID));
        assertEquals("Problem.DATA_LENGTH", Catalogue.entryOf(lengths.getMessage()), lengths.getMessage());
    }

    @Test
    void insideAndTrace() throws Exception {
        assertEquals(1.0, (Double) addIn.insideValidity(TERNARY, new Object[][] {{0.2, 0.5, 0.3}}, one(20.0), Any.VOID, Any.VOID));
        Object[][] block = {{0.2, 0.5, 0.3}, {0.1, 0.3, 0.6}};
        Object[][] inside = (Object[][]) ((Any) addIn.insideValidity(TERNARY, block, one(20.0), Any.VOID, Any.VOID)).getObject();
        assertEquals(0.0, (Double) inside[1][0], "R above its 0.5 limit");
        Object[][] trace = (Object[][]) ((Any) addIn.traceEvaluation(TERNARY, new Object[][] {{0.2, 0.5, 0.3}},
                one(20.0), Any.VOID, Any.VOID, Any.VOID, Any.VOID)).getObject();
        assertEquals("card", trace[0][0]);
        boolean found = false;
        for (Object[] r : trace) {
            if ("mixture density [kg/m³]".equals(r[0])) {
                assertEquals(core(X, 20), (Double) r[1], 0.0);
                found = true;
            }
        }
        assertTrue(found);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> addIn.traceEvaluation(TERNARY, new Object[][] {{0.2, 0.5, 0.3}}, one(20.0), "viscosity",
                        Any.VOID, Any.VOID, Any.VOID));
        assertTrue(e.getMessage().contains("volume, enthalpy"), e.getMessage());
    }

    /**
     * A fit whose order is blank says so (it used to say "found -1", a number nobody wrote). Calc itself refuses a
     * call that leaves the order out (Err:504: it is typed as a range); a cell holding empty text gives "", and a
     * caller of the library may pass nothing.
     */
    @Test
    void aFitWithoutItsOrderSaysTheOrderIsBlank() throws Exception {
        Object[][] x = {{0.2}, {0.4}, {0.6}, {0.8}};
        Object[][] v = {{-0.736}, {-1.008}, {-0.912}, {-0.544}};
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> addIn.fitExcessVolume(x, v, one(""), Any.VOID, Any.VOID, Any.VOID, Any.VOID, Any.VOID));
        assertEquals("The order is blank.", e.getMessage());
        assertEquals("The order is blank.", addIn.fitExcessVolume(x, v, null, Any.VOID, Any.VOID, Any.VOID,
                Any.VOID, "check"));
        IllegalArgumentException d = assertThrows(IllegalArgumentException.class, () -> addIn.fitDensity(CARD,
                Any.VOID, x, new Object[][] {{960.0}, {930.0}, {890.0}, {850.0}}, one(20.0), one(" "), Any.VOID,
                Any.VOID, Any.VOID, Any.VOID));
        assertEquals("The order is blank.", d.getMessage());
        Object ok = addIn.fitExcessVolume(x, v, one(1.0), Any.VOID, Any.VOID, Any.VOID, Any.VOID, "check");
        assertEquals("OK", ((Object[][]) ((Any) ok).getObject())[0][0], "with the order given");
    }

    /**
     * MIX.FITVLE through the adapter: bubble pressures at 70 °C from the Wilson card (Gmehling et al. 2012, problem
     * P05.01a: Λ12 = 0.154, Λ21 = 0.888, written as Δλ/R = 641.966 and 40.761 K with equal volumes), fitted by
     * Barker's method, give back the card's Wilson row, shaped as the row takes it; the Redlich–Kister and NRTL fits
     * of the same points come out shaped as their rows; data typed in Pa on a card in kPa are refused in words.
     */
    @Test
    void theVapourLiquidFitGivesBackTheCardsWilsonRow() throws Exception {
        Object[][] wilson = TestCards.cells("ethanol-water-wilson.tsv");
        Object[][] x = {{0.1}, {0.3}, {0.5}, {0.7}, {0.9}};
        Object[][] p = new Object[5][1];
        for (int i = 0; i < 5; i++) {
            p[i][0] = addIn.bubblePressure(wilson, new Object[][] {{x[i][0]}}, one(70.0), Any.VOID, Any.VOID,
                    Any.VOID);
        }
        Object[][] row = (Object[][]) ((Any) addIn.fitVapourLiquid(wilson, Any.VOID, x, Any.VOID, one(70.0), p,
                "Wilson", Any.VOID, Any.VOID, Any.VOID, Any.VOID, Any.VOID, Any.VOID)).getObject();
        assertEquals(1, row.length);
        assertEquals(641.9659384644834, (Double) row[0][0], 1e-3);
        assertEquals(40.76057037495717, (Double) row[0][1], 1e-3);
        Object[][] rk = (Object[][]) ((Any) addIn.fitVapourLiquid(wilson, Any.VOID, x, Any.VOID, one(70.0), p,
                Any.VOID, one(3.0), Any.VOID, Any.VOID, Any.VOID, Any.VOID, Any.VOID)).getObject();
        assertEquals(4, rk.length, "A0..A3, one per row");
        Object[][] nrtl = (Object[][]) ((Any) addIn.fitVapourLiquid(wilson, Any.VOID, x, Any.VOID, one(70.0), p,
                "NRTL", Any.VOID, Any.VOID, Any.VOID, one(0.25), Any.VOID, Any.VOID)).getObject();
        assertEquals(5, nrtl[0].length, "A, B, A, B, alpha");
        assertEquals(0.25, (Double) nrtl[0][4], 0.0);
        Object[][] pascal = new Object[5][1];
        for (int i = 0; i < 5; i++) {
            pascal[i][0] = 1000 * (Double) p[i][0];
        }
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> addIn.fitVapourLiquid(
                wilson, Any.VOID, x, Any.VOID, one(70.0), pascal, Any.VOID, Any.VOID, Any.VOID, Any.VOID, Any.VOID,
                Any.VOID, Any.VOID));
        assertTrue(e.getMessage().startsWith("The best fit misses the measured pressures by"), e.getMessage());
    }

    /** Numbers a message quotes from an argument are written as a person writes them ("31", not "31.0"). */
    @Test
    void messagesQuoteNumbersAsWritten() {
        Object[][] x = {{0.2}, {0.4}, {0.6}, {0.8}};
        Object[][] v = {{-0.736}, {-1.008}, {-0.912}, {-0.544}};
        IllegalArgumentException order = assertThrows(IllegalArgumentException.class,
                () -> addIn.fitExcessVolume(x, v, one(31.0), Any.VOID, Any.VOID, Any.VOID, Any.VOID, Any.VOID));
        assertEquals("The order must be a whole number from 0 to 30; found 31.", order.getMessage());
        IllegalArgumentException unit = assertThrows(IllegalArgumentException.class, () -> addIn.batchTotals(CARD,
                new Object[][] {{50.0, 50.0}}, one(5.0), one(20.0), Any.VOID, Any.VOID, Any.VOID, Any.VOID));
        assertEquals("The unit must be text; found 5.", unit.getMessage());
    }

    /**
     * Masses weighed in air (conventional mass, OIML D 28 (2004): m·(1 − 1.2/ρ) = m_c·(1 − 1.2/8000)) through the
     * interface, as a cell passes them: 50 g + 50 g read off a balance at 20 °C are 50·(1 − 1.2/8000)/(1 − 1.2/ρ) g of
     * each, ρ the OIML R 22 pure densities at 20 °C; a recipe asked for in "kg air" is what the balance must show.
     */
    @Test
    void conventionalMassThroughTheInterface() throws Exception {
        double kEthanol = (1 - 1.2 / 8000) / (1 - 1.2 / org.miscela.reference.Oiml22.density(1, 20));
        double kWater = (1 - 1.2 / 8000) / (1 - 1.2 / org.miscela.reference.Oiml22.density(0, 20));
        Object[][] batch = {{50.0, 50.0}};
        double grams = (Double) addIn.batchTotals(CARD, batch, one("g (conventional)"), one(20.0), "mass", "g", Any.VOID,
                Any.VOID);
        assertEquals(50 * kEthanol + 50 * kWater, grams, 1e-9);
        double volume = (Double) addIn.batchTotals(CARD, batch, one("g air"), one(20.0), Any.VOID, "mL", Any.VOID,
                Any.VOID);
        assertEquals((Double) addIn.batchTotals(CARD, new Object[][] {{50 * kEthanol, 50 * kWater}}, one("g"), one(20.0),
                Any.VOID, "mL", Any.VOID, Any.VOID), volume, 1e-9);
        Object[][] recipe = (Object[][]) ((Any) addIn.recipe(CARD, one(1.0), one("kg"), one(0.5), one("mass fraction"), one(20.0),
                Any.VOID, "kg air", Any.VOID, Any.VOID, Any.VOID, Any.VOID)).getObject();
        assertEquals(0.5 / kEthanol, (Double) recipe[0][0], 1e-12);
        assertEquals(0.5 / kWater, (Double) recipe[0][1], 1e-12);
        Object[][] added = (Object[][]) ((Any) addIn.adjustBatch(CARD, new Object[][] {{500.0, 500.0}}, one("g air"),
                one(0.4), one("mass fraction"), one(20.0), Any.VOID, Any.VOID, Any.VOID, Any.VOID, "g air", Any.VOID,
                Any.VOID, Any.VOID, Any.VOID))
                .getObject();
        double water = 500 * kEthanol / 0.4 - 500 * kEthanol - 500 * kWater;
        assertEquals(water / kWater, (Double) added[0][1], 1e-9);
        // a gallon and a pound: 1 US gal of 40 %vol holds 0.4 gal of ethanol at 20 °C (definition of %vol)
        Object[][] gallons = (Object[][]) ((Any) addIn.recipe(CARD, one(1.0), one("gal"), one(40.0), one("%vol"), one(20.0), 20.0,
                "US gal",
                Any.VOID, Any.VOID, Any.VOID, Any.VOID)).getObject();
        assertEquals(0.4, (Double) gallons[0][0], 1e-12);
        IllegalArgumentException light = assertThrows(IllegalArgumentException.class, () -> addIn.batchTotals(
                TestCards.cells("invented-lighter-than-air.tsv"), batch, one("kg air"), one(20.0), Any.VOID, Any.VOID,
                Any.VOID, Any.VOID));
        assertEquals("Problem.LIGHTER_THAN_AIR", Catalogue.entryOf(light.getMessage()), light.getMessage());
    }

    /** A batch that would cool below absolute zero: the range searched is named from 0 K (it said "-0.85 K"). */
    @Test
    void aTemperatureRiseWithNoRootNamesNoNegativeKelvin() {
        Object[][] endothermic = TestCards.cells("invented-endothermic.tsv");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> addIn.adiabaticRise(
                endothermic, new Object[][] {{1.0, 1.0}}, one(-272.0), Any.VOID, Boolean.TRUE, Any.VOID));
        assertEquals("No temperature between 0 and 1.15 K balances the heat of mixing; the card's heat capacities or "
                + "excess enthalpy are not physical there.", e.getMessage());
    }

    /**
     * MIX.MOLARMASS: x1 alone, a row of x1 values, a block with a blank line; 0.3·46.06844 + 0.7·18.01528 g/mol
     * (the OIML card's molar masses, those of the IUPAC 2007 atomic weights, from memory); and equal to a batch's
     * mass over its moles as MIX.BATCH gives them.
     */
    @Test
    void meanMolarMassOfOneCompositionARangeAndABlock() throws Exception {
        assertEquals(0.3 * 46.06844 + 0.7 * 18.01528, (Double) addIn.mixtureMolarMass(CARD, one(0.3), Any.VOID, Any.VOID), 1e-12);
        Object[][] row = (Object[][]) ((Any) addIn.mixtureMolarMass(CARD, new Object[][] {{0.0, 1.0, ""}}, Any.VOID, Any.VOID))
                .getObject();
        assertEquals(18.01528, (Double) row[0][0], 1e-12);
        assertEquals(46.06844, (Double) row[0][1], 1e-12);
        assertEquals("", row[0][2]);
        Object[][] tern = TestCards.cells("ternary-invented.tsv");
        Object[][] column = (Object[][]) ((Any) addIn.mixtureMolarMass(tern,
                new Object[][] {{0.2, 0.5, 0.3}, {"", "", ""}, {1.0, 0.0, 0.0}}, Any.VOID, Any.VOID)).getObject();
        assertEquals(0.2 * 62.07 + 0.5 * 18.015 + 0.3 * 92.09, (Double) column[0][0], 1e-12, "invented card");
        assertEquals("", column[1][0]);
        assertEquals(62.07, (Double) column[2][0], 1e-12);
        Object[][] batch = {{0.3, 0.7}};
        double grams = (Double) addIn.batchTotals(CARD, batch, one("mol"), one(20.0), "mass", "g", Any.VOID, Any.VOID);
        double moles = (Double) addIn.batchTotals(CARD, batch, one("mol"), one(20.0), "moles", "mol", Any.VOID, Any.VOID);
        assertEquals(grams / moles, (Double) addIn.mixtureMolarMass(CARD, batch, Any.VOID, Any.VOID), 1e-12);
    }

    @Test
    void meanMolarMassRefusesWhatIsNoComposition() {
        Object[][] tern = TestCards.cells("ternary-invented.tsv");
        Object[][][] bad = {one("abc"), one(1.5), new Object[][] {{0.3, 0.6}}};
        String[] entries = {"Problem.ARG_NOT_NUMBER", "Problem.MOLE_FRACTION_OUTSIDE_UNIT", "Problem.COMPOSITION_SUM"};
        for (int i = 0; i < bad.length; i++) {
            Object[][] x = bad[i];
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> addIn.mixtureMolarMass(CARD, x, Any.VOID, Any.VOID));
            assertEquals(entries[i], Catalogue.entryOf(e.getMessage()), e.getMessage());
        }
        IllegalArgumentException single = assertThrows(IllegalArgumentException.class,
                () -> addIn.mixtureMolarMass(tern, one(0.3), Any.VOID, Any.VOID));
        assertEquals("Problem.NOT_BINARY", Catalogue.entryOf(single.getMessage()), single.getMessage());
        IllegalArgumentException two = assertThrows(IllegalArgumentException.class,
                () -> addIn.mixtureMolarMass(tern, new Object[][] {{0.5, 0.5}}, Any.VOID, Any.VOID));
        assertEquals("Problem.COMPOSITION_SHAPE", Catalogue.entryOf(two.getMessage()), two.getMessage());
    }

    /**
     * The phase functions added with the excess entropy: each adapter method gives the core's number for one point, a
     * column of x1 values gives a column of results, and a refusal carries the catalogue's entry (the values
     * themselves are checked against their sources in the core's tests).
     */
    @Test
    void entropyInfiniteDilutionDewPressureAndTheVapourTrace() throws Exception {
        Object[][] gh = TestCards.cells("invented-gibbs-helmholtz.tsv");
        Object[][] vle = TestCards.cells("ethanol-water-vle.tsv");
        Object[][] vlw = TestCards.cells("ethanol-water-wilson.tsv");
        org.miscela.core.card.Card ghCard = TestCards.card("invented-gibbs-helmholtz.tsv");
        org.miscela.core.card.Card vleCard = TestCards.card("ethanol-water-vle.tsv");
        Extrapolation e = Extrapolation.AS_CARD;
        double[] x = {0.3, 0.7};
        assertEquals(org.miscela.core.functions.PhaseFunctions.excessEntropy(ghCard, -1, x, 40, e),
                (Double) addIn.excessEntropy(gh, one(0.3), one(40.0), Any.VOID, Any.VOID, Any.VOID), 0.0);
        assertEquals(org.miscela.core.functions.PhaseFunctions.excessEntropy(ghCard, 1, x, 40, e),
                (Double) addIn.partialExcessEntropy(gh, one("liquid Q"), one(0.3), one(40.0), Any.VOID, Any.VOID,
                        Any.VOID), 0.0);
        assertEquals(Math.exp(1 - Math.log(0.154) - 0.888), (Double) addIn.infiniteDilutionActivity(vlw,
                one("ethanol"), one(0.5), one(70.0), Any.VOID, Any.VOID, Any.VOID), 1e-11);
        assertEquals(org.miscela.core.functions.PhaseFunctions.dewPressure(vleCard, x, 60, e),
                (Double) addIn.dewPressure(vle, one(0.3), one(60.0), Any.VOID), 0.0);
        Object column = addIn.dewPressure(vle, new Object[][] {{0.2}, {0.6}}, one(60.0), Any.VOID);
        Object[][] rows = (Object[][]) (column instanceof Any ? ((Any) column).getObject() : column);
        assertEquals(2, rows.length);
        assertEquals(org.miscela.core.functions.PhaseFunctions.dewPressure(vleCard, new double[] {0.6, 0.4}, 60, e),
                (Double) rows[1][0], 0.0);
        Object trace = addIn.traceEvaluation(vlw, one(0.3), one(70.0), "vapour", Any.VOID, Any.VOID, Any.VOID);
        Object[][] t = (Object[][]) (trace instanceof Any ? ((Any) trace).getObject() : trace);
        assertEquals("vapour", t[2][1]);
        IllegalArgumentException none = assertThrows(IllegalArgumentException.class,
                () -> addIn.infiniteDilutionActivity(vle, one(1.0), one(1.0), one(50.0), Any.VOID, Any.VOID,
                        Any.VOID));
        assertEquals("Problem.NO_DILUENT", Catalogue.entryOf(none.getMessage()), none.getMessage());
        IllegalArgumentException noH = assertThrows(IllegalArgumentException.class,
                () -> addIn.excessEntropy(vle, one(0.3), one(50.0), Any.VOID, Any.VOID, Any.VOID));
        assertEquals("Problem.NO_ENTHALPY", Catalogue.entryOf(noH.getMessage()), noH.getMessage());
        IllegalArgumentException noP = assertThrows(IllegalArgumentException.class,
                () -> addIn.dewPressure(CARD, one(0.3), one(20.0), Any.VOID));
        assertEquals("Problem.NO_PRESSURE_UNIT", Catalogue.entryOf(noP.getMessage()), noP.getMessage());
    }
    /**
     * MIX.FREEZINGPOINT through the adapter: the core's number for a mass percentage, a column of x1 giving a column
     * (the freezing curve), the component that crystallises, the ideal solution on request only, and its refusals
     * with the catalogue's entries (the values are checked against the CRC Handbook in the core's FreezingPointTest).
     */
    @Test
    void freezingPoint() throws Exception {
        Object[][] ice = TestCards.cells("ethanol-water-vle-ice.tsv");
        Object[][] glycol = TestCards.cells("ethylene-glycol-water-ice-ideal.tsv");
        org.miscela.core.card.Card iceCard = TestCards.card("ethanol-water-vle-ice.tsv");
        org.miscela.core.functions.PhaseFunctions.Activity card = org.miscela.core.functions.PhaseFunctions.Activity.CARD;
        double m1 = iceCard.components().get(0).molarMass();
        double m2 = iceCard.components().get(1).molarMass();
        double x1 = (20 / m1) / (20 / m1 + 80 / m2);
        double expected = org.miscela.core.functions.PhaseFunctions.freezingPoint(iceCard, -1,
                new double[] {x1, 1 - x1}, card, Extrapolation.ALLOW);
        assertEquals(-9.415, expected, 0.001); // as FreezingPointTest records
        assertEquals(expected, (Double) addIn.freezingPoint(ice, one(20.0), Any.VOID, Any.VOID, Any.VOID,
                Boolean.TRUE, "%w/w", Any.VOID), 1e-9);
        Object column = addIn.freezingPoint(ice, new Object[][] {{0.0}, {x1}}, Any.VOID, Any.VOID, Any.VOID,
                Boolean.TRUE, Any.VOID, Any.VOID);
        Object[][] rows = (Object[][]) (column instanceof Any ? ((Any) column).getObject() : column);
        assertEquals(0.0, (Double) rows[0][0], 0.0);
        assertEquals(expected, (Double) rows[1][0], 1e-9);
        assertEquals(2.0, (Double) addIn.freezingPoint(ice, one(0.1), Any.VOID, Any.VOID, "component", Boolean.TRUE,
                Any.VOID, Any.VOID), 0.0);
        double ideal = (Double) addIn.freezingPoint(glycol, one(40.0), "water", "ideal", Any.VOID, Any.VOID, "%w/w",
                Any.VOID);
        assertEquals(-18.12, ideal, 0.005); // the ideal-solution value of FreezingPointTest (CRC: -23.84 °C)
        IllegalArgumentException noGibbs = assertThrows(IllegalArgumentException.class,
                () -> addIn.freezingPoint(glycol, one(0.1), Any.VOID, Any.VOID, Any.VOID, Any.VOID, Any.VOID,
                        Any.VOID));
        assertEquals("Problem.FREEZING_NEEDS_GIBBS", Catalogue.entryOf(noGibbs.getMessage()), noGibbs.getMessage());
        IllegalArgumentException outside = assertThrows(IllegalArgumentException.class,
                () -> addIn.freezingPoint(ice, one(0.1), Any.VOID, Any.VOID, Any.VOID, Any.VOID, Any.VOID, Any.VOID));
        assertEquals("Problem.OUTSIDE_TEMPERATURE", Catalogue.entryOf(outside.getMessage()), outside.getMessage());
        IllegalArgumentException word = assertThrows(IllegalArgumentException.class,
                () -> addIn.freezingPoint(ice, one(0.1), Any.VOID, "gamma", Any.VOID, Any.VOID, Any.VOID, Any.VOID));
        assertEquals("Problem.UNKNOWN_ACTIVITY", Catalogue.entryOf(word.getMessage()), word.getMessage());
        IllegalArgumentException noData = assertThrows(IllegalArgumentException.class,
                () -> addIn.freezingPoint(ice, one(0.1), "ethanol", Any.VOID, Any.VOID, Boolean.TRUE, Any.VOID,
                        Any.VOID));
        assertEquals("Problem.NO_FUSION_DATA", Catalogue.entryOf(noData.getMessage()), noData.getMessage());
    }
}
