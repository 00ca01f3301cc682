package riffle.index;

import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.index.Term;
import org.apache.lucene.queryparser.classic.ParseException;
import org.apache.lucene.queryparser.classic.QueryParser;
import org.apache.lucene.search.MatchAllDocsQuery;
import org.apache.lucene.search.Query;
import org.apache.lucene.search.TermQuery;

/**
 * The analysts' query language, on Lucene's classic syntax: words (stemmed, so "deliveries" finds
 * "delivery"), "exact phrases", proximity ({@code "late delivery"~3}), prefix*, AND, OR, NOT,
 * parentheses; words side by side must all match. Filters: {@code wave:"Wave 3"}, {@code
 * question:2} (its number) or {@code question:"What made you choose us?"}, {@code code:"price too
 * high"}, {@code is:uncoded} / {@code is:coded}, any segment column ({@code device:mobile}), and
 * {@code exact:"delivery dates"} for unstemmed wording. Not thread-safe.
 */
final class AnalystQueryParser extends QueryParser {
  private static final Pattern COLUMN = Pattern.compile("column (\\d+)");

  private final Set<String> segments;
  private final List<String> questions;

  AnalystQueryParser(Analyzer analyzer, Set<String> segments, List<String> questions) {
    super(Fields.TEXT, analyzer);
    this.segments = segments;
    this.questions = questions;
    setDefaultOperator(QueryParser.Operator.AND);
    setAllowLeadingWildcard(false);
  }

  /** Parses a query; a blank one matches every answer. */
  Query read(String query) throws QuerySyntaxException {
    if (query.isBlank()) {
      return new MatchAllDocsQuery();
    }
    try {
      return parse(query);
    } catch (ParseException e) {
      throw explain(query, e);
    } catch (IllegalArgumentException e) {
      throw new QuerySyntaxException(1, e.getMessage());
    }
  }

  private static QuerySyntaxException explain(String query, ParseException e) {
    ParseException positioned = null;
    for (Throwable t = e; t != null; t = t.getCause()) {
      if (t instanceof FieldProblem p) {
        return new QuerySyntaxException(p.column, p.getMessage());
      }
      if (positioned == null && t instanceof ParseException pe && pe.currentToken != null) {
        positioned = pe;
      }
    }
    if (positioned != null && positioned.currentToken.next != null) {
      var next = positioned.currentToken.next;
      if (next.kind == 0) {
        return new QuerySyntaxException(
            query.length() + 1,
            "the query ends too early; is a parenthesis left open, or an operator (AND, OR,"
                + " NOT) missing its word?");
      }
      int column = next.beginColumn + 1; // the parser counts from 0
      return new QuerySyntaxException(
          column, "unexpected '" + next.image + "' at column " + column + " of the query");
    }
    Throwable root = e;
    while (root.getCause() != null) {
      root = root.getCause();
    }
    int quote = unclosedQuote(query);
    if (quote >= 0) {
      return new QuerySyntaxException(
          quote + 1, "the quote at column " + (quote + 1) + " of the query is never closed");
    }
    Matcher m = COLUMN.matcher(String.valueOf(root.getMessage()));
    int column = m.find() ? Integer.parseInt(m.group(1)) : 1;
    return new QuerySyntaxException(
        column, "the query cannot be read at column " + column + "; check its quotes and brackets");
  }

  /** Where a quote opens that is never closed, or -1. A backslash escapes a quote. */
  private static int unclosedQuote(String query) {
    int open = -1;
    for (int i = 0; i < query.length(); i++) {
      char c = query.charAt(i);
      if (c == '\\') {
        i++;
      } else if (c == '"') {
        open = open < 0 ? i : -1;
      }
    }
    return open;
  }

  @Override
  protected Query getFieldQuery(String field, String text, boolean quoted) throws ParseException {
    if (field.equals(Fields.TEXT) || field.equals(Fields.EXACT)) {
      return super.getFieldQuery(field, text, quoted);
    }
    return filter(field, text);
  }

  @Override
  protected Query getFieldQuery(String field, String text, int slop) throws ParseException {
    if (field.equals(Fields.TEXT) || field.equals(Fields.EXACT)) {
      return super.getFieldQuery(field, text, slop);
    }
    return filter(field, text);
  }

  @Override
  protected Query getPrefixQuery(String field, String termStr) throws ParseException {
    requireTextField(field, "a prefix*");
    return super.getPrefixQuery(field, termStr);
  }

  @Override
  protected Query getWildcardQuery(String field, String termStr) throws ParseException {
    requireTextField(field, "a wildcard");
    return super.getWildcardQuery(field, termStr);
  }

  @Override
  protected Query getFuzzyQuery(String field, String termStr, float minSimilarity)
      throws ParseException {
    requireTextField(field, "a fuzzy~ match");
    return super.getFuzzyQuery(field, termStr, minSimilarity);
  }

  @Override
  protected Query getRangeQuery(
      String field, String part1, String part2, boolean startInclusive, boolean endInclusive)
      throws ParseException {
    throw problem(field, "ranges [a TO b] are not part of the query language");
  }

  private void requireTextField(String field, String what) throws ParseException {
    if (!field.equals(Fields.TEXT) && !field.equals(Fields.EXACT)) {
      throw problem(field, what + " works on answer text only, not on " + field + ":");
    }
  }

  private Query filter(String field, String value) throws ParseException {
    String name = field.toLowerCase(Locale.ROOT);
    String key = Fields.key(value);
    switch (name) {
      case "wave":
        return new TermQuery(new Term(Fields.WAVE, key));
      case "question":
        if (key.matches("\\d+")) {
          int n = Integer.parseInt(key);
          if (n < 1 || n > questions.size()) {
            throw problem(
                field,
                "question:"
                    + key
                    + " does not exist; questions are numbered 1 to "
                    + questions.size());
          }
          return new TermQuery(new Term(Fields.QUESTION, Fields.key(questions.get(n - 1))));
        }
        return new TermQuery(new Term(Fields.QUESTION, key));
      case "code":
        return new TermQuery(new Term(Fields.CODE, key));
      case "is":
        if (key.equals("uncoded") || key.equals("coded")) {
          return new TermQuery(new Term(Fields.CODED, key.equals("coded") ? "yes" : "no"));
        }
        throw problem(field, "is: takes uncoded or coded, not '" + value + "'");
      default:
        if (segments.contains(name)) {
          return new TermQuery(new Term(Fields.SEGMENT + name, key));
        }
        throw problem(
            field,
            "unknown filter '"
                + field
                + ":'; filters are wave:, question:, code:, is:uncoded, exact:"
                + (segments.isEmpty()
                    ? ""
                    : ", and the segments " + String.join(":, ", segments) + ":"));
    }
  }

  /**
   * A problem with the filter or term just read; its column is where the field name starts (the
   * parser's current token is the value after {@code field:}, counted from 0).
   */
  private ParseException problem(String field, String message) {
    int column = token == null ? 1 : Math.max(1, token.beginColumn + 1 - field.length() - 1);
    ParseException e = new ParseException(message);
    e.initCause(new FieldProblem(column, message));
    return e;
  }

  /** A problem found while building the query, with the column of the token it concerns. */
  private static final class FieldProblem extends Exception {
    private static final long serialVersionUID = 1L;
    final int column;

    FieldProblem(int column, String message) {
      super(message, null, false, false);
      this.column = column;
    }
  }
}
