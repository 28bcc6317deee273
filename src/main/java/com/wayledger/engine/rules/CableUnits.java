package com.wayledger.engine.rules;

import com.wayledger.engine.nec.ConductorSize;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.Locale;
import java.util.Optional;

/**
 * The units a site's people read and type conductor sizes and cable lengths in. Storage and the
 * engine stay metric (mm², metres); these convert at the edges: forms, API, pages, spreadsheets.
 *
 * <p>One foot is 0.3048 m exactly (the international foot of the 1959 agreement). An AWG or kcmil
 * size is stored as its area ({@link ConductorSize#squareMillimetres()}) and read back as that
 * size, so 12 AWG entered comes back as 12 AWG and 50 ft as 50 ft.
 */
public enum CableUnits {
  /** mm² and metres. */
  METRIC,
  /** AWG/kcmil sizes of NEC Table 310.16 and feet. */
  AWG_AND_FEET;

  /** Metres in one international foot, exact by definition. */
  public static final double METRES_PER_FOOT = 0.3048;

  /** Lengths in feet are shown to this many decimals (0.01 ft is about 3 mm). */
  static final int FEET_DECIMALS = 2;

  /** The units of a rule set. */
  public static CableUnits of(RuleSet ruleSet) {
    return ruleSet.usesAwgAndFeet() ? AWG_AND_FEET : METRIC;
  }

  /** The units of a site by its rule set's key (an unknown key reads as metric). */
  public static CableUnits ofRuleSet(String ruleSetKey) {
    return RuleSets.find(ruleSetKey).map(CableUnits::of).orElse(METRIC);
  }

  public boolean awgAndFeet() {
    return this == AWG_AND_FEET;
  }

  /** The length unit's symbol: "m" or "ft". */
  public String lengthSymbol() {
    return awgAndFeet() ? "ft" : "m";
  }

  /** The size unit's symbol as a column header would say it: "mm²" or "AWG/kcmil". */
  public String sizeSymbol() {
    return awgAndFeet() ? "AWG/kcmil" : "mm²";
  }

  /** Feet to metres. */
  public static double metresOfFeet(double feet) {
    return feet * METRES_PER_FOOT;
  }

  /** Metres to feet, rounded to {@value #FEET_DECIMALS} decimals so 50 ft stored reads 50 ft. */
  public static double feetOfMetres(double metres) {
    return BigDecimal.valueOf(metres / METRES_PER_FOOT)
        .setScale(FEET_DECIMALS, RoundingMode.HALF_UP)
        .doubleValue();
  }

  /** A stored length in this unit (metres as stored, or feet); null stays null. */
  public Double lengthInUnit(Double metres) {
    if (metres == null) {
      return null;
    }
    return awgAndFeet() ? feetOfMetres(metres) : metres;
  }

  /** A length typed in this unit, in metres; null stays null. */
  public Double metresOf(Double lengthInUnit) {
    if (lengthInUnit == null) {
      return null;
    }
    return awgAndFeet() ? metresOfFeet(lengthInUnit) : lengthInUnit;
  }

  /** "18 m" or "50 ft"; empty for null. */
  public String lengthText(Double metres) {
    if (metres == null) {
      return "";
    }
    return plain(lengthInUnit(metres)) + " " + lengthSymbol();
  }

  /**
   * "2.5 mm²" or "12 AWG"; empty for null. A stored area that is no NEC size on an AWG site is
   * shown in mm², never rounded to a neighbouring gauge.
   */
  public String sizeText(Double squareMillimetres) {
    if (squareMillimetres == null) {
      return "";
    }
    if (awgAndFeet()) {
      Optional<ConductorSize> size = ConductorSize.ofSquareMillimetres(squareMillimetres);
      if (size.isPresent()) {
        return size.get().label();
      }
    }
    return plain(squareMillimetres) + " mm²";
  }

  /** The NEC size label of a stored area ("12 AWG"), if it is one. */
  public static Optional<String> awgLabel(Double squareMillimetres) {
    return ConductorSize.ofSquareMillimetres(squareMillimetres).map(ConductorSize::label);
  }

  /**
   * The stored area of a size written as the trade writes it: "12 AWG", "#12", "1/0", "250 kcmil",
   * "250 MCM". Empty for anything else, including gauges the NEC table does not list ("13 AWG").
   */
  public static Optional<Double> squareMillimetresOfAwg(String text) {
    if (text == null || text.isBlank()) {
      return Optional.empty();
    }
    String t =
        text.strip().toLowerCase(Locale.ROOT).replace("mcm", "kcmil").replaceAll("\\s+", " ");
    return ConductorSize.ofLabel(t).map(ConductorSize::squareMillimetres);
  }

  /** Whether the text names its size in AWG or kcmil ("12 AWG", "#10", "4/0", "350 kcmil"). */
  public static boolean looksLikeAwg(String text) {
    if (text == null) {
      return false;
    }
    String t = text.strip().toLowerCase(Locale.ROOT);
    return t.contains("awg")
        || t.contains("kcmil")
        || t.contains("mcm")
        || t.startsWith("#")
        || t.matches("[1-4]/0");
  }

  private static String plain(double value) {
    return BigDecimal.valueOf(value).stripTrailingZeros().toPlainString();
  }
}
