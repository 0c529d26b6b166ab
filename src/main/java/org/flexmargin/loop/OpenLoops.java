package org.flexmargin.loop;

import java.util.ArrayList;
import java.util.List;
import org.flexmargin.model.LoopFile;
import org.flexmargin.model.MeasuredTable;
import org.flexmargin.model.OpenLoopData;

/**
 * The broken loop of a {@link LoopFile} as loop blocks: the model (transfer function, zeros, poles
 * and gain, or state space) or the measured response, in series with the zero-order hold (sample
 * period T) and the pure delay of the file. The frequency responses are exact (e^{-j w tau}, the
 * hold's sinc(w T/2) e^{-j w T/2}); the state space uses Padé approximations of both (for the
 * nominal closed-loop stability only). Stateless.
 */
public final class OpenLoops {
  private OpenLoops() {}

  /**
   * @param data a model form (not a measured response)
   * @return the model as a block
   */
  public static LinearBlock model(OpenLoopData data) {
    if (data instanceof OpenLoopData.TransferFunction t) {
      return new TransferFunctionBlock(t.coefficients().numerator(), t.coefficients().denominator());
    }
    if (data instanceof OpenLoopData.ZerosPolesGain z) {
      double[] num = Polynomials.fromRoots(z.zerosReal(), z.zerosImag(), "zeros");
      for (int i = 0; i < num.length; i++) {
        num[i] *= z.gain();
      }
      return new TransferFunctionBlock(num, Polynomials.fromRoots(z.polesReal(), z.polesImag(), "poles"));
    }
    if (data instanceof OpenLoopData.StateSpaceModel s) {
      int n = s.b().length;
      double[][] b = new double[n][];
      for (int i = 0; i < n; i++) {
        b[i] = new double[] {s.b()[i]};
      }
      return new StateSpaceBlock(StateSpace.of(s.a(), b, new double[][] {s.c()}, new double[][] {{s.d()}}));
    }
    throw new IllegalArgumentException("a measured response is not a model: " + data);
  }

  /**
   * @param table a measured table
   * @return its frequency function (phase unwrapped, log-frequency interpolation)
   */
  public static MeasuredResponse measured(MeasuredTable table) {
    return new MeasuredResponse(table);
  }

  /**
   * @param file the loop file
   * @param pade Padé order of the state-space face of the hold and the delay
   * @return the zero-order hold and the delay in series, or null when the file has neither
   */
  public static LinearBlock digitalEffects(LoopFile file, PadeOrder pade) {
    List<LinearBlock> blocks = new ArrayList<>();
    if (file.samplePeriodS() > 0) {
      blocks.add(new ZeroOrderHold(file.samplePeriodS(), pade));
    }
    if (file.delayS() > 0) {
      blocks.add(new PureDelay(file.delayS(), pade));
    }
    return blocks.isEmpty() ? null : blocks.size() == 1 ? blocks.get(0) : new SeriesBlock(blocks);
  }

  /**
   * The complete broken loop of a model file, as a block (so that its closed-loop stability can be
   * checked).
   *
   * @param file a loop file whose loop is a model
   * @param pade Padé order of the hold and delay in the state space
   * @return model, then hold and delay
   */
  public static LinearBlock modelLoop(LoopFile file, PadeOrder pade) {
    LinearBlock m = model(file.loop());
    LinearBlock extra = digitalEffects(file, pade);
    return extra == null ? m : new SeriesBlock(List.of(m, extra));
  }

  /**
   * The complete broken loop of a measured file, as a frequency function.
   *
   * @param file a loop file whose loop is a measured response
   * @param pade Padé order (unused by the exact responses, kept for symmetry of the blocks)
   * @return the measured response, times hold and delay when the file has them
   */
  public static SisoFrequencyFunction measuredLoop(LoopFile file, PadeOrder pade) {
    MeasuredResponse m = measured(((OpenLoopData.Measured) file.loop()).table());
    LinearBlock extra = digitalEffects(file, pade);
    return extra == null ? m : new ResponseProduct(m, extra);
  }
}
