package org.flexmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Numbers in the report's tables: fixed decimals, no minus sign on a value shown as zero. */
class NumberTextTest {
  @Test
  void zeroIsShownWithoutASign() {
    assertEquals("0.0", OpenLoopSections.fmt(-0.02, 1));
    assertEquals("0.00", OpenLoopSections.fmt(-0.0, 2));
    assertEquals("0", OpenLoopSections.fmt(-0.4, 0));
    assertEquals("-0.1", OpenLoopSections.fmt(-0.06, 1));
    assertEquals("-10.0", OpenLoopSections.fmt(-10.0, 1));
    assertEquals("-0.05", OpenLoopSections.fmt(-0.05, 2));
    assertEquals("2.50", OpenLoopSections.fmt(2.5, 2));
    assertEquals(OpenLoopSections.MISSING, OpenLoopSections.fmt(Double.NaN, 2));
  }
}
