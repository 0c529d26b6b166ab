package org.flexmargin.simulate;

import java.util.Objects;
import java.util.concurrent.ConcurrentHashMap;
import org.flexmargin.model.Configuration;
import org.flexmargin.sweep.ConfigurationModel;

/**
 * The configuration models of one run, each built once and shared by the parts that need the same
 * configuration (the time-domain check and the report's loop charts). A model tabulates its loop
 * aerodynamics on first use, which costs as much as a few hundred loop evaluations, and does not
 * depend on the speed, so one model per configuration serves every speed. Configurations are told
 * apart by identity: a run's case holds each one once. Thread-safe.
 */
public final class SharedModels {
  private final ConcurrentHashMap<Key, ConfigurationModel> models = new ConcurrentHashMap<>();

  /** A configuration compared by identity (records compare by content, which is slower and not needed). */
  private record Key(Configuration configuration) {
    @Override
    public boolean equals(Object o) {
      return o instanceof Key k && k.configuration == configuration;
    }

    @Override
    public int hashCode() {
      return System.identityHashCode(configuration);
    }
  }

  /**
   * @param configuration a configuration of the run's case
   * @return its model, built on the first request
   */
  public ConfigurationModel of(Configuration configuration) {
    Objects.requireNonNull(configuration, "configuration");
    return models.computeIfAbsent(new Key(configuration), k -> ConfigurationModel.of(k.configuration()));
  }

  /** @return how many models have been built */
  public int size() {
    return models.size();
  }
}
