package riffle.model;

/** How an assignment came about. */
public enum Origin {
  /** Coded by a person, by hand. */
  MANUAL,
  /** Made by one of the code's saved rules. */
  RULE,
  /** Read from a codes column of an export coded elsewhere. */
  IMPORTED,
  /** A learned suggestion that an analyst accepted. */
  SUGGESTION;

  /** Whether a person decided it (by hand here, or elsewhere before the import). */
  public boolean human() {
    return this == MANUAL || this == IMPORTED;
  }
}
