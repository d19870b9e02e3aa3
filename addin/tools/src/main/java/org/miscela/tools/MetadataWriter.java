package org.miscela.tools;

import org.miscela.core.catalog.ArgumentInfo;
import org.miscela.core.catalog.FunctionCatalog;
import org.miscela.core.catalog.FunctionInfo;
import org.miscela.core.problem.Problem;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;

/**
 * Writes the artefacts made from the {@link FunctionCatalog}: Calc's wizard metadata (CalcAddIns.xcu, by the build),
 * and, run by scripts/regenerate-docs, the function reference (docs/functions.md), the error catalogue
 * (docs/errors.md), the IDL interface ({@link IdlWriter}) and the README's function table.
 */
public final class MetadataWriter {
    private MetadataWriter() {
    }

    public static void main(String[] args) throws IOException {
        if (args.length == 1) {
            write(Paths.get(args[0]), calcAddInsXcu());
            return;
        }
        if (args.length == 0 || args.length % 2 != 0) {
            throw new IllegalArgumentException(USAGE);
        }
        for (int i = 0; i < args.length; i += 2) {
            Path out = Paths.get(args[i + 1]);
            switch (args[i]) {
                case "--docs":
                    write(out, functionReference());
                    break;
                case "--errors":
                    write(out, errorCatalogue());
                    break;
                case "--idl":
                    write(out, IdlWriter.interfaceIdl());
                    break;
                case "--readme":
                    write(out, withFunctionTable(new String(Files.readAllBytes(out), StandardCharsets.UTF_8)));
                    break;
                default:
                    throw new IllegalArgumentException(USAGE);
            }
        }
    }

    private static final String USAGE = "usage: MetadataWriter OUT.xcu | [--docs functions.md] [--errors errors.md] "
            + "[--idl XMixtureFunctions.idl] [--readme README.md]";

    private static void write(Path out, String text) throws IOException {
        if (out.getParent() != null) {
            Files.createDirectories(out.getParent());
        }
        Files.write(out, text.getBytes(StandardCharsets.UTF_8));
    }

    /** The CalcAddIns configuration: node names must equal the UNO service, IDL method and IDL parameter names. */
    public static String calcAddInsXcu() {
        StringBuilder x = new StringBuilder();
        x.append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
        x.append("<!-- Generated from the function catalogue by MetadataWriter; do not edit. -->\n");
        x.append("<oor:component-data xmlns:oor=\"http://openoffice.org/2001/registry\"")
                .append(" xmlns:xs=\"http://www.w3.org/2001/XMLSchema\"")
                .append(" oor:name=\"CalcAddIns\" oor:package=\"org.openoffice.Office\">\n");
        x.append(" <node oor:name=\"AddInInfo\">\n");
        x.append("  <node oor:name=\"").append(FunctionCatalog.SERVICE).append("\" oor:op=\"replace\">\n");
        x.append("   <node oor:name=\"AddInFunctions\">\n");
        for (FunctionInfo f : FunctionCatalog.functions()) {
            x.append("    <node oor:name=\"").append(f.method()).append("\" oor:op=\"replace\">\n");
            prop(x, "      ", "DisplayName", f.displayName(), true);
            prop(x, "      ", "Description", f.summary(), true);
            prop(x, "      ", "Category", f.category(), false);
            // the name a call is stored under in .xls files; without it Calc writes a macro name and a reload shows
            // #MACRO? (Err:531)
            prop(x, "      ", "CompatibilityName", f.displayName(), true);
            x.append("      <node oor:name=\"Parameters\">\n");
            for (ArgumentInfo a : f.arguments()) {
                x.append("       <node oor:name=\"").append(a.name()).append("\" oor:op=\"replace\">\n");
                prop(x, "        ", "DisplayName", a.displayName(), true);
                prop(x, "        ", "Description", a.description(), true);
                x.append("       </node>\n");
            }
            x.append("      </node>\n");
            x.append("    </node>\n");
        }
        x.append("   </node>\n");
        x.append("  </node>\n");
        x.append(" </node>\n");
        x.append("</oor:component-data>\n");
        return x.toString();
    }

