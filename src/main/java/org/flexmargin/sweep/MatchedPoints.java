package org.flexmargin.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.DoubleFunction;
import org.flexmargin.aero.AeroSource;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.atmosphere.StandardAtmosphere;
import org.flexmargin.flutter.AeroelasticSystem;
import org.flexmargin.flutter.DivergenceResult;
import org.flexmargin.flutter.DivergenceSolver;
import org.flexmargin.flutter.FlutterCrossing;
import org.flexmargin.flutter.FlutterSolution;
import org.flexmargin.flutter.PkMethod;
import org.flexmargin.lattice.AeroSourceFactory;
import org.flexmargin.model.AirspeedKind;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.GafTable;
import org.flexmargin.model.Altitudes;
import org.flexmargin.model.AnalysisOptions;
import org.flexmargin.model.EnvelopeSpec;
import org.flexmargin.model.MachSweep;
import org.flexmargin.model.SpeedSweep;
import org.flexmargin.structure.StructuralModel;

/**
 * Matched-point flutter and divergence boundaries ({@link EnvelopeSpec}).
 *
 * <p><b>Constant altitude.</b> Start with the forces at the Mach number {@code machStart}; find
 * the first flutter onset of the p-k sweep in true airspeed at that altitude; take the onset's
 * Mach number V / a(h) as the Mach number of the forces and repeat until the two differ by less
 * than {@value #MACH_TOLERANCE} (at most {@value #MAX_ITERATIONS} times; otherwise the point is
 * reported as not converged). Divergence the same way, with q_D(M) from the static eigenproblem
 * and V = sqrt(2 q_D / rho(h)). The iteration is a fixed point of M -&gt; M_onset(M); it
 * converges when the onset Mach number changes by less than the Mach number of the forces, which
 * holds for the mild compressibility of subsonic linear theory (an onset that jumps between modes
 * as the Mach number changes shows as not converged).
 *
 * <p><b>Constant Mach.</b> With the forces at M the altitude is swept from the highest to the
 * lowest listed altitude at that Mach number (so speed, density and Mach agree at every point) and
 * the first onset is the matched point; divergence at M is where the dynamic pressure
 * gamma p(h) M^2 / 2 equals q_D(M), solved for the pressure and then the altitude.
 */
public final class MatchedPoints {
  /** Largest accepted difference between the Mach number of the forces and of the point. */
  public static final double MACH_TOLERANCE = 1e-4;
  /** Largest number of fixed-point iterations per point. */
  public static final int MAX_ITERATIONS = 20;

  /** What a point of the boundary is. */
  public enum Kind {
    /** flutter onset at a listed altitude, Mach number iterated */
    FLUTTER_AT_ALTITUDE,
    /** divergence at a listed altitude, Mach number iterated */
    DIVERGENCE_AT_ALTITUDE,
    /** flutter onset along a listed Mach number (altitude swept) */
    FLUTTER_AT_MACH,
    /** divergence along a listed Mach number */
    DIVERGENCE_AT_MACH
  }

  /**
   * One matched point.
   *
   * @param kind what it is
   * @param found whether an onset lies within the swept range
   * @param condition the flight condition of the onset (null when not found)
   * @param forcesMach the Mach number of the forces used for the last solve: the matched Mach
   *     number, or the nearest end of the forces' Mach table when it lies outside (the point is
   *     then warned about), or the table's one Mach number (0 for incompressible strip theory) when
   *     the forces do not depend on Mach
   * @param frequencyHz flutter frequency (Hz); 0 for divergence, NaN when not found
   * @param mode the mode the onset branch starts from ("" for divergence or none)
   * @param iterations fixed-point iterations (1 for constant-Mach points)
   * @param converged whether the Mach numbers agree within {@link #MACH_TOLERANCE}
   * @param note why a point is missing or unconverged ("" otherwise)
   */
  public record Point(Kind kind, boolean found, FlightCondition condition, double forcesMach, double frequencyHz,
      String mode, int iterations, boolean converged, String note) {
    /** @return this point with the forces' Mach number replaced */
    Point withForcesMach(double mach) {
      return new Point(kind, found, condition, mach, frequencyHz, mode, iterations, converged, note);
    }
  }

  /**
   * The boundary of one configuration.
   *
   * @param configuration configuration name
   * @param aero the forces' description (at the first Mach number used)
   * @param points the matched points ({@link #boundary} order)
   * @param warnings aerodynamics used outside their Mach range, unconverged points
   */
  public record Envelope(String configuration, String aero, List<Point> points, List<String> warnings) {
    /** Copies the lists. */
    public Envelope {
      points = List.copyOf(points);
      warnings = List.copyOf(warnings);
    }
  }

  private MatchedPoints() {}

