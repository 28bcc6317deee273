package com.wayledger.engine.capacity;

import com.wayledger.engine.CircuitLocation;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.RatingUnit;

/**
 * The load someone wants to add.
 *
 * @param description what it is
 * @param category diversity category
 * @param ratingValue nameplate rating: kW when {@code ratingUnit} is W (the total for a three-phase
 *     load), or A (per line for a three-phase load)
 * @param ratingUnit W (given in kW) or A
 * @param powerFactor cos φ in (0, 1]
 * @param threePhase whether it needs a three-pole way
 * @param startUpSurgeMultiple peak start-up current as a multiple of running current; null when
 *     none
 * @param location where it will be, for the residual-current rules; null when not given (a proposal
 *     then includes 30 mA protection, the safe side)
 */
public record NewLoad(
    String description,
    LoadCategory category,
    double ratingValue,
    RatingUnit ratingUnit,
    double powerFactor,
    boolean threePhase,
    Double startUpSurgeMultiple,
    CircuitLocation location) {

  /** A load whose location is not given: the argument list from before locations. */
  public NewLoad(
      String description,
      LoadCategory category,
      double ratingValue,
      RatingUnit ratingUnit,
      double powerFactor,
      boolean threePhase,
      Double startUpSurgeMultiple) {
    this(
        description,
        category,
        ratingValue,
        ratingUnit,
        powerFactor,
        threePhase,
        startUpSurgeMultiple,
        null);
  }

  /**
   * Assumed duration of a start-up surge when only its multiple is given, ms (a typical motor
   * start).
   */
  public static final double DEFAULT_SURGE_MILLIS = 200.0;

  /** The load as one line of a circuit's load list. */
  public LoadSpec toLoadSpec() {
    double value = ratingUnit == RatingUnit.W ? ratingValue * 1000.0 : ratingValue;
    return new LoadSpec(
        description,
        category,
        1,
        value,
        ratingUnit,
        powerFactor,
        startUpSurgeMultiple,
        startUpSurgeMultiple == null ? null : DEFAULT_SURGE_MILLIS,
        false);
  }
}
