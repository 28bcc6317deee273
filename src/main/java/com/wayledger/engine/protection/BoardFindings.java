package com.wayledger.engine.protection;

import com.wayledger.engine.PositionWords;
import com.wayledger.engine.protection.fault.BoardFaultLevel;
import com.wayledger.engine.protection.result.Finding;
import java.util.List;

/**
 * The checks of one board: its own (incomer, busbar, unbalance, selectivity) and its circuits'.
 *
 * @param boardId the board
 * @param reference its name on site
 * @param faultLevel Ze, fault current and voltage drop at the board, with their sources
 * @param findings the board's own findings
 * @param circuits one entry per circuit that holds a device
 * @param words the board's words, which name its findings' checks ({@link #titleOf(Finding)})
 */
public record BoardFindings(
    long boardId,
    String reference,
    BoardFaultLevel faultLevel,
    List<Finding> findings,
    List<CircuitFindings> circuits,
    PositionWords words) {

  public BoardFindings {
    findings = List.copyOf(findings);
    circuits = List.copyOf(circuits);
    if (words == null) {
      words = PositionWords.WAYS;
    }
  }

  /** The checks of a board of ways on the IEC supply. */
  public BoardFindings(
      long boardId,
      String reference,
      BoardFaultLevel faultLevel,
      List<Finding> findings,
      List<CircuitFindings> circuits) {
    this(boardId, reference, faultLevel, findings, circuits, null);
  }

  /** The title of a finding's check in this board's words ("Line unbalance within …"). */
  public String titleOf(Finding finding) {
    return finding.check().title(words);
  }
}
