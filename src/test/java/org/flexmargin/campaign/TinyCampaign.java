package org.flexmargin.campaign;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * A campaign on a one-mode case for tests: a single torsion mode (10 Hz, 1 kg m^2, unit twist at
 * one strip of 1 m span and 0.5 m semichord, elastic axis at a = -0.2), strip theory, no loop, no
 * requirements, swept on 6 points. Its divergence speed scales exactly with the torsion frequency
 * (q_D proportional to the stiffness, V_D EAS to its square root).
 */
public final class TinyCampaign {
  private TinyCampaign() {}

  /**
   * Writes the case, its mode table and a campaign with a normal frequency factor into {@code dir}.
   *
   * @return the campaign file
   */
  public static Path write(Path dir, int samples, double sigma, long seed) throws IOException {
    Files.writeString(dir.resolve("torsion.json"), """
        {"format": 1, "name": "torsion", "description": "test section, invented",
         "modes": [{"name": "torsion", "frequency_hz": 10.0, "damping_ratio": 0.01, "generalized_mass_kg": 1.0,
                    "shapes": {"s1": {"displacement_m": 0.0, "rotation_rad": 1.0}}}]}
        """);
    Files.writeString(dir.resolve("case.json"), """
        {"format": 1, "name": "tiny", "description": "test section, invented",
         "configurations": [{"name": "only", "mode_table": "torsion.json",
           "aero": {"strip_theory": {"reference_semichord_m": 0.5,
             "strips": [{"station": "s1", "width_m": 1.0, "semichord_m": 0.5, "elastic_axis_a": -0.2,
                         "lift_slope_per_rad": 6.283185307179586}]}}}],
         "sweep": {"kind": "speed", "altitude_m": 0, "speed_kind": "eas", "from_mps": 10, "to_mps": 60, "points": 6},
         "options": {"method": "pk"}}
        """);
    Path campaign = dir.resolve("campaign.json");
    Files.writeString(campaign, """
        {"format": 1, "name": "tiny-campaign", "base_case": "case.json",
         "matrix": {"flight_conditions": [{"name": "sl", "altitude_m": 0}, {"name": "h2000", "altitude_m": 2000}]},
         "monte_carlo": {"samples": %d, "seed": %d, "parameters": [
           {"name": "f", "quantity": "modal_frequency",
            "distribution": {"normal": {"mean": 1.0, "standard_deviation": %s}}}]},
         "worst_samples": 2}
        """.formatted(samples, seed, Double.toString(sigma)));
    return campaign;
  }
}
