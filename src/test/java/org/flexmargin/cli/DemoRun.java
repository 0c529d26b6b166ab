package org.flexmargin.cli;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.stream.Stream;

/**
 * The bundled demo run once per test JVM through the command line ({@code demo --out DIR
 * --quiet}, the sweep route of every case file), shared by the tests that only read what it
 * wrote: its sweep is the most expensive command-line run of the suite. The folder is removed when
 * the JVM exits.
 */
final class DemoRun {
  private static CliRun run;
  private static Path folder;

  private DemoRun() {}

  /** @return the outcome of the shared run */
  static synchronized CliRun result() {
    if (run == null) {
      try {
        Path root = Files.createTempDirectory("flexmargin-demo-run");
        Runtime.getRuntime().addShutdownHook(new Thread(() -> delete(root)));
        folder = root.resolve("demo");
      } catch (IOException e) {
        throw new UncheckedIOException(e);
      }
      run = CliRun.of("demo", "--out", folder.toString(), "--quiet");
    }
    return run;
  }

  /** @return the output folder of the shared run */
  static synchronized Path folder() {
    result();
    return folder;
  }

  private static void delete(Path root) {
    try (Stream<Path> files = Files.walk(root)) {
      files.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
    } catch (IOException e) {
      // best effort at exit
    }
  }
}
