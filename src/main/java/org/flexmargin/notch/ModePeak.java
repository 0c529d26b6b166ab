package org.flexmargin.notch;

/**
 * The worst structural peak of one mode over samples, and where it occurs.
 *
 * @param mode mode name
 * @param peakDb max |L| over the mode's band, dB
 * @param frequencyHz where, Hz
 * @param where configuration, sweep point, EAS and frequency shift of the worst sample
 */
public record ModePeak(String mode, double peakDb, double frequencyHz, SampleLabel where) {}
