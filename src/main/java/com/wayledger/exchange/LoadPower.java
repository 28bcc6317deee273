package com.wayledger.exchange;

import com.wayledger.board.LoadForm;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.demand.ConnectedLoad;

/** P and Q of one load line by the demand engine's own rule, for figures written as values. */
final class LoadPower {

  private LoadPower() {}

  /** {P W, Q var} of the load line; zeros when the engine cannot assess it. */
  static double[] of(LoadForm load, PhasePosition position, double nominalVoltageVolts) {
    if (load.quantity() == null || load.ratingValue() == null || load.powerFactor() == null) {
      return new double[2];
    }
    ConnectedLoad connected =
        ConnectedLoad.of(
            new LoadSpec(load.description(), load.category(), load.quantity(), load.ratingValue(), load.ratingUnit(),
                load.powerFactor(), load.startUpSurgeMultiple(), load.startUpSurgeMillis(), load.continuous()),
            nominalVoltageVolts, position == PhasePosition.THREE_POLE);
    return new double[] {connected.activeWatts(), connected.reactiveVars()};
  }
}
