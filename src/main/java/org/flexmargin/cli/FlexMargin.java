package org.flexmargin.cli;

import java.io.PrintWriter;
import java.util.List;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The {@code flexmargin} command line. Exit codes: 0 done (and every requirement met), 1 internal
 * error, 2 bad input, 3 done with requirements violated.
 */
@Command(
    name = "flexmargin",
    mixinStandardHelpOptions = true,
    versionProvider = Version.class,
    description = {
      "Aeroelastic and aeroservoelastic clearance: divergence, flutter (open and closed loop), loop "
          + "margins against a requirements table, structural notch placement, and the report of margin "
          + "versus airspeed.",
      "",
      "Analysis only: results support, and never replace, ground vibration tests, structural-coupling "
          + "tests, flight flutter testing and the approval of the airworthiness authority."
    },
    footer = {
      "",
      "Examples:",
      "  flexmargin demo",
      "  flexmargin check mode-tables/validation/goland-wing.json",
      "  flexmargin sweep mode-tables/demo/demo-case.json --out reports/demo",
      "  flexmargin notch-design mode-tables/demo/demo-case.json",
      "",
      "Exit codes: 0 done, 1 internal error, 2 bad input, 3 done with requirements violated, "
          + "4 output could not be written (disk full, read-only, no permission)."
    })
public final class FlexMargin implements Runnable {

  /** The subcommands, in the order the usage help lists them. */
  private static final List<Class<?>> SUBCOMMANDS = List.of(CheckCommand.class, SweepCommand.class,
      DemoCommand.class, BenchCommand.class, NotchDesignCommand.class, MarginsCommand.class,
      SimulateCommand.class, CampaignCommand.class, EnvelopeCommand.class, CommandLine.HelpCommand.class);

  /** Exit code: done. */
  public static final int EXIT_OK = 0;
  /** Exit code: internal error. */
  public static final int EXIT_INTERNAL = 1;
  /** Exit code: bad input. */
  public static final int EXIT_BAD_INPUT = 2;
  /** Exit code: done with requirements violated. */
  public static final int EXIT_REQUIREMENTS_VIOLATED = 3;
  /** Exit code: the results could not be written (disk full, read-only file system, no permission). */
  public static final int EXIT_WRITE_FAILED = 4;
  /** Exit code: done, no requirement violated, but some findings are unreliable (mode tracking in doubt). */
  public static final int EXIT_UNRELIABLE = 5;

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Override
  public void run() {
    spec.commandLine().usage(spec.commandLine().getOut());
  }

  /**
   * Runs the command line and returns the exit code (without exiting).
   *
   * @param args arguments
   * @param out standard output
   * @param err standard error
   * @return exit code
   */
  public static int execute(String[] args, PrintWriter out, PrintWriter err) {
    CommandLine cl = new CommandLine(new FlexMargin());
    for (Class<?> c : subcommandsFor(args)) {
      cl.addSubcommand(c);
    }
    cl.setOut(out);
    cl.setErr(err);
    cl.setExecutionExceptionHandler(new ErrorHandler());
    cl.setParameterExceptionHandler((ex, a) -> {
      err.println("flexmargin: " + ex.getMessage());
      CommandLine.UnmatchedArgumentException.printSuggestions(ex, err);
      err.println("Try 'flexmargin " + (ex.getCommandLine().getCommandName().equals("flexmargin") ? ""
          : ex.getCommandLine().getCommandName() + " ") + "--help'.");
      return EXIT_BAD_INPUT;
    });
    int code = cl.execute(args);
    out.flush();
    err.flush();
    return code;
  }

  /**
   * The subcommands whose model is built for these arguments: only the named one when the first
   * argument names a subcommand (building the model of every command costs more than a small
   * {@code check}), all of them otherwise (top-level help, {@code help}, a mistyped name).
   */
  static List<Class<?>> subcommandsFor(String[] args) {
    if (args.length > 0) {
      for (Class<?> c : SUBCOMMANDS) {
        if (c != CommandLine.HelpCommand.class && c.getAnnotation(Command.class).name().equals(args[0])) {
          return List.of(c);
        }
      }
    }
    return SUBCOMMANDS;
  }

  /** @param args command-line arguments */
  public static void main(String[] args) {
    PrintWriter out = new PrintWriter(System.out, true);
    PrintWriter err = new PrintWriter(System.err, true);
    System.exit(execute(args, out, err));
  }
}
