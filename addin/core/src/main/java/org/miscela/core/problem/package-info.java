/**
 * What the add-in says when it refuses: the catalogue of problems with their message patterns, the exception that
 * carries one, and the formatting of numbers quoted in messages. The lowest layer of the core: it depends on no other
 * package of it, so every other package can raise a problem.
 */
package org.miscela.core.problem;
