package com.wayledger.loadlog;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.WayStatus;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Change-log snapshots written before circuits recorded rings must still read, as radials. */
class SnapshotsTests {

  // the JSON a CircuitSpec snapshot had before the ringFinal component existed
  private static final String OLD_SNAPSHOT =
      "{\"id\":7,\"wayNumber\":3,\"position\":\"L1\",\"description\":\"Sockets\",\"status\":\"IN_USE\","
          + "\"lockedForBalancing\":true,\"device\":null,\"cable\":null,\"loads\":[],\"feedsBoardId\":null,"
          + "\"measuredLoopImpedanceOhms\":0.8}";

  @Test
  void snapshotWithoutTheRingFlagReadsAsARadial() {
    CircuitSpec old = Snapshots.circuit(OLD_SNAPSHOT);
    assertThat(old.ringFinal()).isFalse();
    assertThat(old.lockedForBalancing()).as("the other fields still read").isTrue();
    assertThat(old.measuredLoopImpedanceOhms()).isEqualTo(0.8);
    assertThat(Snapshots.circuits("[" + OLD_SNAPSHOT + "]"))
        .extracting(CircuitSpec::ringFinal)
        .containsExactly(false);
  }

  @Test
  void ringFlagSurvivesTheSnapshot() {
    CircuitSpec ring =
        new CircuitSpec(
            8,
            4,
            PhasePosition.L2,
            "Ring",
            WayStatus.IN_USE,
            false,
            null,
            null,
            List.of(),
            null,
            null,
            true);
    String json = Snapshots.MAPPER.writeValueAsString(ring);
    assertThat(json).contains("\"ringFinal\":true");
    assertThat(Snapshots.circuit(json)).isEqualTo(ring);
  }
}
