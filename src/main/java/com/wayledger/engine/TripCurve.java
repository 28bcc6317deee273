package com.wayledger.engine;

/**
 * Instantaneous tripping type of an IEC 60898-1 breaker: the band of multiples of In within which
 * the magnetic element trips without intentional delay (B 3–5, C 5–10, D 10–20 × In).
 */
public enum TripCurve {
  B(3.0, 5.0),
  C(5.0, 10.0),
  D(10.0, 20.0);

  private final double lowestInstantMultiple;
  private final double highestInstantMultiple;

  TripCurve(double lowestInstantMultiple, double highestInstantMultiple) {
    this.lowestInstantMultiple = lowestInstantMultiple;
    this.highestInstantMultiple = highestInstantMultiple;
  }

  /**
   * Lower edge of the instantaneous band, multiple of In: at or below it the breaker must not trip
   * instantly.
   */
  public double lowestInstantMultiple() {
    return lowestInstantMultiple;
  }

  /**
   * Upper edge of the instantaneous band, multiple of In: at or above it the breaker must trip
   * instantly.
   */
  public double highestInstantMultiple() {
    return highestInstantMultiple;
  }
}
