package org.flexmargin.model;

import java.util.List;

/**
 * An explicit list of flight points, analysed in the order given; onsets are refined along the
 * straight segment (altitude and speed interpolated linearly) between consecutive points.
 *
 * @param points at least two points
 */
public record PointList(List<SweepPoint> points) implements SweepPlan {
  /** Validates and copies. */
  public PointList {
    points = Checks.nonEmpty("points", points);
    if (points.size() < 2) {
      throw new InvalidInputException("points", "at least two points", "1");
    }
  }

  @Override
  public int pointCount() {
    return points.size();
  }
}
