package org.flexmargin.report;

import org.flexmargin.simulate.LoopComparison;
import org.flexmargin.simulate.SharedModels;

/**
 * How the human-readable report is drawn.
 *
 * @param chartSpeedUnit unit of the airspeed in the charts and tables of the page (data files
 *     stay in m/s)
 * @param vectorCharts whether to write an SVG copy of every chart beside the PNG
 * @param proposedNotches a notch design to show beside the case's own filters, or null
 * @param timeDomainCheck a doublet-and-gust simulation at V0max to show, or null
 * @param envelope a matched-point envelope to show, or null
 * @param models the run's configuration models, reused by the loop charts (a fresh set if null)
 */
public record ReportOptions(SpeedAxisUnit chartSpeedUnit, boolean vectorCharts, ProposedNotches proposedNotches,
    LoopComparison timeDomainCheck, EnvelopeReport.Data envelope, SharedModels models) {
  /** Validates. */
  public ReportOptions {
    if (chartSpeedUnit == null) {
      throw new IllegalArgumentException("chart speed unit is required");
    }
    models = models == null ? new SharedModels() : models;
  }

  /**
   * Options without a notch design.
   *
   * @param chartSpeedUnit unit of the airspeed in charts and tables
   * @param vectorCharts whether to write SVG copies
   */
  public ReportOptions(SpeedAxisUnit chartSpeedUnit, boolean vectorCharts) {
    this(chartSpeedUnit, vectorCharts, null, null, null, null);
  }

  /**
   * @param notches the design to show
   * @return these options with the design
   */
  public ReportOptions withProposedNotches(ProposedNotches notches) {
    return new ReportOptions(chartSpeedUnit, vectorCharts, notches, timeDomainCheck, envelope, models);
  }

  /**
   * @param check the simulation to show
   * @return these options with the time-domain check
   */
  public ReportOptions withTimeDomainCheck(LoopComparison check) {
    return new ReportOptions(chartSpeedUnit, vectorCharts, proposedNotches, check, envelope, models);
  }

  /**
   * @param data the envelope to show
   * @return these options with the envelope
   */
  public ReportOptions withEnvelope(EnvelopeReport.Data data) {
    return new ReportOptions(chartSpeedUnit, vectorCharts, proposedNotches, timeDomainCheck, data, models);
  }

  /**
   * @param shared the run's configuration models (e.g. those the time-domain check used)
   * @return these options drawing the loop charts from those models
   */
  public ReportOptions withModels(SharedModels shared) {
    return new ReportOptions(chartSpeedUnit, vectorCharts, proposedNotches, timeDomainCheck, envelope, shared);
  }

  /** @return EAS in m/s, SVG copies written */
  public static ReportOptions defaults() {
    return new ReportOptions(SpeedAxisUnit.METRES_PER_SECOND, true);
  }
}
