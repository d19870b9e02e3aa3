package org.miscela.core.card;

import org.miscela.core.functions.CardFunctions;
import org.miscela.core.model.Component;
import org.miscela.core.model.GeometricModel;
import org.miscela.core.problem.MiscelaException;
import org.miscela.core.problem.Numbers;
import org.miscela.core.problem.Problem;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumSet;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * Keeps docs/card-format.md and the reader in step: every example card in the document (a Markdown table after a
 * line {@code <!-- card-example: name, name -->}) must read and declare exactly the components the marker lists.
 */
public class CardFormatDocTest {
    private static final Pattern MARKER = Pattern.compile("^\\s*<!--\\s*card-example:(.*?)-->\\s*$");
    private static final Pattern NUMBER = Pattern.compile("[-+]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][-+]?\\d+)?");
    private static final double T = 298.15;

    /** An example card: the components its marker states and its cells. */
    private static final class Example {
        final int line;
        final List<String> components;
        final Object[][] cells;

        Example(int line, List<String> components, Object[][] cells) {
            this.line = line;
            this.components = components;
            this.cells = cells;
        }
    }

    public static Path document() {
        String repo = System.getProperty("miscela.repo");
        Path root = repo != null ? Paths.get(repo) : Paths.get("").toAbsolutePath().getParent();
        return root.resolve("docs").resolve("card-format.md");
    }

    private static List<String> lines() throws IOException {
        return Files.readAllLines(document(), StandardCharsets.UTF_8);
    }

    /** Numbers become Double, other text String, an empty cell "". */
    static Object cell(String text) {
        String t = text.trim();
        if (NUMBER.matcher(t).matches()) {
            return Double.valueOf(t);
        }
        return t;
    }

    /** Cells of a Markdown table row "| a | b |". */
    static List<String> split(String row) {
        String r = row.trim();
        if (!r.startsWith("|") || !r.endsWith("|") || r.length() < 2) {
            throw new IllegalArgumentException("not a table row: " + row);
        }
        return Arrays.asList(r.substring(1, r.length() - 1).split("\\|", -1));
    }

    static List<Example> examples(List<String> lines) {
        List<Example> out = new ArrayList<>();
        for (int i = 0; i < lines.size(); i++) {
            Matcher m = MARKER.matcher(lines.get(i));
            if (!m.find()) {
                continue;
            }
            List<String> names = new ArrayList<>();
            for (String n : m.group(1).split(",")) {
                names.add(n.trim());
            }
            int start = i + 1;
            assertTrue(start + 1 < lines.size() && lines.get(start).trim().startsWith("|")
                    && lines.get(start + 1).trim().matches("\\|(\\s*:?-+:?\\s*\\|)+"),
                    "line " + (i + 1) + ": a card-example marker must be followed by a table with a header row");
            int width = split(lines.get(start)).size();
            List<Object[]> rows = new ArrayList<>();
            int j = start + 2;
            for (; j < lines.size() && lines.get(j).trim().startsWith("|"); j++) {
                List<String> cells = split(lines.get(j));
                assertEquals(width, cells.size(), "line " + (j + 1) + ": cell count differs from the header");
                Object[] row = new Object[width];
                for (int c = 0; c < width; c++) {
                    row[c] = cell(cells.get(c));
                }
                rows.add(row);
            }
            out.add(new Example(i + 1, names, rows.toArray(new Object[0][])));
            i = j - 1;
        }
        return out;
    }

    @Test
    void everyExampleCardReadsWithItsStatedComponents() throws IOException {
        List<Example> examples = examples(lines());
        assertTrue(examples.size() >= 2, "expected at least two example cards, found " + examples.size());
        for (Example e : examples) {
            Card card;
            try {
                card = CardReader.read(e.cells);
            } catch (MiscelaException ex) {
                throw new AssertionError("example card at line " + e.line + ": " + ex.getMessage(), ex);
            }
            List<String> names = new ArrayList<>();
            for (Component c : card.components()) {
                names.add(c.name());
            }
            assertEquals(e.components, names, "example card at line " + e.line);
            assertTrue(card.source().toLowerCase(java.util.Locale.ROOT).contains("invented values"),
                    "example card at line " + e.line + " must say its values are invented");
            assertEquals(CardFunctions.OK, CardFunctions.check(card, Double.NaN, Double.NaN,
                    Extrapolation.AS_CARD), "example card at line " + e.line);
            assertEquals(java.util.Collections.emptyList(), CardSanity.warnings(e.cells, card),
                    "example card at line " + e.line + " has nothing for MIX.CHECK to warn about");
        }
    }

