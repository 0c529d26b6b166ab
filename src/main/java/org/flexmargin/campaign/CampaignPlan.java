package org.flexmargin.campaign;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.CampaignCondition;
import org.flexmargin.model.CampaignSpec;
import org.flexmargin.model.CaseVariant;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.FailureState;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.SensorSpec;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.model.UncertainParameter;

/**
 * The tasks of a campaign: task {@code t} is Monte Carlo sample {@code t % samples} of matrix
 * cell {@code t / samples}. Builds each task's case as changes to the base case. Immutable and
 * thread-safe.
 */
public final class CampaignPlan {
  private final CampaignSpec spec;
  private final List<Cell> cells;
  private final Sampler sampler;
  private final Map<String, ModeTable> tables = new HashMap<>();

  /** @param spec a validated campaign */
  public CampaignPlan(CampaignSpec spec) {
    this.spec = spec;
    List<Cell> c = new ArrayList<>();
    for (String conf : spec.configurations()) {
      for (CampaignCondition cond : spec.conditions()) {
        for (FailureState f : spec.failureStates()) {
          for (double g : spec.gainFactors()) {
            c.add(new Cell(c.size(), conf, cond, f, g));
          }
        }
      }
    }
    this.cells = List.copyOf(c);
    this.sampler = new Sampler(spec.parameters(), spec.correlation(), spec.seed());
    for (Configuration conf : spec.baseCase().configurations()) {
      if (conf.structure() instanceof ModeTable mt) {
        tables.put(conf.name(), mt);
      }
    }
  }

  /** @return the campaign */
  public CampaignSpec spec() {
    return spec;
  }

  /** @return the matrix cells in task order */
  public List<Cell> cells() {
    return cells;
  }

  /** @return total number of tasks */
  public int taskCount() {
    return Math.toIntExact(spec.sampleCount());
  }

  /** @return the cell of task {@code task} */
  public Cell cellOf(int task) {
    return cells.get(task / spec.samples());
  }

  /** @return the Monte Carlo sample index of task {@code task} */
  public int sampleOf(int task) {
    return task % spec.samples();
  }

  /** @return the drawn parameter values of task {@code task}, in parameter order */
  public double[] draws(int task) {
    return sampler.draw(sampleOf(task));
  }

  /** @return the case name of task {@code task}'s sample */
  public String caseName(int task) {
    return String.format(Locale.ROOT, "%s-task%05d", spec.name(), task);
  }

  /**
   * @param task task index
   * @return the task's case as changes to the base case
   */
  public CaseVariant variant(int task) {
    Cell cell = cellOf(task);
    double[] v = draws(task);
    AnalysisCase base = spec.baseCase();
    ModeTable table = perturbed(tables.get(cell.configuration()), v, base);
    double aero = 1.0;
    double actuator = cell.failure().actuatorBandwidthFactor();
    double delay = cell.failure().addedDelayS();
    StringBuilder drawn = new StringBuilder();
    for (int i = 0; i < v.length; i++) {
      UncertainParameter p = spec.parameters().get(i);
      switch (p.quantity()) {
        case AERO_SCALE -> aero *= v[i];
        case ACTUATOR_BANDWIDTH -> actuator *= v[i];
        case ADDED_DELAY_S -> delay += v[i];
        default -> { }
      }
      drawn.append(i == 0 ? "" : ", ").append(p.name()).append(" = ").append(v[i]);
    }
    String description = String.format(Locale.ROOT,
        "Campaign %s, task %d: Monte Carlo sample %d (seed %d) of cell %s%s. Written by the campaign so that "
            + "'sweep' reproduces this sample exactly. Base case: %s",
        spec.name(), task, sampleOf(task), spec.seed(), cell.label(),
        drawn.length() == 0 ? "" : "; drawn " + drawn, base.description());
    return new CaseVariant(caseName(task), description, cell.configuration(), table, cell.condition().altitudeM(),
        cell.condition().machNumber(), spec.sweepPoints(), cell.failure().pathLost(), actuator, delay,
        cell.gainFactor(), aero);
  }

  /** @return {@code t} with the per-mode parameters applied */
  private ModeTable perturbed(ModeTable t, double[] v, AnalysisCase base) {
    List<String> sensorStations = base.loop() == null ? List.of()
        : base.loop().sensors().stream().map(SensorSpec::station).toList();
    List<ElasticMode> modes = new ArrayList<>();
    for (ElasticMode m : t.modes()) {
      double f = 1;
      double z = 1;
      double mass = 1;
      double shape = 1;
      for (int i = 0; i < v.length; i++) {
        UncertainParameter p = spec.parameters().get(i);
        if (!p.quantity().perMode() || !(p.modes().isEmpty() || p.modes().contains(m.name()))) {
          continue;
        }
        switch (p.quantity()) {
          case MODAL_FREQUENCY -> f *= v[i];
          case MODAL_DAMPING -> z *= v[i];
          case GENERALIZED_MASS -> mass *= v[i];
          default -> shape *= v[i];
        }
      }
      Map<String, ShapeValue> shapes = new HashMap<>(m.shapes());
      if (shape != 1) {
        for (String s : sensorStations) {
          ShapeValue sv = shapes.get(s);
          if (sv != null) {
            shapes.put(s, new ShapeValue(sv.displacementM() * shape, sv.rotationRad() * shape));
          }
        }
      }
      modes.add(new ElasticMode(m.name(), m.frequencyHz() * f, m.dampingRatio() * z, m.generalizedMassKg() * mass,
          shapes));
    }
    return new ModeTable(t.name(), modes);
  }
}
