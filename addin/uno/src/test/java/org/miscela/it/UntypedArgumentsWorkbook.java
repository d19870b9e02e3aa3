package org.miscela.it;

import com.sun.star.frame.XStorable;
import com.sun.star.lang.XComponent;
import com.sun.star.sheet.XSpreadsheet;
import com.sun.star.sheet.XSpreadsheetDocument;
import com.sun.star.table.XCell;
import com.sun.star.uno.UnoRuntime;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import org.miscela.core.card.TestCards;

/**
 * The workbook TypedArgumentsReloadIT reloads: every function whose required single values were IDL {@code any}
 * parameters until they were typed as ranges (so that the Function Wizard shows them as required), called with those
 * arguments given as values, cells, a formula and an empty cell, and the value each call showed then, kept as a
 * constant beside it. Sheet "Calls": A the formula, B what it showed (a number, a text, or "Err:n"), C what it
 * exercises; inputs in E1:E4; sheet "Cards" holds the cards {@code card} (ethanol + water, OIML R 22) and
 * {@code acid} (sulfuric acid + water, NBS).
 *
 * <p>Written once by the add-in built from the commit before the typing (its .oxt given as {@code miscela.oxt}):
 * <pre>
 * mvn -q -B exec:java -pl addin/uno -Dexec.mainClass=org.miscela.it.UntypedArgumentsWorkbook \
 *     -Dexec.classpathScope=test -Dmiscela.oxt=/path/to/that/miscela.oxt -Dexec.args=FILE.ods
 * </pre>
 * and committed as {@code src/test/resources/workbooks/untyped-arguments.ods}. Run with a later add-in it writes that
 * add-in's values instead, which is no longer the point.
 */
public final class UntypedArgumentsWorkbook {
    /** Formula, and the parameters it gives as a single value. */
    static final String[][] CALLS = {
        {"=MIX.PARTIALVOLUME(card;\"ethanol\";0.4;20)", "MIX.PARTIALVOLUME component, a name"},
        {"=MIX.PARTIALVOLUME(card;$E$1;0.4;20)", "MIX.PARTIALVOLUME component, a cell holding a name"},
        {"=MIX.PARTIALEXCESS(card;2;0.4;20)", "MIX.PARTIALEXCESS component, a number"},
        {"=MIX.PUREDENSITY(card;\"water\";20)", "MIX.PUREDENSITY component"},
        {"=MIX.PARTIALENTHALPY(acid;1;0.1;25)", "MIX.PARTIALENTHALPY component"},
        {"=MIX.ADDITIONHEAT(acid;{1;1};\"water\";9;25)", "MIX.ADDITIONHEAT component and amount added"},
        {"=INDEX(MIX.FITEXCESS({0.2|0.4|0.6|0.8};{-0.736|-1.008|-0.912|-0.544};1);2;1)", "MIX.FITEXCESS order"},
        {"=INDEX(MIX.FITEXCESS({0.2|0.4|0.6|0.8};{-0.736|-1.008|-0.912|-0.544};$E$3);1;1)",
            "MIX.FITEXCESS order, an empty cell (0)"},
        {"=INDEX(MIX.FITDENSITY(card;\"ethanol + water\";{0.1|0.3|0.5|0.7|0.9};"
            + "{965.728|908.666|863.096|829.229|801.749};20;2);1;1)", "MIX.FITDENSITY order"},
        {"=MIX.CONVERT(card;0.5;\"mass fraction\";\"%vol\";20)", "MIX.CONVERT from and to"},
        {"=MIX.BATCH(card;{50;50};\"g\";20;\"contraction\";\"mL\")", "MIX.BATCH unit"},
        {"=INDEX(MIX.RECIPE(card;1;\"L\";40;\"%vol\";20;20;\"mL\");1;1)",
            "MIX.RECIPE quantity, unit, basis and temperature"},
        {"=INDEX(MIX.RECIPE(card;$E$2;$E$4;40;\"%vol\";10+10;20;\"mL\");1;2)",
            "MIX.RECIPE quantity and unit from cells, temperature a formula"},
        {"=INDEX(MIX.ADJUST(card;{500;500};\"g\";0.4;\"mass fraction\";20);1;2)",
            "MIX.ADJUST unit, basis and temperature"},
        {"=MIX.ADDVOLUME(card;{50;50};\"g\";\"ethanol\";10;20;;\"mL\")",
            "MIX.ADDVOLUME unit, component, amount added and temperature"},
        {"=MIX.VOLUMEFACTOR(card;0.5;\"mass fraction\";25;20)", "MIX.VOLUMEFACTOR basis and reference temperature"},
        {"=MIX.EXPLAIN(\"MIX.PARTIALVOLUME\";card;\"glycol\";0.4;20)", "MIX.EXPLAIN function name"},
        {"=MIX.CONVERT(card;0.5;\"mass fraction\";\"no such basis\")", "MIX.CONVERT to, refused (an unknown basis)"},
        {"=MIX.PARTIALVOLUME(card;{1;2};0.4;20)", "MIX.PARTIALVOLUME component, refused (a range of two cells)"},
        {"=MIX.RECIPE(card;;\"L\";40;\"%vol\";20)", "MIX.RECIPE quantity left out between others"},
        {"=MIX.FITEXCESS({0.2|0.4|0.6|0.8};{-0.736|-1.008|-0.912|-0.544})", "MIX.FITEXCESS order left out at the end"},
    };

