package com.wayledger.engine.nec;

import com.wayledger.engine.CableSpec;
import com.wayledger.engine.Conduit;
import com.wayledger.engine.LinePhasors;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.demand.ConnectedLoad;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Quantity;
import com.wayledger.engine.protection.result.Verdict;
import java.util.List;

/**
 * Voltage drop from NEC Chapter 9 Table 9 impedances against the informational notes' 3 % for a
 * branch circuit and 5 % for feeder and branch together (210.19(A) Informational Note No. 4,
 * 215.2(A)(1) Informational Note No. 2, 2020 numbering from memory). The notes are recommendations,
 * not requirements: an excess is advice, never a violation.
 *
 * <p>Drop = k · I · Ze · L / 1000 with Ze = R·cosθ + X·sinθ per 1000 ft (Table 9 note 2), k = 2 for
 * a two-wire (line-to-neutral or line-to-line) circuit and √3 for three phases; the percentage is
 * of the circuit's own voltage. The schedule records no conduit type, so the conduit column with
 * the highest Ze is taken (the safe side); where the power factor is not known the magnitude
 * √(R²+X²), the largest Ze at any power factor, is taken.
 */
public final class VoltageDrop {

  public static final String REF_BRANCH =
      "NEC 210.19(A) Informational Note No. 4 (recommendation) with Chapter 9 Table 9";
  public static final String REF_TOTAL =
      "NEC 215.2(A)(1) Informational Note No. 2, 210.19(A) Informational Note No. 4"
          + " (recommendation) with Chapter 9 Table 9";

  /** Recommended largest branch-circuit drop, %. */
  public static final double BRANCH_PERCENT = 3.0;

  /** Recommended largest feeder plus branch drop, %. */
  public static final double TOTAL_PERCENT = 5.0;

  static final double FEET_PER_METRE = 1.0 / 0.3048;

  private VoltageDrop() {}

  /**
   * One run's drop, or what is missing.
   *
   * @param missing the missing input; null when worked out
   * @param percent drop, % of the circuit voltage
   * @param volts drop, V
   * @param note how it was worked out (conduit and power factor taken)
   */
  public record Run(String missing, double percent, double volts, String note) {
    static Run missing(String what) {
      return new Run(what, Double.NaN, Double.NaN, "");
    }

    public boolean isKnown() {
      return missing == null;
    }
  }

  /**
   * The drop along one cable carrying {@code amps}.
   *
   * @param powerFactor the load's power factor; null when not known (|Z| taken)
   */
  public static Run of(
      CableSpec cable, double amps, Double powerFactor, boolean threePhase, double circuitVolts) {
    NecCircuitChecks.Conductor conductor = NecCircuitChecks.Conductor.of(cable);
    if (conductor.missing() != null) {
      return Run.missing(conductor.missing());
    }
    if (cable.lengthMetres() == null) {
      return Run.missing("conductor length");
    }
    ConductorSize size = conductor.size();
    double feet = cable.lengthMetres() * FEET_PER_METRE;
    double ze;
    String note;
    Conduit recorded = cable.conduit();
    if (powerFactor == null) {
      Conduit used = recorded == null ? Conduit.STEEL : recorded;
      double usedZ = recorded == null ? 0.0 : magnitude(size, cable, recorded);
      if (recorded == null) {
        for (Conduit c : Conduit.values()) {
          double z = magnitude(size, cable, c);
          if (z > usedZ) {
            usedZ = z;
            used = c;
          }
        }
      }
      ze = usedZ;
      note =
          "power factor not known: |Z| taken; "
              + (recorded == null
                  ? "conduit not recorded: " + words(used) + " taken"
                  : words(used) + " (recorded)");
    } else {
      Conduit used =
          recorded == null
              ? ConductorImpedance.worstConduit(size, cable.material(), powerFactor)
              : recorded;
      ze = ConductorImpedance.effectiveOhmsPer1000Feet(size, cable.material(), used, powerFactor);
      note =
          "PF "
              + NecCircuitChecks.fmt(powerFactor)
              + "; "
              + (recorded == null
                  ? "conduit not recorded: " + words(used) + " taken (the highest impedance)"
                  : words(used) + " (recorded)");
    }
    if (Double.isNaN(ze)) {
      return Run.missing("a Chapter 9 Table 9 entry for " + size.label());
    }
    double volts = (threePhase ? Math.sqrt(3.0) : 2.0) * amps * ze * feet / 1000.0;
    return new Run(null, volts / circuitVolts * 100.0, volts, note);
  }

