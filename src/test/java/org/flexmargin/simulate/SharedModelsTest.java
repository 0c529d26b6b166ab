package org.flexmargin.simulate;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.atmosphere.StandardAtmosphere;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.sweep.ConfigurationModel;
import org.flexmargin.sweep.ServoMargins;
import org.junit.jupiter.api.Test;

/**
 * One model per configuration of a run: the same configuration gets the same model, another
 * configuration (even an equal copy) its own, and a shared model answers exactly as a freshly
 * built one (the sharing changes no number of the report).
 */
class SharedModelsTest {
  static final AnalysisCase DEMO = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));

  @Test
  void sameConfigurationSameModelOthersTheirOwn() {
    SharedModels models = new SharedModels();
    Configuration full = DEMO.configurations().get(0);
    Configuration empty = DEMO.configurations().get(1);
    ConfigurationModel first = models.of(full);
    assertSame(first, models.of(full));
    assertNotSame(first, models.of(empty));
    assertEquals(2, models.size());
    Configuration copy = new Configuration(full.name(), full.structure(), full.aero(), full.rigidBody());
    assertEquals(full, copy, "an equal copy");
    assertNotSame(first, models.of(copy), "told apart by identity, not content");
    assertEquals(3, models.size());
    assertThrows(NullPointerException.class, () -> models.of(null));
  }

  @Test
  void concurrentRequestsBuildOneModel() throws Exception {
    SharedModels models = new SharedModels();
    Configuration full = DEMO.configurations().get(0);
    ExecutorService pool = Executors.newFixedThreadPool(4);
    try {
      Callable<ConfigurationModel> ask = () -> models.of(full);
      List<Future<ConfigurationModel>> got = pool.invokeAll(List.of(ask, ask, ask, ask));
      for (Future<ConfigurationModel> f : got) {
        assertSame(got.get(0).get(), f.get());
      }
    } finally {
      pool.shutdown();
    }
    assertEquals(1, models.size());
  }

  @Test
  void sharedModelAnswersAsAFreshOne() {
    Configuration full = DEMO.configurations().get(0);
    FlightCondition fc = StandardAtmosphere.atEquivalentSpeed(3000.0, 100.0);
    SharedModels models = new SharedModels();
    models.of(full).loopAero().source(); // the shared model's tables built by an earlier user
    double[] shared = new double[2];
    double[] fresh = new double[2];
    for (double hz : new double[] {0.3, 4.1, 8.6, 12.0, 30.0}) {
      double w = 2 * Math.PI * hz;
      ServoMargins.loopAt(models.of(full), full, DEMO.loop(), fc).brokenLoop().response(w, shared);
      ServoMargins.loopAt(ConfigurationModel.of(full), full, DEMO.loop(), fc).brokenLoop().response(w, fresh);
      assertArrayEquals(fresh, shared, 0.0, "bit for bit at " + hz + " Hz");
    }
  }

  @Test
  void timeDomainCheckUsesTheRunsModel() {
    SharedModels models = new SharedModels();
    LoopComparison.of(DEMO, models, null, "none");
    assertEquals(1, models.size(), "the first configuration's model, left for the report's charts");
  }
}
