package org.plenum.demo;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.simple.RandomSource;

/**
 * The random draws the demo scenario needs, from one seeded stream.
 *
 * <p>Every stream is a {@code XO_RO_SHI_RO_128_PP} generator seeded from the scenario seed, a
 * purpose number and an item number, so changing how many draws one item or purpose uses does not
 * shift the draws of any other. Transcendental functions use {@link StrictMath} so that the same
 * seed gives the same numbers on every JVM and CPU.
 */
final class Dice {

    private final UniformRandomProvider rng;

    private Dice(UniformRandomProvider rng) {
        this.rng = rng;
    }

    /** A stream for one purpose (catalogue, demand, review…) and one item. */
    static Dice of(long seed, int purpose, int item) {
        long mixed = seed * 0x9E3779B97F4A7C15L + purpose * 0xBF58476D1CE4E5B9L + item * 0x94D049BB133111EBL;
        return new Dice(RandomSource.XO_RO_SHI_RO_128_PP.create(mixed));
    }

    /** True with probability {@code p}. */
    boolean chance(double p) {
        return rng.nextDouble() < p;
    }

    /** Uniform on [low, high). */
    double uniform(double low, double high) {
        return low + (high - low) * rng.nextDouble();
    }

    /** Uniform whole number in [low, high], both included. */
    int between(int low, int high) {
        return low + rng.nextInt(high - low + 1);
    }

    <T> T pick(T[] choices) {
        return choices[rng.nextInt(choices.length)];
    }

    /** Standard normal by Box-Muller; one value per call keeps the stream easy to reason about. */
    double normal() {
        double u = 1 - rng.nextDouble();
        return StrictMath.sqrt(-2 * StrictMath.log(u)) * StrictMath.cos(2 * StrictMath.PI * rng.nextDouble());
    }

    /** Log-normal with the given median and log-scale spread. */
    double logNormal(double median, double sigma) {
        return median * StrictMath.exp(sigma * normal());
    }
}
