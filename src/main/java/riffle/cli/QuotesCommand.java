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
import riffle.app.Project;
import riffle.app.QuoteQuery;
import riffle.model.CopyBoard;
import riffle.model.InputException;
import riffle.model.Quote;
import riffle.model.QuoteFindings;
import riffle.model.QuoteSlot;

/** {@code riffle quotes}: the buyers' own words, ranked for page copy. */
@Command(
    name = "quotes",
    mixinStandardHelpOptions = true,
    description = {
      "Shows quotable buyer wording: per use (headline ideas, sub-headline ideas, benefit "
          + "lines, objections to answer, proof quotes) the best candidates from the coded "
          + "answers, masked, each traceable to its answer.",
      "Quoting respondents publicly needs their consent."
    })
final class QuotesCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Option(names = "--project", required = true, paramLabel = "P", description = "Project file.")
  Path project;

  @Option(names = "--code", paramLabel = "C", description = "Only this code's quotes.")
  String code;

  @Option(names = "--wave", paramLabel = "W", description = "Only quotes from this wave.")
  String wave;

  @Option(
      names = "--segment",
      paramLabel = "COLUMN=VALUE",
      description = "Only respondents with this segment value (repeatable), e.g. device=mobile.")
  Map<String, String> segments = new LinkedHashMap<>();

  @Mixin JsonOption json;

  @Override
  public Integer call() throws InputException {
    QuoteFindings findings;
    try (Project p = Project.openExisting(project)) {
      findings =
          p.quotes()
              .rank(new QuoteQuery(Optional.ofNullable(code), Optional.ofNullable(wave), segments));
    }
    PrintWriter out = spec.commandLine().getOut();
    if (json.enabled) {
      JsonOutput.print(out, findings);
      return 0;
    }
    out.println(CopyBoard.CONSENT_NOTICE);
    for (QuoteSlot slot : QuoteSlot.values()) {
      out.printf(Locale.ROOT, "%n%s%n", BoardCommand.heading(slot));
      for (Quote q : findings.candidates(slot)) {
        out.printf(
            Locale.ROOT,
            "  \"%s\"%n    %s · #%d %s · %s%s%s%n",
            q.text(),
            q.code(),
            q.answerId(),
            q.respondent(),
            q.wave(),
            q.count() > 1 ? " · said this way by " + q.count() + " buyers" : "",
            q.fresh() ? " · new this wave" : "");
      }
    }
    return 0;
  }
}
