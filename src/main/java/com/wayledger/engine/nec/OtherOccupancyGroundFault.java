package com.wayledger.engine.nec;

import com.wayledger.engine.CircuitLocation;
import com.wayledger.engine.CircuitSpec;
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

/**
 * Ground-fault (GFCI) protection of receptacles other than in dwelling units, NEC 210.8(B):
 * Wayledger's own table of the code's locations, each with its list item (NFPA 70-2020, from
 * memory; the edition {@link DwellingProtection} follows too). 210.8(B) covers single-phase
 * receptacles rated 150 V or less to ground and 50 A or less, and three-phase receptacles rated 150
 * V or less to ground and 100 A or less. The schedule records the breaker, not the receptacle: by
 * 210.21(B) (from memory) a receptacle is rated at least its individual circuit's rating and the
 * multi-outlet circuits of Table 210.21(B)(3) stop at 50 A, so the breaker's rating stands for the
 * receptacle's. A GFCI receptacle also meets the rule and the schedule cannot see it: a missing
 * GFCI breaker is the same warning to check on site as in a dwelling.
 */
public final class OtherOccupancyGroundFault {

  public static final String REF = "NEC 210.8(B) other than dwelling units (GFCI)";

  /** Highest voltage to ground 210.8(B) covers, V. */
  static final double MAX_VOLTS_TO_GROUND = 150.0;

  /** Largest single-phase receptacle 210.8(B) covers, A. */
  static final double SINGLE_PHASE_MAX_AMPS = 50.0;

  /** Largest three-phase receptacle 210.8(B) covers, A. */
  static final double THREE_PHASE_MAX_AMPS = 100.0;

  /**
   * One row of the table.
   *
   * @param clause the list item that asks for GFCI; null where none does
   * @param assumption the safe-side reading the row makes, named in the finding; null for none
   * @param notAssessed why the location cannot be judged under 210.8(B); null when it can
   */
  public record Row(String clause, String assumption, String notAssessed) {
    static Row none() {
      return new Row(null, null, null);
    }

    static Row item(String clause) {
      return new Row(clause, null, null);
    }
  }

  private static final Map<CircuitLocation, Row> TABLE = new EnumMap<>(CircuitLocation.class);

  static {
    TABLE.put(CircuitLocation.INDOORS, Row.none());
    TABLE.put(CircuitLocation.OUTDOORS, Row.item("210.8(B)(4) outdoors"));
    TABLE.put(CircuitLocation.BATHROOM, Row.item("210.8(B)(1) bathrooms"));
    TABLE.put(
        CircuitLocation.GARAGE,
        Row.item("210.8(B)(8) garages, accessory buildings, service bays and similar areas"));
    TABLE.put(CircuitLocation.CRAWL_SPACE, Row.item("210.8(B)(9) crawl spaces"));
    TABLE.put(
        CircuitLocation.BASEMENT,
        new Row(
            "210.8(B)(10) unfinished areas of basements",
            "the basement area is taken as unfinished (the safe side: the schedule does not say)",
            null));
    TABLE.put(CircuitLocation.KITCHEN, Row.item("210.8(B)(2) kitchens"));
    TABLE.put(CircuitLocation.NEAR_SINK, Row.item("210.8(B)(5) within 6 ft of a sink"));
    TABLE.put(
        CircuitLocation.BOATHOUSE,
        new Row(
            null,
            null,
            "boathouses and docking facilities of other occupancies fall under Article 555, which"
                + " is not in this version"));
    TABLE.put(
        CircuitLocation.NEAR_TUB_OR_SHOWER,
        Row.item("210.8(B)(12) within 6 ft of a bathtub or shower stall"));
    TABLE.put(CircuitLocation.LAUNDRY, Row.item("210.8(B)(11) laundry areas"));
    TABLE.put(CircuitLocation.LIVING_AREA, Row.none());
    TABLE.put(CircuitLocation.BEDROOM, Row.none());
    TABLE.put(CircuitLocation.CLOSET_OR_HALLWAY, Row.none());
    TABLE.put(CircuitLocation.ROOFTOP, Row.item("210.8(B)(3) rooftops"));
    TABLE.put(
        CircuitLocation.DAMP_OR_WET_INDOORS, Row.item("210.8(B)(6) indoor damp and wet locations"));
    TABLE.put(
        CircuitLocation.LOCKER_ROOM,
        Row.item("210.8(B)(7) locker rooms with associated showering facilities"));
    TABLE.put(
        CircuitLocation.SERVICE_BAY,
        Row.item("210.8(B)(8) garages, accessory buildings, service bays and similar areas"));
    TABLE.put(
        CircuitLocation.FOOD_PREPARATION,
        Row.item(
            "210.8(B)(2) areas with a sink and permanent provisions for food preparation or"
                + " cooking"));
  }

  private OtherOccupancyGroundFault() {}

  /** The table's row for a location; null for a location the table does not know. */
  public static Row row(CircuitLocation location) {
    return location == null ? null : TABLE.get(location);
  }

