package com.wayledger.exchange;

import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.WayStatus;
import com.wayledger.system.EnumWords;
import java.util.Locale;

/**
 * How closed vocabularies are written into a spreadsheet cell, and read back from ours and others'
 * files.
 */
final class Codes {

  private Codes() {}

  static String line(PhasePosition position) {
    return line(position, com.wayledger.engine.Phase::name);
  }

  /**
   * The Line cell of a position, its lines named as on the board: "A", "B-C" on a North American
   * panel, "L1", "L1-L2" otherwise; "3P" for three poles. Import reads either spelling on any board
   * ({@link #parseLine}).
   */
  static String line(
      PhasePosition position,
      java.util.function.Function<com.wayledger.engine.Phase, String> lineName) {
    if (position.isLineToLine()) {
      return lineName.apply(position.fromLine()) + "-" + lineName.apply(position.toLine());
    }
    if (position == PhasePosition.THREE_POLE) {
      return ScheduleColumn.THREE_POLE_CODE;
    }
    return lineName.apply(position.phases().iterator().next());
  }

  /** L1, L2, L3, or a three-pole position in the usual spellings; null when unrecognised. */
  static PhasePosition parseLine(String text) {
    String t = squash(text);
    return switch (t) {
      case "L1", "1", "A", "R", "P1", "PH1", "PHASE1" -> PhasePosition.L1;
      case "L2", "2", "B", "S", "Y", "P2", "PH2", "PHASE2" -> PhasePosition.L2;
      case "L3", "3", "C", "T", "P3", "PH3", "PHASE3" -> PhasePosition.L3;
      case "3P",
          "TP",
          "TPN",
          "3PH",
          "3PHASE",
          "THREEPOLE",
          "THREEPHASE",
          "L1L2L3",
          "L1L3",
          "L123",
          "ABC",
          "RYB",
          "RST" ->
          PhasePosition.THREE_POLE;
      case "L1L2", "AB" -> PhasePosition.L1_L2;
      case "L2L3", "BC" -> PhasePosition.L2_L3;
      case "L3L1", "CA" -> PhasePosition.L3_L1;
      default -> EnumWords.standard().parse(PhasePosition.class, text);
    };
  }

  /** How a load is connected, as the Connection column says it. */
  enum Connection {
    LINE_TO_NEUTRAL("L-N"),
    LINE_TO_LINE("L-L"),
    THREE_PHASE("3-phase");

    final String code;

    Connection(String code) {
      this.code = code;
    }
  }

  /** "L-N", "L-L" or "3-phase" for a position; empty when none. */
  static String connection(PhasePosition position) {
    if (position == null) {
      return "";
    }
    if (position == PhasePosition.THREE_POLE) {
      return Connection.THREE_PHASE.code;
    }
    return position.isLineToLine() ? Connection.LINE_TO_LINE.code : Connection.LINE_TO_NEUTRAL.code;
  }

  /**
   * A connection in the usual spellings of both vocabularies: "L-N", "line to neutral", "120 V",
   * "277 V", "1P" for line to neutral; "L-L", "line to line", "240 V", "208 V", "480 V", "2P",
   * "two-pole" for line to line; "3-phase", "3P", "three-phase" for three-phase; null otherwise.
   */
  static Connection parseConnection(String text) {
    String t = squash(text).replace("VOLTS", "").replace("VOLT", "");
    if (t.endsWith("V")) {
      t = t.substring(0, t.length() - 1);
    }
    return switch (t) {
      case "LN",
          "LINETONEUTRAL",
          "PHASETONEUTRAL",
          "SINGLEPOLE",
          "1P",
          "1POLE",
          "120",
          "230",
          "277" ->
          Connection.LINE_TO_NEUTRAL;
      case "LL",
          "LINETOLINE",
          "PHASETOPHASE",
          "TWOPOLE",
          "2P",
          "2POLE",
          "DOUBLEPOLE",
          "240",
          "208",
          "480",
          "400" ->
          Connection.LINE_TO_LINE;
      case "3PHASE", "3PH", "THREEPHASE", "3P", "3POLE", "THREEPOLE", "TP", "TPN" ->
          Connection.THREE_PHASE;
      default -> null;
    };
  }

  /**
   * The position a row's line and connection say together, among the positions the board may take:
   * a single line with "line to line" is the two-pole position from that line (on a split-phase
   * board always A–B); a line with "three-phase" is the three-pole position; null when they
   * contradict each other or the board has no such position.
   */
  static PhasePosition connect(
      PhasePosition line, Connection connection, java.util.List<PhasePosition> allowed) {
    PhasePosition wanted =
        switch (connection) {
          case LINE_TO_NEUTRAL -> line.isSinglePole() ? line : null;
          case THREE_PHASE ->
              line.isSinglePole() || line == PhasePosition.THREE_POLE
                  ? PhasePosition.THREE_POLE
                  : null;
          case LINE_TO_LINE -> {
            if (line.isLineToLine()) {
              yield line;
            }
            if (!line.isSinglePole()) {
              yield null;
            }
            PhasePosition from = PhasePosition.twoPoleFrom(line.phases().iterator().next());
            yield allowed.contains(from) || !allowed.contains(PhasePosition.L1_L2)
                ? from
                : PhasePosition.L1_L2;
          }
        };
    return wanted;
  }

  static String state(WayStatus status) {
    return switch (status) {
      case IN_USE -> "in use";
      case SPARE_DEVICE -> "spare";
      case EMPTY -> "empty";
    };
  }

  static WayStatus parseState(String text) {
    String t = squash(text);
    return switch (t) {
      case "INUSE", "USED", "LIVE", "ACTIVE", "ON" -> WayStatus.IN_USE;
      case "SPARE", "SPAREDEVICE" -> WayStatus.SPARE_DEVICE;
      case "EMPTY", "SPACE", "EMPTYSPACE", "BLANK", "NONE" -> WayStatus.EMPTY;
      default -> EnumWords.standard().parse(WayStatus.class, text);
    };
  }

  static String yes(boolean flag) {
    return flag ? "yes" : "";
  }

  /** yes/no in common spellings; null when unrecognised. */
  static Boolean parseYes(String text) {
    String t = squash(text);
    return switch (t) {
      case "YES", "Y", "TRUE", "X", "1" -> Boolean.TRUE;
      case "NO", "N", "FALSE", "0", "" -> Boolean.FALSE;
      default -> null;
    };
  }

  /** Ring or radial, as yes/no or in words ("ring", "RFC", "radial"); null when unrecognised. */
  static Boolean parseRing(String text) {
    return switch (squash(text)) {
      case "RING", "RFC", "RINGFINAL" -> Boolean.TRUE;
      case "RADIAL" -> Boolean.FALSE;
      default -> parseYes(text);
    };
  }

  /**
   * An enum constant by its words ("Thermoplastic 70 °C") or its code ("THERMOPLASTIC_70"),
   * ignoring case, spaces and punctuation; null when none.
   */
  static <E extends Enum<E>> E parseEnum(Class<E> type, String text) {
    return EnumWords.standard().parse(type, text);
  }

  /** How a closed vocabulary's value is written in a cell: its words, never its code. */
  static String word(Enum<?> value) {
    return EnumWords.standard().shortOf(value);
  }

  /**
   * Upper case without spaces, hyphens, underscores, dots or slashes, so "in-use" and "IN_USE"
   * meet.
   */
  static String squash(String text) {
    if (text == null) {
      return "";
    }
    return text.strip().toUpperCase(Locale.ROOT).replaceAll("[\\s_\\-./–+]", "");
  }
}
