package org.flexmargin.report;

import java.util.List;

/**
 * The cautions every report, the README and the command-line summary carry. One source so that
 * they never drift apart.
 */
public final class Cautions {
  private Cautions() {}

  /** The cautions, one paragraph each. */
  public static final List<String> TEXT = List.of(
      "Analysis only. These results support, and never replace, ground vibration testing, structural "
          + "coupling (servo-elastic) ground tests, flight flutter testing with incremental envelope "
          + "expansion, and the approval of the responsible airworthiness authority.",
      "Results are only as good as the supplied mode tables, aerodynamic data and control-law model. "
          + "The clearance analysis is linear: actuator rate and position limits, freeplay, transonic and "
          + "other nonlinear effects are not modelled (the time-domain simulation adds actuator rate and "
          + "position limits only).",
      "Requirement presets are recalled from published specifications for convenience; the edition and "
          + "criteria that apply to a programme are set by its contract, its certification basis and "
          + "licensed engineering judgement. Follow the applicable airworthiness regulations.");
}
