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
      default -> EnumWords.standard().parse(PhasePosition.class, text);
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
