/**
 * Findings from coded answers, and the files they are delivered in.
 *
 * <p>Front doors: {@link riffle.report.Report#compute} turns a {@link riffle.report.ReportInput}
 * (questions, waves, codebook, coded answers) into {@link riffle.model.Findings}; {@link
 * riffle.report.Exports} writes findings as HTML or Markdown and coded answers and the codebook as
 * CSV or Markdown.
 *
 * <h2>Counting: bases follow coverage</h2>
 *
 * <ul>
 *   <li>An answer is <em>read</em> once a person has coded it, taken a code off it, marked it as
 *       read with no code applying, accepted a suggestion on it, or coded it elsewhere before the
 *       import ({@link riffle.report.ReportAnswer#read()}). Codes made by rules never make an
 *       answer read. Coverage is how many of a wave's substantive answers to the question are read
 *       ("read 112 of 580 (19%)"); non-answers count nowhere and are kept apart.
 *   <li>A code is <em>given by a person</em> in a question when some read answer to it carries the
 *       code (or a code below it) other than by an unseen rule: a rule's code counts as a person's
 *       when it was on the answer while they read it (given before the answer's last reading mark),
 *       and as the rule's alone when the answer is unread or the rule came after the reading
 *       ({@link riffle.report.ReportAnswer#byRule()}).
 *   <li>For a code given by a person, a wave's share is over the answers read in that wave: count =
 *       read answers carrying it, base = read answers. A wave nobody read gives it a share by rule
 *       when its rules ran there (below), else no share: "no answer of W read by a person yet".
 *   <li>A code no person gave in the question is <em>by rule</em>: each share counts the answers
 *       carrying it over every substantive answer of the wave, the answers its rules ran on. Rules
 *       run over whole waves (every saved rule on each import's new answers, {@code rules apply} on
 *       every answer, all questions alike), so a wave in which the code's rules coded at least one
 *       answer (of any question) counts as run on in full; in a wave where they coded none there is
 *       no share, "its rules coded no answer of W": a rule that ran and matched nothing cannot be
 *       told from one that never ran (the project keeps no record of runs).
 *   <li>Every share and every change by rule is labelled so ({@code byRule}). A question's {@code
 *       notCoded} lists the waves with no read answer: the former rule for waves nobody had coded
 *       is the case of a read base of 0. A wave is shown when it has a read answer, or an answer
 *       carrying a code.
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
 * question). A change compares two shares of the same kind only, both over read answers or both by
 * rule: never a wave without a share, and never a share people read against one rules made; those
 * pairs are listed under {@code notCompared} with the reason. By default each wave in which a code
 * has a share is compared with the code's previous wave with a share of the same kind (a wave
 * nobody read is stepped over), or the settings name the two waves. The difference is the later
 * share minus the earlier one, with its 95% Newcombe hybrid-score interval (Newcombe 1998, method
 * 10) and a two-sided Fisher exact p-value; the p-values of all codes compared between the same two
 * waves are adjusted by Benjamini–Hochberg. The verdict, checked in this order:
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
 * For each pair of codes that are not one below the other and that both occur, over the read
 * substantive answers to the question (all waves pooled, or per wave; codes only an unseen rule
 * gave left out): how many answers carry both, Jaccard (both / either), lift (both × base / (a ×
 * b), above 1 when they meet more often than chance) and the two-sided Fisher p of the 2×2 table.
 *
 * <h2>Saturation</h2>
 *
 * The substantive answers a person has read, in the order of their first reading: the number of
 * distinct codes given directly (by people) against the number of answers read (the curve), the
 * bias-corrected Chao1 estimate of the number of codes with its log-linear interval (from how many
 * read answers carry each code), and how many codes appeared first among the last {@value
 * riffle.report.Report#SATURATION_WINDOW} read answers (all of them while fewer have been read).
 * Before anyone has read an answer there is no curve and no estimate, and the reports say "no
 * answer read by a person yet". A flat curve, Chao1 close to the observed count and no new code in
 * the window suggest that further coding will rarely need a new code.
 *
 * <h2>Segments</h2>
 *
 * Split by a metadata column, each value gets its coverage, read bases and shares by the rules
 * above (whether a code is by rule is decided for the whole question). Values that differ only in
 * case or surrounding space are one value, shown as most answers spell it; answers without a value
 * form the group "(no value)", listed last. A column no respondent has a value in is refused.
 *
 * <h2>Coded-answers exports</h2>
 *
 * The wide CSV has {@code read} (1/0) and {@code read_by} for every answer, and a code cell is 1
 * when the answer carries the code (a rule's code on an unread answer included), 0 only when a
 * person read it and it does not, and blank when nobody read it: unknown is not absent. The long
 * CSV carries the same two columns and gives an answer read without a code one row with the code's
 * columns empty.
 */
package riffle.report;
