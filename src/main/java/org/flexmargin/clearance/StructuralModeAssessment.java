package org.flexmargin.clearance;

/**
 * The structural-coupling assessment of one mode over its frequency uncertainty band.
 *
 * @param modeName mode name
 * @param modeFrequencyHz current mode frequency f, Hz
 * @param bandLowHz f (1 - u), Hz
 * @param bandHighHz f (1 + u), Hz
 * @param peakDb largest 20 log10 |L| over the band, dB
 * @param peakFrequencyHz frequency of that peak, Hz
 * @param phaseDistanceDeg least distance of arg L from -180 deg (mod 360), in [0, 180] deg, over
 *     the frequencies of the band where |L| is at or above the peak limit, together with the peak
 *     frequency itself (so the value is defined, and continuous, also when gain-stabilised)
 * @param phaseDistanceFrequencyHz frequency of that least distance, Hz
 * @param peakLimitDb the gain-stabilisation limit applied, dB
 * @param phaseMarginDeg the phase-stabilisation margin applied, deg
 * @param status the classification
 * @param evaluations evaluations of L used
 */
public record StructuralModeAssessment(String modeName, double modeFrequencyHz,
    double bandLowHz, double bandHighHz, double peakDb, double peakFrequencyHz,
    double phaseDistanceDeg, double phaseDistanceFrequencyHz, double peakLimitDb,
    double phaseMarginDeg, StructuralStabilisation status, int evaluations) {}
