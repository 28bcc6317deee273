package com.wayledger.inspection;

import java.util.List;

/**
 * What a column of an uploaded results sheet means: how a row finds its circuit (way, line, or the
 * circuit's key when the sheet carries it) or which reading of the result grid it holds. Header
 * phrases are the trade's usual words and our own grid headings, most telling first, as {@link
 * ResultColumnGuesser#normalise} leaves them.
 */
public enum ResultColumn {
  IGNORE(null, List.of()),
  WAY(
      null,
      List.of(
          "way",
          "way no",
          "cct",
          "cct no",
          "ckt",
          "circuit no",
          "circuit number",
          "circuit ref",
          "no",
          "ref",
          "position")),
  LINE(null, List.of("line", "phase", "ph", "pole")),
  CIRCUIT_KEY(null, List.of("circuit key", "key", "circuit id", "id")),
  DESCRIPTION(
      null, List.of("circuit", "description", "circuit description", "feeds", "designation")),
  R1R2(
      "r1r2",
      List.of(
          "r1+r2",
          "r1+r2 ohm",
          "r1 + r2",
          "r1r2",
          "continuity r1+r2",
          "continuity",
          "cpc continuity")),
  /** Upper-case R2 (the protective conductor alone); a lower-case r2 is the ring's end-to-end. */
  R2("r2", List.of("wander lead r2", "r2 only", "cpc r2", "protective conductor r2")),
  RING_R1("ringR1", List.of("r1", "ring r1", "r1 ohm", "ring end to end r1", "end to end r1")),
  RING_RN("ringRn", List.of("rn", "ring rn", "rn ohm", "ring end to end rn", "end to end rn")),
  RING_R2(
      "ringR2",
      List.of("ring r2", "ring r2 ohm", "ring end to end r2", "end to end r2", "ring cpc")),
  IR_LL(
      "irLl",
      List.of(
          "ir l l",
          "ir l l mohm",
          "ir ll",
          "ir live live",
          "insulation l l",
          "insulation resistance l l",
          "ir l n",
          "ir live live mohm")),
  IR_LE(
      "irLe",
      List.of(
          "ir l e",
          "ir l e mohm",
          "ir le",
          "ir live earth",
          "insulation l e",
          "insulation resistance l e",
          "ir l pe",
          "ir")),
  IR_NE(
      "irNe",
      List.of(
          "ir n e",
          "ir n e mohm",
          "ir ne",
          "ir neutral earth",
          "insulation n e",
          "insulation resistance n e",
          "ir n pe")),
  POLARITY("polarity", List.of("polarity", "pol", "polarity ok", "polarity correct")),
  ZS(
      "zs",
      List.of(
          "zs",
          "zs ohm",
          "measured zs",
          "zs measured",
          "loop impedance",
          "earth fault loop impedance",
          "efli")),
  RCD_RATED(
      "rcd1",
      List.of(
          "rcd ms",
          "rcd",
          "rcd time",
          "rcd x1",
          "rcd 1x",
          "rcd x1 ms",
          "rcd 1x ms",
          "rcd idn",
          "rcd idn ms",
          "idn ms",
          "rcd trip time",
          "rcd time ms")),
  RCD_FIVE(
      "rcd5",
      List.of(
          "rcd 5x ms",
          "rcd 5 x ms",
          "rcd x5",
          "rcd 5x",
          "rcd x5 ms",
          "rcd 5 x",
          "5idn",
          "5 x idn",
          "5x idn",
          "rcd 5idn",
          "rcd 5 idn ms")),
  RCD_BUTTON(
      "rcdButton",
      List.of("btn", "rcd button", "test button", "rcd test button", "button", "t button")),
  RCD_DELAYED(
      "rcdDelayed", List.of("s", "rcd delay", "time delayed", "delayed", "type s", "rcd type s"));

  private final String gridColumn;
  private final List<String> words;

  ResultColumn(String gridColumn, List<String> words) {
    this.gridColumn = gridColumn;
    this.words = words;
  }

  /** The result grid's column this reading fills, or null for the columns that find the circuit. */
  public String gridColumn() {
    return gridColumn;
  }

  /** Whether the column holds a reading (not a way, line, key or description). */
  public boolean isReading() {
    return gridColumn != null;
  }

  List<String> words() {
    return words;
  }

  /** Key of the column's name in i18n/inspection.properties. */
  public String messageKey() {
    return "inspection.import.column." + name();
  }
}
