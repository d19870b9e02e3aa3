package org.miscela.examples;

import static org.miscela.examples.ExampleWorkbooks.INPUT_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.INVENTED_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.REFERENCE_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.array;
import static org.miscela.examples.ExampleWorkbooks.section;
import static org.miscela.examples.ExampleWorkbooks.band;
import static org.miscela.examples.ExampleWorkbooks.block;
import static org.miscela.examples.ExampleWorkbooks.bold;
import static org.miscela.examples.ExampleWorkbooks.col;
import static org.miscela.examples.ExampleWorkbooks.fitted;
import static org.miscela.examples.ExampleWorkbooks.head;
import static org.miscela.examples.ExampleWorkbooks.nameRange;
import static org.miscela.examples.ExampleWorkbooks.pageSetup;
import static org.miscela.examples.ExampleWorkbooks.prop;
import static org.miscela.examples.ExampleWorkbooks.put;
import static org.miscela.examples.ExampleWorkbooks.sheet;
import static org.miscela.examples.ExampleWorkbooks.text;
import static org.miscela.examples.ExampleWorkbooks.widths;

import com.sun.star.awt.Rectangle;
import com.sun.star.awt.Size;
import com.sun.star.beans.XPropertySet;
import com.sun.star.chart.ChartLegendPosition;
import com.sun.star.chart.ChartSymbolType;
import com.sun.star.chart.XAxisYSupplier;
import com.sun.star.chart.XChartDocument;
import com.sun.star.chart.XDiagram;
import com.sun.star.container.XNameAccess;
import com.sun.star.document.XEmbeddedObjectSupplier;
import com.sun.star.lang.XComponent;
import com.sun.star.sheet.XCellRangeData;
import com.sun.star.sheet.XSpreadsheet;
import com.sun.star.sheet.XSpreadsheets;
import com.sun.star.table.CellHoriJustify;
import com.sun.star.table.CellRangeAddress;
import com.sun.star.table.XTableCharts;
import com.sun.star.table.XTableChartsSupplier;
import com.sun.star.uno.UnoRuntime;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.miscela.core.card.TestCards;
import org.miscela.examples.ExampleWorkbooks.Formats;
import org.miscela.reference.Oiml22;

/**
 * Builds the example workbook examples/lab-fit.ods from nothing, through a real office with the built extension
 * installed: lab densities of ethanol + water in a table, a card whose coefficient and covariance cells are
 * MIX.FITDENSITY array formulas over that table, the fit's statistics and order table, results with their
 * uncertainty, and charts of the data against the fit and of the residuals.
 *
 * <p>The "measurements" are INVENTED: each is the OIML R 22 formula's density ({@link Oiml22}) at a planned mass
 * fraction and temperature plus Gaussian noise of standard deviation {@link #NOISE} kg/m³ from
 * {@code new java.util.Random(SEED)}, rounded to 0.001 kg/m³; the sheets say so. The pure-component rows of the card
 * are the project's reference card's (the OIML formula's own polynomials).
 *
 * <p>Sheets: Fit (the fit's check, statistics, order table and both charts), Lab (the data, with room for more),
 * Card (named ranges 'pure' and 'card'), Results (values and standard uncertainties from the card, coefficients with
 * their standard errors), Plot (the charts' data). The constants that locate cells are shared with ExamplesIT.
 *
 * <p>Run: {@code mvn -q -B test-compile exec:java -pl addin/uno -Dexec.classpathScope=test
 * -Dexec.mainClass=org.miscela.examples.LabFitWorkbookBuilder -Dmiscela.oxt=$PWD/addin/uno/target/miscela.oxt}
 * (optional argument: the output file).
 */
public final class LabFitWorkbookBuilder {
    static final String FILE = "lab-fit.ods";
    static final String PAIR = "ethanol + water";

    // --- the invented measurements
    static final long SEED = 20260;
    static final double NOISE = 0.05;
    static final double[] TEMPERATURES = {15, 20, 25, 30};
    static final double[] MASS_FRACTIONS = {0.05, 0.10, 0.15, 0.20, 0.25, 0.30, 0.35, 0.40, 0.45, 0.50, 0.55, 0.60,
        0.65, 0.70, 0.75, 0.80, 0.85, 0.90, 0.95, 0.975, 0.99};
    static final int POINTS = TEMPERATURES.length * MASS_FRACTIONS.length;

    // --- the fit
    static final int ORDER = 11;
    static final int ORDER_IN_T = 1;
    static final int HIGHEST_ORDER = 14;
    static final int PARAMETERS = (ORDER + 1) * (ORDER_IN_T + 1);

    // --- Lab sheet: sample, mass fraction, mole fraction (formula), temperature, density
    static final int LAB_HEAD = 5;
    static final int LAB_FIRST = 6;
    static final int LAB_ROOM = 100;
    static final int LAB_W = 1;
    static final int LAB_X = 2;
    static final int LAB_T = 3;
    static final int LAB_DENSITY = 4;
    static final int LAB_CHECK_ROW = 3;

    // --- Card sheet
    private static final int CARD_TOP = 5;
    static final int CARD_COLUMNS = 2 + PARAMETERS;

    // --- Fit sheet
    static final int FIT_CHECK_ROW = 5;
    static final int FIT_POINTS_ROW = 6;
    static final int TREF_ROW = 9;
    static final int STATS_FIRST = 13;
    static final int STATS_ROWS = 9;
    static final int ORDERS_FIRST = 24;
    static final int ORDERS_ROWS = 1 + (HIGHEST_ORDER + 1) + 3;
    static final String DATA_CHART = "data-and-fit";
    static final String RESIDUAL_CHART = "residuals";

