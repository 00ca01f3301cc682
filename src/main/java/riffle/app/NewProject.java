package riffle.app;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import riffle.model.InputException;
import riffle.store.AnalysisCache;
import riffle.store.ProjectFileException;

/**
 * Makes a new project whole or not at all. It is built in a working folder of its own beside the
 * target ({@code NAME.riffle.partial-PID/}, holding the project file and its {@code .d} folder),
 * folded into one file (no write-ahead log beside it), and only then put in place: the file with
 * one atomic link that fails when the name was taken meanwhile, its derived folder moved after it.
 * A process stopped before that (SIGTERM, a crash) leaves no project; SIGTERM removes its working
 * folder on the way out, and a folder left by a process that is gone (kill -9) is removed by the
 * next new project of that name.
 */
final class NewProject {
  private static final String PARTIAL = ".partial-";

  /** Files SQLite keeps beside a database. */
  private static final List<String> SIDE_FILES = List.of("-wal", "-shm", "-journal");

  private NewProject() {}

  /** Work that fills the new project. */
  @FunctionalInterface
  interface Work<T> {
    T run(Project project) throws InputException;
  }

  /**
   * Builds a project at {@code file}, which must not exist, with {@code work}. Empty when another
   * process created the file meanwhile (nothing of this attempt is left then).
   *
   * @throws InputException what {@code work} throws, or when the folder cannot be written
   */
  static <T> Optional<T> create(Path file, Work<T> work) throws InputException {
    return build(file, false, work);
  }

  /** Builds a project with {@code work} and puts it in place of the one at {@code file}, if any. */
  static void replace(Path file, Work<?> work) throws InputException {
    build(file, true, work);
  }

  private static <T> Optional<T> build(Path file, boolean replace, Work<T> work)
      throws InputException {
    Path target = file.toAbsolutePath();
    Path parent = target.getParent();
    if (parent == null || !Files.isDirectory(parent)) {
      throw new ProjectFileException(
          "cannot create project " + file + ": folder " + parent + " does not exist");
    }
    removeLeftovers(target);
    Path folder = workFolder(target);
    Thread cleanup = new Thread(() -> deleteTree(folder), "riffle-new-project-cleanup");
    Runtime.getRuntime().addShutdownHook(cleanup);
    try {
      deleteTree(folder);
      Files.createDirectories(folder);
      Path inside = folder.resolve(target.getFileName());
      T result;
      try (Project p = Project.openOrCreate(inside)) {
        result = work.run(p);
        p.foldIntoOneFile();
      }
      return publish(inside, target, folder, replace)
          ? Optional.ofNullable(result)
          : Optional.empty();
    } catch (IOException e) {
      throw new ProjectFileException(
          "cannot create project " + file + " (" + e.getMessage() + "); nothing was created");
    } finally {
      deleteTree(folder);
      try {
        Runtime.getRuntime().removeShutdownHook(cleanup);
      } catch (IllegalStateException shuttingDown) {
        // the hook runs anyway
      }
    }
  }

  /** The working folder of this process for {@code target}. */
  static Path workFolder(Path target) {
    return target.resolveSibling(target.getFileName() + PARTIAL + ProcessHandle.current().pid());
  }

  /**
   * Puts the finished project in place: SQLite's side files and the derived folder of an earlier
   * project of that name go first (they would be taken for the new one's), then the file appears in
   * one step, then its derived folder follows. False when the name was taken meanwhile.
   */
  private static boolean publish(Path inside, Path target, Path folder, boolean replace)
      throws IOException {
    if (!replace && Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
      return false;
    }
    Path derived = AnalysisCache.derivedFolder(target);
    if (Files.exists(derived, LinkOption.NOFOLLOW_LINKS)) {
      moveAside(derived, folder.resolve("earlier.d"));
    }
    for (String suffix : SIDE_FILES) {
      Files.deleteIfExists(target.resolveSibling(target.getFileName() + suffix));
    }
    if (replace) {
      Files.move(inside, target, StandardCopyOption.REPLACE_EXISTING, atomic());
    } else {
      try {
        Files.createLink(target, inside);
      } catch (FileAlreadyExistsException taken) {
        return false;
      } catch (UnsupportedOperationException | IOException noLinks) {
        // A file system without hard links: a move, which gives up when the name is taken.
        try {
          Files.move(inside, target);
        } catch (FileAlreadyExistsException taken) {
          return false;
        }
      }
    }
    Path built = AnalysisCache.derivedFolder(inside);
    if (Files.isDirectory(built)) {
      try {
        Files.move(built, derived, atomic());
      } catch (IOException madeMeanwhile) {
        // Another process opened the new project first and began its own: it is made again.
      }
    }
    return true;
  }

  private static StandardCopyOption atomic() {
    return StandardCopyOption.ATOMIC_MOVE;
  }

  private static void moveAside(Path from, Path to) throws IOException {
    try {
      Files.move(from, to, atomic());
    } catch (AtomicMoveNotSupportedException e) {
      deleteTree(from);
    }
  }

  /** Removes working folders of {@code target} whose process is gone. */
  private static void removeLeftovers(Path target) {
    Pattern own = Pattern.compile(Pattern.quote(target.getFileName() + PARTIAL) + "(\\d+)");
    long self = ProcessHandle.current().pid();
    try (Stream<Path> siblings = Files.list(target.getParent())) {
      for (Path p : siblings.toList()) {
        Matcher m = own.matcher(p.getFileName().toString());
        if (m.matches()) {
          long pid = Long.parseLong(m.group(1));
          if (pid != self && ProcessHandle.of(pid).map(h -> !h.isAlive()).orElse(true)) {
            deleteTree(p);
          }
        }
      }
    } catch (IOException | NumberFormatException e) {
      // Leftovers are only clutter; a folder that cannot be listed stops nothing.
    }
  }

  /** Deletes a folder and everything in it, as far as it can. */
  static void deleteTree(Path root) {
    if (!Files.exists(root, LinkOption.NOFOLLOW_LINKS)) {
      return;
    }
    try (Stream<Path> all = Files.walk(root)) {
      for (Path p : all.sorted(Comparator.reverseOrder()).toList()) {
        Files.deleteIfExists(p);
      }
    } catch (IOException | java.io.UncheckedIOException e) {
      // best effort: what is left is removed by the next new project of this name
    }
  }
}
