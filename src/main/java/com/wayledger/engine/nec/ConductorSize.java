package com.wayledger.engine.nec;

import java.util.Optional;

/**
 * Conductor sizes of NEC Table 310.16 from 14 AWG to 1000 kcmil. Schedules store cross-sections in
 * mm²; an AWG or kcmil size is stored as its area, computed here from the size's definition: AWG
 * diameter d = 0.127 mm × 92^((36 − n)/39) (ASTM B258, from memory), 1/0…4/0 as n = 0…−3, and 1
 * kcmil = 0.506707 mm² (a circular mil is the area of a 0.001 in circle: π/4 × 0.0254² mm²).
 */
public enum ConductorSize {
  AWG_14("14 AWG", 14),
  AWG_12("12 AWG", 12),
  AWG_10("10 AWG", 10),
  AWG_8("8 AWG", 8),
  AWG_6("6 AWG", 6),
  AWG_4("4 AWG", 4),
  AWG_3("3 AWG", 3),
  AWG_2("2 AWG", 2),
  AWG_1("1 AWG", 1),
  AWG_1_0("1/0 AWG", 0),
  AWG_2_0("2/0 AWG", -1),
  AWG_3_0("3/0 AWG", -2),
  AWG_4_0("4/0 AWG", -3),
  KCMIL_250("250 kcmil", 250.0),
  KCMIL_300("300 kcmil", 300.0),
  KCMIL_350("350 kcmil", 350.0),
  KCMIL_400("400 kcmil", 400.0),
  KCMIL_500("500 kcmil", 500.0),
  KCMIL_600("600 kcmil", 600.0),
  KCMIL_750("750 kcmil", 750.0),
  KCMIL_1000("1000 kcmil", 1000.0);

  /** mm² per kcmil: π/4 × (0.0254 mm)² × 1000. */
  public static final double SQUARE_MILLIMETRES_PER_KCMIL = Math.PI / 4.0 * 0.0254 * 0.0254 * 1000;

  /** Stored cross-sections within this share of a size's area are read as that size. */
  static final double MATCH_TOLERANCE = 0.02;

  private final String label;
  private final double squareMillimetres;

  ConductorSize(String label, int gauge) {
    this.label = label;
    double diameter = 0.127 * Math.pow(92.0, (36.0 - gauge) / 39.0);
    this.squareMillimetres = Math.PI / 4.0 * diameter * diameter;
  }

  ConductorSize(String label, double kcmil) {
    this.label = label;
    this.squareMillimetres = kcmil * Math.PI / 4.0 * 0.0254 * 0.0254 * 1000;
  }

  /** "12 AWG", "250 kcmil". */
  public String label() {
    return label;
  }

  /** Cross-section, mm². */
  public double squareMillimetres() {
    return squareMillimetres;
  }

  /** Whether this is 1 AWG or smaller (14 … 1 AWG), the range 110.14(C)(1)(a) speaks of. */
  public boolean isOneAwgOrSmaller() {
    return ordinal() <= AWG_1.ordinal();
  }

  /** The size whose area a stored cross-section is (within 2 %), if any. */
  public static Optional<ConductorSize> ofSquareMillimetres(Double squareMillimetres) {
    if (squareMillimetres == null || !(squareMillimetres > 0)) {
      return Optional.empty();
    }
    for (ConductorSize size : values()) {
      if (Math.abs(squareMillimetres - size.squareMillimetres)
          <= MATCH_TOLERANCE * size.squareMillimetres) {
        return Optional.of(size);
      }
    }
    return Optional.empty();
  }

  /** The size by its label ("12 AWG", "12", "1/0", "250 kcmil"), if any. */
  public static Optional<ConductorSize> ofLabel(String text) {
    if (text == null) {
      return Optional.empty();
    }
    String t = text.strip().toLowerCase(java.util.Locale.ROOT).replace("#", "");
    for (ConductorSize size : values()) {
      String l = size.label.toLowerCase(java.util.Locale.ROOT);
      if (l.equals(t) || l.replace(" awg", "").equals(t) || l.replace(" kcmil", "").equals(t)) {
        return Optional.of(size);
      }
    }
    return Optional.empty();
  }
}
