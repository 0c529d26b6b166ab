package org.flexmargin.campaign;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.flexmargin.clearance.RankedFinding;
import org.flexmargin.io.CaseReader;
import org.flexmargin.io.CaseVariantWriter;
import org.flexmargin.io.InputFileException;
import org.flexmargin.loop.GainCrossover;
import org.flexmargin.loop.MarginOptions;
import org.flexmargin.loop.PhaseCrossover;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.CaseVariant;
import org.flexmargin.model.Configuration;
import org.flexmargin.sweep.CaseSweep;
import org.flexmargin.sweep.ConfigurationResult;
import org.flexmargin.sweep.Instability;
import org.flexmargin.sweep.LoopDetail;
import org.flexmargin.sweep.PlannedPath;
import org.flexmargin.sweep.ServoPoint;
import org.flexmargin.sweep.SweepProgress;

/**
 * Computes campaign samples: writes the sample's case as a plain case file (and its mode table)
 * into a scratch folder, reads it back like {@code sweep} does, analyses it and reduces the
 * result to a {@link SampleOutcome}. Samples whose strip-theory forces are the same share the
 * loop's interpolated forces ({@link SharedLoopAerodynamics}). A failing sample gives an
 * {@link SampleStatus#ERROR} outcome with the message, never an exception. Thread-safe: each call
 * uses its own scratch files.
 */
public final class SampleRunner {
  /**
   * Loop margin settings of a sample: the defaults without refining the peak gain and the disk
   * margin between grid points, which a sample reports neither of (its onsets, verdict and margin
   * curves do not depend on them; `SampleRunnerMarginsTest`). About 45 % of the margins' aircraft
   * solves at a point went to those two maximisations.
   */
  static final MarginOptions SAMPLE_MARGINS = MarginOptions.defaults().withoutExtremaRefinement();

  /**
   * Loop analysis of a sample: {@link #SAMPLE_MARGINS}, without the loop-at-a-time margins broken
   * at each feedback path, which a sample does not report and nothing it reports depends on
   * ({@link LoopDetail}; `SampleRunnerMarginsTest`).
   */
  static final LoopDetail SAMPLE_DETAIL = new LoopDetail(SAMPLE_MARGINS, false);

  private final CampaignPlan plan;
  private final CaseVariantWriter writer;
  private final Path scratch;
  private final SharedLoopAerodynamics models = new SharedLoopAerodynamics();

  /**
   * @param plan the campaign's tasks
   * @param baseCaseFile the base case file (absolute or relative to the working folder)
   * @param scratch an existing folder for the samples' case files (they are removed after use)
   */
  public SampleRunner(CampaignPlan plan, Path baseCaseFile, Path scratch) {
    this.plan = plan;
    this.writer = new CaseVariantWriter(baseCaseFile);
    this.scratch = scratch;
  }

  /** @return the number of distinct loop force sources shared between samples so far */
  int sharedLoopSources() {
    return models.size();
  }

  /** @return the plan */
  public CampaignPlan plan() {
    return plan;
  }

  /**
   * Writes task {@code task}'s case file (and mode table) into {@code folder}.
   *
   * @return the case file
   */
  public Path writeCase(int task, Path folder) {
    return writer.write(plan.variant(task), folder);
  }

  /** @return the outcome of task {@code task} */
  public SampleOutcome run(int task) {
    double[] draws = plan.draws(task);
    int cell = task / plan.spec().samples();
    int sample = plan.sampleOf(task);
    Path folder = null;
    try {
      CaseVariant v = plan.variant(task);
      folder = Files.createTempDirectory(scratch, "task" + task + "-");
      Path file = writer.write(v, folder);
      AnalysisCase c = CaseReader.read(file);
      Configuration cfg = c.configurations().get(0);
      ConfigurationResult r = CaseSweep.analyse(models.modelOf(cfg), cfg, new PlannedPath(c.sweep()), c,
          SweepProgress.NONE, SAMPLE_DETAIL);
      return outcome(task, cell, sample, draws, r);
    } catch (InputFileException e) {
      return error(task, cell, sample, draws, "perturbed input refused: " + e.getMessage());
    } catch (RuntimeException | IOException | StackOverflowError e) {
      return error(task, cell, sample, draws, e.getClass().getSimpleName() + ": " + e.getMessage());
    } finally {
      delete(folder);
    }
  }

