package org.miscela.core.functions;

import org.miscela.core.problem.Problem;

/** The extensive properties a card can describe, for functions that take the property as an argument. */
public enum PropertyKind {
    VOLUME("volume"),
    ENTHALPY("enthalpy"),
    /** The liquid's activity coefficients and the vapour over it (MIX.TRACE only). */
    VAPOUR("vapour"),
    /** The vapour trace and the flash point's terms by Liaw's model (MIX.TRACE only). */
    FLASH("flash"),
    /** The freezing point's terms: each crystallising component's melting data against its activity (MIX.TRACE only). */
    FREEZING("freezing");

    private final String word;

    PropertyKind(String word) {
        this.word = word;
    }

    public String word() {
        return word;
    }

    /** The property spelled {@code text} (case ignored); fails with a readable message otherwise. */
    public static PropertyKind lookup(String text) {
        for (PropertyKind p : values()) {
            if (p.word.equalsIgnoreCase(text.trim())) {
                return p;
            }
        }
        throw Problem.UNKNOWN_PROPERTY.raise(text.trim(), "volume, enthalpy, vapour, flash, freezing");
    }
}
