package org.flexmargin.sweep;

import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.loop.LoopMarginResult;

/**
 * Loop margins at one sweep point, from the exact broken-loop response.
 *
 * @param pathParameter path parameter t (grid points are integers)
 * @param condition flight condition
 * @param margins all crossings, disk margin, peak gain and diagnostics of L(j w)
 */
public record ServoPoint(double pathParameter, FlightCondition condition, LoopMarginResult margins) {}
