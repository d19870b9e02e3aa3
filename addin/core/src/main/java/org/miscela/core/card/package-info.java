/**
 * The card: reading a named range's cells (format versions 1 and 2, docs/card-format.md) into an immutable
 * {@link org.miscela.core.card.Card}, the card's units and validity range, the mixture view of its pure liquids and
 * excess functions (and where the blend's heat capacity comes from), the packed card (one text holding a card's cells)
 * and the cache that parses each distinct card content once, whichever form it comes in.
 */
package org.miscela.core.card;
