package riffle.model;

import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * Everything one import adds to a wave, written in one transaction.
 *
 * @param wave the wave's name; created when new
 * @param fieldedOn when the wave was fielded
 * @param source the file name, or {@code "paste"}
 * @param sha256 hex digest of the input's bytes
 * @param encoding the encoding the input was read with
 * @param delimiter the delimiter's label
 * @param rows data rows read, skipped ones included
 * @param skipped rows left out (ragged or blank)
 * @param questions the open-text questions, in column order
 * @param questionNames the questions' short names, by question, for those the export names
 * @param respondents the rows, one respondent each
 * @param actor who ran the import
 * @param analysedWith the version of the text analysis that analysed the answers
 */
public record WaveBatch(
    String wave,
    LocalDate fieldedOn,
    String source,
    String sha256,
    String encoding,
    String delimiter,
    int rows,
    int skipped,
    List<String> questions,
    Map<String, String> questionNames,
    List<NewRespondent> respondents,
    String actor,
    String analysedWith) {
  public WaveBatch {
    Objects.requireNonNull(wave, "wave");
    Objects.requireNonNull(fieldedOn, "fieldedOn");
    Objects.requireNonNull(source, "source");
    Objects.requireNonNull(sha256, "sha256");
    Objects.requireNonNull(encoding, "encoding");
    Objects.requireNonNull(delimiter, "delimiter");
    questions = List.copyOf(questions);
    questionNames = Map.copyOf(questionNames);
    respondents = List.copyOf(respondents);
    Objects.requireNonNull(actor, "actor");
    Objects.requireNonNull(analysedWith, "analysedWith");
  }
}
