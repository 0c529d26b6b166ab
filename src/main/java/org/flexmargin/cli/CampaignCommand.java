package org.flexmargin.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.stream.Stream;
import org.flexmargin.campaign.CampaignPlan;
import org.flexmargin.campaign.CampaignStore;
import org.flexmargin.campaign.CampaignSummary;
import org.flexmargin.campaign.GroupSummary;
import org.flexmargin.campaign.LocalEngine;
import org.flexmargin.campaign.SampleOutcome;
import org.flexmargin.campaign.SampleRunner;
import org.flexmargin.campaign.SampleStatus;
import org.flexmargin.io.CampaignReader;
import org.flexmargin.model.CampaignSpec;
import org.flexmargin.model.InputFile;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.report.CampaignReport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code flexmargin campaign FILE}: a clearance campaign (matrix and Monte Carlo). */
@Command(name = "campaign", mixinStandardHelpOptions = true,
    description = {"Run a clearance campaign (docs/campaigns.md): every configuration x flight-condition set x "
        + "failure state x gain factor of the campaign file, for every Monte Carlo sample of the uncertain modal, "
        + "aerodynamic and loop parameters. Samples run on all local cores (or on Apache Spark with --engine "
        + "spark under spark-submit); each finished sample is appended to the output folder at once, and a run "
        + "started again on the same folder resumes where it stopped. Writes samples.csv, margins.csv, "
        + "summary.json, campaign.html, charts and the worst samples as case files (exit 3 when some sample is "
        + "not cleared)."},
    footer = {"", "Examples:", "  flexmargin campaign mode-tables/demo/demo-campaign.json",
        "  flexmargin campaign my-campaign.json --out /tmp/campaign --threads 2"})
final class CampaignCommand implements Callable<Integer> {
  @Parameters(index = "0", paramLabel = "FILE", description = "Campaign file (JSON).")
  Path file;

  @Option(names = "--out", paramLabel = "DIR",
      description = "Output folder (default: reports/<campaign name>). New, empty, or the folder of an earlier "
          + "run of the same campaign, which is resumed.")
  Path out;

  @Option(names = "--engine", paramLabel = "local|spark", defaultValue = "local",
      description = "Where samples run: local worker threads (default), or Apache Spark tasks (inside "
          + "spark-submit; README, 'Campaigns on Spark').")
  String engine;

  @Mixin CommonOptions common;
  @Mixin WorkOptions work;

  @Spec picocli.CommandLine.Model.CommandSpec spec;

  @Override
  public Integer call() throws IOException {
    if (!engine.equals("local") && !engine.equals("spark")) {
      throw new InvalidInputException("--engine", "local or spark", "\"" + engine + "\"");
    }
    CampaignSpec c = CampaignReader.read(file);
    c.baseCase().warnings().forEach(w -> spec.commandLine().getErr().println("flexmargin: warning: " + w.message()));
    Path target = out != null ? out : Path.of("reports", c.name());
    checkFolder(target);
    PrintWriter o = spec.commandLine().getOut();
    PrintWriter err = spec.commandLine().getErr();
    CampaignPlan plan = new CampaignPlan(c);
    Path base = file.toAbsolutePath().normalize().getParent().resolve(c.baseCaseFile()).normalize();
    long start = System.nanoTime();
    List<SampleOutcome> outcomes;
    if (!common.quiet) {
      o.printf(Locale.ROOT, "campaign %s: %d cells x %d samples = %d samples on %s%n", c.name(), c.cellCount(),
          c.samples(), plan.taskCount(), engine.equals("spark") ? "Apache Spark" : work.threads + " thread(s)");
      o.flush();
    }
    Path scratch = Files.createTempDirectory("flexmargin-campaign-");
    try (CampaignStore store = new CampaignStore(target, plan, key(file, c))) {
      int resumed = store.done().size();
      if (resumed > 0 && !common.quiet) {
        o.println("resuming: " + resumed + " sample(s) already done in " + target);
        o.flush();
      }
      if (engine.equals("spark")) {
        outcomes = org.flexmargin.campaign.spark.SparkEngine.run(file.toAbsolutePath().normalize(), plan, store);
      } else {
        boolean terminal = System.console() != null && !common.quiet;
        Bar bar = new Bar(err, terminal, resumed);
        outcomes = new LocalEngine(work.threads).run(new SampleRunner(plan, base, scratch), store, bar);
      }
      store.writeSorted(outcomes);
    } catch (IllegalStateException e) {
      throw new InvalidInputException("--out", "a new folder or one of this campaign", e.getMessage());
    } finally {
      deleteTree(scratch);
    }
    CampaignSummary summary = CampaignSummary.of(plan, outcomes);
    List<String> worstFiles = writeWorst(plan, base, target, summary);
    CampaignReport.write(target, plan, summary, outcomes, worstFiles);
    double elapsed = (System.nanoTime() - start) * 1e-9;
    if (!common.quiet) {
      summary(o, plan, summary, worstFiles, elapsed);
      o.println("results written to " + target.toAbsolutePath().normalize() + " (report: "
          + target.toAbsolutePath().normalize().resolve("campaign.html") + ")");
      Tables.cautions(o);
    }
    return summary.overall().passed() == summary.overall().samples() ? FlexMargin.EXIT_OK
        : FlexMargin.EXIT_REQUIREMENTS_VIOLATED;
  }

