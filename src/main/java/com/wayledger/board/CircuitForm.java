package com.wayledger.board;

import com.wayledger.engine.CircuitLocation;
import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.Conduit;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.FaultInterrupter;
import com.wayledger.engine.InstallationMethod;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.RcdType;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.WayStatus;
import com.wayledger.system.CleanText;
import com.wayledger.system.TextInput.Kind;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.Size;

/**
 * A circuit row as typed on the schedule: position, device, cable and, when the circuit is new, an
 * optional first load so that a schedule can be typed one row per circuit.
 */
public record CircuitForm(
    @NotNull @Min(1) @Max(96) Integer wayNumber,
    @NotNull PhasePosition position,
    @NotBlank @Size(max = 120) @CleanText(Kind.NAME) String description,
    @NotNull WayStatus status,
    Boolean lockedForBalancing,
    DeviceKind deviceKind,
    TripCurve deviceCurve,
    @Positive @DecimalMax("6300") Double deviceRatingAmps,
    @Min(1) @Max(4) Integer devicePoles,
    @Positive @DecimalMax("200") Double deviceBreakingCapacityKiloAmps,
    @Positive @DecimalMax("3000") Double deviceResidualMilliAmps,
    RcdType deviceRcdType,
    @Positive @DecimalMax("630") Double cableLineCsa,
    @Positive @DecimalMax("630") Double cableCpcCsa,
    ConductorMaterial cableMaterial,
    Insulation cableInsulation,
    @Positive @DecimalMax("5000") Double cableLengthMetres,
    InstallationMethod cableInstallationMethod,
    @DecimalMin("-30") @DecimalMax("90") Double cableAmbientCelsius,
    @Min(1) @Max(100) Integer cableGroupedCircuits,
    @Min(0) @Max(100000) Integer cableThermalInsulationMm,
    @Positive @DecimalMax("100") Double measuredLoopImpedanceOhms,
    @Size(max = 120) @CleanText(Kind.LINE) String loadDescription,
    LoadCategory loadCategory,
    @Min(1) @Max(10000) Integer loadQuantity,
    @Positive @DecimalMax("10000000") Double loadRatingValue,
    RatingUnit loadRatingUnit,
    @DecimalMin(value = "0", inclusive = false) @DecimalMax("1") Double loadPowerFactor,
    Long version,
    Boolean ringFinal,
    @Positive @DecimalMax("63000") Double deviceOverloadSettingAmps,
    @Positive @DecimalMax("63000") Double deviceInstantaneousSettingAmps,
    @DecimalMin("1") @DecimalMax("50") Double loadStartUpMultiple,
    CircuitLocation location,
    FaultInterrupter deviceFaultInterrupter,
    @Size(max = 40) String cableLineSize,
    @Size(max = 40) String cableCpcSize,
    @Positive @DecimalMax("16405") Double cableLengthFeet,
    Conduit cableConduit) {

  /** A row whose conduit is not recorded: the argument list from before conduits. */
  public CircuitForm(
      Integer wayNumber,
      PhasePosition position,
      String description,
      WayStatus status,
      Boolean lockedForBalancing,
      DeviceKind deviceKind,
      TripCurve deviceCurve,
      Double deviceRatingAmps,
      Integer devicePoles,
      Double deviceBreakingCapacityKiloAmps,
      Double deviceResidualMilliAmps,
      RcdType deviceRcdType,
      Double cableLineCsa,
      Double cableCpcCsa,
      ConductorMaterial cableMaterial,
      Insulation cableInsulation,
      Double cableLengthMetres,
      InstallationMethod cableInstallationMethod,
      Double cableAmbientCelsius,
      Integer cableGroupedCircuits,
      Integer cableThermalInsulationMm,
      Double measuredLoopImpedanceOhms,
      String loadDescription,
      LoadCategory loadCategory,
      Integer loadQuantity,
      Double loadRatingValue,
      RatingUnit loadRatingUnit,
      Double loadPowerFactor,
      Long version,
      Boolean ringFinal,
      Double deviceOverloadSettingAmps,
      Double deviceInstantaneousSettingAmps,
      Double loadStartUpMultiple,
      CircuitLocation location,
      FaultInterrupter deviceFaultInterrupter,
      String cableLineSize,
      String cableCpcSize,
      Double cableLengthFeet) {
    this(
        wayNumber,
        position,
        description,
        status,
        lockedForBalancing,
        deviceKind,
        deviceCurve,
        deviceRatingAmps,
        devicePoles,
        deviceBreakingCapacityKiloAmps,
        deviceResidualMilliAmps,
        deviceRcdType,
        cableLineCsa,
        cableCpcCsa,
        cableMaterial,
        cableInsulation,
        cableLengthMetres,
        cableInstallationMethod,
        cableAmbientCelsius,
        cableGroupedCircuits,
        cableThermalInsulationMm,
        measuredLoopImpedanceOhms,
        loadDescription,
        loadCategory,
        loadQuantity,
        loadRatingValue,
        loadRatingUnit,
        loadPowerFactor,
        version,
        ringFinal,
        deviceOverloadSettingAmps,
        deviceInstantaneousSettingAmps,
        loadStartUpMultiple,
        location,
        deviceFaultInterrupter,
        cableLineSize,
        cableCpcSize,
        cableLengthFeet,
        null);
  }

  /** The same row with the conduit its cable runs in (NEC; null: not recorded). */
  public CircuitForm withCableConduit(Conduit conduit) {
    return new CircuitForm(
        wayNumber,
        position,
        description,
        status,
        lockedForBalancing,
        deviceKind,
        deviceCurve,
        deviceRatingAmps,
        devicePoles,
        deviceBreakingCapacityKiloAmps,
        deviceResidualMilliAmps,
        deviceRcdType,
        cableLineCsa,
        cableCpcCsa,
        cableMaterial,
        cableInsulation,
        cableLengthMetres,
        cableInstallationMethod,
        cableAmbientCelsius,
        cableGroupedCircuits,
        cableThermalInsulationMm,
        measuredLoopImpedanceOhms,
        loadDescription,
        loadCategory,
        loadQuantity,
        loadRatingValue,
        loadRatingUnit,
        loadPowerFactor,
        version,
        ringFinal,
        deviceOverloadSettingAmps,
        deviceInstantaneousSettingAmps,
        loadStartUpMultiple,
        location,
        deviceFaultInterrupter,
        cableLineSize,
        cableCpcSize,
        cableLengthFeet,
        conduit);
  }

  /**
   * A row in stored units only (mm², metres). {@code cableLineSize}, {@code cableCpcSize} (AWG or
   * kcmil, "12 AWG") and {@code cableLengthFeet} carry what a person on an AWG-and-feet site typed
   * or reads; {@link CableUnitsOfForms} turns them into the stored fields and back.
   */
  public CircuitForm(
      Integer wayNumber,
      PhasePosition position,
      String description,
      WayStatus status,
      Boolean lockedForBalancing,
      DeviceKind deviceKind,
      TripCurve deviceCurve,
      Double deviceRatingAmps,
      Integer devicePoles,
      Double deviceBreakingCapacityKiloAmps,
      Double deviceResidualMilliAmps,
      RcdType deviceRcdType,
      Double cableLineCsa,
      Double cableCpcCsa,
      ConductorMaterial cableMaterial,
      Insulation cableInsulation,
      Double cableLengthMetres,
      InstallationMethod cableInstallationMethod,
      Double cableAmbientCelsius,
      Integer cableGroupedCircuits,
      Integer cableThermalInsulationMm,
      Double measuredLoopImpedanceOhms,
      String loadDescription,
      LoadCategory loadCategory,
      Integer loadQuantity,
      Double loadRatingValue,
      RatingUnit loadRatingUnit,
      Double loadPowerFactor,
      Long version,
      Boolean ringFinal,
      Double deviceOverloadSettingAmps,
      Double deviceInstantaneousSettingAmps,
      Double loadStartUpMultiple,
      CircuitLocation location,
      FaultInterrupter deviceFaultInterrupter) {
    this(
        wayNumber,
        position,
        description,
        status,
        lockedForBalancing,
        deviceKind,
        deviceCurve,
        deviceRatingAmps,
        devicePoles,
        deviceBreakingCapacityKiloAmps,
        deviceResidualMilliAmps,
        deviceRcdType,
        cableLineCsa,
        cableCpcCsa,
        cableMaterial,
        cableInsulation,
        cableLengthMetres,
        cableInstallationMethod,
        cableAmbientCelsius,
        cableGroupedCircuits,
        cableThermalInsulationMm,
        measuredLoopImpedanceOhms,
        loadDescription,
        loadCategory,
        loadQuantity,
        loadRatingValue,
        loadRatingUnit,
        loadPowerFactor,
        version,
        ringFinal,
        deviceOverloadSettingAmps,
        deviceInstantaneousSettingAmps,
        loadStartUpMultiple,
        location,
        deviceFaultInterrupter,
        null,
        null,
        null);
  }

  /**
   * The same row with its cable's sizes and length replaced: stored values (mm², m) and the values
   * in site units (AWG label, ft), any of them null.
   */
  public CircuitForm withCableUnits(
      Double lineCsa,
      Double cpcCsa,
      Double lengthMetres,
      String lineSize,
      String cpcSize,
      Double lengthFeet) {
    return new CircuitForm(
            wayNumber,
            position,
            description,
            status,
            lockedForBalancing,
            deviceKind,
            deviceCurve,
            deviceRatingAmps,
            devicePoles,
            deviceBreakingCapacityKiloAmps,
            deviceResidualMilliAmps,
            deviceRcdType,
            lineCsa,
            cpcCsa,
            cableMaterial,
            cableInsulation,
            lengthMetres,
            cableInstallationMethod,
            cableAmbientCelsius,
            cableGroupedCircuits,
            cableThermalInsulationMm,
            measuredLoopImpedanceOhms,
            loadDescription,
            loadCategory,
            loadQuantity,
            loadRatingValue,
            loadRatingUnit,
            loadPowerFactor,
            version,
            ringFinal,
            deviceOverloadSettingAmps,
            deviceInstantaneousSettingAmps,
            loadStartUpMultiple,
            location,
            deviceFaultInterrupter,
            lineSize,
            cpcSize,
            lengthFeet)
        .withCableConduit(cableConduit);
  }

  /** A row whose device has no GFCI/AFCI function: the argument list from before NEC devices. */
  public CircuitForm(
      Integer wayNumber,
      PhasePosition position,
      String description,
      WayStatus status,
      Boolean lockedForBalancing,
      DeviceKind deviceKind,
      TripCurve deviceCurve,
      Double deviceRatingAmps,
      Integer devicePoles,
      Double deviceBreakingCapacityKiloAmps,
      Double deviceResidualMilliAmps,
      RcdType deviceRcdType,
      Double cableLineCsa,
      Double cableCpcCsa,
      ConductorMaterial cableMaterial,
      Insulation cableInsulation,
      Double cableLengthMetres,
      InstallationMethod cableInstallationMethod,
      Double cableAmbientCelsius,
      Integer cableGroupedCircuits,
      Integer cableThermalInsulationMm,
      Double measuredLoopImpedanceOhms,
      String loadDescription,
      LoadCategory loadCategory,
      Integer loadQuantity,
      Double loadRatingValue,
      RatingUnit loadRatingUnit,
      Double loadPowerFactor,
      Long version,
      Boolean ringFinal,
      Double deviceOverloadSettingAmps,
      Double deviceInstantaneousSettingAmps,
      Double loadStartUpMultiple,
      CircuitLocation location) {
    this(
        wayNumber,
        position,
        description,
        status,
        lockedForBalancing,
        deviceKind,
        deviceCurve,
        deviceRatingAmps,
        devicePoles,
        deviceBreakingCapacityKiloAmps,
        deviceResidualMilliAmps,
        deviceRcdType,
        cableLineCsa,
        cableCpcCsa,
        cableMaterial,
        cableInsulation,
        cableLengthMetres,
        cableInstallationMethod,
        cableAmbientCelsius,
        cableGroupedCircuits,
        cableThermalInsulationMm,
        measuredLoopImpedanceOhms,
        loadDescription,
        loadCategory,
        loadQuantity,
        loadRatingValue,
        loadRatingUnit,
        loadPowerFactor,
        version,
        ringFinal,
        deviceOverloadSettingAmps,
        deviceInstantaneousSettingAmps,
        loadStartUpMultiple,
        location,
        null);
  }

  /** A row whose location is not recorded: the argument list from before locations. */
  public CircuitForm(
      Integer wayNumber,
      PhasePosition position,
      String description,
      WayStatus status,
      Boolean lockedForBalancing,
      DeviceKind deviceKind,
      TripCurve deviceCurve,
      Double deviceRatingAmps,
      Integer devicePoles,
      Double deviceBreakingCapacityKiloAmps,
      Double deviceResidualMilliAmps,
      RcdType deviceRcdType,
      Double cableLineCsa,
      Double cableCpcCsa,
      ConductorMaterial cableMaterial,
      Insulation cableInsulation,
      Double cableLengthMetres,
      InstallationMethod cableInstallationMethod,
      Double cableAmbientCelsius,
      Integer cableGroupedCircuits,
      Integer cableThermalInsulationMm,
      Double measuredLoopImpedanceOhms,
      String loadDescription,
      LoadCategory loadCategory,
      Integer loadQuantity,
      Double loadRatingValue,
      RatingUnit loadRatingUnit,
      Double loadPowerFactor,
      Long version,
      Boolean ringFinal,
      Double deviceOverloadSettingAmps,
      Double deviceInstantaneousSettingAmps,
      Double loadStartUpMultiple) {
    this(
        wayNumber,
        position,
        description,
        status,
        lockedForBalancing,
        deviceKind,
        deviceCurve,
        deviceRatingAmps,
        devicePoles,
        deviceBreakingCapacityKiloAmps,
        deviceResidualMilliAmps,
        deviceRcdType,
        cableLineCsa,
        cableCpcCsa,
        cableMaterial,
        cableInsulation,
        cableLengthMetres,
        cableInstallationMethod,
        cableAmbientCelsius,
        cableGroupedCircuits,
        cableThermalInsulationMm,
        measuredLoopImpedanceOhms,
        loadDescription,
        loadCategory,
        loadQuantity,
        loadRatingValue,
        loadRatingUnit,
        loadPowerFactor,
        version,
        ringFinal,
        deviceOverloadSettingAmps,
        deviceInstantaneousSettingAmps,
        loadStartUpMultiple,
        null);
  }

  /** The same row at a location (null: not recorded). */
  public CircuitForm at(CircuitLocation where) {
    return new CircuitForm(
            wayNumber,
            position,
            description,
            status,
            lockedForBalancing,
            deviceKind,
            deviceCurve,
            deviceRatingAmps,
            devicePoles,
            deviceBreakingCapacityKiloAmps,
            deviceResidualMilliAmps,
            deviceRcdType,
            cableLineCsa,
            cableCpcCsa,
            cableMaterial,
            cableInsulation,
            cableLengthMetres,
            cableInstallationMethod,
            cableAmbientCelsius,
            cableGroupedCircuits,
            cableThermalInsulationMm,
            measuredLoopImpedanceOhms,
            loadDescription,
            loadCategory,
            loadQuantity,
            loadRatingValue,
            loadRatingUnit,
            loadPowerFactor,
            version,
            ringFinal,
            deviceOverloadSettingAmps,
            deviceInstantaneousSettingAmps,
            loadStartUpMultiple,
            where,
            deviceFaultInterrupter)
        .withCableConduit(cableConduit);
  }

  /** The same row on another way (on a panelboard: with its top pole on another space). */
  public CircuitForm onWay(int way) {
    return new CircuitForm(
            way,
            position,
            description,
            status,
            lockedForBalancing,
            deviceKind,
            deviceCurve,
            deviceRatingAmps,
            devicePoles,
            deviceBreakingCapacityKiloAmps,
            deviceResidualMilliAmps,
            deviceRcdType,
            cableLineCsa,
            cableCpcCsa,
            cableMaterial,
            cableInsulation,
            cableLengthMetres,
            cableInstallationMethod,
            cableAmbientCelsius,
            cableGroupedCircuits,
            cableThermalInsulationMm,
            measuredLoopImpedanceOhms,
            loadDescription,
            loadCategory,
            loadQuantity,
            loadRatingValue,
            loadRatingUnit,
            loadPowerFactor,
            version,
            ringFinal,
            deviceOverloadSettingAmps,
            deviceInstantaneousSettingAmps,
            loadStartUpMultiple,
            location,
            deviceFaultInterrupter)
        .withCableConduit(cableConduit);
  }

  /** A row without a start-up multiple for its first load: the argument list from before. */
  public CircuitForm(
      Integer wayNumber,
      PhasePosition position,
      String description,
      WayStatus status,
      Boolean lockedForBalancing,
      DeviceKind deviceKind,
      TripCurve deviceCurve,
      Double deviceRatingAmps,
      Integer devicePoles,
      Double deviceBreakingCapacityKiloAmps,
      Double deviceResidualMilliAmps,
      RcdType deviceRcdType,
      Double cableLineCsa,
      Double cableCpcCsa,
      ConductorMaterial cableMaterial,
      Insulation cableInsulation,
      Double cableLengthMetres,
      InstallationMethod cableInstallationMethod,
      Double cableAmbientCelsius,
      Integer cableGroupedCircuits,
      Integer cableThermalInsulationMm,
      Double measuredLoopImpedanceOhms,
      String loadDescription,
      LoadCategory loadCategory,
      Integer loadQuantity,
      Double loadRatingValue,
      RatingUnit loadRatingUnit,
      Double loadPowerFactor,
      Long version,
      Boolean ringFinal,
      Double deviceOverloadSettingAmps,
      Double deviceInstantaneousSettingAmps) {
    this(
        wayNumber,
        position,
        description,
        status,
        lockedForBalancing,
        deviceKind,
        deviceCurve,
        deviceRatingAmps,
        devicePoles,
        deviceBreakingCapacityKiloAmps,
        deviceResidualMilliAmps,
        deviceRcdType,
        cableLineCsa,
        cableCpcCsa,
        cableMaterial,
        cableInsulation,
        cableLengthMetres,
        cableInstallationMethod,
        cableAmbientCelsius,
        cableGroupedCircuits,
        cableThermalInsulationMm,
        measuredLoopImpedanceOhms,
        loadDescription,
        loadCategory,
        loadQuantity,
        loadRatingValue,
        loadRatingUnit,
        loadPowerFactor,
        version,
        ringFinal,
        deviceOverloadSettingAmps,
        deviceInstantaneousSettingAmps,
        null);
  }

  /**
   * A radial circuit (not a ring final circuit): the argument list from before rings were recorded.
   */
  public CircuitForm(
      Integer wayNumber,
      PhasePosition position,
      String description,
      WayStatus status,
      Boolean lockedForBalancing,
      DeviceKind deviceKind,
      TripCurve deviceCurve,
      Double deviceRatingAmps,
      Integer devicePoles,
      Double deviceBreakingCapacityKiloAmps,
      Double deviceResidualMilliAmps,
      RcdType deviceRcdType,
      Double cableLineCsa,
      Double cableCpcCsa,
      ConductorMaterial cableMaterial,
      Insulation cableInsulation,
      Double cableLengthMetres,
      InstallationMethod cableInstallationMethod,
      Double cableAmbientCelsius,
      Integer cableGroupedCircuits,
      Integer cableThermalInsulationMm,
      Double measuredLoopImpedanceOhms,
      String loadDescription,
      LoadCategory loadCategory,
      Integer loadQuantity,
      Double loadRatingValue,
      RatingUnit loadRatingUnit,
      Double loadPowerFactor,
      Long version) {
    this(
        wayNumber,
        position,
        description,
        status,
        lockedForBalancing,
        deviceKind,
        deviceCurve,
        deviceRatingAmps,
        devicePoles,
        deviceBreakingCapacityKiloAmps,
        deviceResidualMilliAmps,
        deviceRcdType,
        cableLineCsa,
        cableCpcCsa,
        cableMaterial,
        cableInsulation,
        cableLengthMetres,
        cableInstallationMethod,
        cableAmbientCelsius,
        cableGroupedCircuits,
        cableThermalInsulationMm,
        measuredLoopImpedanceOhms,
        loadDescription,
        loadCategory,
        loadQuantity,
        loadRatingValue,
        loadRatingUnit,
        loadPowerFactor,
        version,
        false,
        null,
        null);
  }

  /** The same row marked as a ring final circuit or not. */
  public CircuitForm withRingFinal(boolean ring) {
    return copy(
        cableThermalInsulationMm, ring, deviceOverloadSettingAmps, deviceInstantaneousSettingAmps);
  }

  /** The same row with moulded-case breaker settings Ir and Ii (A; null when not recorded). */
  public CircuitForm withMccbSettings(Double overloadSettingAmps, Double instantaneousSettingAmps) {
    return copy(cableThermalInsulationMm, ringFinal, overloadSettingAmps, instantaneousSettingAmps);
  }

  /**
   * The same row with this conductor material and insulation (null: inherit the board's or site's
   * default).
   */
  public CircuitForm withConductor(ConductorMaterial material, Insulation insulation) {
    return new CircuitForm(
            wayNumber,
            position,
            description,
            status,
            lockedForBalancing,
            deviceKind,
            deviceCurve,
            deviceRatingAmps,
            devicePoles,
            deviceBreakingCapacityKiloAmps,
            deviceResidualMilliAmps,
            deviceRcdType,
            cableLineCsa,
            cableCpcCsa,
            material,
            insulation,
            cableLengthMetres,
            cableInstallationMethod,
            cableAmbientCelsius,
            cableGroupedCircuits,
            cableThermalInsulationMm,
            measuredLoopImpedanceOhms,
            loadDescription,
            loadCategory,
            loadQuantity,
            loadRatingValue,
            loadRatingUnit,
            loadPowerFactor,
            version,
            ringFinal,
            deviceOverloadSettingAmps,
            deviceInstantaneousSettingAmps,
            loadStartUpMultiple,
            location,
            deviceFaultInterrupter,
            cableLineSize,
            cableCpcSize,
            cableLengthFeet)
        .withCableConduit(cableConduit);
  }

  /** The same row with this length of its cable surrounded by thermal insulation, mm. */
  public CircuitForm withThermalInsulationMm(Integer millimetres) {
    return copy(millimetres, ringFinal, deviceOverloadSettingAmps, deviceInstantaneousSettingAmps);
  }

  /**
   * The circuit put in use under a new description. A replacement device, when given, also replaces
   * the moulded-case breaker settings (which belonged to the old device); without one the device is
   * kept whole.
   */
  public CircuitForm inUseAs(String newDescription, com.wayledger.engine.DeviceSpec replacement) {
    if (replacement == null) {
      return copy(
          newDescription,
          WayStatus.IN_USE,
          deviceDetails(),
          deviceOverloadSettingAmps,
          deviceInstantaneousSettingAmps,
          null,
          null,
          null,
          null,
          null,
          null,
          deviceFaultInterrupter);
    }
    return copy(
        newDescription,
        WayStatus.IN_USE,
        DeviceDetails.fromSpec(replacement),
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        replacement.faultInterrupter());
  }

  private CircuitForm copy(
      String newDescription,
      WayStatus newStatus,
      DeviceDetails device,
      Double overloadSettingAmps,
      Double instantaneousSettingAmps,
      String firstLoadDescription,
      LoadCategory firstLoadCategory,
      Integer firstLoadQuantity,
      Double firstLoadRatingValue,
      RatingUnit firstLoadRatingUnit,
      Double firstLoadPowerFactor,
      FaultInterrupter function) {
    boolean hasDevice = device != null;
    return new CircuitForm(
            wayNumber,
            position,
            newDescription,
            newStatus,
            lockedForBalancing,
            hasDevice ? device.getKind() : null,
            hasDevice ? device.getCurve() : null,
            hasDevice ? device.getRatingAmps() : null,
            hasDevice ? device.getPoles() : null,
            hasDevice ? device.getBreakingCapacityKiloAmps() : null,
            hasDevice ? device.getResidualMilliAmps() : null,
            hasDevice ? device.getRcdType() : null,
            cableLineCsa,
            cableCpcCsa,
            cableMaterial,
            cableInsulation,
            cableLengthMetres,
            cableInstallationMethod,
            cableAmbientCelsius,
            cableGroupedCircuits,
            cableThermalInsulationMm,
            measuredLoopImpedanceOhms,
            firstLoadDescription,
            firstLoadCategory,
            firstLoadQuantity,
            firstLoadRatingValue,
            firstLoadRatingUnit,
            firstLoadPowerFactor,
            version,
            ringFinal,
            overloadSettingAmps,
            instantaneousSettingAmps,
            null,
            location,
            function,
            cableLineSize,
            cableCpcSize,
            cableLengthFeet)
        .withCableConduit(cableConduit);
  }

  /**
   * The same row with this location and fault interrupter (an import keeps the stored ones when its
   * file has no such column).
   */
  public CircuitForm withLocationAndFaultInterrupter(
      CircuitLocation newLocation, FaultInterrupter newFaultInterrupter) {
    return new CircuitForm(
        wayNumber,
        position,
        description,
        status,
        lockedForBalancing,
        deviceKind,
        deviceCurve,
        deviceRatingAmps,
        devicePoles,
        deviceBreakingCapacityKiloAmps,
        deviceResidualMilliAmps,
        deviceRcdType,
        cableLineCsa,
        cableCpcCsa,
        cableMaterial,
        cableInsulation,
        cableLengthMetres,
        cableInstallationMethod,
        cableAmbientCelsius,
        cableGroupedCircuits,
        cableThermalInsulationMm,
        measuredLoopImpedanceOhms,
        loadDescription,
        loadCategory,
        loadQuantity,
        loadRatingValue,
        loadRatingUnit,
        loadPowerFactor,
        version,
        ringFinal,
        deviceOverloadSettingAmps,
        deviceInstantaneousSettingAmps,
        loadStartUpMultiple,
        newLocation,
        newFaultInterrupter,
        cableLineSize,
        cableCpcSize,
        cableLengthFeet);
  }

  /** The one place the withers copy the whole row, with the fields they may change. */
  private CircuitForm copy(
      Integer thermalInsulationMm,
      Boolean ring,
      Double overloadSettingAmps,
      Double instantaneousSettingAmps) {
    return new CircuitForm(
            wayNumber,
            position,
            description,
            status,
            lockedForBalancing,
            deviceKind,
            deviceCurve,
            deviceRatingAmps,
            devicePoles,
            deviceBreakingCapacityKiloAmps,
            deviceResidualMilliAmps,
            deviceRcdType,
            cableLineCsa,
            cableCpcCsa,
            cableMaterial,
            cableInsulation,
            cableLengthMetres,
            cableInstallationMethod,
            cableAmbientCelsius,
            cableGroupedCircuits,
            thermalInsulationMm,
            measuredLoopImpedanceOhms,
            loadDescription,
            loadCategory,
            loadQuantity,
            loadRatingValue,
            loadRatingUnit,
            loadPowerFactor,
            version,
            ring,
            overloadSettingAmps,
            instantaneousSettingAmps,
            loadStartUpMultiple,
            location,
            deviceFaultInterrupter,
            cableLineSize,
            cableCpcSize,
            cableLengthFeet)
        .withCableConduit(cableConduit);
  }

  /**
   * A new in-use circuit at a position, with a type B MCB, copper 70 °C cable and a blank first
   * load.
   */
  public static CircuitForm blankAt(int wayNumber, PhasePosition position) {
    return new CircuitForm(
        wayNumber,
        position,
        "",
        WayStatus.IN_USE,
        false,
        DeviceKind.MCB,
        TripCurve.B,
        null,
        null,
        6.0,
        null,
        null,
        null,
        null,
        ConductorMaterial.COPPER,
        Insulation.THERMOPLASTIC_70,
        null,
        null,
        null,
        null,
        null,
        null,
        "",
        LoadCategory.SOCKET_OUTLETS,
        1,
        null,
        RatingUnit.W,
        1.0,
        null);
  }

  public static CircuitForm of(Circuit circuit) {
    DeviceDetails device = circuit.getDevice();
    CableDetails cable = circuit.getCable();
    boolean hasDevice = device != null;
    boolean hasCable = cable != null;
    return new CircuitForm(
            circuit.getWayNumber(),
            circuit.getPosition(),
            circuit.getDescription(),
            circuit.getStatus(),
            circuit.isLockedForBalancing(),
            hasDevice ? device.getKind() : null,
            hasDevice ? device.getCurve() : null,
            hasDevice ? device.getRatingAmps() : null,
            hasDevice ? device.getPoles() : null,
            hasDevice ? device.getBreakingCapacityKiloAmps() : null,
            hasDevice ? device.getResidualMilliAmps() : null,
            hasDevice ? device.getRcdType() : null,
            hasCable ? cable.getLineCsaSquareMillimetres() : null,
            hasCable ? cable.getProtectiveCsaSquareMillimetres() : null,
            hasCable ? cable.getMaterial() : null,
            hasCable ? cable.getInsulation() : null,
            hasCable ? cable.getLengthMetres() : null,
            hasCable ? cable.getInstallationMethod() : null,
            hasCable ? cable.getAmbientCelsius() : null,
            hasCable ? cable.getGroupedCircuits() : null,
            hasCable ? cable.getThermalInsulationMillimetres() : null,
            circuit.getMeasuredLoopImpedanceOhms(),
            null,
            null,
            null,
            null,
            null,
            null,
            circuit.getVersion(),
            circuit.isRingFinal(),
            hasDevice ? device.getOverloadSettingAmps() : null,
            hasDevice ? device.getInstantaneousSettingAmps() : null,
            null,
            circuit.getLocation(),
            circuit.getFaultInterrupter())
        .withCableConduit(circuit.getConduit());
  }

  DeviceDetails deviceDetails() {
    if (deviceKind == null) {
      return null;
    }
    return new DeviceDetails(
        deviceKind,
        deviceCurve,
        deviceRatingAmps,
        devicePoles,
        deviceBreakingCapacityKiloAmps,
        deviceResidualMilliAmps,
        deviceRcdType,
        deviceOverloadSettingAmps,
        deviceInstantaneousSettingAmps);
  }

  CableDetails cableDetails() {
    return new CableDetails(
        cableLineCsa,
        cableCpcCsa,
        cableMaterial,
        cableInsulation,
        cableLengthMetres,
        cableInstallationMethod,
        cableAmbientCelsius,
        cableGroupedCircuits,
        cableThermalInsulationMm);
  }

  /** Fields that say nothing about the stored row: the edit's version and the first load. */
  private static final java.util.Set<String> NOT_THE_ROW =
      java.util.Set.of(
          "version",
          "loadDescription",
          "loadCategory",
          "loadQuantity",
          "loadRatingValue",
          "loadRatingUnit",
          "loadPowerFactor",
          "loadStartUpMultiple");

  /**
   * Whether {@code other} would store the same row as this one (blank text and an unticked box
   * count as nothing), so that a save which changes nothing records nothing.
   */
  boolean sameRowAs(CircuitForm other) {
    return changedFields(other).isEmpty();
  }

  /**
   * The row's fields that differ in {@code other}, blank text and unticked boxes counting as none.
   */
  public java.util.List<com.wayledger.system.RecordDiff.FieldChange> changedFields(
      CircuitForm other) {
    return com.wayledger.system.RecordDiff.between(other, this, NOT_THE_ROW).stream()
        .filter(change -> !(isUnset(change.yours()) && isUnset(change.theirs())))
        .toList();
  }

  private static boolean isUnset(Object value) {
    return value == null || Boolean.FALSE.equals(value);
  }

  /** Whether the user started typing a first load (any of its value fields filled). */
  boolean hasFirstLoad() {
    return (loadDescription != null && !loadDescription.isBlank()) || loadRatingValue != null;
  }

  /** The first load as a load form; its fields are checked by the same rules as any load. */
  LoadForm firstLoad() {
    return new LoadForm(
        loadDescription == null || loadDescription.isBlank() ? description : loadDescription,
        loadCategory,
        loadQuantity == null ? 1 : loadQuantity,
        loadRatingValue,
        loadRatingUnit,
        loadPowerFactor,
        loadStartUpMultiple,
        null,
        false);
  }

  /** The device as the trade writes it ("MCB B6", "Fuse 32 A"); empty when none is recorded. */
  public String deviceLabel() {
    return DeviceDetails.describe(
        deviceKind, deviceCurve, deviceRatingAmps, deviceResidualMilliAmps);
  }

  /** The cable as short text ("2.5 mm² 18 m"); empty when none is recorded. */
  public String cableLabel() {
    return cableLabel(com.wayledger.engine.rules.CableUnits.METRIC);
  }

  /** The stored cable as short text in a site's units ("12 AWG 50 ft"). */
  public String cableLabel(com.wayledger.engine.rules.CableUnits units) {
    return CableDetails.describe(cableLineCsa, null, cableLengthMetres, units);
  }
}
