package org.flexmargin.sweep;

import org.flexmargin.aero.AeroSource;
import org.flexmargin.lattice.AeroSourceFactory;
import org.flexmargin.flutter.AeroelasticSystem;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.StripTheorySpec;
import org.flexmargin.structure.BuiltInStructures;
import org.flexmargin.structure.BuiltStructure;
import org.flexmargin.structure.StructuralModel;

/**
 * Turns a configuration into the aeroelastic equations: a user mode table with its aerodynamic
 * data, or a built-in validation structure with its own strips.
 *
 * @param modes the mode table (user's, or built from a validation structure)
 * @param system the aeroelastic equations in modal coordinates
 * @param loopAero the forces of the frequency-domain loop (interpolated strip theory by default)
 */
public record ConfigurationModel(ModeTable modes, AeroelasticSystem system, LoopAerodynamics loopAero) {

  /**
   * @param modes the mode table
   * @param system the aeroelastic equations
   */
  public ConfigurationModel(ModeTable modes, AeroelasticSystem system) {
    this(modes, system, LoopAerodynamics.of(system.aero()));
  }

  /** @return the same model with the loop on the exact aerodynamic source */
  public ConfigurationModel withExactLoop() {
    return new ConfigurationModel(modes, system, LoopAerodynamics.exact(system.aero()));
  }

  /** @return the model of a configuration */
  public static ConfigurationModel of(Configuration configuration) {
    ModeTable table;
    AeroSource aero;
    if (configuration.structure() instanceof ModeTable mt) {
      table = mt;
      aero = AeroSourceFactory.of(configuration.aero(), mt);
    } else {
      BuiltStructure built = BuiltInStructures.build(configuration.structure());
      table = built.modes();
      StripTheorySpec strips = built.aero();
      aero = AeroSourceFactory.of(strips, table);
    }
    return new ConfigurationModel(table, new AeroelasticSystem(StructuralModel.fromModeTable(table), aero));
  }
}