    // --- Results sheet
    static final int POINT_W_ROW = 4;
    static final int POINT_T_ROW = 5;
    static final int POINT_X_ROW = 6;
    static final int RESULTS_FIRST = 9;
    static final int COEFF_FIRST = 18;
    private static final double POINT_W = 0.40;
    private static final double POINT_T = 25;

    // --- Plot sheet: x, measured Vᴱ, the card's Vᴱ at four temperatures, residual
    static final int PLOT_HEAD = 4;
    static final int PLOT_FIRST = 5;
    static final int CURVE_FIRST = PLOT_FIRST + LAB_ROOM;
    static final int CURVE_ROWS = 51;
    static final int PLOT_RESIDUAL = 6;

    private static Formats formats;
    /** 0-based Card rows of the two components and of excess volume A0, set by writeCard. */
    private static int[] cardRow;
    private static int a0Row;

    private LabFitWorkbookBuilder() {
    }

    public static void main(String[] args) throws Exception {
        ExampleWorkbooks.buildAndSave(FILE, args, (doc, context) -> build(doc));
    }

    /** The invented measurements, in table order: mass fraction, temperature, density. */
    static double[][] measurements() {
        Random random = new Random(SEED);
        double[][] m = new double[POINTS][];
        int i = 0;
        for (double t : TEMPERATURES) {
            for (double p : MASS_FRACTIONS) {
                double rho = Oiml22.density(p, t) + NOISE * random.nextGaussian();
                m[i++] = new double[] {p, t, Math.round(rho * 1000) / 1000.0};
            }
        }
        return m;
    }

    static void build(XComponent doc) throws Exception {
        XSpreadsheets sheets = ExampleWorkbooks.nameSheets(doc, "Fit", "Lab", "Card", "Results", "Plot");
        formats = new Formats(doc);
        writeCard(doc, sheet(sheets, "Card"));
        writeLab(doc, sheet(sheets, "Lab"));
        writeFit(sheet(sheets, "Fit"));
        writeResults(sheet(sheets, "Results"));
        writePlot(sheet(sheets, "Plot"));
        addCharts(sheet(sheets, "Fit"));
        pageSetup(doc);
        ExampleWorkbooks.portraitFullWidth(doc, sheet(sheets, "Lab"), sheet(sheets, "Plot"));
    }

    // --- formulas shared by the sheets

    private static String labColumn(int c) {
        return "$Lab.$" + col(c) + "$" + (LAB_FIRST + 1) + ":$" + col(c) + "$" + (LAB_FIRST + LAB_ROOM);
    }

    /** MIX.FITDENSITY over the lab table with the given order and result (null: the coefficients). */
    static String fit(int order, String result) {
        return "MIX.FITDENSITY(pure;\"" + PAIR + "\";" + labColumn(LAB_X) + ";" + labColumn(LAB_DENSITY) + ";"
                + labColumn(LAB_T) + ";" + order + ";" + ORDER_IN_T + ";$Fit.$B$" + (TREF_ROW + 1)
                + (result == null ? "" : ";;\"" + result + "\"") + ")";
    }

    private static String molarMass(int component) {
        return "$Card.$C$" + (CARD_TOP + cardRow[component] + 1);
    }

    // --- Card

