package riffle.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.stream.Collectors;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import riffle.app.Analyses;
import riffle.model.Analysis;
import riffle.model.PiiMask;
import riffle.model.Sentence;
import riffle.model.Token;

/** {@code riffle analyze}: shows what text analysis makes of one answer. */
@Command(
    name = "analyze",
    mixinStandardHelpOptions = true,
    description =
        "Shows what Riffle's text analysis makes of one answer: masked personal data, "
            + "language, sentences, tokens with Penn Treebank tags, stems and negation, and chunks.")
final class AnalyzeCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Option(names = "--text", required = true, paramLabel = "T", description = "The answer.")
  String text;

  @Mixin JsonOption json;

  @Override
  public Integer call() {
    Analysis a = Analyses.analyze(text);
    PrintWriter out = spec.commandLine().getOut();
    if (json.enabled) {
      JsonOutput.print(out, a);
      return 0;
    }
    out.printf(Locale.ROOT, "language: %s%s%n", a.language(), a.foreign() ? " (not analysed)" : "");
    out.println("masked:   " + a.masked());
    for (PiiMask m : a.pii()) {
      out.printf(Locale.ROOT, "  %s at %d-%d%n", m.type().placeholder(), m.start(), m.end());
    }
    if (a.truncated()) {
      out.println("(long answer: only its start was analysed)");
    }
    for (Sentence s : a.sentences()) {
      out.println();
      out.println(
          s.chunks().stream()
              .map(c -> "[" + c.type() + " " + c.text() + "]")
              .collect(Collectors.joining(" ")));
      for (Token t : s.tokens()) {
        out.printf(
            Locale.ROOT,
            "  %-16s %-5s %-14s%s%n",
            t.text(),
            t.pos(),
            t.stem(),
            t.negated() ? " negated" : "");
      }
    }
    return 0;
  }
}
