package com.wayledger.exchange;

import com.wayledger.board.CircuitForm;
import com.wayledger.engine.Phase;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.WayStatus;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;

/**
 * The positions of a board that hold nothing (no circuit, or a way recorded as an empty space), as
 * printed on the door chart. A spare device is not free: it is a breaker waiting for a circuit.
 *
 * @param labels runs of whole free ways ("9", "10–12") and single free positions ("5 L2")
 * @param count how many single-pole positions are free (a whole free way of a three-phase board
 *     counts three)
 */
public record FreePositions(List<String> labels, int count) {

  public FreePositions {
    labels = List.copyOf(labels);
  }

  /**
   * A recorded way position.
   *
   * @param wayNumber the way
   * @param position its line(s); null reads as the whole way
   * @param status in use, spare device or empty space
   */
  record Occupant(Integer wayNumber, PhasePosition position, WayStatus status) {}

  static FreePositions of(BoardEntry board) {
    List<Occupant> occupants = new ArrayList<>();
    for (CircuitEntry entry : board.circuits()) {
      CircuitForm c = entry.circuit();
      occupants.add(new Occupant(c.wayNumber(), c.position(), c.status()));
    }
    return of(board.wayCount(), board.isThreePhase(), occupants);
  }

  static FreePositions of(int ways, boolean threePhase, List<Occupant> occupants) {
    List<Set<Phase>> taken = new ArrayList<>();
    for (int way = 0; way <= ways; way++) {
      taken.add(EnumSet.noneOf(Phase.class));
    }
    for (Occupant circuit : occupants) {
      if (circuit.status() == WayStatus.EMPTY
          || circuit.wayNumber() == null
          || circuit.wayNumber() < 1
          || circuit.wayNumber() > ways) {
        continue;
      }
      if (!threePhase || circuit.position() == null) {
        taken.get(circuit.wayNumber()).addAll(EnumSet.allOf(Phase.class));
      } else {
        taken.get(circuit.wayNumber()).addAll(circuit.position().phases());
      }
    }
    List<String> labels = new ArrayList<>();
    int count = 0;
    int runStart = 0;
    for (int way = 1; way <= ways + 1; way++) {
      boolean wholeWayFree = way <= ways && taken.get(way).isEmpty();
      if (wholeWayFree) {
        count += threePhase ? 3 : 1;
        if (runStart == 0) {
          runStart = way;
        }
        continue;
      }
      if (runStart != 0) {
        labels.add(runStart == way - 1 ? Integer.toString(runStart) : runStart + "–" + (way - 1));
        runStart = 0;
      }
      if (way <= ways && threePhase) {
        for (Phase phase : Phase.values()) {
          if (!taken.get(way).contains(phase)) {
            labels.add(way + " " + phase.name());
            count++;
          }
        }
      }
    }
    return new FreePositions(labels, count);
  }
}
