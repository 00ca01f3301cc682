package riffle.app;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.Set;
import riffle.coding.Codebook;
import riffle.coding.CodebookFile;
import riffle.coding.CodebookFile.Format;
import riffle.model.Assignment;
import riffle.model.Code;
import riffle.model.CodeDraft;
import riffle.model.EditOutcome;
import riffle.model.InputException;
import riffle.model.InputProblem;
import riffle.model.Rule;
import riffle.store.CodingEdit;
import riffle.store.ProjectFileException;
import riffle.store.ProjectStore;

/**
 * Changes to a project's codebook: codes created, changed, archived, deleted, moved, merged and
 * split, and codebook files brought in and written out. Every change is one edit its coder can undo
 * and redo, with a row in the audit log (see {@link Coding} for the concurrency rule).
 */
public final class CodebookEditor {
  private final ProjectStore store;
  private final AnswerSearch search;

  CodebookEditor(ProjectStore store, AnswerSearch search) {
    this.store = store;
    this.search = search;
  }

  /** The codebook, in order. */
  public List<Code> codes() throws InputException {
    return store.codes();
  }

  /** The code with this name (any case). */
  public Code code(String name) throws InputException {
    return Codebook.named(store.codes(), name);
  }

  /**
   * Adds a code.
   *
   * @throws IllegalArgumentException when the draft breaks a rule of the codebook
   */
  public Code create(String coder, CodeDraft draft) throws InputException {
    long[] id = new long[1];
    store.edit(
        coder,
        "create-code",
        e -> {
          Code made = Codebook.create(e.codes(), draft, e.newCodeId());
          e.putCode(made);
          id[0] = made.id();
          e.note("code", made.name());
          return "Created code \"" + made.name() + "\".";
        });
    return Codebook.byId(store.codes(), id[0]);
  }

  /**
   * Changes a code's name, texts, colour, key, theme or direction.
   *
   * @throws IllegalArgumentException when the result breaks a rule of the codebook
   */
  public Code change(String coder, long codeId, CodeDraft changes) throws InputException {
    store.edit(
        coder,
        "change-code",
        e -> {
          List<Code> book = e.codes();
          Code before = Codebook.byId(book, codeId);
          if (changes.parent().filter(p -> !p.isBlank()).isPresent()
              && !Codebook.children(book, codeId).isEmpty()) {
            throw new InputException(
                "\""
                    + before.name()
                    + "\" is a theme with codes under it; themes are two levels deep, so move"
                    + " its codes first");
          }
          Code after = Codebook.change(book, before, changes);
          e.putCode(after);
          e.note("code", after.name());
          return before.name().equals(after.name())
              ? "Changed code \"" + after.name() + "\"."
              : "Renamed \"" + before.name() + "\" to \"" + after.name() + "\".";
        });
    return Codebook.byId(store.codes(), codeId);
  }

  /** Sets the answers that show a code well (shown beside its guidance). */
  public EditOutcome setExamples(String coder, long codeId, List<Long> answers)
      throws InputException {
    return store.edit(
        coder,
        "code-examples",
        e -> {
          Code c = Codebook.byId(e.codes(), codeId);
          for (long a : answers) {
            Coding.answerText(e, a);
          }
          e.putCode(c.toBuilder().examples(List.copyOf(new LinkedHashSet<>(answers))).build());
          return "\""
              + c.name()
              + "\" has "
              + new LinkedHashSet<>(answers).size()
              + " example answer(s).";
        });
  }

  /** Archives a code (kept with its assignments, offered no more) or brings it back. */
  public EditOutcome archive(String coder, long codeId, boolean archived) throws InputException {
    return store.edit(
        coder,
        archived ? "archive-code" : "restore-code",
        e -> {
          Code c = Codebook.byId(e.codes(), codeId);
          e.putCode(c.toBuilder().archived(archived).build());
          return (archived ? "Archived \"" : "Brought back \"") + c.name() + "\".";
        });
  }