  private static SampleOutcome error(int task, int cell, int sample, double[] draws, String message) {
    double nan = Double.NaN;
    return new SampleOutcome(task, cell, sample, SampleStatus.ERROR, nan, nan, nan, nan, nan,
        message.replace('\n', ' ').replace('\r', ' '), draws, MarginCurve.EMPTY);
  }

  static SampleOutcome outcome(int task, int cell, int sample, double[] draws, ConfigurationResult r) {
    double div = r.divergenceInstability().map(Instability::speedEasMps).orElse(Double.NaN);
    double ol = r.lowestOpenLoopFlutter().map(Instability::speedEasMps).orElse(Double.NaN);
    double cl = r.lowestClosedLoopInstability().map(Instability::speedEasMps).orElse(Double.NaN);
    double mo = Double.NaN;
    double failedFrom = Double.NaN;
    SampleStatus status;
    String governing;
    if (r.clearance() == null) {
      status = SampleStatus.NOT_JUDGED;
      governing = r.lowestInstability().map(Instability::describe).orElse("no instability in the sweep");
    } else {
      mo = r.clearance().marginOnsets().stream().mapToDouble(m -> m.condition().speedEasMps()).min()
          .orElse(Double.NaN);
      boolean passed = r.clearance().passed();
      status = !passed ? SampleStatus.FAIL
          : r.trackingTrustedUpToEasMps().isPresent() ? SampleStatus.UNRELIABLE : SampleStatus.PASS;
      governing = r.clearance().governingFinding().map(f -> f.describe()).orElse("");
      failedFrom = r.clearance().failures().stream().mapToDouble(RankedFinding::speedEasMps).min()
          .orElse(Double.NaN);
    }
    double critical = min(min(r.lowestInstability().map(Instability::speedEasMps).orElse(Double.NaN), mo),
        failedFrom);
    return new SampleOutcome(task, cell, sample, status, div, ol, cl, mo, critical, governing, draws, curve(r));
  }

  private static double min(double a, double b) {
    if (Double.isNaN(a)) {
      return b;
    }
    return Double.isNaN(b) ? a : Math.min(a, b);
  }

  private static MarginCurve curve(ConfigurationResult r) {
    if (r.servo() == null) {
      return MarginCurve.EMPTY;
    }
    List<ServoPoint> pts = r.servo().points();
    int n = pts.size();
    double[] v = new double[n];
    double[] gm = new double[n];
    double[] pm = new double[n];
    for (int i = 0; i < n; i++) {
      ServoPoint p = pts.get(i);
      v[i] = p.condition().speedEasMps();
      Optional<PhaseCrossover> g = p.margins().governingGainIncreaseMargin();
      gm[i] = g.map(PhaseCrossover::gainMarginDb).orElse(Double.NaN);
      Optional<GainCrossover> ph = p.margins().governingPhaseMargin();
      pm[i] = ph.map(x -> Math.abs(x.phaseMarginDeg())).orElse(Double.NaN);
    }
    return new MarginCurve(v, gm, pm);
  }

  private static void delete(Path folder) {
    if (folder == null) {
      return;
    }
    try (var files = Files.list(folder)) {
      for (Path f : (Iterable<Path>) files::iterator) {
        Files.deleteIfExists(f);
      }
      Files.deleteIfExists(folder);
    } catch (IOException e) {
      // best effort: a scratch file left behind is removed with the scratch folder
    }
  }
}
