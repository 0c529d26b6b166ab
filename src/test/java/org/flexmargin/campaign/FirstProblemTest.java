package org.flexmargin.campaign;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.flexmargin.io.CaseReader;
import org.flexmargin.model.AnalysisCase;
import org.flexmargin.sweep.CaseSweep;
import org.flexmargin.sweep.ConfigurationResult;
import org.flexmargin.sweep.PlannedPath;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A sample's first problem includes a failed requirement that is not an instability: the one-mode
 * test case asked for a damping of g >= 0.9 up to V_L, which a structure with 1 % critical damping
 * (g = 2 zeta = 0.02 in still air) cannot have at any speed, fails that requirement from the first
 * grid point, well below its divergence.
 */
class FirstProblemTest {
  @TempDir Path dir;

  @Test
  void aDampingRequirementFailedFromTheFirstPointIsTheFirstProblem() throws Exception {
    TinyCampaign.write(dir, 2, 0.05, 1);
    String text = Files.readString(dir.resolve("case.json")).replace("\"options\": {\"method\": \"pk\"}",
        "\"options\": {\"method\": \"pk\"},\n \"requirements\": {\"preset\": "
            + "\"recalled_military_and_transport\", \"limit_speed_eas_mps\": 40, \"max_operating_speed_eas_mps\": 35, "
            + "\"minimum_damping_g\": 0.9}");
    Files.writeString(dir.resolve("judged.json"), text);
    AnalysisCase c = CaseReader.read(dir.resolve("judged.json"));
    ConfigurationResult r = CaseSweep.analyse(c.configurations().get(0), new PlannedPath(c.sweep()), c);
    SampleOutcome o = SampleRunner.outcome(0, 0, 0, new double[0], r);
    assertEquals(SampleStatus.FAIL, o.status(), o.governing());
    assertEquals(10.0, o.criticalEasMps(), 1e-9, "first grid speed (10 m/s EAS): " + o.governing());
    assertTrue(Double.isNaN(o.divergenceEasMps()) || o.divergenceEasMps() > 10.0);
    assertTrue(Double.isNaN(o.marginOnsetEasMps()), "no loop, no margin onset");
  }
}
