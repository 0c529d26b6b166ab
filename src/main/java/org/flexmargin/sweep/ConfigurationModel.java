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
 */
public record ConfigurationModel(ModeTable modes, AeroelasticSystem system) {

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
