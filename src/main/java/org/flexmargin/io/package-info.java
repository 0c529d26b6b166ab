/**
 * Reading and validating input files: case files, mode tables (JSON or CSV) and tables of
 * generalized aerodynamic forces, format 1, into the records of {@code org.flexmargin.model}.
 * Failures are {@link org.flexmargin.io.InputFileException}s that name file, line, field path,
 * expected and found. The format is documented in {@code docs/case-files.md}.
 */
package org.flexmargin.io;