    /** The card shown in the README reads too, with a density a person can recognise. */
    @Test
    void readmeCardReads() throws IOException {
        Path readme = document().getParent().getParent().resolve("README.md");
        List<Example> examples = examples(Files.readAllLines(readme, StandardCharsets.UTF_8));
        assertEquals(1, examples.size(), "the README shows one card");
        Card card = CardReader.read(examples.get(0).cells);
        assertEquals(examples.get(0).components.size(), card.componentCount());
        assertEquals(java.util.Collections.emptyList(), CardSanity.warnings(examples.get(0).cells, card));
        double water = CardFunctions.density(card, 0, 20, Extrapolation.AS_CARD);
        assertEquals(998.2067, water, 1e-4, "pure water at 20 °C through the README card (Tanaka 2001)");
    }

    /** The statements the examples' prose makes about them. */
    @Test
    void examplesBehaveAsDescribed() throws IOException {
        List<Example> examples = examples(lines());
        assertEquals(13, examples.size());
        Card one = CardReader.read(examples.get(0).cells);
        // "the functions refuse x1 above 0.9 unless extrapolation is allowed"
        assertEquals(CardFunctions.OK, CardFunctions.check(one, 0.0, T, Extrapolation.AS_CARD));
        assertEquals(CardFunctions.OK, CardFunctions.check(one, 0.89, T, Extrapolation.AS_CARD));
        assertEquals(CardFunctions.OK, CardFunctions.check(one, 0.9, T, Extrapolation.AS_CARD), "limits are inclusive");
        assertTrue(CardFunctions.check(one, 0.95, T, Extrapolation.AS_CARD).contains("solvent Q"));
        assertEquals(CardFunctions.OK, CardFunctions.check(one, 0.95, T, Extrapolation.ALLOW));
        assertEquals(-1.62, one.excessVolume(0, 1).coefficientAt(0, T), 0.0);

        Card two = CardReader.read(examples.get(1).cells);
        assertEquals(Units.Temperature.CELSIUS, two.units().temperature());
        assertEquals(Units.Density.G_PER_CM3, two.units().density());
        assertTrue(two.extrapolationAllowed());
        assertEquals("Tanaka 2001", two.components().get(1).density().modelName());
        assertEquals(791.2, two.components().get(0).density().at(293.15), 1e-9);
        assertEquals(-3.95 - 0.011 * 10, two.excessVolume(0, 1).coefficientAt(0, 308.15), 1e-12);
        assertEquals(2, two.excessVolume(0, 1).order(), "the commented-out A3 row is ignored");

        Card three = CardReader.read(examples.get(2).cells);
        assertEquals(Units.MolarVolume.L_PER_MOL, three.units().molarVolume());
        assertEquals(-2.1, three.excessVolume(0, 1).coefficientAt(0, T), 1e-12); // -0.0021 L/mol in cm³/mol
        assertEquals(-0.4, three.excessVolume(0, 1).coefficientAt(1, T), 1e-12);
        assertEquals(74.1, three.components().get(0).molarMass(), 1e-9);

        // Example 4: Toop with water asymmetric; the additive + glycol pair limit; a ternary term.
        Card four = CardReader.read(examples.get(3).cells);
        assertEquals(GeometricModel.TOOP, four.excessVolume().model());
        assertEquals(1, four.excessVolume().asymmetricComponent());
        assertEquals(1, four.excessVolume().ternaryTerms().size());
        double[] inside = {0.5, 0.4, 0.1}; // additive share of the pair 0.1/0.6 = 0.17
        double[] outside = {0.2, 0.6, 0.2}; // 0.2/0.4 = 0.5 > 0.3
        assertEquals(1.0, CardFunctions.inside(four, inside, 20));
        assertTrue(CardFunctions.check(four, outside, 20, Extrapolation.AS_CARD).contains("additive + glycol"));

        // Example 5: enthalpy only; volumes refused; H^E depends on T, so Cp^E = x1 x2 Σ dA_k/dT (x1 − x2)^k.
        Card five = CardReader.read(examples.get(4).cells);
        assertEquals(null, five.excessVolume());
        assertEquals(Problem.NO_VOLUME, org.junit.jupiter.api.Assertions.assertThrows(MiscelaException.class,
                () -> CardFunctions.density(five, 0.2, 25, Extrapolation.AS_CARD)).problem());
        double[] x = {0.2, 0.8};
        assertEquals(0.2 * 0.8 * 0.05 * 1000, five.mixture().excessHeatCapacity(x, 298.15), 1e-9);
        assertEquals(0.2 * 0.8 * (-55 + 33 * -0.6 + 14 * 0.36),
                CardFunctions.excessEnthalpy(five, x, 25, Extrapolation.AS_CARD), 1e-12);

        // Example 6: u(V^E) at x = 0.5 is x1·x2·√C00 since (x1 − x2) = 0 there: 0.25·0.02 = 0.005 cm³/mol.
        Card six = CardReader.read(examples.get(5).cells);
        assertEquals(0.005, CardFunctions.uncertainty(six, "excess volume", -1, new double[] {0.5, 0.5}, 20,
                Extrapolation.AS_CARD), 1e-12);

        // Example 7: with the X + Y pair ideal, V^E is the two water pairs alone (Kohler's d matters only for A1+).
        Card seven = CardReader.read(examples.get(6).cells);
        double[] z = {0.3, 0.2, 0.5};
        assertEquals(0.3 * 0.5 * -1.8 + 0.2 * 0.5 * -0.9,
                CardFunctions.excessMolarVolume(seven, z, 298.15, Extrapolation.AS_CARD), 1e-14);
        assertEquals(null, seven.excessVolume(0, 1));
        // Example 8: "every %vol, mol/L, g/L or volume fraction … is at 15 °C unless the call gives its own"
        Card eight = CardReader.read(examples.get(7).cells);
        assertEquals(15.0, eight.basisReferenceTemperature(), 1e-12);
        assertTrue(eight.statesBasisReference());
        assertEquals(20.0, one.basisReferenceTemperature() - 273.15, 1e-9, "example 1 (in K) keeps the 20 °C default");

        // Example 9: the salt has no pure-liquid density; the solution's follows the model's equations.
        Card nine = CardReader.read(examples.get(8).cells);
        assertEquals(Problem.PURE_HYPOTHETICAL, org.junit.jupiter.api.Assertions.assertThrows(MiscelaException.class,
                () -> CardFunctions.pureDensity(nine, 0, 20, Extrapolation.AS_CARD)).problem());
        double w = 0.1;
        double t = 20;
        double water = org.miscela.core.model.Kell1975WaterDensity.INSTANCE.at(293.15);
        double apparent = (0 * w + 0.06) * Math.exp(1e-6 * (t + 3300) * (t + 3300)) / (w + 1 + 0.015 * t);
        double x9 = (w / 58.4) / (w / 58.4 + (1 - w) / 18.015);
        assertEquals(1 / ((1 - w) / water + w / apparent), CardFunctions.density(nine, x9, 20, Extrapolation.AS_CARD),
                1e-9);

        // Example 10: ρ = 998 − 160·w − 0.2·(t − 20) − 0.6·w·(t − 20); at w = 0.3 and 25 °C, 948.1 kg/m³.
        Card ten = CardReader.read(examples.get(9).cells);
        double x10 = (0.3 / 46.07) / (0.3 / 46.07 + 0.7 / 18.015);
        assertEquals(948.1, CardFunctions.density(ten, x10, 25, Extrapolation.AS_CARD), 1e-9);
        assertEquals(998 - 0.2 * 5, CardFunctions.pureDensity(ten, 1, 25, Extrapolation.AS_CARD), 1e-9);

        // Example 11: ρ_M = C1·M/C2^(1 + (1 − T/C3)^C4); the table passes through its points.
        Card eleven = CardReader.read(examples.get(10).cells);
        double tau = 1 - 293.15 / 514;
        assertEquals(1.6 * 46.07 / Math.pow(0.27, 1 + Math.pow(tau, 0.23)),
                CardFunctions.pureDensity(eleven, 0, 20, Extrapolation.AS_CARD), 1e-9);
        assertEquals(996.0, CardFunctions.pureDensity(eleven, 1, 30, Extrapolation.AS_CARD), 0.0);

        // Example 12: ln γ1 = x2²·(A0 + A1·(4·x1 − 1)) for a two-term expansion; p = Σ x γ p*; no volumes.
        Card twelve = CardReader.read(examples.get(11).cells);
        double[] x12 = {0.3, 0.7};
        assertEquals(Math.exp(0.49 * (1.2 - 0.3 * 0.2)), org.miscela.core.functions.PhaseFunctions
                .activityCoefficient(twelve, 0, x12, 50, Extrapolation.AS_CARD), 1e-12);
        double p1 = Math.pow(10, 7.2 - 1600 / 275.0);
        double p2 = Math.pow(10, 7.1 - 1690 / 280.0);
        double g1 = Math.exp(0.49 * (1.2 - 0.3 * 0.2));
        double g2 = Math.exp(0.09 * (1.2 - 0.3 * (4 * 0.3 - 3)));
        assertEquals(0.3 * g1 * p1 + 0.7 * g2 * p2, org.miscela.core.functions.PhaseFunctions.bubblePressure(twelve,
                x12, 50, Extrapolation.AS_CARD), 1e-9);
        assertEquals(Problem.NO_VOLUME, org.junit.jupiter.api.Assertions.assertThrows(MiscelaException.class,
                () -> CardFunctions.density(twelve, 0.3, 50, Extrapolation.AS_CARD)).problem());

        // Example 13: pure S freezes at its 5.5 °C; at x_S = 0.9 the freezing point satisfies the SLE equation with
        // ln γ_S = x_P²·A0 (Redlich–Kister, one term), ΔH_fus = 9900 J/mol, ΔCp = 10 J/(mol·K).
        Card thirteen = CardReader.read(examples.get(12).cells);
        org.miscela.core.functions.PhaseFunctions.Activity fromCard =
                org.miscela.core.functions.PhaseFunctions.Activity.CARD;
        assertEquals(5.5, org.miscela.core.functions.PhaseFunctions.freezingPoint(thirteen, -1, new double[] {0, 1},
                fromCard, Extrapolation.AS_CARD), 0.0);
        double tf = org.miscela.core.functions.PhaseFunctions.freezingPoint(thirteen, -1, new double[] {0.1, 0.9},
                fromCard, Extrapolation.AS_CARD) + 273.15;
        double tm = 278.65;
        double r = org.miscela.core.functions.PhaseFunctions.GAS_CONSTANT;
        assertEquals(Math.log(0.9) + 0.01 * 0.8, -9900 / r * (1 / tf - 1 / tm) + 10 / r * (tm / tf - 1 - Math.log(tm / tf)),
                1e-9);
    }

