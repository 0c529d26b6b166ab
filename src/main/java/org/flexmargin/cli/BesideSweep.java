package org.flexmargin.cli;

import java.util.concurrent.ExecutionException;
import java.util.concurrent.FutureTask;
import java.util.function.Supplier;

/**
 * Work that does not need the sweep's result (the report's time-domain check), run beside the
 * sweep. With two or more worker threads it starts at once on one extra thread, and so fills the
 * cores the sweep leaves idle between its parallel stages; with one worker thread it runs in the
 * caller's thread when its result is asked for, so that {@code --threads 1} stays one thread. The
 * result is the same either way: the work shares nothing with the sweep.
 *
 * @param <T> the result
 */
final class BesideSweep<T> {
  private final FutureTask<T> task;
  private final boolean started;

  private BesideSweep(FutureTask<T> task, boolean started) {
    this.task = task;
    this.started = started;
  }

  /**
   * @param work the work
   * @param threads the sweep's worker threads
   * @param name the extra thread's name
   * @return the work, started on its own thread if {@code threads >= 2}
   */
  static <T> BesideSweep<T> start(Supplier<T> work, int threads, String name) {
    FutureTask<T> task = new FutureTask<>(work::get);
    boolean beside = threads >= 2;
    if (beside) {
      Thread t = new Thread(task, name);
      t.setDaemon(true);
      t.start();
    }
    return new BesideSweep<>(task, beside);
  }

  /** @return whether the work runs on its own thread */
  boolean started() {
    return started;
  }

  /**
   * Waits for the work (runs it here if it was not started).
   *
   * @return its result
   * @throws RuntimeException the work's own unchecked exceptions and errors, unchanged
   */
  T join() {
    if (!started) {
      task.run();
    }
    try {
      return task.get();
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      throw new IllegalStateException("interrupted while waiting for " + task, e);
    } catch (ExecutionException e) {
      if (e.getCause() instanceof RuntimeException re) {
        throw re;
      }
      if (e.getCause() instanceof Error err) {
        throw err;
      }
      throw new IllegalStateException(e.getCause());
    }
  }

  /** Stops the work if it is still running (when the sweep failed and its result is not wanted). */
  void cancel() {
    task.cancel(true);
  }
}
