package org.flexmargin.campaign;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * Runs the samples of a campaign that are not done yet on local worker threads, appending each
 * finished sample to the store as it completes.
 */
public final class LocalEngine {
  /** Told of each finished sample: samples done so far (resumed ones included) and in all. */
  @FunctionalInterface
  public interface Progress {
    /** @param done samples done @param total samples in all */
    void sampleDone(int done, int total);
  }

  private final int threads;

  /** @param threads worker threads, &gt;= 1 */
  public LocalEngine(int threads) {
    if (threads < 1) {
      throw new IllegalArgumentException("threads must be >= 1, got " + threads);
    }
    this.threads = threads;
  }

  /**
   * @param runner computes one sample
   * @param store done samples and where new ones go
   * @param progress told of each finished sample (from worker threads)
   * @return every outcome of the campaign, in task order
   */
  public List<SampleOutcome> run(SampleRunner runner, CampaignStore store, Progress progress) {
    int total = runner.plan().taskCount();
    Map<Integer, SampleOutcome> done = store.done();
    AtomicInteger count = new AtomicInteger(done.size());
    ExecutorService pool = Executors.newFixedThreadPool(threads);
    try {
      List<Future<SampleOutcome>> futures = new ArrayList<>();
      for (int t = 0; t < total; t++) {
        if (done.containsKey(t)) {
          continue;
        }
        int task = t;
        futures.add(pool.submit(() -> {
          SampleOutcome o = runner.run(task);
          store.append(o);
          progress.sampleDone(count.incrementAndGet(), total);
          return o;
        }));
      }
      for (Future<SampleOutcome> f : futures) {
        SampleOutcome o = f.get();
        done.put(o.task(), o);
      }
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      throw new IllegalStateException("campaign interrupted", e);
    } catch (ExecutionException e) {
      throw e.getCause() instanceof RuntimeException re ? re : new IllegalStateException(e.getCause());
    } finally {
      pool.shutdownNow();
    }
    return new ArrayList<>(done.values());
  }
}
