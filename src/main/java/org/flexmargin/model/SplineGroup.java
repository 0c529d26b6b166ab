package org.flexmargin.model;

import java.util.List;

/**
 * One spline: the structural points that move a set of lifting surfaces.
 *
 * @param kind beam or surface spline
 * @param surfaces names of the lifting surfaces it moves, at least one
 * @param points the structural points, at least two for a beam and three for a surface spline
 */
public record SplineGroup(SplineKind kind, List<String> surfaces, List<SplinePoint> points) {
  /** Validates and copies. */
  public SplineGroup {
    if (kind == null) {
      throw new InvalidInputException("kind", "beam or surface", "none");
    }
    surfaces = Checks.nonEmpty("surfaces", surfaces);
    points = Checks.nonEmpty("points", points);
    int min = kind == SplineKind.BEAM ? 2 : 3;
    if (points.size() < min) {
      throw new InvalidInputException(
          "points", "at least " + min + " points for a " + kind.name().toLowerCase() + " spline",
          points.size() + "");
    }
  }
}
