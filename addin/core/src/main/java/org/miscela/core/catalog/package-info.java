/**
 * The single source of truth for every cell function's face: its permanent IDL method name, display name, texts,
 * result type, arguments with their IDL types, and the problems it may report. The IDL interface, the wizard's XCU,
 * the docs and the README's function table are generated from it, and tests check the compiled interface, the
 * adapter, the explain table and the fuzzers against it. Pure data: nothing else in the core depends on it.
 */
package org.miscela.core.catalog;
