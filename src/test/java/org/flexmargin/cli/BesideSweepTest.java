package org.flexmargin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;

/**
 * Work beside the sweep: on its own thread from two worker threads up, in the caller's thread
 * (when asked for) with one, its exceptions passed on unchanged, and stoppable.
 */
class BesideSweepTest {
  @Test
  void oneWorkerThreadRunsTheWorkInTheCallersThreadWhenAskedFor() {
    String[] ranOn = new String[1];
    BesideSweep<Integer> w = BesideSweep.start(() -> {
      ranOn[0] = Thread.currentThread().getName();
      return 42;
    }, 1, "beside");
    assertFalse(w.started());
    assertEquals(null, ranOn[0], "not run before it is asked for");
    assertEquals(42, w.join());
    assertEquals(Thread.currentThread().getName(), ranOn[0]);
    assertEquals(42, w.join(), "asked again, the same result");
  }

  @Test
  void twoWorkerThreadsStartTheWorkAtOnceOnItsOwnThread() throws InterruptedException {
    CountDownLatch running = new CountDownLatch(1);
    String[] ranOn = new String[1];
    boolean[] daemon = new boolean[1];
    BesideSweep<String> w = BesideSweep.start(() -> {
      ranOn[0] = Thread.currentThread().getName();
      daemon[0] = Thread.currentThread().isDaemon();
      running.countDown();
      return "done";
    }, 2, "beside the sweep");
    assertTrue(w.started());
    assertTrue(running.await(10, TimeUnit.SECONDS), "running before anyone asks");
    assertEquals("done", w.join());
    assertEquals("beside the sweep", ranOn[0]);
    assertTrue(daemon[0], "a daemon thread: it never keeps the program alive");
  }

  @Test
  void aCallerInterruptedWhileWaitingKeepsItsInterrupt() throws InterruptedException {
    CountDownLatch release = new CountDownLatch(1);
    BesideSweep<String> w = BesideSweep.start(() -> {
      try {
        release.await();
      } catch (InterruptedException e) {
        Thread.currentThread().interrupt();
      }
      return "late";
    }, 2, "beside");
    Thread.currentThread().interrupt();
    assertThrows(IllegalStateException.class, w::join);
    assertTrue(Thread.interrupted(), "the interrupt is kept (and cleared here)");
    release.countDown();
    assertEquals("late", w.join());
  }

  @Test
  void theWorksExceptionsArePassedOnUnchanged() {
    IllegalArgumentException bad = new IllegalArgumentException("no loop");
    for (int threads : new int[] {1, 3}) {
      BesideSweep<Object> w = BesideSweep.start(() -> {
        throw bad;
      }, threads, "beside");
      assertSame(bad, assertThrows(IllegalArgumentException.class, w::join));
    }
    AssertionError error = new AssertionError("broken");
    BesideSweep<Object> e = BesideSweep.start(() -> {
      throw error;
    }, 2, "beside");
    assertSame(error, assertThrows(AssertionError.class, e::join));
  }

  @Test
  void stoppedWorkIsInterrupted() throws InterruptedException {
    CountDownLatch running = new CountDownLatch(1);
    CountDownLatch interrupted = new CountDownLatch(1);
    BesideSweep<Object> w = BesideSweep.start(() -> {
      running.countDown();
      try {
        Thread.sleep(60_000);
      } catch (InterruptedException e) {
        interrupted.countDown();
      }
      return null;
    }, 2, "beside");
    assertTrue(running.await(10, TimeUnit.SECONDS));
    w.cancel();
    assertTrue(interrupted.await(10, TimeUnit.SECONDS), "the work's thread was interrupted");
    assertThrows(java.util.concurrent.CancellationException.class, w::join);
  }
}
