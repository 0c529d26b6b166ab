package org.flexmargin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** The campaign benchmark's linear projection of a 10 000-sample campaign from a measured run. */
class CampaignBenchProjectionTest {
  @Test
  void projectsLinearlyFromTheMeasuredRun() {
    // 400 samples in 60 s: 0.15 s each, x 10 000 = 1 500 s = 25 min
    CampaignBench.Projection p = new CampaignBench.Projection(400, 60.0);
    assertEquals(25.0, p.projectedMinutes(), 1e-12);
    // 25 min against 10 min
    assertEquals(2.5, p.ratioToTarget(), 1e-12);
    assertEquals("missed by a factor 2.50", p.verdict());
    // a run of the projected size is its own projection: 10 000 samples in 540 s = 9 min
    assertEquals(9.0, new CampaignBench.Projection(10_000, 540.0).projectedMinutes(), 1e-12);
  }

  @Test
  void saysByHowMuchTheTargetIsMet() {
    // 1 000 samples in 15 s: 150 s = 2.5 min for 10 000, a factor 4 below 10 min
    CampaignBench.Projection p = new CampaignBench.Projection(1000, 15.0);
    assertEquals(0.25, p.ratioToTarget(), 1e-12);
    assertEquals("met with a factor 4.00 to spare", p.verdict());
    // exactly on target: 10 000 samples in 600 s
    assertEquals("met with a factor 1.00 to spare", new CampaignBench.Projection(10_000, 600.0).verdict());
    // 100 samples in 12 s: 20 min, twice the target
    assertEquals("missed by a factor 2.00", new CampaignBench.Projection(100, 12.0).verdict());
  }

  @Test
  void refusesMeaninglessInput() {
    assertThrows(IllegalArgumentException.class, () -> new CampaignBench.Projection(0, 1.0));
    assertThrows(IllegalArgumentException.class, () -> new CampaignBench.Projection(10, -0.1));
    assertThrows(IllegalArgumentException.class, () -> new CampaignBench.Projection(10, Double.NaN));
    assertThrows(IllegalArgumentException.class,
        () -> new CampaignBench.Projection(10, Double.POSITIVE_INFINITY));
  }
}
