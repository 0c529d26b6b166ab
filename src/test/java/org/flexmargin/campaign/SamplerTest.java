package org.flexmargin.campaign;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.commons.math3.stat.correlation.PearsonsCorrelation;
import org.apache.commons.math3.stat.descriptive.moment.Mean;
import org.apache.commons.math3.stat.descriptive.moment.StandardDeviation;
import org.apache.commons.math3.stat.descriptive.rank.Median;
import org.flexmargin.model.Distribution;
import org.flexmargin.model.UncertainParameter;
import org.flexmargin.model.UncertainQuantity;
import org.junit.jupiter.api.Test;

/** Draws: reproducible per sample, distributed and correlated as asked. */
class SamplerTest {
  private static final List<UncertainParameter> PARAMS = List.of(
      new UncertainParameter("a", UncertainQuantity.MODAL_FREQUENCY, List.of(), new Distribution.Normal(1.0, 0.03)),
      new UncertainParameter("b", UncertainQuantity.MODAL_FREQUENCY, List.of(), new Distribution.Normal(2.0, 0.5)),
      new UncertainParameter("c", UncertainQuantity.AERO_SCALE, List.of(),
          new Distribution.TruncatedNormal(1.0, 0.1, 0.95, 1.2)),
      new UncertainParameter("d", UncertainQuantity.MODAL_DAMPING, List.of(), new Distribution.LogNormal(1.5, 0.3)),
      new UncertainParameter("e", UncertainQuantity.ADDED_DELAY_S, List.of(), new Distribution.Uniform(0, 0.004)));
  private static final double[][] CORR = {
      {1, 0.6, 0, 0, 0}, {0.6, 1, 0, 0, 0}, {0, 0, 1, 0, 0}, {0, 0, 0, 1, 0}, {0, 0, 0, 0, 1}};

  @Test
  void eachSampleDependsOnlyOnSeedAndIndex() {
    Sampler one = new Sampler(PARAMS, CORR, 42);
    Sampler other = new Sampler(PARAMS, CORR, 42);
    double[] late = other.draw(999);
    for (int s = 0; s < 5; s++) {
      other.draw(s);
    }
    assertArrayEquals(one.draw(999), late, 0.0);
    assertArrayEquals(one.draw(3), other.draw(3), 0.0);
    assertTrue(one.draw(3)[0] != new Sampler(PARAMS, CORR, 43).draw(3)[0]);
  }

  @Test
  void momentsCorrelationAndBoundsAsAsked() {
    int n = 20000;
    Sampler s = new Sampler(PARAMS, CORR, 7);
    double[][] cols = new double[5][n];
    for (int i = 0; i < n; i++) {
      double[] d = s.draw(i);
      for (int j = 0; j < 5; j++) {
        cols[j][i] = d[j];
      }
    }
    // sampling error of a mean is sd/sqrt(n); 4 standard errors is a tolerance that a correct
    // sampler fails with probability 6e-5 (normal theory)
    assertEquals(1.0, new Mean().evaluate(cols[0]), 4 * 0.03 / Math.sqrt(n));
    assertEquals(0.5, new StandardDeviation().evaluate(cols[1]), 4 * 0.5 / Math.sqrt(2.0 * n));
    // correlation: standard error (1 - r^2)/sqrt(n) for normal data
    assertEquals(0.6, new PearsonsCorrelation().correlation(cols[0], cols[1]), 4 * 0.64 / Math.sqrt(n));
    assertEquals(0.0, new PearsonsCorrelation().correlation(cols[0], cols[3]), 4 / Math.sqrt(n));
    // log-normal: the median is the given median (standard error of a median about 1.25 sd/sqrt(n) of ln x)
    assertEquals(Math.log(1.5), Math.log(new Median().evaluate(cols[3])), 4 * 1.25 * 0.3 / Math.sqrt(n));
    for (int i = 0; i < n; i++) {
      assertTrue(cols[2][i] >= 0.95 && cols[2][i] <= 1.2);
      assertTrue(cols[4][i] >= 0 && cols[4][i] <= 0.004);
    }
    // uniform mean (low + high)/2, sd (high - low)/sqrt(12)
    assertEquals(0.002, new Mean().evaluate(cols[4]), 4 * 0.004 / Math.sqrt(12.0 * n));
  }
}
