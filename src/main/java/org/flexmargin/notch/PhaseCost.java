package org.flexmargin.notch;

/**
 * Phase loss of a notch set at the rigid-body gain crossovers (of the loop without the designed
 * notches), the worst over the samples of one configuration (or of all).
 *
 * @param configuration configuration name, or "all"
 * @param worstLossDeg -arg prod N_i(j w_c), deg, positive = lag
 * @param crossoverHz w_c / (2 pi) of that worst loss, Hz (NaN if no rigid crossover)
 * @param where the sample where it occurs (null if none)
 */
public record PhaseCost(String configuration, double worstLossDeg, double crossoverHz, SampleLabel where) {}
