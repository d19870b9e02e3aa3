package org.miscela.core.catalog;

/** One argument of a cell function: its IDL name (permanent), the name the wizard shows, and its help text. */
public final class ArgumentInfo {
    private final String name;
    private final String displayName;
    private final String description;
    private final boolean optional;

    ArgumentInfo(String name, String displayName, String description, boolean optional) {
        this.name = name;
        this.displayName = displayName;
        this.description = description;
        this.optional = optional;
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

    public boolean optional() {
        return optional;
    }
}
