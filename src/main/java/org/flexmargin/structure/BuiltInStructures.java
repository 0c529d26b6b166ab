package org.flexmargin.structure;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.ejml.data.DMatrixRMaj;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.ModeTable;
import org.flexmargin.model.ShapeValue;
import org.flexmargin.model.Strip;
import org.flexmargin.model.StripTheorySpec;
import org.flexmargin.model.StructureSpec;
import org.flexmargin.model.TypicalSection;
import org.flexmargin.model.UniformCantileverWing;

/**
 * Turns the built-in validation structures into normal modes and strip-theory aerodynamics, so
 * that the analyses only ever see a {@link ModeTable} and a {@link StripTheorySpec}.
 *
 * <p>Sign convention (as {@link ShapeValue}): displacement of the elastic axis positive up,
 * rotation positive nose up. A point at distance x aft of the elastic axis then moves up by
 * {@code w - x theta}, which puts a minus sign on the inertial coupling of heave (or bending)
 * with pitch (or twist) when the centre of mass lies aft of the elastic axis.
 */
public final class BuiltInStructures {
  /** Name of the single station of the typical section. */
  public static final String SECTION_STATION = "section";

  private BuiltInStructures() {}

  /**
   * Dispatches on the kind of structure.
   *
   * @param spec a {@link UniformCantileverWing} or {@link TypicalSection}
   * @return its modes and strips
   * @throws InvalidInputException for a {@link ModeTable} (already modes; its aerodynamics
   *     come from the configuration) or null
   */
  public static BuiltStructure build(StructureSpec spec) {
    if (spec instanceof UniformCantileverWing wing) {
      return build(wing);
    }
    if (spec instanceof TypicalSection section) {
      return build(section);
    }
    throw new InvalidInputException(
        "structure",
        "a built-in structure (uniform cantilever wing or typical section)",
        spec == null ? "nothing" : "a mode table");
  }

  /**
   * Normal modes of a uniform cantilever wing by Rayleigh-Ritz ({@link CantileverWingModes},
   * which documents the formulation and the mode scaling), with the wing's damping ratio on every
   * mode, shapes at the midpoints of equal strips named {@code strip_01, strip_02, ...}, and
   * strip theory on those strips.
   *
   * @param wing the wing, not null
   * @return modes and strips
   */
  public static BuiltStructure build(UniformCantileverWing wing) {
    CantileverWingModes modes = CantileverWingModes.solve(wing);
    return new BuiltStructure(modes.modeTable(), modes.stripTheory());
  }

  /**
   * Normal modes of the two-degree-of-freedom typical section, table name
   * {@code typical_section}, one station {@value #SECTION_STATION} and one strip.
   *
   * <p>The physical model is {@link #sectionModel}; its two normal modes are ordered by
   * frequency, named {@code mode_1, mode_2}, and scaled so that the larger of |h| and b|alpha| is
   * 1 m (and positive); the generalized mass (kg) is reported with that scaling. The shape at
   * the station is (h, alpha) per unit modal coordinate.
   *
   * <p>Damping approximation: the section's damping ratio zeta is assigned to both normal modes
   * (modal damping). It equals viscous dampers of ratio zeta on the uncoupled springs exactly
   * when x_alpha = 0; with inertial coupling it is the usual proportional-damping idealisation,
   * not a transformation of physical dampers.
   *
   * @param section the typical section, not null
   * @return modes and the single strip (width = span, semichord b, elastic axis a, lift slope);
   *     reference semichord b
   */
  public static BuiltStructure build(TypicalSection section) {
    StructuralModel physical = sectionModel(section);
    GeneralizedSymmetricEigen.Solution sol =
        GeneralizedSymmetricEigen.solve(physical.stiffnessMatrix(), physical.massMatrix());
    double b = section.semichordM();
    DMatrixRMaj v = sol.vectors();
    List<ElasticMode> modes = new ArrayList<>();
    for (int mode = 0; mode < 2; mode++) {
      double h = v.get(0, mode);
      double alpha = v.get(1, mode);
      double largest = Math.abs(h) >= b * Math.abs(alpha) ? h : b * alpha;
      double scale = 1.0 / largest;
      double omega = Math.sqrt(sol.eigenvalues()[mode]);
      modes.add(
          new ElasticMode(
              "mode_" + (mode + 1),
              omega / (2 * Math.PI),
              section.dampingRatio(),
              scale * scale,
              Map.of(SECTION_STATION, new ShapeValue(h * scale, alpha * scale))));
    }
    Strip strip =
        new Strip(
            SECTION_STATION,
            section.spanM(),
            b,
            section.elasticAxisA(),
            section.liftSlopePerRad());
    return new BuiltStructure(
        new ModeTable("typical_section", modes), new StripTheorySpec(b, List.of(strip)));
  }

  /**
   * The typical section in its physical coordinates {@code h} (m, positive up) and {@code alpha}
   * (rad, positive nose up), for a section of span s:
   *
   * <pre>
   *   M = s [ m              -m x_alpha b     ]
   *         [ -m x_alpha b    m r_alpha^2 b^2 ]
   *   K = s [ m omega_h^2     0                             ]
   *         [ 0               m r_alpha^2 b^2 omega_alpha^2 ]
   * </pre>
   *
   * (Bisplinghoff, Ashley &amp; Halfman and Hodges &amp; Pierce write +S_alpha with h positive
   * down; with h up the centre of mass at x_alpha b aft of the axis moves h - x_alpha b alpha,
   * hence the minus sign). Damping is zero here: it is assigned per normal mode by
   * {@link #build(TypicalSection)}.
   *
   * @param section the typical section, not null
   * @return the 2 x 2 model with coordinates {@code h}, {@code alpha}
   */
  public static StructuralModel sectionModel(TypicalSection section) {
    if (section == null) {
      throw new InvalidInputException("structure", "a typical section", "nothing");
    }
    double s = section.spanM();
    double m = section.massPerSpanKgPerM();
    double b = section.semichordM();
    double xa = section.massOffsetXAlpha();
    double ra2 = section.radiusOfGyrationSquared();
    double wh = 2 * Math.PI * section.heaveFrequencyHz();
    double wa = 2 * Math.PI * section.pitchFrequencyHz();
    double[][] mass = {
      {s * m, -s * m * xa * b},
      {-s * m * xa * b, s * m * ra2 * b * b}
    };
    double[][] stiffness = {
      {s * m * wh * wh, 0},
      {0, s * m * ra2 * b * b * wa * wa}
    };
    return new StructuralModel(List.of("h", "alpha"), mass, new double[2][2], stiffness);
  }
}
