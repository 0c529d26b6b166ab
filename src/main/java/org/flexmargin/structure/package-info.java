/**
 * Structural dynamics: the {@link org.flexmargin.structure.StructuralModel} (M, C, K in
 * generalized coordinates) used by the flutter solvers, and the conversion of the built-in
 * validation structures of the model package (uniform cantilever wing, typical section) into
 * normal modes ({@link org.flexmargin.model.ModeTable}) and strip-theory aerodynamics
 * ({@link org.flexmargin.model.StripTheorySpec}), so that the rest of the tool sees only mode
 * tables. {@link org.flexmargin.structure.TrapezoidalPlateRitz} gives the modes of a swept,
 * tapered orthotropic cantilever plate at chosen points of its planform, for the lattice's
 * surface spline.
 *
 * <p>Conventions:
 *
 * <ul>
 *   <li>SI units throughout: m, kg, s, rad, N.
 *   <li>Displacement (heave, bending) of the elastic axis positive <b>up</b>; rotation (pitch,
 *       twist) positive <b>nose up</b>; chordwise offsets positive <b>aft</b>. A point x aft of
 *       the elastic axis moves up by {@code w - x theta}, so a centre of mass aft of the axis
 *       gives a <em>negative</em> heave-pitch mass coupling.
 *   <li>Span coordinate y from the clamped root (0) to the tip (L).
 *   <li>Normal modes are mass- and stiffness-orthogonal, ordered by ascending frequency, named
 *       {@code mode_1, mode_2, ...}; each is scaled so that its largest translation, counting a
 *       rotation as semichord times angle, is +1 m; the generalized mass (kg) is reported with
 *       that scaling. Generalized stiffness is omega^2 times generalized mass.
 *   <li>Damping of built-in structures is a viscous ratio zeta on every normal mode (modal
 *       damping); {@link org.flexmargin.structure.StructuralModel#fromModeTable} turns it into
 *       C_ii = 2 zeta_i omega_i m_i.
 *   <li>Strip stations of the cantilever wing are the strip midpoints, named {@code strip_01,
 *       strip_02, ...} (zero-padded to the digit count of the strip number, at least two
 *       digits); the typical section has the single station {@code section}.
 * </ul>
 */
package org.flexmargin.structure;
