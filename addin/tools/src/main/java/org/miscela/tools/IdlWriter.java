package org.miscela.tools;

import java.util.ArrayList;
import java.util.List;
import org.miscela.core.catalog.ArgumentInfo;
import org.miscela.core.catalog.FunctionCatalog;
import org.miscela.core.catalog.FunctionInfo;

/**
 * Writes the add-in's IDL interface (idl/org/miscela/calc/XMixtureFunctions.idl) from the {@link FunctionCatalog}:
 * one method per function in catalogue order, each parameter with its catalogue name and IDL type, the function's
 * summary as the method's doc comment and each argument's help text as its {@code @param}. The file is committed
 * (method names are permanent, so every change to it should show in review); FunctionCatalogTest fails when it
 * differs from this text, and scripts/regenerate-docs rewrites it.
 */
public final class IdlWriter {
    /** Where the file lives, relative to the repository. */
    public static final String PATH = "idl/org/miscela/calc/XMixtureFunctions.idl";
    private static final int WIDTH = 120;
    private static final String INDENT = "    ";
    private static final String RAISES = "raises (com::sun::star::lang::IllegalArgumentException)";

    private IdlWriter() {
    }

    /** The whole IDL file. */
    public static String interfaceIdl() {
        StringBuilder b = new StringBuilder();
        b.append("/*\n");
        for (String line : wrap(HEADER, WIDTH - 3)) {
            b.append(line.isEmpty() ? " *" : " * " + line).append('\n');
        }
        b.append(" */\n");
        b.append("module org { module miscela { module calc {\n\n");
        b.append("interface XMixtureFunctions : com::sun::star::uno::XInterface\n{\n");
        List<FunctionInfo> functions = FunctionCatalog.functions();
        for (int i = 0; i < functions.size(); i++) {
            b.append(i == 0 ? "" : "\n");
            method(b, functions.get(i));
        }
        b.append("};\n\n}; }; };\n");
        return b.toString();
    }

    private static final String HEADER = "Generated from the function catalogue "
            + "(addin/core/src/main/java/org/miscela/core/catalog/FunctionCatalog.java) by org.miscela.tools.IdlWriter; "
            + "FunctionCatalogTest fails when this file differs from it. Regenerate with scripts/regenerate-docs.\n\n"
            + "Miscela: the Calc cell functions for non-ideal liquid mixtures. The interface's method and parameter "
            + "names are written into every saved workbook (of:=ORG.MISCELA.CALC.MIXTUREFUNCTIONS.METHOD(…)) and into "
            + "the wizard metadata, so they never change: add methods, never rename one.\n\n"
            + "A range parameter is sequence< sequence< any > > (every cell of the range, \"\" for a blank one in a "
            + "multi-cell range), because Calc passes an empty cell to an 'any' parameter as the number 0 and a "
            + "blank must never count as zero. A required single value is sequence< sequence< any > > too (a value, "
            + "a cell or a formula's result arrives as a one-cell range), because Calc's Function Wizard shows every "
            + "'any' parameter as optional and a typed one as required; only optional single values are 'any' (void "
            + "when left out). A refused call raises IllegalArgumentException, which Calc shows as Err:502; "
            + "MIX.EXPLAIN with the same arguments says why.";

    private static void method(StringBuilder b, FunctionInfo f) {
        String doc = INDENT + "    ";
        b.append(INDENT).append("/** ");
        appendWrapped(b, text(f.summary()), INDENT + "/** ", doc);
        for (ArgumentInfo a : f.arguments()) {
            String head = "@param " + a.name() + " ";
            b.append(doc).append(head);
            appendWrapped(b, text(a.description()), doc + head, doc + "    ");
        }
        b.append(INDENT).append("*/\n");
        b.append(INDENT).append(f.returnType().idl()).append(' ').append(f.method()).append('(');
        List<ArgumentInfo> args = f.arguments();
        for (int i = 0; i < args.size(); i++) {
            ArgumentInfo a = args.get(i);
            b.append('\n').append(INDENT).append(INDENT).append("[in] ").append(a.type().idl()).append(' ')
                    .append(a.name()).append(i < args.size() - 1 ? "," : ")");
        }
        if (args.isEmpty()) {
            b.append(')');
        }
        if (f.raisesIllegalArgument()) {
            b.append('\n').append(INDENT).append(INDENT).append(RAISES);
        }
        b.append(";\n");
    }

    /** A catalogue text as comment text: it must not end the comment. */
    private static String text(String s) {
        if (s.contains("*/")) {
            throw new IllegalArgumentException("a catalogue text would end the IDL comment: " + s);
        }
        return s;
    }

    /** Appends text wrapped to the width: the first line after {@code first}, further lines after {@code rest}. */
    private static void appendWrapped(StringBuilder b, String text, String first, String rest) {
        List<String> lines = wrap(text, WIDTH - first.length(), WIDTH - rest.length());
        for (int i = 0; i < lines.size(); i++) {
            b.append(i == 0 ? "" : rest).append(lines.get(i)).append('\n');
        }
    }

    private static List<String> wrap(String text, int width) {
        List<String> out = new ArrayList<>();
        for (String paragraph : text.split("\n", -1)) {
            out.addAll(paragraph.isEmpty() ? List.of("") : wrap(paragraph, width, width));
        }
        return out;
    }

    /** Words into lines of at most the width (a longer word stands alone); the first line may be narrower. */
    private static List<String> wrap(String text, int firstWidth, int width) {
        List<String> out = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : text.trim().split(" +")) {
            int limit = out.isEmpty() ? firstWidth : width;
            if (line.length() > 0 && line.length() + 1 + word.length() > limit) {
                out.add(line.toString());
                line.setLength(0);
            }
            line.append(line.length() == 0 ? "" : " ").append(word);
        }
        out.add(line.toString());
        return out;
    }
}
