package org.flexmargin.io;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Locale;

/**
 * The bytes of one input file with the name it is reported under and its SHA-256 digest.
 * Instances are immutable.
 *
 * <p>Only regular files are read (a symbolic link is followed to its target, which must be a
 * regular file): a device such as {@code /dev/zero}, a named pipe or a socket is refused before it
 * is opened, so that reading can neither block nor run out of memory. A file larger than the input
 * size limit is refused too: {@value #DEFAULT_LIMIT_MB} MB unless the system property
 * {@value #LIMIT_PROPERTY} or the environment variable {@value #LIMIT_ENVIRONMENT} gives another
 * whole number of megabytes (1 MB = 2^20 bytes).
 */
final class SourceFile {
  /** Default input size limit (MB of 2^20 bytes). */
  static final long DEFAULT_LIMIT_MB = 512;
  /** System property that overrides the input size limit (whole MB). */
  static final String LIMIT_PROPERTY = "flexmargin.max-input-mb";
  /** Environment variable that overrides the input size limit (whole MB). */
  static final String LIMIT_ENVIRONMENT = "FLEXMARGIN_MAX_INPUT_MB";

  private final Path path;
  private final String display;
  private final byte[] bytes;
  private final String sha256;

  private SourceFile(Path path, String display, byte[] bytes) {
    this.path = path;
    this.display = display;
    this.bytes = bytes;
    this.sha256 = digest(bytes);
  }

  /**
   * Reads a whole file.
   *
   * @param path file to read
   * @param display name used in messages
   * @return the file
   * @throws InputFileException if it is missing, not a regular file, too large or unreadable;
   *     reported in the file itself (line 0)
   */
  static SourceFile read(Path path, String display) {
    return read(path, display, limitBytes());
  }

  /** As {@link #read(Path, String)} with an explicit size limit in bytes. */
  static SourceFile read(Path path, String display, long limitBytes) {
    String problem = problem(path, limitBytes);
    if (problem != null) {
      throw new InputFileException(display, 0, "", expectation(problem, limitBytes), problem);
    }
    try {
      return new SourceFile(path, display, readBounded(path, limitBytes));
    } catch (TooLarge e) {
      throw new InputFileException(display, 0, "", expectation("a file of", limitBytes), e.getMessage());
    } catch (IOException e) {
      throw new InputFileException(display, 0, "", "a readable file", describe(e), e);
    }
  }

  /**
   * Reads a file named by a field of another file; a missing or unreadable file is reported at
   * that field.
   *
   * @param path resolved file path
   * @param display name used in messages
   * @param from the referencing field
   * @return the file
   */
  static SourceFile readReferenced(Path path, String display, JsonField from) {
    long limit = limitBytes();
    String problem = problem(path, limit);
    if (problem != null) {
      throw from.fail(expectation(problem, limit), problem + " (" + display + ")");
    }
    try {
      return new SourceFile(path, display, readBounded(path, limit));
    } catch (TooLarge e) {
      throw from.fail(expectation("a file of", limit), e.getMessage() + " (" + display + ")");
    } catch (IOException e) {
      throw from.fail("a readable file", describe(e) + " (" + display + ")");
    }
  }

  /** @return the input size limit in bytes, from the property, the environment or the default */
  static long limitBytes() {
    String v = System.getProperty(LIMIT_PROPERTY);
    String from = "system property " + LIMIT_PROPERTY;
    if (v == null || v.isBlank()) {
      v = System.getenv(LIMIT_ENVIRONMENT);
      from = "environment variable " + LIMIT_ENVIRONMENT;
    }
    if (v == null || v.isBlank()) {
      return DEFAULT_LIMIT_MB << 20;
    }
    long mb;
    try {
      mb = Long.parseLong(v.strip());
    } catch (NumberFormatException e) {
      mb = -1;
    }
    if (mb < 1 || mb > (1L << 23)) {
      throw new InputFileException(from, 0, "", "a whole number of megabytes from 1 to 8388608",
          "\"" + v + "\"");
    }
    return mb << 20;
  }

  private static String expectation(String problem, long limitBytes) {
    if (problem.startsWith("not a regular file")) {
      return "a regular file";
    }
    if (!problem.startsWith("a file of")) {
      return "a readable file";
    }
    return "a readable regular file of at most " + megabytes(limitBytes)
        + " (the input size limit; raise it with " + LIMIT_ENVIRONMENT + " or -D" + LIMIT_PROPERTY + ")";
  }

  private static String megabytes(long bytes) {
    double mb = bytes / (double) (1L << 20);
    return mb >= 10 || mb == Math.rint(mb)
        ? String.format(Locale.ROOT, "%.0f MB", mb) : String.format(Locale.ROOT, "%.2f MB", mb);
  }

  private static String problem(Path path, long limitBytes) {
    if (!Files.exists(path)) {
      return Files.isSymbolicLink(path) ? "a symbolic link to a missing file" : "no such file";
    }
    if (Files.isDirectory(path)) {
      return "a directory";
    }
    if (!Files.isRegularFile(path)) {
      return "not a regular file (a device, named pipe or socket" + (Files.isSymbolicLink(path)
          ? ", reached through a symbolic link" : "") + "), which is never read";
    }
    if (!Files.isReadable(path)) {
      return "a file without read permission";
    }
    try {
      long size = Files.size(path);
      if (size > limitBytes) {
        return "a file of " + megabytes(size);
      }
    } catch (IOException e) {
      return describe(e);
    }
    return null;
  }

  /** The file grew past the limit while it was read. */
  private static final class TooLarge extends IOException {
    private static final long serialVersionUID = 1L;

    TooLarge(String message) {
      super(message);
    }
  }

  private static byte[] readBounded(Path path, long limitBytes) throws IOException {
    try (InputStream in = Files.newInputStream(path)) {
      int cap = (int) Math.min(limitBytes, Integer.MAX_VALUE - 16);
      byte[] b = in.readNBytes(cap);
      if (b.length == cap && in.read() >= 0) {
        throw new TooLarge("a file larger than " + megabytes(limitBytes) + " (it grew while being read)");
      }
      return b;
    }
  }

  private static String describe(IOException e) {
    if (e instanceof NoSuchFileException) {
      return "no such file";
    }
    if (e instanceof AccessDeniedException) {
      return "a file without read permission";
    }
    return "a read error (" + e.getClass().getSimpleName() + (e.getMessage() == null ? "" : ": " + e.getMessage())
        + ")";
  }

  private static String digest(byte[] bytes) {
    try {
      return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException("SHA-256 is required of every Java platform", e);
    }
  }

  /** @return the file path */
  Path path() {
    return path;
  }

  /** @return the name used in messages and provenance */
  String display() {
    return display;
  }

  /** @return the bytes (not a copy; not to be modified) */
  byte[] bytes() {
    return bytes;
  }

  /** @return lower-case hex SHA-256 of the bytes */
  String sha256() {
    return sha256;
  }
}
