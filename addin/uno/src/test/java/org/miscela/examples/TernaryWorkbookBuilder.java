package org.miscela.examples;

import static org.miscela.examples.ExampleWorkbooks.CAUTION_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.INPUT_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.INVENTED_COLOUR;
import static org.miscela.examples.ExampleWorkbooks.band;
import static org.miscela.examples.ExampleWorkbooks.bold;
import static org.miscela.examples.ExampleWorkbooks.col;
import static org.miscela.examples.ExampleWorkbooks.head;
import static org.miscela.examples.ExampleWorkbooks.merge;
import static org.miscela.examples.ExampleWorkbooks.nameRange;
import static org.miscela.examples.ExampleWorkbooks.pageSetup;
import static org.miscela.examples.ExampleWorkbooks.prop;
import static org.miscela.examples.ExampleWorkbooks.rowHeight;
import static org.miscela.examples.ExampleWorkbooks.sheet;
import static org.miscela.examples.ExampleWorkbooks.text;
import static org.miscela.examples.ExampleWorkbooks.widths;
import static org.miscela.examples.ExampleWorkbooks.wrapped;

import com.sun.star.awt.Rectangle;
import com.sun.star.awt.Size;
import com.sun.star.beans.PropertyValue;
import com.sun.star.beans.XPropertySet;
import com.sun.star.chart.ChartLegendPosition;
import com.sun.star.chart.ChartSymbolType;
import com.sun.star.chart.XAxisXSupplier;
import com.sun.star.chart.XAxisYSupplier;
import com.sun.star.chart.XDiagram;
import com.sun.star.chart.XDiagramPositioning;
import com.sun.star.chart2.DataPointCustomLabelField;
import com.sun.star.chart2.DataPointCustomLabelFieldType;
import com.sun.star.chart2.DataPointLabel;
import com.sun.star.chart2.XChartTypeContainer;
import com.sun.star.chart2.XCoordinateSystemContainer;
import com.sun.star.chart2.XDataPointCustomLabelField;
import com.sun.star.chart2.XDataSeries;
import com.sun.star.chart2.XDataSeriesContainer;
import com.sun.star.container.XNameAccess;
import com.sun.star.container.XNameContainer;
import com.sun.star.document.XEmbeddedObjectSupplier;
import com.sun.star.lang.XComponent;
import com.sun.star.lang.XMultiServiceFactory;
import com.sun.star.sheet.ConditionOperator;
import com.sun.star.sheet.XArrayFormulaRange;
import com.sun.star.sheet.XSheetConditionalEntries;
import com.sun.star.sheet.XSpreadsheet;
import com.sun.star.sheet.XSpreadsheets;
import com.sun.star.style.XStyleFamiliesSupplier;
import com.sun.star.table.CellAddress;
import com.sun.star.table.CellRangeAddress;
import com.sun.star.table.XTableCharts;
import com.sun.star.table.XTableChartsSupplier;
import com.sun.star.uno.UnoRuntime;
import com.sun.star.uno.XComponentContext;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.miscela.core.card.Card;
import org.miscela.core.functions.CardFunctions;
import org.miscela.core.card.CardReader;
import org.miscela.core.card.Extrapolation;
import org.miscela.core.functions.PropertyKind;
import org.miscela.examples.ExampleWorkbooks.Formats;
import org.miscela.it.Office;

/**
 * Builds the example workbook examples/ternary-blend.ods from nothing, through a real office with the built
 * extension installed: a three-component heat-transfer fluid of the invented company Tarnwick Fluid Works. The
 * company, its product, its recipe and every coefficient on the card are invented.
 *
 * <p>Sheets: Overview (inputs, cautions, a ternary plot drawn as an XY chart), Card (a version-2 card), Grid (66
 * compositions across the triangle, array formulas), Batch (a recipe in kg and its heats), Audit (MIX.TRACE re-derived
 * by native formulas), Plot (the chart's coordinates). The constants that locate cells are shared with ExamplesIT.
 *
 * <p>Run: {@code mvn -q -B test-compile exec:java -pl addin/uno -Dexec.classpathScope=test
 * -Dexec.mainClass=org.miscela.examples.TernaryWorkbookBuilder -Dmiscela.oxt=$PWD/addin/uno/target/miscela.oxt}
 * (optional argument: the output file).
 */
public final class TernaryWorkbookBuilder {
    static final String FILE = "ternary-blend.ods";
    private static final String[] COMPONENTS = {"propylene glycol", "water", "glycerol"};

    // --- where things are (0-based rows and columns); the package-visible ones are read by ExamplesIT

    /** Card sheet: the card's first row; the named range spans columns A..E. */
    private static final int CARD_TOP = 5;
    private static final int CARD_COLUMNS = 5;

    /** Overview sheet: the temperature of the grid and the three density band limits, column B. */
    static final int OVERVIEW_TEMPERATURE_ROW = 4;
    private static final int OVERVIEW_BAND_ROW = 5;
    static final String CHART_NAME = "composition-triangle";

    /** Grid sheet: header row, first composition row, number of compositions (step 0.1 in two fractions). */
    static final String GRID_TEMPERATURE_CELL = "D4";
    private static final int GRID_HEAD = 6;
    static final int GRID_FIRST = 7;
    private static final int GRID_STEPS = 10;
    static final int GRID_ROWS = (GRID_STEPS + 1) * (GRID_STEPS + 2) / 2;
    /** Grid columns: x of the three components from B, then density, excess volume, inside. */
    static final int GRID_X = 1;
    static final int GRID_DENSITY = 4;
    static final int GRID_EXCESS = 5;
    static final int GRID_INSIDE = 6;
    /** Partial molar volumes (columns I..K) for the rows whose glycerol fraction is 0.1: a line across the inside. */
    static final int GRID_PARTIAL = 8;
    static final int PARTIAL_FIRST = GRID_FIRST + GRID_STEPS + 1;
    static final int PARTIAL_ROWS = GRID_STEPS;
    /** Plot sheet (the chart's data): header row, first point row; columns label, X, Y, then one Y per series. */
    private static final short PLOT_SHEET = 5;
    private static final int PLOT_HEAD = 3;
    private static final int PLOT_FIRST = 4;
    private static final int PLOT_LABEL = 0;
    private static final int PLOT_X = 1;
    private static final int PLOT_Y = 2;
    private static final int FIRST_SERIES = 3;
    private static final int BAND_SERIES = FIRST_SERIES;
    private static final int BANDS = 4;
    private static final int OUTSIDE_SERIES = BAND_SERIES + BANDS;
    private static final int EDGE_SERIES = OUTSIDE_SERIES + 1;
    private static final int BATCH_SERIES = EDGE_SERIES + 1;
    private static final int GRIDLINE_SERIES = BATCH_SERIES + 1;
    private static final int LAST_SERIES = GRIDLINE_SERIES;
    /** Rows below the points: the triangle's corners, the batch, then gridline segments (two ends and a gap each). */
    private static final int EDGE_FIRST = PLOT_FIRST + GRID_ROWS;
    private static final int BATCH_PLOT_ROW = EDGE_FIRST + 4;
    private static final int GRIDLINE_FIRST = BATCH_PLOT_ROW + 1;
    private static final int GRIDLINE_ROWS = 3 * (GRID_STEPS - 1) * 3;
    private static final int PLOT_LAST = GRIDLINE_FIRST + GRIDLINE_ROWS - 1;

    /** Batch sheet: starting temperature (B5), recipe rows (B8:B10 in kg), results and the top-up. */
    static final int BATCH_TEMPERATURE_ROW = 4;
    static final int RECIPE_FIRST = 7;
    private static final double[] RECIPE_KG = {400.0, 520.0, 80.0};
    static final int MIXING_HEAT_ROW = 16;
    static final int RISE_ROW = 18;
    static final int BATCH_DENSITY_ROW = 20;
    static final int TOP_UP_ROW = 24;
    private static final double TOP_UP_WATER_KG = 100.0;
    static final int ADDITION_HEAT_ROW = 29;

    /** Audit sheet: composition B5:B7, temperature B8, pass cell B10, largest residual B11, trace from A14. */
    private static final double[] AUDIT_X = {0.30, 0.60, 0.10};
    private static final double AUDIT_TEMPERATURE = 25.0;
    static final int AUDIT_X_ROW = 4;
    static final int AUDIT_TEMPERATURE_ROW = 7;
    static final int AUDIT_PASS_ROW = 9;
    static final int AUDIT_RESIDUAL_ROW = 10;
    static final int TRACE_TOP = 13;
    private static final String AUDIT_COMPOSITION = "$B$5:$B$7";
    private static final String AUDIT_T = "$B$8";
    /** The largest relative difference between a hand re-derivation and the add-in that still passes. */
    static final double AUDIT_TOLERANCE = 1e-12;

    private static final int[] BAND_COLOURS = {0xA6DDB9, 0x4CB5A0, 0x23808F, 0x1E4A70};
    private static final int[] DEFAULT_BAND_LIMITS = {1040, 1090, 1140};
    private static final int OUTSIDE_COLOUR = 0xC4C4C4;
    private static final int EDGE_COLOUR = 0x505050;
    private static final int GRIDLINE_COLOUR = 0xD0D0D0;
    private static final int BATCH_COLOUR = 0xE2571E;
    private static final int PASS_COLOUR = 0xD8EFD3;

    private static final String CARD = "card";
    private static Formats formats;

    private TernaryWorkbookBuilder() {
    }

    public static void main(String[] args) throws Exception {
        ExampleWorkbooks.buildAndSave(FILE, args, TernaryWorkbookBuilder::build);
    }

