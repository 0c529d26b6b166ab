package org.flexmargin.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import org.flexmargin.model.InvalidInputException;

/**
 * Writes an output folder atomically: everything goes into a temporary sibling folder
 * ({@code .tmp-<name>-<random>}), which replaces the target only once complete; the previous
 * report is moved aside ({@code .old-<name>-<random>}) and deleted once the new one is in place.
 * On failure the temporary folder is removed and the previous report is kept.
 *
 * <p>Safety rules, checked before any computation by {@link #checkTarget} and again on writing:
 *
 * <ul>
 *   <li>the target must be a new folder, an empty folder, or an earlier output folder of this
 *       program (it carries the marker file {@value #OUTPUT_MARKER}, or is a first-release report
 *       with {@code results.json}, {@code notch-design.json} or {@code notch-check.json}); an
 *       existing regular file, a symbolic link or a folder with other content is refused as bad
 *       input, and nothing is changed;
 *   <li>a target below a regular file is refused with the name of that file;
 *   <li>temporary and old folders carry an owner file ({@value #OWNER_FILE}: process id and start
 *       time). A later run removes those whose process is gone (a run that was killed); an old
 *       folder whose target is missing (killed between the two renames) is put back as the target.
 *       Folders without a readable owner file, or whose process still runs, are never touched.
 * </ul>
 *
 * <p>Failures to write (disk full, read-only file system, permissions) are
 * {@link OutputWriteException}s.
 */
public final class ReportFolder {
  private ReportFolder() {}

  /** Marker file in every output folder written by this program. */
  public static final String OUTPUT_MARKER = ".flexmargin-output";
  /** Owner file in temporary and old folders: process id and start time. */
  public static final String OWNER_FILE = ".flexmargin-owner";
  private static final String TMP_PREFIX = ".tmp-";
  private static final String OLD_PREFIX = ".old-";
  /** Files by which a first-release output folder (written before the marker existed) is recognised. */
  private static final List<String> EARLIER_OUTPUT_FILES =
      List.of("results.json", "notch-design.json", "notch-check.json");

  /** Writes the files of a report into a folder. */
  @FunctionalInterface
  public interface Writer {
    /**
     * @param folder the (temporary) folder to write into
     * @throws IOException on failure
     */
    void write(Path folder) throws IOException;
  }

  /**
   * Checks that a target folder may be written (see the class comment) without changing anything.
   *
   * @param target the output folder
   * @throws InvalidInputException (field path {@code --out}) if it may not
   */
  public static void checkTarget(Path target) {
    Path abs = target.toAbsolutePath().normalize();
    if (abs.getParent() == null) {
      throw refuse(abs, "a folder below the file-system root", "the root itself");
    }
    for (Path p = abs.getParent(); p != null; p = p.getParent()) {
      if (Files.exists(p) && !Files.isDirectory(p)) {
        throw refuse(abs, "a folder that can be created",
            p + " is a regular file, not a folder, so nothing can be created below it");
      }
    }
    if (Files.isSymbolicLink(abs)) {
      throw refuse(abs, "a folder", "a symbolic link (give the folder it points to)");
    }
    if (!Files.exists(abs)) {
      return;
    }
    if (!Files.isDirectory(abs)) {
      throw refuse(abs, "a folder (new, empty, or an earlier report, which is replaced)",
          "an existing file that is not a folder; it is left as it is");
    }
    if (!isReplaceable(abs)) {
      throw refuse(abs, "a new folder, an empty folder or an earlier flexmargin output folder (which is replaced)",
          "a folder with other content; it is left as it is");
    }
  }

  private static InvalidInputException refuse(Path abs, String expected, String found) {
    return new InvalidInputException("--out " + abs, expected, found);
  }

  private static boolean isReplaceable(Path dir) {
    if (Files.exists(dir.resolve(OUTPUT_MARKER), LinkOption.NOFOLLOW_LINKS)) {
      return true;
    }
    for (String f : EARLIER_OUTPUT_FILES) {
      if (Files.isRegularFile(dir.resolve(f), LinkOption.NOFOLLOW_LINKS)) {
        return true;
      }
    }
    try (DirectoryStream<Path> s = Files.newDirectoryStream(dir)) {
      return !s.iterator().hasNext();
    } catch (IOException e) {
      return false;
    }
  }

