package riffle.ingest;

import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.Charset;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Decodes the bytes of an export into text.
 *
 * <p>Sniffing order: a byte-order mark (UTF-8, UTF-16LE, UTF-16BE); else UTF-16 without a mark when
 * the first 4 KiB show the NUL pattern of mostly-Latin UTF-16 (at least half of the byte pairs have
 * a NUL on one side and at most 2% on the other); else strict UTF-8; else, when no line holds a
 * well-formed multi-byte UTF-8 sequence, windows-1252; else the file mixes encodings (exports
 * concatenated from two sources) and each physical line is decoded on its own: a line that is valid
 * UTF-8 as UTF-8, a line with stray bytes and no well-formed multi-byte sequence as windows-1252, a
 * line with both as UTF-8 with the stray bytes replaced by U+FFFD. The lines read unlike most of
 * the file (windows-1252 lines in a mostly UTF-8 file, or the other way round) and every line with
 * replaced bytes get a warning with their line number, after one for the whole file. NUL bytes not
 * explained by UTF-16, well-known binary signatures (zip/xlsx, xls, pdf, gzip) or more than 5%
 * control characters in the first 64 Ki characters mean a binary file. An explicit encoding skips
 * sniffing; a byte-order mark matching it is still stripped.
 *
 * <p>Whatever the encoding, a line that reads like UTF-8 text decoded as windows-1252 once before
 * it reached the export ({@code CafÃ© crÃ¨me} for {@code Café crème}) gets a warning; its text is
 * kept as it is.
 *
 * <p>Size: one class because the sniffing order above is one decision over the same bytes, and the
 * per-line decoding of mixed files shares its counts and warnings.
 */
final class EncodingSniffer {
  /**
   * Decoded text and how it was obtained.
   *
   * @param text the text, without a byte-order mark
   * @param label how it was decoded, such as {@code UTF-8 (BOM)}
   * @param detected true when sniffed rather than given
   * @param warnings what the analyst should check, each on its line (0 for the whole file)
   */
  record Decoded(String text, String label, boolean detected, List<Warning> warnings) {}

  /**
   * A decoding problem worth a look.
   *
   * @param line the 1-based physical line, 0 for the whole file
   * @param message what happened and what to do
   */
  record Warning(long line, String message) {}

  /** The label of a file whose lines were decoded as UTF-8 and as windows-1252. */
  static final String MIXED = "UTF-8 and windows-1252 (line by line)";

  static final String BINARY =
      "looks like a binary file, not a CSV/TSV export; export the survey as CSV";

  private static final Charset WINDOWS_1252 = Charset.forName("windows-1252");
  private static final int UTF16_SAMPLE = 4096;
  private static final int BINARY_SAMPLE = 65536;
  private static final double CONTROL_SHARE = 0.05;

  /** The characters windows-1252 gives the bytes 0x80–0xBF, UTF-8's continuation bytes. */
  private static final String CONTINUATIONS = continuations();

  private EncodingSniffer() {}

  private static String continuations() {
    byte[] b = new byte[0x40];
    for (int i = 0; i < b.length; i++) {
      b[i] = (byte) (0x80 + i);
    }
    return new String(b, WINDOWS_1252).replace("\uFFFD", "");
  }

  /**
   * Decodes bytes.
   *
   * @param bytes the whole input
   * @param explicit the encoding the analyst gave, or empty to sniff
   * @return the text without a byte-order mark
   * @throws BadInput when the input is empty or binary; the message is what to tell the analyst
   */
  static Decoded decode(byte[] bytes, Optional<Charset> explicit) throws BadInput {
    if (bytes.length == 0) {
      throw new BadInput("file is empty");
    }
    Decoded d = explicit.isPresent() ? decodeAs(bytes, explicit.get()) : sniff(bytes);
    checkText(d.text());
    return d;
  }

  /** Rejects text that is empty or looks binary once decoded. */
  static void checkText(String text) throws BadInput {
    if (text.isBlank()) {
      throw new BadInput("file is empty");
    }
    int n = Math.min(text.length(), BINARY_SAMPLE);
    int controls = 0;
    for (int i = 0; i < n; i++) {
      char c = text.charAt(i);
      if (c == 0) {
        throw new BadInput(BINARY);
      }
      if ((c < 0x20 && c != '\t' && c != '\n' && c != '\r' && c != '\f') || c == 0x7f) {
        controls++;
      }
    }
    if (controls > CONTROL_SHARE * n) {
      throw new BadInput(BINARY);
    }
  }