    static void build(XComponent doc, XComponentContext context) throws Exception {
        XSpreadsheets sheets = ExampleWorkbooks.nameSheets(doc, "Overview", "Card", "Grid", "Batch", "Audit",
                "Plot");
        formats = new Formats(doc);
        writeCard(sheet(sheets, "Card"));
        nameRange(doc, CARD, "$Card.$A$" + (CARD_TOP + 1) + ":$" + col(CARD_COLUMNS - 1) + "$"
                + (CARD_TOP + CARD_ROWS.length));
        writeOverview(sheet(sheets, "Overview"));
        writeGrid(doc, sheet(sheets, "Grid"));
        writeBatch(sheet(sheets, "Batch"));
        writeAudit(sheet(sheets, "Audit"));
        writePlot(sheet(sheets, "Plot"));
        addTriangleChart(sheet(sheets, "Overview"), context);
        pageSetup(doc);
        ExampleWorkbooks.portraitFullWidth(doc, sheet(sheets, "Grid"), sheet(sheets, "Plot"));
    }

    // --- the card

    /** One card row: label, the values of columns B..E (String, Double or absent), and what it says. */
    private static final class CardRow {
        final String label;
        final Object[] values;
        final String says;

        CardRow(String label, String says, Object... values) {
            this.label = label;
            this.says = says;
            this.values = values;
        }
    }

    private static final String WHY_TOOP = "Toop, water asymmetric: propylene glycol and glycerol are both polyols "
            + "and alike, while water differs from both in kind, so water keeps its own mole fraction in both water "
            + "pairs and only the polyol pair is taken at its own ratio.";

    /** The card, every coefficient invented (molar masses are ordinary rounded values). */
    private static final CardRow[] CARD_ROWS = {
        new CardRow("Miscela card", "card format version 2 (model, enthalpy, heat capacity and pair-limit rows)", 2.0),
        new CardRow("# invented", "a comment row (label starts with #): the reader skips it",
                "every coefficient below is invented"),
        new CardRow("title", "", "Propylene glycol + water + glycerol, TFW-40 (invented coefficients)"),
        new CardRow("source", "where the numbers come from: nowhere, they are invented",
                "Invented for the Miscela ternary example; not measured"),
        new CardRow("temperature unit", "", "°C"),
        new CardRow("density unit", "", "kg/m³"),
        new CardRow("molar volume unit", "", "cm³/mol"),
        new CardRow("molar mass unit", "", "g/mol"),
        new CardRow("enthalpy unit", "Hᴱ in kJ/mol, heat capacities in kJ/(mol·K), heats of a batch in kJ", "kJ/mol"),
        new CardRow("valid temperature", "the functions refuse outside 0..40 °C (the span of the water formula)", 0.0,
                40.0),
        new CardRow("extrapolation", "outside the limits the functions refuse, unless a call passes TRUE", "refuse"),
        new CardRow("multicomponent model", "how the three pairs combine; why Toop: see the note row below",
                "Toop", "water"),
        new CardRow("note", "a note row: it stays with the card and the reader ignores it", WHY_TOOP),
        new CardRow("component", "component 1 (x1 is its mole fraction); molar mass g/mol", COMPONENTS[0], 76.094),
        new CardRow("component", "component 2", COMPONENTS[1], 18.015),
        new CardRow("component", "component 3, the additive", COMPONENTS[2], 92.094),
        new CardRow("density model", "", COMPONENTS[0], "polynomial"),
        new CardRow("density reference temperature", "", COMPONENTS[0], 20.0),
        new CardRow("density coefficients", "ρ = 1036 − 0.74·(T − 20 °C) kg/m³ (invented)", COMPONENTS[0], 1036.0,
                -0.74),
        new CardRow("density model", "the add-in's built-in water formula (Tanaka et al. 2001), not invented",
                COMPONENTS[1], "Tanaka 2001"),
        new CardRow("density model", "", COMPONENTS[2], "polynomial"),
        new CardRow("density reference temperature", "", COMPONENTS[2], 20.0),
        new CardRow("density coefficients", "ρ = 1261 − 0.63·(T − 20 °C) kg/m³ (invented)", COMPONENTS[2], 1261.0,
                -0.63),
        new CardRow("valid mole fraction", "glycerol at most 0.4: the invented data stop there", COMPONENTS[2], 0.0,
                0.4),
        new CardRow("valid pair mole fraction", "per-pair limit: x(glycerol)/(x(glycerol) + x(propylene glycol)) at "
                + "most 0.6; checked where both are present",
                "glycerol + propylene glycol", 0.0, 0.6),
        new CardRow("excess volume reference temperature", "", "propylene glycol + water", 20.0),
        new CardRow("excess volume A0", "A0 = −1.45 − 0.006·(T − 20 °C) cm³/mol (invented)",
                "propylene glycol + water", -1.45, -0.006),
        new CardRow("excess volume A1", "Toop reads this pair water first, so the trace shows A1 with its sign "
                + "changed", "propylene glycol + water", 0.38),
        new CardRow("excess volume A2", "(invented)", "propylene glycol + water", -0.22),
        new CardRow("excess volume reference temperature", "", "water + glycerol", 20.0),
        new CardRow("excess volume A0", "A0 = −1.05 − 0.004·(T − 20 °C) cm³/mol (invented)", "water + glycerol",
                -1.05, -0.004),
        new CardRow("excess volume A1", "(invented)", "water + glycerol", 0.30),
        new CardRow("excess volume A0", "the two polyols mix almost ideally (invented)", "propylene glycol + glycerol",
                -0.18),
        new CardRow("excess volume ternary C0", "ternary term x1·x2·x3·(C0 + C1·x1) cm³/mol (invented)",
                "propylene glycol + water + glycerol", 0.9),
        new CardRow("excess volume ternary C1", "(invented)", "propylene glycol + water + glycerol", -0.6),
        new CardRow("excess enthalpy reference temperature", "", "propylene glycol + water", 25.0),
        new CardRow("excess enthalpy A0", "kJ/mol; negative: mixing releases heat (invented)",
                "propylene glycol + water", -2.9, 0.012),
        new CardRow("excess enthalpy A1", "(invented)", "propylene glycol + water", 1.1),
        new CardRow("excess enthalpy reference temperature", "", "water + glycerol", 25.0),
        new CardRow("excess enthalpy A0", "(invented)", "water + glycerol", -2.2, 0.009),
        new CardRow("excess enthalpy A1", "(invented)", "water + glycerol", 0.6),
        new CardRow("excess enthalpy A0", "slightly endothermic (invented)", "propylene glycol + glycerol", 0.25),
        new CardRow("heat capacity reference temperature", "", COMPONENTS[0], 25.0),
        new CardRow("heat capacity", "Cp = 0.189 + 0.0004·(T − 25 °C) kJ/(mol·K) (invented)", COMPONENTS[0], 0.189,
                0.0004),
        new CardRow("heat capacity", "kJ/(mol·K), approximate and not from a cited source", COMPONENTS[1], 0.0753),
        new CardRow("heat capacity", "kJ/(mol·K) (invented)", COMPONENTS[2], 0.219),
    };

    /** The card's cells as Calc hands them to the add-in (blank cells as empty text). */
    private static Object[][] cardCells() {
        Object[][] cells = new Object[CARD_ROWS.length][CARD_COLUMNS];
        for (int r = 0; r < CARD_ROWS.length; r++) {
            cells[r][0] = CARD_ROWS[r].label;
            for (int c = 1; c < CARD_COLUMNS; c++) {
                Object v = c - 1 < CARD_ROWS[r].values.length ? CARD_ROWS[r].values[c - 1] : null;
                cells[r][c] = v == null ? "" : v;
            }
        }
        return cells;
    }

    /** The absolute address of a value on the card: the row with this label and subject, value column (B = 0). */
    private static String cardCell(String label, String subject, int valueColumn) {
        for (int r = 0; r < CARD_ROWS.length; r++) {
            CardRow row = CARD_ROWS[r];
            if (row.label.equals(label) && (subject == null || subject.equals(row.values[0]))) {
                return "$Card.$" + col(1 + valueColumn) + "$" + (CARD_TOP + r + 1);
            }
        }
        throw new IllegalArgumentException("no card row " + label + " | " + subject);
    }

    private static void writeCard(XSpreadsheet s) throws Exception {
        text(s, 0, 0, "Miscela card: propylene glycol + water + glycerol for the Tarnwick Fluid Works example "
                + "(invented company)");
        bold(s, "A1", 13);
        text(s, 0, 1, "INVENTED VALUES. Every density, excess volume, excess enthalpy, heat capacity and limit on "
                + "this card was made up to show how the add-in handles three components. Only the molar masses "
                + "(rounded) and the built-in water formula are ordinary reference values. Do not use this card "
                + "for real blending, design or trade.");
        band(s, "A2:G2", INVENTED_COLOUR);
        bold(s, "A2", 10);
        wrapped(s, "A2:G2", 1);
        rowHeight(s, 1, 1400);
        text(s, 0, 2, "The named range 'card' covers A" + (CARD_TOP + 1) + ":E" + (CARD_TOP + CARD_ROWS.length)
                + ". Labels are in column A and values to their right; in keyed rows column B names the component, "
                + "the pair or the triple. Rows labelled note or starting with # are comments. Column G explains "
                + "each row.");
        wrapped(s, "A3:G3", 2);
        text(s, 0, 3, "Card check (MIX.CHECK)");
        bold(s, "A4", 10);
        s.getCellByPosition(1, 3).setFormula("=MIX.CHECK(card)");
        String[] heads = {"label", "subject / value", "value", "value", "value", "", "what the row says"};
        for (int c = 0; c < heads.length; c++) {
            text(s, c, CARD_TOP - 1, heads[c]);
        }
        head(s, "A" + CARD_TOP + ":G" + CARD_TOP);
        Object[][] cells = cardCells();
        for (int r = 0; r < cells.length; r++) {
            for (int c = 0; c < CARD_COLUMNS; c++) {
                Object v = cells[r][c];
                if (v instanceof Double) {
                    s.getCellByPosition(c, CARD_TOP + r).setValue((Double) v);
                } else if (!((String) v).isEmpty()) {
                    text(s, c, CARD_TOP + r, (String) v);
                }
            }
            text(s, 6, CARD_TOP + r, CARD_ROWS[r].says);
        }
        int last = CARD_TOP + CARD_ROWS.length;
        band(s, "A" + (CARD_TOP + 1) + ":E" + last, INVENTED_COLOUR);
        prop(s, "G" + (CARD_TOP + 1) + ":G" + last, "CharPosture", com.sun.star.awt.FontSlant.ITALIC);
        int note = CARD_TOP + indexOfLabel("note");
        // the reason for the model is a sentence: let it wrap within its row
        prop(s, "B" + (note + 1), "IsTextWrapped", Boolean.TRUE);
        prop(s, "B" + (note + 1), "VertJustify", com.sun.star.table.CellVertJustify2.TOP);
        prop(s, "A" + (note + 1) + ":G" + (note + 1), "VertJustify", com.sun.star.table.CellVertJustify2.TOP);
        merge(s, "B" + (note + 1) + ":E" + (note + 1));
        rowHeight(s, note, textHeight(WHY_TOOP, 66 + 20 + 16 + 14));
        text(s, 0, last + 1, "Replace the shaded values only with coefficients of your own whose source you know, and "
                + "write that source in the 'source' row.");
        wrapped(s, "A" + (last + 2) + ":G" + (last + 2), last + 1);
        widths(s, 72, 66, 20, 16, 14, 4, 120);
    }

