package riffle.quotes;

import java.util.HashMap;
import java.util.Map;
import riffle.model.Token;

/**
 * Integer ids for word keys: the stem, or the stem marked as negated, so that "not expensive" and
 * "expensive" never share a key. Not thread-safe; filled before the ranking runs.
 */
final class Vocabulary {
  private final Map<String, Integer> ids = new HashMap<>();

  /** The id of the token's key, added when new. */
  int id(Token t) {
    String key = t.negated() ? "\u00ac" + t.stem() : t.stem();
    Integer id = ids.get(key);
    if (id == null) {
      id = ids.size();
      ids.put(key, id);
    }
    return id;
  }

  int size() {
    return ids.size();
  }
}
