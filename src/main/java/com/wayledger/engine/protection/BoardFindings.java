package com.wayledger.engine.protection;

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
 */
public record BoardFindings(
    long boardId,
    String reference,
    BoardFaultLevel faultLevel,
    List<Finding> findings,
    List<CircuitFindings> circuits) {

  public BoardFindings {
    findings = List.copyOf(findings);
    circuits = List.copyOf(circuits);
  }
}
