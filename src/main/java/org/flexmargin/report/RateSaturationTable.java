package org.flexmargin.report;

import java.util.List;
import java.util.Optional;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.sweep.ConfigurationResult;
import org.flexmargin.sweep.RateSaturation;
import org.flexmargin.sweep.ServoPoint;

/**
 * The per-point rate-saturation line in the HTML report: at the most critical structural
 * frequency, the command amplitude that drives the actuator to its rate limit (broken loop) and
 * the amplitude injected at the actuator command with the loop closed that does so. Written only
 * when the case gives an actuator rate limit.
 */
final class RateSaturationTable {
  private RateSaturationTable() {}

  static void write(XhtmlWriter w, ConfigurationResult c, LoopSpec loop, int index, SpeedAxisUnit unit) {
    List<Optional<RateSaturation.Line>> lines = RateSaturation.along(c, loop);
    if (lines.isEmpty()) {
      return;
    }
    w.element("h3", "Actuator rate saturation at the critical structural frequency");
    w.element("p", String.format(java.util.Locale.ROOT, "Rate limit %.0f deg/s. At each point, the structural "
        + "phase crossover closest to -1 (else the highest structural peak): the sinusoidal command amplitude "
        + "at the broken loop's input whose elevator rate |j w F(j w)| A reaches the limit (F: hold, delay and "
        + "actuator, exact), and the amplitude injected at the actuator command with the loop closed that does so "
        + "(A |1 + L|, L = -|L| at the crossover; only where the closed loop is stable). Smaller values mean the "
        + "structural loop saturates the actuator "
        + "sooner; beyond them the linear margins no longer describe the loop (see the time-domain simulation).",
        Math.toDegrees(loop.actuator().rateLimitRadPerS())));
    w.open("table", "class", "per-speed compact");
    w.open("thead").open("tr");
    for (String h : List.of("EAS (" + unit.symbol() + ")", "frequency (Hz)", "|L|", "|F| (dB)",
        "command, loop open (deg)", "injection, loop closed (deg)", "basis")) {
      w.element("th", h);
    }
    w.close("tr").close("thead").open("tbody");
    List<ServoPoint> pts = c.servo().points();
    for (int i = 0; i < pts.size(); i++) {
      String base = "/configurations/" + index + "/loop/points/" + i + "/rate_saturation/";
      w.open("tr");
      w.element("td", OpenLoopSections.fmt(unit.fromMps(pts.get(i).condition().speedEasMps()), 2), "class", "num");
      Optional<RateSaturation.Line> line = lines.get(i);
      if (line.isEmpty()) {
        w.element("td", "no structural frequency known", "colspan", "6");
      } else {
        RateSaturation.Line l = line.get();
        w.element("td", OpenLoopSections.fmt(l.frequencyHz(), 2), "class", "num", "data-json", base + "frequency_hz",
            "data-value", Double.toString(l.frequencyHz()));
        w.element("td", OpenLoopSections.fmt(l.loopMagnitude(), 3), "class", "num");
        w.element("td", OpenLoopSections.fmt(20 * Math.log10(l.elevatorPerCommand()), 1), "class", "num");
        // shown in degrees; results.json has radians (command_amplitude_rad, closed_loop_injection_amplitude_rad)
        w.element("td", OpenLoopSections.fmt(Math.toDegrees(l.commandAmplitudeRad()), 3), "class", "num");
        w.element("td", OpenLoopSections.fmt(Math.toDegrees(l.closedLoopInjectionAmplitudeRad()), 3), "class",
            "num");
        w.element("td", l.basis());
      }
      w.close("tr");
    }
    w.close("tbody").close("table");
  }
}