  /**
   * The matched-point boundary of a configuration. Lifting surfaces and force tables at several
   * Mach numbers give forces at every Mach number (interpolated in their Mach table); strip theory
   * and a force table at one Mach number do not depend on Mach, which the warnings state.
   *
   * @param c the configuration
   * @param spec the envelope's lines
   * @param options the p-k settings
   * @return the boundary with its warnings
   */
  public static Envelope of(Configuration c, EnvelopeSpec spec, AnalysisOptions options) {
    ConfigurationModel model = ConfigurationModel.of(c);
    List<String> warnings = new ArrayList<>();
    DoubleFunction<AeroSource> aero;
    double lo, hi, start;
    Optional<AeroSourceFactory.MachForces> overMach = AeroSourceFactory.overMach(c.aero(), model.modes());
    if (overMach.isPresent()) {
      aero = overMach.get().atMach();
      lo = overMach.get().lowestMach();
      hi = overMach.get().highestMach();
      start = overMach.get().sweepMach();
    } else {
      AeroSource fixed = model.system().aero();
      aero = m -> fixed;
      start = c.aero() instanceof GafTable t ? t.machNumber() : 0;
      lo = c.aero() instanceof GafTable ? start : 0;
      hi = c.aero() instanceof GafTable ? start : AeroValidity.STRIP_THEORY_MAX_MACH;
      warnings.add("the forces do not depend on the Mach number (" + (c.aero() instanceof GafTable
          ? "a force table at one Mach number" : "incompressible strip theory")
          + "): each matched point is the onset of the ordinary sweep at its altitude");
    }
    List<Point> solved = boundary(model.system().structure(), aero, spec, options, start);
    List<Point> points = new ArrayList<>(solved.size());
    for (Point p : solved) {
      // the forces actually used: clamped to the table's Mach range, or the one fixed Mach number
      points.add(p.withForcesMach(overMach.isPresent() ? Math.max(lo, Math.min(hi, p.forcesMach())) : start));
    }
    for (Point p : points) {
      if (!p.converged()) {
        warnings.add(p.kind().name().toLowerCase(Locale.ROOT).replace('_', ' ') + ": " + p.note());
      } else if (p.found() && (p.condition().mach() < lo - AeroValidity.TABLE_MACH_TOLERANCE
          || p.condition().mach() > hi + AeroValidity.TABLE_MACH_TOLERANCE)) {
        warnings.add(String.format(Locale.ROOT, "aerodynamics outside their range: %s at %.0f m, Mach %.3f, "
            + "lies outside the forces' Mach range %.3f to %.3f (the nearest forces were used)",
            p.kind().name().toLowerCase(Locale.ROOT).replace('_', ' '), p.condition().altitudeM(),
            p.condition().mach(), lo, hi));
      }
    }
    return new Envelope(c.name(), aero.apply(start).description(), points, warnings);
  }

  /**
   * The whole boundary of one configuration.
   *
   * @param structure the structural model
   * @param aeroAtMach the forces at a Mach number
   * @param spec the envelope's lines
   * @param options the p-k settings (damping limit, tolerances)
   * @param machStart Mach number of the forces for the first solve at each altitude
   * @return the points: per altitude flutter then divergence, then per Mach number flutter then
   *     divergence
   */
  public static List<Point> boundary(StructuralModel structure, DoubleFunction<AeroSource> aeroAtMach,
      EnvelopeSpec spec, AnalysisOptions options, double machStart) {
    List<Point> out = new ArrayList<>();
    for (double h : spec.altitudesM()) {
      out.add(flutterAtAltitude(structure, aeroAtMach, h, spec, options, machStart));
      out.add(divergenceAtAltitude(structure, aeroAtMach, h, machStart));
    }
    double[] alts = spec.altitudesM();
    for (double m : spec.machNumbers()) {
      out.add(flutterAtMach(structure, aeroAtMach.apply(m), m, alts[alts.length - 1], alts[0], spec, options));
      out.add(divergenceAtMach(structure, aeroAtMach.apply(m), m));
    }
    return out;
  }

