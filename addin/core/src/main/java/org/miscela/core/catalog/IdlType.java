package org.miscela.core.catalog;

/**
 * The UNO IDL types of the cell functions' parameters and results, spelled as the IDL file spells them. The type
 * decides what Calc passes: every cell of a range, or one value.
 */
public enum IdlType {
    /**
     * A cell range, a single cell or an inline array: Calc passes every cell, a blank one in a multi-cell range as "",
     * and a single value as a one-cell range. Compositions, temperatures that may be ranges, cards and lab data are
     * ranges, because a blank must never count as zero; so is every required single value, because the Function
     * Wizard shows a typed parameter as required and an {@code any} as optional. Left out, Calc refuses the call
     * itself (Err:502, or Err:504 at the end of the call).
     */
    RANGE("sequence< sequence< any > >", Kind.RANGE),
    /**
     * One value (number, text or boolean), or a range's cells when given one: the type of the optional single values
     * only. Calc passes a left-out argument as void, and its Function Wizard shows every such parameter as
     * optional.
     */
    ANY("any", Kind.VALUE),
    /** A variable argument list: every further argument of the call, each as Calc passes it. */
    ARGUMENT_LIST("sequence< any >", Kind.ARGUMENT_LIST),
    /** Text: the result of the functions that answer in words. */
    STRING("string", Kind.VALUE);

    /** What a parameter of this type receives from Calc: a range's cells, one value, or a list of arguments. */
    public enum Kind {
        RANGE, VALUE, ARGUMENT_LIST
    }

    private final String idl;
    private final Kind kind;

    IdlType(String idl, Kind kind) {
        this.idl = idl;
        this.kind = kind;
    }

    /** The type as the IDL file writes it. */
    public String idl() {
        return idl;
    }

    public Kind kind() {
        return kind;
    }
}
