package org.flexmargin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** The campaign benchmark's projection of a 10 000-sample campaign from the CPU time of one sample. */
class CampaignBenchProjectionTest {
  @Test
  void projectsFromCpuTimeSharedByTheCores() {
    // 0.3 s CPU x 10 000 samples = 3 000 s = 5/6 h of CPU; on 2 cores 1 500 s = 25 min elapsed
    CampaignBench.Projection p = new CampaignBench.Projection(0.3, 2);
    assertEquals(3000.0 / 3600, p.cpuHours(), 1e-12);
    assertEquals(1500.0 / 3600, p.elapsedHours(), 1e-12);
    // 10 min on 2 cores = 1 200 s of CPU for 10 000 samples: 0.12 s each
    assertEquals(0.12, p.targetCpuPerSampleS(), 1e-12);
    // 25 min against 10 min
    assertEquals(2.5, p.ratioToTarget(), 1e-12);
    assertEquals("missed by a factor 2.50", p.verdict());
  }

  @Test
  void saysByHowMuchTheTargetIsMet() {
    // 0.06 s x 10 000 / 4 cores = 150 s = 2.5 min: a factor 4 below 10 min
    CampaignBench.Projection p = new CampaignBench.Projection(0.06, 4);
    assertEquals(0.25, p.ratioToTarget(), 1e-12);
    assertEquals("met with a factor 4.00 to spare", p.verdict());
    // 0.24 s x 10 000 / 2 cores = 20 min: twice the target
    assertEquals("missed by a factor 2.00", new CampaignBench.Projection(0.24, 2).verdict());
  }

  @Test
  void refusesMeaninglessInput() {
    assertThrows(IllegalArgumentException.class, () -> new CampaignBench.Projection(-0.1, 2));
    assertThrows(IllegalArgumentException.class, () -> new CampaignBench.Projection(Double.NaN, 2));
    assertThrows(IllegalArgumentException.class, () -> new CampaignBench.Projection(0.1, 0));
  }
}
