package org.plenum.agenda;

import java.util.List;
import java.util.OptionalDouble;
import org.plenum.score.Evidence;

/**
 * What the adjustment form shows beside a proposal: the track record of similar past decisions
 * and warnings. Never a restriction.
 *
 * @param sizeClass the proposal's direction and size class, e.g. "up 15-35%"
 * @param pool which past decisions were compared, e.g. "group kitchen, up 15-35%"
 * @param count how many of them have an actual
 * @param errorRatio geometric mean of |e_new| / |e_prior| over them (exact hits counted apart)
 * @param shareRight of those whose prior missed, the share moved toward the actual
 * @param shareOvershoot of those moved the right way, the share that went past the actual
 * @param evidence the signed-rank evidence over them
 * @param sentence the plain-language summary, never stronger than {@code evidence}
 * @param warnings tiny adjustment, setting to zero
 */
public record Advice(String sizeClass, String pool, int count, OptionalDouble errorRatio, OptionalDouble shareRight,
        OptionalDouble shareOvershoot, Evidence evidence, String sentence, List<String> warnings) {}