  /**
   * @param target final folder, e.g. reports/demo
   * @param writer writes the content
   * @return the target, absolute
   * @throws InvalidInputException if the target may not be written (see {@link #checkTarget})
   * @throws OutputWriteException if writing failed; the previous report is kept
   */
  public static Path writeAtomically(Path target, Writer writer) {
    checkTarget(target);
    Path abs = target.toAbsolutePath().normalize();
    Path parent = abs.getParent();
    Path tmp = null;
    Path old = null;
    try {
      Files.createDirectories(parent);
      cleanStale(parent);
      tmp = Files.createTempDirectory(parent, TMP_PREFIX + abs.getFileName() + "-");
      writeOwner(tmp);
      makeReadable(tmp);
      writer.write(tmp);
      Files.writeString(tmp.resolve(OUTPUT_MARKER),
          "Output folder written by flexmargin; the next run to the same folder replaces it.\n",
          StandardCharsets.UTF_8);
      Files.delete(tmp.resolve(OWNER_FILE));
      if (Files.exists(abs, LinkOption.NOFOLLOW_LINKS)) {
        old = Files.createTempDirectory(parent, OLD_PREFIX + abs.getFileName() + "-");
        Files.delete(old);
        move(abs, old);
        writeOwner(old);
      }
      move(tmp, abs);
      tmp = null;
      if (old != null) {
        deleteTree(old);
      }
      return abs;
    } catch (IOException e) {
      if (old != null && !Files.exists(abs, LinkOption.NOFOLLOW_LINKS)) {
        try {
          Files.deleteIfExists(old.resolve(OWNER_FILE));
          move(old, abs);
        } catch (IOException ignored) {
          // the previous report stays at its temporary name, marked as ours: the next run restores it
        }
      }
      throw new OutputWriteException("could not write " + abs + ": " + describe(e), e);
    } finally {
      if (tmp != null) {
        try {
          deleteTree(tmp);
        } catch (IOException ignored) {
          // best effort; it carries our owner file, so the next run removes it
        }
      }
    }
  }

  /** Checks a file written to a temporary name before it takes its final name. */
  @FunctionalInterface
  public interface FileCheck {
    /**
     * @param written the complete temporary file (in the target's folder)
     * @throws RuntimeException if the file must not be kept
     */
    void check(Path written);
  }

  /**
   * Checks that a single output file may be written: its folder is a folder (or can be created)
   * and the file does not exist unless replacing is allowed.
   *
   * @param file the file
   * @param option the command-line option that names it, for messages
   * @param mayReplace whether an existing regular file may be replaced
   * @throws InvalidInputException (field path: the option and file) if it may not
   */
  public static void checkFile(Path file, String option, boolean mayReplace) {
    Path abs = file.toAbsolutePath().normalize();
    for (Path p = abs.getParent(); p != null; p = p.getParent()) {
      if (Files.exists(p) && !Files.isDirectory(p)) {
        throw new InvalidInputException(option + " " + abs, "a file whose folder can be created",
            p + " is a regular file, not a folder, so nothing can be created below it");
      }
    }
    if (Files.isDirectory(abs) || Files.isSymbolicLink(abs)
        || Files.exists(abs) && !Files.isRegularFile(abs)) {
      throw new InvalidInputException(option + " " + abs, "a regular file", "a folder, link or special file");
    }
    if (Files.exists(abs) && !mayReplace) {
      throw new InvalidInputException(option + " " + abs, "a new file (give --overwrite to replace it)",
          "an existing file; it is left as it is");
    }
  }