  /** Flutter onset at altitude h with the Mach number of the forces iterated to the onset's. */
  static Point flutterAtAltitude(StructuralModel structure, DoubleFunction<AeroSource> aeroAtMach, double h,
      EnvelopeSpec spec, AnalysisOptions options, double machStart) {
    PlannedPath path = new PlannedPath(new SpeedSweep(h, AirspeedKind.TRUE, spec.fromTasMps(), spec.toTasMps(),
        spec.points()));
    double m = machStart;
    for (int it = 1; it <= MAX_ITERATIONS; it++) {
      FlutterSolution sol = new PkMethod().solve(new AeroelasticSystem(structure, aeroAtMach.apply(m)), path, options);
      Optional<FlutterCrossing> onset = sol.firstOnset();
      if (onset.isEmpty()) {
        return new Point(Kind.FLUTTER_AT_ALTITUDE, false, null, m, Double.NaN, "", it, true, String.format(
            Locale.ROOT, "no flutter onset up to %.1f m/s TAS at %.0f m (forces at Mach %.3f)", spec.toTasMps(), h, m));
      }
      FlutterCrossing x = onset.get();
      double mf = x.condition().mach();
      if (Math.abs(mf - m) < MACH_TOLERANCE) {
        return new Point(Kind.FLUTTER_AT_ALTITUDE, true, x.condition(), m, x.frequencyHz(), x.branchName(), it, true, "");
      }
      m = mf;
    }
    return unconverged(Kind.FLUTTER_AT_ALTITUDE, h, m);
  }

  /** Divergence at altitude h with the Mach number of the forces iterated to the point's. */
  static Point divergenceAtAltitude(StructuralModel structure, DoubleFunction<AeroSource> aeroAtMach, double h,
      double machStart) {
    double rho = StandardAtmosphere.densityKgPerM3(h);
    double m = machStart;
    for (int it = 1; it <= MAX_ITERATIONS; it++) {
      DivergenceResult d = new DivergenceSolver().solve(new AeroelasticSystem(structure, aeroAtMach.apply(m)));
      if (!d.found()) {
        return new Point(Kind.DIVERGENCE_AT_ALTITUDE, false, null, m, Double.NaN, "", it, true,
            "no divergence (forces at Mach " + String.format(Locale.ROOT, "%.3f", m) + ")");
      }
      FlightCondition fc = StandardAtmosphere.at(h, d.speedTasMps(rho));
      if (Math.abs(fc.mach() - m) < MACH_TOLERANCE) {
        return new Point(Kind.DIVERGENCE_AT_ALTITUDE, true, fc, m, 0, "", it, true, "");
      }
      m = fc.mach();
    }
    return unconverged(Kind.DIVERGENCE_AT_ALTITUDE, h, m);
  }

  private static Point unconverged(Kind kind, double h, double m) {
    return new Point(kind, false, null, m, Double.NaN, "", MAX_ITERATIONS, false, String.format(Locale.ROOT,
        "Mach number of the forces did not settle at %.0f m after %d iterations (last %.4f): the onset may jump "
            + "between branches as the Mach number changes; check the constant-Mach lines", h, MAX_ITERATIONS, m));
  }

  /** Flutter onset along Mach m, altitude swept from {@code highM} down to {@code lowM}. */
  static Point flutterAtMach(StructuralModel structure, AeroSource aero, double m, double highM, double lowM,
      EnvelopeSpec spec, AnalysisOptions options) {
    PlannedPath path = new PlannedPath(new MachSweep(m, highM, lowM, spec.points()));
    FlutterSolution sol = new PkMethod().solve(new AeroelasticSystem(structure, aero), path, options);
    Optional<FlutterCrossing> onset = sol.firstOnset();
    if (onset.isEmpty()) {
      return new Point(Kind.FLUTTER_AT_MACH, false, null, m, Double.NaN, "", 1, true, String.format(Locale.ROOT,
          "no flutter onset at Mach %.3f between %.0f and %.0f m", m, highM, lowM));
    }
    FlutterCrossing x = onset.get();
    return new Point(Kind.FLUTTER_AT_MACH, true, x.condition(), m, x.frequencyHz(), x.branchName(), 1, true, "");
  }

  /** Divergence along Mach m: the altitude where gamma p M^2 / 2 = q_D(M). */
  static Point divergenceAtMach(StructuralModel structure, AeroSource aero, double m) {
    DivergenceResult d = new DivergenceSolver().solve(new AeroelasticSystem(structure, aero));
    if (!d.found()) {
      return new Point(Kind.DIVERGENCE_AT_MACH, false, null, m, Double.NaN, "", 1, true,
          String.format(Locale.ROOT, "no divergence at Mach %.3f", m));
    }
    double p = 2 * d.dynamicPressurePa() / (StandardAtmosphere.GAMMA * m * m);
    if (!(p <= StandardAtmosphere.pressurePa(Altitudes.MIN_M) && p >= StandardAtmosphere.pressurePa(Altitudes.MAX_M))) {
      return new Point(Kind.DIVERGENCE_AT_MACH, false, null, m, Double.NaN, "", 1, true, String.format(Locale.ROOT,
          "divergence at Mach %.3f needs a static pressure of %.0f Pa, outside the standard atmosphere", m, p));
    }
    double h = StandardAtmosphere.altitudeAtPressureM(p);
    return new Point(Kind.DIVERGENCE_AT_MACH, true, StandardAtmosphere.atMach(h, m), m, 0, "", 1, true, "");
  }
}
