package org.flexmargin.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.BasicFileAttributes;

/**
 * Writes an output folder atomically: everything goes into a temporary sibling folder, which
 * replaces the target only once complete. An existing target is kept until then; on failure the
 * temporary folder is removed and nothing else is touched.
 */
public final class ReportFolder {
  private ReportFolder() {}

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
   * @param target final folder, e.g. reports/demo
   * @param writer writes the content
   * @return the target
   */
  public static Path writeAtomically(Path target, Writer writer) {
    Path abs = target.toAbsolutePath().normalize();
    Path parent = abs.getParent();
    Path tmp = null;
    Path old = null;
    try {
      Files.createDirectories(parent);
      tmp = Files.createTempDirectory(parent, ".tmp-" + abs.getFileName() + "-");
      makeReadable(tmp);
      writer.write(tmp);
      if (Files.exists(abs)) {
        old = Files.createTempDirectory(parent, ".old-" + abs.getFileName() + "-");
        Files.delete(old);
        move(abs, old);
      }
      move(tmp, abs);
      tmp = null;
      if (old != null) {
        deleteTree(old);
      }
      return abs;
    } catch (IOException e) {
      if (old != null && !Files.exists(abs)) {
        try {
          move(old, abs);
        } catch (IOException ignored) {
          // the previous report stays at its temporary name; the error below says what failed
        }
      }
      throw new UncheckedIOException("could not write " + abs + ": " + e.getMessage(), e);
    } finally {
      if (tmp != null) {
        try {
          deleteTree(tmp);
        } catch (IOException ignored) {
          // best effort clean-up of our own temporary folder
        }
      }
    }
  }

  /** A temporary folder is private (rwx------); a report folder is readable by all (rwxr-xr-x). */
  private static void makeReadable(Path folder) throws IOException {
    try {
      Files.setPosixFilePermissions(folder, java.nio.file.attribute.PosixFilePermissions.fromString("rwxr-xr-x"));
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
    if (!Files.exists(root)) {
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
