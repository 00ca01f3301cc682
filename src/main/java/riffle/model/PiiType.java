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
  /**
   * A payment-card-like number (13–19 digits passing the Luhn check), its expiry date or its
   * security code (CVV, CVC).
   */
  CARD,
  /** An order, invoice, tracking, customer or account reference. */
  REFERENCE,
  /** A social-media handle such as {@code @someone}. */
  HANDLE,
  /** A person's name given by the respondent ("my name is …", "Regards, …"). */
  NAME,
  /** A postal address: house number and street (or a PO box), with its town and postcode. */
  ADDRESS,
  /** A postcode standing in an address or after a cue ("postcode", "zip", "PLZ"). */
  POSTCODE,
  /** A date of birth after a cue ("born", "DOB", "date of birth", "birthday"). */
  DOB,
  /** An international bank account number (ISO 13616 structure and mod-97 check). */
  IBAN,
  /** A national identity, tax or insurance number (SSN, NI number …). */
  ID,
  /** An IP address (IPv4 or IPv6). */
  IP,
  /** A network hardware (MAC) address. */
  MAC,
  /** A vehicle licence plate after a cue ("reg", "number plate", "Kennzeichen" …). */
  PLATE;

  private final String placeholder = "[" + name().toLowerCase(Locale.ROOT) + "]";

  /** The text that replaces the personal data in masked text, such as {@code [email]}. */
  public String placeholder() {
    return placeholder;
  }
}
