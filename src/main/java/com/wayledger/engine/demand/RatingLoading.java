package com.wayledger.engine.demand;

/**
 * The highest phase current of a board against one rating (incomer device, busbar, supply fuse).
 *
 * @param subject what the rating belongs to, in plain words
 * @param ratingAmps the rating, A; null when not known
 * @param highestPhaseCurrentAmps the largest phase current, A
 * @param loadingPercent highest phase current ÷ rating, %; null when not assessed
 * @param notAssessedReason why no loading is given; null when it is
 */
public record RatingLoading(
    String subject,
    Double ratingAmps,
    double highestPhaseCurrentAmps,
    Double loadingPercent,
    String notAssessedReason) {

  static RatingLoading of(String subject, Double ratingAmps, double highestPhaseCurrentAmps) {
    if (ratingAmps == null) {
      return new RatingLoading(
          subject,
          null,
          highestPhaseCurrentAmps,
          null,
          "not assessed — missing " + subject + " rating");
    }
    if (!(ratingAmps > 0)) {
      return new RatingLoading(
          subject,
          ratingAmps,
          highestPhaseCurrentAmps,
          null,
          "not assessed — " + subject + " rating must be above 0 A");
    }
    return new RatingLoading(
        subject,
        ratingAmps,
        highestPhaseCurrentAmps,
        100.0 * highestPhaseCurrentAmps / ratingAmps,
        null);
  }

  static RatingLoading notApplicable(String subject, String reason) {
    return new RatingLoading(subject, null, 0.0, null, reason);
  }

  public boolean isAssessed() {
    return loadingPercent != null;
  }

  /** Whether the highest phase current exceeds the rating; false when not assessed. */
  public boolean isOverloaded() {
    return loadingPercent != null && loadingPercent > 100.0;
  }
}
