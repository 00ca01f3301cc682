package riffle.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import riffle.app.PhraseFindings;
import riffle.app.PhraseQuery;
import riffle.app.Project;
import riffle.model.InputException;
import riffle.model.KeyPhrase;
import riffle.model.Phrase;
import riffle.model.PhraseCluster;
import riffle.model.WaveChange;

/** {@code riffle phrases}: what buyers keep saying, what they say together, what changed. */
@Command(
    name = "phrases",
    mixinStandardHelpOptions = true,
    description =
        "Shows the recurring phrases of the answers in the buyers' own words (negation kept), "
            + "the themes that travel together as candidate codes with a ready search query, and, "
            + "with --against, the phrases that rose or fell between two waves (log-likelihood, Log "
            + "Ratio).")
final class PhrasesCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Option(names = "--project", required = true, paramLabel = "P", description = "Project file.")
  Path project;

  @Option(names = "--wave", paramLabel = "W", description = "Only this wave.")
  String wave;

  @Option(
      names = "--question",
      paramLabel = "Q",
      description = "Only this question: its number (1, 2 …) or its text.")
  String question;

  @Option(
      names = "--segment",
      paramLabel = "COLUMN=VALUE",
      description = "Only respondents with this segment value (repeatable), e.g. device=mobile.")
  Map<String, String> segments = new LinkedHashMap<>();

  @Option(
      names = "--against",
      paramLabel = "W",
      description = "Compare --wave with this wave: which phrases rose or fell.")
  String against;

  @Option(
      names = "--limit",
      paramLabel = "N",
      defaultValue = "30",
      description = "Show at most N phrases (default: ${DEFAULT-VALUE}).")
  int limit;

  @Mixin JsonOption json;

  @Override
  public Integer call() throws InputException {
    PhraseQuery query =
        new PhraseQuery(
            Optional.ofNullable(wave),
            Optional.ofNullable(question),
            segments,
            Optional.ofNullable(against),
            limit);
    PhraseFindings found;
    try (Project p = Project.openExisting(project)) {
      found = p.phrases(query);
    }
    PrintWriter out = spec.commandLine().getOut();
    if (json.enabled) {
      JsonOutput.print(out, found);
      return 0;
    }
    out.printf(Locale.ROOT, "%d answers mined%n%n", found.answers());
    out.printf(Locale.ROOT, "%-44s %8s %8s%n", "recurring phrase", "answers", "score");
    for (Phrase p : found.phrases()) {
      out.printf(
          Locale.ROOT,
          "%-44s %8d %8.1f%s%n",
          p.phrase(),
          p.answers(),
          p.score(),
          p.negated() ? "  (negated)" : "");
    }
    if (!found.clusters().isEmpty()) {
      out.printf(Locale.ROOT, "%nthemes that travel together%n");
      for (PhraseCluster c : found.clusters()) {
        out.printf(
            Locale.ROOT, "  %d answers: %s%n    query: %s%n", c.answers(), c.phrases(), c.query());
      }
    }
    if (!found.keyness().isEmpty()) {
      out.printf(
          Locale.ROOT,
          "%n%s against %s (rose or fell only where the adjusted p is under %.2f)%n",
          found.wave().orElse(""),
          found.against().orElse(""),
          WaveChange.SIGNIFICANCE);
      for (KeyPhrase k : found.keyness()) {
        out.printf(
            Locale.ROOT,
            "  %-40s %-15s  %d vs %d  G²=%.2f  log ratio %.2f  p=%.4f  adjusted p=%.4f%n",
            k.phrase(),
            k.verdict(),
            k.focus(),
            k.reference(),
            k.logLikelihood(),
            k.logRatio(),
            k.p(),
            k.pAdjusted());
      }
    }
    return 0;
  }
}
