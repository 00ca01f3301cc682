package riffle.app;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import riffle.model.SettingException;

/**
 * Finds the wave or question a person named among the project's, the one way every use case reads
 * them: a wave by its name in any case, a question by its number or its text.
 */
final class Lookups {
  private Lookups() {}

  /**
   * The project's name of the wave {@code given} names.
   *
   * @param setting the setting that named it, in plain words ({@code wave}, {@code against}, {@code
   *     from}, {@code to})
   * @throws SettingException naming that setting when the project has no such wave
   */
  static String wave(String given, List<String> waves, String setting) {
    for (String w : waves) {
      if (w.equalsIgnoreCase(given.strip())) {
        return w;
      }
    }
    throw new SettingException(
        setting, "no wave named \"" + given + "\"; the waves are " + String.join(", ", waves));
  }

  /**
   * The text of the question {@code given} names, by its number (from 1), its text or its short
   * name ({@code names}, by text) in any case.
   *
   * @throws SettingException naming the question setting when the project has no such question
   */
  static String question(String given, List<String> questions, Map<String, String> names) {
    String q = given.strip();
    if (q.matches("\\d+")) {
      int n = Integer.parseInt(q);
      if (n >= 1 && n <= questions.size()) {
        return questions.get(n - 1);
      }
    }
    for (String text : questions) {
      if (text.toLowerCase(Locale.ROOT).equals(q.toLowerCase(Locale.ROOT))) {
        return text;
      }
    }
    for (String text : questions) {
      String name = names.get(text);
      if (name != null && name.toLowerCase(Locale.ROOT).equals(q.toLowerCase(Locale.ROOT))) {
        return text;
      }
    }
    StringBuilder list = new StringBuilder();
    for (int i = 0; i < questions.size(); i++) {
      String name = names.get(questions.get(i));
      list.append(i == 0 ? "" : "; ")
          .append(i + 1)
          .append(" = ")
          .append(name == null ? "" : name + ": ")
          .append(questions.get(i));
    }
    throw new SettingException(
        "question",
        "no question \""
            + given
            + "\"; give its number, "
            + (names.isEmpty() ? "" : "name ")
            + "or text: "
            + list);
  }
}
