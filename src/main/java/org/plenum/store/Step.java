package org.plenum.store;

/** One configured stage of the forecasting process, in its place in the order (1 = first). */
public record Step(int id, String name, int position) {}
