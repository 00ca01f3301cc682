package riffle.model;

import java.util.Objects;

/**
 * One piece of personal data found in an answer and masked.
 *
 * @param type what it is
 * @param start first character in the analysed (NFC) text
 * @param end one past the last character in the analysed text
 * @param maskedStart where its placeholder starts in the masked text
 * @param maskedEnd one past the placeholder's end in the masked text
 */
public record PiiMask(PiiType type, int start, int end, int maskedStart, int maskedEnd) {
  public PiiMask {
    Objects.requireNonNull(type, "type");
    if (start < 0 || end <= start || maskedStart < 0 || maskedEnd <= maskedStart) {
      throw new IllegalArgumentException("bad mask offsets " + start + ".." + end);
    }
  }
}
