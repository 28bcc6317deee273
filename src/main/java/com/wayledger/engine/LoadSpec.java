package com.wayledger.engine;

/**
 * One line of a circuit's load list: a number of identical items with one nameplate rating.
 *
 * @param description what the load is
 * @param category diversity category
 * @param quantity number of identical items, at least 1
 * @param ratingValue nameplate rating of one item in {@code ratingUnit}; for a three-phase load in
 *     A, per line
 * @param ratingUnit W, VA or A
 * @param powerFactor cos φ in (0, 1], lagging
 * @param startUpSurgeMultiple peak start-up current as a multiple of running current; null when
 *     none
 * @param startUpSurgeMillis duration of the start-up surge, ms; null when none
 * @param continuous whether the load runs for three hours or more at a time
 * @param motorHorsepower rated horsepower of one motor (NEC Tables 430.248/430.250 are read by it);
 *     null when not recorded or not a motor
 */
public record LoadSpec(
    String description,
    LoadCategory category,
    int quantity,
    double ratingValue,
    RatingUnit ratingUnit,
    double powerFactor,
    Double startUpSurgeMultiple,
    Double startUpSurgeMillis,
    boolean continuous,
    Double motorHorsepower) {

  /** A load with no motor horsepower recorded: the argument list from before motor ratings. */
  public LoadSpec(
      String description,
      LoadCategory category,
      int quantity,
      double ratingValue,
      RatingUnit ratingUnit,
      double powerFactor,
      Double startUpSurgeMultiple,
      Double startUpSurgeMillis,
      boolean continuous) {
    this(
        description,
        category,
        quantity,
        ratingValue,
        ratingUnit,
        powerFactor,
        startUpSurgeMultiple,
        startUpSurgeMillis,
        continuous,
        null);
  }
}