    private static int indexOfLabel(String label) {
        for (int r = 0; r < CARD_ROWS.length; r++) {
            if (CARD_ROWS[r].label.equals(label)) {
                return r;
            }
        }
        throw new IllegalArgumentException(label);
    }

    // --- Overview

    private static void writeOverview(XSpreadsheet s) throws Exception {
        text(s, 0, 0, "Tarnwick Fluid Works (invented company): TFW-40 heat-transfer fluid of propylene glycol, "
                + "water and glycerol");
        bold(s, "A1", 14);
        text(s, 0, 1, "INVENTED SCENARIO AND DATA. The company, the product, the recipe and every coefficient on "
                + "sheet Card are made up to show how the Miscela functions work with three components. They are "
                + "not measured properties of any fluid.");
        band(s, "A2:N2", INVENTED_COLOUR);
        bold(s, "A2", 10);
        wrapped(s, "A2:N2", 1);

        text(s, 0, 3, "Inputs (change the blue cells)");
        head(s, "A4:C4");
        inputRow(s, OVERVIEW_TEMPERATURE_ROW, "Temperature of the grid and the triangle", 20.0, "°C", "0.0");
        for (int b = 0; b < DEFAULT_BAND_LIMITS.length; b++) {
            inputRow(s, OVERVIEW_BAND_ROW + b, "Density band limit " + (b + 1) + " (colours of the triangle)",
                    DEFAULT_BAND_LIMITS[b], "kg/m³", "0");
        }
        int row = OVERVIEW_BAND_ROW + DEFAULT_BAND_LIMITS.length;
        text(s, 0, row, "Card check (MIX.CHECK)");
        s.getCellByPosition(1, row).setFormula("=MIX.CHECK(card)");
        prop(s, "B" + (row + 1), "HoriJustify", com.sun.star.table.CellHoriJustify.RIGHT);
        row++;
        text(s, 0, row, "Grid points inside every limit of the card (of " + GRID_ROWS + ")");
        s.getCellByPosition(1, row).setFormula("=SUMPRODUCT(" + gridColumn(GRID_INSIDE, true) + ")");

        row += 2;
        text(s, 0, row, "The workbook");
        head(s, "A" + (row + 1) + ":C" + (row + 1));
        String[] directory = {
            "Triangle (right): each dot is one composition of sheet Grid, coloured by its density band; a corner "
                    + "is a pure component and the faint lines mark steps of 0.1 in each mole fraction. Grey dots lie "
                    + "outside the card's limits, the diamond is the batch of sheet Batch.",
            "Card: the version-2 card (named range 'card'): three components, Toop's model, a ternary term, a "
                    + "per-pair limit, excess enthalpy and heat capacities.",
            "Grid: " + GRID_ROWS + " compositions in steps of 0.1; density, Vᴱ and MIX.INSIDE as one array formula "
                    + "per column; partial molar volumes along x(glycerol) = 0.1.",
            "Batch: a 1000 kg recipe in kg; heat of mixing, adiabatic temperature rise with its assumptions, and "
                    + "the heat of a water top-up.",
            "Audit: MIX.TRACE for one composition beside native formulas that re-derive it, with a pass/fail cell.",
        };
        for (String d : directory) {
            row++;
            fitted(s, "A" + (row + 1) + ":C" + (row + 1), row, d, OVERVIEW_TEXT_MM);
        }

        row += 2;
        text(s, 0, row, "Cautions");
        head(s, "A" + (row + 1) + ":C" + (row + 1));
        band(s, "A" + (row + 1) + ":C" + (row + 1), CAUTION_COLOUR);
        String[] cautions = {
            "Flammable vapours. Warm glycols and glycerol give off more vapour, and their vapours and mists can "
                    + "burn; alcohols sometimes added to such fluids are flammable at room temperature. Heat, blend "
                    + "and transfer them only as your site's fire and hazardous-area rules allow.",
            "Exothermic mixing. These liquids release heat when mixed with water (the negative heats on sheet "
                    + "Batch). Plan cooling and the order and rate of addition; the temperature rise is an estimate "
                    + "without losses, not a safety rating.",
            "Custody transfer and overfilling. Densities and volumes here come from a model with invented "
                    + "coefficients and stated limits, not from calibrated measurement: do not use them to fill "
                    + "tanks, invoice, declare or label quantities.",
            "Local codes, safety data sheets and licensed practice take precedence over anything this workbook "
                    + "computes.",
        };
        for (String c : cautions) {
            row++;
            String a = "A" + (row + 1) + ":C" + (row + 1);
            fitted(s, a, row, c, OVERVIEW_TEXT_MM);
            band(s, a, CAUTION_COLOUR);
        }
        widths(s, 86, 22, 16, 4);
    }

    /**
     * Writes text into the first cell of a one-row range, merges and wraps it, and makes the row tall enough for the
     * number of lines the text needs at 10 pt in {@code widthMm} (about 2 mm a character).
     */
    private static void fitted(XSpreadsheet s, String range, int row, String text, int widthMm) throws Exception {
        String first = range.substring(0, range.indexOf(':'));
        UnoRuntime.queryInterface(com.sun.star.text.XText.class, s.getCellRangeByName(first).getCellByPosition(0, 0))
                .setString(text);
        merge(s, range);
        prop(s, range, "IsTextWrapped", Boolean.TRUE);
        prop(s, range, "VertJustify", com.sun.star.table.CellVertJustify2.TOP);
        rowHeight(s, row, textHeight(text, widthMm));
    }

    /** The row height, in 1/100 mm, for a text wrapped at 10 pt in {@code widthMm}. */
    private static int textHeight(String text, int widthMm) {
        int lines = (int) Math.ceil(text.length() * 1.85 / widthMm);
        return lines * 460 + 120;
    }

    private static void inputRow(XSpreadsheet s, int row, String label, double value, String unit, String format)
            throws Exception {
        text(s, 0, row, label);
        s.getCellByPosition(1, row).setValue(value);
        text(s, 2, row, unit);
        band(s, "B" + (row + 1), INPUT_COLOUR);
        prop(s, "B" + (row + 1), "NumberFormat", formats.key(format));
    }

    /** The width of columns A..C of the Overview, where its texts wrap. */
    private static final int OVERVIEW_TEXT_MM = 86 + 22 + 16;

    private static String overviewCell(int row) {
        return "$Overview.$B$" + (row + 1);
    }

    // --- Grid

    /** The grid's rows of one column, absolute, optionally with the sheet name. */
    private static String gridColumn(int c, boolean withSheet) {
        return (withSheet ? "$Grid." : "") + "$" + col(c) + "$" + (GRID_FIRST + 1) + ":$" + col(c) + "$"
                + (GRID_FIRST + GRID_ROWS);
    }

    private static String gridBlock(int firstRow, int rows) {
        return "$" + col(GRID_X) + "$" + (firstRow + 1) + ":$" + col(GRID_X + 2) + "$" + (firstRow + rows);
    }

