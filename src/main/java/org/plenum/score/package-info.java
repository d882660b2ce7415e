/**
 * Closing the loop, pure: the paired set, the placebo, the process scorecard, the decision lens,
 * time and money, and one class per published method (AvgRelMAE, geometric-mean ratio, Wilcoxon
 * signed-rank, bootstrap interval, adjustment outcome, size class, evidence). Depends on core
 * only; takes and returns values.
 */
package org.plenum.score;