  /**
   * Writes one file atomically: to a temporary name in the same folder, checked, then renamed.
   * Nothing is left behind on failure.
   *
   * @param file the target
   * @param option the command-line option that names it, for messages
   * @param content the text (UTF-8)
   * @param mayReplace whether an existing file may be replaced
   * @param check run on the complete temporary file before it is renamed
   * @return the target, absolute
   * @throws OutputWriteException if writing failed
   */
  public static Path writeFileAtomically(Path file, String option, String content, boolean mayReplace,
      FileCheck check) {
    checkFile(file, option, mayReplace);
    Path abs = file.toAbsolutePath().normalize();
    String name = abs.getFileName().toString();
    int dot = name.lastIndexOf('.');
    Path tmp = null;
    try {
      Files.createDirectories(abs.getParent());
      tmp = Files.createTempFile(abs.getParent(), TMP_PREFIX + (dot > 0 ? name.substring(0, dot) : name) + "-",
          dot > 0 ? name.substring(dot) : "");
      Files.writeString(tmp, content, StandardCharsets.UTF_8);
      check.check(tmp);
      if (mayReplace) {
        Files.move(tmp, abs, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
      } else {
        move(tmp, abs);
      }
      tmp = null;
      return abs;
    } catch (IOException e) {
      throw new OutputWriteException("could not write " + abs + ": " + describe(e), e);
    } finally {
      if (tmp != null) {
        try {
          Files.deleteIfExists(tmp);
        } catch (IOException ignored) {
          // best effort
        }
      }
    }
  }

  private static String describe(IOException e) {
    if (e instanceof java.nio.file.AccessDeniedException) {
      return "permission denied (" + e.getMessage() + ")";
    }
    return e.getMessage() != null ? e.getMessage() : e.getClass().getSimpleName();
  }

  /** The owner record of this process: pid and start time. */
  static String ownerRecord() {
    ProcessHandle self = ProcessHandle.current();
    return "pid=" + self.pid() + "\nstart=" + self.info().startInstant().map(Object::toString).orElse("unknown") + "\n";
  }

  private static void writeOwner(Path folder) throws IOException {
    Files.writeString(folder.resolve(OWNER_FILE), ownerRecord(), StandardCharsets.UTF_8);
  }

  /**
   * Removes (or, for an old folder whose target is missing, restores) the temporary and old
   * folders in a parent folder that were left by runs of this program that no longer run.
   *
   * @param parent the folder holding output folders
   * @return number of folders removed or restored
   */
  public static int cleanStale(Path parent) {
    int cleaned = 0;
    try (DirectoryStream<Path> s = Files.newDirectoryStream(parent,
        p -> p.getFileName().toString().startsWith(TMP_PREFIX) || p.getFileName().toString().startsWith(OLD_PREFIX))) {
      for (Path p : s) {
        if (Files.isDirectory(p, LinkOption.NOFOLLOW_LINKS) && ownerIsGone(p.resolve(OWNER_FILE))) {
          cleaned += removeOrRestore(p) ? 1 : 0;
        }
      }
    } catch (IOException e) {
      // clean-up is best effort: the listing failed, nothing was touched
    }
    return cleaned;
  }

  private static boolean removeOrRestore(Path stale) {
    String name = stale.getFileName().toString();
    try {
      if (name.startsWith(OLD_PREFIX)) {
        int dash = name.lastIndexOf('-');
        Path target = stale.resolveSibling(name.substring(OLD_PREFIX.length(), dash));
        if (dash > OLD_PREFIX.length() && !Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
          Files.delete(stale.resolve(OWNER_FILE));
          move(stale, target);
          return true;
        }
      }
      deleteTree(stale);
      return true;
    } catch (IOException e) {
      return false;
    }
  }

  /**
   * @param owner an owner file
   * @return true if it is a regular file naming a process that is gone (no process with that id,
   *     or one started at another time); false if it is missing, unreadable or its process runs
   */
  static boolean ownerIsGone(Path owner) {
    if (!Files.isRegularFile(owner, LinkOption.NOFOLLOW_LINKS)) {
      return false;
    }
    long pid = -1;
    String start = null;
    try {
      for (String line : Files.readAllLines(owner, StandardCharsets.UTF_8)) {
        if (line.startsWith("pid=")) {
          pid = Long.parseLong(line.substring(4).trim());
        } else if (line.startsWith("start=")) {
          start = line.substring(6).trim();
        }
      }
    } catch (IOException | NumberFormatException e) {
      return false;
    }
    if (pid <= 0 || start == null) {
      return false;
    }
    var process = ProcessHandle.of(pid);
    if (process.isEmpty() || !process.get().isAlive()) {
      return true;
    }
    String recorded = start;
    return !recorded.equals("unknown")
        && process.get().info().startInstant().map(i -> !i.toString().equals(recorded)).orElse(false);
  }

  /** A temporary folder is private (rwx------); a report folder is readable by all (rwxr-xr-x). */
  private static void makeReadable(Path folder) throws IOException {
    try {
      Files.setPosixFilePermissions(folder, PosixFilePermissions.fromString("rwxr-xr-x"));
    } catch (UnsupportedOperationException e) {
      // not a POSIX file system: default permissions apply
    }
  }

  private static void move(Path from, Path to) throws IOException {
    try {
      Files.move(from, to, StandardCopyOption.ATOMIC_MOVE);
    } catch (AtomicMoveNotSupportedException e) {
      Files.move(from, to);
    }
  }

  private static void deleteTree(Path root) throws IOException {
    if (!Files.exists(root, LinkOption.NOFOLLOW_LINKS)) {
      return;
    }
    Files.walkFileTree(root, new SimpleFileVisitor<>() {
      @Override
      public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) throws IOException {
        Files.delete(file);
        return FileVisitResult.CONTINUE;
      }

      @Override
      public FileVisitResult postVisitDirectory(Path dir, IOException exc) throws IOException {
        Files.delete(dir);
        return FileVisitResult.CONTINUE;
      }
    });
  }
}
