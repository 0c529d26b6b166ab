package org.flexmargin.notch;

/**
 * A mode's worst structural peak before and after the notch design.
 *
 * @param mode mode name
 * @param before with the case's own filters
 * @param after with the designed notches
 */
public record ModePeakChange(String mode, ModePeak before, ModePeak after) {}
