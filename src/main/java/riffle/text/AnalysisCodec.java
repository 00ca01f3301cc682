package riffle.text;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
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
  public static final String VERSION = "text-3";

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
    return decoder().decode(masked, data);
  }

  /** A decoder for many entries in a row; it shares equal tags and stems between them. */
  public static Decoder decoder() {
    return new Decoder();
  }

  /**
   * Decodes cache entries, reading the bytes in place and sharing one instance of each short string
   * (tags, chunk types, stems) across the entries it decodes, which keeps a large read light on
   * memory and makes later look-ups of those strings cheap. Not thread-safe: one per thread.
   */
  public static final class Decoder {
    private static final int MAX_SHARED = 1 << 18;

    private String[] shared = new String[1 << 10];
    private int sharedCount;
    private byte[] data;
    private int at;

    private Decoder() {}

    /** As {@link AnalysisCodec#decode}. */
    public Optional<List<Sentence>> decode(String masked, byte[] bytes) {
      data = bytes;
      at = 0;
      try {
        if (u8() != FORMAT) {
          return Optional.empty();
        }
        int count = u16();
        List<Sentence> sentences = new ArrayList<>(count);
        for (int i = 0; i < count; i++) {
          int start = s32();
          int end = s32();
          int tokens = u16();
          List<Token> ts = new ArrayList<>(tokens);
          for (int t = 0; t < tokens; t++) {
            int s = start + u16();
            int e = start + u16();
            String pos = utf();
            String stem = utf();
            ts.add(new Token(text(masked, s, e), s, e, pos, stem, u8() != 0));
          }
          int chunks = u16();
          List<Chunk> cs = new ArrayList<>(chunks);
          for (int c = 0; c < chunks; c++) {
            String type = utf();
            int s = start + u16();
            int e = start + u16();
            cs.add(new Chunk(type, text(masked, s, e), s, e));
          }
          sentences.add(new Sentence(text(masked, start, end), start, end, ts, cs));
        }
        return at == data.length ? Optional.of(sentences) : Optional.empty();
      } catch (IOException | RuntimeException e) {
        // IndexOutOfBounds from a short entry or an offset beyond the text, or an
        // IllegalArgumentException from a record: the entry does not fit and is redone.
        return Optional.empty();
      } finally {
        data = null;
      }
    }

    private int u8() {
      return data[at++] & 0xFF;
    }

    private int u16() {
      int v = ((data[at] & 0xFF) << 8) | (data[at + 1] & 0xFF);
      at += 2;
      return v;
    }

    private int s32() {
      return (u16() << 16) | u16();
    }

    /** A string as {@code DataOutputStream.writeUTF} wrote it (modified UTF-8). */
    private String utf() throws IOException {
      int length = u16();
      int from = at;
      int end = from + length;
      if (end > data.length) {
        throw new IOException("entry ends inside a string");
      }
      int hash = 0;
      for (int i = from; i < end; i++) {
        byte b = data[i];
        if (b < 0) {
          at = end;
          return new DataInputStream(new ByteArrayInputStream(data, from - 2, length + 2))
              .readUTF();
        }
        hash = 31 * hash + b;
      }
      at = end;
      return shared(from, length, hash);
    }

    /** The shared instance of an ASCII string; {@code hash} equals its {@code hashCode()}. */
    private String shared(int from, int length, int hash) {
      int mask = shared.length - 1;
      int slot = (hash ^ (hash >>> 16)) & mask;
      for (String s = shared[slot]; s != null; s = shared[slot]) {
        if (s.hashCode() == hash && s.length() == length && same(s, from)) {
          return s;
        }
        slot = (slot + 1) & mask;
      }
      String fresh = new String(data, from, length, StandardCharsets.ISO_8859_1);
      if (sharedCount < MAX_SHARED) {
        shared[slot] = fresh;
        if (++sharedCount * 2 > shared.length) {
          grow();
        }
      }
      return fresh;
    }

    /** The shared instance of {@code masked.substring(from, to)}. */
    private String text(String masked, int from, int to) {
      if (from < 0 || to > masked.length() || from > to) {
        throw new IndexOutOfBoundsException("offsets " + from + ".." + to + " outside the text");
      }
      if (to - from == masked.length()) {
        return masked;
      }
      int hash = 0;
      for (int i = from; i < to; i++) {
        hash = 31 * hash + masked.charAt(i);
      }
      int length = to - from;
      int mask = shared.length - 1;
      int slot = (hash ^ (hash >>> 16)) & mask;
      for (String s = shared[slot]; s != null; s = shared[slot]) {
        if (s.hashCode() == hash
            && s.length() == length
            && masked.regionMatches(from, s, 0, length)) {
          return s;
        }
        slot = (slot + 1) & mask;
      }
      String fresh = masked.substring(from, to);
      if (sharedCount < MAX_SHARED) {
        shared[slot] = fresh;
        if (++sharedCount * 2 > shared.length) {
          grow();
        }
      }
      return fresh;
    }

    private boolean same(String s, int from) {
      for (int i = 0; i < s.length(); i++) {
        if (s.charAt(i) != data[from + i]) {
          return false;
        }
      }
      return true;
    }

    private void grow() {
      String[] old = shared;
      shared = new String[old.length * 2];
      int mask = shared.length - 1;
      for (String s : old) {
        if (s != null) {
          int h = s.hashCode();
          int slot = (h ^ (h >>> 16)) & mask;
          while (shared[slot] != null) {
            slot = (slot + 1) & mask;
          }
          shared[slot] = s;
        }
      }
    }
  }
}
