package riffle.tools;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;

/**
 * The naive import that {@link ImportBench} runs as a process of its own: reads a CSV export (an id
 * column, then one open-text column) with Commons CSV and runs every answer through {@link
 * AnalysisBench.Baseline} — stock OpenNLP sentence detector, tokenizer, tagger and chunker, one
 * thread, in sequence — then prints how many answers, sentences and tokens it saw. Run with {@code
 * java -cp target/riffle.jar:target/test-classes riffle.tools.NaiveImport FILE}.
 */
public final class NaiveImport {
  private NaiveImport() {}

  public static void main(String[] args) throws IOException {
    if (args.length != 1) {
      throw new IllegalArgumentException(
          "usage: NaiveImport FILE (CSV: an id column, the answers)");
    }
    AnalysisBench.Baseline baseline = new AnalysisBench.Baseline();
    long answers = 0;
    long sentences = 0;
    long tokens = 0;
    CSVFormat csv = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get();
    try (Reader in = Files.newBufferedReader(Path.of(args[0]), StandardCharsets.UTF_8)) {
      for (CSVRecord row : csv.parse(in)) {
        List<String[]> tags = baseline.tags(row.get(1));
        answers++;
        sentences += tags.size();
        tokens += tags.stream().mapToLong(t -> t.length).sum();
      }
    }
    System.out.printf(
        Locale.ROOT, "%,d answers, %,d sentences, %,d tokens%n", answers, sentences, tokens);
  }
}