  /**
   * Deletes a code nobody used; a code in use is archived instead, so no assignment is lost. Its
   * own codes move to the top level.
   */
  public EditOutcome remove(String coder, long codeId) throws InputException {
    return store.edit(
        coder,
        "remove-code",
        e -> {
          List<Code> book = e.codes();
          Code c = Codebook.byId(book, codeId);
          int uses = e.assignmentsOfCode(codeId).size();
          if (uses > 0) {
            e.putCode(c.toBuilder().archived(true).build());
            return "Archived \""
                + c.name()
                + "\" instead of deleting it: "
                + uses
                + " answer(s) carry it.";
          }
          for (Code child : Codebook.children(book, codeId)) {
            e.putCode(child.toBuilder().parent(OptionalLong.empty()).build());
          }
          dropRulesAndRemovals(e, codeId);
          e.removeCode(codeId);
          return "Deleted \"" + c.name() + "\".";
        });
  }

  /** Moves a code to another place in the codebook's order (1 = first). */
  public EditOutcome reorder(String coder, long codeId, int place) throws InputException {
    return store.edit(
        coder,
        "reorder-code",
        e -> {
          List<Code> book = new ArrayList<>(e.codes());
          Code c = Codebook.byId(book, codeId);
          book.remove(c);
          book.add(Math.max(0, Math.min(book.size(), place - 1)), c);
          for (int i = 0; i < book.size(); i++) {
            if (book.get(i).position() != i + 1) {
              e.putCode(book.get(i).toBuilder().position(i + 1).build());
            }
          }
          return "Moved \"" + c.name() + "\" to place " + (book.indexOf(c) + 1) + ".";
        });
  }

  /**
   * Merges codes into one: their assignments move to the target (an answer that carries both keeps
   * one), as do their rules, examples and child codes; the merged codes are deleted.
   */
  public EditOutcome merge(String coder, Collection<Long> sources, long targetId)
      throws InputException {
    return store.edit(
        coder,
        "merge-codes",
        e -> {
          List<Code> book = e.codes();
          Code target = Codebook.byId(book, targetId);
          List<String> names = new ArrayList<>();
          int moved = 0;
          int collapsed = 0;
          Set<Long> examples = new LinkedHashSet<>(target.examples());
          Set<String> targetQueries = new HashSet<>();
          for (Rule r : e.rules()) {
            if (r.codeId() == targetId) {
              targetQueries.add(r.query());
            }
          }
          for (long sourceId : new LinkedHashSet<>(sources)) {
            if (sourceId == targetId) {
              continue;
            }
            Code source = Codebook.byId(book, sourceId);
            if (target.parent().isPresent() && target.parent().getAsLong() == sourceId) {
              throw new InputException(
                  "\""
                      + target.name()
                      + "\" is under \""
                      + source.name()
                      + "\"; merge the theme's codes into the theme instead");
            }
            List<Code> children = Codebook.children(book, sourceId);
            if (!children.isEmpty() && target.parent().isPresent()) {
              throw new InputException(
                  "\""
                      + source.name()
                      + "\" has codes under it and \""
                      + target.name()
                      + "\" is not a theme; merge into a top-level code");
            }
            for (Code child : children) {
              e.putCode(child.toBuilder().parent(OptionalLong.of(targetId)).build());
            }
            for (Assignment a : e.assignmentsOfCode(sourceId)) {
              if (e.assignment(a.answerId(), targetId).isPresent()) {
                collapsed++;
              } else {
                e.putAssignment(
                    new Assignment(
                        a.answerId(), targetId, a.span(), a.coder(), a.origin(), a.at()));
                moved++;
              }
              e.removeAssignment(a.answerId(), sourceId);
            }
            for (Rule r : e.rules()) {
              if (r.codeId() == sourceId) {
                e.removeRule(r.id());
                if (targetQueries.add(r.query())) {
                  e.putRule(new Rule(e.newRuleId(), targetId, r.query(), r.author(), r.at()));
                }
              }
            }
            examples.addAll(source.examples());
            dropRulesAndRemovals(e, sourceId);
            e.removeCode(sourceId);
            names.add("\"" + source.name() + "\"");
          }
          if (names.isEmpty()) {
            throw new InputException("name at least one code to merge into another");
          }
          e.putCode(
              Codebook.byId(e.codes(), targetId).toBuilder()
                  .examples(List.copyOf(examples))
                  .build());
          e.note("into", target.name());
          e.note("moved", moved);
          e.note("collapsed", collapsed);
          return "Merged "
              + String.join(", ", names)
              + " into \""
              + target.name()
              + "\": "
              + moved
              + " assignment(s) moved, "
              + collapsed
              + " already there.";
        });
  }