    private static void writeCard(XComponent doc, XSpreadsheet s) throws Exception {
        List<Object[]> pure = new ArrayList<>();
        for (Object[] r : TestCards.cells(ExampleWorkbooks.OIML_CARD)) {
            String label = String.valueOf(r[0]).toLowerCase(Locale.ROOT);
            if (label.startsWith("excess volume") || label.equals("valid mole fraction")) {
                continue;
            }
            if (label.equals("miscela card")) {
                r = new Object[] {"Miscela card", 2.0};
            } else if (label.equals("title")) {
                r = new Object[] {"title", "Ethanol + water fitted to the INVENTED lab densities of sheet Lab"};
            } else if (label.equals("source")) {
                r = new Object[] {"source", "pure liquids: OIML R 22 (1975) density formula, exact (as on the "
                        + "project's card " + ExampleWorkbooks.OIML_CARD + "); A0..A" + ORDER + ", each linear in "
                        + "(t - T_ref), and their covariance: MIX.FITDENSITY over the INVENTED densities of sheet Lab "
                        + "(formula plus seeded noise). An example, not for use."};
            } else if (label.equals("valid temperature")) {
                r = new Object[] {"valid temperature", TEMPERATURES[0], TEMPERATURES[TEMPERATURES.length - 1]};
            }
            pure.add(r);
        }
        cardRow = new int[2];
        int component = 0;
        for (int r = 0; r < pure.size(); r++) {
            if ("component".equals(pure.get(r)[0])) {
                cardRow[component++] = r;
            }
        }
        String last = col(CARD_COLUMNS - 1);
        int wide = 70 + 34 + 24 * 2 + 18 * (CARD_COLUMNS - 4);
        text(s, 0, 0, "The card: pure liquids from the OIML R 22 formula, the pair's coefficients fitted in the sheet");
        bold(s, "A1", 13);
        fitted(s, "A2:P2", 1, "The grey rows (named range 'pure') are the project's reference data for the pure "
                + "liquids: the OIML R 22 (1975) density polynomials of ethanol and of water, exact (from "
                + ExampleWorkbooks.OIML_CARD_PATH + "). The orange coefficient and covariance cells are array formulas "
                + "of MIX.FITDENSITY over the INVENTED lab densities of sheet Lab: they are fitted to invented data "
                + "and describe nothing real.", wide / 2);
        band(s, "A2:P2", INVENTED_COLOUR);
        bold(s, "A2", 10);
        fitted(s, "A3:P3", 2, "The fit reads 'pure' (the rows above the coefficients), never 'card' (which holds "
                + "the fit itself: that would be a circular reference). 'card' is the whole block, and every result "
                + "reads it. Select a coefficient cell to see its array formula.", wide / 2);
        text(s, 0, 3, "Card check (MIX.CHECK)");
        bold(s, "A4", 10);
        s.getCellByPosition(1, 3).setFormula("=MIX.CHECK(card)");
        for (int c = 0; c < CARD_COLUMNS; c++) {
            text(s, c, CARD_TOP - 1, c == 0 ? "label" : c == 1 ? "subject / value" : "value");
        }
        head(s, "A" + CARD_TOP + ":" + last + CARD_TOP);
        int row = CARD_TOP;
        for (Object[] r : pure) {
            for (int c = 0; c < r.length; c++) {
                put(s, c, row, r[c]);
            }
            row++;
        }
        band(s, "A" + (CARD_TOP + 1) + ":" + last + row, REFERENCE_COLOUR);
        nameRange(doc, "pure", "$Card.$A$" + (CARD_TOP + 1) + ":$" + last + "$" + row);
        int fitted = row;
        put(s, 0, row, "valid mole fraction");
        put(s, 1, row, "ethanol");
        put(s, 2, row, 0.0);
        put(s, 3, row++, 1.0);
        put(s, 0, row, "excess volume reference temperature");
        put(s, 1, row, PAIR);
        s.getCellByPosition(2, row++).setFormula("=$Fit.$B$" + (TREF_ROW + 1));
        int a0 = row;
        a0Row = a0;
        for (int k = 0; k <= ORDER; k++) {
            put(s, 0, row, "excess volume A" + k);
            put(s, 1, row++, PAIR);
        }
        array(s, "C" + (a0 + 1) + ":" + col(2 + ORDER_IN_T) + row, "=" + fit(ORDER, null));
        int cov = row;
        for (int p = 0; p < PARAMETERS; p++) {
            put(s, 0, row, "excess volume covariance");
            put(s, 1, row++, PAIR);
        }
        array(s, "C" + (cov + 1) + ":" + last + row, "=" + fit(ORDER, "covariance"));
        band(s, "A" + (fitted + 1) + ":" + last + row, INVENTED_COLOUR);
        prop(s, "C" + (a0 + 1) + ":" + col(2 + ORDER_IN_T) + cov, "NumberFormat", formats.key("0.000000"));
        prop(s, "C" + (cov + 1) + ":" + last + row, "NumberFormat", formats.key("0.0E+00"));
        nameRange(doc, "card", "$Card.$A$" + (CARD_TOP + 1) + ":$" + last + "$" + row);
        text(s, 0, row + 1, "Coefficient rows: one per A_k, columns C and D the constant and the (t − T_ref) term, "
                + "in cm³/mol and cm³/(mol·K). Covariance rows: one per coefficient, counted A0's terms first, then "
                + "A1's, in (cm³/mol)² per K^(j+j').");
        prop(s, "A" + (row + 2), "CharPosture", com.sun.star.awt.FontSlant.ITALIC);
        int[] mm = new int[CARD_COLUMNS];
        mm[0] = 70;
        mm[1] = 34;
        for (int c = 2; c < CARD_COLUMNS; c++) {
            mm[c] = c < 4 ? 24 : 18;
        }
        widths(s, mm);
    }

    // --- Lab

