package com.wayledger.inspection;

import com.wayledger.engine.inspection.ResultDrift;
import java.util.List;

/**
 * What changed on a board between two points: an earlier inspection and a later one (or now).
 *
 * @param fromLabel the earlier point, e.g. "inspection of 2022-05-10"
 * @param toLabel the later point
 * @param changes the schedule changes logged in between, oldest first
 * @param peakLineAmpsBefore the most loaded line's demand current at the earlier point, A (null
 *     when the log has no figure for it)
 * @param peakLineAmpsAfter the same at the later point
 * @param drift per circuit, the results measured at both inspections and how they moved
 * @param attention the short list of what needs attention
 */
public record Comparison(
    String fromLabel,
    String toLabel,
    List<Change> changes,
    Double peakLineAmpsBefore,
    Double peakLineAmpsAfter,
    List<CircuitDrift> drift,
    List<String> attention) {

  /**
   * One logged change.
   *
   * @param category a message key suffix: added, removed, moved, device, cable, edited, load, board
   */
  public record Change(String when, String category, String summary) {}

  /** One circuit's moves between the two inspections. */
  public record CircuitDrift(String wayLabel, String description, List<ResultDrift.Move> moves) {

    public boolean needsAttention() {
      return moves.stream().anyMatch(ResultDrift.Move::attention);
    }
  }
}