  private static Decoded sniff(byte[] b) throws BadInput {
    if (startsWith(b, 0xEF, 0xBB, 0xBF)) {
      return marked(b, 3, StandardCharsets.UTF_8, "UTF-8 (BOM)");
    }
    if (startsWith(b, 0xFF, 0xFE)) {
      return marked(b, 2, StandardCharsets.UTF_16LE, "UTF-16LE (BOM)");
    }
    if (startsWith(b, 0xFE, 0xFF)) {
      return marked(b, 2, StandardCharsets.UTF_16BE, "UTF-16BE (BOM)");
    }
    String signature = binarySignature(b);
    if (signature != null) {
      throw new BadInput(BINARY + " (it starts like " + signature + ")");
    }
    Charset utf16 = utf16WithoutBom(b);
    if (utf16 != null) {
      String text = tryStrict(b, 0, utf16);
      if (text != null) {
        return new Decoded(text, utf16.name(), true, List.of());
      }
    }
    int n = Math.min(b.length, BINARY_SAMPLE);
    for (int i = 0; i < n; i++) {
      if (b[i] == 0) {
        throw new BadInput(
            0,
            0,
            BINARY
                + " (it holds NUL bytes; if it is a UTF-16 text export, set the encoding to UTF-16LE"
                + " or UTF-16BE)",
            "encoding");
      }
    }
    String utf8 = tryStrict(b, 0, StandardCharsets.UTF_8);
    if (utf8 != null) {
      return new Decoded(utf8, "UTF-8", true, List.of());
    }
    return byLine(b);
  }

  /**
   * Decodes bytes that are not valid UTF-8 as a whole: windows-1252 when no line holds a
   * well-formed multi-byte UTF-8 sequence, else line by line.
   */
  private static Decoded byLine(byte[] b) {
    boolean anyUtf8 = false;
    for (int start = 0; start < b.length && !anyUtf8; ) {
      int end = lineEnd(b, start);
      anyUtf8 = utf8Counts(b, start, end)[0] > 0;
      start = next(b, end);
    }
    if (!anyUtf8) {
      return new Decoded(new String(b, WINDOWS_1252), "windows-1252", true, List.of());
    }
    StringBuilder text = new StringBuilder(b.length);
    List<Warning> damaged = new ArrayList<>();
    List<Long> utf8Lines = new ArrayList<>();
    List<Long> latinLines = new ArrayList<>();
    long line = 1;
    for (int start = 0; start < b.length; line++) {
      int end = lineEnd(b, start);
      long[] counts = utf8Counts(b, start, end);
      if (counts[1] == 0) {
        text.append(new String(b, start, end - start, StandardCharsets.UTF_8));
        if (counts[0] > 0) {
          utf8Lines.add(line);
        }
      } else if (counts[0] == 0) {
        text.append(new String(b, start, end - start, WINDOWS_1252));
        latinLines.add(line);
      } else {
        text.append(new String(b, start, end - start, StandardCharsets.UTF_8));
        damaged.add(
            new Warning(
                line,
                (counts[1] == 1 ? "1 byte on this line is" : counts[1] + " bytes on this line are")
                    + " not valid UTF-8 and show as \uFFFD; check its answers or re-export the"
                    + " survey as UTF-8 CSV"));
      }
      int after = next(b, end);
      text.append(new String(b, end, after - end, StandardCharsets.US_ASCII));
      start = after;
    }
    if (latinLines.isEmpty()) {
      return new Decoded(text.toString(), "UTF-8", true, List.copyOf(damaged));
    }
    // The lines named are those of the minority encoding: the ones decoded unlike the rest.
    boolean mostlyUtf8 = utf8Lines.size() >= latinLines.size();
    List<Long> odd = mostlyUtf8 ? latinLines : utf8Lines;
    String oddAs = mostlyUtf8 ? "windows-1252" : "UTF-8";
    String restAs = mostlyUtf8 ? "UTF-8" : "windows-1252";
    List<Warning> warnings = new ArrayList<>();
    warnings.add(
        new Warning(
            0,
            "the file mixes encodings: "
                + (odd.size() == 1 ? "1 line" : odd.size() + " lines")
                + " (listed) "
                + (odd.size() == 1 ? "was" : "were")
                + " read as "
                + oddAs
                + ", the rest as "
                + restAs
                + "; check them, or re-export the survey as UTF-8 CSV"));
    for (long l : odd) {
      warnings.add(
          new Warning(
              l,
              mostlyUtf8
                  ? "this line is not valid UTF-8 and was read as windows-1252; check its answers"
                  : "this line is valid UTF-8 and was read as UTF-8, unlike most of the file;"
                      + " check its answers"));
    }
    warnings.addAll(damaged);
    return new Decoded(
        text.toString(),
        mostlyUtf8 ? MIXED : "windows-1252 and UTF-8 (line by line)",
        true,
        List.copyOf(warnings));
  }

