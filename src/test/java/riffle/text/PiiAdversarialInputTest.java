package riffle.text;

import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;

import java.time.Duration;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Long answers built to make pattern matching backtrack or recurse: each is masked correctly and
 * quickly. The timeout is a guard against hangs (a 20,000-character answer takes milliseconds), not
 * a benchmark.
 */
class PiiAdversarialInputTest {
  private static final int LENGTH = 20_000;
  private static final Duration GUARD = Duration.ofSeconds(5);

  static Stream<Arguments> inputs() {
    return Stream.of(
            "1",
            "@",
            "a@",
            "@a",
            "a.",
            "1 ",
            "1-",
            "1.",
            "1,",
            "(1)",
            "+1",
            "+1 ",
            "0 ",
            "12 ",
            "1234 ",
            "4111 ",
            "www.",
            "http://",
            "https://a",
            "a/",
            "a.b/",
            ".com/",
            "A1",
            "ORD-1",
            "ORD-",
            "order ",
            "order #1",
            "tracking 1",
            "my name is ",
            "This is ",
            "I'm ",
            "ask for Jo ",
            "Jo ",
            "at ",
            " at a dot ",
            "a [at] b [dot] ",
            "'s",
            "-a",
            "_1",
            "é",
            "😀",
            "\u0308",
            ")",
            "(",
            "((",
            "#1",
            "%",
            "€1",
            "2026-03-15 ",
            "9.30-",
            "12 Oak Road, ",
            "Oak Road ",
            "Via Roma 1",
            "Hauptstraße 1 ",
            ", London NW1 6XE",
            "PO Box 1 ",
            "Regards, Jo ",
            "Thanks, Marta\n",
            "Cheers,\n",
            "name: jo ",
            "DOB ",
            "born on 1 May ",
            "exp 12/28 ",
            "cvv 123 ",
            "GB82 WEST ",
            "SSN 123-45-",
            "QQ 12 34 ",
            "192.168.",
            "fe80::",
            "02:1A:",
            "reg AB12 ",
            "10115 Berlin ")
        .map(unit -> Arguments.of(label(unit), unit.repeat(LENGTH / unit.length() + 1)));
  }

  @ParameterizedTest(name = "{0} repeated")
  @MethodSource("inputs")
  void longRepetitiveAnswersAreMaskedQuickly(String label, String answer) {
    assertTimeoutPreemptively(
        GUARD,
        () -> {
          PiiMaskerTest.assertInvariants(answer, PiiMasker.standard().mask(answer));
          String tailed = answer + " call 07700 900123";
          PiiMaskerTest.assertInvariants(tailed, PiiMasker.standard().mask(tailed));
        });
  }

  @ParameterizedTest(name = "one long run of {0}")
  @MethodSource("runs")
  void oneLongWordOrNumberIsMaskedQuickly(String label, String answer) {
    assertTimeoutPreemptively(
        GUARD, () -> PiiMaskerTest.assertInvariants(answer, PiiMasker.standard().mask(answer)));
  }

  static Stream<Arguments> runs() {
    String a = "a".repeat(LENGTH);
    String d = "7".repeat(LENGTH);
    return Stream.of(
        Arguments.of("letters then @", a + "@" + a + ".com"),
        Arguments.of("digits", d),
        Arguments.of("+digits", "+" + d),
        Arguments.of("upper-case code", "A" + d + "B"),
        Arguments.of("host with a path", a + "." + a + "/" + a),
        Arguments.of("url", "https://" + a),
        Arguments.of("www host", "www." + a + ".com"),
        Arguments.of("local part", "jo" + ".".repeat(LENGTH) + "@example.com"));
  }

  private static String label(String unit) {
    return "\"" + unit.replace("\u0308", "\\u0308") + "\"";
  }
}