    private static final Pattern CHECK_MARKER = Pattern.compile("^\\s*<!--\\s*check-example:(.*?)-->\\s*$");

    /**
     * The section on MIX.CHECK's warnings: each line {@code <!-- check-example: example N; result W; edits -->} takes
     * example card N of this document, applies the edits ({@link CardEdits}: {@code set R = a | b} replaces row R,
     * {@code add a | b} appends a row, {@code pad R} pads with blank rows to R rows, {@code sort C} sorts the rows below
     * the header by column C as Calc does) and asks MIX.CHECK for result W; the next line quoted with "> " must be the answer,
     * exactly. Every entry of the catalogue's CHECK section must be shown this way.
     */
    @Test
    void everyCheckExampleShowsMixChecksAnswer() throws IOException {
        List<String> lines = lines();
        List<Example> examples = examples(lines);
        java.util.Set<Problem> shown = EnumSet.noneOf(Problem.class);
        int count = 0;
        for (int i = 0; i < lines.size(); i++) {
            Matcher m = CHECK_MARKER.matcher(lines.get(i));
            if (!m.find()) {
                continue;
            }
            count++;
            String[] fields = m.group(1).split(";");
            int example = Integer.parseInt(fields[0].trim().substring("example ".length()));
            String result = fields[1].trim().substring("result ".length());
            StringBuilder edits = new StringBuilder();
            for (int f = 2; f < fields.length; f++) {
                edits.append(fields[f]).append(';');
            }
            Object[][] cells = CardEdits.apply(examples.get(example - 1).cells, edits.toString());
            int a = i + 1;
            while (a < lines.size() && lines.get(a).trim().isEmpty()) {
                a++;
            }
            assertTrue(a < lines.size() && lines.get(a).startsWith("> "),
                    "line " + (i + 1) + ": a check-example must be followed by the answer quoted with \"> \"");
            String expected = lines.get(a).substring(2);
            org.miscela.core.functions.CheckOutput output = org.miscela.core.functions.CheckOutput.lookup(result);
            Object actual = output == org.miscela.core.functions.CheckOutput.EXTENT ? CardSanity.extent(cells).words()
                    : CardFunctions.checkCard(cells, CardReader.read(cells), output);
            assertEquals(expected, actual, "the check-example at line " + (i + 1));
            String entry = org.miscela.core.problem.Catalogue.entryOf(expected);
            shown.add(Problem.valueOf(entry.substring("Problem.".length())));
            if (output == org.miscela.core.functions.CheckOutput.SUMMARY) {
                for (String w : CardSanity.warnings(cells, CardReader.read(cells))) {
                    String e = org.miscela.core.problem.Catalogue.entryOf(w);
                    shown.add(Problem.valueOf(e.substring("Problem.".length())));
                }
            }
        }
        assertTrue(count > 0, "no check-example in docs/card-format.md");
        java.util.Set<Problem> missing = EnumSet.copyOf(Problem.of(Problem.Section.CHECK));
        missing.removeAll(shown);
        assertTrue(missing.isEmpty(), "docs/card-format.md shows no example of " + missing);
    }

