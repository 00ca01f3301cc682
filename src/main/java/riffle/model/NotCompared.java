package riffle.model;

import java.util.Objects;

/**
 * A comparison of a code between two waves that the findings do not make, and why: one wave has no
 * share of the code (nobody read its answers yet, or its rules did not run there), or one share is
 * over the answers people read and the other over the answers rules ran on.
 *
 * @param code the code's name
 * @param codeId the code's id in the codebook
 * @param from the earlier wave
 * @param to the later wave
 * @param reason why there is no verdict, in words
 */
public record NotCompared(String code, String codeId, String from, String to, String reason) {
  /** Checks the components. */
  public NotCompared {
    Objects.requireNonNull(code, "code");
    Objects.requireNonNull(codeId, "codeId");
    Objects.requireNonNull(from, "from");
    Objects.requireNonNull(to, "to");
    Objects.requireNonNull(reason, "reason");
  }
}