  private static double magnitude(ConductorSize size, CableSpec cable, Conduit conduit) {
    return Math.hypot(
        ConductorImpedance.resistanceOhmsPer1000Feet(size, cable.material(), conduit),
        ConductorImpedance.reactanceOhmsPer1000Feet(size, conduit));
  }

  /** The plain-number core: k · I · Ze · L / 1000 as % of the circuit voltage. */
  public static double percent(
      double amps, double ohmsPer1000Feet, double feet, boolean threePhase, double circuitVolts) {
    return (threePhase ? Math.sqrt(3.0) : 2.0)
        * amps
        * ohmsPer1000Feet
        * feet
        / 1000.0
        / circuitVolts
        * 100.0;
  }

  /** The power factor of a circuit's loads (Σ P / Σ S); null when it cannot be told. */
  static Double powerFactor(
      SupplySystem system, double u0, PhasePosition position, List<LoadSpec> loads) {
    if (loads.isEmpty() || position == null) {
      return null;
    }
    double perAmp = LinePhasors.voltAmperesPerAmp(system, position, u0);
    double p = 0.0;
    double q = 0.0;
    for (LoadSpec load : loads) {
      ConnectedLoad c = ConnectedLoad.ofPerAmp(load, perAmp);
      if (!c.isAssessed()) {
        return null;
      }
      p += c.activeWatts();
      q += c.reactiveVars();
    }
    double s = Math.hypot(p, q);
    return s > 0 ? p / s : null;
  }

  /** The branch finding. */
  static Finding branch(Run run, Double designCurrentAmps) {
    if (designCurrentAmps == null) {
      return Finding.notAssessed(CheckKind.BRANCH_VOLTAGE_DROP, "design current Ib", REF_BRANCH);
    }
    if (!run.isKnown()) {
      return Finding.notAssessed(CheckKind.BRANCH_VOLTAGE_DROP, run.missing(), REF_BRANCH);
    }
    return graded(
        CheckKind.BRANCH_VOLTAGE_DROP,
        run.percent(),
        BRANCH_PERCENT,
        run.note(),
        REF_BRANCH,
        "branch circuit");
  }

  /** The feeder-plus-branch finding; {@code feederMissing} names a feeder input not recorded. */
  static Finding total(Run branch, Double feederPercent, String feederMissing, String feederNote) {
    if (!branch.isKnown()) {
      return Finding.notAssessedBecause(
          CheckKind.TOTAL_VOLTAGE_DROP,
          "the branch circuit's drop is not known (" + branch.missing() + ")",
          REF_TOTAL);
    }
    if (feederPercent == null) {
      return Finding.notAssessed(CheckKind.TOTAL_VOLTAGE_DROP, feederMissing, REF_TOTAL);
    }
    return graded(
        CheckKind.TOTAL_VOLTAGE_DROP,
        feederPercent + branch.percent(),
        TOTAL_PERCENT,
        "feeders "
            + NecCircuitChecks.fmt(feederPercent)
            + " % ("
            + feederNote
            + ") + branch "
            + NecCircuitChecks.fmt(branch.percent())
            + " %",
        REF_TOTAL,
        "feeders and branch circuit");
  }

  private static Finding graded(
      CheckKind check, double percent, double limit, String note, String reference, String what) {
    List<Quantity> values =
        List.of(new Quantity("drop", percent, "%"), new Quantity("recommended", limit, "%"));
    String text = what + " drop " + NecCircuitChecks.fmt(percent) + " % (" + note + ")";
    if (percent > limit + 1e-9) {
      return new Finding(
          check,
          Verdict.ADVICE,
          text + ": above the " + NecCircuitChecks.fmt(limit) + " % the code recommends",
          values,
          reference,
          "a recommendation, not a requirement: consider a larger conductor or a shorter run");
    }
    return Finding.pass(
        check,
        text + ": within the recommended " + NecCircuitChecks.fmt(limit) + " %",
        values,
        reference);
  }

  private static String words(Conduit conduit) {
    return switch (conduit) {
      case PVC -> "PVC conduit";
      case ALUMINUM -> "aluminum conduit";
      case STEEL -> "steel conduit";
    };
  }
}
