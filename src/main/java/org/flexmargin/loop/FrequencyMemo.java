package org.flexmargin.loop;

import java.util.Arrays;

/**
 * Memo of a vector-valued function of frequency: the source is evaluated once per exact frequency
 * value (compared bit for bit) and later requests at the same frequency are answered from the
 * memo. Since the source is deterministic, an answer from the memo is the very value a new
 * evaluation would give; only the work is saved. Used where several searches sample the same
 * response at the same frequencies (grid points shared by several loops, the ends of a root
 * bracket, the start of a maximisation).
 *
 * <p>Open addressing with linear probing on the frequency's bits; the values are kept in one flat
 * array, so nothing is allocated per request once the memo has grown. When {@code capacity}
 * frequencies are held the memo is emptied and starts again (bounded memory for long-lived
 * users). A workspace: not thread-safe.
 */
public final class FrequencyMemo {
  /** A vector-valued function of frequency. */
  @FunctionalInterface
  public interface Source {
    /**
     * @param omegaRadPerS frequency, rad/s
     * @param out receives the values (length at least the memo's width)
     */
    void evaluate(double omegaRadPerS, double[] out);
  }

  private static final int INITIAL_TABLE = 1 << 10;

  private final Source source;
  private final int width;
  private final int capacity;
  /** Frequency bits per stored entry. */
  private long[] keys = new long[INITIAL_TABLE / 2];
  /** Stored values, entry e at [e width, (e + 1) width). */
  private double[] values;
  /** Hash table: entry index + 1, 0 for an empty slot; length a power of two. */
  private int[] table = new int[INITIAL_TABLE];
  private int size;
  private long evaluations;

  /**
   * @param width number of values per frequency (&gt;= 1)
   * @param capacity largest number of frequencies held before the memo is emptied (&gt;= 1)
   * @param source the function
   */
  public FrequencyMemo(int width, int capacity, Source source) {
    StateSpace.require(width >= 1, "memo_width", ">= 1", String.valueOf(width));
    StateSpace.require(capacity >= 1, "memo_capacity", ">= 1", String.valueOf(capacity));
    StateSpace.require(source != null, "memo_source", "a function", "null");
    this.width = width;
    this.capacity = capacity;
    this.source = source;
    this.values = new double[keys.length * width];
  }

  /**
   * Copies the values at w into out, evaluating the source only if w has not been asked for
   * since the memo was last emptied.
   *
   * @param omegaRadPerS frequency, rad/s
   * @param out receives the values (length at least the width)
   */
  public void valuesAt(double omegaRadPerS, double[] out) {
    long bits = Double.doubleToRawLongBits(omegaRadPerS);
    int mask = table.length - 1;
    for (int slot = hash(bits) & mask; table[slot] != 0; slot = (slot + 1) & mask) {
      int e = table[slot] - 1;
      if (keys[e] == bits) {
        System.arraycopy(values, e * width, out, 0, width);
        return;
      }
    }
    source.evaluate(omegaRadPerS, out);
    evaluations++;
    if (size == capacity) {
      clear();
    } else if (2 * (size + 1) > table.length) {
      grow();
    }
    if (size == keys.length) {
      keys = Arrays.copyOf(keys, 2 * size);
      values = Arrays.copyOf(values, 2 * size * width);
    }
    keys[size] = bits;
    System.arraycopy(out, 0, values, size * width, width);
    table[findEmpty(bits)] = ++size;
  }

  /** @return evaluations of the source so far (requests answered from the memo not counted) */
  public long evaluations() {
    return evaluations;
  }

  /** @return frequencies held */
  public int size() {
    return size;
  }

  private void clear() {
    Arrays.fill(table, 0);
    size = 0;
  }

  private void grow() {
    table = new int[2 * table.length];
    for (int e = 0; e < size; e++) {
      table[findEmpty(keys[e])] = e + 1;
    }
  }

  private int findEmpty(long bits) {
    int mask = table.length - 1;
    int slot = hash(bits) & mask;
    while (table[slot] != 0) {
      slot = (slot + 1) & mask;
    }
    return slot;
  }

  private static int hash(long bits) {
    long h = bits * 0x9E3779B97F4A7C15L;
    return (int) (h ^ (h >>> 32));
  }
}
