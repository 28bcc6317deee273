package com.wayledger.engine.inspection;

import com.wayledger.engine.CableSpec;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.protection.ProtectionSettings;
import com.wayledger.engine.protection.device.DeviceCharacteristic;
import com.wayledger.engine.protection.result.Resolved;
import java.util.ArrayList;
import java.util.List;

/**
 * Grades one circuit's measured results against the limits, using what the schedule records about
 * the circuit (its cable for the expected continuity, its device for the Zs limit, its RCD for the
 * trip times). Every value is graded; a value not measured or lacking a recorded input says "not
 * assessed" and why.
 */
public final class InspectionGrader {

  private InspectionGrader() {}

  public static List<GradedValue> gradeCircuit(
      CircuitSpec circuit, CircuitResults results, TestConditions conditions) {
    List<GradedValue> out = new ArrayList<>();
    CableSpec cable = circuit.cable();
    DeviceSpec device = circuit.device();
    ConductorMaterial material =
        cable == null || cable.material() == null ? ConductorMaterial.COPPER : cable.material();
    Double line = cable == null ? null : cable.lineCsaSquareMillimetres();
    Double cpc = cable == null ? null : cable.protectiveCsaSquareMillimetres();
    Double length = cable == null ? null : cable.lengthMetres();
    double celsius = conditions.testCelsius();
    String basis =
        (line == null ? "?" : ContinuityLimits.size(line))
            + "/"
            + (cpc == null ? "?" : ContinuityLimits.size(cpc))
            + " mm² "
            + material.name().toLowerCase(java.util.Locale.ROOT)
            + ", "
            + (length == null ? "?" : Figures.fixed(length, 0))
            + " m at "
            + Figures.fixed(celsius, 0)
            + " °C";

    if (circuit.ringFinal()) {
      out.addAll(
          RingContinuity.grade(
              results.ringLineOhms(),
              results.ringNeutralOhms(),
              results.ringProtectiveOhms(),
              results.r1PlusR2Ohms(),
              line,
              cpc));
      Resolved<Double> loop =
          ContinuityLimits.expectedR1PlusR2Ohms(material, line, cpc, length, celsius)
              .map(endToEnd -> endToEnd / 4.0);
      out.add(
          ContinuityLimits.grade(
              "R1+R2", results.r1PlusR2Ohms(), loop, "ring of " + basis + ", quartered"));
      if (results.r1PlusR2Ohms() != null && line != null && cpc != null && length != null) {
        out.addAll(
            ContinuityLimits.recordMismatch(
                4 * results.r1PlusR2Ohms(), length, celsius, line, cpc));
      }
    } else {
      Resolved<Double> expected =
          ContinuityLimits.expectedR1PlusR2Ohms(material, line, cpc, length, celsius);
      out.add(ContinuityLimits.grade("R1+R2", results.r1PlusR2Ohms(), expected, basis));
      if (results.r2Ohms() != null) {
        out.add(
            ContinuityLimits.grade(
                "R2",
                results.r2Ohms(),
                ContinuityLimits.expectedConductorOhms(material, cpc, length, celsius),
                "cpc of " + basis));
      }
      if (results.r1PlusR2Ohms() != null && line != null && cpc != null && length != null) {
        out.addAll(
            ContinuityLimits.recordMismatch(results.r1PlusR2Ohms(), length, celsius, line, cpc));
      }
    }

    InsulationMinimum.VoltageBand band =
        InsulationMinimum.VoltageBand.ofNominalVolts(conditions.lineVoltageVolts());
    out.add(
        InsulationMinimum.grade(
            "IR L–L",
            results.insulationLineLineMegaohms(),
            band,
            conditions.insulationTestVolts()));
    out.add(
        InsulationMinimum.grade(
            "IR L–E",
            results.insulationLineEarthMegaohms(),
            band,
            conditions.insulationTestVolts()));
    out.add(
        InsulationMinimum.grade(
            "IR N–E",
            results.insulationNeutralEarthMegaohms(),
            band,
            conditions.insulationTestVolts()));
    out.add(YesNoTests.polarity(results.polarityCorrect()));

    Double residual = residualMilliAmpsOf(device);
    out.add(
        LoopImpedanceLimit.grade(
            results.loopImpedanceOhms(),
            conditions.earthing(),
            conditions.nominalVoltageToEarthVolts(),
            DeviceCharacteristic.of(
                device, null, ProtectionSettings.DEFAULT_MCCB_INSTANTANEOUS_MULTIPLE),
            residual,
            conditions.measuredLoopFraction(),
            conditions.minimumVoltageFactor(),
            conditions.touchVoltageLimitVolts()));

    if (residual != null) {
      out.add(RcdTimeLimits.atRated(results.rcdRatedMillis(), results.rcdDelayed()));
      if (results.rcdFiveTimesMillis() != null || residual <= 30) {
        out.add(RcdTimeLimits.atFiveTimes(results.rcdFiveTimesMillis(), results.rcdDelayed()));
      }
      out.add(YesNoTests.rcdButton(results.rcdButtonWorks()));
    } else if (results.rcdRatedMillis() != null || results.rcdFiveTimesMillis() != null) {
      out.add(
          new GradedValue(
              TestKind.RCD_TIME,
              "RCD",
              results.rcdRatedMillis() != null
                  ? results.rcdRatedMillis()
                  : results.rcdFiveTimesMillis(),
              "ms",
              null,
              "",
              Grade.FAIL,
              "an RCD time was measured but the schedule records no RCD or RCBO on this circuit:"
                  + " correct the schedule",
              RcdTimeLimits.SOURCE));
    }
    return out;
  }

  /** IΔn of the circuit's own residual-current device (RCD or RCBO), null when none. */
  public static Double residualMilliAmpsOf(DeviceSpec device) {
    if (device == null || (device.kind() != DeviceKind.RCD && device.kind() != DeviceKind.RCBO)) {
      return null;
    }
    return device.residualCurrentMilliAmps();
  }
}
