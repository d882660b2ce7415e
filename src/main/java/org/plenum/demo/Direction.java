package org.plenum.demo;

/** What a simulated review did to the statistical forecast of one item in one cycle. */
enum Direction {
    UP, DOWN, ZERO, KEEP
}
