package org.flexmargin.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.flexmargin.io.InputFileException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code flexmargin demo}: the bundled invented scenario. */
@Command(name = "demo", mixinStandardHelpOptions = true,
    description = {"Run the sweep on the bundled demo: the invented Ridgeline MC-7 cargo drone "
        + "(mode-tables/demo/demo-case.json; fictional data, not any real aircraft)."},
    footer = {"", "Example (from the repository root):", "  flexmargin demo"})
final class DemoCommand implements Callable<Integer> {
  static final Path DEMO_CASE = Path.of("mode-tables", "demo", "demo-case.json");

  @Option(names = "--out", paramLabel = "DIR", description = "Output folder (default: reports/<case name>).")
  Path out;

  @Option(names = "--case", paramLabel = "FILE", description = "Demo case file (default: ${DEFAULT-VALUE}).")
  Path caseFile = DEMO_CASE;

  @Mixin CommonOptions common;

  @Spec picocli.CommandLine.Model.CommandSpec spec;

  @Override
  public Integer call() {
    if (!Files.isRegularFile(caseFile)) {
      throw new InputFileException(caseFile.toString(), 0, "(file)",
          "the demo case file (run from the repository root)", "no such file");
    }
    return SweepCommand.run(spec, caseFile, out, common);
  }
}
