package org.flexmargin.loop;

/**
 * Second-order notch filter
 *
 * <pre>
 *   N(s) = (s^2 + 2 zeta_z w s + w^2) / (s^2 + 2 zeta_p w s + w^2),   w = 2 pi f_c
 * </pre>
 *
 * with unit gain far from the centre and |N(j w)| = zeta_z/zeta_p at the centre (common
 * practice for structural-coupling filters). Writing u = (w^2 - omega^2)/(2 w omega), |N|^2 =
 * (u^2 + zeta_z^2)/(u^2 + zeta_p^2); the attenuation equals half the centre depth in dB (|N| =
 * sqrt(zeta_z/zeta_p)) at u = +-sqrt(zeta_z zeta_p), i.e. at two frequencies exactly
 * 2 w sqrt(zeta_z zeta_p) apart. That separation is this class's <b>width</b> (derived here from
 * the formula above; a definition of our own).
 *
 * @param centreFrequencyHz f_c, Hz (&gt; 0)
 * @param zeroDampingRatio zeta_z (&gt;= 0; 0 gives an infinitely deep notch)
 * @param poleDampingRatio zeta_p (&gt; zeta_z for attenuation)
 */
public record NotchFilter(double centreFrequencyHz, double zeroDampingRatio,
    double poleDampingRatio) implements LinearBlock {
  /** Validates. */
  public NotchFilter {
    StateSpace.require(Double.isFinite(centreFrequencyHz) && centreFrequencyHz > 0,
        "notch.centre_frequency_hz", "a finite value > 0", String.valueOf(centreFrequencyHz));
    StateSpace.require(Double.isFinite(zeroDampingRatio) && zeroDampingRatio >= 0,
        "notch.zero_damping_ratio", "a finite value >= 0", String.valueOf(zeroDampingRatio));
    StateSpace.require(Double.isFinite(poleDampingRatio) && poleDampingRatio > 0,
        "notch.pole_damping_ratio", "a finite value > 0", String.valueOf(poleDampingRatio));
  }

  /**
   * Notch of given centre, depth and width (width as defined in the class comment): zeta_p =
   * (W / (2 f_c)) / sqrt(r), zeta_z = r zeta_p with r = 10^(-depth/20).
   *
   * @param centreFrequencyHz f_c, Hz (&gt; 0)
   * @param depthDb attenuation at the centre, dB (&gt; 0; 20 means |N| = 0.1)
   * @param widthHz separation of the two half-depth frequencies, Hz (&gt; 0)
   * @return the notch
   */
  public static NotchFilter fromDepthAndWidth(double centreFrequencyHz, double depthDb,
      double widthHz) {
    StateSpace.require(Double.isFinite(depthDb) && depthDb > 0, "notch.depth_db",
        "a finite attenuation > 0 dB", String.valueOf(depthDb));
    StateSpace.require(Double.isFinite(widthHz) && widthHz > 0, "notch.width_hz",
        "a finite value > 0", String.valueOf(widthHz));
    // the centre frequency is validated by the constructor, with the same field and wording
    double r = Math.pow(10, -depthDb / 20);
    double zp = widthHz / (2 * centreFrequencyHz) / Math.sqrt(r);
    return new NotchFilter(centreFrequencyHz, r * zp, zp);
  }

  /** @return 20 log10(zeta_z/zeta_p), the gain at the centre, dB (negative for a notch) */
  public double centreGainDb() {
    return 20 * Math.log10(zeroDampingRatio / poleDampingRatio);
  }

  /** @return 2 f_c sqrt(zeta_z zeta_p), the half-depth width, Hz */
  public double widthHz() {
    return 2 * centreFrequencyHz * Math.sqrt(zeroDampingRatio * poleDampingRatio);
  }

  /**
   * The usual notch width: the separation of the two frequencies where the gain is -3 dB
   * (|N|^2 = 1/2). From |N|^2 = (u^2 + zeta_z^2)/(u^2 + zeta_p^2) (class comment), |N|^2 = 1/2 at
   * u = +-U with U^2 = zeta_p^2 - 2 zeta_z^2, and the two roots of omega^2 +- 2 w U omega - w^2 = 0
   * are exactly 2 w U apart: the width is 2 f_c sqrt(zeta_p^2 - 2 zeta_z^2) (derived). For a deep
   * notch it is about sqrt(zeta_p/zeta_z) times the half-depth {@link #widthHz()} (4.5 times at
   * 26 dB).
   *
   * @return the -3 dB width, Hz; NaN for a notch no deeper than 3.01 dB (no -3 dB points)
   */
  public double minus3DbWidthHz() {
    double u2 = poleDampingRatio * poleDampingRatio - 2 * zeroDampingRatio * zeroDampingRatio;
    return u2 > 0 ? 2 * centreFrequencyHz * Math.sqrt(u2) : Double.NaN;
  }

  private double w() {
    return 2 * Math.PI * centreFrequencyHz;
  }

  @Override
  public StateSpace stateSpace() {
    return NotchFilters.transferFunction(this).stateSpace();
  }

  @Override
  public void response(double omegaRadPerS, double[] reIm) {
    double w = w();
    double re = w * w - omegaRadPerS * omegaRadPerS;
    double ni = 2 * zeroDampingRatio * w * omegaRadPerS;
    double di = 2 * poleDampingRatio * w * omegaRadPerS;
    double den = re * re + di * di;
    reIm[0] = (re * re + ni * di) / den;
    reIm[1] = (ni * re - re * di) / den;
  }
}
