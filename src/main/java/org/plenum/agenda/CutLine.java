package org.plenum.agenda;

import java.util.ArrayList;
import java.util.List;

/**
 * Where the meeting's time budget runs out, walking the agenda in rank order and adding each
 * item's expected minutes: an item is above the cut while the running total stays within the
 * budget; the first item that does not fit and everything after it are below (a line, not a
 * packing: a later, shorter item does not jump the queue). Hands-off items take no time and are
 * never above the cut.
 */
public final class CutLine {
    private CutLine() {}

    /**
     * @param minutes expected minutes per row, in rank order
     * @param handsOff whether each row is hands-off
     * @return per row, whether it is above the cut
     */
    public static List<Boolean> of(double budgetMinutes, double[] minutes, boolean[] handsOff) {
        List<Boolean> out = new ArrayList<>();
        double used = 0;
        boolean open = true;
        for (int i = 0; i < minutes.length; i++) {
            if (handsOff[i]) {
                out.add(false);
                continue;
            }
            used += minutes[i];
            open &= used <= budgetMinutes + 1e-9;
            out.add(open);
        }
        return out;
    }
}
