package org.flexmargin.clearance;

import java.util.ArrayList;
import java.util.List;
import org.flexmargin.loop.ClosedLoopStability;
import org.flexmargin.loop.LinearBlock;
import org.flexmargin.loop.LoopMarginResult;
import org.flexmargin.loop.LoopMargins;
import org.flexmargin.loop.MeasuredResponse;
import org.flexmargin.loop.OpenLoops;
import org.flexmargin.loop.PadeOrder;
import org.flexmargin.loop.SisoFrequencyFunction;
import org.flexmargin.model.ClearanceRequirements;
import org.flexmargin.model.LoopFile;
import org.flexmargin.model.MeasuredTable;
import org.flexmargin.model.OpenLoopData;

/**
 * Margins, structural peaks and the requirements check of a loop given on its own ({@link
 * LoopFile}): the same {@link LoopMargins}, {@link StructuralPeakSearch} and {@link PointAssessor}
 * that judge the flexible aircraft in a sweep, applied to the file's loop at the file's airspeed.
 *
 * <p>A model loop (transfer function, zeros/poles/gain, state space) is analysed over the file's
 * frequency range, and its nominal closed-loop stability is checked on the state space with
 * order-{@value #PADE_ORDER} Padé approximations of the delay and the hold (the margins use the
 * exact responses). A measured response is analysed over the part of the range its table covers;
 * its closed-loop stability is not known from the response alone and is not checked. Without a
 * requirements table the structural peaks are judged with the common-practice limits (-6 dB,
 * 60 deg, +-10 %) and no verdict is given. Stateless.
 */
public final class LoopFileCheck {
  private LoopFileCheck() {}

  /** Order of the Padé approximations of delay and hold in the closed-loop stability check. */
  public static final int PADE_ORDER = 4;

  /**
   * The analysis of one loop response.
   *
   * @param label "model" or "measured" (or the caller's word), for tables and legends
   * @param loop the broken loop L(j w), negative-feedback convention
   * @param minFrequencyHz low end of the analysed range, Hz
   * @param maxFrequencyHz high end, Hz
   * @param margins gain, phase, delay and disk margins over the range
   * @param structuralModes the peak search of every mode of the file
   * @param assessment the requirements check, or null without a requirements table
   * @param notes what the reader must know (range cut to a table, stability not checked, ...)
   */
  public record Result(String label, SisoFrequencyFunction loop, double minFrequencyHz, double maxFrequencyHz,
      LoopMarginResult margins, List<StructuralModeAssessment> structuralModes, PointAssessment assessment,
      List<String> notes) {
    /** Copies. */
    public Result {
      structuralModes = List.copyOf(structuralModes);
      notes = List.copyOf(notes);
    }

    /** @return true without a requirements table, else whether every check passes */
    public boolean passed() {
      return assessment == null || assessment.passed();
    }
  }

  /**
   * Analyses the file's own loop.
   *
   * @param file the loop file
   * @return the analysis
   */
  public static Result analyse(LoopFile file) {
    PadeOrder pade = PadeOrder.ofDegree(PADE_ORDER);
    if (file.loop() instanceof OpenLoopData.Measured m) {
      return analyseResponse(file, "measured", OpenLoops.measuredLoop(file, pade), m.table());
    }
    LinearBlock block = OpenLoops.modelLoop(file, pade);
    LoopMarginResult margins = new LoopMargins().analyse(block, 2 * Math.PI * file.minFrequencyHz(),
        2 * Math.PI * file.maxFrequencyHz());
    List<String> notes = new ArrayList<>();
    if (file.delayS() > 0 || file.samplePeriodS() > 0) {
      notes.add("Margins use the exact delay and hold; the nominal closed-loop stability is checked on the state "
          + "space with order-" + PADE_ORDER + " Pade approximations of them.");
    }
    return finish(file, "model", block, file.minFrequencyHz(), file.maxFrequencyHz(), margins,
        margins.closedLoopStability(), notes);
  }

