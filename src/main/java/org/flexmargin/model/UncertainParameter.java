package org.flexmargin.model;

import java.util.List;

/**
 * One scalar random variable of a campaign's Monte Carlo layer.
 *
 * @param name unique name (used by the correlation list and the results)
 * @param quantity what the value changes
 * @param modes the modes it applies to (per-mode quantities only; empty means every mode of the
 *     configuration); one value is drawn per sample and applied to all of them
 * @param distribution distribution of the value (factor or seconds, per {@code quantity})
 */
public record UncertainParameter(String name, UncertainQuantity quantity, List<String> modes,
    Distribution distribution) {
  /** Validates and copies. */
  public UncertainParameter {
    Checks.name("name", name);
    if (quantity == null) {
      throw new InvalidInputException("quantity", "a quantity", "nothing");
    }
    if (distribution == null) {
      throw new InvalidInputException("distribution", "a distribution", "nothing");
    }
    modes = modes == null ? List.of() : List.copyOf(modes);
    if (!quantity.perMode() && !modes.isEmpty()) {
      throw new InvalidInputException("modes", "no mode list for " + quantity.key(), modes.toString());
    }
  }
}
