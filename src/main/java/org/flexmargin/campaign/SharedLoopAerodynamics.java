package org.flexmargin.campaign;

import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.flexmargin.model.AeroSpec;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.sweep.ConfigurationModel;
import org.flexmargin.sweep.LoopAerodynamics;

/**
 * Builds the configuration models of a campaign's samples, sharing the frequency-domain loop's
 * interpolated strip-theory forces ({@link LoopAerodynamics}, about 2 300 exact evaluations to
 * build) between samples whose forces are the same. Strip-theory forces depend only on the strips
 * and the mode shapes (not on modal frequencies, damping or generalized masses, the quantities a
 * campaign usually perturbs), so two samples with equal strips, mode names and shapes get the
 * same interpolant, built from an equal source: their results are those of separate builds. At
 * most {@value #MAX_SHARED} sources are kept (a campaign that perturbs shapes simply builds one
 * per sample, as before). Thread-safe.
 */
final class SharedLoopAerodynamics {
  /** Largest number of distinct force sources kept. */
  static final int MAX_SHARED = 16;

  /** What strip-theory forces depend on. */
  private record Key(AeroSpec aero, List<String> modes, List<Map<String, ShapeValue>> shapes) {}

  private final Map<Key, LoopAerodynamics> shared = new ConcurrentHashMap<>();

  /** @return the model of a configuration, its loop forces shared where they are the same */
  ConfigurationModel modelOf(Configuration configuration) {
    ConfigurationModel model = ConfigurationModel.of(configuration);
    if (!(configuration.structure() instanceof ModeTable table) || !model.loopAero().interpolated()) {
      return model;
    }
    Key key = new Key(configuration.aero(), table.modes().stream().map(ElasticMode::name).toList(),
        table.modes().stream().map(ElasticMode::shapes).toList());
    LoopAerodynamics loop = shared.get(key);
    if (loop == null) {
      if (shared.size() >= MAX_SHARED) {
        return model;
      }
      loop = shared.computeIfAbsent(key, k -> model.loopAero());
    }
    return new ConfigurationModel(model.modes(), model.system(), loop);
  }

  /** @return the number of distinct force sources kept */
  int size() {
    return shared.size();
  }
}
