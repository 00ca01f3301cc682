package riffle.tools;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.YearMonth;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.function.Predicate;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.tools.SampleResponses.GeneratedAnswer;
import riffle.tools.SampleResponses.GeneratedRespondent;
import riffle.tools.SampleResponses.GeneratedWave;
import riffle.tools.SampleResponses.Question;
import riffle.tools.SampleResponses.Theme;

class SampleResponsesTest {

  private static final Path COMMITTED = Path.of("sample-responses");
  private static final byte[] BOM = {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF};

  @TempDir Path tmp;

  private static List<GeneratedWave> waves() {
    return SampleResponses.demoWaves();
  }

  @Test
  void committedFilesEqualWhatTheGeneratorWritesNow() throws IOException {
    SampleResponses.writeAll(tmp);
    for (String name : SampleResponses.GENERATED_FILES) {
      byte[] committed = Files.readAllBytes(COMMITTED.resolve(name));
      byte[] fresh = Files.readAllBytes(tmp.resolve(name));
      int at = Arrays.mismatch(committed, fresh);
      if (at >= 0) {
        fail(
            "sample-responses/"
                + name
                + " differs from the generator at byte "
                + at
                + "; regenerate with mvn -q test-compile exec:java -Dexec.mainClass=riffle.tools.SampleResponses");
      }
    }
  }

  @Test
  void respondentCountsAreInRange() {
    List<GeneratedWave> waves = waves();
    assertEquals(SampleResponses.WAVE_NAMES, waves.stream().map(GeneratedWave::name).toList());
    assertEquals(1000, waves.get(SampleResponses.PILOT).respondents().size());
    for (int i = SampleResponses.WAVE_1; i <= SampleResponses.WAVE_3; i++) {
      int n = waves.get(i).respondents().size();
      assertTrue(n >= 400 && n <= 800, waves.get(i).name() + ": " + n);
    }
  }

  @Test
  void idsAndDatesFitTheirWave() {
    for (GeneratedWave w : waves()) {
      YearMonth month = YearMonth.from(w.date());
      LocalDate previous = w.date();
      for (GeneratedRespondent p : w.respondents()) {
        assertEquals(month, YearMonth.from(p.submittedAt()), p.id());
        assertFalse(p.submittedAt().isBefore(previous), p.id());
        previous = p.submittedAt();
      }
      assertEquals(
          w.respondents().size(),
          w.respondents().stream().map(GeneratedRespondent::id).distinct().count());
      assertTrue(w.respondents().get(0).id().endsWith("-0001"));
    }
  }

  @Test
  void siteChangeThemesFallInWave3() {
    GeneratedWave wave2 = waves().get(SampleResponses.WAVE_2);
    GeneratedWave wave3 = waves().get(SampleResponses.WAVE_3);
    for (Theme t : SampleResponses.SITE_CHANGE_THEMES) {
      assertTrue(t.changes());
      assertTrue(
          wave3.share(t) < wave2.share(t) / 2,
          t.code() + ": " + wave2.share(t) + " -> " + wave3.share(t));
    }
  }

  @Test
  void otherThemesStayFlatAndNearTheirPlantedProbability() {
    for (Theme t : SampleResponses.THEMES) {
      double min = 1;
      double max = 0;
      for (GeneratedWave w : waves()) {
        double share = w.share(t);
        assertEquals(t.probability(w.index()), share, 0.035, t.code() + " in " + w.name());
        min = Math.min(min, share);
        max = Math.max(max, share);
      }
      if (!SampleResponses.SITE_CHANGE_THEMES.contains(t)) {
        assertFalse(t.changes(), t.code());
        assertTrue(max - min < 0.04, t.code() + " ranges " + min + " .. " + max);
      }
    }
  }

  @Test
  void slotWeightsAreValidForEveryWaveAndMetadataCombination() {
    for (int wave = 0; wave < SampleResponses.WAVE_NAMES.size(); wave++) {
      for (SampleResponses.Meta meta : SampleResponses.combinations()) {
        double[] w = SampleResponses.slotWeights(wave, meta);
        double[] sum = new double[2];
        for (int i = 0; i < w.length; i++) {
          assertTrue(w[i] > 0 && w[i] < 1, SampleResponses.THEMES.get(i).code());
          sum[SampleResponses.THEMES.get(i).question().ordinal()] += w[i];
        }
        assertTrue(sum[0] < 0.95 && sum[1] < 0.95, meta + " in wave " + wave);
      }
    }
    for (SampleResponses.Link link : SampleResponses.LINKS) {
      assertTrue(
          SampleResponses.THEMES.indexOf(link.anchor())
              < SampleResponses.THEMES.indexOf(link.theme()),
          link.theme().code());
    }
  }

