/**
 * The pure domain: periods (months and ISO weeks as positions on a line), exact quantities,
 * decisions, the event-tag vocabulary, sorted value columns, and the point error measures (WAPE,
 * percentage bias, MASE). No I/O of any kind; depends on nothing else in Plenum.
 */
package org.plenum.core;