    /** The document's table of problems names every card problem of the catalogue. */
    @Test
    void documentListsEveryCardProblem() throws IOException {
        String text = String.join("\n", lines());
        for (Problem p : EnumSet.range(Problem.CARD_EMPTY, Problem.NO_COMPOSITION_LIMIT)) {
            assertTrue(text.contains("| `" + p.name() + "` |"), "docs/card-format.md does not describe " + p);
        }
        for (Problem p : Problem.of(Problem.Section.CHECK)) {
            assertTrue(p.name().startsWith("CHECK_") || text.contains("| `" + p.name() + "` |"),
                    "docs/card-format.md's table of warnings does not describe " + p);
        }
    }

    /** The document lists exactly the unit spellings the reader accepts. */
    @Test
    void documentListsEveryUnitSpelling() throws IOException {
        String text = String.join("\n", lines());
        List<Units.Spelled> all = new ArrayList<>();
        all.addAll(Arrays.asList(Units.Temperature.values()));
        all.addAll(Arrays.asList(Units.Density.values()));
        all.addAll(Arrays.asList(Units.MolarVolume.values()));
        all.addAll(Arrays.asList(Units.MolarMass.values()));
        all.addAll(Arrays.asList(Units.MolarEnthalpy.values()));
        for (Units.Spelled u : all) {
            for (String s : u.spellings()) {
                assertTrue(text.contains("`" + s + "`"), "docs/card-format.md does not list the spelling " + s);
            }
        }
    }

