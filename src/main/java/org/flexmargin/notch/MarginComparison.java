package org.flexmargin.notch;

/**
 * Rigid-body margins before and after at one flight point, recomputed independently.
 *
 * @param before with the case's own filters
 * @param after with the designed notches
 */
public record MarginComparison(RigidMargins before, RigidMargins after) {}