    private static void writeGrid(XComponent doc, XSpreadsheet s) throws Exception {
        text(s, 0, 0, "Composition grid across the triangle: propylene glycol + water + glycerol (array formulas)");
        bold(s, "A1", 13);
        text(s, 0, 1, "Invented coefficients (sheet Card): the numbers show how the functions work, not the "
                + "properties of any real fluid.");
        band(s, "A2:K2", INVENTED_COLOUR);
        text(s, 0, 3, "Temperature, from Overview");
        merge(s, "A4:C4");
        s.getCellByPosition(3, 3).setFormula("=" + overviewCell(OVERVIEW_TEMPERATURE_ROW));
        text(s, 4, 3, "°C");
        prop(s, GRID_TEMPERATURE_CELL, "NumberFormat", formats.key("0.0"));
        fitted(s, "A5:K5", 4, "The grid spans the whole triangle, beyond the card's limits (glycerol at most 0.4; "
                + "glycerol at most 0.6 of the polyols). The density and Vᴱ columns therefore pass TRUE, the explicit "
                + "extrapolate argument; MIX.INSIDE flags every point, and values outside the limits are grey: "
                + "extrapolations of invented coefficients, not results. Each block is one call, entered as an array "
                + "formula.", 190);

        String[] heads = {"point", "x propylene glycol\nmol/mol", "x water\n= 1 − others", "x glycerol\nmol/mol",
            "ρ blend\nkg/m³", "Vᴱ\ncm³/mol", "inside\nlimits", "", "V̄ propylene glycol\ncm³/mol",
            "V̄ water\ncm³/mol", "V̄ glycerol\ncm³/mol"};
        for (int c = 0; c < heads.length; c++) {
            text(s, c, GRID_HEAD, heads[c]);
        }
        head(s, "A" + (GRID_HEAD + 1) + ":K" + (GRID_HEAD + 1));
        prop(s, "A" + (GRID_HEAD + 1) + ":K" + (GRID_HEAD + 1), "IsTextWrapped", Boolean.TRUE);
        prop(s, "A" + (GRID_HEAD + 1) + ":K" + (GRID_HEAD + 1), "HoriJustify",
                com.sun.star.table.CellHoriJustify.CENTER);
        rowHeight(s, GRID_HEAD, 1900);
        text(s, GRID_PARTIAL, GRID_HEAD - 1, "V̄ along x(glycerol) = 0.1, points "
                + (PARTIAL_FIRST - GRID_FIRST + 1) + "–" + (PARTIAL_FIRST - GRID_FIRST + PARTIAL_ROWS));
        prop(s, col(GRID_PARTIAL) + GRID_HEAD, "CharPosture", com.sun.star.awt.FontSlant.ITALIC);

        // outer loop over glycerol, so that each line of constant glycerol is a run of rows
        int r = GRID_FIRST;
        for (int j = 0; j <= GRID_STEPS; j++) {
            for (int i = 0; i <= GRID_STEPS - j; i++) {
                s.getCellByPosition(0, r).setValue(r - GRID_FIRST + 1);
                s.getCellByPosition(GRID_X, r).setValue(i / (double) GRID_STEPS);
                // rounded so that 1 − 0.3 − 0.7 is 0, not a tiny negative fraction the functions would refuse
                s.getCellByPosition(GRID_X + 1, r).setFormula("=ROUND(1-B" + (r + 1) + "-D" + (r + 1) + ";12)");
                s.getCellByPosition(GRID_X + 2, r).setValue(j / (double) GRID_STEPS);
                r++;
            }
        }
        String block = gridBlock(GRID_FIRST, GRID_ROWS);
        String t = "$" + GRID_TEMPERATURE_CELL.charAt(0) + "$" + GRID_TEMPERATURE_CELL.substring(1);
        array(s, gridColumn(GRID_DENSITY, false), "=MIX.DENSITY(card;" + block + ";" + t + ";TRUE())");
        array(s, gridColumn(GRID_EXCESS, false), "=MIX.EXCESSVOLUME(card;" + block + ";" + t + ";TRUE())");
        array(s, gridColumn(GRID_INSIDE, false), "=MIX.INSIDE(card;" + block + ";" + t + ")");
        String partialBlock = gridBlock(PARTIAL_FIRST, PARTIAL_ROWS);
        for (int k = 0; k < COMPONENTS.length; k++) {
            String range = col(GRID_PARTIAL + k) + (PARTIAL_FIRST + 1) + ":" + col(GRID_PARTIAL + k)
                    + (PARTIAL_FIRST + PARTIAL_ROWS);
            array(s, range, "=MIX.PARTIALVOLUME(card;" + (k + 1) + ";" + partialBlock + ";" + t + ")");
            prop(s, range, "NumberFormat", formats.key("0.000"));
        }
        prop(s, gridColumn(0, false), "NumberFormat", formats.key("0"));
        prop(s, "B" + (GRID_FIRST + 1) + ":D" + (GRID_FIRST + GRID_ROWS), "NumberFormat", formats.key("0.0"));
        prop(s, gridColumn(GRID_DENSITY, false), "NumberFormat", formats.key("0.00"));
        prop(s, gridColumn(GRID_EXCESS, false), "NumberFormat", formats.key("0.0000"));
        prop(s, gridColumn(GRID_INSIDE, false), "NumberFormat", formats.key("BOOLEAN"));
        prop(s, gridColumn(GRID_INSIDE, false), "HoriJustify", com.sun.star.table.CellHoriJustify.CENTER);
        greyWhenOutside(doc, s);
        int end = GRID_FIRST + GRID_ROWS;
        text(s, 0, end + 1, "ρ = density of the blend; Vᴱ = excess molar volume; V̄ = partial molar volume. Sheet "
                + "Plot turns these rows into the triangle on sheet Overview.");
        prop(s, "A" + (end + 2), "CharPosture", com.sun.star.awt.FontSlant.ITALIC);
        widths(s, 12, 22, 20, 20, 18, 17, 18, 3, 22, 20, 20);
    }

    /** Density and Vᴱ of points outside the card's limits in grey italics, by a conditional format on inside. */
    private static void greyWhenOutside(XComponent doc, XSpreadsheet s) throws Exception {
        XNameAccess families = UnoRuntime.queryInterface(XStyleFamiliesSupplier.class, doc).getStyleFamilies();
        XNameContainer cellStyles = UnoRuntime.queryInterface(XNameContainer.class,
                families.getByName("CellStyles"));
        Object style = UnoRuntime.queryInterface(XMultiServiceFactory.class, doc)
                .createInstance("com.sun.star.style.CellStyle");
        cellStyles.insertByName("Extrapolated", style);
        XPropertySet sp = UnoRuntime.queryInterface(XPropertySet.class, style);
        sp.setPropertyValue("CharColor", 0x8C8C8C);
        sp.setPropertyValue("CharPosture", com.sun.star.awt.FontSlant.ITALIC);
        String range = col(GRID_DENSITY) + (GRID_FIRST + 1) + ":" + col(GRID_EXCESS) + (GRID_FIRST + GRID_ROWS);
        XPropertySet rp = UnoRuntime.queryInterface(XPropertySet.class, s.getCellRangeByName(range));
        XSheetConditionalEntries entries = UnoRuntime.queryInterface(XSheetConditionalEntries.class,
                rp.getPropertyValue("ConditionalFormat"));
        entries.addNew(new PropertyValue[] {
            Office.property("Operator", ConditionOperator.FORMULA),
            Office.property("Formula1", "NOT($" + col(GRID_INSIDE) + (GRID_FIRST + 1) + ")"),
            Office.property("SourcePosition", new CellAddress((short) 2, GRID_DENSITY, GRID_FIRST)),
            Office.property("StyleName", "Extrapolated"),
        });
        rp.setPropertyValue("ConditionalFormat", entries);
    }

    /**
     * The triangle's data: X = x(water) + x(glycerol)/2 and Y = x(glycerol)·√3/2 put propylene glycol at (0, 0),
     * water at (1, 0) and glycerol at (1/2, √3/2). Each series column repeats Y where a point belongs to it and is
     * empty text elsewhere, which the chart leaves out; below the points come the corners, the batch and the
     * gridlines.
     */
    private static void writePlot(XSpreadsheet s) throws Exception {
        text(s, 0, 0, "Plot data: the composition triangle on sheet Overview, drawn as an XY chart");
        bold(s, "A1", 13);
        fitted(s, "A2:K2", 1, "X = x(water) + x(glycerol)/2 and Y = x(glycerol)·√3/2 put propylene glycol at (0, 0), "
                + "water at (1, 0) and glycerol at (½, √3/2). Each series column repeats Y where a point belongs to "
                + "that series and is empty text elsewhere, which the chart leaves out. The points are the rows of "
                + "sheet Grid, in order; blank rows end a gridline.", 250);
        text(s, PLOT_LABEL, PLOT_HEAD, "row");
        text(s, PLOT_X, PLOT_HEAD, "X = x water + x glycerol/2");
        text(s, PLOT_Y, PLOT_HEAD, "Y = x glycerol·√3/2");
        String[] limits = new String[DEFAULT_BAND_LIMITS.length];
        for (int b = 0; b < limits.length; b++) {
            limits[b] = overviewCell(OVERVIEW_BAND_ROW + b);
        }
        String[] bandNames = {
            "=\"ρ < \"&" + limits[0] + "&\" kg/m³\"",
            "=" + limits[0] + "&\"–\"&" + limits[1] + "&\" kg/m³\"",
            "=" + limits[1] + "&\"–\"&" + limits[2] + "&\" kg/m³\"",
            "=\"ρ ≥ \"&" + limits[2] + "&\" kg/m³\"",
        };
        for (int b = 0; b < BANDS; b++) {
            s.getCellByPosition(BAND_SERIES + b, PLOT_HEAD).setFormula(bandNames[b]);
        }
        text(s, OUTSIDE_SERIES, PLOT_HEAD, "outside the card's limits (extrapolated)");
        text(s, EDGE_SERIES, PLOT_HEAD, "triangle edges");
        text(s, BATCH_SERIES, PLOT_HEAD, "the batch on sheet Batch");
        text(s, GRIDLINE_SERIES, PLOT_HEAD, "lines of constant mole fraction, step 0.1");
        String headRange = col(PLOT_LABEL) + (PLOT_HEAD + 1) + ":" + col(LAST_SERIES) + (PLOT_HEAD + 1);
        head(s, headRange);
        prop(s, headRange, "IsTextWrapped", Boolean.TRUE);
        prop(s, headRange, "HoriJustify", com.sun.star.table.CellHoriJustify.CENTER);
        rowHeight(s, PLOT_HEAD, 1300);
        for (int i = 0; i < GRID_ROWS; i++) {
            int r = PLOT_FIRST + i;
            int g = GRID_FIRST + i + 1;
            String inside = "$Grid.$G$" + g;
            String rho = "$Grid.$E$" + g;
            String y = "$" + col(PLOT_Y) + (r + 1);
            text(s, PLOT_LABEL, r, "Grid point " + (i + 1));
            s.getCellByPosition(PLOT_X, r).setFormula("=$Grid.$C$" + g + "+$Grid.$D$" + g + "/2");
            s.getCellByPosition(PLOT_Y, r).setFormula("=$Grid.$D$" + g + "*SQRT(3)/2");
            String[] conditions = {
                rho + "<" + limits[0],
                rho + ">=" + limits[0] + ";" + rho + "<" + limits[1],
                rho + ">=" + limits[1] + ";" + rho + "<" + limits[2],
                rho + ">=" + limits[2],
            };
            for (int b = 0; b < BANDS; b++) {
                s.getCellByPosition(BAND_SERIES + b, r).setFormula("=IF(AND(" + inside + ";" + conditions[b] + ");"
                        + y + ";\"\")");
            }
            s.getCellByPosition(OUTSIDE_SERIES, r).setFormula("=IF(" + inside + ";\"\";" + y + ")");
        }
        String[] corners = {"corner: " + COMPONENTS[0], "corner: " + COMPONENTS[1], "corner: " + COMPONENTS[2],
            "back to the first corner"};
        String[][] cornerXy = {{"0", "0"}, {"1", "0"}, {"0.5", "=SQRT(3)/2"}, {"0", "0"}};
        for (int i = 0; i < corners.length; i++) {
            int r = EDGE_FIRST + i;
            text(s, PLOT_LABEL, r, corners[i]);
            s.getCellByPosition(PLOT_X, r).setFormula(cornerXy[i][0]);
            s.getCellByPosition(EDGE_SERIES, r).setFormula(cornerXy[i][1]);
        }
        text(s, PLOT_LABEL, BATCH_PLOT_ROW, "the batch");
        String xWater = "$Batch.$E$" + (RECIPE_FIRST + 2);
        String xGlycerol = "$Batch.$E$" + (RECIPE_FIRST + 3);
        s.getCellByPosition(PLOT_X, BATCH_PLOT_ROW).setFormula("=" + xWater + "+" + xGlycerol + "/2");
        s.getCellByPosition(BATCH_SERIES, BATCH_PLOT_ROW).setFormula("=" + xGlycerol + "*SQRT(3)/2");
        writeGridlines(s);
        prop(s, col(PLOT_X) + (PLOT_FIRST + 1) + ":" + col(LAST_SERIES) + (PLOT_LAST + 1), "NumberFormat",
                formats.key("0.0000"));
        widths(s, 46, 24, 24, 22, 22, 22, 22, 30, 20, 22, 30);
    }

