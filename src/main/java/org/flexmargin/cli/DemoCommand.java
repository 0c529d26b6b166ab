package org.flexmargin.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.InputFile;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code flexmargin demo}: the bundled invented scenario. The case and its mode tables are inside
 * the jar (copied from {@code mode-tables/demo/} at build time), so the command runs from any
 * folder; the report goes to {@code reports/demo/} under the current folder, which git ignores in
 * the repository. The committed sample report {@code reports/ridgeline-mc7-demo/} is refreshed on
 * purpose only, by {@code scripts/refresh-sample-report.sh}.
 */
@Command(name = "demo", mixinStandardHelpOptions = true,
    description = {"Run the sweep on the bundled demo: the invented Ridgeline MC-7 cargo drone (fictional "
        + "data, not any real aircraft). The case and its mode tables are inside the program, so it runs "
        + "from any folder (the same files are in mode-tables/demo/ of the source tree)."},
    footer = {"", "Examples:", "  flexmargin demo", "  flexmargin demo --out /tmp/mc7 --speed-unit kt",
        "  flexmargin demo --design-notches"})
final class DemoCommand implements Callable<Integer> {
  /** Resource folder of the bundled demo. */
  static final String RESOURCE_FOLDER = "/org/flexmargin/demo/";
  /** The bundled files: the case first, then the mode tables it references. */
  static final List<String> FILES =
      List.of("demo-case.json", "ridgeline-mc7-full-payload.json", "ridgeline-mc7-empty.csv", "demo-campaign.json",
          "demo-case-notched.json");
  /** Default output folder, relative to the current folder (git-ignored in the repository). */
  static final Path DEFAULT_OUT = Path.of("reports", "demo");

  @Option(names = "--out", paramLabel = "DIR",
      description = "Output folder (default: reports/demo under the current folder). Must be new, empty or "
          + "an earlier flexmargin output folder, which is replaced once the new report is complete.")
  Path out = DEFAULT_OUT;

  @Option(names = "--design-notches", description = "Also place structural notches as notch-design does and show "
      + "them in the report and in its time-domain check. Adds the cost of a notch design.")
  boolean designNotches;

  @Mixin CommonOptions common;
  @Mixin ReportStyleOptions style;
  @Mixin WorkOptions work;

  @Spec picocli.CommandLine.Model.CommandSpec spec;

  @Override
  public Integer call() {
    if (!common.quiet) {
      spec.commandLine().getOut().println("demo: the bundled Ridgeline MC-7 case (invented data; the same files as "
          + "mode-tables/demo/ in the source tree), report to " + out);
    }
    return SweepCommand.run(spec, bundledCase(), out, common, style, work, designNotches, true);
  }

  /**
   * Copies the bundled demo files ({@link #FILES}) into a folder.
   *
   * @param dir an existing folder
   * @throws IOException if a file cannot be written
   */
  static void unpack(Path dir) throws IOException {
    for (String name : FILES) {
      try (InputStream in = DemoCommand.class.getResourceAsStream(RESOURCE_FOLDER + name)) {
        if (in == null) {
          throw new IllegalStateException("the demo file " + name + " is missing from the program's jar");
        }
        Files.copy(in, dir.resolve(name));
      }
    }
  }

  /**
   * Reads the bundled demo: its files are copied to a private temporary folder, read (every file is
   * read up front) and removed; the case's inputs name them as bundled files, with their hashes.
   *
   * @return the validated demo case
   */
  static AnalysisCase bundledCase() {
    Path dir = null;
    try {
      dir = Files.createTempDirectory("flexmargin-demo-");
      unpack(dir);
      AnalysisCase c = CaseReader.read(dir.resolve(FILES.get(0)));
      String prefix = dir.toString();
      List<InputFile> inputs = new ArrayList<>();
      for (InputFile f : c.inputs()) {
        String path = f.path().startsWith(prefix) ? f.path().substring(prefix.length() + 1) : f.path();
        inputs.add(new InputFile("(bundled demo) " + path, f.sha256()));
      }
      return new AnalysisCase(c.format(), c.name(), c.description(), c.configurations(), c.sweep(), c.options(),
          inputs, c.loop(), c.requirements());
    } catch (IOException e) {
      throw new UncheckedIOException("could not unpack the bundled demo: " + e.getMessage(), e);
    } finally {
      if (dir != null) {
        for (String name : FILES) {
          dir.resolve(name).toFile().delete();
        }
        dir.toFile().delete();
      }
    }
  }
}
