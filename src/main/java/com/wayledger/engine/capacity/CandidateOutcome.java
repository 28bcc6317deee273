package com.wayledger.engine.capacity;

import com.wayledger.engine.Phase;
import com.wayledger.engine.protection.result.Finding;
import java.util.List;
import java.util.Map;

/**
 * What adding the load at one candidate would do.
 *
 * @param candidate where
 * @param designCurrentAmps Ib of the way after the change (per line for three poles), A
 * @param ratedCurrentAmps In of the way's device, A; null when not known
 * @param wayLoadingPercent Ib ÷ In, %; null when In is not known
 * @param phaseCurrentsBeforeAmps demand current per line of the board before, A
 * @param phaseCurrentsAfterAmps the same after, A
 * @param incomerLoadingPercent largest phase current ÷ incomer rating after, %; null when not
 *     assessed
 * @param busbarLoadingPercent the same against the busbar, %; null when not assessed
 * @param supplyLoadingPercent largest phase current at the origin ÷ supply fuse after, %; null when
 *     not assessed
 * @param unbalancePercentAfter phase unbalance of the board after, %; null for a single-phase board
 * @param newFindings problem findings (danger, warning) that the change would add or make worse,
 *     anywhere on the site
 * @param reason one line saying why it ranks where it does
 * @param blockers why this candidate must not be offered as the answer: a line, way, incomer,
 *     busbar or supply fuse on its path taken beyond its rating, or a new danger-grade finding;
 *     empty when none
 */
public record CandidateOutcome(
    Candidate candidate,
    double designCurrentAmps,
    Double ratedCurrentAmps,
    Double wayLoadingPercent,
    Map<Phase, Double> phaseCurrentsBeforeAmps,
    Map<Phase, Double> phaseCurrentsAfterAmps,
    Double incomerLoadingPercent,
    Double busbarLoadingPercent,
    Double supplyLoadingPercent,
    Double unbalancePercentAfter,
    List<Finding> newFindings,
    String reason,
    List<String> blockers) {

  public CandidateOutcome {
    phaseCurrentsBeforeAmps = Map.copyOf(phaseCurrentsBeforeAmps);
    phaseCurrentsAfterAmps = Map.copyOf(phaseCurrentsAfterAmps);
    newFindings = List.copyOf(newFindings);
    blockers = List.copyOf(blockers);
  }

  /**
   * Whether the candidate may be offered as the answer: it overloads nothing on its path and adds
   * no danger.
   */
  public boolean isAcceptable() {
    return blockers.isEmpty();
  }

  public long newDangerCount() {
    return newFindings.stream()
        .filter(f -> f.verdict() == com.wayledger.engine.protection.result.Verdict.DANGER)
        .count();
  }

  public long newWarningCount() {
    return newFindings.stream()
        .filter(f -> f.verdict() == com.wayledger.engine.protection.result.Verdict.WARNING)
        .count();
  }

  /** The largest line current of the board after the change, A. */
  public double largestPhaseAmps() {
    return phaseCurrentsAfterAmps.values().stream()
        .mapToDouble(Double::doubleValue)
        .max()
        .orElse(0.0);
  }

  public Double phaseAfter(Phase phase) {
    return phaseCurrentsAfterAmps.get(phase);
  }

  public Double phaseBefore(Phase phase) {
    return phaseCurrentsBeforeAmps.get(phase);
  }

  /** Whether the change adds no danger and no warning finding. */
  public boolean isClean() {
    return newFindings.isEmpty();
  }
}