    /** The document's table of amount units lists every spelling of the blending units and the heat bases. */
    @Test
    void documentListsEveryAmountUnitSpelling() throws IOException {
        String text = String.join("\n", lines());
        for (org.miscela.core.blend.AmountUnit u : org.miscela.core.blend.AmountUnit.values()) {
            for (String s : u.spellings()) {
                assertTrue(text.contains("`" + s + "`"), "docs/card-format.md does not list the amount unit " + s);
            }
        }
        for (org.miscela.core.functions.AmountBasis b : org.miscela.core.functions.AmountBasis.values()) {
            assertTrue(text.contains("`" + b.symbol() + "`"), "docs/card-format.md does not list the basis " + b);
            assertEquals(b, org.miscela.core.functions.AmountBasis.lookup(b.symbol()));
            assertEquals(org.miscela.core.blend.AmountUnit.lookup(b.symbol()).isConventional(), b.isConventional(),
                    "the heat functions' basis " + b + " means what the blending unit of that name means");
        }
    }

    @Test
    void cellConversion() {
        assertEquals(1.0, cell(" 1 "));
        assertEquals(-0.0000012, cell("-0.0000012"));
        assertEquals(1e-3, cell("1e-3"));
        assertEquals("", cell("  "));
        assertEquals("Tanaka 2001", cell(" Tanaka 2001 "));
        assertEquals("solvent P + solvent Q", cell("solvent P + solvent Q"));
        assertEquals(Arrays.asList(" a ", " ", "b"), split("| a | |b|"));
    }
}