  /**
   * Splits a code: the given answers among those carrying it move to a new code beside it (same
   * theme and direction unless the draft says otherwise).
   */
  public EditOutcome split(String coder, long sourceId, CodeDraft newCode, Collection<Long> answers)
      throws InputException {
    return store.edit(
        coder,
        "split-code",
        e -> {
          List<Code> book = e.codes();
          Code source = Codebook.byId(book, sourceId);
          CodeDraft draft =
              new CodeDraft(
                  newCode.name(),
                  newCode.description(),
                  newCode.include(),
                  newCode.exclude(),
                  newCode.colour(),
                  newCode.key(),
                  newCode.parent().isPresent()
                      ? newCode.parent()
                      : Optional.of(
                          source.parent().isPresent()
                              ? Codebook.byId(book, source.parent().getAsLong()).name()
                              : ""),
                  newCode.direction().isPresent()
                      ? newCode.direction()
                      : Optional.of(source.direction()));
          Code made = Codebook.create(book, draft, e.newCodeId());
          e.putCode(made);
          Set<Long> wanted = new HashSet<>(answers);
          int moved = 0;
          for (Assignment a : e.assignmentsOfCode(sourceId)) {
            if (wanted.contains(a.answerId())) {
              e.putAssignment(
                  new Assignment(a.answerId(), made.id(), a.span(), a.coder(), a.origin(), a.at()));
              e.removeAssignment(a.answerId(), sourceId);
              moved++;
            }
          }
          e.note("from", source.name());
          e.note("into", made.name());
          e.note("moved", moved);
          return "Split \""
              + made.name()
              + "\" off \""
              + source.name()
              + "\": "
              + moved
              + " answer(s) moved.";
        });
  }

  /**
   * Splits a code by a query: the answers carrying it that the query matches move to the new code.
   *
   * @throws InputException when the query cannot be read
   */
  public EditOutcome split(String coder, long sourceId, CodeDraft newCode, String query)
      throws InputException {
    List<Long> matches = new ArrayList<>();
    for (long id : search.matches(query)) {
      matches.add(id);
    }
    return split(coder, sourceId, newCode, matches);
  }

  private static void dropRulesAndRemovals(CodingEdit e, long codeId) throws ProjectFileException {
    for (Rule r : e.rules()) {
      if (r.codeId() == codeId) {
        e.removeRule(r.id());
      }
    }
    for (long answer : e.vetoes(codeId)) {
      e.removeVeto(answer, codeId);
    }
  }

  /**
   * Brings in a codebook file: codes it names are updated, new ones created, themes set after all
   * codes exist; codes it does not name are left as they are. All or nothing.
   *
   * @throws InputException naming the file and line of the first problem
   */
  public EditOutcome importCodebook(String coder, Path file) throws InputException {
    byte[] bytes;
    try {
      bytes = Files.readAllBytes(file);
    } catch (IOException e) {
      throw new InputException(
          new InputProblem(file.toString(), 0, 0, "cannot be read (" + e.getMessage() + ")"));
    }
    return importCodebook(coder, file.getFileName().toString(), bytes);
  }

  /**
   * Brings in a codebook file's contents; {@code source} is its file name (its extension says CSV
   * or JSON).
   *
   * @throws InputException naming the source and line of the first problem
   */
  public EditOutcome importCodebook(String coder, String source, byte[] bytes)
      throws InputException {
    return CodebookImport.run(store, coder, source, bytes);
  }

  /**
   * The codebook as the contents of a file named {@code fileName}: CSV or JSON, as its extension
   * says.
   */
  public String exportCodebook(String fileName) throws InputException {
    Format format = Format.of(fileName);
    List<Code> book = store.codes();
    return format == Format.CSV ? CodebookFile.csv(book) : CodebookFile.json(book);
  }
}
