/**
 * The use cases both front ends call (init, import, decide, score, export, demo, benchmarks). Holds
 * no SQL and no formulas: it composes store, io and score.
 */
package org.plenum.app;
