package com.wayledger.engine.inspection;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;

class OutcomeTests {

  @Test
  void onlyAdvisoryObservationsLeaveTheOutcomeSatisfactory() {
    // common practice: improvement recommended alone does not make a report unsatisfactory
    assertThat(Outcome.of(List.of(Urgency.ADVISORY, Urgency.ADVISORY)))
        .isEqualTo(Outcome.SATISFACTORY);
  }

  @Test
  void anyUrgentOrInvestigateObservationMakesItUnsatisfactory() {
    assertThat(Outcome.of(List.of(Urgency.ADVISORY, Urgency.INVESTIGATE)))
        .isEqualTo(Outcome.UNSATISFACTORY);
    assertThat(Outcome.of(List.of(Urgency.URGENT))).isEqualTo(Outcome.UNSATISFACTORY);
  }

  @Test
  void noObservationsIsSatisfactory() {
    assertThat(Outcome.of(List.of())).isEqualTo(Outcome.SATISFACTORY);
  }

  @Test
  void worstClassIsDangerBeforeUrgentBeforeInvestigateBeforeAdvisory() {
    assertThat(Outcome.worst(List.of(Urgency.ADVISORY, Urgency.URGENT, Urgency.INVESTIGATE)))
        .isEqualTo(Urgency.URGENT);
    assertThat(Outcome.worst(List.of(Urgency.URGENT, Urgency.DANGER_NOW)))
        .isEqualTo(Urgency.DANGER_NOW);
  }

  @Test
  void wrongPolarityIsProposedAsDangerNow() {
    assertThat(Urgency.proposedFor(TestKind.POLARITY)).isEqualTo(Urgency.DANGER_NOW);
    assertThat(Urgency.proposedFor(TestKind.INSULATION)).isEqualTo(Urgency.URGENT);
  }
}
