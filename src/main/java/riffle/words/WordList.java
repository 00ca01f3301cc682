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
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * Reads one word list shipped with Riffle, once, from {@code riffle/words/<language>/<name>.txt} on
 * the class path.
 *
 * <p>The file format follows Lucene's {@code WordlistLoader}: UTF-8, one entry per line; text from
 * {@code #} to the end of a line is a comment; entries are trimmed and blank lines skipped. An
 * entry may hold several words ("no comment") and may hold a {@code #} when it is escaped as {@code
 * \#}. Entries keep their order; a repeated entry is a mistake in the file and is refused, as is a
 * missing file: both are faults of the build, not of a user's input, so they surface as {@link
 * IllegalStateException} when the list is first read.
 */
public final class WordList {
  private static final Pattern LANGUAGE = Pattern.compile("[a-z]{2,3}");
  private static final Pattern NAME = Pattern.compile("[a-z0-9][a-z0-9-]*");

  private WordList() {}

  /** The entries of a list in file order, unmodifiable. */
  public static List<String> entries(String language, String name) {
    String path = path(language, name);
    InputStream in = WordList.class.getResourceAsStream("/" + path);
    if (in == null) {
      throw new IllegalStateException("word list " + path + " is not on the class path");
    }
    List<String> entries = new ArrayList<>();
    Set<String> seen = new LinkedHashSet<>();
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
        entries.add(entry);
      }
    } catch (CharacterCodingException e) {
      throw new IllegalStateException("word list " + path + " is not UTF-8", e);
    } catch (IOException e) {
      throw new UncheckedIOException("word list " + path + " could not be read", e);
    }
    return Collections.unmodifiableList(entries);
  }

  /** The entries of a list as a set that keeps file order, unmodifiable. */
  public static Set<String> set(String language, String name) {
    return Collections.unmodifiableSet(new LinkedHashSet<>(entries(language, name)));
  }

  private static String path(String language, String name) {
    Objects.requireNonNull(language, "language");
    Objects.requireNonNull(name, "name");
    if (!LANGUAGE.matcher(language).matches()) {
      throw new IllegalArgumentException("language must be an ISO 639 code, was " + language);
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