    private UntypedArgumentsWorkbook() {
    }

    public static void main(String[] args) throws Exception {
        Path out = Paths.get(args[0]).toAbsolutePath();
        Office office = Office.start();
        try {
            XComponent doc = office.newSpreadsheet();
            try {
                XSpreadsheetDocument sd = UnoRuntime.queryInterface(XSpreadsheetDocument.class, doc);
                UnoRuntime.queryInterface(com.sun.star.container.XNamed.class, Sheets.sheet(doc, 0)).setName("Calls");
                sd.getSheets().insertNewByName("Cards", (short) 1);
                XSpreadsheet cards = Sheets.sheet(doc, "Cards");
                Object[][] card = TestCards.cells("ethanol-water-oiml.tsv");
                Sheets.putCard(doc, cards, "Cards", "card", card, 0, 0);
                Sheets.putCard(doc, cards, "Cards", "acid", TestCards.cells("sulfuric-acid-water-nbs.tsv"), 0,
                        card.length + 2);
                XSpreadsheet calls = Sheets.sheet(doc, "Calls");
                Sheets.put(calls, 4, 0, "ethanol");
                Sheets.put(calls, 4, 1, 2.0);
                Sheets.put(calls, 4, 3, "L");
                for (int r = 0; r < CALLS.length; r++) {
                    Sheets.cell(calls, 0, r).setFormula(CALLS[r][0]);
                    Sheets.put(calls, 2, r, CALLS[r][1]);
                }
                Sheets.recalculate(doc);
                for (int r = 0; r < CALLS.length; r++) {
                    XCell c = Sheets.cell(calls, 0, r);
                    if (c.getError() != 0) {
                        Sheets.put(calls, 1, r, "Err:" + c.getError());
                    } else if (TypedArgumentsReloadIT.isText(c)) {
                        Sheets.put(calls, 1, r, Sheets.text(c));
                    } else {
                        Sheets.put(calls, 1, r, c.getValue());
                    }
                }
                Path saved = office.scratch(out.getFileName().toString());
                UnoRuntime.queryInterface(XStorable.class, doc).storeToURL(saved.toUri().toString(),
                        new com.sun.star.beans.PropertyValue[] {Office.property("FilterName", "calc8")});
                Files.copy(saved, out, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
            } finally {
                Sheets.close(doc);
            }
        } finally {
            office.dispose();
        }
        System.out.println("wrote " + out);
    }
}
