package org.flexmargin.lattice;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.concurrent.ForkJoinPool;
import org.ejml.data.ZMatrixRMaj;
import org.flexmargin.model.FlowSymmetry;
import org.flexmargin.model.LiftingSurface;
import org.flexmargin.model.SurfacePoint;
import org.junit.jupiter.api.Test;

/** Assembly properties of the influence matrix (row blocks in parallel, shared end points). */
class InfluenceMatrixTest {
  private static final LiftingSurface WING = new LiftingSurface(
      "wing", new SurfacePoint(0, 0, 0), 1.2, new SurfacePoint(0.9, 3, 0.4), 0.6, 4, 10);

  @Test
  void sameMatrixOnOneThreadAndOnAll() throws Exception {
    // each row is computed on its own, so the thread count cannot change a single bit
    BoxLattice l = new BoxLattice(List.of(WING), FlowSymmetry.SYMMETRIC);
    ZMatrixRMaj all = new ZMatrixRMaj(1, 1);
    ZMatrixRMaj one = new ZMatrixRMaj(1, 1);
    InfluenceMatrix.build(l, 1.7, 0.6, all);
    ForkJoinPool pool = new ForkJoinPool(1);
    try {
      pool.submit(() -> InfluenceMatrix.build(l, 1.7, 0.6, one)).get();
    } finally {
      pool.shutdown();
    }
    assertArrayEquals(all.data, one.data);
  }

  @Test
  void wingSplitInTwoSurfacesGivesTheSameMatrix() {
    // the same boxes given as one surface or as an inboard and an outboard surface: the end points
    // that neighbours share are found by their coordinates, within and across surfaces, so the
    // matrices agree to rounding (1e-12 of the largest entry; the split points are interpolated
    // separately and differ in the last bits)
    LiftingSurface in = new LiftingSurface(
        "in", new SurfacePoint(0, 0, 0), 1.2, new SurfacePoint(0.45, 1.5, 0.2), 0.9, 4, 5);
    LiftingSurface out = new LiftingSurface(
        "out", new SurfacePoint(0.45, 1.5, 0.2), 0.9, new SurfacePoint(0.9, 3, 0.4), 0.6, 4, 5);
    for (FlowSymmetry sym : FlowSymmetry.values()) {
      ZMatrixRMaj whole = new ZMatrixRMaj(1, 1);
      ZMatrixRMaj split = new ZMatrixRMaj(1, 1);
      InfluenceMatrix.build(new BoxLattice(List.of(WING), sym), 2.5, 0.3, whole);
      InfluenceMatrix.build(new BoxLattice(List.of(in, out), sym), 2.5, 0.3, split);
      double largest = 0, diff = 0;
      for (int i = 0; i < whole.data.length; i++) {
        largest = Math.max(largest, Math.abs(whole.data[i]));
        diff = Math.max(diff, Math.abs(whole.data[i] - split.data[i]));
      }
      assertTrue(diff < 1e-12 * largest, sym + ": " + diff + " of " + largest);
    }
  }
}