    /**
     * Segments of constant mole fraction 0.1 … 0.9 for each component, from edge to edge: (X, Y) of both ends and a
     * blank row, where the chart leaves a gap.
     */
    private static void writeGridlines(XSpreadsheet s) throws Exception {
        int r = GRIDLINE_FIRST;
        for (int k = 0; k < 3; k++) {
            for (int level = 1; level < GRID_STEPS; level++) {
                double v = level / (double) GRID_STEPS;
                double[][] ends = new double[2][];
                // the other two components share 1 − v: all of it to one, then all of it to the other
                for (int e = 0; e < 2; e++) {
                    double[] x = new double[3];
                    x[k] = v;
                    x[(k + 1 + e) % 3] = 1.0 - v;
                    ends[e] = x;
                }
                text(s, PLOT_LABEL, r, "gridline x " + COMPONENTS[k] + " = " + v);
                for (double[] x : ends) {
                    s.getCellByPosition(PLOT_X, r).setValue(x[1] + x[2] / 2);
                    s.getCellByPosition(GRIDLINE_SERIES, r).setValue(x[2] * Math.sqrt(3) / 2);
                    r++;
                }
                r++;
            }
        }
    }

    // --- Batch

    private static void writeBatch(XSpreadsheet s) throws Exception {
        text(s, 0, 0, "Batch sheet: one 1000 kg batch of TFW-40 (invented recipe and coefficients)");
        bold(s, "A1", 13);
        text(s, 0, 1, "Invented scenario: the recipe and the card's coefficients are made up. Negative heats are heat "
                + "released by mixing. See the cautions on sheet Overview before using numbers like these.");
        band(s, "A2:H2", INVENTED_COLOUR);
        wrapped(s, "A2:H2", 1);

        text(s, 0, 3, "Inputs (change the blue cells)");
        head(s, "A4:F4");
        inputRow(s, BATCH_TEMPERATURE_ROW, "Starting temperature of every component", 15.0, "°C", "0.0");
        String t = "$B$" + (BATCH_TEMPERATURE_ROW + 1);

        String[] heads = {"Recipe", "mass\nkg", "molar mass\ng/mol (card)", "amount\nmol", "mole fraction", "mass "
            + "fraction"};
        for (int c = 0; c < heads.length; c++) {
            text(s, c, RECIPE_FIRST - 1, heads[c]);
        }
        head(s, "A" + RECIPE_FIRST + ":F" + RECIPE_FIRST);
        prop(s, "A" + RECIPE_FIRST + ":F" + RECIPE_FIRST, "IsTextWrapped", Boolean.TRUE);
        rowHeight(s, RECIPE_FIRST - 1, 900);
        int first = RECIPE_FIRST + 1;
        int last = RECIPE_FIRST + COMPONENTS.length;
        for (int k = 0; k < COMPONENTS.length; k++) {
            int r = RECIPE_FIRST + k;
            int n = r + 1;
            text(s, 0, r, COMPONENTS[k]);
            s.getCellByPosition(1, r).setValue(RECIPE_KG[k]);
            s.getCellByPosition(2, r).setFormula("=" + cardCell("component", COMPONENTS[k], 1));
            s.getCellByPosition(3, r).setFormula("=B" + n + "*1000/C" + n);
            s.getCellByPosition(4, r).setFormula("=D" + n + "/SUM($D$" + first + ":$D$" + last + ")");
            s.getCellByPosition(5, r).setFormula("=B" + n + "/SUM($B$" + first + ":$B$" + last + ")");
        }
        band(s, "B" + first + ":B" + last, INPUT_COLOUR);
        int total = last;
        text(s, 0, total, "batch");
        s.getCellByPosition(1, total).setFormula("=SUM(B" + first + ":B" + last + ")");
        s.getCellByPosition(3, total).setFormula("=SUM(D" + first + ":D" + last + ")");
        s.getCellByPosition(4, total).setFormula("=SUM(E" + first + ":E" + last + ")");
        s.getCellByPosition(5, total).setFormula("=SUM(F" + first + ":F" + last + ")");
        bold(s, "A" + (total + 1) + ":F" + (total + 1), 10);
        prop(s, "B" + first + ":B" + (total + 1), "NumberFormat", formats.key("0.0"));
        prop(s, "C" + first + ":C" + last, "NumberFormat", formats.key("0.000"));
        prop(s, "D" + first + ":D" + (total + 1), "NumberFormat", formats.key("#,##0.0"));
        prop(s, "E" + first + ":F" + (total + 1), "NumberFormat", formats.key("0.0000"));

        String kg = "$B$" + first + ":$B$" + last;
        String x = "$E$" + first + ":$E$" + last;
        text(s, 0, 12, "Mixing the whole batch at once");
        head(s, "A13:C13");
        String[][] results = {
            {"Point check at the batch composition (MIX.CHECKPOINT)", "=MIX.CHECKPOINT(card;" + x + ";" + t + ")", "",
                "@"},
            {"Excess molar enthalpy Hᴱ (MIX.EXCESSENTHALPY)", "=MIX.EXCESSENTHALPY(card;" + x + ";" + t + ")",
                "kJ/mol", "0.0000"},
            {"Partial molar excess enthalpy of water (MIX.PARTIALENTHALPY)",
                "=MIX.PARTIALENTHALPY(card;\"water\";" + x + ";" + t + ")", "kJ/mol", "0.0000"},
            {"Heat of mixing at constant temperature (MIX.MIXINGHEAT)",
                "=MIX.MIXINGHEAT(card;" + kg + ";" + t + ";\"kg\")", "kJ", "#,##0"},
            {"Heat to remove to keep the batch at the starting temperature", "=-B" + (MIXING_HEAT_ROW + 1), "kJ",
                "#,##0"},
            {"Adiabatic temperature rise (MIX.TEMPERATURERISE)",
                "=MIX.TEMPERATURERISE(card;" + kg + ";" + t + ";\"kg\")", "K", "0.00"},
            {"Estimated final temperature without cooling", "=" + t + "+B" + (RISE_ROW + 1), "°C", "0.0"},
            {"Density of the batch at the starting temperature (MIX.DENSITY)",
                "=MIX.DENSITY(card;" + x + ";" + t + ")", "kg/m³", "0.00"},
            {"Volume of the batch at the starting temperature",
                "=B" + (total + 1) + "/B" + (BATCH_DENSITY_ROW + 1) + "*1000", "L", "#,##0"},
        };
        for (int i = 0; i < results.length; i++) {
            resultRow(s, 13 + i, results[i]);
        }
        text(s, 7, 12, "Assumptions behind the temperature rise");
        head(s, "H13");
        text(s, 7, 13, "MIX.TEMPERATURERISE solves for the final temperature at which the heat released by mixing "
                + "has warmed the batch itself. It assumes: all three liquids start at the same temperature; the whole "
                + "batch is mixed at once; no heat passes to or from the vessel, agitator, jacket or air; nothing "
                + "evaporates or reacts; the pressure is constant; the heat capacities and the excess enthalpy (with "
                + "its temperature dependence) are the card's, which are invented. It is a planning estimate, not a "
                + "safety rating: while one liquid is being added, parts of the batch can run warmer than this.");
        String note = "H14:H" + (14 + results.length);
        merge(s, note);
        prop(s, note, "IsTextWrapped", Boolean.TRUE);
        prop(s, note, "VertJustify", com.sun.star.table.CellVertJustify2.TOP);
        band(s, note, CAUTION_COLOUR);

        text(s, 0, TOP_UP_ROW - 1, "Topping up with water");
        head(s, "A" + TOP_UP_ROW + ":C" + TOP_UP_ROW);
        inputRow(s, TOP_UP_ROW, "Water added to the batch", TOP_UP_WATER_KG, "kg", "0.0");
        String added = "$B$" + (TOP_UP_ROW + 1);
        int water = RECIPE_FIRST + 1;
        String addedMol = added + "*1000/$C$" + (water + 1);
        for (int k = 0; k < COMPONENTS.length; k++) {
            int r = TOP_UP_ROW + 1 + k;
            String moles = "$D$" + (RECIPE_FIRST + k + 1) + (k == 1 ? "+" + addedMol : "");
            resultRow(s, r, new String[] {"Mole fraction after the top-up: " + COMPONENTS[k],
                "=(" + moles + ")/($D$" + (total + 1) + "+" + addedMol + ")", "mol/mol", "0.0000"});
        }
        String after = "$B$" + (TOP_UP_ROW + 2) + ":$B$" + (TOP_UP_ROW + 4);
        resultRow(s, TOP_UP_ROW + 4, new String[] {"Point check after the top-up (MIX.CHECKPOINT)",
            "=MIX.CHECKPOINT(card;" + after + ";" + t + ")", "", "@"});
        resultRow(s, ADDITION_HEAT_ROW, new String[] {"Heat of the top-up (MIX.ADDITIONHEAT)",
            "=MIX.ADDITIONHEAT(card;" + kg + ";\"water\";" + added + ";" + t + ";\"kg\")", "kJ", "#,##0"});
        resultRow(s, ADDITION_HEAT_ROW + 1, new String[] {"Density after the top-up (MIX.DENSITY)",
            "=MIX.DENSITY(card;" + after + ";" + t + ")", "kg/m³", "0.00"});
        text(s, 0, ADDITION_HEAT_ROW + 3, "MIX.ADDITIONHEAT = (N + Δn)·Hᴱ(after) − N·Hᴱ(before): the heat of stirring "
                + "the water into the finished batch, on top of the heat of mixing above.");
        prop(s, "A" + (ADDITION_HEAT_ROW + 4), "CharPosture", com.sun.star.awt.FontSlant.ITALIC);
        prop(s, "C5:C" + (ADDITION_HEAT_ROW + 2), "ParaLeftMargin", 150);
        widths(s, 112, 24, 20, 20, 18, 18, 4, 120);
    }

