package com.wayledger.board;

import com.wayledger.engine.CableSpec;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.WayStatus;
import java.util.ArrayList;
import java.util.List;

/**
 * Every input of an in-use circuit that its checks still lack, all at once, named by the circuit
 * form's field so that the editor can mark each one beside its field. A value the board or site
 * supplies as a default is not missing. This lists the form's inputs only; the checks themselves
 * still say "not assessed" with their own reason for anything else (the supply's Ze, say).
 */
final class MissingInputs {

  private MissingInputs() {}

  /**
   * @param locationChecked whether a check of this circuit reads where its equipment is: every
   *     circuit under the IEC set (the 30 mA rules), circuits of dwelling panels under the NEC set
   *     (the GFCI and AFCI rules); see {@link #locationChecked(Board, boolean)}
   */
  static List<String> of(Circuit circuit, boolean locationChecked) {
    List<String> missing = new ArrayList<>();
    if (circuit.getStatus() != WayStatus.IN_USE) {
      return missing;
    }
    DeviceDetails device = circuit.getDevice();
    if (device == null || device.getKind() == null) {
      missing.add("deviceKind");
    } else {
      if (device.getRatingAmps() == null) {
        missing.add("deviceRatingAmps");
      }
      boolean curved = device.getKind() == DeviceKind.MCB || device.getKind() == DeviceKind.RCBO;
      if (curved && device.getCurve() == null) {
        missing.add("deviceCurve");
      }
      if (device.getBreakingCapacityKiloAmps() == null) {
        missing.add("deviceBreakingCapacityKiloAmps");
      }
    }
    CableSpec cable = Inheritance.effectiveCable(circuit.getCable(), circuit.getBoard());
    if (cable == null) {
      missing.add("cableLineCsa");
      missing.add("cableCpcCsa");
      missing.add("cableLengthMetres");
    } else {
      addIfNull(missing, cable.lineCsaSquareMillimetres(), "cableLineCsa");
      addIfNull(missing, cable.protectiveCsaSquareMillimetres(), "cableCpcCsa");
      addIfNull(missing, cable.lengthMetres(), "cableLengthMetres");
    }
    addIfNull(
        missing, cable == null ? null : cable.installationMethod(), "cableInstallationMethod");
    addIfNull(missing, cable == null ? null : cable.ambientCelsius(), "cableAmbientCelsius");
    addIfNull(missing, cable == null ? null : cable.groupedCircuits(), "cableGroupedCircuits");
    addIfNull(
        missing,
        cable == null ? null : cable.thermalInsulationMillimetres(),
        "cableThermalInsulationMm");
    if (locationChecked) {
      addIfNull(
          missing,
          Inheritance.effectiveLocation(circuit, circuit.getBoard()),
          Inheritance.LOCATION_FIELD);
    }
    if (circuit.getLoads().isEmpty()) {
      missing.add("loads");
    }
    return missing;
  }

  /** Whether the checks of circuits on this board read their location. */
  static boolean locationChecked(Board board, boolean dwellingPanel) {
    return com.wayledger.engine.SiteSpec.DEFAULT_RULE_SET_KEY.equals(board.getSite().getRuleSet())
        || dwellingPanel;
  }

  private static void addIfNull(List<String> missing, Object value, String field) {
    if (value == null) {
      missing.add(field);
    }
  }
}
