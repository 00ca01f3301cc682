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
 * a NUL on one side and at most 2% on the other); else strict UTF-8; else UTF-8 with the stray
 * bytes replaced (and a warning) when well-formed multi-byte sequences outnumber stray bytes four
 * to one; else windows-1252. NUL bytes not explained by UTF-16, well-known binary signatures
 * (zip/xlsx, xls, pdf, gzip) or more than 5% control characters in the first 64 Ki characters mean
 * a binary file. An explicit encoding skips sniffing; a byte-order mark matching it is still
 * stripped.
 */
final class EncodingSniffer {
  /** Decoded text and how it was obtained. */
  record Decoded(String text, String label, boolean detected, List<String> warnings) {}

  static final String BINARY =
      "looks like a binary file, not a CSV/TSV export; export the survey as CSV";

  private static final Charset WINDOWS_1252 = Charset.forName("windows-1252");
  private static final int UTF16_SAMPLE = 4096;
  private static final int BINARY_SAMPLE = 65536;
  private static final double CONTROL_SHARE = 0.05;

  /**
   * A file whose well-formed UTF-8 sequences outnumber its stray bytes this many times is UTF-8
   * with a few damaged answers, not windows-1252.
   */
  private static final int MOSTLY_UTF8 = 4;

  private EncodingSniffer() {}

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
            BINARY
                + " (it holds NUL bytes; if it is a UTF-16 text export, use --encoding UTF-16LE"
                + " or UTF-16BE)");
      }
    }
    String utf8 = tryStrict(b, 0, StandardCharsets.UTF_8);
    if (utf8 != null) {
      return new Decoded(utf8, "UTF-8", true, List.of());
    }
    long[] counts = utf8Counts(b);
    if (counts[0] > 0 && counts[0] >= MOSTLY_UTF8 * counts[1]) {
      return new Decoded(
          new String(b, StandardCharsets.UTF_8),
          "UTF-8",
          true,
          List.of(
              (counts[1] == 1 ? "1 byte is" : counts[1] + " bytes are")
                  + " not valid UTF-8 and show as \uFFFD (the file mixes encodings);"
                  + " check those answers or re-export the survey as UTF-8 CSV"));
    }
    return new Decoded(new String(b, WINDOWS_1252), "windows-1252", true, List.of());
  }

  private static Decoded decodeAs(byte[] b, Charset cs) {
    List<String> warnings = new ArrayList<>();
    String text = tryStrict(b, 0, cs);
    if (text == null) {
      text = new String(b, cs);
      warnings.add(
          "some bytes are not valid "
              + cs.name()
              + " and show as \uFFFD; check the --encoding option or use --encoding auto");
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
          "the file starts with the byte-order mark of another encoding than "
              + cs.name()
              + "; if the header looks garbled, use --encoding auto");
    }
    return new Decoded(text, label, false, List.copyOf(warnings));
  }

  /**
   * Counts well-formed multi-byte UTF-8 sequences ([0]) and bytes that belong to none ([1]),
   * following the well-formed byte sequences table of the Unicode Standard, section 3.9.
   */
  static long[] utf8Counts(byte[] b) {
    long valid = 0;
    long invalid = 0;
    int i = 0;
    while (i < b.length) {
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
      boolean ok = i + len <= b.length;
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
    return new Decoded(
        new String(b, offset, b.length - offset, cs),
        label,
        true,
        List.of(
            "the file starts with a "
                + cs.name()
                + " byte-order mark, but some bytes are not valid "
                + cs.name()
                + " and show as \uFFFD; re-export the survey as UTF-8 CSV"));
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
