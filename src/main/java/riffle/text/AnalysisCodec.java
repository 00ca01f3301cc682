package riffle.text;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import riffle.model.Chunk;
import riffle.model.Sentence;
import riffle.model.Token;

/**
 * A compact binary form of an answer's sentences, for the analysis cache. Token and chunk texts are
 * not stored: they are cut from the masked text on reading.
 */
public final class AnalysisCodec {
  /** Bump when the form or the pipeline's output changes: cached analyses are then redone. */
  public static final String VERSION = "text-1";

  private static final int FORMAT = 1;

  private AnalysisCodec() {}

  /** Encodes sentences whose offsets are into {@code masked}. */
  public static byte[] encode(List<Sentence> sentences) {
    ByteArrayOutputStream bytes = new ByteArrayOutputStream(64 + 24 * sentences.size());
    try (DataOutputStream out = new DataOutputStream(bytes)) {
      out.writeByte(FORMAT);
      out.writeShort(sentences.size());
      for (Sentence s : sentences) {
        out.writeInt(s.start());
        out.writeInt(s.end());
        out.writeShort(s.tokens().size());
        for (Token t : s.tokens()) {
          out.writeShort(t.start() - s.start());
          out.writeShort(t.end() - s.start());
          out.writeUTF(t.pos());
          out.writeUTF(t.stem());
          out.writeBoolean(t.negated());
        }
        out.writeShort(s.chunks().size());
        for (Chunk c : s.chunks()) {
          out.writeUTF(c.type());
          out.writeShort(c.start() - s.start());
          out.writeShort(c.end() - s.start());
        }
      }
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return bytes.toByteArray();
  }

  /**
   * Decodes what {@link #encode} wrote for {@code masked}; empty when the bytes do not fit the text
   * (a damaged or stale cache entry), so that the caller analyses afresh.
   */
  public static Optional<List<Sentence>> decode(String masked, byte[] data) {
    try (DataInputStream in = new DataInputStream(new ByteArrayInputStream(data))) {
      if (in.readByte() != FORMAT) {
        return Optional.empty();
      }
      int count = in.readUnsignedShort();
      List<Sentence> sentences = new ArrayList<>(count);
      for (int i = 0; i < count; i++) {
        int start = in.readInt();
        int end = in.readInt();
        int tokens = in.readUnsignedShort();
        List<Token> ts = new ArrayList<>(tokens);
        for (int t = 0; t < tokens; t++) {
          int s = start + in.readUnsignedShort();
          int e = start + in.readUnsignedShort();
          ts.add(
              new Token(
                  masked.substring(s, e), s, e, in.readUTF(), in.readUTF(), in.readBoolean()));
        }
        int chunks = in.readUnsignedShort();
        List<Chunk> cs = new ArrayList<>(chunks);
        for (int c = 0; c < chunks; c++) {
          String type = in.readUTF();
          int s = start + in.readUnsignedShort();
          int e = start + in.readUnsignedShort();
          cs.add(new Chunk(type, masked.substring(s, e), s, e));
        }
        sentences.add(new Sentence(masked.substring(start, end), start, end, ts, cs));
      }
      return in.read() == -1 ? Optional.of(sentences) : Optional.empty();
    } catch (IOException | IndexOutOfBoundsException e) {
      return Optional.empty();
    }
  }
}
