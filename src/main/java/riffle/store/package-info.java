/**
 * The project file: one SQLite database that is the source of truth for waves, questions,
 * respondents, answers, segments, the codebook, assignments and the audit log.
 *
 * <p>Every connection runs with {@code journal_mode=WAL}, {@code foreign_keys=ON}, {@code
 * synchronous=NORMAL} and a busy timeout. Writes take SQLite's write lock up front ({@code BEGIN
 * IMMEDIATE}), so two processes writing one project are serialised by SQLite: the second waits for
 * the first, and gives up with {@link riffle.store.ProjectFileException} when the wait exceeds the
 * timeout. The schema carries a version ({@code PRAGMA user_version}) and migrates forward only; a
 * project written by a newer schema is refused untouched.
 */
package riffle.store;
