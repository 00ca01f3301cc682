/**
 * Findings from coded answers, and the files they are delivered in.
 *
 * <p>Front doors: {@link riffle.report.Report#compute} turns a {@link riffle.report.ReportInput}
 * (questions, waves, codebook, coded answers) into {@link riffle.model.Findings}; {@link
 * riffle.report.Exports} writes findings as HTML or Markdown and coded answers and the codebook as
 * CSV or Markdown.
 *
 * <h2>Counting</h2>
 *
 * <ul>
 *   <li>The base of a share is the number of substantive answers to the question in the wave;
 *       non-answers count nowhere.
 *   <li>An answer counts towards a code when it carries the code or any code below it: a theme
 *       counts an answer once, however many of its codes the answer carries.
 *   <li>Archived codes are left out, with their assignments; a code under an archived theme hangs
 *       from the nearest theme above that is not archived.
 *   <li>Every share carries its 95% Wilson score interval (Newcombe 1998, method 3). It is flagged
 *       {@code small_base} when the base is under {@value riffle.report.Report#SMALL_BASE} and
 *       {@code imprecise} when the interval is wider than 20 percentage points. Both cut-offs
 *       follow the practice of public statistical agencies, e.g. the US National Center for Health
 *       Statistics' data presentation standards for proportions (2017), which flag or suppress such
 *       estimates; they are common practice, not a law of statistics.
 * </ul>
 *
 * <h2>Changes between waves</h2>
 *
 * A question's findings list only the codes some answer to it carries (a codebook serves every
 * question), and a wave in which no answer to the question is coded yet is left out of the
 * comparisons: its zeros would read as falls. Each pair of neighbouring waves is compared (or the
 * two waves the settings name), for every code, when both waves have answers to the question. The
 * difference is the later share minus the earlier one, with its 95% Newcombe hybrid-score interval
 * (Newcombe 1998, method 10) and a two-sided Fisher exact p-value; the p-values of all codes
 * compared between the same two waves are adjusted by Benjamini–Hochberg. The verdict, checked in
 * this order:
 *
 * <ol>
 *   <li>"too few answers to tell" when either base is under {@value
 *       riffle.report.Report#SMALL_BASE}, or when an expected count of the 2×2 table (wave ×
 *       carries the code) is under {@value riffle.report.Report#MIN_EXPECTED} — the code is then
 *       too rare (or too common) in these waves for any test to detect a change of the size that
 *       matters (Cochran's rule, common practice);
 *   <li>"rose" when the adjusted p is under 0.05 and the whole interval lies above zero;
 *   <li>"fell" when the adjusted p is under 0.05 and the whole interval lies below zero;
 *   <li>"no clear change" otherwise: the data do not rule out that the share stayed the same.
 * </ol>
 *
 * <h2>Co-occurrence</h2>
 *
 * For each pair of codes that are not one below the other and that both occur, over the substantive
 * answers to the question (all waves pooled, or per wave): how many answers carry both, Jaccard
 * (both / either), lift (both × base / (a × b), above 1 when they meet more often than chance) and
 * the two-sided Fisher p of the 2×2 table.
 *
 * <h2>Saturation</h2>
 *
 * The substantive answers a person has coded, in the order of their first coding: the number of
 * distinct codes given directly against the number of answers coded (the curve), the bias-corrected
 * Chao1 estimate of the number of codes with its log-linear interval (from how many coded answers
 * carry each code), and how many codes appeared first among the last {@value
 * riffle.report.Report#SATURATION_WINDOW} coded answers (all of them while fewer have been coded).
 * A flat curve, Chao1 close to the observed count and no new code in the window suggest that
 * further coding will rarely need a new code.
 */
package riffle.report;