    private static void writeLab(XComponent doc, XSpreadsheet s) throws Exception {
        text(s, 0, 0, "Lab densities of ethanol + water (INVENTED measurements)");
        bold(s, "A1", 13);
        fitted(s, "A2:H2", 1, "INVENTED DATA. Nobody measured these densities. Each is the OIML R 22 (1975) "
                + "formula's density of ethanol + water at the planned mass fraction and temperature "
                + "(addin/core/src/test/java/org/miscela/reference/Oiml22.java) plus Gaussian noise of standard deviation "
                + NOISE + " kg/m³ drawn by java.util.Random with seed " + SEED + ", rounded to 0.001 kg/m³. They stand "
                + "in for a lab's densitometer readings to show how a card is fitted; do not use them as data.", 150);
        band(s, "A2:H2", INVENTED_COLOUR);
        bold(s, "A2", 10);
        text(s, 0, LAB_CHECK_ROW, "Fit check (MIX.FITDENSITY \"check\")");
        bold(s, "A" + (LAB_CHECK_ROW + 1), 10);
        s.getCellByPosition(1, LAB_CHECK_ROW).setFormula("=" + fit(ORDER, "check"));
        String[] heads = {"sample", "ethanol mass fraction\n(as weighed)", "ethanol mole fraction\n(formula)",
            "temperature\n°C", "density\nkg/m³"};
        for (int c = 0; c < heads.length; c++) {
            text(s, c, LAB_HEAD, heads[c]);
        }
        String headRange = "A" + (LAB_HEAD + 1) + ":E" + (LAB_HEAD + 1);
        head(s, headRange);
        prop(s, headRange, "IsTextWrapped", Boolean.TRUE);
        prop(s, headRange, "HoriJustify", CellHoriJustify.CENTER);
        ExampleWorkbooks.rowHeight(s, LAB_HEAD, 1400);
        double[][] m = measurements();
        Object[][] names = new Object[POINTS][2];
        Object[][] values = new Object[POINTS][2];
        for (int i = 0; i < POINTS; i++) {
            names[i][0] = String.format(Locale.ROOT, "L%02d", i + 1);
            names[i][1] = m[i][0];
            values[i][0] = m[i][1];
            values[i][1] = m[i][2];
        }
        data(s, "A" + (LAB_FIRST + 1) + ":B" + (LAB_FIRST + POINTS), names);
        data(s, "D" + (LAB_FIRST + 1) + ":E" + (LAB_FIRST + POINTS), values);
        String m1 = molarMass(0);
        String m2 = molarMass(1);
        for (int i = 0; i < LAB_ROOM; i++) {
            int n = LAB_FIRST + i + 1;
            s.getCellByPosition(LAB_X, LAB_FIRST + i).setFormula("=IF(B" + n + "=\"\";\"\";(B" + n + "/" + m1
                    + ")/(B" + n + "/" + m1 + "+(1-B" + n + ")/" + m2 + "))");
        }
        int end = LAB_FIRST + LAB_ROOM;
        band(s, "A" + (LAB_FIRST + 1) + ":B" + end, INVENTED_COLOUR);
        band(s, "D" + (LAB_FIRST + 1) + ":E" + end, INVENTED_COLOUR);
        prop(s, "B" + (LAB_FIRST + 1) + ":B" + end, "NumberFormat", formats.key("0.000"));
        prop(s, "C" + (LAB_FIRST + 1) + ":C" + end, "NumberFormat", formats.key("0.00000"));
        prop(s, "D" + (LAB_FIRST + 1) + ":D" + end, "NumberFormat", formats.key("0.0"));
        prop(s, "E" + (LAB_FIRST + 1) + ":E" + end, "NumberFormat", formats.key("0.000"));
        text(s, 6, LAB_HEAD, "Adding measurements");
        head(s, "G" + (LAB_HEAD + 1) + ":H" + (LAB_HEAD + 1));
        block(s, "G" + (LAB_FIRST + 1) + ":H" + (LAB_FIRST + 30), "Type a new measurement into the next empty row: "
                + "sample, mass fraction, temperature and density (the mole fraction follows from the card's molar "
                + "masses). The fit covers rows " + (LAB_FIRST + 1) + " to " + end + ": the card's coefficients, "
                + "their covariance, the statistics, the charts and every result refit and recalculate at once.\n\n"
                + "Blank rows are skipped, so the table may have gaps and room to spare.\n\n"
                + "A half-filled row is refused, not read as zero: with a mass fraction but no density, for "
                + "example, the card's coefficient cells show Err:502, everything that reads the card shows Err:504 "
                + "(Calc's code for an error inside a range argument), and the fit check above says which point and "
                + "what is missing. Fill the row in, or clear it.\n\n"
                + "Beyond row " + end + ", widen the ranges in the array formulas on sheets Card, Fit and Plot.\n\n"
                + "The temperatures must lie inside the card's 'valid temperature' row (" + (int) TEMPERATURES[0]
                + " to " + (int) TEMPERATURES[TEMPERATURES.length - 1] + " °C); widen it only with data that span "
                + "the new range.");
        widths(s, 20, 34, 34, 26, 26, 6, 80, 60);
    }

    private static void data(XSpreadsheet s, String range, Object[][] values) throws Exception {
        UnoRuntime.queryInterface(XCellRangeData.class, s.getCellRangeByName(range)).setDataArray(values);
    }

    // --- Fit

