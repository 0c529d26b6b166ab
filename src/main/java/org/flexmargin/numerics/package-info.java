/**
 * Small dense numerical kernels that EJML and Commons Math do not provide, or not fast enough:
 * the complex general eigen-decomposition (with complex eigenvectors), the eigenvalues of a real
 * matrix by balancing and Francis double-shift QR (for sweeps that solve many matrices of the
 * same size), and complex vector helpers used by mode tracking. Depends on EJML only. Nothing
 * here prints, reads files or keeps global state.
 */
package org.flexmargin.numerics;
