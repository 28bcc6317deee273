package com.wayledger.engine;

/**
 * The geometry of a low-voltage supply: how many lines a board on it has, their voltage to neutral
 * and the angle of each line's voltage. The phasor relations used are those of any power-systems
 * textbook (from memory: W. D. Stevenson, <i>Elements of Power System Analysis</i>, ch. 2, balanced
 * three-phase circuits, V_LL = √3·V_LN ∠30°; the single-phase three-wire system as two 120 V halves
 * of one 240 V winding with a centre tap, so line B is line A shifted by 180°; the 120/208 V
 * single-phase three-wire system as two lines of a 208Y/120 V wye with its neutral, so line B lags
 * line A by 120° and |V_AB| = |1 − e^{−j120°}|·V_LN = √3·120 V ≈ 208 V).
 */
public enum SupplySystem {
  /**
   * The existing behaviour: U0 and the number of phases as recorded on the site (230/400 V
   * typical), lines at 0°, −120°, +120°.
   */
  IEC_WYE(null, null, "L"),
  /** 120/240 V single-phase three-wire: lines A and B, 120 V to neutral, 180° apart. */
  SPLIT_PHASE_120_240(120.0, 180.0, ""),
  /** 208Y/120 V three-phase four-wire: lines A, B, C, 120 V to neutral, 208 V between lines. */
  WYE_208Y_120(120.0, null, ""),
  /** 480Y/277 V three-phase four-wire: lines A, B, C, 277 V to neutral, 480 V between lines. */
  WYE_480Y_277(277.0, null, ""),
  /**
   * 120/208 V single-phase three-wire: two lines of a 208Y/120 V wye and its neutral (a panel fed
   * from a two-pole breaker of a 208Y/120 V panel), lines A and B, 120 V to neutral, B at −120°
   * from A, 208 V between them. The neutral carries |I_A + I_B|, not their difference.
   */
  SINGLE_PHASE_120_208(120.0, -120.0, "");

  private final Double lineToNeutralVolts;

  /** Angle of line B on a two-line system, degrees; null on a wye of one or three lines. */
  private final Double secondLineAngleDegrees;

  private final String linePrefix;

  SupplySystem(Double lineToNeutralVolts, Double secondLineAngleDegrees, String linePrefix) {
    this.lineToNeutralVolts = lineToNeutralVolts;
    this.secondLineAngleDegrees = secondLineAngleDegrees;
    this.linePrefix = linePrefix;
  }

  /** The system's fixed voltage line to neutral, V; null when it is the site's recorded U0. */
  public Double lineToNeutralVolts() {
    return lineToNeutralVolts;
  }

  /** Whether this is the single-phase three-wire system (two lines 180° apart). */
  public boolean isSplitPhase() {
    return this == SPLIT_PHASE_120_240;
  }

  /**
   * Whether a board on this system always has two lines and the neutral (120/240 V or 120/208 V
   * single-phase three-wire).
   */
  public boolean hasTwoLines() {
    return secondLineAngleDegrees != null;
  }

  /** Whether the system is one of the North American ones (lines named A, B, C). */
  public boolean namesLinesByLetter() {
    return linePrefix.isEmpty();
  }

  /**
   * Number of lines of a board with {@code boardPhases} phases (1 or 3) on this system: a
   * split-phase board always has its two lines A and B; on a wye system 1 or 3.
   */
  public int lineCount(int boardPhases) {
    if (hasTwoLines()) {
      return 2;
    }
    return boardPhases == 3 ? 3 : 1;
  }

  /**
   * Angle of a line's voltage to neutral, degrees: L1 0°, L2 −120°, L3 +120° on a wye system
   * (positive sequence); on the split-phase system line A (L1) 0° and line B (L2) 180°; on the
   * 120/208 V single-phase system line A 0° and line B −120° (the wye's A and B).
   */
  public double angleDegrees(Phase line) {
    if (hasTwoLines()) {
      return switch (line) {
        case L1 -> 0.0;
        case L2 -> secondLineAngleDegrees;
        case L3 -> throw new IllegalArgumentException("a two-line supply has no third line");
      };
    }
    return line.angleDegrees();
  }

  /** The line's name on this system: L1/L2/L3 on an IEC supply, A/B/C on a North American one. */
  public String lineName(Phase line) {
    return namesLinesByLetter() ? String.valueOf((char) ('A' + line.ordinal())) : line.name();
  }

  /**
   * Magnitude of the voltage between two lines as a multiple of the line-to-neutral voltage: 2 on
   * the split-phase system (240/120), √3 on a wye system and on the 120/208 V single-phase one
   * (|e^{j0} − e^{−j120°}| = √3).
   */
  public double lineToLineFactor() {
    return isSplitPhase() ? 2.0 : Math.sqrt(3.0);
  }

  /**
   * The systems a board fed from a way in {@code feed} of a board on this system can have: the same
   * system, except that two poles of a 208Y/120 V panel supply a 120/208 V single-phase three-wire
   * panel (and nothing else). A null feed (no feeding way recorded) allows either.
   */
  public java.util.List<SupplySystem> suppliesThrough(PhasePosition feed) {
    if (this == WYE_208Y_120) {
      if (feed == null) {
        return java.util.List.of(WYE_208Y_120, SINGLE_PHASE_120_208);
      }
      if (feed.isLineToLine()) {
        return java.util.List.of(SINGLE_PHASE_120_208);
      }
    }
    return java.util.List.of(this);
  }
}
