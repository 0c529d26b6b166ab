package org.flexmargin.model;

/**
 * Provenance of one input file.
 *
 * @param path the path as given (relative to the case file where it was relative)
 * @param sha256 hex SHA-256 of the file's bytes
 */
public record InputFile(String path, String sha256) {
  /** Validates. */
  public InputFile {
    Checks.name("path", path);
    Checks.name("sha256", sha256);
  }
}