  @Test
  void plantedProbabilitiesAreExactInExpectation() {
    int n = 60_000;
    Random r = new Random(11);
    for (int wave = 0; wave < SampleResponses.WAVE_NAMES.size(); wave++) {
      int[] counts = new int[SampleResponses.THEMES.size()];
      for (int i = 0; i < n; i++) {
        SampleResponses.Meta meta =
            new SampleResponses.Meta(
                SampleResponses.DEVICE.draw(r),
                SampleResponses.CUSTOMER.draw(r),
                SampleResponses.ORDER_VALUE.draw(r));
        for (List<Theme> themes : SampleResponses.drawThemes(wave, meta, r)) {
          for (Theme t : themes) {
            counts[SampleResponses.THEMES.indexOf(t)]++;
          }
        }
      }
      for (int i = 0; i < counts.length; i++) {
        Theme t = SampleResponses.THEMES.get(i);
        // About five standard errors at p = 0.32.
        assertEquals(t.probability(wave), counts[i] / (double) n, 0.009, t.code() + " " + wave);
      }
    }
  }

  @Test
  void catalogueIsWellFormed() {
    assertEquals(17, SampleResponses.THEMES.size());
    assertEquals(
        SampleResponses.THEMES.size(),
        SampleResponses.THEMES.stream().map(Theme::code).distinct().count());
    for (Theme t : SampleResponses.THEMES) {
      assertEquals(t.code().toLowerCase(Locale.ROOT), t.code());
      assertTrue(t.code().matches("[a-z]+( [a-z]+)*"), t.code());
      assertEquals(
          t.question() == Question.STOPPED
              ? SampleResponses.Direction.FRICTION
              : SampleResponses.Direction.PRAISE,
          t.direction());
      assertFalse(t.sentences().isEmpty());
      assertFalse(t.shortForms().isEmpty());
    }
    assertEquals(9, SampleResponses.themes(Question.STOPPED).size());
    assertEquals(8, SampleResponses.themes(Question.CHOSE).size());
  }

  @Test
  void returningCustomersMentionTrustLess() {
    int[] count = new int[2];
    int[] base = new int[2];
    for (GeneratedWave w : waves()) {
      for (GeneratedRespondent p : w.respondents()) {
        if (p.stopped().nonAnswer()) {
          continue;
        }
        int i = p.customer().equals("returning") ? 1 : 0;
        base[i]++;
        if (p.stopped().has(SampleResponses.UNKNOWN_SHOP)) {
          count[i]++;
        }
      }
    }
    assertTrue(count[1] / (double) base[1] < count[0] / (double) base[0] / 2);
  }

  @Test
  void themesTravelTogether() {
    int both = 0;
    int anchor = 0;
    int theme = 0;
    int n = 0;
    for (GeneratedWave w : waves()) {
      for (GeneratedRespondent p : w.respondents()) {
        GeneratedAnswer a = p.stopped();
        if (a.nonAnswer()) {
          continue;
        }
        n++;
        boolean x = a.has(SampleResponses.WARRANTY_DOUBTS);
        boolean y = a.has(SampleResponses.REFURBISHED_CONDITION);
        anchor += x ? 1 : 0;
        theme += y ? 1 : 0;
        both += x && y ? 1 : 0;
      }
    }
    double lift = both / (anchor / (double) n * theme);
    assertTrue(lift > 2, "lift " + lift);
  }

