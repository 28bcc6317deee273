package com.wayledger.engine.nec;

import com.wayledger.engine.ConductorMaterial;
import java.util.List;

/**
 * NEC 240.6(A) standard ampere ratings of fuses and inverse-time circuit breakers and 240.4(D)
 * small-conductor limits. Values from memory (NFPA 70-2020); 240.4(D) also appears in the footnote
 * of older Table 310.16 reproductions (alanwire.com/resources/allowable-ampacities), which agrees.
 */
public final class OvercurrentLimits {

  /** 240.6(A) standard ratings, A (from memory, 2020 edition). */
  public static final List<Integer> STANDARD_RATINGS_AMPS =
      List.of(
          15, 20, 25, 30, 35, 40, 45, 50, 60, 70, 80, 90, 100, 110, 125, 150, 175, 200, 225, 250,
          300, 350, 400, 450, 500, 600, 700, 800, 1000, 1200, 1600, 2000, 2500, 3000, 4000, 5000,
          6000);

  /** Additional standard ratings for fuses only, A (240.6(A), from memory). */
  public static final List<Integer> ADDITIONAL_FUSE_RATINGS_AMPS = List.of(1, 3, 6, 10, 601);

  private OvercurrentLimits() {}

  /** Whether a rating is a 240.6(A) standard rating (fuse-only ratings when {@code fuse}). */
  public static boolean isStandardRating(double amps, boolean fuse) {
    for (int rating : STANDARD_RATINGS_AMPS) {
      if (Math.abs(amps - rating) < 1e-9) {
        return true;
      }
    }
    if (fuse) {
      for (int rating : ADDITIONAL_FUSE_RATINGS_AMPS) {
        if (Math.abs(amps - rating) < 1e-9) {
          return true;
        }
      }
    }
    return false;
  }

  /** The next standard rating at or above a current (240.4(B)); null above 6000 A. */
  public static Integer nextStandardRatingAtOrAbove(double amps) {
    for (int rating : STANDARD_RATINGS_AMPS) {
      if (rating >= amps - 1e-9) {
        return rating;
      }
    }
    return null;
  }

  /**
   * 240.4(D) largest overcurrent protection of a small conductor, A: copper 14 AWG 15 A, 12 AWG 20
   * A, 10 AWG 30 A; aluminium and copper-clad aluminium 12 AWG 15 A, 10 AWG 25 A; null for larger
   * sizes (no small-conductor limit).
   */
  public static Integer smallConductorLimitAmps(ConductorSize size, ConductorMaterial material) {
    if (size == null || material == null) {
      return null;
    }
    if (material == ConductorMaterial.COPPER) {
      return switch (size) {
        case AWG_14 -> 15;
        case AWG_12 -> 20;
        case AWG_10 -> 30;
        default -> null;
      };
    }
    return switch (size) {
      case AWG_12 -> 15;
      case AWG_10 -> 25;
      default -> null;
    };
  }
}
