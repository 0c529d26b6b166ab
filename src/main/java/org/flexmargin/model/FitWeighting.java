package org.flexmargin.model;

/**
 * How the equations of a rational fit are weighted across the fitted reduced frequencies.
 *
 * <p>Example: an element with |Q(0.1 i)| = 2 and |Q(1.5 i)| = 20 m^2, beside one of 200 m^2.
 * {@link #UNIFORM} weights every equation alike, so an error of 0.1 m^2 costs the same anywhere
 * (the large elements, which decide flutter, are fitted best); {@link #ELEMENT} divides each
 * element's equations by its largest modulus (20 m^2), fitting every element to the same relative
 * accuracy; {@link #INVERSE_MAGNITUDE} divides each equation by the element's modulus there
 * (floored at 5 % of its largest), so the same 0.1 m^2 costs ten times more at k = 0.1 than at
 * k = 1.5. Roger's form is fitted element by element, so for it {@link #UNIFORM} and {@link
 * #ELEMENT} give the same fit.
 */
public enum FitWeighting {
  /** Every equation alike: absolute error over all elements and frequencies. */
  UNIFORM,
  /** Each element's equations divided by its largest modulus: relative error per element. */
  ELEMENT,
  /** Each equation divided by |Q_ij(ik)| at its frequency: relative error at each frequency. */
  INVERSE_MAGNITUDE;

  /** @return the weighting's key in a case file: "uniform", "element" or "inverse_magnitude" */
  public String word() {
    return switch (this) {
      case UNIFORM -> "uniform";
      case ELEMENT -> "element";
      case INVERSE_MAGNITUDE -> "inverse_magnitude";
    };
  }
}
