package org.flexmargin.structure;

/**
 * Thickness of a plate at a point of its planform, from the local chord and the chord fraction.
 */
public sealed interface PlateThickness permits PlateThickness.Uniform, PlateThickness.FourDigitSection {

  /**
   * @param xi chord fraction from the leading edge, 0 to 1
   * @param chordM local chord (m)
   * @return thickness (m), &gt;= 0
   */
  double thicknessM(double xi, double chordM);

  /**
   * Constant thickness.
   *
   * @param thicknessM plate thickness (m), &gt; 0
   */
  record Uniform(double thicknessM) implements PlateThickness {
    /** Validates a positive finite thickness. */
    public Uniform {
      PositiveFinite.require("plate thickness (m)", thicknessM);
    }

    @Override
    public double thicknessM(double xi, double chordM) {
      return thicknessM;
    }
  }

  /**
   * The thickness of a symmetric section of the NACA four-digit family scaled to the given
   * thickness ratio (Abbott and von Doenhoff, <i>Theory of Wing Sections</i>, 1959, eq. 6.2):
   * t / c = 10 tau (0.2969 sqrt(xi) - 0.1260 xi - 0.3516 xi^2 + 0.2843 xi^3 - 0.1015 xi^4), largest
   * (= tau) near xi = 0.30, with a small finite trailing edge (0.21 % of the chord at tau = 0.1).
   * Used as the thickness distribution of thin sections whose own ordinates are not given; its
   * section area is 0.6855 tau c^2 (the integral of the bracket times 10).
   *
   * @param thicknessRatio largest thickness over chord, tau, in (0, 0.3]
   */
  record FourDigitSection(double thicknessRatio) implements PlateThickness {
    /** Validates the thickness ratio. */
    public FourDigitSection {
      if (!(thicknessRatio > 0) || !(thicknessRatio <= 0.3)) {
        throw new IllegalArgumentException("thickness ratio must lie in (0, 0.3]; got " + thicknessRatio);
      }
    }

    @Override
    public double thicknessM(double xi, double chordM) {
      double x = Math.min(Math.max(xi, 0), 1);
      double f = 0.2969 * Math.sqrt(x) + x * (-0.1260 + x * (-0.3516 + x * (0.2843 - 0.1015 * x)));
      return 10 * thicknessRatio * f * chordM;
    }
  }
}
