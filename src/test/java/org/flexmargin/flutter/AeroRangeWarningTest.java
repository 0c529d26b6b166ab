package org.flexmargin.flutter;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The warning for aerodynamic data used outside their reduced-frequency range [k_min, k_max]: data
 * used at the table ends themselves are inside the range; anything beyond either end is not.
 */
class AeroRangeWarningTest {

  private static final double K_MIN = 0.005;
  private static final double K_MAX = 2.0;

  private static List<String> warnings(double usedMin, double usedMax) {
    AeroelasticSystem sys = PkClosedFormTest.system(PkClosedFormTest.F_HZ, PkClosedFormTest.Q0,
        PkClosedFormTest.D, K_MIN, K_MAX);
    SolveCounters counters = new SolveCounters();
    counters.noteReducedFrequency(usedMin);
    counters.noteReducedFrequency(usedMax);
    List<String> out = new ArrayList<>();
    PkMethod.addRangeWarning(sys, counters, out);
    return out;
  }

  @Test
  void dataUsedExactlyAtTheTableEndsAreInsideTheRange() {
    assertEquals(List.of(), warnings(K_MIN, K_MAX));
    assertEquals(List.of(), warnings(0.1, 1.0));
  }

  @Test
  void dataUsedBeyondEitherEndAreReportedWithTheRangeNeeded() {
    List<String> low = warnings(Math.nextDown(K_MIN), K_MAX);
    assertEquals(1, low.size());
    assertTrue(low.get(0).contains("[0.005000, 2.000]"), low.get(0));
    List<String> high = warnings(K_MIN, 2.5);
    assertEquals(1, high.size());
    assertTrue(high.get(0).contains("k from 0.005000 to 2.500 was needed"), high.get(0));
  }
}