    private static void writeFit(XSpreadsheet s) throws Exception {
        text(s, 0, 0, "From lab data to a card: ethanol + water fitted in the sheet (INVENTED lab data)");
        bold(s, "A1", 14);
        fitted(s, "A2:Q2", 1, "INVENTED DATA. The lab densities on sheet Lab are the OIML R 22 formula's values "
                + "plus seeded random noise of " + NOISE + " kg/m³ (see sheet Lab), not measurements; the card fitted "
                + "to them is an example and describes nothing real. Only the pure-liquid rows of the card are "
                + "reference data.", 240);
        band(s, "A2:Q2", INVENTED_COLOUR);
        bold(s, "A2", 10);
        fitted(s, "A3:Q3", 2, "The card's A0…A" + ORDER + " and covariance cells on sheet Card are MIX.FITDENSITY "
                + "array formulas over the table on sheet Lab: a new measurement refits the card and every result. "
                + "The same function gives the tables below (results \"check\", \"statistics\", \"orders\") and the "
                + "residuals plotted on the right.", 280);
        section(s, 4, "The fit");
        result(s, FIT_CHECK_ROW, "Fit check (result \"check\")", "=" + fit(ORDER, "check"), "", "@");
        result(s, FIT_POINTS_ROW, "Points in the fit (blank rows skipped)",
                "=INDEX(" + fit(ORDER, "statistics") + ";2;2)", "", "0");
        text(s, 0, 7, "Order in x (A0 … A" + ORDER + " on the card)");
        s.getCellByPosition(1, 7).setValue(ORDER);
        text(s, 0, 8, "Order in t (each A_k linear in t)");
        s.getCellByPosition(1, 8).setValue(ORDER_IN_T);
        text(s, 0, TREF_ROW, "Reference temperature T_ref");
        s.getCellByPosition(1, TREF_ROW).setValue(20.0);
        text(s, 2, TREF_ROW, "°C");
        band(s, "B" + (TREF_ROW + 1), INPUT_COLOUR);
        result(s, TREF_ROW + 1, "Card check (MIX.CHECK)", "=MIX.CHECK(card)", "", "@");
        prop(s, "B6:B11", "HoriJustify", CellHoriJustify.RIGHT);

        section(s, STATS_FIRST - 1, "Statistics (result \"statistics\")");
        array(s, "A" + (STATS_FIRST + 1) + ":B" + (STATS_FIRST + STATS_ROWS), "=" + fit(ORDER, "statistics"));
        prop(s, "B" + (STATS_FIRST + 1) + ":B" + (STATS_FIRST + STATS_ROWS), "NumberFormat",
                formats.key("0.0000"));
        prop(s, "B" + (STATS_FIRST + 2) + ":B" + (STATS_FIRST + 4), "NumberFormat", formats.key("0"));
        prop(s, "B" + (STATS_FIRST + 7), "NumberFormat", formats.key("0"));
        prop(s, "B" + (STATS_FIRST + 8), "NumberFormat", formats.key("0.0000000"));
        prop(s, "B" + (STATS_FIRST + 9), "NumberFormat", formats.key("0"));
        prop(s, "B" + (STATS_FIRST + 2) + ":B" + (STATS_FIRST + STATS_ROWS), "HoriJustify", CellHoriJustify.RIGHT);
        block(s, "E" + (STATS_FIRST + 1) + ":H" + (STATS_FIRST + STATS_ROWS), "The standard deviation of the fit "
                + "should come out near the scatter of the measurements (here the invented noise, " + NOISE
                + " kg/m³). The largest residual and its point say where to look first; the condition number "
                + "grows with the order and warns when the coefficients are poorly determined.");

        int head = ORDERS_FIRST - 1;
        section(s, head, "Which order? (result \"orders\": orders 0 to " + HIGHEST_ORDER + ", each linear in "
                + "temperature)");
        String orders = "A" + (ORDERS_FIRST + 1) + ":H" + (ORDERS_FIRST + ORDERS_ROWS);
        array(s, orders, "=" + fit(HIGHEST_ORDER, "orders"));
        int body = ORDERS_FIRST + 2;
        int bodyEnd = ORDERS_FIRST + 1 + HIGHEST_ORDER + 1;
        bold(s, "A" + (ORDERS_FIRST + 1) + ":H" + (ORDERS_FIRST + 1), 9);
        prop(s, "A" + (ORDERS_FIRST + 1) + ":H" + (ORDERS_FIRST + 1), "IsTextWrapped", Boolean.TRUE);
        prop(s, "A" + (ORDERS_FIRST + 1) + ":H" + (ORDERS_FIRST + 1), "HoriJustify", CellHoriJustify.CENTER);
        ExampleWorkbooks.rowHeight(s, ORDERS_FIRST, 1300);
        prop(s, "A" + body + ":C" + bodyEnd, "NumberFormat", formats.key("0"));
        prop(s, "D" + body + ":D" + bodyEnd, "NumberFormat", formats.key("0.0000"));
        prop(s, "E" + body + ":E" + bodyEnd, "NumberFormat", formats.key("0.0"));
        prop(s, "F" + body + ":F" + bodyEnd, "NumberFormat", formats.key("0.0E+00"));
        prop(s, "G" + body + ":H" + bodyEnd, "NumberFormat", formats.key("0.0"));
        prop(s, "A" + body + ":A" + bodyEnd, "HoriJustify", CellHoriJustify.CENTER);
        prop(s, "B" + (bodyEnd + 1) + ":B" + (ORDERS_FIRST + ORDERS_ROWS), "NumberFormat", formats.key("0"));
        prop(s, "B" + (bodyEnd + 1) + ":B" + (ORDERS_FIRST + ORDERS_ROWS), "HoriJustify", CellHoriJustify.RIGHT);
        bold(s, "A" + (bodyEnd + 1) + ":B" + (ORDERS_FIRST + ORDERS_ROWS), 10);
        int note = ORDERS_FIRST + ORDERS_ROWS + 1;
        block(s, "A" + (note + 1) + ":H" + (note + 5), "Each row is a fit of that order to the same points. The F "
                + "column tests the terms that order adds against the order below (p-value under 5 %: they are "
                + "worth having); the F-test verdict is the last order before the first term that is not. AIC and "
                + "BIC weigh the fit against the number of parameters (lowest wins). Here all three pick order "
                + ORDER + ", the order of the card; with other data they may disagree, and the order is then a "
                + "judgement to make and to write in the card's 'source' row.");
        widths(s, 66, 22, 22, 26, 22, 20, 20, 20, 5);
    }

    // --- Results

