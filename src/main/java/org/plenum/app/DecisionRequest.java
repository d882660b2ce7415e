package org.plenum.app;

import java.math.BigDecimal;
import java.util.List;

/**
 * A decision as typed on the command line, not yet checked against the workspace.
 *
 * @param quantity the new absolute quantity, or null
 * @param percent the relative change in percent (may be negative), or null
 * @param keep reviewed and left as it is
 * @param minutes minutes spent, or null when not given
 * @param step the step decided, or null for the workspace's ledger step
 */
public record DecisionRequest(String item, String cycle, List<String> periods, String quantity, BigDecimal percent,
        boolean keep, String reason, String tag, String minutes, String step, String author) {}
