package org.flexmargin.model;

/**
 * How mode shapes at structural points are carried to the boxes of a lifting surface.
 *
 * <p>Example: a wing whose mode table gives heave and pitch of the elastic axis at stations along
 * the span uses {@link #BEAM}; a tailplane whose mode table gives vertical displacements at
 * scattered grid points over its planform uses {@link #SURFACE}.
 */
public enum SplineKind {
  /**
   * Beam spline along a straight axis parallel to y: stations carry displacement and streamwise
   * pitch, chords move rigidly.
   */
  BEAM,
  /**
   * Infinite-plate surface spline (Harder and Desmarais 1972) of the vertical displacements at the
   * points; rotations are not used.
   */
  SURFACE
}
