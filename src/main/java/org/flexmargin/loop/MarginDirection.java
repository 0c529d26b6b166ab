package org.flexmargin.loop;

/** Which way the loop gain must move to reach a phase crossover's critical point. */
public enum MarginDirection {
  /** |L| &lt; 1 at the phase crossover: instability if the gain rises by the margin (GM &gt; 0 dB). */
  GAIN_INCREASE,
  /** |L| &gt; 1 at the phase crossover: instability if the gain falls by the margin (GM &lt; 0 dB). */
  GAIN_REDUCTION
}
