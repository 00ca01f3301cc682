package riffle.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code riffle board} on a project an older masker analysed: the quote that the new masks cover is
 * taken off on the next open, and the board says so (text and JSON), as does the history.
 */
class BoardTakenOffTest {
  @TempDir Path dir;

  @Test
  void theBoardSaysWhichQuoteWasTakenOffAndWhy() throws Exception {
    Path file = dir.resolve("wave.csv");
    Files.writeString(
        file,
        "id,What made you choose us?\n"
            + "A1,\"Fast delivery to 9 Quillon Street, Oxbury OX9 4QT, well packed\"\n"
            + "A2,\"The chat helped me choose the right grinder\"\n",
        StandardCharsets.UTF_8);
    String project = dir.resolve("shop.riffle").toString();
    assertEquals(
        0,
        CliTest.riffle("import", "--project", project, "--file", file.toString(), "--wave", "W1")
            .code());
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + project);
        Statement s = c.createStatement()) {
      // as an older masker left it, with a quote pinned from the unmasked address
      s.executeUpdate("UPDATE answer SET masked = normalized, analysed_with = 'text-1'");
      s.executeUpdate("DELETE FROM answer_pii");
      s.executeUpdate(
          "INSERT INTO board_item (id, slot, position, answer_id, code, text) VALUES"
              + " (1, 'headline', 1, 1, 'fast delivery', 'Fast delivery to 9 Quillon Street'),"
              + " (2, 'proof', 1, 2, 'advice', 'The chat helped me choose the right grinder')");
    }
    CliTest.Run board = CliTest.riffle("board", "--project", project);
    assertEquals(0, board.code(), board.err());
    assertTrue(
        board.out().contains("Took quote 1 of Headline ideas (answer 1, code \"fast delivery\")"),
        board.out());
    assertFalse(board.out().contains("Quillon"), board.out());
    assertTrue(board.out().contains("The chat helped me choose the right grinder"));

    JsonNode json = CliTest.riffle("board", "--project", project, "--json").json();
    assertEquals(1, json.get("taken_off").size(), json.toString());
    assertEquals(0, json.get("slots").get(0).get("items").size(), "headline slot emptied");

    JsonNode history = CliTest.riffle("history", "--project", project, "--json").json();
    assertTrue(history.toString().contains("unpin-masked"), history.toString());
  }
}
