package org.flexmargin.notch;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.flexmargin.loop.SisoFrequencyFunction;
import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;

/** Frequency grids, stored values and crossovers of sampled loops against hand-counted values. */
class LoopSamplesTest {
  private static final double TWO_PI = 2 * Math.PI;
  private static final SisoFrequencyFunction ZERO = ClosedForm.constant(0, 0);

  private static SampleLabel label(String c) {
    return new SampleLabel(c, 0, Double.NaN, Double.NaN, 1.0);
  }

  @Test
  void modeGridSpacingIsHalfTheDampingRatioClampedAndEndsOnTheBand() {
    LoopSamples.Builder b = LoopSamples.builder();
    // band 9..11 Hz: ln(11/9) = 0.2006707; zeta 0.01 -> step 0.005 -> ceil(40.13) + 1 = 42 points
    int g1 = b.modeGrid(10, 0.01, 0.1);
    // zeta 0.1 -> step clamped to 0.01 -> ceil(20.07) + 1 = 22
    int g2 = b.modeGrid(10, 0.1, 9, 11);
    // zeta 0.001 -> step clamped to 0.002 -> ceil(100.34) + 1 = 102
    int g3 = b.modeGrid(10, 0.001, 9, 11);
    // zeta 0.016 -> step 0.008 -> ceil(25.08) + 1 = 27 (inside the clamp)
    int g4 = b.modeGrid(10, 0.016, 9, 11);
    // rigid band 0.01..1 Hz: two decades at 60 per decade -> 121 points
    int r = b.rigidGrid(0.01, 1.0);
    // 0.01..0.5 Hz: log10(50) = 1.69897 decades -> ceil(101.94) + 1 = 103
    int r2 = b.rigidGrid(0.01, 0.5);
    // the band-fraction form again: 10 Hz +-10 %, the 9..11 Hz band
    int g5 = b.modeGrid(10, 0.01, 0.1);
    assertEquals(List.of(0, 1, 2, 3, 4, 5, 6), List.of(g1, g2, g3, g4, r, r2, g5));
    // the builder chains
    b.add(label("a"), ZERO, ClosedForm.constant(1, 0), List.of("m"), new int[] {g1}, r)
        .add(label("b"), ZERO, ClosedForm.constant(1, 0), List.of("m"), new int[] {g5}, r);
    LoopSamples s = b.build();
    int[] expected = {42, 22, 102, 27, 121, 103};
    for (int i = 0; i < expected.length; i++) {
      assertEquals(expected[i], s.grids().get(i).length, "grid " + i);
    }
    double[] w = s.grids().get(g1);
    assertEquals(TWO_PI * 9, w[0], 1e-12);
    assertEquals(TWO_PI * 11, w[w.length - 1], 1e-12);
    // logarithmic: constant ratio between neighbours, (11/9)^(1/41)
    double ratio = Math.pow(11.0 / 9.0, 1.0 / 41);
    for (int i = 1; i < w.length; i++) {
      assertEquals(ratio, w[i] / w[i - 1], 1e-12);
    }
    double[] rg = s.grids().get(r);
    assertEquals(TWO_PI * 0.01, rg[0], 1e-14);
    assertEquals(TWO_PI, rg[120], 1e-12);
    assertEquals(Math.pow(10, 1.0 / 60), rg[61] / rg[60], 1e-12);
    assertEquals(42, s.grids().get(g5).length);
    // stored values: two samples with one mode grid (42) and the rigid grid (121) each
    assertEquals(2 * (42 + 121), s.storedValues());
  }

  @Test
  void gridsAndSamplesAreValidated() {
    LoopSamples.Builder b = LoopSamples.builder();
    assertThrows(InvalidInputException.class, () -> b.modeGrid(0, 0.01, 1, 2));
    assertThrows(InvalidInputException.class, () -> b.modeGrid(Double.NaN, 0.01, 1, 2));
    assertThrows(InvalidInputException.class, () -> b.modeGrid(10, 0.01, 0, 2));
    assertThrows(InvalidInputException.class, () -> b.modeGrid(10, 0.01, 2, 2));
    assertThrows(InvalidInputException.class, () -> b.modeGrid(10, 0.01, 3, 2));
    assertThrows(InvalidInputException.class, () -> b.rigidGrid(0, 1));
    assertThrows(InvalidInputException.class, () -> b.rigidGrid(1, 1));
    assertThrows(InvalidInputException.class, () -> b.rigidGrid(2, 1));
    InvalidInputException empty = assertThrows(InvalidInputException.class, b::build);
    assertEquals("samples", empty.fieldPath());
    int g = b.modeGrid(10, 0.01, 0.1);
    int r = b.rigidGrid(0.01, 1);
    InvalidInputException e = assertThrows(InvalidInputException.class,
        () -> b.add(label("a"), ZERO, ZERO, List.of("m", "n"), new int[] {g}, r));
    assertEquals("sample.modes", e.fieldPath());
  }

  @Test
  void aVeryNarrowBandStillHasTwoPoints() {
    LoopSamples.Builder b = LoopSamples.builder();
    // ln(1.000001) / 0.01 -> ceil = 1, + 1 = 2 points
    int g = b.modeGrid(10, 0.05, 10, 10.00001);
    int r = b.rigidGrid(1, 1.0000001);
    b.add(label("a"), ZERO, ZERO, List.of("m"), new int[] {g}, r);
    LoopSamples s = b.build();
    assertEquals(2, s.grids().get(g).length);
    assertEquals(2, s.grids().get(r).length);
    assertEquals(4, s.storedValues());
  }