  /**
   * Analyses a measured open-loop response against the file's modes and requirements (for
   * example a ground-test response beside the model of the file). The table is taken as the
   * complete loop: the file's delay and hold are not applied to it.
   *
   * @param file the loop file (modes, requirements, airspeed, frequency range)
   * @param table the measured table
   * @return the analysis over the part of the file's range that the table covers
   */
  public static Result analyseMeasured(LoopFile file, MeasuredTable table) {
    return analyseResponse(file, "measured", OpenLoops.measured(table), table);
  }

  private static Result analyseResponse(LoopFile file, String label, SisoFrequencyFunction fn, MeasuredTable table) {
    MeasuredResponse m = OpenLoops.measured(table);
    double lo = Math.max(file.minFrequencyHz(), m.minFrequencyHz());
    double hi = Math.min(file.maxFrequencyHz(), m.maxFrequencyHz());
    if (!(hi > lo)) {
      throw new org.flexmargin.model.InvalidInputException("measured_response.frequency_hz",
          "a table overlapping the analysis range [" + file.minFrequencyHz() + ", " + file.maxFrequencyHz() + "] Hz",
          "a table from " + m.minFrequencyHz() + " to " + m.maxFrequencyHz() + " Hz");
    }
    List<String> notes = new ArrayList<>();
    notes.add(String.format(java.util.Locale.ROOT, "The %s response (%s, %d rows) is analysed from %.4g to %.4g Hz, "
        + "where its table has data; gain (dB) and phase are interpolated linearly in log frequency between rows.",
        label, table.source(), m.size(), lo, hi));
    notes.add("The nominal closed-loop stability of a measured response is not known from the response alone and "
        + "is not checked: the margins bound the tolerated gain and phase only if the closed loop is stable.");
    LoopMarginResult margins = new LoopMargins().analyse(fn, 2 * Math.PI * lo, 2 * Math.PI * hi,
        org.flexmargin.loop.Eigenvalues.none());
    return finish(file, label, fn, lo, hi, margins, ClosedLoopStability.NOT_CHECKED, notes);
  }

  private static Result finish(LoopFile file, String label, SisoFrequencyFunction fn, double lo, double hi,
      LoopMarginResult margins, ClosedLoopStability stability, List<String> notes) {
    ClearanceRequirements req = file.requirements();
    double limit = req == null ? ClearanceRequirements.DEFAULT_STRUCTURAL_PEAK_LIMIT_DB : req.structuralPeakLimitDb();
    double phase = req == null ? ClearanceRequirements.DEFAULT_PHASE_STABILISATION_MARGIN_DEG
        : req.phaseStabilisationMarginDeg();
    double u = req == null ? ClearanceRequirements.DEFAULT_FREQUENCY_UNCERTAINTY : req.frequencyUncertainty();
    List<ModeFrequency> modes = new ArrayList<>();
    List<StructuralModeAssessment> structural = new ArrayList<>();
    for (int i = 0; i < file.modes().size(); i++) {
      LoopFile.Mode mode = file.modes().get(i);
      if (mode.frequencyHz() * (1 - u) < lo || mode.frequencyHz() * (1 + u) > hi) {
        throw new org.flexmargin.model.InvalidInputException("structural_modes[" + i + "].frequency_hz",
            String.format(java.util.Locale.ROOT, "a mode whose band f (1 +- %.3g) lies inside the analysed range "
                + "[%.4g, %.4g] Hz", u, lo, hi), mode.frequencyHz() + " Hz");
      }
      ModeFrequency mf = new ModeFrequency(mode.name(), mode.frequencyHz());
      modes.add(mf);
      structural.add(StructuralPeakSearch.assess(mf, fn, limit, phase, u));
    }
    PointAssessment assessment = req == null ? null
        : PointAssessor.assess(req, file.speedEasMps(), file.bandEdgeHz(), margins, stability, modes, fn);
    if (req == null) {
      notes.add("No requirements table: margins and structural peaks are reported without a verdict (peaks judged "
          + "with the common-practice -6 dB, 60 deg and +-10 % band).");
    }
    return new Result(label, fn, lo, hi, margins, structural, assessment, notes);
  }
}
