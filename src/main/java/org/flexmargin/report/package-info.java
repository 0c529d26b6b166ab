/**
 * Report output of an analysis: the data files ({@link org.flexmargin.report.ResultFiles}), the
 * charts ({@link org.flexmargin.report.FlutterCharts}, drawn with XChart in our own
 * {@link org.flexmargin.report.ReportStyle}) and the self-contained HTML page
 * ({@link org.flexmargin.report.HtmlReport} with the sections of
 * {@link org.flexmargin.report.OpenLoopSections}), all written through
 * {@link org.flexmargin.report.ReportWriter} into a folder that
 * {@link org.flexmargin.report.ReportFolder} moves into place atomically. Every report carries the
 * {@link org.flexmargin.report.Cautions}.
 *
 * <p>Reads results only: depends on {@code model}, {@code atmosphere}, {@code flutter} and
 * {@code sweep}, never on the solvers' internals or the command line.
 */
package org.flexmargin.report;