  /** Where the line starting at {@code start} ends: its CR or LF, or the end of the bytes. */
  private static int lineEnd(byte[] b, int start) {
    int i = start;
    while (i < b.length && b[i] != '\n' && b[i] != '\r') {
      i++;
    }
    return i;
  }

  /** Where the next line starts, after the line end at {@code end} (CR LF, CR or LF). */
  private static int next(byte[] b, int end) {
    if (end >= b.length) {
      return b.length;
    }
    return b[end] == '\r' && end + 1 < b.length && b[end + 1] == '\n' ? end + 2 : end + 1;
  }

  /**
   * Finds lines that read like UTF-8 text decoded as windows-1252 once already: {@code Ã} or {@code
   * Â} followed by a character windows-1252 gives a continuation byte ({@code Ã©} for {@code é},
   * {@code Â°} for {@code °}), or {@code â} followed by two ({@code â€™} for {@code ’}). These
   * pairs hardly occur in real text. One warning per line, naming the first pair and what it stood
   * for.
   */
  static List<Warning> doubleEncoded(String text) {
    List<Warning> out = new ArrayList<>();
    long line = 1;
    long warned = 0;
    for (int i = 0; i < text.length(); i++) {
      char c = text.charAt(i);
      if (c == '\n' || (c == '\r' && (i + 1 == text.length() || text.charAt(i + 1) != '\n'))) {
        line++;
        continue;
      }
      int len = c == '\u00C3' || c == '\u00C2' ? 2 : c == '\u00E2' ? 3 : 0;
      if (len == 0 || line == warned || i + len > text.length()) {
        continue;
      }
      boolean all = true;
      for (int k = 1; k < len && all; k++) {
        all = CONTINUATIONS.indexOf(text.charAt(i + k)) >= 0;
      }
      if (!all) {
        continue;
      }
      String seen = text.substring(i, i + len);
      String meant = new String(seen.getBytes(WINDOWS_1252), StandardCharsets.UTF_8);
      out.add(
          new Warning(
              line,
              "this line reads like UTF-8 text that was decoded as windows-1252 before it was"
                  + " exported (\""
                  + seen
                  + "\" where \""
                  + meant
                  + "\" was meant); its answers are kept as they are: fix them at the source and"
                  + " import again"));
      warned = line;
    }
    return out;
  }

  private static Decoded decodeAs(byte[] b, Charset cs) {
    List<Warning> warnings = new ArrayList<>();
    String text = tryStrict(b, 0, cs);
    boolean replaced = text == null;
    if (replaced) {
      text = new String(b, cs);
    }
    String label = cs.name();
    boolean bom =
        startsWith(b, 0xEF, 0xBB, 0xBF) || startsWith(b, 0xFF, 0xFE) || startsWith(b, 0xFE, 0xFF);
    if (!text.isEmpty() && text.charAt(0) == '\uFEFF') {
      text = text.substring(1);
      label += " (BOM)";
    } else if (bom && cs.name().equals("UTF-16")) {
      label += " (BOM)"; // Java's UTF-16 decoder consumes the mark itself
    } else if (bom) {
      warnings.add(
          new Warning(
              1,
              "the file starts with the byte-order mark of another encoding than "
                  + cs.name()
                  + "; if the header looks garbled, set the encoding to auto"));
    }
    if (replaced) {
      warnings.add(
          new Warning(
              TableParser.lineOf(text, text.indexOf('\uFFFD')),
              "some bytes are not valid "
                  + cs.name()
                  + " and show as \uFFFD; check the encoding, or set it to auto"));
    }
    return new Decoded(text, label, false, List.copyOf(warnings));
  }

