package riffle.app;

import java.util.List;
import java.util.Optional;
import riffle.coding.Codebook;
import riffle.coding.CodebookFile;
import riffle.coding.CodebookFile.Format;
import riffle.model.Code;
import riffle.model.CodeDraft;
import riffle.model.EditOutcome;
import riffle.model.InputException;
import riffle.model.InputProblem;
import riffle.store.ProjectStore;

/**
 * Brings a codebook file into a project in one edit: codes it names are updated, new ones created,
 * themes set in a second pass once every code exists; codes it does not name are left as they are.
 * All or nothing: the first bad row stops the whole file, named by its line.
 */
final class CodebookImport {
  private CodebookImport() {}

  /** Brings in {@code bytes}, the contents of the file named {@code source}. */
  static EditOutcome run(ProjectStore store, String coder, String source, byte[] bytes)
      throws InputException {
    List<CodebookFile.Row> rows = CodebookFile.read(source, bytes, Format.of(source));
    InputException[] failed = new InputException[1];
    try {
      return store.edit(
          coder,
          "import-codebook",
          e -> {
            int created = 0;
            int changed = 0;
            for (int pass = 0; pass < 2; pass++) {
              for (CodebookFile.Row r : rows) {
                CodeDraft d = r.draft();
                CodeDraft fields =
                    pass == 0
                        ? new CodeDraft(
                            d.name(),
                            d.description(),
                            d.include(),
                            d.exclude(),
                            d.colour(),
                            d.key(),
                            Optional.empty(),
                            d.direction())
                        : new CodeDraft(
                            Optional.empty(),
                            Optional.empty(),
                            Optional.empty(),
                            Optional.empty(),
                            Optional.empty(),
                            Optional.empty(),
                            d.parent(),
                            Optional.empty());
                try {
                  List<Code> book = e.codes();
                  Optional<Code> have = Codebook.find(book, d.name().orElseThrow());
                  if (have.isEmpty()) {
                    e.putCode(
                        Codebook.create(book, fields, e.newCodeId()).toBuilder()
                            .archived(r.archived())
                            .build());
                    created++;
                  } else {
                    Code next = Codebook.change(book, have.get(), fields);
                    if (pass == 0) {
                      next = next.toBuilder().archived(r.archived()).build();
                    }
                    if (!next.equals(have.get())) {
                      e.putCode(next);
                      changed += pass == 0 ? 1 : 0;
                    }
                  }
                } catch (InputException bad) {
                  failed[0] =
                      new InputException(new InputProblem(source, r.line(), 0, bad.getMessage()));
                  throw bad;
                }
              }
            }
            e.note("file", source);
            return "Brought in "
                + source
                + ": "
                + created
                + " code(s) created, "
                + changed
                + " changed.";
          });
    } catch (InputException bad) {
      if (failed[0] != null) {
        throw failed[0];
      }
      throw bad;
    }
  }
}
