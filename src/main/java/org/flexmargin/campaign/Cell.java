package org.flexmargin.campaign;

import java.util.Locale;
import org.flexmargin.model.CampaignCondition;
import org.flexmargin.model.FailureState;

/**
 * One cell of a campaign matrix.
 *
 * @param index cell index, configuration-major (configuration, flight condition, failure state,
 *     gain factor)
 * @param configuration configuration name
 * @param condition flight-condition set
 * @param failure failure state
 * @param gainFactor factor on the loop gains (dimensionless)
 */
public record Cell(int index, String configuration, CampaignCondition condition, FailureState failure,
    double gainFactor) {
  /** @return a short label: {@code configuration / condition / failure / x gain} */
  public String label() {
    return String.format(Locale.ROOT, "%s / %s / %s / gain x%s", configuration, condition.name(), failure.name(),
        trim(gainFactor));
  }

  private static String trim(double v) {
    String s = Double.toString(v);
    return s.endsWith(".0") ? s.substring(0, s.length() - 2) : s;
  }
}
