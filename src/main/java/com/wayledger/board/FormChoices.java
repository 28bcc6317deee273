package com.wayledger.board;

import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.InstallationMethod;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.RcdType;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.WayStatus;
import org.springframework.ui.Model;

/**
 * The closed vocabularies the board and circuit forms offer in their drop-downs, named once for
 * both.
 */
final class FormChoices {

  private FormChoices() {}

  /** Devices and cables: what the board form (incomer, submain) and the circuit editor share. */
  static void addDeviceAndCable(Model model) {
    model.addAttribute("deviceKinds", DeviceKind.values());
    model.addAttribute("tripCurves", TripCurve.values());
    model.addAttribute("rcdTypes", RcdType.values());
    model.addAttribute("faultInterrupters", com.wayledger.engine.FaultInterrupter.values());
    model.addAttribute("conduits", com.wayledger.engine.Conduit.values());
    model.addAttribute("materials", ConductorMaterial.values());
    model.addAttribute("insulations", Insulation.values());
    model.addAttribute("installationMethods", InstallationMethod.values());
    model.addAttribute(
        "necSizes",
        java.util.Arrays.stream(com.wayledger.engine.nec.ConductorSize.values())
            .map(com.wayledger.engine.nec.ConductorSize::label)
            .toList());
  }

  /** Everything the circuit editor offers: positions, states, devices, cables and loads. */
  static void addCircuit(Model model) {
    addDeviceAndCable(model);
    model.addAttribute("positions", PhasePosition.LINE_TO_NEUTRAL_OR_THREE_POLE);
    model.addAttribute("statuses", WayStatus.values());
    model.addAttribute("locations", com.wayledger.engine.CircuitLocation.values());
    model.addAttribute("categories", LoadCategory.values());
    model.addAttribute("ratingUnits", RatingUnit.values());
  }
}
