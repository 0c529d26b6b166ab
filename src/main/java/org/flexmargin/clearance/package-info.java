/**
 * Clearance against requirements: looks up the required gain and phase margins by frequency band
 * and speed regime ({@link org.flexmargin.clearance.RequirementLookup}), checks one broken loop at
 * one airspeed ({@link org.flexmargin.clearance.PointAssessor}: every gain and phase crossover,
 * gain or phase stabilisation of every structural mode, nominal stability), applies the flutter
 * speed and damping rule ({@link org.flexmargin.clearance.FlutterClearanceRule}) and offers the
 * excess functions from which the sweep refines margin onsets
 * ({@link org.flexmargin.clearance.MarginOnsets}).
 *
 * <p>The requirement tables themselves are input records in {@code org.flexmargin.model}
 * ({@link org.flexmargin.model.ClearanceRequirements},
 * {@link org.flexmargin.model.RequirementPresets}). Presets are recalled from published
 * specifications for convenience; the edition and criteria that apply to a programme are set by
 * its contract, its certification basis and licensed engineering judgement. Results support, and
 * never replace, ground vibration and structural coupling tests, flight flutter testing and the
 * approval of the responsible airworthiness authority.
 *
 * <p>Depends on {@code org.flexmargin.model}, {@code org.flexmargin.loop} and Commons Math only.
 * Units: dB (20 log10 of an amplitude ratio), degrees, Hz, m/s equivalent airspeed, damping g in
 * the V-g sign convention (negative = stable).
 */
package org.flexmargin.clearance;
