package org.flexmargin.model;

/**
 * The flight points of a sweep, ordered along a one-parameter path so that onsets can be refined
 * between neighbouring points.
 */
public sealed interface SweepPlan permits SpeedSweep, MachSweep, PointList {
  /** @return number of grid points on the path */
  int pointCount();
}
