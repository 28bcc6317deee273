package com.wayledger.engine.inspection;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.CableSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.EarthingSystem;
import com.wayledger.engine.InstallationMethod;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RcdType;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.WayStatus;
import java.util.List;
import org.junit.jupiter.api.Test;

class InspectionGraderTests {

  private static final TestConditions CONDITIONS =
      new TestConditions(EarthingSystem.TN_C_S, 230, 400, 20, 500.0);

  @Test
  void everyTestOfAnRcboCircuitIsGradedAndNoneIsSilentlySkipped() {
    List<GradedValue> values =
        InspectionGrader.gradeCircuit(radialRcbo(), CircuitResults.NONE, CONDITIONS);
    assertThat(values)
        .extracting(GradedValue::quantity)
        .contains(
            "R1+R2",
            "IR L–L",
            "IR L–E",
            "IR N–E",
            "polarity",
            "Zs",
            "RCD at IΔn",
            "RCD at 5×IΔn",
            "RCD test button");
    assertThat(values).allMatch(v -> v.grade() == Grade.NOT_ASSESSED);
  }

  @Test
  void failingResultsFailAndPassingResultsPass() {
    // 2.5/1.5 mm² over 20 m at 20 °C: 0.39 Ω expected (IEC 60228 from memory); B16 80 % Zs limit
    // 0.8·0.95·230/80 = 2.19 Ω; RCD 30 mA general type ≤ 300 ms (IEC 61008-1 Table 1)
    CircuitResults results =
        new CircuitResults(
            0.41, null, null, null, null, 200.0, 0.6, 150.0, true, 0.82, 340.0, 18.0, true, false);
    List<GradedValue> values = InspectionGrader.gradeCircuit(radialRcbo(), results, CONDITIONS);
    assertThat(gradeOf(values, "R1+R2")).isEqualTo(Grade.PASS);
    assertThat(gradeOf(values, "IR L–E")).isEqualTo(Grade.FAIL);
    assertThat(gradeOf(values, "Zs")).isEqualTo(Grade.PASS);
    assertThat(gradeOf(values, "RCD at IΔn")).isEqualTo(Grade.FAIL);
    assertThat(gradeOf(values, "RCD at 5×IΔn")).isEqualTo(Grade.PASS);
  }

  @Test
  void rcdTimeOnACircuitWithoutAnRecordedRcdContradictsTheRecord() {
    CircuitSpec mcb =
        new CircuitSpec(
            1,
            1,
            PhasePosition.L1,
            "Lights",
            WayStatus.IN_USE,
            false,
            new DeviceSpec(DeviceKind.MCB, TripCurve.B, 6.0, 1, 6.0, null, null),
            cable(1.5, 1.0, 18.0),
            List.of(),
            null,
            null);
    CircuitResults results =
        new CircuitResults(
            null, null, null, null, null, null, null, null, null, null, 25.0, null, null, false);
    assertThat(InspectionGrader.gradeCircuit(mcb, results, CONDITIONS))
        .anySatisfy(v -> assertThat(v.message()).contains("records no RCD"));
  }

  private static Grade gradeOf(List<GradedValue> values, String quantity) {
    return values.stream()
        .filter(v -> v.quantity().equals(quantity))
        .findFirst()
        .orElseThrow()
        .grade();
  }

  private static CircuitSpec radialRcbo() {
    return new CircuitSpec(
        1,
        3,
        PhasePosition.L1,
        "Sockets",
        WayStatus.IN_USE,
        false,
        new DeviceSpec(DeviceKind.RCBO, TripCurve.B, 16.0, 1, 6.0, 30.0, RcdType.A),
        cable(2.5, 1.5, 20.0),
        List.of(),
        null,
        null);
  }

  private static CableSpec cable(double line, double cpc, double metres) {
    return new CableSpec(
        line,
        cpc,
        ConductorMaterial.COPPER,
        Insulation.THERMOPLASTIC_70,
        metres,
        InstallationMethod.values()[0],
        30.0,
        1,
        0);
  }
}
