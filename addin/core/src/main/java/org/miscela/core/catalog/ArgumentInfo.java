package org.miscela.core.catalog;

/**
 * One argument of a cell function: its IDL name (permanent) and IDL type, the name the wizard shows, its help text
 * (also the IDL's {@code @param} comment), and whether a call may leave it out.
 */
public final class ArgumentInfo {
    private final String name;
    private final String displayName;
    private final String description;
    private final boolean optional;
    private final IdlType type;

    ArgumentInfo(String name, String displayName, String description, boolean optional, IdlType type) {
        if (!optional && type == IdlType.ANY) {
            // Calc's Function Wizard shows every 'any' parameter as optional: a required one must be typed
            throw new IllegalArgumentException("the required argument " + name + " cannot be an 'any'");
        }
        this.name = name;
        this.displayName = displayName;
        this.description = description;
        this.optional = optional;
        this.type = type;
    }

    public String name() {
        return name;
    }

    public String displayName() {
        return displayName;
    }

    public String description() {
        return description;
    }

    /** Whether the syntax shows the argument in brackets: a call may leave it out. */
    public boolean optional() {
        return optional;
    }

    /** The IDL type: it decides what Calc passes (saved workbooks store no types, only names). */
    public IdlType type() {
        return type;
    }

    /** Range or single value (or MIX.EXPLAIN's list of arguments), from the IDL type. */
    public IdlType.Kind kind() {
        return type.kind();
    }
}
