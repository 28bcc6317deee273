package com.wayledger.engine.inspection;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;

class ResultDriftTests {

  @Test
  void insulationFallingByMoreThanHalfNeedsAttention() {
    // Wayledger's own threshold: a fall below half of the earlier reading
    List<ResultDrift.Move> moves = ResultDrift.between(ir(200.0), ir(80.0));
    assertThat(moves).singleElement().satisfies(m -> assertThat(m.attention()).isTrue());
  }

  @Test
  void insulationFallingLessThanHalfIsShownWithoutAttention() {
    List<ResultDrift.Move> moves = ResultDrift.between(ir(200.0), ir(150.0));
    assertThat(moves).singleElement().satisfies(m -> assertThat(m.attention()).isFalse());
  }

  @Test
  void r1PlusR2RisingMoreThan5HundredthsNeedsAttention() {
    var earlier =
        new CircuitResults(
            0.40, null, null, null, null, null, null, null, null, null, null, null, null, false);
    var later =
        new CircuitResults(
            0.52, null, null, null, null, null, null, null, null, null, null, null, null, false);
    assertThat(ResultDrift.between(earlier, later).get(0).attention()).isTrue();
  }

  @Test
  void rcdTimeLengtheningByMoreThanAFifthNeedsAttention() {
    var earlier =
        new CircuitResults(
            null, null, null, null, null, null, null, null, null, null, 22.0, null, null, false);
    var later =
        new CircuitResults(
            null, null, null, null, null, null, null, null, null, null, 34.0, null, null, false);
    assertThat(ResultDrift.between(earlier, later).get(0).attention()).isTrue();
  }

  @Test
  void valuesMeasuredOnlyOnceAreNotCompared() {
    assertThat(ResultDrift.between(CircuitResults.NONE, ir(100.0))).isEmpty();
  }

  private static CircuitResults ir(Double lineEarth) {
    return new CircuitResults(
        null, null, null, null, null, null, lineEarth, null, null, null, null, null, null, false);
  }
}
