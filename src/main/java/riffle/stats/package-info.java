/**
 * Pure statistical functions, JDK only: Dunning's log-likelihood G² for 2×2 tables, the chi-square
 * upper tail with one degree of freedom (through a precise complementary error function), and the
 * keyness measures used to compare two waves or segments (log-likelihood and Log Ratio).
 *
 * <p>Every class is final with static methods only, keeps no state and is safe to call from any
 * thread. Each method's Javadoc names the published source of its formula; the tests check them
 * against the worked examples in {@code shared/CHECKS.md} and against commons-math3.
 */
package riffle.stats;
