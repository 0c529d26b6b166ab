/**
 * Small dense numerical kernels that EJML and Commons Math do not provide: the complex general
 * eigen-decomposition (with complex eigenvectors), and complex vector helpers used by mode
 * tracking. Depends on EJML only. Nothing here prints, reads files or keeps global state.
 */
package org.flexmargin.numerics;