    private static void resultRow(XSpreadsheet s, int row, String[] labelFormulaUnitFormat) throws Exception {
        text(s, 0, row, labelFormulaUnitFormat[0]);
        s.getCellByPosition(1, row).setFormula(labelFormulaUnitFormat[1]);
        if (!labelFormulaUnitFormat[2].isEmpty()) {
            text(s, 2, row, labelFormulaUnitFormat[2]);
        }
        prop(s, "B" + (row + 1), "NumberFormat", formats.key(labelFormulaUnitFormat[3]));
        prop(s, "B" + (row + 1), "HoriJustify", com.sun.star.table.CellHoriJustify.RIGHT);
    }

    // --- Audit

    /** The number of rows MIX.TRACE returns for this card, from the core library itself. */
    private static int traceRows() {
        Card card = CardReader.read(cardCells());
        return CardFunctions.trace(card, AUDIT_X, AUDIT_TEMPERATURE, PropertyKind.VOLUME, Extrapolation.AS_CARD)
                .length;
    }

    /** One hand re-derivation: what it is, the native formula, what it is compared with, and how it is made. */
    private static final class Line {
        final String key;
        final String quantity;
        final String hand;
        final String reference;
        final String how;

        Line(String key, String quantity, String hand, String reference, String how) {
            this.key = key;
            this.quantity = quantity;
            this.hand = hand;
            this.reference = reference;
            this.how = how;
        }
    }

    private static void writeAudit(XSpreadsheet s) throws Exception {
        text(s, 0, 0, "Audit: MIX.TRACE for one composition, re-derived by hand with native Calc formulas");
        bold(s, "A1", 13);
        text(s, 0, 1, "Invented coefficients (sheet Card). The check shows that the add-in's numbers follow from "
                + "the card by the formulas in docs/trace.md; it says nothing about whether the card is right.");
        band(s, "A2:H2", INVENTED_COLOUR);
        text(s, 0, 3, "Inputs (change the blue cells)");
        head(s, "A4:C4");
        for (int k = 0; k < COMPONENTS.length; k++) {
            inputRow(s, AUDIT_X_ROW + k, "Mole fraction of " + COMPONENTS[k] + " (component " + (k + 1) + ")",
                    AUDIT_X[k], "mol/mol", "0.000");
        }
        inputRow(s, AUDIT_TEMPERATURE_ROW, "Temperature", AUDIT_TEMPERATURE, "°C", "0.0");
        text(s, 0, AUDIT_TEMPERATURE_ROW + 1, "Point check (MIX.CHECKPOINT)");
        s.getCellByPosition(1, AUDIT_TEMPERATURE_ROW + 1).setFormula("=MIX.CHECKPOINT(card;" + AUDIT_COMPOSITION + ";"
                + AUDIT_T + ")");
        prop(s, "B" + (AUDIT_TEMPERATURE_ROW + 2), "HoriJustify", com.sun.star.table.CellHoriJustify.RIGHT);

        int rows = traceRows();
        String trace = "$A$" + (TRACE_TOP + 1) + ":$B$" + (TRACE_TOP + rows);
        text(s, 0, TRACE_TOP - 1, "MIX.TRACE(card; B5:B7; B8): label");
        text(s, 1, TRACE_TOP - 1, "value");
        array(s, trace, "=MIX.TRACE(card;" + AUDIT_COMPOSITION + ";" + AUDIT_T + ")");

        List<Line> lines = auditLines(trace);
        Map<String, String> at = new LinkedHashMap<>();
        for (int i = 0; i < lines.size(); i++) {
            at.put(lines.get(i).key, "$E$" + (TRACE_TOP + 1 + i));
        }
        String[] heads = {"Re-derived quantity", "by hand", "trace / function", "rel. residual",
            "how the hand value is made"};
        for (int c = 0; c < heads.length; c++) {
            text(s, 3 + c, TRACE_TOP - 1, heads[c]);
        }
        head(s, "A" + TRACE_TOP + ":H" + TRACE_TOP);
        for (int i = 0; i < lines.size(); i++) {
            Line l = lines.get(i);
            int r = TRACE_TOP + i;
            int n = r + 1;
            text(s, 3, r, l.quantity);
            s.getCellByPosition(4, r).setFormula(substitute(l.hand, at));
            s.getCellByPosition(5, r).setFormula(substitute(l.reference, at));
            s.getCellByPosition(6, r).setFormula("=IF(F" + n + "=0;E" + n + "-F" + n + ";(E" + n + "-F" + n
                    + ")/ABS(F" + n + "))");
            text(s, 7, r, l.how);
        }
        int lastLine = TRACE_TOP + lines.size();
        prop(s, "E" + (TRACE_TOP + 1) + ":F" + lastLine, "NumberFormat", formats.key("0.000000000"));
        prop(s, "G" + (TRACE_TOP + 1) + ":G" + lastLine, "NumberFormat", formats.key("0.0E+00"));
        prop(s, "H" + (TRACE_TOP + 1) + ":H" + lastLine, "CharPosture", com.sun.star.awt.FontSlant.ITALIC);
        String residuals = "G" + (TRACE_TOP + 1) + ":G" + lastLine;

        text(s, 0, AUDIT_PASS_ROW, "Passes: every |relative residual| ≤ " + AUDIT_TOLERANCE);
        s.getCellByPosition(1, AUDIT_PASS_ROW).setFormula("=B" + (AUDIT_RESIDUAL_ROW + 1) + "<=" + AUDIT_TOLERANCE);
        prop(s, "B" + (AUDIT_PASS_ROW + 1), "NumberFormat", formats.key("BOOLEAN"));
        bold(s, "A" + (AUDIT_PASS_ROW + 1) + ":B" + (AUDIT_PASS_ROW + 1), 10);
        band(s, "B" + (AUDIT_PASS_ROW + 1), PASS_COLOUR);
        text(s, 0, AUDIT_RESIDUAL_ROW, "Largest |relative residual| of the " + lines.size() + " re-derivations");
        // SUMPRODUCT makes ABS work on the whole column without an array formula
        s.getCellByPosition(1, AUDIT_RESIDUAL_ROW).setFormula("=SUMPRODUCT(MAX(ABS(" + residuals + ")))");
        prop(s, "B" + (AUDIT_RESIDUAL_ROW + 1), "NumberFormat", formats.key("0.0E+00"));
        prop(s, "B" + (AUDIT_PASS_ROW + 1) + ":B" + (AUDIT_RESIDUAL_ROW + 1), "HoriJustify",
                com.sun.star.table.CellHoriJustify.RIGHT);
        int noteRow = TRACE_TOP + rows + 1;
        fitted(s, "A" + (noteRow + 1) + ":H" + (noteRow + 1), noteRow, "Every trace label is explained in "
                + "docs/trace.md. The hand column uses only the inputs above, the card's cells and the trace's own "
                + "numbers, never the add-in's code. Trace values are looked up as INDEX(B; MATCH(label; A&\"\"; 0)): "
                + "Calc matches the add-in's array text only once a formula has copied it (&\"\").", 380);
        prop(s, "A" + (noteRow + 1), "CharPosture", com.sun.star.awt.FontSlant.ITALIC);
        widths(s, 106, 34, 16, 112, 32, 32, 24, 100);
    }

    /** Replaces {key} by the address of that line's hand value. */
    private static String substitute(String formula, Map<String, String> at) {
        String out = formula;
        for (Map.Entry<String, String> e : at.entrySet()) {
            out = out.replace("{" + e.getKey() + "}", e.getValue());
        }
        if (out.contains("{")) {
            throw new IllegalStateException("unresolved reference in " + out);
        }
        return out;
    }

