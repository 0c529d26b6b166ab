package org.flexmargin.cli;

import java.io.PrintWriter;
import java.io.UncheckedIOException;
import org.flexmargin.io.InputFileException;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.report.OutputWriteException;
import picocli.CommandLine;
import picocli.CommandLine.IExecutionExceptionHandler;
import picocli.CommandLine.ParseResult;

/**
 * Maps exceptions to exit codes and one clear message: bad input (2), output that could not be
 * written (4) and internal errors (1). A
 * stack trace is printed only with {@code --debug}.
 */
final class ErrorHandler implements IExecutionExceptionHandler {
  @Override
  public int handleExecutionException(Exception ex, CommandLine cl, ParseResult parsed) {
    PrintWriter err = cl.getErr();
    boolean debug = parsed.subcommands().stream().anyMatch(p -> p.hasMatchedOption("--debug"))
        || parsed.hasMatchedOption("--debug");
    int code;
    if (ex instanceof InputFileException || ex instanceof InvalidInputException) {
      err.println("flexmargin: bad input: " + ex.getMessage());
      code = FlexMargin.EXIT_BAD_INPUT;
    } else if (ex instanceof OutputWriteException) {
      err.println("flexmargin: output not written: " + ex.getMessage()
          + " (nothing half-written is left; an earlier report there is kept)");
      code = FlexMargin.EXIT_WRITE_FAILED;
    } else if (ex instanceof UncheckedIOException) {
      err.println("flexmargin: " + ex.getMessage());
      code = FlexMargin.EXIT_INTERNAL;
    } else {
      err.println("flexmargin: internal error: " + ex + " (run again with --debug for the stack trace)");
      code = FlexMargin.EXIT_INTERNAL;
    }
    if (debug) {
      ex.printStackTrace(err);
    }
    err.flush();
    return code;
  }
}
