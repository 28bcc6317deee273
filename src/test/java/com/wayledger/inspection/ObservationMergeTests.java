package com.wayledger.inspection;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.inspection.Outcome;
import com.wayledger.engine.inspection.Urgency;
import com.wayledger.inspection.InspectionForm.ObservationEntry;
import java.util.List;
import org.junit.jupiter.api.Test;

/** How the inspector's decisions on proposed observations survive a re-grade. */
class ObservationMergeTests {

  private static final ObservationEntry SLOW_RCD =
      new ObservationEntry("keep", "URGENT", "RCD slow", 7L, "3", "URGENT", "RCD slow");
  private static final ObservationEntry LOW_IR =
      new ObservationEntry("keep", "URGENT", "IR low", 7L, "3", "URGENT", "IR low");

  @Test
  void aDroppedProposalStaysDroppedWhileItIsStillProposed() {
    ObservationEntry dropped =
        new ObservationEntry("drop", "URGENT", "RCD slow", 7L, "3", "URGENT", "RCD slow");
    List<ObservationEntry> merged = InspectionService.merge(List.of(dropped), List.of(SLOW_RCD));
    assertThat(merged).containsExactly(dropped);
    assertThat(merged.get(0).isKept()).isFalse();
  }

  @Test
  void anEditedProposalKeepsTheInspectorsWordsAndClass() {
    ObservationEntry edited =
        new ObservationEntry(
            "keep", "DANGER_NOW", "RCD does not trip in time", 7L, "3", "URGENT", "RCD slow");
    assertThat(InspectionService.merge(List.of(edited), List.of(SLOW_RCD))).containsExactly(edited);
  }

  @Test
  void aProposalWhoseValueNoLongerFailsIsRemovedAndANewOneIsAddedKept() {
    List<ObservationEntry> merged = InspectionService.merge(List.of(SLOW_RCD), List.of(LOW_IR));
    assertThat(merged).containsExactly(LOW_IR);
    assertThat(merged.get(0).isKept()).isTrue();
  }

  @Test
  void theInspectorsOwnObservationsAreKeptAndBlankLinesIgnored() {
    ObservationEntry own =
        new ObservationEntry("keep", "ADVISORY", "Label the ways", null, null, null, null);
    ObservationEntry blank = new ObservationEntry("keep", "ADVISORY", " ", null, null, null, null);
    assertThat(InspectionService.merge(List.of(own, blank), List.of())).containsExactly(own);
  }

  @Test
  void droppingTheOnlyUrgentProposalLeavesAnAdvisoryOnlyRecordSatisfactory() {
    // common practice: only "improvement recommended" leaves a report satisfactory
    ObservationEntry dropped =
        new ObservationEntry("drop", "URGENT", "RCD slow", 7L, "3", "URGENT", "RCD slow");
    ObservationEntry own =
        new ObservationEntry("keep", "ADVISORY", "Label the ways", null, null, null, null);
    List<Urgency> kept =
        InspectionService.merge(List.of(dropped, own), List.of(SLOW_RCD)).stream()
            .filter(ObservationEntry::isKept)
            .map(e -> Urgency.valueOf(e.urgency()))
            .toList();
    assertThat(Outcome.of(kept)).isEqualTo(Outcome.SATISFACTORY);
  }
}
