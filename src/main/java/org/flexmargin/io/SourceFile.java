package org.flexmargin.io;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/**
 * The bytes of one input file with the name it is reported under and its SHA-256 digest.
 * Instances are immutable.
 */
final class SourceFile {
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
   * @throws InputFileException if it is missing, a directory or unreadable; reported in the file
   *     itself (line 0)
   */
  static SourceFile read(Path path, String display) {
    String problem = problem(path);
    if (problem != null) {
      throw new InputFileException(display, 0, "", "a readable file", problem);
    }
    try {
      return new SourceFile(path, display, Files.readAllBytes(path));
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
    String problem = problem(path);
    if (problem != null) {
      throw from.fail("a readable file", problem + " (" + display + ")");
    }
    try {
      return new SourceFile(path, display, Files.readAllBytes(path));
    } catch (IOException e) {
      throw from.fail("a readable file", describe(e) + " (" + display + ")");
    }
  }

  private static String problem(Path path) {
    if (!Files.exists(path)) {
      return "no such file";
    }
    if (Files.isDirectory(path)) {
      return "a directory";
    }
    if (!Files.isReadable(path)) {
      return "a file without read permission";
    }
    return null;
  }

  private static String describe(IOException e) {
    if (e instanceof NoSuchFileException) {
      return "no such file";
    }
    if (e instanceof AccessDeniedException) {
      return "a file without read permission";
    }
    return e.getClass().getSimpleName() + " " + e.getMessage();
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
