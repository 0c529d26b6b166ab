package org.flexmargin.model;

/** A filter in a feedback path: second-order notch or second-order low-pass. */
public sealed interface FilterSpec permits NotchFilterSpec, LowPassFilterSpec {}
