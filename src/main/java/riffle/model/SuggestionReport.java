package riffle.model;

import java.util.List;

/**
 * The suggestions the engine would show, and how good they are.
 *
 * @param suggestions the proposed codes, most confident first
 * @param metrics per question and code, cross-validated precision, recall, F1 and support
 * @param examples how many human-coded answers the engine learned from
 */
public record SuggestionReport(
    List<ShownSuggestion> suggestions, List<SuggestionQuality> metrics, int examples) {
  public SuggestionReport {
    suggestions = List.copyOf(suggestions);
    metrics = List.copyOf(metrics);
  }
}
