package riffle.model;

import java.util.Objects;
import java.util.Set;

/**
 * One answer as a human coded it: the ground truth suggestions learn from and are measured on.
 *
 * <p>Only codes a person decided count: assigned by hand or imported from a file coded elsewhere,
 * never an accepted suggestion or a rule's assignment (learning from them would let the engine
 * grade its own work). An answer the coder saw and left without codes is an example with no codes.
 *
 * @param answerId the answer's id
 * @param respondent a key unique per respondent (such as wave and the export's id); answers of one
 *     respondent always fall in the same cross-validation fold
 * @param analysis the answer's analysis
 * @param codes the ids of the codes the human gave it, possibly none
 */
public record CodedExample(long answerId, String respondent, Analysis analysis, Set<Long> codes) {
  /** Checks the components and copies the codes. */
  public CodedExample {
    Objects.requireNonNull(respondent, "respondent");
    Objects.requireNonNull(analysis, "analysis");
    codes = Set.copyOf(Objects.requireNonNull(codes, "codes"));
  }
}
