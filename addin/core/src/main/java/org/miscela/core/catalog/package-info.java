/**
 * The single source of truth for every cell function's face: its permanent IDL method name, display name, texts,
 * arguments and the problems it may report. The build generates the wizard's XCU and the docs from it, and tests
 * check the IDL, the adapter and the explain table against it. Pure data: nothing else in the core depends on it.
 */
package org.miscela.core.catalog;
