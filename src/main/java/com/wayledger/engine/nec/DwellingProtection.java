package com.wayledger.engine.nec;

import com.wayledger.engine.CircuitLocation;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.FaultInterrupter;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.protection.result.CheckKind;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Quantity;
import com.wayledger.engine.protection.result.Verdict;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Ground-fault (GFCI, NEC 210.8(A)) and arc-fault (AFCI, NEC 210.12(A)) protection of dwelling-unit
 * branch circuits by location: Wayledger's own table of the code's locations, each with its clause
 * (NFPA 70-2020 list items, from memory). 210.8(B) for other occupancies is in {@link
 * OtherOccupancyGroundFault}, which reads the same locations. 210.8(A) covers 125 V through 250 V
 * receptacles on single-phase branch circuits rated 150 V or less to ground; 210.12(A) covers 120 V
 * single-phase 15 and 20 A branch circuits supplying outlets or devices. A receptacle-type GFCI or
 * an outlet branch-circuit AFCI at the first outlet also meets the rules; the schedule records the
 * breaker only, so a missing breaker function is a warning to check on site, not proof of a fault.
 * 210.8(D)/(E) (specific appliances, equipment) and the 2023 edition's extensions are not in this
 * version.
 */
public final class DwellingProtection {

  public static final String REF_GFCI = "NEC 210.8(A) dwelling units (GFCI)";
  public static final String REF_AFCI = "NEC 210.12(A) dwelling units (AFCI)";

  /** Highest voltage to ground of a branch circuit 210.8(A) covers, V. */
  static final double GFCI_MAX_VOLTS_TO_GROUND = 150.0;

  /** Largest branch-circuit rating 210.12(A) covers, A. */
  static final double AFCI_MAX_RATING_AMPS = 20.0;

  /** One row of the table: the clause that asks for each protection, null where none does. */
  public record Row(String gfciClause, String afciClause) {}

  private static final Map<CircuitLocation, Row> TABLE = new EnumMap<>(CircuitLocation.class);

  /** The row of a location that only 210.8(B) names: no dwelling rule can be read from it. */
  private static final Row OTHER_OCCUPANCIES_ONLY = new Row(null, null);

  static {
    TABLE.put(CircuitLocation.INDOORS, new Row(null, null));
    TABLE.put(CircuitLocation.BATHROOM, new Row("210.8(A)(1) bathrooms", null));
    TABLE.put(CircuitLocation.GARAGE, new Row("210.8(A)(2) garages and accessory buildings", null));
    TABLE.put(CircuitLocation.OUTDOORS, new Row("210.8(A)(3) outdoors", null));
    TABLE.put(CircuitLocation.CRAWL_SPACE, new Row("210.8(A)(4) crawl spaces", null));
    TABLE.put(CircuitLocation.BASEMENT, new Row("210.8(A)(5) basements", null));
    TABLE.put(
        CircuitLocation.KITCHEN,
        new Row("210.8(A)(6) kitchens (countertop receptacles)", "210.12(A) kitchens"));
    TABLE.put(CircuitLocation.NEAR_SINK, new Row("210.8(A)(7) within 6 ft of a sink", null));
    TABLE.put(CircuitLocation.BOATHOUSE, new Row("210.8(A)(8) boathouses", null));
    TABLE.put(
        CircuitLocation.NEAR_TUB_OR_SHOWER,
        new Row("210.8(A)(9) within 6 ft of a bathtub or shower stall", null));
    TABLE.put(
        CircuitLocation.LAUNDRY, new Row("210.8(A)(10) laundry areas", "210.12(A) laundry areas"));
    TABLE.put(
        CircuitLocation.LIVING_AREA,
        new Row(
            null,
            "210.12(A) family, dining and living rooms, parlors, libraries, dens, sunrooms,"
                + " recreation rooms"));
    TABLE.put(CircuitLocation.BEDROOM, new Row(null, "210.12(A) bedrooms"));
    TABLE.put(CircuitLocation.CLOSET_OR_HALLWAY, new Row(null, "210.12(A) closets, hallways"));
    TABLE.put(
        CircuitLocation.ROOFTOP, new Row("210.8(A)(3) outdoors (a rooftop is outdoors)", null));
    TABLE.put(
        CircuitLocation.DAMP_OR_WET_INDOORS,
        new Row("210.8(A)(11) indoor damp and wet locations", null));
    // locations of other occupancies' list (210.8(B)): in a dwelling they say nothing of the room
    TABLE.put(CircuitLocation.LOCKER_ROOM, OTHER_OCCUPANCIES_ONLY);
    TABLE.put(CircuitLocation.SERVICE_BAY, OTHER_OCCUPANCIES_ONLY);
    TABLE.put(CircuitLocation.FOOD_PREPARATION, OTHER_OCCUPANCIES_ONLY);
  }

