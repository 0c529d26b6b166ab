package org.flexmargin.notch;

/**
 * A structural peak recomputed independently on the full loop ({@link org.flexmargin.loop.LoopMargins}
 * peak search over the mode's band, adaptive grid and Brent refinement).
 *
 * @param mode mode name
 * @param where configuration, point, EAS, frequency shift
 * @param peakDb max |L| over the band, dB
 * @param frequencyHz where, Hz
 */
public record CheckedPeak(String mode, SampleLabel where, double peakDb, double frequencyHz) {}
