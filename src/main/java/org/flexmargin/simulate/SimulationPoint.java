package org.flexmargin.simulate;

import java.util.List;
import org.flexmargin.aero.RationalFit;
import org.flexmargin.aero.RationalFits;
import org.flexmargin.ase.RationalAerodynamics;
import org.flexmargin.ase.ServoLoop;
import org.flexmargin.atmosphere.FlightCondition;
import org.flexmargin.model.Configuration;
import org.flexmargin.model.ElasticMode;
import org.flexmargin.model.InvalidInputException;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.RationalFitSettings;
import org.flexmargin.sweep.ConfigurationModel;
import org.flexmargin.sweep.ServoMargins;

/**
 * One configuration at one flight condition, ready to simulate: the same plant and law as the
 * sweep ({@link ServoMargins#loopAt}) and the rational approximation of the elastic forces the
 * sweep's closed loop uses (the case's rational-fit settings; by default Roger's form with four lag
 * roots), fitted up to 1.5 times the reduced frequency of the highest mode at this speed (at least
 * 0.5, at most the aerodynamic data's range) unless the settings give the range. Immutable.
 *
 * @param configurationName configuration name
 * @param condition flight condition
 * @param servo the loop at the condition
 * @param rational the elastic forces in rational form
 * @param fitDescription the fit and its worst element error, in words
 * @param fitWarnings the fit's own warnings
 * @param referenceChordM the rigid body's reference chord c (m), &gt; 0; c / 2 is the length of
 *     the reduced time of unsteady lift growth
 */
public record SimulationPoint(String configurationName, FlightCondition condition, ServoLoop servo,
    RationalAerodynamics rational, String fitDescription, List<String> fitWarnings, double referenceChordM) {

  /** Copies and validates. */
  public SimulationPoint {
    fitWarnings = List.copyOf(fitWarnings);
    if (!(referenceChordM > 0) || !Double.isFinite(referenceChordM)) {
      throw new InvalidInputException("rigid_body.reference_chord_m", "a finite chord > 0 m",
          String.valueOf(referenceChordM));
    }
  }

  /**
   * @param model the configuration's aeroelastic model
   * @param configuration the configuration
   * @param loop the loop
   * @param condition the flight condition
   * @return the point
   */
  public static SimulationPoint of(ConfigurationModel model, Configuration configuration, LoopSpec loop,
      FlightCondition condition) {
    return of(model, configuration, loop, condition, RationalFitSettings.defaults());
  }

  /**
   * @param model the configuration's aeroelastic model
   * @param configuration the configuration
   * @param loop the loop
   * @param condition the flight condition
   * @param fitSettings how the elastic forces are approximated (the case's {@code rational_fit})
   * @return the point
   */
  public static SimulationPoint of(ConfigurationModel model, Configuration configuration, LoopSpec loop,
      FlightCondition condition, RationalFitSettings fitSettings) {
    double fmax = model.modes().modes().stream().mapToDouble(ElasticMode::frequencyHz).max().orElse(1);
    double b = model.system().aero().referenceSemichordM();
    double kMax = Math.min(model.system().aero().maxReducedFrequency(),
        Math.max(0.5, 1.5 * 2 * Math.PI * fmax * b / condition.speedTasMps()));
    RationalFit fit = RationalFits.fit(model.system().aero(), fitSettings, kMax);
    String text = RationalFits.summary(fit);
    return new SimulationPoint(configuration.name(), condition,
        ServoMargins.loopAt(model, configuration, loop, condition), RationalAerodynamics.of(fit), text,
        fit.warnings(), configuration.rigidBody().referenceChordM());
  }

  /**
   * @param closure open or closed loop
   * @return the simulation model at this point
   */
  public AircraftSimulationModel model(LoopClosure closure) {
    return AircraftSimulationModel.of(servo, rational, closure);
  }

  /**
   * @param closure open or closed loop
   * @param penetration wing-to-tail gust delay, or null
   * @return the simulation model at this point
   */
  public AircraftSimulationModel model(LoopClosure closure, GustPenetration penetration) {
    return model(closure, penetration, LiftGrowth.QUASI_STEADY);
  }

  /**
   * @param closure open or closed loop
   * @param penetration wing-to-tail gust delay, or null
   * @param growth quasi-steady or unsteady rigid-body lift (reduced time on half the reference chord)
   * @return the simulation model at this point
   */
  public AircraftSimulationModel model(LoopClosure closure, GustPenetration penetration, LiftGrowth growth) {
    return AircraftSimulationModel.of(servo, rational, closure, penetration, growth, referenceChordM / 2);
  }
}
