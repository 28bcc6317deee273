package com.wayledger.exchange;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.WayStatus;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Free positions as printed on the door chart. */
class FreePositionsTests {

  private static FreePositions.Occupant at(int way, PhasePosition position, WayStatus status) {
    return new FreePositions.Occupant(way, position, status);
  }

  @Test
  void threePhaseBoardListsWholeFreeWaysAsRunsAndSinglePositions() {
    List<FreePositions.Occupant> circuits = new ArrayList<>();
    circuits.add(at(1, PhasePosition.THREE_POLE, WayStatus.IN_USE));
    circuits.add(at(2, PhasePosition.L1, WayStatus.IN_USE));
    circuits.add(at(2, PhasePosition.L3, WayStatus.SPARE_DEVICE));
    circuits.add(at(4, PhasePosition.L2, WayStatus.EMPTY));
    FreePositions free = FreePositions.of(6, true, circuits);

    // way 2 L2 free; 3 whole; 4 whole (an empty space holds nothing); 5, 6 whole
    assertThat(free.labels()).containsExactly("2 L2", "3–6");
    assertThat(free.count()).as("single-pole positions free").isEqualTo(1 + 4 * 3);
  }

  @Test
  void singlePhaseBoardCountsWays() {
    FreePositions free =
        FreePositions.of(
            5,
            false,
            List.of(
                at(1, PhasePosition.L1, WayStatus.IN_USE),
                at(3, PhasePosition.L1, WayStatus.IN_USE)));

    assertThat(free.labels()).containsExactly("2", "4–5");
    assertThat(free.count()).isEqualTo(3);
  }

  @Test
  void fullBoardHasNoFreePosition() {
    List<FreePositions.Occupant> circuits = new ArrayList<>();
    for (int way = 1; way <= 2; way++) {
      circuits.add(at(way, PhasePosition.THREE_POLE, WayStatus.IN_USE));
    }
    FreePositions free = FreePositions.of(2, true, circuits);
    assertThat(free.labels()).isEmpty();
    assertThat(free.count()).isZero();
  }
}
