/**
 * Interpolation of structural displacements to aerodynamic points: the infinite-plate surface
 * spline (Harder and Desmarais, J. Aircraft 9(2), 1972) and a beam spline along a straight
 * reference axis. Both reproduce rigid-body heave and pitch exactly; {@link
 * org.flexmargin.spline.SplineMatrix} carries the interpolation as a matrix so that every mode is
 * one product.
 */
package org.flexmargin.spline;