    private static void prop(StringBuilder x, String indent, String name, String value, boolean localised) {
        x.append(indent).append("<prop oor:name=\"").append(name).append("\">");
        x.append(localised ? "<value xml:lang=\"en-US\">" : "<value>").append(escape(value)).append("</value>");
        x.append("</prop>\n");
    }

    static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }

    /** docs/functions.md. */
    public static String functionReference() {
        StringBuilder m = new StringBuilder();
        m.append("# Function reference\n\n");
        m.append("<!-- Generated from the function catalogue (addin/core/src/main/java/org/miscela/core/catalog/"
                + "FunctionCatalog.java); a test fails when this file is out of date. Regenerate with\n"
                + "     scripts/regenerate-docs. -->\n\n");
        m.append("All functions take the card (a named range) first. Numbers are in the units the card states. "
                + "A composition or temperature argument may be a range: the result is then an array of the same "
                + "shape (enter the formula as an array formula), and blank input cells give blank results. "
                + "Bad input shows Err:502; `MIX.EXPLAIN` with the same arguments tells why. Outside the card's validity range results "
                + "are refused unless extrapolation is allowed (per call or on the card).\n\n");
        m.append("**Examples.** Each function's example is entered in a real office by a test "
                + "(`ReferenceExamplesIT`), which checks that Calc shows the value printed here. The examples use "
                + "these cards (test resources in `addin/core/src/test/resources/cards/`): `card`, ethanol + water "
                + "fitted to the OIML R 22 densities (`ethanol-water-oiml.tsv`); `tern`, three invented liquids P, Q "
                + "and R (`ternary-invented.tsv`, invented values); `acid`, sulfuric acid + water fitted to the NBS "
                + "heats of solution (`sulfuric-acid-water-nbs.tsv`); `cov`, ethanol + water at 20 °C with a "
                + "coefficient covariance (`ethanol-water-covariance.tsv`, fitted to OIML densities with invented "
                + "noise); `vle`, ethanol + water with G^E/RT fitted to published vapour-liquid equilibrium data and "
                + "Wagner vapour pressures (`ethanol-water-vle.tsv`); `vlw`, the same liquids by Wilson's model with "
                + "published parameters (`ethanol-water-wilson.tsv`); `gibhelm`, two invented liquids P and Q whose "
                + "excess enthalpy is computed from their G^E/RT (`invented-gibbs-helmholtz.tsv`, invented values); "
                + "`fmin`, two invented solvents that flash lower together than apart (`invented-flash-minimum.tsv`, "
                + "invented values); "
                + "`ice`, the `vle` card with the melting rows of ice (`ethanol-water-vle-ice.tsv`). "
                + "Formulas are written with `;` between arguments and, inside inline arrays, `;` between "
                + "columns and `|` between rows (the form the office's API and ODF files use; in the English "
                + "user interface type `,` between the columns of an inline array and `;` between its rows).\n\n"
                + "**Errors.** A refused call shows Err:502; the message below (with `…` for the details the "
                + "actual message fills in) says why, and `MIX.EXPLAIN(\"MIX.…\"; the same arguments)` shows it "
                + "in a cell (so do `MIX.CHECK` / `MIX.CHECKPOINT` for a card or a point, and a fit's result "
                + "`\"check\"`). Every function that reads a card also reports the card's own "
                + "problems (docs/card-format.md). Calc itself shows Err:504 for a call that ends before its last "
                + "required argument or has too many, or with an error cell inside a range argument, and Err:502 for "
                + "a required argument left out between others (`;;`).\n\n"
                + "**Optional arguments** are in brackets in the syntax and marked *(optional)* in the tables, as "
                + "the Function Wizard marks them; every other argument is required, and the wizard shows it in "
                + "bold.\n\n");
        m.append("| function | what it returns |\n|---|---|\n");
        for (FunctionInfo f : FunctionCatalog.functions()) {
            m.append("| [`").append(f.displayName()).append("`](#").append(anchor(f.displayName())).append(") | ")
                    .append(f.summary().replace("|", "\\|")).append(" |\n");
        }
        for (FunctionInfo f : FunctionCatalog.functions()) {
            m.append("\n## ").append(f.displayName()).append("\n\n");
            m.append(f.summary()).append("\n\n");
            m.append("Syntax: `").append(syntax(f)).append("`\n\n");
            m.append("| argument | meaning |\n|---|---|\n");
            for (ArgumentInfo a : f.arguments()) {
                m.append("| ").append(a.displayName()).append(a.optional() ? " *(optional)*" : "").append(" | ")
                        .append(a.description().replace("|", "\\|")).append(" |\n");
            }
            m.append("\nFormula: ").append(f.formula()).append("\n\n");
            m.append("Example: `").append(f.example()).append("` shows **").append(f.exampleResult())
                    .append("**.\n\n");
            if (!f.errors().isEmpty()) {
                m.append("Refused (Err:502) when:\n\n");
                for (Problem e : f.errors()) {
                    m.append("- `").append(e.name()).append("`: ").append(pattern(e).replaceAll("%[sd]", "…").replace("%%", "%"))
                            .append('\n');
                }
                m.append('\n');
            }
            m.append("Saved in ODF files as `").append(FunctionCatalog.SERVICE).append('.').append(f.method())
                    .append("`.\n");
        }
        return m.toString();
    }

    /** The README's function table is the text between these two lines. */
    public static final String TABLE_START = "<!-- function table: generated from the function catalogue by "
            + "scripts/regenerate-docs; a test fails when it is out of date -->";
    public static final String TABLE_END = "<!-- end of the function table -->";

    /** The README's function table: each function's syntax and a few words on what it returns. */
    public static String functionTable() {
        StringBuilder m = new StringBuilder("| function | returns |\n|---|---|\n");
        for (FunctionInfo f : FunctionCatalog.functions()) {
            m.append("| `").append(syntax(f)).append("` | ").append(f.brief().replace("|", "\\|")).append(" |\n");
        }
        return m.toString();
    }

    /** The README's text with the function table between its markers made anew. */
    public static String withFunctionTable(String readme) {
        int start = readme.indexOf(TABLE_START);
        int end = readme.indexOf(TABLE_END);
        if (start < 0 || end < start) {
            throw new IllegalArgumentException("the README lacks the function table's markers: " + TABLE_START
                    + " … " + TABLE_END);
        }
        return readme.substring(0, start + TABLE_START.length()) + "\n" + functionTable()
                + readme.substring(end);
    }

    /** How a call is written, optional arguments in brackets: {@code MIX.DENSITY(card; x1; temperature; [extrapolate])}. */
    public static String syntax(FunctionInfo f) {
        return f.syntax();
    }

    /** docs/errors.md: every message the add-in can produce, where it occurs and what Calc shows. */
    public static String errorCatalogue() {
        StringBuilder m = new StringBuilder();
        m.append("# Error catalogue\n\n");
        m.append("<!-- Generated from the message catalogue (org.miscela.core.problem.Problem, one section per table "
                + "below) and the function catalogue; a test fails when this file is out of date. Regenerate with "
                + "scripts/regenerate-docs. -->\n\n");
        m.append("Every message names what was wrong and how to put it right; `…` stands for the details the actual "
                + "message fills in (a row number, a value, a name).\n\n");
        m.append("## What Calc shows\n\n");
        m.append("| Calc shows | Meaning | Where the words are |\n|---|---|---|\n");
        m.append("| Err:502 | The add-in refused the call: one of the messages below. | "
                + "`MIX.EXPLAIN(\"MIX.…\"; the same arguments)` for any refused call: put the function's name "
                + "first and then the call's own arguments (copy them from the formula). Also `MIX.CHECK(card)` "
                + "for the card's problems, `MIX.CHECKPOINT(card; x; temperature)` for a point's, a fit's result "
                + "`\"check\"` for a fit's. |\n");
        m.append("| Err:523 | A numerical search inside the add-in did not converge (`").append(Problem.NO_CONVERGENCE)
                .append("` below): Calc's own code for a calculation that does not converge. | `MIX.EXPLAIN` of the "
                + "same call, as for Err:502. |\n");
        m.append("| Err:504 | Calc's own parameter error: a required argument left out, too many arguments, or an "
                + "error value inside a range argument (for example a card whose fitted cells show Err:502). Calc "
                + "does not call the add-in. | `MIX.EXPLAIN` says when the number of arguments is wrong; otherwise "
                + "look at the arguments' cells. |\n");
        m.append("| the argument's own error (#DIV/0!, #N/A, …) | An argument that is an error value; Calc passes it "
                + "through without calling the add-in. | The argument's cell. |\n");
        m.append("| #NAME? | The extension is not installed in this LibreOffice, or the function name is "
                + "misspelt. | Tools ▸ Extension Manager; `MIX.EXPLAIN(\"the name\")` lists the names there are. |\n");
        m.append("| #VALUE! | An unexpected failure: a fault in the add-in, not a refusal (see the last section). | "
                + "`MIX.EXPLAIN` of the same call, and `MIX.INFO(\"last failure\")` for the last one since the office "
                + "started. |\n");
        m.append("| text | `MIX.EXPLAIN`, `MIX.CHECK`, `MIX.CHECKPOINT`, `MIX.TRACE` labels, a fit's `\"check\"` "
                + "and `MIX.ADJUST`'s `\"summary\"` return text by design. | — |\n\n");
        m.append("A required argument left out (`;;`, or `;` at the end, where a range or a required value belongs) "
                + "makes Calc show Err:502 itself, without calling the add-in; `MIX.EXPLAIN` says which argument it "
                + "is.\n\n");
        m.append("Every message of the tables of a call, a fit and a blending calculation below, and every answer of "
                + "`MIX.EXPLAIN` itself, is produced in a real office by a spreadsheet test "
                + "(`addin/uno/src/test/resources/sheets/errors.spec`, checked by `ErrorCatalogueIT`): the call shows "
                + "its error code and `MIX.EXPLAIN` of the same call the message. The exceptions are marked *not "
                + "reachable from a cell*, with the reason: they guard the library's own callers or paths the cell "
                + "functions never take, and `UnreachableProblemsTest` produces each through the library (all but "
                + "one, for which no input is known). Every card problem is shown by `MIX.CHECK` in a real office "
                + "(`CardProblemsIT`).\n\n");
        m.append("The add-in never returns NaN or an infinity (Calc would show #NUM!); the tests (`CalcFuzzIT`, the "
                + "core fuzzers) check that it does not, and that no call fails unexpectedly.\n\n");
        m.append("## Problems with a card\n\n");
        m.append("Reported by every function given the card (Err:502) and, in words, by `MIX.CHECK(card)`; each "
                + "names the card row. The layout rules behind them are in [card-format.md](card-format.md).\n\n");
        table(m, Problem.of(Problem.Section.CARD), false);
        m.append("\n## Warnings and details of MIX.CHECK\n\n");
        m.append("A card that reads but looks like a mistake (a value outside the range of common liquids, rows in "
                + "sorted order, coefficients written with too few digits for a card whose terms cancel, a range far "
                + "larger than the card) is never refused: every function computes as before, and `MIX.CHECK(card)` "
                + "says `OK with n warnings: …` instead of `OK` (so a formula comparing it with \"OK\" is TRUE only for "
                + "a card with nothing to report). `MIX.CHECK(card; \"warnings\")` lists them one per row, "
                + "`MIX.EXPLAIN` of a call on the card that gives a result says them too, and `MIX.CHECK(card; "
                + "\"extent\")` answers with one of the two texts at the end of this table. The bounds and their "
                + "sources are in [card-format.md](card-format.md#warnings-of-mixcheck).\n\n");
        table(m, Problem.of(Problem.Section.CHECK), false);
        m.append("\n## Warnings of MIX.EXPLAIN about a call's arguments\n\n");
        m.append("Input that looks like a slip but can be real (a strength under 1 %vol, a laboratory batch, a "
                + "correction to a working temperature) is never refused: the call gives its result, and "
                + "`MIX.EXPLAIN` of the same call says `OK with n warnings: …` with these beside the card's own "
                + "warnings. [The mistakes sheet](../addin/uno/src/test/resources/sheets/mistakes.spec) has a row for "
                + "each.\n\n");
        table(m, Problem.of(Problem.Section.SLIP), false);
        m.append("\n## Problems with a call\n\n");
        table(m, Problem.of(Problem.Section.CALL), true);
        m.append("\n## Problems with a fit\n\n");
        table(m, Problem.of(Problem.Section.FIT), true);
        m.append("\n## Problems with a blending calculation\n\n");
        table(m, Problem.of(Problem.Section.BLEND), true);
        m.append("\n## What MIX.EXPLAIN answers about a call it cannot run\n\n");
        m.append("`MIX.EXPLAIN` never refuses: for a call it cannot run it answers one of these instead of "
                + "\"OK\" or the call's refusal.\n\n");
        m.append("| Answer | Message |\n|---|---|\n");
        for (Problem p : FunctionCatalog.explainAnswers()) {
            m.append("| `").append(p.name()).append("` | ").append(pattern(p).replaceAll("%[sd]", "…").replace("%%", "%")
                    .replace("|", "\\|")).append(" |\n");
        }
        m.append("\n## An unexpected failure\n\n");
        m.append("Any other exception inside the add-in is a fault in it, never a refusal: Calc shows #VALUE!, and "
                + "the add-in writes no file and no log. The words are kept instead: `MIX.EXPLAIN` of the same call "
                + "answers with them, and `MIX.INFO(\"last failure\")` returns the last failure since the office "
                + "started, with its time (UTC) and function (only the last one is kept, a thousand characters at most): "
                + "the exception's class and message and where in the add-in's code it happened. Please report them "
                + "with the call.\n\n");
        table(m, Problem.of(Problem.Section.FAILURE), false);
        return m.toString();
    }

    private static void table(StringBuilder m, java.util.List<Problem> problems, boolean where) {
        m.append(where ? "| Problem | Message | Reported by |\n|---|---|---|\n" : "| Problem | Message |\n|---|---|\n");
        for (Problem p : problems) {
            m.append("| `").append(p.name()).append("` | ")
                    .append(pattern(p).replaceAll("%[sd]", "…").replace("%%", "%").replace("|", "\\|"));
            if (where) {
                StringBuilder fs = new StringBuilder();
                for (FunctionInfo f : FunctionCatalog.functions()) {
                    if (f.errors().contains(p)) {
                        fs.append(fs.length() == 0 ? "" : ", ").append(f.displayName());
                    }
                }
                String unreachable = FunctionCatalog.notFromACell().get(p);
                m.append(" | ").append(unreachable != null ? "not reachable from a cell: " + unreachable
                        : fs.length() == 0 ? "—" : fs);
            }
            m.append(" |\n");
        }
    }

    /** The message pattern of a catalogue entry. */
    static String pattern(Problem problem) {
        return problem.pattern();
    }

    private static String anchor(String displayName) {
        return displayName.toLowerCase(java.util.Locale.ROOT).replace(".", "");
    }
}
