package org.flexmargin.structure;

/** Input check shared by the plate model's records. */
final class PositiveFinite {
  private PositiveFinite() {}

  /**
   * @param what name and unit of the quantity, for the message
   * @param value the value
   * @throws IllegalArgumentException unless 0 &lt; value &lt; infinity
   */
  static void require(String what, double value) {
    if (!(value > 0) || value == Double.POSITIVE_INFINITY) {
      throw new IllegalArgumentException(what + " must be positive and finite; got " + value);
    }
  }
}