    private static void writeResults(XSpreadsheet s) throws Exception {
        text(s, 0, 0, "Results from the fitted card, with their standard uncertainty (INVENTED lab data)");
        bold(s, "A1", 13);
        fitted(s, "A2:F2", 1, "The card is fitted to invented data (sheet Lab): these numbers show how the functions "
                + "work, not the properties of a real blend. The uncertainty is propagated from the card's "
                + "coefficient covariance (MIX.UNCERTAINTY; the pure liquids taken as exact).", 150);
        band(s, "A2:F2", INVENTED_COLOUR);
        bold(s, "A2", 10);
        section(s, 3, "The point (change the blue cells)");
        text(s, 0, POINT_W_ROW, "Ethanol mass fraction");
        s.getCellByPosition(1, POINT_W_ROW).setValue(POINT_W);
        text(s, 2, POINT_W_ROW, "kg/kg");
        text(s, 0, POINT_T_ROW, "Temperature");
        s.getCellByPosition(1, POINT_T_ROW).setValue(POINT_T);
        text(s, 2, POINT_T_ROW, "°C");
        band(s, "B" + (POINT_W_ROW + 1) + ":B" + (POINT_T_ROW + 1), INPUT_COLOUR);
        String w = "$B$" + (POINT_W_ROW + 1);
        String t = "$B$" + (POINT_T_ROW + 1);
        text(s, 0, POINT_X_ROW, "Ethanol mole fraction (card's molar masses)");
        s.getCellByPosition(1, POINT_X_ROW).setFormula("=(" + w + "/" + molarMass(0) + ")/(" + w + "/" + molarMass(0)
                + "+(1-" + w + ")/" + molarMass(1) + ")");
        text(s, 2, POINT_X_ROW, "mol/mol");
        String x = "$B$" + (POINT_X_ROW + 1);
        text(s, 0, POINT_X_ROW + 1, "Point check (MIX.CHECKPOINT)");
        s.getCellByPosition(1, POINT_X_ROW + 1).setFormula("=MIX.CHECKPOINT(card;" + x + ";" + t + ")");
        prop(s, "B" + (POINT_W_ROW + 1) + ":B" + (POINT_X_ROW + 2), "HoriJustify", CellHoriJustify.RIGHT);
        prop(s, "B" + (POINT_W_ROW + 1), "NumberFormat", formats.key("0.000"));
        prop(s, "B" + (POINT_T_ROW + 1), "NumberFormat", formats.key("0.0"));
        prop(s, "B" + (POINT_X_ROW + 1), "NumberFormat", formats.key("0.00000"));

        String[] heads = {"Result at the point", "value", "std. uncertainty", "unit"};
        for (int c = 0; c < heads.length; c++) {
            text(s, c, RESULTS_FIRST - 1, heads[c]);
        }
        head(s, "A" + RESULTS_FIRST + ":D" + RESULTS_FIRST);
        prop(s, "B" + RESULTS_FIRST + ":C" + RESULTS_FIRST, "HoriJustify", CellHoriJustify.RIGHT);
        String at = x + ";" + t;
        String[][] rows = {
            {"Density (MIX.DENSITY)", "=MIX.DENSITY(card;" + at + ")", "=MIX.UNCERTAINTY(card;" + at + ")", "kg/m³",
                "0.000"},
            {"Excess molar volume Vᴱ (MIX.EXCESSVOLUME)", "=MIX.EXCESSVOLUME(card;" + at + ")",
                "=MIX.UNCERTAINTY(card;" + at + ";\"excess volume\")", "cm³/mol", "0.0000"},
            {"Molar volume (MIX.MOLARVOLUME)", "=MIX.MOLARVOLUME(card;" + at + ")",
                "=MIX.UNCERTAINTY(card;" + at + ";\"molar volume\")", "cm³/mol", "0.0000"},
            {"V̄ ethanol (MIX.PARTIALVOLUME)", "=MIX.PARTIALVOLUME(card;1;" + at + ")",
                "=MIX.UNCERTAINTY(card;" + at + ";\"partial volume\";1)", "cm³/mol", "0.0000"},
            {"V̄ water (MIX.PARTIALVOLUME)", "=MIX.PARTIALVOLUME(card;2;" + at + ")",
                "=MIX.UNCERTAINTY(card;" + at + ";\"partial volume\";2)", "cm³/mol", "0.0000"},
        };
        for (int i = 0; i < rows.length; i++) {
            int r = RESULTS_FIRST + i;
            text(s, 0, r, rows[i][0]);
            s.getCellByPosition(1, r).setFormula(rows[i][1]);
            s.getCellByPosition(2, r).setFormula(rows[i][2]);
            text(s, 3, r, rows[i][3]);
            prop(s, "B" + (r + 1) + ":C" + (r + 1), "NumberFormat", formats.key(rows[i][4]));
        }
        int noteRow = RESULTS_FIRST + rows.length + 1;
        fitted(s, "A" + (noteRow + 1) + ":F" + (noteRow + 1), noteRow, "The standard uncertainty is the fit's: how "
                + "far the card may be off because the data scatter, assuming the model's form is right. It grows "
                + "where the data are sparse and outside them; the card refuses beyond its validity rows.", 150);
        prop(s, "A" + (noteRow + 1), "CharPosture", com.sun.star.awt.FontSlant.ITALIC);

        String[] coeffHeads = {"Coefficient", "a_k0", "a_k1", "u(a_k0)", "u(a_k1)"};
        for (int c = 0; c < coeffHeads.length; c++) {
            text(s, c, COEFF_FIRST - 1, coeffHeads[c]);
        }
        head(s, "A" + COEFF_FIRST + ":E" + COEFF_FIRST);
        prop(s, "B" + COEFF_FIRST + ":E" + COEFF_FIRST, "HoriJustify", CellHoriJustify.RIGHT);
        int cardA0 = a0Row;
        for (int k = 0; k <= ORDER; k++) {
            int r = COEFF_FIRST + k;
            text(s, 0, r, "A" + k + " (sheet Card, row " + (cardA0 + k + 1) + ")");
            for (int j = 0; j <= ORDER_IN_T; j++) {
                s.getCellByPosition(1 + j, r).setFormula("=$Card.$" + col(2 + j) + "$" + (cardA0 + k + 1));
            }
        }
        int end = COEFF_FIRST + ORDER + 1;
        array(s, "D" + (COEFF_FIRST + 1) + ":E" + end, "=" + fit(ORDER, "standard errors"));
        prop(s, "B" + (COEFF_FIRST + 1) + ":E" + end, "NumberFormat", formats.key("0.000000"));
        fitted(s, "A" + (end + 2) + ":F" + (end + 2), end + 1, "A_k = a_k0 + a_k1·(t − T_ref): a_k0 in cm³/mol, a_k1 in cm³/(mol·K). The standard errors (result "
                + "\"standard errors\") are the square roots of the covariance's diagonal on sheet Card. Neighbouring coefficients of a "
                + "high-order fit are strongly correlated, which is why the card keeps the whole covariance: the "
                + "uncertainty of a result needs it, not just these columns.", 150);
        prop(s, "A" + (end + 2), "CharPosture", com.sun.star.awt.FontSlant.ITALIC);
        widths(s, 90, 26, 34, 24, 24, 10);
    }


