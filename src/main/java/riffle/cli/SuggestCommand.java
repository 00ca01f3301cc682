package riffle.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import riffle.app.Project;
import riffle.model.EditOutcome;
import riffle.model.InputException;
import riffle.model.ShownSuggestion;
import riffle.model.SuggestionQuality;
import riffle.model.SuggestionReport;

/** {@code riffle suggest}: codes learned from the answers people coded. */
@Command(
    name = "suggest",
    mixinStandardHelpOptions = true,
    description = {
      "Learns from the answers people coded (by hand or imported) and shows the codes it "
          + "would suggest, with how often such suggestions were right (cross-validated "
          + "precision, recall, F1 and support per code).",
      "Nothing is coded unless you say --accept-above."
    })
final class SuggestCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Mixin CodingOptions options;

  @Option(names = "--wave", paramLabel = "W", description = "Only answers of this wave.")
  String wave;

  @Option(
      names = "--limit",
      paramLabel = "N",
      defaultValue = "30",
      description = "Show at most N suggestions (default: ${DEFAULT-VALUE}).")
  int limit;

  @Option(
      names = "--accept-above",
      paramLabel = "X",
      description = "Accept every suggestion with a confidence of X or more (one undoable change).")
  Double acceptAbove;

  @Override
  public Integer call() throws InputException {
    SuggestionReport report;
    Optional<EditOutcome> accepted = Optional.empty();
    try (Project p = Project.openExisting(options.project)) {
      report = p.suggest(Optional.ofNullable(wave));
      if (acceptAbove != null) {
        accepted =
            Optional.of(p.coding().acceptAbove(options.coder(), report.suggestions(), acceptAbove));
      }
    }
    PrintWriter out = spec.commandLine().getOut();
    if (options.json.enabled) {
      JsonOutput.print(
          out,
          accepted.isPresent()
              ? java.util.Map.of(
                  "suggestions",
                  report.suggestions(),
                  "metrics",
                  report.metrics(),
                  "accepted",
                  accepted.get())
              : report);
      return 0;
    }
    out.printf(Locale.ROOT, "Learned from %d coded answers.%n%n", report.examples());
    out.println("How often suggestions were right (cross-validated on people's codes)");
    for (SuggestionQuality q : report.metrics()) {
      if (q.ready()) {
        out.printf(
            Locale.ROOT,
            "  %-30s precision %s  recall %s  F1 %s  (%d coded answers)%n",
            q.code(),
            pct(q.precision()),
            pct(q.recall()),
            pct(q.f1()),
            q.support());
      } else {
        out.printf(
            Locale.ROOT,
            "  %-30s not enough examples yet (%d coded answers carry it)%n",
            q.code(),
            q.support());
      }
    }
    out.printf(Locale.ROOT, "%n%d suggestion(s)%n", report.suggestions().size());
    int shown = 0;
    for (ShownSuggestion s : report.suggestions()) {
      if (shown++ >= limit) {
        break;
      }
      out.printf(
          Locale.ROOT,
          "  #%d %-10s %-28s %.2f%n",
          s.answerId(),
          s.respondent(),
          s.code(),
          s.confidence());
    }
    accepted.ifPresent(a -> out.println(a.message()));
    return 0;
  }

  private static String pct(Double v) {
    return v == null ? "  –  " : String.format(Locale.ROOT, "%4.0f%%", 100 * v);
  }
}