  /** Whether a location belongs to 210.8(B)'s list only and tells nothing in a dwelling unit. */
  static boolean otherOccupanciesOnly(CircuitLocation location) {
    return row(location) == OTHER_OCCUPANCIES_ONLY;
  }

  private DwellingProtection() {}

  /** The locations the NEC set knows, in the table's order. */
  public static Set<CircuitLocation> locations() {
    return TABLE.keySet();
  }

  /** The table's row for a location; null for a location the NEC set does not know. */
  public static Row row(CircuitLocation location) {
    return location == null ? null : TABLE.get(location);
  }

  /** Whether 210.8(A) covers this circuit at all: a receptacle circuit of ≤ 150 V to ground. */
  static boolean gfciCovers(CircuitSpec circuit, double u0) {
    return circuit.loads().stream().anyMatch(l -> l.category() == LoadCategory.SOCKET_OUTLETS)
        && circuit.position() != PhasePosition.THREE_POLE
        && u0 <= GFCI_MAX_VOLTS_TO_GROUND + 1e-9;
  }

  /** Whether 210.12(A) covers this circuit at all: 120 V single-phase, 15 or 20 A. */
  static boolean afciCovers(CircuitSpec circuit, double u0) {
    DeviceSpec d = circuit.device();
    return circuit.position() != null
        && circuit.position().isSinglePole()
        && Math.abs(u0 - 120.0) <= 10.0
        && d != null
        && d.ratedCurrentAmps() != null
        && d.ratedCurrentAmps() <= AFCI_MAX_RATING_AMPS + 1e-9;
  }

  /** Which function a circuit needs at its location: null when none (or it cannot be told). */
  public static FaultInterrupter needed(CircuitSpec circuit, double u0) {
    Row row = row(circuit.location());
    if (row == null) {
      return null;
    }
    boolean gfci = row.gfciClause() != null && gfciCovers(circuit, u0);
    boolean afci = row.afciClause() != null && afciCovers(circuit, u0);
    if (gfci && afci) {
      return FaultInterrupter.DUAL_FUNCTION;
    }
    return gfci ? FaultInterrupter.GFCI : afci ? FaultInterrupter.AFCI : null;
  }

  /**
   * Which function a circuit needs on its panelboard: the dwelling table's on a dwelling unit's,
   * 210.8(B)'s GFCI on any other (the AFCI rules of other occupancies are not in this version).
   */
  public static FaultInterrupter needed(CircuitSpec circuit, double u0, boolean dwelling) {
    if (dwelling) {
      return needed(circuit, u0);
    }
    return OtherOccupancyGroundFault.needsGfci(circuit, u0) ? FaultInterrupter.GFCI : null;
  }

  /**
   * Ground-fault protection of a branch circuit: 210.8(A) on a dwelling unit's panelboard, 210.8(B)
   * ({@link OtherOccupancyGroundFault}) on any other.
   */
  public static Finding groundFault(CircuitSpec circuit, double u0, boolean dwelling) {
    if (!dwelling && circuit.feedsBoardId() == null) {
      return OtherOccupancyGroundFault.assess(circuit, u0);
    }
    Finding early =
        early(CheckKind.GROUND_FAULT_PROTECTION, circuit, dwelling, REF_GFCI, "210.8(B)");
    if (early != null) {
      return early;
    }
    Row row = row(circuit.location());
    String where = locationWords(circuit.location());
    if (row.gfciClause() == null) {
      return Finding.pass(
          CheckKind.GROUND_FAULT_PROTECTION,
          "not required: " + where + " is none of the 210.8(A) locations",
          List.of(),
          REF_GFCI);
    }
    String reference = "NEC " + row.gfciClause() + " (GFCI)";
    if (!gfciCovers(circuit, u0)) {
      return Finding.pass(
          CheckKind.GROUND_FAULT_PROTECTION,
          "not required: 210.8(A) covers receptacles on single-phase circuits of 150 V or less to"
              + " ground, and this circuit records no receptacle outlet load or is not such a"
              + " circuit",
          List.of(),
          reference);
    }
    FaultInterrupter fitted = circuit.device().faultInterrupter();
    if (fitted != null && fitted.groundFault()) {
      return Finding.pass(
          CheckKind.GROUND_FAULT_PROTECTION,
          "GFCI breaker recorded for receptacles at " + where,
          List.of(new Quantity("Class A trip", FaultInterrupter.CLASS_A_TRIP_MILLIAMPS, "mA")),
          reference);
    }
    Double residual = circuit.device().residualCurrentMilliAmps();
    String rcdNote =
        residual != null && residual > FaultInterrupter.CLASS_A_TRIP_MILLIAMPS
            ? "; the recorded "
                + NecCircuitChecks.fmt(residual)
                + " mA residual-current device is not a Class A GFCI (UL 943: trips at 6 mA at"
                + " most, from memory)"
            : "";
    return new Finding(
        CheckKind.GROUND_FAULT_PROTECTION,
        Verdict.WARNING,
        "receptacles at " + where + " need GFCI protection; no GFCI breaker recorded" + rcdNote,
        List.of(),
        reference,
        "fit a GFCI breaker (or dual-function breaker), or check on site that every receptacle is"
            + " a GFCI receptacle or is fed through one");
  }

