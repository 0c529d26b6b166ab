package org.flexmargin.sweep;

import java.util.List;
import java.util.function.IntFunction;
import java.util.stream.IntStream;

/**
 * Independent work items of a sweep (grid points, onset brackets) mapped in parallel, results in
 * item order. Called from a task of the {@link CaseSweep}'s work-stealing pool, the items run on
 * that pool (a parallel stream forks into the pool of the thread that starts it), so one pool of
 * {@code --threads} workers shares configurations, points and brackets; called from any other
 * thread they run on the common pool. Each item must be independent of the others, so that the
 * results are the same for any number of threads.
 */
final class SweepParallel {
  private SweepParallel() {}

  /**
   * @param count number of items
   * @param item computes item i (thread-safe, independent of other items)
   * @return the results in item order
   */
  static <T> List<T> map(int count, IntFunction<T> item) {
    return IntStream.range(0, count).parallel().mapToObj(item).toList();
  }
}
