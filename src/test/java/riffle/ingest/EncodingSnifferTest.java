package riffle.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

class EncodingSnifferTest {
  private static final String TEXT = "id,answer\n1,Le café coûte 180 € — c’est honnête\n";
  private static final Charset CP1252 = Charset.forName("windows-1252");

  private static byte[] concat(byte[] a, byte[] b) {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    out.writeBytes(a);
    out.writeBytes(b);
    return out.toByteArray();
  }

  private static EncodingSniffer.Decoded sniff(byte[] b) throws BadInput {
    return EncodingSniffer.decode(b, Optional.empty());
  }

  @Test
  void detectsUtf8WithoutBom() throws BadInput {
    EncodingSniffer.Decoded d = sniff(TEXT.getBytes(StandardCharsets.UTF_8));
    assertEquals("UTF-8", d.label());
    assertEquals(TEXT, d.text());
    assertTrue(d.detected());
  }

  @Test
  void detectsUtf8BomAndStripsIt() throws BadInput {
    byte[] b =
        concat(
            new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF},
            TEXT.getBytes(StandardCharsets.UTF_8));
    EncodingSniffer.Decoded d = sniff(b);
    assertEquals("UTF-8 (BOM)", d.label());
    assertEquals(TEXT, d.text());
  }

  @Test
  void detectsUtf16WithEitherBom() throws BadInput {
    byte[] le =
        concat(new byte[] {(byte) 0xFF, (byte) 0xFE}, TEXT.getBytes(StandardCharsets.UTF_16LE));
    byte[] be =
        concat(new byte[] {(byte) 0xFE, (byte) 0xFF}, TEXT.getBytes(StandardCharsets.UTF_16BE));
    assertEquals("UTF-16LE (BOM)", sniff(le).label());
    assertEquals(TEXT, sniff(le).text());
    assertEquals("UTF-16BE (BOM)", sniff(be).label());
    assertEquals(TEXT, sniff(be).text());
  }

  @Test
  void detectsUtf16WithoutBomFromTheNulPattern() throws BadInput {
    assertEquals("UTF-16LE", sniff(TEXT.getBytes(StandardCharsets.UTF_16LE)).label());
    assertEquals("UTF-16BE", sniff(TEXT.getBytes(StandardCharsets.UTF_16BE)).label());
    assertEquals(TEXT, sniff(TEXT.getBytes(StandardCharsets.UTF_16BE)).text());
  }

  @Test
  void fallsBackToWindows1252WhenBytesAreNotUtf8() throws BadInput {
    EncodingSniffer.Decoded d = sniff(TEXT.getBytes(CP1252));
    assertEquals("windows-1252", d.label());
    assertEquals(TEXT, d.text());
    assertTrue(d.warnings().isEmpty());
  }

  @Test
  void aUtf8FileWithWindows1252LinesIsDecodedLineByLine() throws BadInput {
    // Mostly English UTF-8 (one accent a line) with two French windows-1252 lines full of
    // accents: stray bytes outnumber UTF-8 sequences, and reading the whole file as windows-1252
    // would turn every UTF-8 line into mojibake ("CafÃ©").
    String utf8 = "id,answer\r\n" + "1,Caf\u00e9 was fine\r\n".repeat(3);
    String latin = "2,Le d\u00e9lai \u00e9tait long, tr\u00e8s d\u00e9cevant, d\u00e9j\u00e0\r\n";
    byte[] b =
        concat(
            concat(utf8.getBytes(StandardCharsets.UTF_8), latin.repeat(2).getBytes(CP1252)),
            "3,\u00fcber gut\n".getBytes(StandardCharsets.UTF_8));
    long[] counts = EncodingSniffer.utf8Counts(b, 0, b.length);
    assertTrue(counts[1] > counts[0], "more stray bytes than UTF-8 sequences");
    EncodingSniffer.Decoded d = sniff(b);
    assertEquals(EncodingSniffer.MIXED, d.label());
    assertEquals(utf8 + latin + latin + "3,\u00fcber gut\n", d.text());
    assertEquals(3, d.warnings().size(), d.warnings().toString());
    assertEquals(0, d.warnings().get(0).line());
    assertTrue(
        d.warnings().get(0).message().contains("2 lines (listed) were read as windows-1252"),
        d.warnings().get(0).message());
    assertEquals(5, d.warnings().get(1).line());
    assertEquals(6, d.warnings().get(2).line());
    assertTrue(d.warnings().get(1).message().contains("read as windows-1252"));
  }

  @Test
  void aMostlyWindows1252FileNamesItsFewUtf8Lines() throws BadInput {
    String latin = "1,Tr\u00e8s bon caf\u00e9, livr\u00e9 \u00e0 temps\n";
    byte[] b =
        concat(
            ("id,answer\n" + latin.repeat(4)).getBytes(CP1252),
            "2,Sch\u00f6ne M\u00fchle\n".getBytes(StandardCharsets.UTF_8));
    EncodingSniffer.Decoded d = sniff(b);
    assertEquals("windows-1252 and UTF-8 (line by line)", d.label());
    assertEquals("id,answer\n" + latin.repeat(4) + "2,Sch\u00f6ne M\u00fchle\n", d.text());
    assertEquals(2, d.warnings().size(), d.warnings().toString());
    assertTrue(d.warnings().get(0).message().contains("1 line (listed) was read as UTF-8"));
    assertEquals(6, d.warnings().get(1).line());
    assertTrue(d.warnings().get(1).message().contains("unlike most of the file"));
  }

  @Test
  void aDamagedUtf8LineKeepsItsUtf8AndShowsTheStrayByte() throws BadInput {
    String good = "id,answer\n" + "1,Caf\u00e9 cr\u00e8me, tr\u00e8s bon\n".repeat(3);
    byte[] damaged =
        concat("2,cr\u00e8me ".getBytes(StandardCharsets.UTF_8), new byte[] {(byte) 0xE9, '\n'});
    EncodingSniffer.Decoded d = sniff(concat(good.getBytes(StandardCharsets.UTF_8), damaged));
    assertEquals("UTF-8", d.label(), "no line was read as windows-1252");
    assertEquals(good + "2,cr\u00e8me \uFFFD\n", d.text());
    assertEquals(1, d.warnings().size());
    assertEquals(5, d.warnings().get(0).line());
    assertTrue(d.warnings().get(0).message().startsWith("1 byte on this line is not valid UTF-8"));
  }

  @Test
  void lineNumbersFollowCrLfCrAndLf() throws BadInput {
    byte[] b =
        concat(
            "id,a\r1,\u00e9t\u00e9\r\n2,ok\n".getBytes(StandardCharsets.UTF_8),
            "3,\u00e9t\u00e9\r".getBytes(CP1252));
    EncodingSniffer.Decoded d = sniff(b);
    assertEquals("id,a\r1,\u00e9t\u00e9\r\n2,ok\n3,\u00e9t\u00e9\r", d.text());
    assertEquals(4, d.warnings().get(1).line());
  }

  @Test
  void textDecodedTwiceIsNamedByLine() {
    String text =
        "id,a\n1,Caf\u00c3\u00a9 cr\u00c3\u00a8me\n2,plain\n3,it\u00e2\u20ac\u2122s\n4,S\u00c3O PAULO\n";
    List<EncodingSniffer.Warning> w = EncodingSniffer.doubleEncoded(text);
    assertEquals(2, w.size(), w.toString());
    assertEquals(2, w.get(0).line());
    assertTrue(
        w.get(0).message().contains("\"\u00c3\u00a9\" where \"\u00e9\" was meant"),
        w.get(0).message());
    assertEquals(4, w.get(1).line());
    assertTrue(w.get(1).message().contains("\"\u2019\" was meant"), w.get(1).message());
  }

  @Test
  void explicitEncodingOverridesSniffingAndStillStripsItsBom() throws BadInput {
    byte[] b =
        concat(
            new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF},
            TEXT.getBytes(StandardCharsets.UTF_8));
    EncodingSniffer.Decoded d = EncodingSniffer.decode(b, Optional.of(StandardCharsets.UTF_8));
    assertEquals("UTF-8 (BOM)", d.label());
    assertEquals(TEXT, d.text());
    assertFalse(d.detected());

    EncodingSniffer.Decoded asLatin =
        EncodingSniffer.decode(TEXT.getBytes(StandardCharsets.UTF_8), Optional.of(CP1252));
    assertEquals("windows-1252", asLatin.label());
    assertTrue(asLatin.text().contains("cafÃ©"), asLatin.text());

    byte[] le =
        concat(new byte[] {(byte) 0xFF, (byte) 0xFE}, TEXT.getBytes(StandardCharsets.UTF_16LE));
    EncodingSniffer.Decoded utf16 =
        EncodingSniffer.decode(le, Optional.of(Charset.forName("UTF-16")));
    assertEquals("UTF-16 (BOM)", utf16.label());
    assertEquals(TEXT, utf16.text());
  }

  @Test
  void explicitEncodingWarnsAboutBytesItCannotDecodeAndForeignBoms() throws BadInput {
    EncodingSniffer.Decoded d =
        EncodingSniffer.decode(TEXT.getBytes(CP1252), Optional.of(StandardCharsets.UTF_8));
    assertEquals(1, d.warnings().size());
    assertTrue(d.warnings().get(0).message().contains("not valid UTF-8"), d.warnings().toString());

    byte[] b =
        concat(
            new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF},
            TEXT.getBytes(StandardCharsets.UTF_8));
    EncodingSniffer.Decoded foreign = EncodingSniffer.decode(b, Optional.of(CP1252));
    assertTrue(
        foreign.warnings().get(0).message().contains("byte-order mark"),
        foreign.warnings().toString());
  }

  @Test
  void rejectsEmptyAndBlankInput() {
    for (byte[] b :
        new byte[][] {
          {}, {' ', '\n', '\t'}, {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF}, {(byte) 0xFF, (byte) 0xFE}
        }) {
      BadInput e = assertThrows(BadInput.class, () -> sniff(b));
      assertEquals("file is empty", e.getMessage());
    }
  }

  @Test
  void rejectsBinaryFiles() {
    byte[] nul = "id,answer\n1,fine\0\0\1 more\n".getBytes(StandardCharsets.UTF_8);
    byte[] zip = {'P', 'K', 3, 4, 20, 0, 6, 0, 8, 0};
    byte[] pdf = "%PDF-1.7\n%\u00e2\u00e3".getBytes(StandardCharsets.ISO_8859_1);
    byte[] controls = new byte[200];
    for (int i = 0; i < controls.length; i++) {
      controls[i] = (byte) (i % 3 == 0 ? 'a' : 1 + i % 30);
    }
    for (byte[] b : new byte[][] {nul, zip, pdf, controls}) {
      BadInput e = assertThrows(BadInput.class, () -> sniff(b));
      assertTrue(e.getMessage().startsWith(EncodingSniffer.BINARY), e.getMessage());
    }
  }

  @Test
  void countsWellFormedAndStrayUtf8Bytes() {
    byte[] two = "é€".getBytes(StandardCharsets.UTF_8);
    assertEquals(2, EncodingSniffer.utf8Counts(two, 0, two.length)[0]);
    byte[] mixed = {
      (byte) 0xC3, (byte) 0xA9, (byte) 0xE9, 'a', (byte) 0xED, (byte) 0xA0, (byte) 0x80
    };
    long[] counts = EncodingSniffer.utf8Counts(mixed, 0, mixed.length);
    assertEquals(1, counts[0]);
    assertEquals(4, counts[1]);
  }
}
