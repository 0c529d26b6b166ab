package org.flexmargin.cli;

import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.Locale;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ForkJoinPool;
import org.ejml.data.ZMatrixRMaj;
import org.ejml.dense.row.factory.LinearSolverFactory_ZDRM;
import org.ejml.interfaces.linsol.LinearSolverDense;
import org.flexmargin.lattice.BoxLattice;
import org.flexmargin.lattice.InfluenceMatrix;

/**
 * {@code flexmargin bench lattice}: the doublet-lattice influence matrix of 1,000 boxes (10 x 100,
 * {@link BenchScenario#latticeWing}) at omega / U = 1 rad/m (k = 0.5 on the 0.5 m semichord) and
 * M = 0.5: the build on one thread (thread
 * CPU time, so that other load on the machine counts as little as possible), the build on all
 * processors (wall time), and the complex LU factorisation (thread CPU time).
 */
final class LatticeBench {
  private LatticeBench() {}

  static void run(PrintWriter out, int repeats) {
    BoxLattice wing = BenchScenario.latticeWing(10, 100);
    double omegaOverU = 1.0;
    double mach = 0.5;
    ThreadMXBean threads = ManagementFactory.getThreadMXBean();
    ZMatrixRMaj d = new ZMatrixRMaj(1, 1);
    ForkJoinPool one = new ForkJoinPool(1);
    double single = Double.MAX_VALUE;
    double all = Double.MAX_VALUE;
    double lu = Double.MAX_VALUE;
    try {
      for (int r = 0; r < repeats + 1; r++) {
        double s = one.submit(() -> {
          long c0 = threads.getCurrentThreadCpuTime();
          InfluenceMatrix.build(wing, omegaOverU, mach, d);
          return (threads.getCurrentThreadCpuTime() - c0) * 1e-9;
        }).get();
        long w0 = System.nanoTime();
        InfluenceMatrix.build(wing, omegaOverU, mach, d);
        double a = (System.nanoTime() - w0) * 1e-9;
        ZMatrixRMaj a2 = d.copy();
        LinearSolverDense<ZMatrixRMaj> solver = LinearSolverFactory_ZDRM.lu(wing.size());
        long c0 = threads.getCurrentThreadCpuTime();
        solver.setA(a2);
        double f = (threads.getCurrentThreadCpuTime() - c0) * 1e-9;
        if (r > 0) { // the first round warms up
          single = Math.min(single, s);
          all = Math.min(all, a);
          lu = Math.min(lu, f);
        }
      }
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      return;
    } catch (ExecutionException e) {
      throw new IllegalStateException(e.getCause());
    } finally {
      one.shutdown();
    }
    out.printf(Locale.ROOT, "doublet lattice, %d boxes, k = 0.5, M = 0.5: influence matrix %.3f s on one "
        + "thread (CPU), %.3f s on %d processors (wall); complex LU %.3f s (CPU)%n",
        wing.size(), single, all, Runtime.getRuntime().availableProcessors(), lu);
  }
}
