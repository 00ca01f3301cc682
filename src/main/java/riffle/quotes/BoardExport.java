package riffle.quotes;

import java.util.List;
import java.util.Locale;
import java.util.Objects;
import riffle.csv.SafeCsv;
import riffle.model.BoardItem;
import riffle.model.BoardSlot;
import riffle.model.CopyBoard;
import riffle.model.QuoteSlot;

/**
 * Writes a copy board as Markdown, plain text or CSV. Pure functions of the board: the quotes are
 * written as the board holds them (masked text), every item keeps its answer id, and every export
 * opens with {@link CopyBoard#CONSENT_NOTICE}.
 */
public final class BoardExport {
  private BoardExport() {}

  /** The CSV columns after the notice row, in order. */
  public static final List<String> CSV_COLUMNS =
      List.of(
          "slot",
          "position",
          "quote",
          "working_line",
          "code",
          "answer_id",
          "respondent",
          "wave",
          "question");

  /** The heading of each slot in the Markdown and plain-text exports. */
  public static String heading(QuoteSlot slot) {
    return switch (slot) {
      case HEADLINE -> "Headline ideas";
      case SUBHEADLINE -> "Sub-headline ideas";
      case BENEFIT -> "Benefits";
      case OBJECTION -> "Objections to answer";
      case PROOF -> "Proof quotes";
    };
  }

  /**
   * The board as Markdown: the title, the notice, then one section per slot with its items in order
   * (empty slots say so). Answer text is escaped so that it shows as written and never becomes
   * markup, links or HTML.
   */
  public static String markdown(CopyBoard board) {
    Objects.requireNonNull(board, "board");
    StringBuilder out = new StringBuilder();
    out.append("# ").append(escape(board.title())).append("\n\n");
    out.append("> ").append(CopyBoard.CONSENT_NOTICE).append("\n");
    for (BoardSlot slot : board.slots()) {
      out.append("\n## ").append(heading(slot.slot())).append("\n\n");
      if (slot.items().isEmpty()) {
        out.append("_Nothing pinned._\n");
        continue;
      }
      int n = 1;
      for (BoardItem item : slot.items()) {
        out.append(n++).append(". ");
        if (item.workingLine().isPresent()) {
          out.append("**").append(escape(item.workingLine().get())).append("**  \n   ");
        }
        out.append("\u201c").append(escape(item.text())).append("\u201d  \n   ");
        out.append("_").append(escape(source(item))).append("_\n");
      }
    }
    return out.toString();
  }

  /** The board as plain text, laid out like the Markdown export without markup. */
  public static String plainText(CopyBoard board) {
    Objects.requireNonNull(board, "board");
    StringBuilder out = new StringBuilder();
    out.append(oneLine(board.title())).append("\n\n");
    out.append(CopyBoard.CONSENT_NOTICE).append("\n");
    for (BoardSlot slot : board.slots()) {
      String h = heading(slot.slot());
      out.append("\n").append(h).append("\n").append("-".repeat(h.length())).append("\n");
      if (slot.items().isEmpty()) {
        out.append("(nothing pinned)\n");
        continue;
      }
      int n = 1;
      for (BoardItem item : slot.items()) {
        out.append(n++).append(". ");
        if (item.workingLine().isPresent()) {
          out.append(oneLine(item.workingLine().get())).append("\n   ");
        }
        out.append("\"").append(oneLine(item.text())).append("\"\n   ");
        out.append(oneLine(source(item))).append("\n");
      }
    }
    return out.toString();
  }

  /**
   * The board as CSV, written by {@link SafeCsv} (RFC 4180, cells a spreadsheet would run as
   * formulas neutralised). The first record is the notice, padded with empty cells to the column
   * count; the second names the columns ({@link #CSV_COLUMNS}); then one record per item, slot by
   * slot in order.
   */
  public static String csv(CopyBoard board) {
    Objects.requireNonNull(board, "board");
    String[] notice = new String[CSV_COLUMNS.size()];
    java.util.Arrays.fill(notice, "");
    notice[0] = CopyBoard.CONSENT_NOTICE;
    SafeCsv out = SafeCsv.create(false).row(List.of(notice)).row(CSV_COLUMNS);
    for (BoardSlot slot : board.slots()) {
      int n = 1;
      for (BoardItem item : slot.items()) {
        out.row(
            List.of(
                slot.slot().name().toLowerCase(Locale.ROOT),
                Integer.toString(n++),
                item.text(),
                item.workingLine().orElse(""),
                item.code(),
                Long.toString(item.answerId()),
                item.respondent(),
                item.wave(),
                item.question()));
      }
    }
    return out.toString();
  }

  private static String source(BoardItem item) {
    return item.code()
        + " · respondent "
        + item.respondent()
        + " · "
        + item.wave()
        + " · answer "
        + item.answerId();
  }

  /** Line breaks and tabs as spaces: a quote is one line in the text exports. */
  private static String oneLine(String s) {
    return s.replaceAll("[\\r\\n\\t\\u2028\\u2029]+", " ");
  }

  /**
   * Backslash before every character CommonMark could read as inline markup, a link, HTML or an
   * entity inside a line (any ASCII punctuation may be escaped so, CommonMark 0.31 section 2.4),
   * and line breaks as spaces; a quote never starts a line, so list and heading markers need none.
   */
  static String escape(String s) {
    String line = oneLine(s);
    StringBuilder out = new StringBuilder(line.length() + 8);
    for (int i = 0; i < line.length(); i++) {
      char c = line.charAt(i);
      if ("\\`*_[]<>#|~&".indexOf(c) >= 0) {
        out.append('\\');
      }
      out.append(c);
    }
    return out.toString();
  }
}
