package org.flexmargin.cli;

import java.io.PrintWriter;
import java.io.StringWriter;

/**
 * One run of the command line in this JVM, as a user meets it.
 *
 * @param code exit code
 * @param out standard output
 * @param err standard error
 */
public record CliRun(int code, String out, String err) {
  /** @return the outcome of {@code flexmargin ARGS} */
  public static CliRun of(String... args) {
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    int code = FlexMargin.execute(args, new PrintWriter(out), new PrintWriter(err));
    return new CliRun(code, out.toString(), err.toString());
  }
}