  @Test
  void modeNamesAreTheUnionInFirstSeenOrderAndLabelsAreKept() {
    LoopSamples.Builder b = LoopSamples.builder();
    int g = b.modeGrid(10, 0.02, 0.1);
    int h = b.modeGrid(20, 0.02, 0.1);
    int r = b.rigidGrid(0.01, 1);
    b.add(label("one"), ZERO, ZERO, List.of("wing", "fuselage"), new int[] {g, h}, r);
    b.add(label("two"), ZERO, ZERO, List.of("fin", "wing"), new int[] {h, g}, r);
    LoopSamples s = b.build();
    assertEquals(List.of("wing", "fuselage", "fin"), s.modeNames());
    assertEquals(2, s.size());
    assertEquals("two", s.label(1).configuration());
    assertArrayEquals(new int[] {2, 0}, s.samples().get(1).modeIndex);
    int ng = s.grids().get(g).length;
    int nh = s.grids().get(h).length;
    int nr = s.grids().get(r).length;
    assertEquals(2 * (ng + nh + nr), s.storedValues());
  }

  @Test
  void bothLoopPartsAreStoredOnTheirGrids() {
    LoopSamples.Builder b = LoopSamples.builder();
    int g = b.modeGrid(10, 0.02, 0.1);
    int r = b.rigidGrid(0.01, 1);
    // rest = 0.5 j w, path = 2 - j 0.25 w (closed-form values at every grid point)
    SisoFrequencyFunction rest = ClosedForm.power(0.5, 1);
    SisoFrequencyFunction path = (w, out) -> {
      out[0] = 2;
      out[1] = -0.25 * w;
    };
    b.add(label("a"), rest, path, List.of("m"), new int[] {g}, r);
    LoopSamples s = b.build();
    LoopSamples.Sample smp = s.samples().get(0);
    double[] w = s.grids().get(g);
    for (int i = 0; i < w.length; i++) {
      assertEquals(0, smp.restRe[0][i]);
      assertEquals(0.5 * w[i], smp.restIm[0][i]);
      assertEquals(2, smp.pathRe[0][i]);
      assertEquals(-0.25 * w[i], smp.pathIm[0][i]);
    }
    double[] wr = s.grids().get(r);
    for (int i = 0; i < wr.length; i++) {
      assertEquals(0, smp.rigidRestRe[i]);
      assertEquals(0.5 * wr[i], smp.rigidRestIm[i]);
      assertEquals(2, smp.rigidPathRe[i]);
      assertEquals(-0.25 * wr[i], smp.rigidPathIm[i]);
    }
  }

  @Test
  void crossoversOfTheSumAreTheClosedFormRootsOfItsMagnitude() {
    LoopSamples.Builder b = LoopSamples.builder();
    int r = b.rigidGrid(0.01, 5);
    // |L| = 1 + 0.5 sin(3 ln w) (a real, invented loop): |L| = 1 where 3 ln w = k pi, i.e.
    // w = exp(k pi / 3); over w in [0.0628, 31.4] (ln w in [-2.77, 3.45]) k = -2 .. 3. Split
    // between the two parts (0.25 in rest) so that only their sum crosses.
    SisoFrequencyFunction path = (w, out) -> {
      out[0] = 0.75 + 0.5 * Math.sin(3 * Math.log(w));
      out[1] = 0;
    };
    b.add(label("a"), ClosedForm.constant(0.25, 0), path, List.of(), new int[0], r);
    // a loop that never reaches 1 has none
    b.add(label("b"), ClosedForm.constant(0.25, 0), ClosedForm.constant(0.5, 0), List.of(), new int[0], r);
    LoopSamples s = b.build();
    double[] x = s.crossoversRadPerS(0);
    assertEquals(6, x.length);
    for (int k = -2; k <= 3; k++) {
      // Brent in ln w to 1e-10 absolute
      assertEquals(Math.exp(k * Math.PI / 3), x[k + 2], 1e-9 * x[k + 2]);
    }
    assertEquals(0, s.crossoversRadPerS(1).length);
    // a copy each time
    x[0] = -1;
    assertEquals(Math.exp(-2 * Math.PI / 3), s.crossoversRadPerS(0)[0], 1e-9);
  }

  @Test
  void aGridPointExactlyOnTheCrossoverIsThatCrossover() {
    LoopSamples.Builder b = LoopSamples.builder();
    int r = b.rigidGrid(0.01, 1);
    b.add(label("probe"), ZERO, ZERO, List.of(), new int[0], r);
    double w60 = b.build().grids().get(r)[60];
    // |L| = w / w60 is exactly 1 at grid point 60 (0.1 Hz), below 1 before it, above after
    b.add(label("a"), ZERO, (w, out) -> {
      out[0] = w / w60;
      out[1] = 0;
    }, List.of(), new int[0], r);
    double[] x = b.build().crossoversRadPerS(1);
    assertEquals(1, x.length);
    assertEquals(w60, x[0], 1e-12 * w60);
    assertEquals(TWO_PI * 0.1, x[0], 1e-12);
  }

  @Test
  void aNanLoopValueGivesNoCrossover() {
    LoopSamples.Builder b = LoopSamples.builder();
    int r = b.rigidGrid(0.01, 1);
    b.add(label("a"), ZERO, (w, out) -> {
      // NaN, then below 1, then NaN again: neither change is a crossing
      out[0] = w < 0.5 || w > 2 ? Double.NaN : 0.5;
      out[1] = 0;
    }, List.of(), new int[0], r);
    assertEquals(0, b.build().crossoversRadPerS(0).length);
  }
}
