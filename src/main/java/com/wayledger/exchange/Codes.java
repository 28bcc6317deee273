package com.wayledger.exchange;

import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.WayStatus;
import java.util.Locale;

/**
 * How closed vocabularies are written into a spreadsheet cell, and read back from ours and others'
 * files.
 */
final class Codes {

  private Codes() {}

  static String line(PhasePosition position) {
    if (position.isLineToLine()) {
      return position.fromLine().name() + "-" + position.toLine().name();
    }
    return position == PhasePosition.THREE_POLE ? ScheduleColumn.THREE_POLE_CODE : position.name();
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
      default -> null;
    };
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
      default -> null;
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

  /** An enum constant by name, ignoring case, spaces, hyphens and underscores; null when none. */
  static <E extends Enum<E>> E parseEnum(Class<E> type, String text) {
    String t = squash(text);
    if (t.isEmpty()) {
      return null;
    }
    for (E constant : type.getEnumConstants()) {
      if (squash(constant.name()).equals(t)) {
        return constant;
      }
    }
    return null;
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
