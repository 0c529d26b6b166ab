package org.flexmargin.notch;

/**
 * One requirement not met at one sample.
 *
 * @param kind which requirement
 * @param mode mode name for a structural peak, "rigid body" otherwise
 * @param where the sample
 * @param value the achieved value: peak in dB, phase margin in deg or gain margin in dB
 * @param limit the requirement in the same unit (peak limit, required margin; negative for the
 *     gain-reduction margin)
 * @param excess by how much it is missed, same unit, &gt; 0
 * @param frequencyHz where the peak or crossover is, Hz (NaN if not known)
 */
public record ConstraintViolation(ConstraintKind kind, String mode, SampleLabel where, double value,
    double limit, double excess, double frequencyHz) {}
