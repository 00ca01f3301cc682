/**
 * Pure statistical functions, JDK only.
 *
 * <ul>
 *   <li>Proportions: {@link riffle.stats.Proportions#wilson Wilson score intervals} (with and
 *       without continuity correction) and {@link riffle.stats.Proportions#newcombe Newcombe's
 *       hybrid-score interval} for a difference of two independent proportions, as {@link
 *       riffle.stats.Interval}s; {@link riffle.stats.Normal} gives the critical value for any
 *       confidence level (Wichura's AS 241 quantile).
 *   <li>Shares read from a random sample of a finite wave: {@link riffle.stats.FinitePopulation}
 *       (Wilson's interval with the finite-population correction, the exact hypergeometric
 *       interval, and the {@link riffle.stats.Projection projected count} with its interval).
 *   <li>Tests for 2×2 and r×c tables: {@link riffle.stats.FisherExact} (one- and two-sided, exact
 *       for any n through log-factorials), {@link riffle.stats.PearsonChiSquare} (with and without
 *       Yates, expected counts and Cochran's rule), Dunning's {@link riffle.stats.LogLikelihood
 *       G²}; chi-square tails in {@link riffle.stats.ChiSquare} over {@link riffle.stats.Erf} and
 *       {@link riffle.stats.Gamma} (log-gamma, log-factorials, the regularized incomplete gamma).
 *   <li>Many tests at once: {@link riffle.stats.BenjaminiHochberg} adjusted p-values and rejection
 *       counts.
 *   <li>Agreement between coders: {@link riffle.stats.CohenKappa} (κ, asymptotic standard error,
 *       Landis and Koch bands) and {@link riffle.stats.KrippendorffAlpha} (nominal, ordinal,
 *       interval, ratio; missing values).
 *   <li>How many themes exist: {@link riffle.stats.Chao1} (classic and bias-corrected, variance,
 *       log-linear interval, EstimateS's rules for no singletons or doubletons).
 *   <li>Keyness between two waves or segments: {@link riffle.stats.Keyness} (log-likelihood and Log
 *       Ratio).
 * </ul>
 *
 * <p>Every class is final with static methods only (results are records), keeps no state and is
 * safe to call from any thread. Each method's Javadoc names the published source of its formula;
 * the tests check them against the worked examples in {@code
 * src/test/resources/riffle/stats/checks.md} and, where it has the same quantity, against
 * commons-math3 on seeded random inputs.
 */
package riffle.stats;
