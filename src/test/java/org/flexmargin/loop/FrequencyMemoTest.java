package org.flexmargin.loop;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.flexmargin.model.InvalidInputException;
import org.junit.jupiter.api.Test;

class FrequencyMemoTest {

  /** 1/(1 + j w) and w^2, written out: the values a memo must hand back unchanged. */
  private static void firstOrderAndSquare(double w, double[] out) {
    double d = 1 + w * w;
    out[0] = 1 / d;
    out[1] = -w / d;
    out[2] = w * w;
  }

  @Test
  void answersRepeatedFrequenciesFromTheMemoWithTheSourceValues() {
    int[] calls = {0};
    FrequencyMemo memo = new FrequencyMemo(3, 100_000, (w, out) -> {
      calls[0]++;
      firstOrderAndSquare(w, out);
    });
    double[] got = new double[3];
    double[] expected = new double[3];
    int n = 5000; // well past the initial table, so the memo grows several times
    for (int pass = 0; pass < 3; pass++) {
      for (int i = 0; i < n; i++) {
        double w = 0.01 * Math.pow(1.003, i);
        memo.valuesAt(w, got);
        firstOrderAndSquare(w, expected);
        for (int c = 0; c < 3; c++) {
          assertEquals(expected[c], got[c], 0.0, "value " + c + " at " + w + ", pass " + pass);
        }
      }
    }
    assertEquals(n, calls[0], "each distinct frequency evaluated once");
    assertEquals(n, memo.evaluations());
    assertEquals(n, memo.size());
  }

  @Test
  void neighbouringFrequenciesAreDistinctEntries() {
    FrequencyMemo memo = new FrequencyMemo(3, 16, FrequencyMemoTest::firstOrderAndSquare);
    double[] a = new double[3];
    double[] b = new double[3];
    memo.valuesAt(2.0, a);
    memo.valuesAt(Math.nextUp(2.0), b);
    assertEquals(2, memo.evaluations());
    // w^2 at the next double differs from 4 (closed form: (2 + ulp)^2 = 4 + 4 ulp + ...)
    assertEquals(4.0, a[2], 0.0);
    assertEquals(Math.nextUp(2.0) * Math.nextUp(2.0), b[2], 0.0);
  }

  @Test
  void aFullMemoStartsAgainAndStillAnswersCorrectly() {
    FrequencyMemo memo = new FrequencyMemo(3, 4, FrequencyMemoTest::firstOrderAndSquare);
    double[] v = new double[3];
    for (int i = 1; i <= 4; i++) {
      memo.valuesAt(i, v);
    }
    assertEquals(4, memo.size());
    memo.valuesAt(4, v); // held
    assertEquals(4, memo.evaluations());
    memo.valuesAt(5, v); // the memo is full: emptied, then holds w = 5
    assertEquals(1, memo.size());
    assertEquals(25.0, v[2], 0.0);
    memo.valuesAt(1, v); // evaluated again
    assertEquals(6, memo.evaluations());
    assertEquals(0.5, v[0], 0.0); // 1/(1 + 1)
    assertEquals(-0.5, v[1], 0.0);
    memo.valuesAt(5, v);
    assertEquals(6, memo.evaluations());
    assertEquals(25.0, v[2], 0.0);
    memo.valuesAt(3, v); // held before the memo was emptied, not since
    assertEquals(7, memo.evaluations());
    assertEquals(9.0, v[2], 0.0);
  }

  @Test
  void theSmallestMemoHoldsOneValueOfOneFrequency() {
    int[] calls = {0};
    FrequencyMemo memo = new FrequencyMemo(1, 1, (w, out) -> {
      calls[0]++;
      out[0] = 3 * w;
    });
    double[] v = new double[1];
    memo.valuesAt(2, v);
    memo.valuesAt(2, v);
    assertEquals(6.0, v[0], 0.0);
    memo.valuesAt(3, v); // replaces w = 2
    memo.valuesAt(2, v);
    assertEquals(6.0, v[0], 0.0);
    assertEquals(3, calls[0]);
    assertEquals(1, memo.size());
  }

  @Test
  void rejectsAnEmptyWidthCapacityOrSource() {
    FrequencyMemo.Source s = FrequencyMemoTest::firstOrderAndSquare;
    assertThrows(InvalidInputException.class, () -> new FrequencyMemo(0, 4, s));
    assertThrows(InvalidInputException.class, () -> new FrequencyMemo(3, 0, s));
    assertThrows(InvalidInputException.class, () -> new FrequencyMemo(3, 4, null));
  }
}