  /** The locations the table knows, in the enum's order. */
  static java.util.Set<CircuitLocation> locations() {
    return TABLE.keySet();
  }

  /**
   * 210.8(B): ground-fault protection of a branch circuit of a panelboard that is no dwelling's.
   */
  public static Finding assess(CircuitSpec circuit, double u0) {
    CircuitLocation location = circuit.location();
    if (location == null) {
      return new Finding(
          CheckKind.GROUND_FAULT_PROTECTION,
          Verdict.NOT_ASSESSED,
          "not assessed — location not recorded",
          List.of(),
          REF,
          "record the location");
    }
    Row row = row(location);
    if (row == null) {
      return Finding.notAssessedBecause(
          CheckKind.GROUND_FAULT_PROTECTION, "the location is not one of the NEC set's", REF);
    }
    if (row.notAssessed() != null) {
      return Finding.notAssessedBecause(CheckKind.GROUND_FAULT_PROTECTION, row.notAssessed(), REF);
    }
    String where = DwellingProtection.locationWords(location);
    if (row.clause() == null) {
      return Finding.pass(
          CheckKind.GROUND_FAULT_PROTECTION,
          "not required: " + where + " is none of the 210.8(B) locations",
          List.of(),
          REF);
    }
    String reference = "NEC " + row.clause() + " (GFCI)";
    if (!hasReceptacles(circuit)) {
      return Finding.pass(
          CheckKind.GROUND_FAULT_PROTECTION,
          "not required: 210.8(B) covers receptacles, and this circuit records no receptacle"
              + " outlet load",
          List.of(),
          reference);
    }
    if (circuit.position() == null) {
      return Finding.notAssessed(CheckKind.GROUND_FAULT_PROTECTION, "position", reference);
    }
    if (u0 > MAX_VOLTS_TO_GROUND + 1e-9) {
      return Finding.pass(
          CheckKind.GROUND_FAULT_PROTECTION,
          "not required: the supply is "
              + NecCircuitChecks.fmt(u0)
              + " V to ground, above the 150 V that 210.8(B) covers",
          List.of(new Quantity("U0", u0, "V")),
          reference);
    }
    Double in = circuit.device().ratedCurrentAmps();
    if (in == null) {
      return Finding.notAssessed(CheckKind.GROUND_FAULT_PROTECTION, "device rating In", reference);
    }
    boolean threePhase = circuit.position() == PhasePosition.THREE_POLE;
    double limit = threePhase ? THREE_PHASE_MAX_AMPS : SINGLE_PHASE_MAX_AMPS;
    List<Quantity> values =
        List.of(
            new Quantity("In", in, "A"), new Quantity("210.8(B) receptacles up to", limit, "A"));
    if (in > limit + 1e-9) {
      return Finding.pass(
          CheckKind.GROUND_FAULT_PROTECTION,
          "not required: "
              + (threePhase ? "three-phase" : "single-phase")
              + " receptacles on a "
              + NecCircuitChecks.fmt(in)
              + " A circuit are rated above the "
              + NecCircuitChecks.fmt(limit)
              + " A that 210.8(B) covers (210.21(B): a receptacle is rated at least its"
              + " circuit)",
          values,
          reference);
    }
    String assumed = row.assumption() == null ? "" : "; " + row.assumption();
    FaultInterrupter fitted = circuit.device().faultInterrupter();
    if (fitted != null && fitted.groundFault()) {
      return Finding.pass(
          CheckKind.GROUND_FAULT_PROTECTION,
          "GFCI breaker recorded for receptacles at " + where + assumed,
          List.of(
              new Quantity("In", in, "A"),
              new Quantity("Class A trip", FaultInterrupter.CLASS_A_TRIP_MILLIAMPS, "mA")),
          reference);
    }
    return new Finding(
        CheckKind.GROUND_FAULT_PROTECTION,
        Verdict.WARNING,
        "receptacles at " + where + " need GFCI protection; no GFCI breaker recorded" + assumed,
        values,
        reference,
        "fit a GFCI breaker, or check on site that every receptacle is a GFCI receptacle or is fed"
            + " through one");
  }

  /** Whether 210.8(B) asks this circuit for GFCI protection (every input known and in scope). */
  static boolean needsGfci(CircuitSpec circuit, double u0) {
    Row row = row(circuit.location());
    if (row == null
        || row.clause() == null
        || !hasReceptacles(circuit)
        || circuit.position() == null
        || circuit.device() == null
        || circuit.device().ratedCurrentAmps() == null
        || u0 > MAX_VOLTS_TO_GROUND + 1e-9) {
      return false;
    }
    double limit =
        circuit.position() == PhasePosition.THREE_POLE
            ? THREE_PHASE_MAX_AMPS
            : SINGLE_PHASE_MAX_AMPS;
    return circuit.device().ratedCurrentAmps() <= limit + 1e-9;
  }

  private static boolean hasReceptacles(CircuitSpec circuit) {
    return circuit.loads().stream().anyMatch(l -> l.category() == LoadCategory.SOCKET_OUTLETS);
  }
}
