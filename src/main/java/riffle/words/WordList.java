package riffle.words;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * Reads one word list shipped with Riffle, once, from {@code riffle/words/<language>/<name>.txt} on
 * the class path. The language is an ISO 639 code, or {@code any} for a list that serves every
 * language Riffle reads (street words, IBAN lengths).
 *
 * <p>The file format follows Lucene's {@code WordlistLoader}: UTF-8, one entry per line; text from
 * {@code #} to the end of a line is a comment; entries are trimmed and blank lines skipped. An
 * entry may hold several words ("no comment") and may hold a {@code #} when it is escaped as {@code
 * \#}. Entries keep their order; a repeated entry is a mistake in the file and is refused, as is a
 * missing file: both are faults of the build, not of a user's input, so they surface as {@link
 * IllegalStateException} when the list is first read. A list of pairs ({@link #map}) holds a key
 * and its value on each line.
 */
public final class WordList {
  private static final Pattern LANGUAGE = Pattern.compile("[a-z]{2,3}");
  private static final Pattern NAME = Pattern.compile("[a-z0-9][a-z0-9-]*");

  private WordList() {}

  /** The entries of a list in file order, unmodifiable. */
  public static List<String> entries(String language, String name) {
    return Collections.unmodifiableList(new ArrayList<>(read(language, name).values()));
  }

  /** The entries of a list as a set that keeps file order, unmodifiable. */
  public static Set<String> set(String language, String name) {
    return Collections.unmodifiableSet(new LinkedHashSet<>(entries(language, name)));
  }

  /**
   * A list of pairs as a map in file order, unmodifiable: each entry is a key, then whitespace,
   * then its value ("AD 24"), the key a single word and the value the rest of the entry. An entry
   * without a value, or a key listed twice, is a mistake in the file and is refused.
   */
  public static Map<String, String> map(String language, String name) {
    String path = path(language, name);
    Map<String, String> map = new LinkedHashMap<>();
    for (Map.Entry<Integer, String> e : read(language, name).entrySet()) {
      String[] pair = e.getValue().split("\\s+", 2);
      if (pair.length < 2) {
        throw new IllegalStateException(
            path + ":" + e.getKey() + ": \"" + e.getValue() + "\" has no value after its key");
      }
      if (map.putIfAbsent(pair[0], pair[1]) != null) {
        throw new IllegalStateException(
            path + ":" + e.getKey() + ": the key \"" + pair[0] + "\" is listed twice");
      }
    }
    return Collections.unmodifiableMap(map);
  }

  /** The entries of a list by line number, in file order. */
  private static Map<Integer, String> read(String language, String name) {
    String path = path(language, name);
    InputStream in = WordList.class.getResourceAsStream("/" + path);
    if (in == null) {
      throw new IllegalStateException("word list " + path + " is not on the class path");
    }
    Map<Integer, String> entries = new LinkedHashMap<>();
    Set<String> seen = new HashSet<>();
    try (BufferedReader reader =
        new BufferedReader(
            new InputStreamReader(
                in,
                StandardCharsets.UTF_8
                    .newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)))) {
      int lineNumber = 0;
      for (String line = reader.readLine(); line != null; line = reader.readLine()) {
        lineNumber++;
        String entry = entryOf(line);
        if (entry.isEmpty()) {
          continue;
        }
        if (!seen.add(entry)) {
          throw new IllegalStateException(
              path + ":" + lineNumber + ": \"" + entry + "\" is listed twice");
        }
        entries.put(lineNumber, entry);
      }
    } catch (CharacterCodingException e) {
      throw new IllegalStateException("word list " + path + " is not UTF-8", e);
    } catch (IOException e) {
      throw new UncheckedIOException("word list " + path + " could not be read", e);
    }
    return entries;
  }

  private static String path(String language, String name) {
    Objects.requireNonNull(language, "language");
    Objects.requireNonNull(name, "name");
    if (!LANGUAGE.matcher(language).matches()) {
      throw new IllegalArgumentException(
          "language must be an ISO 639 code or any, was " + language);
    }
    if (!NAME.matcher(name).matches()) {
      throw new IllegalArgumentException("list name must be lower-case words, was " + name);
    }
    return "riffle/words/" + language + "/" + name + ".txt";
  }

  private static String entryOf(String line) {
    StringBuilder out = new StringBuilder(line.length());
    for (int i = 0; i < line.length(); i++) {
      char c = line.charAt(i);
      if (c == '\\' && i + 1 < line.length() && line.charAt(i + 1) == '#') {
        out.append('#');
        i++;
      } else if (c == '#') {
        break;
      } else {
        out.append(c);
      }
    }
    return out.toString().strip();
  }
}