    // --- Plot

    private static void writePlot(XSpreadsheet s) throws Exception {
        text(s, 0, 0, "Chart data (INVENTED lab data): excess molar volumes from the measurements and from the card, "
                + "and the residuals");
        bold(s, "A1", 12);
        fitted(s, "A2:H2", 1, "Rows " + (PLOT_FIRST + 1) + "–" + (PLOT_FIRST + LAB_ROOM) + " follow the rows of "
                + "sheet Lab: Vᴱ of each measured density, (x·M1 + (1 − x)·M2)/ρ − x·V1* − (1 − x)·V2* with the "
                + "pure liquids from the card (MIX.PUREDENSITY), and the fit's residual ρ measured − ρ fitted "
                + "(result \"residuals\", one per point in order, hence INDEX by the count of points so far). Rows "
                + (CURVE_FIRST + 1) + "–" + (CURVE_FIRST + CURVE_ROWS) + " are the card's Vᴱ at the temperatures "
                + "in C4:F4 (MIX.EXCESSVOLUME, one array formula per column).", 170);
        band(s, "A2:H2", INVENTED_COLOUR);
        text(s, 1, 3, "curve temperatures, °C:");
        prop(s, "B4", "HoriJustify", CellHoriJustify.RIGHT);
        for (int i = 0; i < TEMPERATURES.length; i++) {
            s.getCellByPosition(2 + i, 3).setValue(TEMPERATURES[i]);
        }
        band(s, "C4:F4", INPUT_COLOUR);
        text(s, 0, PLOT_HEAD, "x ethanol");
        text(s, 1, PLOT_HEAD, "measured");
        for (int i = 0; i < TEMPERATURES.length; i++) {
            s.getCellByPosition(2 + i, PLOT_HEAD).setFormula("=\"card at \"&" + col(2 + i) + "4&\" °C\"");
        }
        text(s, PLOT_RESIDUAL, PLOT_HEAD, "residual, kg/m³");
        head(s, "A" + (PLOT_HEAD + 1) + ":G" + (PLOT_HEAD + 1));
        String m1 = molarMass(0);
        String m2 = molarMass(1);
        String count = "$Lab.$" + col(LAB_X) + "$" + (LAB_FIRST + 1) + ":$" + col(LAB_X) + "$";
        String residuals = fit(ORDER, "residuals");
        for (int i = 0; i < LAB_ROOM; i++) {
            int lab = LAB_FIRST + i + 1;
            int n = PLOT_FIRST + i + 1;
            String lx = "$Lab.$C$" + lab;
            String lt = "$Lab.$D$" + lab;
            String lr = "$Lab.$E$" + lab;
            s.getCellByPosition(0, PLOT_FIRST + i).setFormula("=IF(" + lx + "=\"\";\"\";" + lx + ")");
            s.getCellByPosition(1, PLOT_FIRST + i).setFormula("=IF(OR(" + lx + "=\"\";" + lt + "=\"\";" + lr
                    + "=\"\");\"\";(A" + n + "*" + m1 + "+(1-A" + n + ")*" + m2 + ")/" + lr + "*1000-A" + n + "*" + m1
                    + "/MIX.PUREDENSITY(card;1;" + lt + ")*1000-(1-A" + n + ")*" + m2 + "/MIX.PUREDENSITY(card;2;" + lt
                    + ")*1000)");
            s.getCellByPosition(PLOT_RESIDUAL, PLOT_FIRST + i).setFormula("=IF(" + lx + "=\"\";\"\";INDEX("
                    + residuals + ";COUNT(" + count + lab + ")))");
        }
        for (int i = 0; i < CURVE_ROWS; i++) {
            s.getCellByPosition(0, CURVE_FIRST + i).setValue(i / (double) (CURVE_ROWS - 1));
        }
        String curve = "$A$" + (CURVE_FIRST + 1) + ":$A$" + (CURVE_FIRST + CURVE_ROWS);
        for (int i = 0; i < TEMPERATURES.length; i++) {
            String c = col(2 + i);
            array(s, c + (CURVE_FIRST + 1) + ":" + c + (CURVE_FIRST + CURVE_ROWS),
                    "=MIX.EXCESSVOLUME(card;" + curve + ";" + c + "$4)");
        }
        int end = CURVE_FIRST + CURVE_ROWS;
        prop(s, "A" + (PLOT_FIRST + 1) + ":A" + end, "NumberFormat", formats.key("0.0000"));
        prop(s, "B" + (PLOT_FIRST + 1) + ":F" + end, "NumberFormat", formats.key("0.0000"));
        prop(s, "G" + (PLOT_FIRST + 1) + ":G" + end, "NumberFormat", formats.key("+0.000;-0.000;0.000"));
        widths(s, 24, 24, 26, 26, 26, 26, 30, 30);
    }