  /** Refuses a folder that is neither new, empty, nor a campaign folder. */
  private static void checkFolder(Path target) throws IOException {
    if (Files.isRegularFile(target)) {
      throw new InvalidInputException("--out", "a folder", "the file " + target);
    }
    if (!Files.isDirectory(target) || Files.exists(target.resolve(CampaignStore.KEY_FILE))) {
      return;
    }
    try (Stream<Path> s = Files.list(target)) {
      if (s.findAny().isPresent()) {
        throw new InvalidInputException("--out", "a new folder, an empty one or one of an earlier campaign run",
            "the folder " + target + " with other files in it (left untouched)");
      }
    }
  }

  /** @return the identity of the campaign: SHA-256 over the campaign file and every file of its base case */
  static String key(Path file, CampaignSpec c) {
    try {
      MessageDigest md = MessageDigest.getInstance("SHA-256");
      md.update(Files.readAllBytes(file));
      for (InputFile f : c.baseCase().inputs()) {
        md.update(f.sha256().getBytes(StandardCharsets.UTF_8));
      }
      return HexFormat.of().formatHex(md.digest());
    } catch (IOException e) {
      throw new UncheckedIOException("cannot read " + file, e);
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException(e);
    }
  }

  private static List<String> writeWorst(CampaignPlan plan, Path base, Path target, CampaignSummary s)
      throws IOException {
    Path folder = target.resolve("worst");
    deleteTree(folder);
    List<String> files = new ArrayList<>();
    if (s.worst().isEmpty()) {
      return files;
    }
    Files.createDirectories(folder);
    SampleRunner writer = new SampleRunner(plan, base, folder);
    for (SampleOutcome o : s.worst()) {
      files.add(target.relativize(writer.writeCase(o.task(), folder)).toString().replace('\\', '/'));
    }
    return files;
  }

  private static void summary(PrintWriter o, CampaignPlan plan, CampaignSummary s, List<String> worst, double t) {
    GroupSummary all = s.overall();
    o.printf(Locale.ROOT, "%n%-58s %8s %8s %9s  %s%n", "cell", "samples", "cleared", "P(clear)", "95 % interval");
    List<GroupSummary> rows = new ArrayList<>(s.cells());
    rows.add(all);
    for (GroupSummary g : rows) {
      o.printf(Locale.ROOT, "%-58s %8d %8d %8.1f%%  %.1f%% to %.1f%%%n", g.label(), g.samples(), g.passed(),
          100 * g.probabilityOfClearance(), 100 * g.clearanceInterval().low(), 100 * g.clearanceInterval().high());
    }
    if (all.errors() > 0) {
      o.println("warning: " + all.errors() + " sample(s) could not be computed and count as not cleared; first: task "
          + s.errors().get(0).task() + ": " + s.errors().get(0).governing());
    }
    if (!s.worst().isEmpty()) {
      o.println();
      o.println("worst samples (lowest first problem), each a case file that 'flexmargin sweep' reproduces:");
      for (int i = 0; i < s.worst().size(); i++) {
        SampleOutcome w = s.worst().get(i);
        o.printf(Locale.ROOT, "  task %d  %s  %s  %s  %s%n", w.task(), plan.cells().get(w.cell()).label(),
            w.status(), Double.isNaN(w.criticalEasMps()) ? "no problem in the sweep"
                : String.format(Locale.ROOT, "first problem at %.1f m/s EAS", w.criticalEasMps()),
            i < worst.size() ? worst.get(i) : "");
      }
    }
    long errors = s.errors().stream().filter(x -> x.status() == SampleStatus.ERROR).count();
    o.printf(Locale.ROOT, "%n%d samples in %.1f s (%d failed to compute)%n", all.samples(), t, errors);
  }

  private static void deleteTree(Path p) throws IOException {
    if (!Files.exists(p)) {
      return;
    }
    try (Stream<Path> s = Files.walk(p)) {
      for (Path f : s.sorted(java.util.Comparator.reverseOrder()).toList()) {
        Files.deleteIfExists(f);
      }
    }
  }

  /** One-line progress with the time left, on standard error, on terminals only. */
  private static final class Bar implements LocalEngine.Progress {
    private final PrintWriter err;
    private final boolean enabled;
    private final int resumed;
    private final long start = System.nanoTime();

    Bar(PrintWriter err, boolean enabled, int resumed) {
      this.err = err;
      this.enabled = enabled;
      this.resumed = resumed;
    }

    @Override
    public synchronized void sampleDone(int done, int total) {
      if (!enabled) {
        return;
      }
      double elapsed = (System.nanoTime() - start) * 1e-9;
      int fresh = done - resumed;
      double left = fresh > 0 ? elapsed / fresh * (total - done) : 0;
      int filled = (int) Math.round(28.0 * done / total);
      err.printf(Locale.ROOT, "\r[%s%s] %3d%%  %d/%d samples  %.0f s elapsed, about %.0f s left   ",
          "#".repeat(filled), "-".repeat(28 - filled), 100 * done / total, done, total, elapsed, left);
      if (done == total) {
        err.println();
      }
      err.flush();
    }
  }
}
