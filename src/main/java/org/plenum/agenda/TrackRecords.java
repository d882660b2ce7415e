package org.plenum.agenda;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import org.plenum.core.ScoredChange;
import org.plenum.score.AvgRelMae;
import org.plenum.score.Evidence;
import org.plenum.score.WilcoxonSignedRank;

/**
 * Track records of every item from the past changed pairs (DESIGN §6): AvgRelMAE (Davydenko &amp;
 * Fildes 2013) of the reviewed value against the statistical forecast, per item, per group and
 * for the whole workspace, each shrunk toward the next wider one.
 *
 * <p>{@code n} is the number of the item's changed pairs (not decisions: a decision over three
 * periods is three pairs), as AvgRelMAE weights series by their pairs. An item whose statistical
 * or reviewed MAE over its changed pairs is zero has no ratio (AvgRelMAE leaves it out) and gets
 * {@code n = 0}. With no ratio anywhere in the workspace the root ratio is 1: no sign that
 * review helps or hurts.
 *
 * <p>Evidence: the two-sided signed-rank test on {@code |e_stat| − |e_reviewed|} over the
 * narrowest pool (item, its group, the workspace) holding at least {@value Evidence#MIN_PAIRS}
 * changed pairs, read by {@link Evidence} against that pool's AvgRelMAE; the workspace's when
 * none is large enough (then "too few to tell").
 */
public final class TrackRecords {
    private final double k;
    private final Map<Integer, ItemPairs> byItem = new HashMap<>();
    private final Map<Integer, String> groups;
    private final Map<String, GroupRecord> byGroup = new HashMap<>();
    private final GroupRecord workspace;

    private record ItemPairs(AvgRelMae.Series series, long[] differences) {}

    /** A pool's AvgRelMAE (unshrunk and shrunk) and, once asked for, its evidence. */
    private static final class GroupRecord {
        final AvgRelMae.Result ratio;
        final double shrunk;
        final List<long[]> differences;
        final int pairs;
        Evidence evidence;

        GroupRecord(AvgRelMae.Result ratio, double shrunk, List<long[]> differences) {
            this.ratio = ratio;
            this.shrunk = shrunk;
            this.differences = differences;
            this.pairs = differences.stream().mapToInt(d -> d.length).sum();
        }

        Evidence evidence() {
            if (evidence == null) {
                long[] all = new long[pairs];
                int k = 0;
                for (long[] d : differences) {
                    System.arraycopy(d, 0, all, k, d.length);
                    k += d.length;
                }
                evidence = TrackRecords.evidence(all, ratio.value());
            }
            return evidence;
        }
    }

    /**
     * @param changed past changed pairs ({@code prior} = statistical forecast, {@code quantity} = reviewed value)
     * @param groups each item's group; items missing have none
     * @param k the shrinkage weight of the parent
     */
    public TrackRecords(List<ScoredChange> changed, Map<Integer, String> groups, double k) {
        this.k = k;
        this.groups = groups;
        Map<Integer, List<ScoredChange>> perItem = new HashMap<>();
        for (ScoredChange c : changed) {
            perItem.computeIfAbsent(c.item(), i -> new ArrayList<>()).add(c);
        }
        perItem.forEach((item, pairs) -> byItem.put(item, pairs(pairs)));
        List<AvgRelMae.Series> all = new ArrayList<>();
        List<long[]> allDifferences = new ArrayList<>();
        Map<String, List<Integer>> members = new HashMap<>();
        byItem.forEach((item, p) -> {
            all.add(p.series());
            allDifferences.add(p.differences());
            String group = groups.get(item);
            if (group != null) {
                members.computeIfAbsent(group, g -> new ArrayList<>()).add(item);
            }
        });
        AvgRelMae.Result root = AvgRelMae.of(all);
        workspace = new GroupRecord(root, root.value().orElse(1), allDifferences);
        members.forEach((group, items) -> {
            AvgRelMae.Result r = AvgRelMae.of(items.stream().map(i -> byItem.get(i).series()).toList());
            double shrunk = r.value().isPresent()
                    ? CredibilityShrinkage.shrink(r.pairsUsed(), r.value().getAsDouble(), workspace.shrunk, k)
                    : workspace.shrunk;
            byGroup.put(group, new GroupRecord(r, shrunk, items.stream().map(i -> byItem.get(i).differences()).toList()));
        });
    }

    private static ItemPairs pairs(List<ScoredChange> pairs) {
        long stat = 0;
        long reviewed = 0;
        long[] differences = new long[pairs.size()];
        for (int i = 0; i < differences.length; i++) {
            ScoredChange c = pairs.get(i);
            long statError = Math.abs(c.actual() - c.prior());
            long reviewedError = Math.abs(c.actual() - c.quantity());
            stat = Math.addExact(stat, statError);
            reviewed = Math.addExact(reviewed, reviewedError);
            differences[i] = statError - reviewedError;
        }
        return new ItemPairs(new AvgRelMae.Series(pairs.size(), reviewed, stat), differences);
    }

    /** The track record of an item (one without any history gets its group's). */
    public TrackRecord of(int item) {
        String group = groups.get(item);
        GroupRecord parent = group == null ? workspace : byGroup.getOrDefault(group, workspace);
        ItemPairs own = byItem.get(item);
        OptionalDouble ownRatio = own == null ? OptionalDouble.empty() : AvgRelMae.of(List.of(own.series())).value();
        long n = ownRatio.isPresent() ? own.series().periods() : 0;
        double shrunk = CredibilityShrinkage.shrink(n, ownRatio.orElse(1), parent.shrunk, k);
        if (own != null && own.differences().length >= Evidence.MIN_PAIRS) {
            return new TrackRecord(ownRatio, n, parent.shrunk, shrunk, evidence(own.differences(), ownRatio),
                    TrackRecord.Pool.ITEM);
        }
        if (parent != workspace && parent.pairs >= Evidence.MIN_PAIRS) {
            return new TrackRecord(ownRatio, n, parent.shrunk, shrunk, parent.evidence(), TrackRecord.Pool.GROUP);
        }
        return new TrackRecord(ownRatio, n, parent.shrunk, shrunk, workspace.evidence(), TrackRecord.Pool.WORKSPACE);
    }

    private static Evidence evidence(long[] differences, OptionalDouble ratio) {
        return Evidence.of(WilcoxonSignedRank.twoSided().test(differences), ratio);
    }
}
