package org.miscela.core.catalog;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import org.miscela.core.problem.Problem;

/** What a person needs to know about one cell function; the wizard metadata and the reference are made from it. */
public final class FunctionInfo {
    private final String method;
    private final String displayName;
    private final String summary;
    private final String formula;
    private final String example;
    private final List<ArgumentInfo> arguments;
    private String exampleResult = "";
    private List<Problem> errors = Collections.emptyList();

    FunctionInfo(String method, String displayName, String summary, String formula, String example,
            ArgumentInfo... arguments) {
        this.method = method;
        this.displayName = displayName;
        this.summary = summary;
        this.formula = formula;
        this.example = example;
        this.arguments = Collections.unmodifiableList(Arrays.asList(arguments));
    }

    /** The value the example shows in Calc (as text, rounded), checked in a real office by a test. */
    FunctionInfo shows(String result) {
        this.exampleResult = result;
        return this;
    }

    /** The problems this function reports besides those of the card itself (entries of the call, fit and blending sections of the catalogue). */
    FunctionInfo refuses(List<Problem> problems) {
        this.errors = Collections.unmodifiableList(problems);
        return this;
    }

    public String exampleResult() {
        return exampleResult;
    }

    public List<Problem> errors() {
        return errors;
    }

    /** The IDL method name, permanent: saved workbooks refer to it. */
    public String method() {
        return method;
    }

    /** The name users type in a cell. */
    public String displayName() {
        return displayName;
    }

    public String summary() {
        return summary;
    }

    public String formula() {
        return formula;
    }

    public String example() {
        return example;
    }

    public List<ArgumentInfo> arguments() {
        return arguments;
    }

    /** How a call is written, optional arguments in brackets: {@code MIX.DENSITY(card; x; temperature; [extrapolate])}. */
    public String syntax() {
        StringBuilder b = new StringBuilder(displayName).append('(');
        for (int i = 0; i < arguments.size(); i++) {
            ArgumentInfo a = arguments.get(i);
            b.append(i > 0 ? "; " : "").append(a.optional() ? "[" + a.displayName() + "]" : a.displayName());
        }
        return b.append(')').toString();
    }

    /** Calc's own category (one of its fixed English names). */
    public String category() {
        return FunctionCatalog.CATEGORY;
    }
}
