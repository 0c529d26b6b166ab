package org.flexmargin.campaign;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.stat.descriptive.rank.Percentile;
import org.junit.jupiter.api.Test;

/**
 * Bands over samples with hand-made margin curves: the stable samples' percentiles against Commons
 * Math's Percentile (definition R-7), and samples whose closed loop is unstable counted as margin lost.
 */
class MarginBandTest {
  private static final double[] GRID = {100, 110, 120, 130};

  /** Sample s: gain margin 20 - s/10 - speed/10 dB; closed-loop onset as given (NaN: none). */
  private static SampleOutcome sample(int s, double onsetEasMps) {
    double[] gm = new double[GRID.length];
    double[] pm = new double[GRID.length];
    for (int i = 0; i < GRID.length; i++) {
      gm[i] = 20 - s / 10.0 - GRID[i] / 10;
      pm[i] = i == 2 ? Double.NaN : 40 + s; // no gain crossover at 120 m/s
    }
    return new SampleOutcome(s, 0, s, SampleStatus.PASS, Double.NaN, Double.NaN, onsetEasMps, Double.NaN,
        onsetEasMps, "", new double[0], new MarginCurve(GRID, gm, pm));
  }

  private static double r7(double[] v, double p) {
    return new Percentile().withEstimationType(Percentile.EstimationType.R_7).evaluate(v, 100 * p);
  }

  @Test
  void stableSamplesGiveTheirPercentilesAndUnstableOnesEndTheLowerLines() {
    List<SampleOutcome> outcomes = new ArrayList<>();
    for (int s = 0; s < 40; s++) {
      // two samples unstable from 120 m/s, eighteen more from 130 m/s; the others stable
      double onset = s < 2 ? 115 : s < 20 ? 125 : Double.NaN;
      outcomes.add(sample(s, onset));
    }
    MarginBand b = MarginBand.of(outcomes, MarginCurve::gainMarginDb);
    assertArrayEquals(GRID, b.speedEasMps());
    assertArrayEquals(new int[] {0, 0, 2, 20}, b.unstable());
    assertArrayEquals(new int[] {40, 40, 40, 40}, b.counts());
    // all stable at 100 and 110 m/s: plain R-7 percentiles of the forty margins
    for (int i = 0; i < 2; i++) {
      double[] v = new double[40];
      for (int s = 0; s < 40; s++) {
        v[s] = 20 - s / 10.0 - GRID[i] / 10;
      }
      assertEquals(r7(v, 0.05), b.p5()[i], 1e-12);
      assertEquals(r7(v, 0.5), b.p50()[i], 1e-12);
      assertEquals(r7(v, 0.95), b.p95()[i], 1e-12);
    }
    // 120 m/s: 2 of 40 lost; h = 39 x 0.05 = 1.95 reaches the second lost sample: the 5 % line ends
    assertEquals(Double.NEGATIVE_INFINITY, b.p5()[2]);
    // the median is that of the values with the two lost ones as the lowest (R-7 with -1e9 in their place)
    double[] v = new double[40];
    for (int s = 0; s < 40; s++) {
      v[s] = s < 2 ? -1e9 : 20 - s / 10.0 - 12;
    }
    assertEquals(r7(v, 0.5), b.p50()[2], 1e-12);
    assertEquals(r7(v, 0.95), b.p95()[2], 1e-12);
    // 130 m/s: half lost; h = 19.5 lies between the 20th lost sample and the lowest stable one
    assertEquals(Double.NEGATIVE_INFINITY, b.p50()[3]);
    assertEquals(r7(lostAndStable(), 0.95), b.p95()[3], 1e-12);
  }

  /** 130 m/s: twenty lost (as -1e9) and the stable samples 20..39. */
  private static double[] lostAndStable() {
    double[] v = new double[40];
    for (int s = 0; s < 40; s++) {
      v[s] = s < 20 ? -1e9 : 20 - s / 10.0 - 13;
    }
    return v;
  }

  @Test
  void samplesWithoutTheMarginAreLeftOutButUnstableOnesCount() {
    List<SampleOutcome> outcomes = List.of(sample(0, Double.NaN), sample(1, 115), sample(2, Double.NaN));
    MarginBand b = MarginBand.of(outcomes, MarginCurve::phaseMarginDeg);
    // 120 m/s: no gain crossover in any sample; the unstable one still counts (lost)
    assertEquals(1, b.counts()[2]);
    assertEquals(1, b.unstable()[2]);
    assertEquals(Double.NEGATIVE_INFINITY, b.p50()[2]);
    // 110 m/s: all stable, phase margins 40, 41, 42
    assertEquals(41, b.p50()[1], 1e-12);
    assertEquals(40 + 0.1 * 1, b.p5()[1], 1e-12); // h = 2 x 0.05 = 0.1
  }

  @Test
  void noCurveGivesAnEmptyBandAndLengthsAreChecked() {
    MarginBand empty = MarginBand.of(List.of(), MarginCurve::gainMarginDb);
    assertEquals(0, empty.speedEasMps().length);
    double[] two = {1, 2};
    assertThrows(IllegalArgumentException.class,
        () -> new MarginBand(two, two, two, two, new int[2], new int[1]));
    assertThrows(IllegalArgumentException.class,
        () -> new MarginBand(two, new double[1], two, two, new int[2], new int[2]));
    assertEquals(Arrays.toString(new int[2]), Arrays.toString(new MarginBand(two, two, two, two, new int[2],
        new int[2]).unstable()));
  }
}
