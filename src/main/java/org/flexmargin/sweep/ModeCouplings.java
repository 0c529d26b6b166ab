package org.flexmargin.sweep;

import java.util.LinkedHashMap;
import java.util.Map;
import org.flexmargin.aero.StripCoupling;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.ModeCoupling;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.RigidBody;

/** The coupling of every mode of a configuration with the short period, as the loop analysis uses it. */
public final class ModeCouplings {

  private ModeCouplings() {}

  /**
   * @param configuration a configuration
   * @return per mode name, in mode-table order: supplied, strip-computed or zero coupling; empty
   *     without rigid-body data or mode table
   */
  public static Map<String, ModeCoupling> of(Configuration configuration) {
    Map<String, ModeCoupling> out = new LinkedHashMap<>();
    if (configuration.rigidBody() == null || !(configuration.structure() instanceof ModeTable table)) {
      return out;
    }
    RigidBody rigid = StripCoupling.resolve(configuration.rigidBody(), configuration.aero(), table);
    for (ElasticMode m : table.modes()) {
      out.put(m.name(), rigid.couplingOf(m.name()));
    }
    return out;
  }
}
