package riffle.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import riffle.model.Analysis;

/** models/manifest.tsv describes exactly the models that load, byte for byte. */
class ModelManifestTest {
  static final Path MANIFEST = Path.of("models/manifest.tsv");

  static List<String[]> rows() throws IOException {
    List<String> lines = Files.readAllLines(MANIFEST, StandardCharsets.UTF_8);
    assertEquals(
        "language\ttask\tresource\tartifact\tversion\tlicence\tsha256\tbytes\ttrained_on",
        lines.get(0));
    return lines.stream().skip(1).filter(l -> !l.isBlank()).map(l -> l.split("\t", -1)).toList();
  }

  @Test
  void everyListedModelLoadsWithTheListedDigestAndSize() throws Exception {
    for (String[] row : rows()) {
      assertEquals(9, row.length, String.join("|", row));
      try (InputStream in = Models.class.getResourceAsStream("/" + row[2])) {
        assertNotNull(in, row[2] + " is listed but not on the classpath");
        byte[] bytes = in.readAllBytes();
        String sha = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        assertEquals(row[6], sha, row[2]);
        assertEquals(Long.parseLong(row[7]), bytes.length, row[2]);
      }
      assertEquals("Apache-2.0", row[5], row[2]);
      assertFalse(row[8].isBlank(), row[2] + " says what it was trained on");
    }
  }

  @Test
  void everyModelThePipelineLoadsIsListed() throws IOException {
    Set<String> listed = rows().stream().map(r -> "/" + r[2]).collect(Collectors.toSet());
    for (String used :
        List.of(
            Models.SENTENCES,
            Models.TOKENS,
            Models.TAGS,
            Models.CHUNKS,
            LanguageCheck.MODEL_RESOURCE)) {
      assertTrue(listed.contains(used), used + " is loaded but not in the manifest");
    }
  }

  @Test
  void modelsDroppedIntoALanguageFolderAreUsedForThatLanguage(@TempDir Path dir)
      throws IOException {
    // Any four valid OpenNLP models make a set; the English ones stand in for German here.
    Path deu = Files.createDirectories(dir.resolve("deu"));
    List<String> resources = List.of(Models.SENTENCES, Models.TOKENS, Models.TAGS, Models.CHUNKS);
    for (int i = 0; i < 4; i++) {
      try (InputStream in = Models.open(resources.get(i))) {
        Files.copy(in, deu.resolve(Models.FILES.get(i)));
      }
    }
    Files.createDirectories(dir.resolve("fra")); // incomplete: reported, not used
    TextAnalyzer analyzer = TextAnalyzer.withModelFolders(List.of(dir), PiiMasker.standard());
    assertEquals(List.of("eng", "deu"), analyzer.languages());
    assertEquals(1, analyzer.modelProblems().size());
    assertTrue(analyzer.modelProblems().get(0).contains("fra"));

    Analysis german =
        analyzer.analyze("Die Lieferzeit war leider nicht angegeben, deshalb habe ich gezögert.");
    assertEquals("deu", german.language());
    assertFalse(german.foreign(), "analysed with the dropped-in models");
    assertFalse(german.sentences().isEmpty());
    Analysis withoutModels =
        TextAnalyzer.english()
            .analyze("Die Lieferzeit war leider nicht angegeben, deshalb habe ich gezögert.");
    assertTrue(withoutModels.foreign());
    assertTrue(withoutModels.sentences().isEmpty());
  }
}
