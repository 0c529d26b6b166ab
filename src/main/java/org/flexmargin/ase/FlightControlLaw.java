package org.flexmargin.ase;

import java.util.ArrayList;
import java.util.List;
import org.flexmargin.loop.DiscreteFilter;
import org.flexmargin.loop.FirstOrderLag;
import org.flexmargin.loop.Gain;
import org.flexmargin.loop.LinearBlock;
import org.flexmargin.loop.NotchFilter;
import org.flexmargin.loop.PadeOrder;
import org.flexmargin.loop.ProportionalIntegral;
import org.flexmargin.loop.PureDelay;
import org.flexmargin.loop.SecondOrderActuator;
import org.flexmargin.loop.SecondOrderLowPass;
import org.flexmargin.loop.SeriesBlock;
import org.flexmargin.loop.TransferFunctionBlock;
import org.flexmargin.model.ActuatorOrder;
import org.flexmargin.model.FeedbackPath;
import org.flexmargin.model.FilterSpec;
import org.flexmargin.model.LoopSpec;
import org.flexmargin.model.LowPassFilterSpec;
import org.flexmargin.model.NotchFilterSpec;
import org.flexmargin.model.SensorSpec;

/**
 * The control law of a {@link LoopSpec} at one dynamic pressure, as loop blocks:
 *
 * <ul>
 *   <li>one path block per feedback path: sensor lag (if the sensor has a bandwidth), the path's
 *       filters in order, then factor(q) (Kp + Ki/s);
 *   <li>the forward block from elevator command to achieved elevator: zero-order hold (if
 *       sampled), computational delay (if any), actuator.
 * </ul>
 *
 * <p>Immutable.
 *
 * @param paths path blocks, in the order of the loop spec's paths
 * @param pathSensorIndex index into the loop's sensor list of each path's sensor
 * @param forward elevator command to achieved elevator
 */
public record FlightControlLaw(List<LinearBlock> paths, int[] pathSensorIndex, LinearBlock forward) {
  /** Copies. */
  public FlightControlLaw {
    paths = List.copyOf(paths);
    pathSensorIndex = pathSensorIndex.clone();
  }

  @Override
  public int[] pathSensorIndex() {
    return pathSensorIndex.clone();
  }

  /**
   * @param loop the loop specification
   * @param dynamicPressurePa dynamic pressure for the gain schedules (Pa)
   * @return the blocks of the law
   */
  public static FlightControlLaw of(LoopSpec loop, double dynamicPressurePa) {
    PadeOrder pade = PadeOrder.ofDegree(loop.padeOrder());
    List<LinearBlock> paths = new ArrayList<>();
    int[] sensorIndex = new int[loop.paths().size()];
    for (int p = 0; p < loop.paths().size(); p++) {
      FeedbackPath path = loop.paths().get(p);
      SensorSpec sensor = loop.sensor(path.sensor());
      sensorIndex[p] = loop.sensors().indexOf(sensor);
      List<LinearBlock> chain = new ArrayList<>();
      if (sensor.bandwidthHz() > 0) {
        chain.add(FirstOrderLag.ofBandwidthHz(sensor.bandwidthHz()));
      }
      for (FilterSpec f : path.filters()) {
        chain.add(filter(f, loop.samplePeriodS()));
      }
      double factor = path.schedule().at(dynamicPressurePa);
      if (path.integralGainPerS() != 0) {
        chain.add(new ProportionalIntegral(factor * path.proportionalGain(), factor * path.integralGainPerS()));
      } else {
        chain.add(new Gain(factor * path.proportionalGain()));
      }
      paths.add(chain.size() == 1 ? chain.get(0) : new SeriesBlock(chain));
    }
    List<LinearBlock> fwd = new ArrayList<>();
    if (loop.samplePeriodS() > 0) {
      fwd.add(new org.flexmargin.loop.ZeroOrderHold(loop.samplePeriodS(), pade));
    }
    if (loop.computationDelayS() > 0) {
      fwd.add(new PureDelay(loop.computationDelayS(), pade));
    }
    fwd.add(actuator(loop));
    return new FlightControlLaw(paths, sensorIndex, fwd.size() == 1 ? fwd.get(0) : new SeriesBlock(fwd));
  }

  /** @return the block of a continuous filter specification (not {@link FilterSpec.Discrete}) */
  public static LinearBlock filter(FilterSpec f) {
    return filter(f, 0.0);
  }

  /**
   * The block of a filter specification. Lead-lag, washout and second-order sections are transfer
   * functions with the coefficients of their definitions ({@link FilterSpec}); a digital filter is
   * evaluated at z = e^{j w T} ({@link DiscreteFilter}).
   *
   * @param f the specification
   * @param samplePeriodS the loop's sample period, s (&gt; 0 for a digital filter)
   * @return the block
   */
  public static LinearBlock filter(FilterSpec f, double samplePeriodS) {
    if (f instanceof NotchFilterSpec n) {
      return new NotchFilter(n.centreHz(), n.numeratorDampingRatio(), n.denominatorDampingRatio());
    }
    if (f instanceof LowPassFilterSpec lp) {
      return new SecondOrderLowPass(lp.cornerHz(), lp.dampingRatio());
    }
    if (f instanceof FilterSpec.LeadLag ll) {
      return new TransferFunctionBlock(new double[] {1 / (2 * Math.PI * ll.zeroHz()), 1},
          new double[] {1 / (2 * Math.PI * ll.poleHz()), 1});
    }
    if (f instanceof FilterSpec.Washout w) {
      return new TransferFunctionBlock(new double[] {w.timeConstantS(), 0}, new double[] {w.timeConstantS(), 1});
    }
    if (f instanceof FilterSpec.SecondOrder so) {
      double wn = 2 * Math.PI * so.numeratorFrequencyHz();
      double wd = 2 * Math.PI * so.denominatorFrequencyHz();
      return new TransferFunctionBlock(new double[] {1 / (wn * wn), 2 * so.numeratorDampingRatio() / wn, 1},
          new double[] {1 / (wd * wd), 2 * so.denominatorDampingRatio() / wd, 1});
    }
    if (f instanceof FilterSpec.TransferFunction tf) {
      return new TransferFunctionBlock(tf.coefficients().numerator(), tf.coefficients().denominator());
    }
    FilterSpec.Discrete d = (FilterSpec.Discrete) f;
    return new DiscreteFilter(d.coefficients().numerator(), d.coefficients().denominator(), samplePeriodS);
  }

  private static LinearBlock actuator(LoopSpec loop) {
    if (loop.actuator().order() == ActuatorOrder.FIRST) {
      return FirstOrderLag.ofBandwidthHz(loop.actuator().bandwidthHz());
    }
    return new SecondOrderActuator(loop.actuator().bandwidthHz(), loop.actuator().dampingRatio());
  }
}