  /**
   * Counts well-formed multi-byte UTF-8 sequences ([0]) and bytes that belong to none ([1]),
   * between {@code from} and {@code to}, following the well-formed byte sequences table of the
   * Unicode Standard, section 3.9.
   */
  static long[] utf8Counts(byte[] b, int from, int to) {
    long valid = 0;
    long invalid = 0;
    int i = from;
    while (i < to) {
      int c = b[i] & 0xFF;
      if (c < 0x80) {
        i++;
        continue;
      }
      int len;
      int lo = 0x80;
      int hi = 0xBF;
      if (c >= 0xC2 && c <= 0xDF) {
        len = 2;
      } else if (c >= 0xE0 && c <= 0xEF) {
        len = 3;
        lo = c == 0xE0 ? 0xA0 : 0x80;
        hi = c == 0xED ? 0x9F : 0xBF;
      } else if (c >= 0xF0 && c <= 0xF4) {
        len = 4;
        lo = c == 0xF0 ? 0x90 : 0x80;
        hi = c == 0xF4 ? 0x8F : 0xBF;
      } else {
        invalid++;
        i++;
        continue;
      }
      boolean ok = i + len <= to;
      for (int k = 1; ok && k < len; k++) {
        int t = b[i + k] & 0xFF;
        ok = k == 1 ? t >= lo && t <= hi : t >= 0x80 && t <= 0xBF;
      }
      if (ok) {
        valid++;
        i += len;
      } else {
        invalid++;
        i++;
      }
    }
    return new long[] {valid, invalid};
  }

  /** Returns UTF-16LE or UTF-16BE when the NUL pattern is unmistakable, else null. */
  static Charset utf16WithoutBom(byte[] b) {
    int pairs = Math.min(b.length, UTF16_SAMPLE) / 2;
    if (pairs < 2) {
      return null;
    }
    int evenNul = 0;
    int oddNul = 0;
    for (int i = 0; i < pairs; i++) {
      if (b[2 * i] == 0) {
        evenNul++;
      }
      if (b[2 * i + 1] == 0) {
        oddNul++;
      }
    }
    if (oddNul * 2 >= pairs && evenNul * 50 <= pairs) {
      return StandardCharsets.UTF_16LE;
    }
    if (evenNul * 2 >= pairs && oddNul * 50 <= pairs) {
      return StandardCharsets.UTF_16BE;
    }
    return null;
  }

  private static String binarySignature(byte[] b) {
    if (startsWith(b, 'P', 'K', 3, 4)) {
      return "a zip archive, such as an .xlsx workbook";
    }
    if (startsWith(b, 0xD0, 0xCF, 0x11, 0xE0)) {
      return "an old .xls workbook";
    }
    if (startsWith(b, '%', 'P', 'D', 'F', '-')) {
      return "a PDF document";
    }
    if (startsWith(b, 0x1F, 0x8B)) {
      return "a gzip archive";
    }
    return null;
  }

  /** Decodes after a byte-order mark; invalid bytes become U+FFFD and are reported. */
  private static Decoded marked(byte[] b, int offset, Charset cs, String label) {
    String text = tryStrict(b, offset, cs);
    if (text != null) {
      return new Decoded(text, label, true, List.of());
    }
    String replaced = new String(b, offset, b.length - offset, cs);
    return new Decoded(
        replaced,
        label,
        true,
        List.of(
            new Warning(
                TableParser.lineOf(replaced, replaced.indexOf('\uFFFD')),
                "the file starts with a "
                    + cs.name()
                    + " byte-order mark, but some bytes are not valid "
                    + cs.name()
                    + " and show as \uFFFD; re-export the survey as UTF-8 CSV")));
  }

  private static String tryStrict(byte[] b, int offset, Charset cs) {
    CharsetDecoder decoder =
        cs.newDecoder()
            .onMalformedInput(CodingErrorAction.REPORT)
            .onUnmappableCharacter(CodingErrorAction.REPORT);
    try {
      CharBuffer chars = decoder.decode(ByteBuffer.wrap(b, offset, b.length - offset));
      return chars.toString();
    } catch (CharacterCodingException e) {
      return null;
    }
  }

  private static boolean startsWith(byte[] b, int... prefix) {
    if (b.length < prefix.length) {
      return false;
    }
    for (int i = 0; i < prefix.length; i++) {
      if ((b[i] & 0xFF) != prefix[i]) {
        return false;
      }
    }
    return true;
  }
}
