/**
 * The Lucene index of answers and the analysts' query language. The index is derived: it lives in
 * the project's {@code NAME.riffle.d/index/} folder, is stamped with what it was built from, and is
 * rebuilt from the project file when missing, stale or damaged. The front door is {@link
 * riffle.index.AnswerIndex}.
 */
package riffle.index;
