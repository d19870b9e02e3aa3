/**
 * The library of cards shipped inside the add-in: each a card file in the card format with its published source,
 * validity range, stated accuracy and the outside check a test holds it to (docs/card-library.md). Lists them and
 * gives one as cells, so that placed in a sheet it is an ordinary card.
 */
package org.miscela.core.library;
