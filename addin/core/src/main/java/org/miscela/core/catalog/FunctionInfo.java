package org.miscela.core.catalog;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import org.miscela.core.problem.Problem;

/**
 * One cell function: what a person needs to know about it and its UNO signature. The IDL interface, the wizard
 * metadata, the reference and the README's function table are made from it.
 */
public final class FunctionInfo {
    private final String method;
    private final String displayName;
    private final String brief;
    private final String summary;
    private final String formula;
    private final String example;
    private final List<ArgumentInfo> arguments;
    private String exampleResult = "";
    private List<Problem> errors = Collections.emptyList();
    private IdlType returnType = IdlType.ANY;
    private boolean raisesIllegalArgument = true;

    FunctionInfo(String method, String displayName, String brief, String summary, String formula, String example,
            ArgumentInfo... arguments) {
        this.method = method;
        this.displayName = displayName;
        this.brief = brief;
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

    /**
     * A function that answers in words: its result is text (IDL {@code string}) and it raises nothing, so a problem
     * is its answer, never Err:502.
     */
    FunctionInfo answersInWords() {
        this.returnType = IdlType.STRING;
        this.raisesIllegalArgument = false;
        return this;
    }

    /**
     * A function that answers in words or, asked for a detail, in a table: its result is {@code any} (a text or an
     * array) and it raises nothing, so a problem is its answer, never Err:502.
     */
    FunctionInfo answersInWordsOrTables() {
        this.returnType = IdlType.ANY;
        this.raisesIllegalArgument = false;
        return this;
    }

    /** The IDL result type: {@code any} (a number, a text or an array), or {@code string}. */
    public IdlType returnType() {
        return returnType;
    }

    /**
     * Whether the IDL method raises com.sun.star.lang.IllegalArgumentException, which Calc shows as Err:502: every
     * function but those that answer in words.
     */
    public boolean raisesIllegalArgument() {
        return raisesIllegalArgument;
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

    /** A few words on what the function returns, for the README's function table. */
    public String brief() {
        return brief;
    }

    /** What the function returns: the wizard's description and the IDL method's doc comment. */
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
