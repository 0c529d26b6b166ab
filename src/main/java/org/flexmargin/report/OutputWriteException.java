package org.flexmargin.report;

import java.io.IOException;
import java.io.UncheckedIOException;

/**
 * Writing an output folder failed (disk full, read-only file system, no permission, ...). Nothing
 * half-written is left behind: the previous report, if any, is kept. The command line gives these
 * their own exit code (4).
 */
public final class OutputWriteException extends UncheckedIOException {
  private static final long serialVersionUID = 1L;

  /**
   * @param message what could not be written, and why
   * @param cause the underlying failure
   */
  public OutputWriteException(String message, IOException cause) {
    super(message, cause);
  }
}
