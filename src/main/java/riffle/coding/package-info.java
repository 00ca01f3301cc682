/**
 * The codebook's rules, saved coding rules and learned suggestions.
 *
 * <p>{@link riffle.coding.Codebook} applies a person's draft to the codebook and checks the result:
 * names present, unique regardless of case and one line without control characters (a new or
 * renamed code; see {@link riffle.model.ControlChars}), themes two levels deep (a code under a
 * theme cannot have codes of its own), no code its own ancestor, keys unique, one lower-case letter
 * or digit and none of the keys the coding screen moves and undoes with ({@code j}, {@code k},
 * {@code z}), colours as {@code #rgb} or {@code #rrggbb}. {@link riffle.coding.CodebookFile} reads
 * and writes the codebook as CSV and JSON.
 *
 * <h2>Suggestions</h2>
 *
 * The front door is {@link riffle.coding.SuggestionEngine}: {@code train} learns from answers a
 * human coded ({@link riffle.model.CodedExample}) and measures itself; {@code suggest} proposes
 * codes for an answer; {@code metrics} reports per code how often the suggestions were right.
 * Settings come from {@link riffle.coding.SuggestSettings}.
 *
 * <h2>Features</h2>
 *
 * Binary features of the text pipeline's analysis, within each sentence: every word's stem, the
 * first five letters of stems longer than that (so that misspellings share a feature), every pair
 * of adjacent stems, and every chunk of two or more words (leading determiners dropped) as its
 * stems. A word a negation governs becomes {@code not:stem}, so "not expensive" and "expensive" are
 * different features. Features found in fewer than {@code cutoff} training answers (default 2) are
 * dropped. Each answer's feature vector is scaled to unit length. An answer without sentences (not
 * in the analysis language) or without a known feature gets no suggestion.
 *
 * <h2>Models</h2>
 *
 * One binary L2-regularised logistic regression per code, fitted by L-BFGS ({@code
 * LogisticRegression}); the confidence of a suggestion is the model's probability. All codes share
 * the feature matrix, and the fits run in parallel, each on one thread and stored in its own slot,
 * so the result never depends on scheduling.
 *
 * <h2>Readiness</h2>
 *
 * A code gets suggestions once at least {@code minExamples} (default 8) coded answers carry it and
 * at least as many do not. Below that it still has a metrics row, with {@code ready = false} and no
 * precision, recall, F1 or threshold.
 *
 * <h2>Cross-validation and thresholds</h2>
 *
 * <ol>
 *   <li>Folds: the distinct respondent keys are sorted, shuffled with the seed and dealt to {@code
 *       folds} folds (default 5; fewer when there are fewer respondents), so that no respondent has
 *       answers on both sides of a fold and the folds depend only on the respondents and the seed.
 *   <li>Held-out confidences: for each fold, a model trained on the other folds (with the feature
 *       cutoff counted on those folds only) scores the fold's answers. Every answer gets exactly
 *       one held-out confidence per code, from a model that never saw it.
 *   <li>Threshold: over all held-out confidences, the cut with the best recall among those whose
 *       precision reaches {@code targetPrecision} (default 0.8); when none does, the cut with the
 *       best F1. The threshold sits half-way between the confidences either side of the cut; a
 *       suggestion is made at or above it.
 *   <li>Metrics: precision, recall and F1 count held-out predictions only, and each fold's
 *       predictions are judged by a threshold chosen (by the same rule) on the other folds'
 *       held-out confidences, so the reported figures do not reward the threshold for fitting the
 *       answers it is measured on. {@code support} is the number of coded answers carrying the
 *       code.
 *   <li>The final model of each ready code learns from every example and is used with the threshold
 *       of step 3.
 * </ol>
 *
 * Learn only from human decisions: codes assigned by hand or imported, never accepted suggestions
 * or rule assignments, which would let the engine grade its own work.
 */
package riffle.coding;
