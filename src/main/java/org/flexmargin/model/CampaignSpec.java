package org.flexmargin.model;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * A clearance campaign: a matrix of configurations x flight-condition sets x failure states x
 * gain factors, each cell run for every Monte Carlo sample of the uncertain parameters. Sample
 * {@code s} draws the same parameter values in every cell (common random numbers), from a
 * generator derived from {@code (seed, s)} alone.
 *
 * @param format campaign-file format version
 * @param name campaign name
 * @param description free text
 * @param baseCase the base case, read and validated
 * @param baseCaseFile the base case file as given (relative to the campaign file where it was)
 * @param configurations configuration names of the base case to run, in order, at least one
 * @param conditions flight-condition sets, at least one
 * @param failureStates failure states, at least one
 * @param gainFactors factors on every feedback path's gains (dimensionless, &gt; 0), at least one
 * @param sweepPoints grid points of each sample's sweep; 0 keeps the base case's
 * @param samples Monte Carlo samples per matrix cell, &gt;= 1 (1 and no parameters: a plain matrix)
 * @param seed seed of the sample generators
 * @param parameters uncertain parameters, names unique
 * @param correlation correlation matrix of the parameters' normal scores (row-major, n x n,
 *     symmetric, unit diagonal, positive definite); identity when uncorrelated
 * @param worstSamples how many of the worst samples to write as case files, &gt;= 0
 */
public record CampaignSpec(int format, String name, String description, AnalysisCase baseCase,
    String baseCaseFile, List<String> configurations, List<CampaignCondition> conditions,
    List<FailureState> failureStates, List<Double> gainFactors, int sweepPoints, int samples, long seed,
    List<UncertainParameter> parameters, double[][] correlation, int worstSamples) {
  /** Validates and copies. */
  public CampaignSpec {
    Checks.atLeast("format", format, 1);
    Checks.name("name", name);
    description = description == null ? "" : description;
    if (baseCase == null) {
      throw new InvalidInputException("base_case", "a case file", "nothing");
    }
    configurations = Checks.nonEmpty("matrix.configurations", configurations);
    conditions = Checks.nonEmpty("matrix.flight_conditions", conditions);
    failureStates = Checks.nonEmpty("matrix.failure_states", failureStates);
    gainFactors = Checks.nonEmpty("matrix.gain_factors", gainFactors);
    for (int i = 0; i < gainFactors.size(); i++) {
      Checks.positive("matrix.gain_factors[" + i + "]", gainFactors.get(i));
    }
    unique("matrix.flight_conditions", conditions.stream().map(CampaignCondition::name).toList());
    unique("matrix.failure_states", failureStates.stream().map(FailureState::name).toList());
    unique("matrix.configurations", configurations);
    if (sweepPoints != 0) {
      Checks.atLeast("sweep_points", sweepPoints, 2);
    }
    Checks.atLeast("monte_carlo.samples", samples, 1);
    parameters = parameters == null ? List.of() : List.copyOf(parameters);
    unique("monte_carlo.parameters", parameters.stream().map(UncertainParameter::name).toList());
    int n = parameters.size();
    if (correlation == null) {
      correlation = new double[n][n];
      for (int i = 0; i < n; i++) {
        correlation[i][i] = 1.0;
      }
    } else {
      correlation = copy(correlation, n);
    }
    Checks.atLeast("worst_samples", worstSamples, 0);
  }

  private static void unique(String path, List<String> names) {
    Set<String> seen = new HashSet<>();
    for (int i = 0; i < names.size(); i++) {
      if (!seen.add(names.get(i))) {
        throw new InvalidInputException(path + "[" + i + "]", "a unique name", "duplicate \"" + names.get(i) + "\"");
      }
    }
  }

  private static double[][] copy(double[][] c, int n) {
    if (c.length != n) {
      throw new InvalidInputException("monte_carlo.correlations", "a " + n + " x " + n + " matrix", c.length + " rows");
    }
    double[][] out = new double[n][];
    for (int i = 0; i < n; i++) {
      if (c[i].length != n) {
        throw new InvalidInputException("monte_carlo.correlations", n + " columns", c[i].length + " in row " + i);
      }
      out[i] = c[i].clone();
    }
    for (int i = 0; i < n; i++) {
      if (out[i][i] != 1.0) {
        throw new InvalidInputException("monte_carlo.correlations", "1 on the diagonal", String.valueOf(out[i][i]));
      }
      for (int j = 0; j < i; j++) {
        if (out[i][j] != out[j][i] || !(Math.abs(out[i][j]) < 1.0)) {
          throw new InvalidInputException("monte_carlo.correlations",
              "a symmetric coefficient in (-1, 1)", out[i][j] + " and " + out[j][i]);
        }
      }
    }
    return out;
  }

  /** @return number of matrix cells */
  public int cellCount() {
    return configurations.size() * conditions.size() * failureStates.size() * gainFactors.size();
  }

  /** @return number of samples in all: cells x Monte Carlo samples */
  public long sampleCount() {
    return (long) cellCount() * samples;
  }

  @Override
  public double[][] correlation() {
    double[][] out = new double[correlation.length][];
    for (int i = 0; i < out.length; i++) {
      out[i] = correlation[i].clone();
    }
    return out;
  }
}