    private static List<Line> auditLines(String trace) {
        String vol = " [cm³/mol]";
        String[] short3 = {"pg", "w", "g"};
        String wpg = "water + propylene glycol";
        String pgg = "propylene glycol + glycerol";
        String wg = "water + glycerol";
        String triple = "propylene glycol + water + glycerol";
        String t = AUDIT_T;
        List<Line> l = new ArrayList<>();
        for (int k = 0; k < 3; k++) {
            l.add(new Line("x" + short3[k], "mole fraction: " + COMPONENTS[k],
                    "=$B$" + (AUDIT_X_ROW + 1 + k) + "/SUM(" + AUDIT_COMPOSITION + ")",
                    tr(trace, "mole fraction: " + COMPONENTS[k]),
                    "input ÷ sum of the inputs"));
        }
        l.add(new Line("rpg", "pure density: propylene glycol [kg/m³]",
                "=" + cardCell("density coefficients", COMPONENTS[0], 1) + "+"
                        + cardCell("density coefficients", COMPONENTS[0], 2) + "*(" + t + "-"
                        + cardCell("density reference temperature", COMPONENTS[0], 1) + ")",
                tr(trace, "pure density: propylene glycol [kg/m³]"), "card polynomial c0 + c1·(T − T_ref)"));
        l.add(new Line("rw", "pure density: water [kg/m³]",
                "=999.97495*(1-(" + t + "-3.983035)^2*(" + t + "+301.797)/(522528.9*(" + t + "+69.34881)))",
                tr(trace, "pure density: water [kg/m³]"),
                "Tanaka et al. (2001): a5·[1 − (t + a1)²(t + a2)/(a3·(t + a4))], t in °C"));
        l.add(new Line("rg", "pure density: glycerol [kg/m³]",
                "=" + cardCell("density coefficients", COMPONENTS[2], 1) + "+"
                        + cardCell("density coefficients", COMPONENTS[2], 2) + "*(" + t + "-"
                        + cardCell("density reference temperature", COMPONENTS[2], 1) + ")",
                tr(trace, "pure density: glycerol [kg/m³]"), "card polynomial c0 + c1·(T − T_ref)"));
        String[] rho = {"rpg", "rw", "rg"};
        for (int k = 0; k < 3; k++) {
            l.add(new Line("v" + short3[k], "pure molar volume: " + COMPONENTS[k] + vol,
                    "=" + cardCell("component", COMPONENTS[k], 1) + "/{" + rho[k] + "}*1000",
                    tr(trace, "pure molar volume: " + COMPONENTS[k] + vol), "M ÷ ρ × 1000 (card's molar mass)"));
        }
        l.add(new Line("dwpg", "pair argument d: " + wpg, "=2*{xw}-1", tr(trace, "pair argument d: " + wpg),
                "Toop, water asymmetric: 2·x(water) − 1"));
        l.add(new Line("dpgg", "pair argument d: " + pgg, "=({xpg}-{xg})/({xpg}+{xg})",
                tr(trace, "pair argument d: " + pgg), "the pair without water, at its own ratio (Kohler's form)"));
        l.add(new Line("dwg", "pair argument d: " + wg, "=2*{xw}-1", tr(trace, "pair argument d: " + wg),
                "Toop, water asymmetric: 2·x(water) − 1"));
        String pgw = "propylene glycol + water";
        l.add(new Line("a0wpg", "A0 at T: " + wpg + vol, "=" + cardCell("excess volume A0", pgw, 1) + "+"
                + cardCell("excess volume A0", pgw, 2) + "*(" + t + "-"
                + cardCell("excess volume reference temperature", pgw, 1) + ")",
                tr(trace, "A0 at T: " + wpg + vol), "card A0 polynomial at T"));
        l.add(new Line("a1wpg", "A1 at T: " + wpg + vol, "=-" + cardCell("excess volume A1", pgw, 1),
                tr(trace, "A1 at T: " + wpg + vol),
                "card A1 with its sign changed: the card writes glycol first, Toop reads water first"));
        l.add(new Line("a2wpg", "A2 at T: " + wpg + vol, "=" + cardCell("excess volume A2", pgw, 1),
                tr(trace, "A2 at T: " + wpg + vol), "card A2 (even: no sign change)"));
        l.add(new Line("a0pgg", "A0 at T: " + pgg + vol, "=" + cardCell("excess volume A0", pgg, 1),
                tr(trace, "A0 at T: " + pgg + vol), "card A0, constant"));
        l.add(new Line("a0wg", "A0 at T: " + wg + vol, "=" + cardCell("excess volume A0", wg, 1) + "+"
                + cardCell("excess volume A0", wg, 2) + "*(" + t + "-"
                + cardCell("excess volume reference temperature", wg, 1) + ")",
                tr(trace, "A0 at T: " + wg + vol), "card A0 polynomial at T"));
        l.add(new Line("a1wg", "A1 at T: " + wg + vol, "=" + cardCell("excess volume A1", wg, 1),
                tr(trace, "A1 at T: " + wg + vol), "card A1, constant"));
        l.add(new Line("c0", "C0 at T: " + triple + vol, "=" + cardCell("excess volume ternary C0", triple, 1),
                tr(trace, "C0 at T: " + triple + vol), "card C0, constant"));
        l.add(new Line("c1", "C1 at T: " + triple + vol, "=" + cardCell("excess volume ternary C1", triple, 1),
                tr(trace, "C1 at T: " + triple + vol), "card C1, constant"));
        l.add(new Line("pwpg", "pair term: " + wpg + vol, "={xw}*{xpg}*({a0wpg}+{a1wpg}*{dwpg}+{a2wpg}*{dwpg}^2)",
                tr(trace, "pair term: " + wpg + vol), "x_i·x_j·(A0 + A1·d + A2·d²)"));
        l.add(new Line("ppgg", "pair term: " + pgg + vol, "={xpg}*{xg}*{a0pgg}", tr(trace, "pair term: " + pgg + vol),
                "x_i·x_j·A0"));
        l.add(new Line("pwg", "pair term: " + wg + vol, "={xw}*{xg}*({a0wg}+{a1wg}*{dwg})",
                tr(trace, "pair term: " + wg + vol), "x_i·x_j·(A0 + A1·d)"));
        l.add(new Line("tern", "ternary term: " + triple + vol, "={xpg}*{xw}*{xg}*({c0}+{c1}*{xpg})",
                tr(trace, "ternary term: " + triple + vol), "x_a·x_b·x_c·(C0 + C1·x_a), a = propylene glycol"));
        l.add(new Line("ve", "excess molar volume" + vol, "={pwpg}+{ppgg}+{pwg}+{tern}",
                tr(trace, "excess molar volume" + vol), "sum of the three pair terms and the ternary term above"));
        l.add(new Line("vetrace", "Vᴱ from the trace's own pair and ternary terms" + vol,
                "=" + tr(trace, "pair term: " + wpg + vol).substring(1) + "+"
                        + tr(trace, "pair term: " + pgg + vol).substring(1) + "+"
                        + tr(trace, "pair term: " + wg + vol).substring(1) + "+"
                        + tr(trace, "ternary term: " + triple + vol).substring(1),
                tr(trace, "excess molar volume" + vol), "sum of the trace's four term rows"));
        l.add(new Line("vefn", "Vᴱ by hand, against MIX.EXCESSVOLUME" + vol, "={ve}",
                "=MIX.EXCESSVOLUME(card;" + AUDIT_COMPOSITION + ";" + AUDIT_T + ")", "the hand Vᴱ above"));
        for (int k = 0; k < 3; k++) {
            String c = COMPONENTS[k];
            l.add(new Line("pe" + short3[k], "partial molar excess volume: " + c + vol,
                    tr(trace, "excess molar volume" + vol) + "+"
                            + tr(trace, "derivative dVE/dx: " + c + vol).substring(1) + "-"
                            + tr(trace, "sum of x·dVE/dx" + vol).substring(1),
                    tr(trace, "partial molar excess volume: " + c + vol),
                    "Vᴱ + dVᴱ/dx_k − Σ x·dVᴱ/dx, from the trace's rows"));
        }
        l.add(new Line("vm", "mixture molar volume" + vol, "={xpg}*{vpg}+{xw}*{vw}+{xg}*{vg}+{ve}",
                tr(trace, "mixture molar volume" + vol), "Σ x_k·V*_k + Vᴱ, all by hand"));
        l.add(new Line("sum", "Σ x_k·V̄_k of the trace's partial molar volumes" + vol,
                "={xpg}*" + tr(trace, "partial molar volume: " + COMPONENTS[0] + vol).substring(1) + "+{xw}*"
                        + tr(trace, "partial molar volume: " + COMPONENTS[1] + vol).substring(1) + "+{xg}*"
                        + tr(trace, "partial molar volume: " + COMPONENTS[2] + vol).substring(1),
                tr(trace, "mixture molar volume" + vol), "summability: the partials add up to the molar volume"));
        l.add(new Line("mm", "mean molar mass [g/mol]", "={xpg}*" + cardCell("component", COMPONENTS[0], 1) + "+{xw}*"
                + cardCell("component", COMPONENTS[1], 1) + "+{xg}*" + cardCell("component", COMPONENTS[2], 1),
                tr(trace, "mean molar mass [g/mol]"), "Σ x_k·M_k (card's molar masses)"));
        l.add(new Line("rhotrace", "density from the trace's M̄ and V_m [kg/m³]",
                tr(trace, "mean molar mass [g/mol]") + "/" + tr(trace, "mixture molar volume" + vol).substring(1)
                        + "*1000",
                tr(trace, "mixture density [kg/m³]"), "M̄ ÷ V_m × 1000, from the trace's rows"));
        l.add(new Line("rho", "density by hand, against MIX.DENSITY [kg/m³]", "={mm}/{vm}*1000",
                "=MIX.DENSITY(card;" + AUDIT_COMPOSITION + ";" + AUDIT_T + ")", "M̄ ÷ V_m × 1000, all by hand"));
        return l;
    }