  /** 210.12(A): arc-fault protection of a dwelling circuit. */
  public static Finding arcFault(CircuitSpec circuit, double u0, boolean dwelling) {
    Finding early = early(CheckKind.ARC_FAULT_PROTECTION, circuit, dwelling, REF_AFCI, "210.12(C)");
    if (early != null) {
      return early;
    }
    FaultInterrupter recorded =
        circuit.device() == null ? null : circuit.device().faultInterrupter();
    boolean arcFaultRecorded = recorded != null && recorded.arcFault();
    if (circuit.location() == CircuitLocation.INDOORS && afciCovers(circuit, u0)) {
      if (arcFaultRecorded) {
        return Finding.pass(
            CheckKind.ARC_FAULT_PROTECTION,
            "arc-fault protection recorded on the breaker; the room is not recorded",
            List.of(),
            REF_AFCI);
      }
      // 210.12(A) ends its list with "or similar rooms or areas": indoors in a dwelling is most
      // likely covered, and "indoors" does not say which room; no pass on that guess
      return Finding.notAssessedBecause(
          CheckKind.ARC_FAULT_PROTECTION,
          "\"indoors\" does not say which room of the dwelling; 210.12(A) covers most rooms"
              + " (and similar rooms or areas): record the room, or an AFCI breaker",
          REF_AFCI);
    }
    Row row = row(circuit.location());
    String where = locationWords(circuit.location());
    if (row.afciClause() == null) {
      return Finding.pass(
          CheckKind.ARC_FAULT_PROTECTION,
          "not required: " + where + " is none of the 210.12(A) rooms and areas",
          List.of(),
          REF_AFCI);
    }
    String reference = "NEC " + row.afciClause() + " (AFCI)";
    if (!afciCovers(circuit, u0)) {
      if (circuit.device().ratedCurrentAmps() == null) {
        return Finding.notAssessed(CheckKind.ARC_FAULT_PROTECTION, "device rating In", reference);
      }
      return Finding.pass(
          CheckKind.ARC_FAULT_PROTECTION,
          "not required: 210.12(A) covers 120 V single-phase 15 and 20 A branch circuits only",
          List.of(),
          reference);
    }
    FaultInterrupter fitted = circuit.device().faultInterrupter();
    if (fitted != null && fitted.arcFault()) {
      return Finding.pass(
          CheckKind.ARC_FAULT_PROTECTION,
          (fitted == FaultInterrupter.DUAL_FUNCTION ? "dual-function" : "AFCI")
              + " breaker recorded for the circuit at "
              + where,
          List.of(),
          reference);
    }
    return new Finding(
        CheckKind.ARC_FAULT_PROTECTION,
        Verdict.WARNING,
        "the circuit at " + where + " needs AFCI protection; no AFCI breaker recorded",
        List.of(),
        reference,
        "fit a combination AFCI breaker (or dual-function breaker), or check on site for one of"
            + " the other 210.12(A) arrangements (an outlet branch-circuit AFCI at the first"
            + " outlet)");
  }

  private static Finding early(
      CheckKind check, CircuitSpec circuit, boolean dwelling, String reference, String other) {
    if (circuit.feedsBoardId() != null) {
      return Finding.notAssessedBecause(
          check, "a feeder: the rule applies to branch circuits", reference);
    }
    if (!dwelling) {
      return Finding.notAssessedBecause(
          check,
          "the panelboard is not recorded as a dwelling unit's; the rules for other occupancies ("
              + other
              + ") are not in this version",
          reference);
    }
    if (circuit.location() == null) {
      Finding f = Finding.notAssessedBecause(check, "location not recorded", reference);
      return new Finding(
          f.check(), f.verdict(), f.summary(), f.values(), reference, "record the location");
    }
    if (row(circuit.location()) == null) {
      return Finding.notAssessedBecause(
          check, "the location is not one of the NEC set's", reference);
    }
    if (otherOccupanciesOnly(circuit.location())) {
      Finding f =
          Finding.notAssessedBecause(
              check,
              locationWords(circuit.location())
                  + " is a location of other occupancies (210.8(B)); it does not say which room of"
                  + " the dwelling unit this is",
              reference);
      return new Finding(
          f.check(), f.verdict(), f.summary(), f.values(), reference, "record the dwelling room");
    }
    return null;
  }

  /** Plain words for a location in a finding (the page shows the bundle's words beside it). */
  static String locationWords(CircuitLocation location) {
    return location.name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ');
  }
}
