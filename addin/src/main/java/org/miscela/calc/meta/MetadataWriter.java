package org.miscela.calc.meta;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;

/**
 * Writes the artefacts made from the {@link FunctionCatalog}: Calc's wizard metadata (CalcAddIns.xcu) and the function
 * reference (docs/functions.md). Run by the build; {@code --docs PATH} rewrites the reference.
 */
public final class MetadataWriter {
    private MetadataWriter() {
    }

    public static void main(String[] args) throws IOException {
        if (args.length == 2 && args[0].equals("--docs")) {
            write(Paths.get(args[1]), functionReference());
        } else if (args.length == 1) {
            write(Paths.get(args[0]), calcAddInsXcu());
        } else {
            throw new IllegalArgumentException("usage: MetadataWriter OUT.xcu | --docs OUT.md");
        }
    }

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
        m.append("<!-- Generated from the function catalogue (addin/src/main/java/org/miscela/calc/meta/"
                + "FunctionCatalog.java); a test fails when this file is out of date. Regenerate with\n"
                + "     scripts/regenerate-docs. -->\n\n");
        m.append("All functions take the card (a named range) first. Numbers are in the units the card states. "
                + "A composition or temperature argument may be a range: the result is then an array of the same "
                + "shape (enter the formula as an array formula), and blank input cells give blank results. "
                + "Bad input shows Err:502; `MIX.CHECK` tells why. Outside the card's validity range results "
                + "are refused unless extrapolation is allowed (per call or on the card).\n\n");
        m.append("**Examples.** Each function's example is entered in a real office by a test "
                + "(`ReferenceExamplesIT`), which checks that Calc shows the value printed here. The examples use "
                + "these cards (test resources in `addin/src/test/resources/cards/`): `card`, ethanol + water "
                + "fitted to the OIML R 22 densities (`ethanol-water-oiml.tsv`); `tern`, three invented liquids P, Q "
                + "and R (`ternary-invented.tsv`, invented values); `acid`, sulfuric acid + water fitted to the NBS "
                + "heats of solution (`sulfuric-acid-water-nbs.tsv`); `cov`, ethanol + water at 20 °C with a "
                + "coefficient covariance (`ethanol-water-covariance.tsv`, fitted to OIML densities with invented "
                + "noise). Formulas are written with `;` between arguments and, inside inline arrays, `;` between "
                + "columns and `|` between rows (the form the office's API and ODF files use; in the English "
                + "user interface type `,` between the columns of an inline array and `;` between its rows).\n\n"
                + "**Errors.** A refused call shows Err:502; the message below (with `…` for the details the "
                + "actual message fills in) says why, and `MIX.CHECK` / `MIX.CHECKPOINT` (or a fit's result "
                + "`\"check\"`) show it in a cell. Every function that reads a card also reports the card's own "
                + "problems (docs/card-format.md). Calc itself shows Err:504 for a missing required argument or "
                + "an error cell inside a range argument.\n\n");
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
                m.append("| ").append(a.displayName()).append(" | ").append(a.description().replace("|", "\\|"))
                        .append(" |\n");
            }
            m.append("\nFormula: ").append(f.formula()).append("\n\n");
            m.append("Example: `").append(f.example()).append("` shows **").append(f.exampleResult())
                    .append("**.\n\n");
            if (!f.errors().isEmpty()) {
                m.append("Refused (Err:502) when:\n\n");
                for (Enum<?> e : f.errors()) {
                    m.append("- `").append(e.name()).append("`: ").append(pattern(e).replaceAll("%[sd]", "…"))
                            .append('\n');
                }
                m.append('\n');
            }
            m.append("Saved in ODF files as `").append(FunctionCatalog.SERVICE).append('.').append(f.method())
                    .append("`.\n");
        }
        return m.toString();
    }

    /** How a call is written, optional arguments in brackets: {@code MIX.DENSITY(card; x1; temperature; [extrapolate])}. */
    public static String syntax(FunctionInfo f) {
        StringBuilder b = new StringBuilder(f.displayName()).append('(');
        for (int i = 0; i < f.arguments().size(); i++) {
            ArgumentInfo a = f.arguments().get(i);
            b.append(i > 0 ? "; " : "").append(a.optional() ? "[" + a.displayName() + "]" : a.displayName());
        }
        return b.append(')').toString();
    }

    /** The message pattern of a Problem or FitProblem entry. */
    static String pattern(Enum<?> problem) {
        if (problem instanceof org.miscela.core.Problem) {
            return ((org.miscela.core.Problem) problem).pattern();
        }
        if (problem instanceof org.miscela.core.blend.BlendProblem) {
            return ((org.miscela.core.blend.BlendProblem) problem).pattern();
        }
        return ((org.miscela.core.fit.FitProblem) problem).pattern();
    }

    private static String anchor(String displayName) {
        return displayName.toLowerCase(java.util.Locale.ROOT).replace(".", "");
    }
}
