package riffle.index;

import java.util.Locale;
import java.util.Map;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.LowerCaseFilter;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.en.PorterStemFilter;
import org.apache.lucene.analysis.miscellaneous.PerFieldAnalyzerWrapper;
import org.apache.lucene.analysis.shingle.ShingleFilter;
import org.apache.lucene.analysis.standard.StandardTokenizer;

/** The index's fields and the analysers behind them. */
final class Fields {
  /** The answer's id: a point for deletes, a stored value and doc values for reading back. */
  static final String ID = "id";

  /** The masked answer, stemmed (Porter, as the text stage): the default search field. */
  static final String TEXT = "text";

  /** The masked answer, lower-cased but not stemmed: {@code exact:"delivery dates"}. */
  static final String EXACT = "exact";

  /** Word pairs and triples of the answer (shingles), for phrase statistics. */
  static final String NGRAMS = "ngrams";

  /** Chunk phrases from the text stage, lower-cased, one term each. */
  static final String CHUNK = "chunk";

  static final String WAVE = "wave";
  static final String QUESTION = "question";
  static final String RESPONDENT = "respondent";
  static final String CODE = "code";

  /** "yes" or "no": whether any code is assigned. */
  static final String CODED = "coded";

  /** Prefix of segment fields: {@code seg.device}. */
  static final String SEGMENT = "seg.";

  private Fields() {}

  /** Filter values are matched ignoring case and surrounding space. */
  static String key(String value) {
    return value.strip().toLowerCase(Locale.ROOT);
  }

  /** The analyser of every text field; keyword fields are not analysed. */
  static Analyzer analyzer() {
    Analyzer stemmed = chain(true, false);
    return new PerFieldAnalyzerWrapper(
        stemmed, Map.of(EXACT, chain(false, false), NGRAMS, chain(false, true)));
  }

  private static Analyzer chain(boolean stem, boolean shingles) {
    return new Analyzer() {
      @Override
      protected TokenStreamComponents createComponents(String fieldName) {
        StandardTokenizer source = new StandardTokenizer();
        TokenStream stream = new LowerCaseFilter(source);
        if (stem) {
          stream = new PorterStemFilter(stream);
        }
        if (shingles) {
          ShingleFilter pairs = new ShingleFilter(stream, 2, 3);
          pairs.setOutputUnigrams(false);
          stream = pairs;
        }
        return new TokenStreamComponents(source, stream);
      }
    };
  }
}
