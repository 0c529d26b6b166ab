package org.flexmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.flexmargin.simulate.SharedModels;
import org.junit.jupiter.api.Test;

/** Report options carry the run's shared models through every change, and always have some. */
class ReportOptionsTest {
  @Test
  void modelsKeptThroughEveryChange() {
    SharedModels run = new SharedModels();
    ReportOptions o = new ReportOptions(SpeedAxisUnit.KNOTS, false).withModels(run);
    assertSame(run, o.models());
    assertSame(run, o.withProposedNotches(null).models());
    assertSame(run, o.withTimeDomainCheck(null).models());
    assertSame(run, o.withEnvelope(null).models());
    assertEquals(SpeedAxisUnit.KNOTS, o.withEnvelope(null).chartSpeedUnit());
    assertFalse(o.vectorCharts());
    assertTrue(ReportOptions.defaults().vectorCharts());
    assertNull(o.proposedNotches());
  }

  @Test
  void withoutModelsAFreshSetEachTime() {
    ReportOptions a = new ReportOptions(SpeedAxisUnit.METRES_PER_SECOND, true);
    ReportOptions b = new ReportOptions(SpeedAxisUnit.METRES_PER_SECOND, true);
    assertNotNull(a.models());
    assertNotSame(a.models(), b.models());
    assertEquals(0, a.models().size());
    assertNotNull(a.withModels(null).models());
    assertThrows(IllegalArgumentException.class, () -> new ReportOptions(null, true));
  }
}
