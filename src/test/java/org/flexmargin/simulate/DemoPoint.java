package org.flexmargin.simulate;

import java.nio.file.Path;
import org.flexmargin.atmosphere.StandardAtmosphere;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.model.Configuration;
import org.flexmargin.sweep.ConfigurationModel;

/** The demo drone (invented data) at one speed, shared by the simulation tests. */
final class DemoPoint {
  /** Demo case, full payload, 3 000 m, 100 m/s EAS (the demo's V0max). */
  static final SimulationPoint FULL_PAYLOAD_V0MAX = at(0, 100.0);

  private DemoPoint() {}

  static SimulationPoint at(int configuration, double speedEasMps) {
    AnalysisCase demo = CaseReader.read(Path.of("mode-tables/demo/demo-case.json"));
    Configuration c = demo.configurations().get(configuration);
    return SimulationPoint.of(ConfigurationModel.of(c), c, demo.loop(),
        StandardAtmosphere.atEquivalentSpeed(3000.0, speedEasMps));
  }
}
