package riffle.model;

/** What a column of a survey export holds, as detected by ingest or chosen by the analyst. */
public enum ColumnRole {
  /** The export's own respondent identifier. */
  ID,
  /** When the respondent answered. */
  DATE,
  /** An open-text question: every value is an answer. */
  TEXT,
  /** A segment kept with the respondent (device, country, plan …). */
  META,
  /** Codes already assigned elsewhere to the answer in the nearest text column on its left. */
  CODES,
  /** Who assigned the codes in the codes columns. */
  CODER,
  /** Not imported (for instance a column of e-mail addresses or names). */
  IGNORED
}