  @Test
  void answersLookLikeRealBuyers() {
    List<GeneratedAnswer> all = new ArrayList<>();
    for (GeneratedWave w : waves()) {
      for (GeneratedRespondent p : w.respondents()) {
        all.add(p.stopped());
        all.add(p.chose());
      }
    }
    assertShare(all, GeneratedAnswer::nonAnswer, 0.03, 0.07, "non-answers");
    assertShare(all, a -> !a.language().equals("en"), 0.01, 0.03, "non-English");
    assertShare(all, a -> !a.pii().isEmpty(), 0.02, 0.04, "personal data");
    assertShare(all, a -> a.themes().size() >= 2, 0.15, 0.5, "two or more themes");
    assertShare(all, a -> a.text().contains("\n"), 0.02, 0.2, "line breaks");
    assertShare(all, a -> a.text().contains("\""), 0.005, 0.1, "double quotes");
    assertShare(all, a -> a.text().contains(","), 0.1, 0.8, "commas");
    assertShare(all, a -> a.text().contains(";"), 0.005, 0.2, "semicolons");
    assertShare(all, a -> a.text().matches("(?s).*\\b[A-Z]{3,}\\b.*"), 0.01, 0.2, "caps");
    assertShare(all, a -> a.text().contains("☕"), 0.002, 0.1, "emoji");
    assertShare(all, a -> a.text().split(" ").length <= 3 && !a.nonAnswer(), 0.1, 0.5, "short");
    assertShare(all, a -> a.text().split("[.?!]\\s").length >= 2, 0.2, 0.8, "multi-sentence");
    for (String variant :
        List.of(
            "delivery date",
            "when it would be delivered",
            "no delivery date shown",
            "worth the money",
            "good value",
            "great price for the quality",
            "did NOT know when it would arrive",
            "sure it would fit under my cabinets",
            "@example.",
            "07700 900",
            "ORD-")) {
      long n = all.stream().filter(a -> a.text().contains(variant)).count();
      assertTrue(n >= 3, variant + ": " + n);
    }
  }

  private static void assertShare(
      List<GeneratedAnswer> all,
      Predicate<GeneratedAnswer> test,
      double lo,
      double hi,
      String what) {
    double share = all.stream().filter(test).count() / (double) all.size();
    assertTrue(share >= lo && share <= hi, what + ": " + share);
  }

  @Test
  void sameSeedGivesSameOutputAndAnotherSeedDiffers() throws IOException {
    assertEquals(waves(), SampleResponses.generateDemoWaves(SampleResponses.DEMO_SEED));
    assertNotEquals(waves(), SampleResponses.generateDemoWaves(SampleResponses.DEMO_SEED + 1));
    Path a = tmp.resolve("a.csv");
    Path b = tmp.resolve("b.csv");
    Path c = tmp.resolve("c.csv");
    SampleResponses.writeLargeExport(a, 500, 42);
    SampleResponses.writeLargeExport(b, 500, 42);
    SampleResponses.writeLargeExport(c, 500, 43);
    assertEquals(-1, Files.mismatch(a, b));
    assertNotEquals(-1, Files.mismatch(a, c));
  }

  @Test
  void wave2IsASemicolonFileWithBom() throws IOException {
    byte[] bytes = Files.readAllBytes(COMMITTED.resolve("wave-2.csv"));
    assertTrue(Arrays.equals(BOM, Arrays.copyOf(bytes, 3)));
    String text = new String(bytes, 3, bytes.length - 3, StandardCharsets.UTF_8);
    String header = text.substring(0, text.indexOf("\r\n"));
    assertEquals(String.join(";", SampleResponses.COLUMNS), header);
    assertEquals(waves().get(SampleResponses.WAVE_2), parsedAgainst(2, text, ';'));
  }

  @Test
  void wave1UsesCrlfAndWave3UsesLf() throws IOException {
    String wave1 = Files.readString(COMMITTED.resolve("wave-1.csv"), StandardCharsets.UTF_8);
    String wave3 = Files.readString(COMMITTED.resolve("wave-3.csv"), StandardCharsets.UTF_8);
    assertTrue(wave1.startsWith(String.join(",", SampleResponses.COLUMNS) + "\r\n"));
    assertTrue(wave3.startsWith(String.join(",", SampleResponses.COLUMNS) + "\n"));
    assertFalse(wave1.startsWith("\uFEFF"));
    assertFalse(wave3.contains("\r"));
    assertEquals(waves().get(SampleResponses.WAVE_1), parsedAgainst(1, wave1, ','));
    assertEquals(waves().get(SampleResponses.WAVE_3), parsedAgainst(3, wave3, ','));
  }

