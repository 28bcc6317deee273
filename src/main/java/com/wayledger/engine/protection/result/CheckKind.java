package com.wayledger.engine.protection.result;

import com.wayledger.engine.PositionWords;

/**
 * The protection and cable checks the engine runs, with a plain-words title for screens and
 * exports: {@link #title()} in the base (en-GB) words, {@link #title(PositionWords)} in a board's
 * own words, which every screen and export that shows a title takes.
 */
public enum CheckKind {
  WAY_OVERLOAD("Way overloaded (Ib > In)"),
  CABLE_PROTECTION("Cable protected by its device (In ≤ Iz, I2 ≤ 1.45·Iz)"),
  BREAKING_CAPACITY("Breaking capacity at least the prospective fault current"),
  LOOP_IMPEDANCE("Earth fault loop impedance within the disconnection limit"),
  VOLTAGE_DROP("Voltage drop from the origin within the limit"),
  START_UP_SURGE("Start-up surge below the instantaneous trip current"),
  SOCKET_RCD("30 mA residual-current protection where the load category needs it"),
  INCOMER_OVERLOAD("Incomer not overloaded"),
  BUSBAR_OVERLOAD("Busbar not overloaded"),
  SUPPLY_FUSE_OVERLOAD("Supply fuse not overloaded"),
  PHASE_UNBALANCE("Phase unbalance within the board's limit"),
  SELECTIVITY("Selectivity between the incomer and outgoing devices"),
  POLE_COUNT("Breaker has as many poles as its position takes"),
  STANDARD_RATING("Breaker or fuse at a standard ampere rating"),
  SMALL_CONDUCTOR("Small conductor within its overcurrent limit"),
  CONDUCTOR_AMPACITY("Conductor protected at its ampacity"),
  TERMINATION_TEMPERATURE("Conductor ampacity within the termination temperature"),
  CONTINUOUS_LOAD("Continuous load at 125 % within the breaker and conductor"),
  MOTOR_CONDUCTOR("Motor circuit conductor at 125 % of the table full-load current"),
  MOTOR_BREAKER("Motor circuit breaker within its maximum rating"),
  BRANCH_VOLTAGE_DROP("Branch-circuit voltage drop within the recommendation"),
  TOTAL_VOLTAGE_DROP("Feeder and branch voltage drop within the recommendation"),
  INTERRUPTING_RATING("Interrupting rating at least the available fault current"),
  GROUND_FAULT_PROTECTION("Ground-fault (GFCI) protection where the location needs it"),
  ARC_FAULT_PROTECTION("Arc-fault (AFCI) protection where the location needs it");

  private final String title;

  CheckKind(String title) {
    this.title = title;
  }

  /** The title in the base words ("Phase unbalance within the board's limit"). */
  public String title() {
    return title;
  }

  /**
   * The title in a board's words, as its finding texts speak (docs/wording.md): a way is a "space"
   * on a panelboard; under the NEC rule set the board is a "panelboard", a phase of the board a
   * "line" (A, B, C: a 120/240 V panel's two legs are not phases) and earth is "ground". Only words
   * whose meanings truly match are swapped; every other title is {@link #title()}. Like the
   * findings' own sentences, the title follows the site's rule set, not the reader's language, so
   * that the board page, the findings page and the workbook print one text.
   *
   * @param words the words of the finding's board; null reads as the base words
   */
  public String title(PositionWords words) {
    if (words == null) {
      return title;
    }
    return switch (this) {
      case WAY_OVERLOAD -> (words.panelboard() ? "Space" : "Way") + " overloaded (Ib > In)";
      case PHASE_UNBALANCE ->
          words.usTrade() ? "Line unbalance within the " + words.board() + "'s limit" : title;
      case LOOP_IMPEDANCE ->
          words.usTrade() ? "Ground fault loop impedance within the disconnection limit" : title;
      default -> title;
    };
  }
}
