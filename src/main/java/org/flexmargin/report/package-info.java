/**
 * Report output of an analysis: the data files ({@link org.flexmargin.report.ResultFiles}), the
 * charts ({@link org.flexmargin.report.FlutterCharts} for V-g and V-f,
 * {@link org.flexmargin.report.MarginCharts} for loop margins against airspeed with the requirement
 * steps and margin onsets, {@link org.flexmargin.report.ClosedLoopCharts} for the root locus and the
 * closed-loop V-g and V-f, {@link org.flexmargin.report.LoopResponseCharts} for Bode, Nichols and
 * notch charts; all drawn with XChart in our own
 * {@link org.flexmargin.report.ReportStyle}) and the self-contained HTML page
 * ({@link org.flexmargin.report.HtmlReport} with the sections of
 * {@link org.flexmargin.report.OpenLoopSections} and {@link org.flexmargin.report.ClearanceSections}),
 * all written through
 * {@link org.flexmargin.report.ReportWriter} into a folder that
 * {@link org.flexmargin.report.ReportFolder} moves into place atomically. Every report carries the
 * {@link org.flexmargin.report.Cautions}.
 *
 * <p>Reads results: depends on {@code model}, {@code atmosphere}, {@code flutter}, {@code sweep},
 * {@code clearance}, {@code loop} and {@code ase} (the Bode and Nichols charts re-evaluate the exact
 * broken loop at chosen speeds through {@code sweep.ServoMargins.loopAt}), never on the command line.
 */
package org.flexmargin.report;