  @Test
  void pilotHasCodesColumnsWithRealisticNoise() throws IOException {
    String text = Files.readString(COMMITTED.resolve("precoded-pilot.tsv"), StandardCharsets.UTF_8);
    assertTrue(text.startsWith(String.join("\t", SampleResponses.PILOT_COLUMNS) + "\n"));
    GeneratedWave pilot = waves().get(SampleResponses.PILOT);
    List<CSVRecord> records = parse(text, '\t');
    assertEquals(pilot.respondents().size(), records.size());
    boolean pipes = false;
    int planted = 0;
    int kept = 0;
    for (int i = 0; i < records.size(); i++) {
      CSVRecord row = records.get(i);
      GeneratedRespondent p = pilot.respondents().get(i);
      assertEquals(p.id(), row.get("response_id"));
      assertEquals(p.stopped().text(), row.get(SampleResponses.STOPPED_QUESTION));
      assertEquals(p.chose().text(), row.get(SampleResponses.CHOSE_QUESTION));
      assertTrue(row.get(SampleResponses.CODED_BY).matches("[A-Z]{2}"));
      for (Question q : Question.values()) {
        String cell = row.get(q.codesColumn());
        pipes |= cell.contains("|");
        List<String> codes = cell.isEmpty() ? List.of() : List.of(cell.split("\\||; "));
        assertEquals(p.answer(q).coded(), codes);
        for (String code : codes) {
          assertEquals(q, SampleResponses.theme(code).question(), code);
        }
        if (p.answer(q).nonAnswer()) {
          assertEquals("", cell, p.id());
        }
        planted += p.answer(q).themes().size();
        kept += (int) p.answer(q).themes().stream().filter(codes::contains).count();
      }
    }
    assertTrue(pipes);
    double agreement = kept / (double) planted;
    assertTrue(agreement > 0.9 && agreement < 0.99, "agreement " + agreement);
    assertEquals(
        3, pilot.respondents().stream().map(GeneratedRespondent::codedBy).distinct().count());
  }

  @Test
  void manifestListsTheWavesInImportOrder() throws IOException {
    assertEquals(
        List.of(
            "file,wave,date",
            "precoded-pilot.tsv,Pilot,2025-12-01",
            "wave-1.csv,Wave 1,2026-03-01",
            "wave-2.csv,Wave 2,2026-06-01",
            "wave-3.csv,Wave 3,2026-09-01"),
        Files.readAllLines(COMMITTED.resolve(SampleResponses.MANIFEST), StandardCharsets.UTF_8));
  }

  @Test
  void largeExportStreamsTheSameColumns() throws IOException {
    Path out = tmp.resolve("large.csv");
    SampleResponses.writeLargeExport(out, 3000, 7);
    String text = Files.readString(out, StandardCharsets.UTF_8);
    assertTrue(text.startsWith(String.join(",", SampleResponses.COLUMNS) + "\n"));
    List<CSVRecord> records = parse(text, ',');
    assertEquals(3000, records.size());
    assertEquals("L-0001", records.get(0).get("response_id"));
    assertEquals("L-3000", records.get(2999).get("response_id"));
    for (CSVRecord row : records) {
      assertEquals(SampleResponses.COLUMNS.size(), row.size());
    }
  }

  @Test
  void generationIsFast() {
    long start = System.nanoTime();
    SampleResponses.generateDemoWaves(1);
    double seconds = (System.nanoTime() - start) / 1e9;
    // Generous bound against pathological slowness; typically well under a second.
    assertTrue(seconds < 5, "took " + seconds + " s");
  }

  /** Parses a wave file and checks it against the ground truth; returns the wave rebuilt. */
  private static GeneratedWave parsedAgainst(int index, String text, char delimiter)
      throws IOException {
    GeneratedWave wave = waves().get(index);
    List<CSVRecord> records = parse(text, delimiter);
    assertEquals(wave.respondents().size(), records.size());
    List<GeneratedRespondent> rebuilt = new ArrayList<>();
    for (int i = 0; i < records.size(); i++) {
      CSVRecord row = records.get(i);
      GeneratedRespondent p = wave.respondents().get(i);
      assertEquals(SampleResponses.COLUMNS.size(), row.size());
      rebuilt.add(
          new GeneratedRespondent(
              row.get("response_id"),
              LocalDate.parse(row.get("submitted_at")),
              row.get("device"),
              row.get("customer"),
              row.get("order_value"),
              withText(p.stopped(), row.get(SampleResponses.STOPPED_QUESTION)),
              withText(p.chose(), row.get(SampleResponses.CHOSE_QUESTION)),
              p.codedBy()));
    }
    return new GeneratedWave(
        wave.index(), wave.name(), wave.file(), wave.date(), wave.precoded(), rebuilt);
  }

  private static GeneratedAnswer withText(GeneratedAnswer a, String text) {
    return new GeneratedAnswer(
        a.question(), text, a.themes(), a.nonAnswer(), a.language(), a.pii(), a.coded());
  }

  private static List<CSVRecord> parse(String text, char delimiter) throws IOException {
    CSVFormat format =
        CSVFormat.RFC4180
            .builder()
            .setDelimiter(delimiter)
            .setHeader()
            .setSkipHeaderRecord(true)
            .get();
    try (Reader in = new StringReader(text);
        CSVParser parser = CSVParser.parse(in, format)) {
      return parser.getRecords();
    }
  }
}
