package com.wayledger.engine.protection;

import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.SourcedValue;
import java.util.List;

/**
 * The checks of one circuit and the figures behind them.
 *
 * @param circuitId the circuit
 * @param wayNumber its way on the board
 * @param loopImpedanceOhms Zs at the far end, Ω, measured or calculated
 * @param capacityAmps Iz after correction factors, A; null when not known
 * @param voltageDropFromOriginPercent total drop origin-to-end, %; null when not known
 * @param startUpSurgeAmps peak start-up current, A; null when no load records a surge
 * @param findings one finding per applicable check
 * @param boardReference the board the circuit is on; null when not given
 * @param position the line(s) the circuit occupies; null when not recorded
 * @param description what the circuit feeds; null when not given
 */
public record CircuitFindings(
    long circuitId,
    int wayNumber,
    SourcedValue loopImpedanceOhms,
    Double capacityAmps,
    Double voltageDropFromOriginPercent,
    Double startUpSurgeAmps,
    List<Finding> findings,
    String boardReference,
    com.wayledger.engine.PhasePosition position,
    String description,
    com.wayledger.engine.PositionWords words) {

  public CircuitFindings {
    findings = List.copyOf(findings);
    if (words == null) {
      words = com.wayledger.engine.PositionWords.WAYS;
    }
  }

  /** Findings not yet placed on a board. */
  public CircuitFindings(
      long circuitId,
      int wayNumber,
      SourcedValue loopImpedanceOhms,
      Double capacityAmps,
      Double voltageDropFromOriginPercent,
      Double startUpSurgeAmps,
      List<Finding> findings) {
    this(
        circuitId,
        wayNumber,
        loopImpedanceOhms,
        capacityAmps,
        voltageDropFromOriginPercent,
        startUpSurgeAmps,
        findings,
        null,
        null,
        null,
        null);
  }

  /** The same findings placed: board, line(s) and circuit name, on a board of ways. */
  public CircuitFindings placed(String board, com.wayledger.engine.PhasePosition at, String feeds) {
    return placed(board, at, feeds, com.wayledger.engine.PositionWords.WAYS);
  }

  /** The same findings placed, their position named in the board's words ("space 5 A"). */
  public CircuitFindings placed(
      String board,
      com.wayledger.engine.PhasePosition at,
      String feeds,
      com.wayledger.engine.PositionWords boardWords) {
    return new CircuitFindings(
        circuitId,
        wayNumber,
        loopImpedanceOhms,
        capacityAmps,
        voltageDropFromOriginPercent,
        startUpSurgeAmps,
        findings,
        board,
        at,
        feeds,
        boardWords);
  }

  /** The line(s) in the board's words: "L2", "L1–L3", "A–B"; empty when not recorded. */
  public String lineLabel() {
    return words.lines(position);
  }

  /** Where the findings are, in words: "DB2 way 9 L2 “Kitchen sockets”", "LP1 space 5 A …". */
  public String place() {
    return boardReference == null ? placeOnBoard() : boardReference + " " + placeOnBoard();
  }

  /** The same without the board: "way 9 L2 “Kitchen sockets”", "space 5 A “Kitchen”". */
  public String placeOnBoard() {
    StringBuilder text = new StringBuilder();
    text.append(words.place(wayNumber, position));
    if (description != null && !description.isBlank()) {
      text.append(" “").append(description).append('”');
    }
    return text.toString();
  }
}
