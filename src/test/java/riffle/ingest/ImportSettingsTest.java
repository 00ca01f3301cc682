package riffle.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import riffle.model.InputException;
import riffle.model.SettingException;

class ImportSettingsTest {
  @Test
  void defaultsSniffEverythingWithDocumentedLimits() {
    ImportSettings s = ImportSettings.builder().get();
    assertEquals(Optional.empty(), s.delimiter());
    assertEquals(Optional.empty(), s.encoding());
    assertEquals(List.of(), s.textColumns());
    assertEquals(Optional.empty(), s.idColumn());
    assertEquals(100L * 1024 * 1024, s.maxBytes());
    assertEquals(200, s.maxProblems());
    assertEquals(1_000, s.maxColumns());
  }

  @Test
  void keepsNamedColumnsInOrderAndDropsRepeats() {
    ImportSettings s =
        ImportSettings.builder()
            .textColumn("What almost stopped you from buying?")
            .textColumn(" Why did you choose us? ")
            .textColumn("what almost stopped you from buying?")
            .codesColumn("Q1 codes")
            .metaColumn("Device")
            .metaColumn("Country")
            .idColumn("Response ID")
            .dateColumn("Submitted at")
            .coderColumn("Coded by")
            .delimiter(Delimiter.SEMICOLON)
            .encoding("windows-1252")
            .get();
    assertEquals(
        List.of("What almost stopped you from buying?", "Why did you choose us?"), s.textColumns());
    assertEquals(List.of("Q1 codes"), s.codesColumns());
    assertEquals(List.of("Device", "Country"), s.metaColumns());
    assertEquals(Optional.of("Response ID"), s.idColumn());
    assertEquals(Optional.of("Submitted at"), s.dateColumn());
    assertEquals(Optional.of("Coded by"), s.coderColumn());
    assertEquals(Optional.of(Delimiter.SEMICOLON), s.delimiter());
    assertEquals("windows-1252", s.encoding().orElseThrow().name());
  }

  @Test
  void acceptsAutoAndCharsetAliasesForEncoding() {
    assertEquals(Optional.empty(), ImportSettings.builder().encoding("auto").get().encoding());
    assertEquals(Optional.empty(), ImportSettings.builder().encoding("Auto").get().encoding());
    assertEquals(
        Optional.of(StandardCharsets.UTF_8),
        ImportSettings.builder().encoding("utf8").get().encoding());
    assertEquals(
        Optional.of(StandardCharsets.UTF_16LE),
        ImportSettings.builder().encoding("UTF-16LE").get().encoding());
  }

  @Test
  void rejectsUnknownEncodingNameWithTheFix() {
    for (String name : new String[] {"latin-9000", "not a charset", "???"}) {
      InputException e =
          assertThrows(InputException.class, () -> ImportSettings.builder().encoding(name));
      assertEquals(
          "unknown encoding '"
              + name
              + "'; use auto or a name such as UTF-8, windows-1252, UTF-16LE",
          e.getMessage());
    }
  }

  @Test
  void rejectsOneColumnNamedForTwoRolesNamingBothOptions() {
    InputException e =
        assertThrows(
            InputException.class,
            () -> ImportSettings.builder().textColumn("Q1").codesColumn(" q1 ").get());
    assertTrue(e.getMessage().contains("text column"), e.getMessage());
    assertTrue(e.getMessage().contains("codes column"), e.getMessage());
    assertFalse(e.getMessage().contains("--"), "names settings, not options: " + e.getMessage());
    assertTrue(e.getMessage().contains("keep only one"), e.getMessage());

    InputException meta =
        assertThrows(
            InputException.class,
            () -> ImportSettings.builder().idColumn("Device").metaColumn("Device").get());
    assertTrue(meta.getMessage().contains("id column and segment column"), meta.getMessage());
  }

  @Test
  void rejectsNonPositiveLimits() {
    assertThrows(InputException.class, () -> ImportSettings.builder().maxBytes(0).get());
    assertThrows(InputException.class, () -> ImportSettings.builder().maxBytes(-5).get());
    assertThrows(InputException.class, () -> ImportSettings.builder().maxProblems(0).get());
    assertEquals(1, ImportSettings.builder().maxProblems(1).get().maxProblems());
    InputException columns =
        assertThrows(InputException.class, () -> ImportSettings.builder().maxColumns(0).get());
    assertTrue(columns.getMessage().contains("column limit"), columns.getMessage());
    assertEquals(5_000, ImportSettings.builder().maxColumns(5_000).get().maxColumns());
  }

  @Test
  void rejectsBlankColumnNames() {
    SettingException blank =
        assertThrows(SettingException.class, () -> ImportSettings.builder().textColumn("  "));
    assertEquals("text column", blank.setting());
    assertThrows(InputException.class, () -> ImportSettings.builder().metaColumn(""));
  }

  @Test
  void settingsDoNotChangeWhenTheBuilderDoes() {
    ImportSettings.Builder b = ImportSettings.builder().textColumn("Q1");
    ImportSettings first = b.get();
    b.textColumn("Q2");
    assertEquals(List.of("Q1"), first.textColumns());
    assertThrows(UnsupportedOperationException.class, () -> first.textColumns().add("Q3"));
  }
}