    /**
     * A native lookup of one trace value by its label. The labels are matched as {@code A&""}: Calc 7.4 compares
     * the text of an add-in's array result with nothing (every EXACT, = or MATCH against it fails), while the text
     * a formula builds from it compares normally.
     */
    private static String tr(String trace, String label) {
        String[] columns = trace.split(":");
        String labels = columns[0] + ":" + columns[1].replace("$B$", "$A$");
        String values = columns[0].replace("$A$", "$B$") + ":" + columns[1];
        return "=INDEX(" + values + ";MATCH(\"" + label + "\";" + labels + "&\"\";0))";
    }

    // --- chart

    private static void array(XSpreadsheet s, String range, String formula) throws Exception {
        UnoRuntime.queryInterface(XArrayFormulaRange.class, s.getCellRangeByName(range)).setArrayFormula(formula);
    }

    /** The ternary plot: an XY chart of the Grid's plot columns, on the Overview sheet. */
    private static void addTriangleChart(XSpreadsheet overview, XComponentContext context) throws Exception {
        CellRangeAddress x = new CellRangeAddress(PLOT_SHEET, PLOT_X, PLOT_HEAD, PLOT_X, PLOT_LAST);
        CellRangeAddress series = new CellRangeAddress(PLOT_SHEET, FIRST_SERIES, PLOT_HEAD, LAST_SERIES, PLOT_LAST);
        XTableCharts charts = UnoRuntime.queryInterface(XTableChartsSupplier.class, overview).getCharts();
        XPropertySet anchor = UnoRuntime.queryInterface(XPropertySet.class, overview.getCellByPosition(4, 3));
        com.sun.star.awt.Point p = (com.sun.star.awt.Point) anchor.getPropertyValue("Position");
        int width = 17600;
        int height = 16600;
        charts.addNewByName(CHART_NAME, new Rectangle(p.X, p.Y, width, height), new CellRangeAddress[] {x, series},
                true, false);
        Object chart = UnoRuntime.queryInterface(XNameAccess.class, charts).getByName(CHART_NAME);
        Object model = UnoRuntime.queryInterface(XEmbeddedObjectSupplier.class, chart).getEmbeddedObject();
        com.sun.star.chart.XChartDocument cd = UnoRuntime.queryInterface(com.sun.star.chart.XChartDocument.class,
                model);
        XDiagram d = ExampleWorkbooks.xyDiagram(cd, "Blend density across the composition triangle, at the "
                + "temperature in B5 (invented coefficients)", 11f);
        XPropertySet cp = UnoRuntime.queryInterface(XPropertySet.class, cd);
        cp.setPropertyValue("HasLegend", Boolean.TRUE);
        XPropertySet legend = UnoRuntime.queryInterface(XPropertySet.class, cd.getLegend());
        legend.setPropertyValue("Alignment", ChartLegendPosition.BOTTOM);
        legend.setPropertyValue("FillStyle", com.sun.star.drawing.FillStyle.NONE);
        legend.setPropertyValue("LineStyle", com.sun.star.drawing.LineStyle.NONE);
        XPropertySet dp = UnoRuntime.queryInterface(XPropertySet.class, d);
        dp.setPropertyValue("Lines", Boolean.TRUE);
        // a blank cell ends a line: each gridline segment stands alone
        dp.setPropertyValue("MissingValueTreatment", com.sun.star.chart.MissingValueTreatment.LEAVE_GAP);
        dp.setPropertyValue("HasXAxisGrid", Boolean.FALSE);
        dp.setPropertyValue("HasYAxisGrid", Boolean.FALSE);
        dp.setPropertyValue("HasXAxisTitle", Boolean.TRUE);
        dp.setPropertyValue("HasYAxisTitle", Boolean.TRUE);
        XPropertySet wall = UnoRuntime.queryInterface(com.sun.star.chart.X3DDisplay.class, d).getWall();
        wall.setPropertyValue("FillStyle", com.sun.star.drawing.FillStyle.NONE);
        wall.setPropertyValue("LineStyle", com.sun.star.drawing.LineStyle.NONE);
        XAxisXSupplier xs = UnoRuntime.queryInterface(XAxisXSupplier.class, d);
        UnoRuntime.queryInterface(XPropertySet.class, xs.getXAxisTitle()).setPropertyValue("String",
                "corners: propylene glycol at (0, 0), water at (1, 0), glycerol at (½, √3/2); "
                        + "X = x(water) + x(glycerol)/2");
        // the plot's own coordinates mean nothing to a reader: no numbers or lines on the axes, only their titles
        hiddenAxis(xs.getXAxis(), -0.2, 1.2);
        XAxisYSupplier ys = UnoRuntime.queryInterface(XAxisYSupplier.class, d);
        UnoRuntime.queryInterface(XPropertySet.class, ys.getYAxisTitle()).setPropertyValue("String",
                "Y = x(glycerol)·√3/2");
        hiddenAxis(ys.getYAxis(), -0.12, 0.98);
        XPropertySet gridlines = d.getDataRowProperties(dataRow(GRIDLINE_SERIES));
        gridlines.setPropertyValue("SymbolType", ChartSymbolType.NONE);
        gridlines.setPropertyValue("Color", GRIDLINE_COLOUR);
        gridlines.setPropertyValue("LineWidth", 0);
        for (int b = 0; b < BANDS; b++) {
            points(d.getDataRowProperties(dataRow(BAND_SERIES + b)), BAND_COLOURS[b], 8, 280);
        }
        points(d.getDataRowProperties(dataRow(OUTSIDE_SERIES)), OUTSIDE_COLOUR, 8, 200);
        XPropertySet edges = d.getDataRowProperties(dataRow(EDGE_SERIES));
        edges.setPropertyValue("SymbolType", ChartSymbolType.NONE);
        edges.setPropertyValue("Color", EDGE_COLOUR);
        edges.setPropertyValue("LineWidth", 40);
        points(d.getDataRowProperties(dataRow(BATCH_SERIES)), BATCH_COLOUR, 1, 450);
        // equal scales on both axes make the triangle equilateral: the plot spans 1.4 by 1.1 in X and Y
        int plotHeight = 12000;
        int plotWidth = plotHeight * 14 / 11;
        UnoRuntime.queryInterface(XDiagramPositioning.class, d).setDiagramPositionExcludingAxes(
                new Rectangle((width - plotWidth) / 2 + 200, 1500, plotWidth, plotHeight));
        labelCorners(model, context);
    }

    /** The old chart API's data row of a series column: row 0 is the X column, the series follow in order. */
    private static int dataRow(int seriesColumn) {
        return 1 + seriesColumn - FIRST_SERIES;
    }

    private static void hiddenAxis(XPropertySet axis, double min, double max) throws Exception {
        axis.setPropertyValue("AutoMin", Boolean.FALSE);
        axis.setPropertyValue("AutoMax", Boolean.FALSE);
        axis.setPropertyValue("Min", min);
        axis.setPropertyValue("Max", max);
        axis.setPropertyValue("DisplayLabels", Boolean.FALSE);
        axis.setPropertyValue("Marks", 0);
        axis.setPropertyValue("LineStyle", com.sun.star.drawing.LineStyle.NONE);
    }

    /** Symbols only, of one colour: standard symbol {@code symbol} (1 diamond, 8 circle), size in 1/100 mm. */
    private static void points(XPropertySet series, int colour, int symbol, int size) throws Exception {
        series.setPropertyValue("LineStyle", com.sun.star.drawing.LineStyle.NONE);
        series.setPropertyValue("SymbolType", symbol);
        series.setPropertyValue("SymbolSize", new Size(size, size));
        series.setPropertyValue("Color", colour);
    }

    /** Names the three corners on the edge series' first three points. */
    private static void labelCorners(Object chartModel, XComponentContext context) throws Exception {
        com.sun.star.chart2.XChartDocument cd = UnoRuntime.queryInterface(com.sun.star.chart2.XChartDocument.class,
                chartModel);
        XCoordinateSystemContainer systems = UnoRuntime.queryInterface(XCoordinateSystemContainer.class,
                cd.getFirstDiagram());
        XChartTypeContainer types = UnoRuntime.queryInterface(XChartTypeContainer.class,
                systems.getCoordinateSystems()[0]);
        XDataSeries[] all = UnoRuntime.queryInterface(XDataSeriesContainer.class, types.getChartTypes()[0])
                .getDataSeries();
        // the scaffolding needs no legend entry
        UnoRuntime.queryInterface(XPropertySet.class, all[GRIDLINE_SERIES - FIRST_SERIES])
                .setPropertyValue("ShowLegendEntry", Boolean.FALSE);
        XDataSeries edges = all[EDGE_SERIES - FIRST_SERIES];
        UnoRuntime.queryInterface(XPropertySet.class, edges).setPropertyValue("ShowLegendEntry", Boolean.FALSE);
        int[] placement = {com.sun.star.chart.DataLabelPlacement.BOTTOM,
            com.sun.star.chart.DataLabelPlacement.BOTTOM, com.sun.star.chart.DataLabelPlacement.TOP};
        for (int k = 0; k < 3; k++) {
            XPropertySet point = edges.getDataPointByIndex(EDGE_FIRST - PLOT_FIRST + k);
            XDataPointCustomLabelField field = DataPointCustomLabelField.create(context);
            field.setFieldType(DataPointCustomLabelFieldType.TEXT);
            field.setString(COMPONENTS[k]);
            point.setPropertyValue("CustomLabelFields", new XDataPointCustomLabelField[] {field});
            point.setPropertyValue("Label", new DataPointLabel(false, false, false, false, true, false));
            point.setPropertyValue("LabelPlacement", placement[k]);
            point.setPropertyValue("CharHeight", 10f);
            point.setPropertyValue("CharWeight", com.sun.star.awt.FontWeight.BOLD);
        }
    }
}
