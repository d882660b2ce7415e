package org.plenum.demo;

import java.util.Arrays;

import org.apache.commons.math3.optim.InitialGuess;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.nonlinear.scalar.ObjectiveFunction;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.NelderMeadSimplex;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.SimplexOptimizer;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;

/**
 * Fits the smoothing parameters of a {@link HoltWinters} method by least squares.
 *
 * <p>The objective is the in-sample sum of squared one-step errors (FPP 2nd ed. §7.1,
 * "Optimisation") from a fixed starting state, by default {@link SmoothingState#initial}; only
 * α, β and γ are searched, each within [0, 1].
 *
 * <ul>
 *   <li>One free parameter (simple exponential smoothing): Brent's method on [0, 1].
 *   <li>Two or three: the Nelder-Mead simplex of Commons Math, started at α = 0.3, β = γ = 0.1 and
 *       restarted once from its result (a restart is the usual guard against a collapsed
 *       simplex). Points outside the box are evaluated at their projection onto it, with the
 *       error multiplied by 1 + 100·(squared distance), so the search is pushed back inside.
 * </ul>
 *
 * The answer is the best projected point evaluated, so it always lies in [0, 1]. Both optimisers
 * are deterministic, so the same series always gives the same fit. (Commons Math's BOBYQA, which
 * handles bounds natively, was several times slower here and sometimes stopped with "failed to
 * reduce Q" on flat objectives.)
 */
public final class HoltWintersFitter {

    private static final double[] START = {0.3, 0.1, 0.1};
    private static final int MAX_EVALUATIONS = 5_000;
    private static final double PENALTY = 100;

    private HoltWintersFitter() {
    }

    /** Fits {@code components} to {@code y} from the deterministic initial state. */
    public static HoltWintersFit fit(double[] y, Components components) {
        return fit(y, components, SmoothingState.initial(y, components));
    }

    /**
     * Fits {@code components} to {@code y} starting from the given state at time 0.
     *
     * @return the fit with the lowest one-step squared error found; α, β, γ all in [0, 1], and the
     *         parameters of absent components set to 0
     */
    public static HoltWintersFit fit(double[] y, Components components, SmoothingState start) {
        int free = 1 + (components.trend() ? 1 : 0) + (components.seasonal() ? 1 : 0);
        Objective objective = new Objective(y, components, start);
        if (free == 1) {
            brent(objective);
        } else {
            simplex(objective, Arrays.copyOf(START, free), 0.2);
            simplex(objective, objective.best.clone(), 0.1);
        }
        HoltWinters method = method(components, objective.best);
        return new HoltWintersFit(method, start, method.smooth(y, start));
    }

    private static void brent(Objective objective) {
        new BrentOptimizer(1e-10, 1e-12).optimize(
                new MaxEval(MAX_EVALUATIONS),
                new UnivariateObjectiveFunction(a -> objective.value(new double[] {a})),
                GoalType.MINIMIZE,
                new SearchInterval(0, 1, START[0]));
    }

    private static void simplex(Objective objective, double[] guess, double step) {
        double[] steps = new double[guess.length];
        Arrays.fill(steps, step);
        new SimplexOptimizer(1e-10, 1e-12).optimize(
                new MaxEval(MAX_EVALUATIONS),
                new ObjectiveFunction(objective::value),
                GoalType.MINIMIZE,
                new InitialGuess(guess),
                new NelderMeadSimplex(steps));
    }

    /** Maps the free parameters, in the order α, then β if trended, then γ if seasonal, to a method. */
    private static HoltWinters method(Components components, double[] free) {
        int i = 1;
        double beta = components.trend() ? free[i++] : 0;
        double gamma = components.seasonal() ? free[i] : 0;
        return new HoltWinters(components, free[0], beta, gamma);
    }

    /** The penalised squared error as a function of the free parameters, remembering the best point. */
    private static final class Objective {
        private final double[] y;
        private final Components components;
        private final SmoothingState start;
        private double[] best;
        private double bestValue = Double.POSITIVE_INFINITY;

        Objective(double[] y, Components components, SmoothingState start) {
            this.y = y;
            this.components = components;
            this.start = start;
        }

        double value(double[] point) {
            double[] inside = new double[point.length];
            double outside = 0;
            for (int i = 0; i < point.length; i++) {
                inside[i] = Math.min(1, Math.max(0, point[i]));
                outside += (point[i] - inside[i]) * (point[i] - inside[i]);
            }
            double value = method(components, inside).sse(y, start) * (1 + PENALTY * outside);
            if (best == null || value < bestValue) {
                best = inside;
                bestValue = value;
            }
            return value;
        }
    }
}