    // --- charts

    private static void addCharts(XSpreadsheet fit) throws Exception {
        short plot = 4;
        int last = CURVE_FIRST + CURVE_ROWS - 1;
        int lastPoint = PLOT_FIRST + LAB_ROOM - 1;
        XDiagram d = chart(fit, DATA_CHART, new CellRangeAddress[] {
            new CellRangeAddress(plot, 0, PLOT_HEAD, 0, last),
            new CellRangeAddress(plot, 1, PLOT_HEAD, 1 + TEMPERATURES.length, last)}, 0,
                "Excess molar volume: from each measured density (dots) and from the fitted card (lines)",
                "Vᴱ, cm³/mol", "0.0", true);
        points(d.getDataRowProperties(1), 0x303030, 130);
        int[] colours = {0x2E6FB0, 0x3A9E5C, 0xD98A1E, 0xC0392B};
        for (int i = 0; i < TEMPERATURES.length; i++) {
            XPropertySet p = d.getDataRowProperties(2 + i);
            p.setPropertyValue("Color", colours[i]);
            p.setPropertyValue("LineWidth", 35);
            p.setPropertyValue("SymbolType", ChartSymbolType.NONE);
        }
        XDiagram r = chart(fit, RESIDUAL_CHART, new CellRangeAddress[] {
            new CellRangeAddress(plot, 0, PLOT_HEAD, 0, lastPoint),
            new CellRangeAddress(plot, PLOT_RESIDUAL, PLOT_HEAD, PLOT_RESIDUAL, lastPoint)}, CHART_HEIGHT + 600,
                "Residuals of the fit: density measured − density of the card (result \"residuals\")",
                "ρ measured − ρ fitted, kg/m³", "0.00", false);
        points(r.getDataRowProperties(1), 0xC0392B, 150);
    }

    private static void points(XPropertySet series, int colour, int size) throws Exception {
        series.setPropertyValue("LineStyle", com.sun.star.drawing.LineStyle.NONE);
        series.setPropertyValue("SymbolType", 8);
        series.setPropertyValue("SymbolSize", new Size(size, size));
        series.setPropertyValue("Color", colour);
    }

    private static final int CHART_HEIGHT = 10000;

    /** One XY chart on the Fit sheet, {@code below} 1/100 mm under the top of cell J5; returns its diagram. */
    private static XDiagram chart(XSpreadsheet s, String name, CellRangeAddress[] ranges, int below, String title,
            String yTitle, String yFormat, boolean legend) throws Exception {
        XTableCharts charts = UnoRuntime.queryInterface(XTableChartsSupplier.class, s).getCharts();
        XPropertySet anchor = UnoRuntime.queryInterface(XPropertySet.class, s.getCellByPosition(9, 4));
        com.sun.star.awt.Point p = (com.sun.star.awt.Point) anchor.getPropertyValue("Position");
        charts.addNewByName(name, new Rectangle(p.X, p.Y + below, 18000, CHART_HEIGHT), ranges, true, false);
        Object chart = UnoRuntime.queryInterface(XNameAccess.class, charts).getByName(name);
        XChartDocument cd = UnoRuntime.queryInterface(XChartDocument.class,
                UnoRuntime.queryInterface(XEmbeddedObjectSupplier.class, chart).getEmbeddedObject());
        XDiagram d = ExampleWorkbooks.xyDiagram(cd, title, 10f);
        XPropertySet cp = UnoRuntime.queryInterface(XPropertySet.class, cd);
        cp.setPropertyValue("HasLegend", legend);
        if (legend) {
            UnoRuntime.queryInterface(XPropertySet.class, cd.getLegend()).setPropertyValue("Alignment",
                    ChartLegendPosition.BOTTOM);
        }
        XPropertySet dp = UnoRuntime.queryInterface(XPropertySet.class, d);
        dp.setPropertyValue("Lines", Boolean.TRUE);
        dp.setPropertyValue("SymbolType", ChartSymbolType.NONE);
        // rows without a measurement hold no number: leave them out rather than join across them
        dp.setPropertyValue("MissingValueTreatment", com.sun.star.chart.MissingValueTreatment.LEAVE_GAP);
        dp.setPropertyValue("HasXAxisTitle", Boolean.TRUE);
        dp.setPropertyValue("HasYAxisTitle", Boolean.TRUE);
        ExampleWorkbooks.moleFractionAxis(d, "ethanol mole fraction x", formats.key("0.0"));
        XAxisYSupplier ys = UnoRuntime.queryInterface(XAxisYSupplier.class, d);
        UnoRuntime.queryInterface(XPropertySet.class, ys.getYAxisTitle()).setPropertyValue("String", yTitle);
        XPropertySet yAxis = ys.getYAxis();
        yAxis.setPropertyValue("LinkNumberFormatToSource", Boolean.FALSE);
        yAxis.setPropertyValue("NumberFormat", formats.key(yFormat));
        return d;
    }

    // --- small helpers


    private static void result(XSpreadsheet s, int row, String label, String formula, String unit, String format)
            throws Exception {
        text(s, 0, row, label);
        s.getCellByPosition(1, row).setFormula(formula);
        if (!unit.isEmpty()) {
            text(s, 2, row, unit);
        }
        prop(s, "B" + (row + 1), "NumberFormat", formats.key(format));
    }
}
