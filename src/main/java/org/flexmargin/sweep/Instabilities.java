package org.flexmargin.sweep;

import java.util.Comparator;
import java.util.Optional;
import java.util.stream.Stream;
import org.flexmargin.flutter.CrossingKind;
import org.flexmargin.flutter.FlutterCrossing;
import org.flexmargin.model.FlutterMethodKind;

/** The lowest unstable airspeeds of one configuration, open and closed loop. */
final class Instabilities {
  private Instabilities() {}

  private static final Comparator<Instability> LOWEST = Comparator.comparingDouble(Instability::speedEasMps);

  /** Lowest open-loop flutter onset, or a root already unstable at the first sweep point. */
  static Optional<Instability> openLoop(ConfigurationResult c) {
    Stream<Instability> onsets = onsets(c.flutter().crossings().stream(), Instability.Kind.OPEN_LOOP_FLUTTER);
    Stream<Instability> atStart = Stream.empty();
    if (c.flutter().method() != FlutterMethodKind.K) {
      atStart = c.flutter().branches().stream()
          .filter(b -> b.size() > 0 && b.converged()[0] && b.dampingG()[0] > 0)
          .map(b -> new Instability(Instability.Kind.OPEN_LOOP_FLUTTER, b.name(), b.speedEasMps()[0],
              b.frequencyHz()[0], true));
    }
    return Stream.concat(onsets, atStart).min(LOWEST);
  }

  /**
   * Lowest closed-loop onset: a refined crossing of an oscillatory root, or the first grid point
   * at which a closed-loop root has a positive real part when no refined onset lies at or below it
   * (a real root, or an instability present from the first point).
   */
  static Optional<Instability> closedLoop(ConfigurationResult c) {
    if (c.servo() == null) {
      return Optional.empty();
    }
    ClosedLoopResult r = c.servo().closedLoop();
    Optional<Instability> refined = onsets(r.crossings().stream(), Instability.Kind.CLOSED_LOOP_FLUTTER)
        .min(LOWEST);
    for (int p = 0; p < r.points().size(); p++) {
      ClosedLoopPoint cp = r.points().get(p);
      if (cp.maxRealPart() > 0) {
        double v = cp.condition().speedEasMps();
        if (refined.isPresent() && refined.get().speedEasMps() <= v) {
          return refined;
        }
        ClosedLoopRoot worst = cp.roots().stream().max(Comparator.comparingDouble(ClosedLoopRoot::realPerS))
            .orElseThrow();
        return Optional.of(new Instability(worst.imagRadPerS() > 0 ? Instability.Kind.CLOSED_LOOP_FLUTTER
            : Instability.Kind.CLOSED_LOOP_DIVERGENT_ROOT, worst.label(), v, worst.frequencyHz(), p == 0));
      }
    }
    return refined;
  }

  /** Static divergence (rigid body restrained), wherever it lies. */
  static Optional<Instability> divergence(ConfigurationResult c) {
    return c.divergence().found()
        ? Optional.of(new Instability(Instability.Kind.DIVERGENCE, "-", c.divergence().speedEasMps(), 0.0, false))
        : Optional.empty();
  }

  /** The lowest of the three. */
  static Optional<Instability> lowest(ConfigurationResult c) {
    return Stream.of(openLoop(c), closedLoop(c), divergence(c)).flatMap(Optional::stream).min(LOWEST);
  }

  private static Stream<Instability> onsets(Stream<FlutterCrossing> crossings, Instability.Kind kind) {
    return crossings.filter(x -> x.kind() == CrossingKind.FLUTTER_ONSET)
        .map(x -> new Instability(kind, x.branchName(), x.condition().speedEasMps(), x.frequencyHz(), false));
  }
}
