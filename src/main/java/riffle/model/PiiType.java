package riffle.model;

import java.util.Locale;

/** Kinds of personal data masked in answers; each has a typed placeholder. */
public enum PiiType {
  /** An e-mail address. */
  EMAIL,
  /** A phone number, international or national format (ITU-T E.164 lengths). */
  PHONE,
  /** A web address. */
  URL,
  /** A payment-card-like number: 13–19 digits passing the Luhn check. */
  CARD,
  /** An order, invoice or tracking reference. */
  REFERENCE,
  /** A social-media handle such as {@code @someone}. */
  HANDLE,
  /** A person's name given by the respondent ("my name is …", "ask for …"). */
  NAME;

  /** The text that replaces the personal data in masked text, such as {@code [email]}. */
  public String placeholder() {
    return "[" + name().toLowerCase(Locale.ROOT) + "]";
  }
}
