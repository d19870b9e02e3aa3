package org.miscela.core.card;

/** Whether one evaluation may go outside the card's validity range. */
public enum Extrapolation {
    /** Follow the card's own 'extrapolation' row (refuse when it has none). */
    AS_CARD,
    /** Accept results outside the validity range for this evaluation. */
    ALLOW,
    /** Refuse results outside the validity range, whatever the card says. */
    REFUSE
}
