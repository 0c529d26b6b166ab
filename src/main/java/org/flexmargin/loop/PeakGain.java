package org.flexmargin.loop;

/**
 * The largest |L(j w)| found over the analysed range (located by Brent's method around the
 * largest sampled local maxima).
 *
 * @param omegaRadPerS frequency of the peak, rad/s
 * @param frequencyHz the same in Hz
 * @param magnitude |L| at the peak
 * @param magnitudeDb 20 log10 |L| at the peak, dB
 */
public record PeakGain(double omegaRadPerS, double frequencyHz, double magnitude,
    double magnitudeDb) {}
