package riffle.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
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
  void keepsUtf8WhenOnlyAFewBytesAreDamaged() throws BadInput {
    String good = "id,answer\n" + "1,Café crème, très bon — merci\n".repeat(10);
    byte[] b = concat(good.getBytes(StandardCharsets.UTF_8), "2,caf\u00e9\n".getBytes(CP1252));
    EncodingSniffer.Decoded d = sniff(b);
    assertEquals("UTF-8", d.label());
    assertTrue(d.text().startsWith(good));
    assertTrue(d.text().contains("caf\uFFFD"));
    assertEquals(1, d.warnings().size());
    assertTrue(d.warnings().get(0).startsWith("1 byte is not valid UTF-8"), d.warnings().get(0));
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
    assertTrue(d.warnings().get(0).contains("not valid UTF-8"), d.warnings().get(0));

    byte[] b =
        concat(
            new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF},
            TEXT.getBytes(StandardCharsets.UTF_8));
    EncodingSniffer.Decoded foreign = EncodingSniffer.decode(b, Optional.of(CP1252));
    assertTrue(
        foreign.warnings().get(0).contains("byte-order mark"), foreign.warnings().toString());
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
    assertEquals(2, EncodingSniffer.utf8Counts("é€".getBytes(StandardCharsets.UTF_8))[0]);
    long[] counts =
        EncodingSniffer.utf8Counts(
            new byte[] {
              (byte) 0xC3, (byte) 0xA9, (byte) 0xE9, 'a', (byte) 0xED, (byte) 0xA0, (byte) 0x80
            });
    assertEquals(1, counts[0]);
    assertEquals(4, counts[1]);
  }
}
