package org.flexmargin.model;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The fit settings as the report's provenance table states them. */
class RationalFitSettingsWordsTest {

  @Test
  void defaultsSayWhatTheAnalysisChooses() {
    assertEquals("Roger form, 4 lag roots (automatic), k from 0.0 to the analysis's choice, 31 points, "
        + "uniform weighting", RationalFitSettings.defaults().words());
  }

  @Test
  void explicitSettingsAreListed() {
    RationalFitSettings s = new RationalFitSettings(RationalFitForm.MINIMUM_STATE, RationalFitSettings.AUTOMATIC,
        new double[] {0.1, 0.4}, 0.05, 2.0, 40, FitWeighting.INVERSE_MAGNITUDE);
    assertEquals("minimum-state (Karpel) form, 2 lag roots (0.1, 0.4), k from 0.05 to 2.0, 40 points, "
        + "inverse magnitude weighting", s.words());
    RationalFitSettings counted = new RationalFitSettings(RationalFitForm.ROGER, 6, null, 0.0, Double.NaN, 31,
        FitWeighting.ELEMENT);
    assertEquals("Roger form, 6 lag roots, k from 0.0 to the analysis's choice, 31 points, element weighting",
        counted.words());
    RationalFitSettings automatic = new RationalFitSettings(RationalFitForm.MINIMUM_STATE,
        RationalFitSettings.AUTOMATIC, null, 0.0, Double.NaN, 31, FitWeighting.UNIFORM);
    assertEquals("minimum-state (Karpel) form, 2 lag roots per coordinate (automatic), k from 0.0 to the "
        + "analysis's choice, 31 points, uniform weighting", automatic.words());
  }
}
