package com.wayledger.board;

import com.wayledger.engine.ConductorMaterial;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.InstallationMethod;
import com.wayledger.engine.Insulation;
import com.wayledger.engine.RcdType;
import com.wayledger.engine.SupplySystem;
import com.wayledger.engine.TripCurve;
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

/** What a user may edit on a board. */
public record BoardForm(
    @NotBlank @Size(max = 40) @CleanText(Kind.NAME) String reference,
    @Size(max = 200) @CleanText(Kind.LINE) String location,
    @NotNull Integer phases,
    @NotNull @Min(1) @Max(96) Integer wayCount,
    @Positive @DecimalMax("6300") Double busbarRatingAmps,
    DeviceKind incomerKind,
    TripCurve incomerCurve,
    @Positive @DecimalMax("6300") Double incomerRatingAmps,
    @Min(1) @Max(4) Integer incomerPoles,
    @Positive @DecimalMax("200") Double incomerBreakingCapacityKiloAmps,
    @Positive @DecimalMax("3000") Double incomerResidualMilliAmps,
    RcdType incomerRcdType,
    Long parentBoardId,
    Long fedFromCircuitId,
    @Positive @DecimalMax("630") Double submainLineCsa,
    @Positive @DecimalMax("630") Double submainCpcCsa,
    ConductorMaterial submainMaterial,
    Insulation submainInsulation,
    @Positive @DecimalMax("5000") Double submainLengthMetres,
    InstallationMethod submainInstallationMethod,
    @DecimalMin("-30") @DecimalMax("90") Double submainAmbientCelsius,
    @Min(1) @Max(100) Integer submainGroupedCircuits,
    @Min(0) @Max(100000) Integer submainThermalInsulationMm,
    @NotNull @DecimalMin(value = "0", inclusive = false) @DecimalMax("100")
        Double unbalanceLimitPercent,
    @NotNull @DecimalMin(value = "0", inclusive = false) @DecimalMax("1") Double coincidenceFactor,
    @Size(max = 60) @CleanText(Kind.LINE) String diversityMethod,
    @Positive @DecimalMax("100") Double measuredExternalLoopImpedanceOhms,
    @Positive @DecimalMax("200") Double measuredFaultCurrentKiloAmps,
    Long version,
    @Positive @DecimalMax("63000") Double incomerOverloadSettingAmps,
    @Positive @DecimalMax("63000") Double incomerInstantaneousSettingAmps,
    @Size(max = 40) String submainLineSize,
    @Size(max = 40) String submainCpcSize,
    @Positive @DecimalMax("16405") Double submainLengthFeet,
    SupplySystem supplySystem) {

  /** A board on its site's supply system: the argument list from before boards had their own. */
  public BoardForm(
      String reference,
      String location,
      Integer phases,
      Integer wayCount,
      Double busbarRatingAmps,
      DeviceKind incomerKind,
      TripCurve incomerCurve,
      Double incomerRatingAmps,
      Integer incomerPoles,
      Double incomerBreakingCapacityKiloAmps,
      Double incomerResidualMilliAmps,
      RcdType incomerRcdType,
      Long parentBoardId,
      Long fedFromCircuitId,
      Double submainLineCsa,
      Double submainCpcCsa,
      ConductorMaterial submainMaterial,
      Insulation submainInsulation,
      Double submainLengthMetres,
      InstallationMethod submainInstallationMethod,
      Double submainAmbientCelsius,
      Integer submainGroupedCircuits,
      Integer submainThermalInsulationMm,
      Double unbalanceLimitPercent,
      Double coincidenceFactor,
      String diversityMethod,
      Double measuredExternalLoopImpedanceOhms,
      Double measuredFaultCurrentKiloAmps,
      Long version,
      Double incomerOverloadSettingAmps,
      Double incomerInstantaneousSettingAmps,
      String submainLineSize,
      String submainCpcSize,
      Double submainLengthFeet) {
    this(
        reference,
        location,
        phases,
        wayCount,
        busbarRatingAmps,
        incomerKind,
        incomerCurve,
        incomerRatingAmps,
        incomerPoles,
        incomerBreakingCapacityKiloAmps,
        incomerResidualMilliAmps,
        incomerRcdType,
        parentBoardId,
        fedFromCircuitId,
        submainLineCsa,
        submainCpcCsa,
        submainMaterial,
        submainInsulation,
        submainLengthMetres,
        submainInstallationMethod,
        submainAmbientCelsius,
        submainGroupedCircuits,
        submainThermalInsulationMm,
        unbalanceLimitPercent,
        coincidenceFactor,
        diversityMethod,
        measuredExternalLoopImpedanceOhms,
        measuredFaultCurrentKiloAmps,
        version,
        incomerOverloadSettingAmps,
        incomerInstantaneousSettingAmps,
        submainLineSize,
        submainCpcSize,
        submainLengthFeet,
        null);
  }

  /**
   * A board in stored units only (mm², metres). {@code submainLineSize}, {@code submainCpcSize}
   * (AWG or kcmil) and {@code submainLengthFeet} carry what a person on an AWG-and-feet site typed
   * or reads; {@link CableUnitsOfForms} turns them into the stored fields and back.
   */
  public BoardForm(
      String reference,
      String location,
      Integer phases,
      Integer wayCount,
      Double busbarRatingAmps,
      DeviceKind incomerKind,
      TripCurve incomerCurve,
      Double incomerRatingAmps,
      Integer incomerPoles,
      Double incomerBreakingCapacityKiloAmps,
      Double incomerResidualMilliAmps,
      RcdType incomerRcdType,
      Long parentBoardId,
      Long fedFromCircuitId,
      Double submainLineCsa,
      Double submainCpcCsa,
      ConductorMaterial submainMaterial,
      Insulation submainInsulation,
      Double submainLengthMetres,
      InstallationMethod submainInstallationMethod,
      Double submainAmbientCelsius,
      Integer submainGroupedCircuits,
      Integer submainThermalInsulationMm,
      Double unbalanceLimitPercent,
      Double coincidenceFactor,
      String diversityMethod,
      Double measuredExternalLoopImpedanceOhms,
      Double measuredFaultCurrentKiloAmps,
      Long version,
      Double incomerOverloadSettingAmps,
      Double incomerInstantaneousSettingAmps) {
    this(
        reference,
        location,
        phases,
        wayCount,
        busbarRatingAmps,
        incomerKind,
        incomerCurve,
        incomerRatingAmps,
        incomerPoles,
        incomerBreakingCapacityKiloAmps,
        incomerResidualMilliAmps,
        incomerRcdType,
        parentBoardId,
        fedFromCircuitId,
        submainLineCsa,
        submainCpcCsa,
        submainMaterial,
        submainInsulation,
        submainLengthMetres,
        submainInstallationMethod,
        submainAmbientCelsius,
        submainGroupedCircuits,
        submainThermalInsulationMm,
        unbalanceLimitPercent,
        coincidenceFactor,
        diversityMethod,
        measuredExternalLoopImpedanceOhms,
        measuredFaultCurrentKiloAmps,
        version,
        incomerOverloadSettingAmps,
        incomerInstantaneousSettingAmps,
        null,
        null,
        null);
  }

  /** The same board with its submain's sizes and length replaced, stored and in site units. */
  public BoardForm withSubmainUnits(
      Double lineCsa,
      Double cpcCsa,
      Double lengthMetres,
      String lineSize,
      String cpcSize,
      Double lengthFeet) {
    return new BoardForm(
        reference,
        location,
        phases,
        wayCount,
        busbarRatingAmps,
        incomerKind,
        incomerCurve,
        incomerRatingAmps,
        incomerPoles,
        incomerBreakingCapacityKiloAmps,
        incomerResidualMilliAmps,
        incomerRcdType,
        parentBoardId,
        fedFromCircuitId,
        lineCsa,
        cpcCsa,
        submainMaterial,
        submainInsulation,
        lengthMetres,
        submainInstallationMethod,
        submainAmbientCelsius,
        submainGroupedCircuits,
        submainThermalInsulationMm,
        unbalanceLimitPercent,
        coincidenceFactor,
        diversityMethod,
        measuredExternalLoopImpedanceOhms,
        measuredFaultCurrentKiloAmps,
        version,
        incomerOverloadSettingAmps,
        incomerInstantaneousSettingAmps,
        lineSize,
        cpcSize,
        lengthFeet,
        supplySystem);
  }

  /** The same board on its own supply system (null: the site's). */
  public BoardForm withSupplySystem(SupplySystem system) {
    return new BoardForm(
        reference,
        location,
        phases,
        wayCount,
        busbarRatingAmps,
        incomerKind,
        incomerCurve,
        incomerRatingAmps,
        incomerPoles,
        incomerBreakingCapacityKiloAmps,
        incomerResidualMilliAmps,
        incomerRcdType,
        parentBoardId,
        fedFromCircuitId,
        submainLineCsa,
        submainCpcCsa,
        submainMaterial,
        submainInsulation,
        submainLengthMetres,
        submainInstallationMethod,
        submainAmbientCelsius,
        submainGroupedCircuits,
        submainThermalInsulationMm,
        unbalanceLimitPercent,
        coincidenceFactor,
        diversityMethod,
        measuredExternalLoopImpedanceOhms,
        measuredFaultCurrentKiloAmps,
        version,
        incomerOverloadSettingAmps,
        incomerInstantaneousSettingAmps,
        submainLineSize,
        submainCpcSize,
        submainLengthFeet,
        system);
  }

  /**
   * A board whose incomer has no moulded-case breaker settings: the argument list from before Ir
   * and Ii.
   */
  public BoardForm(
      String reference,
      String location,
      Integer phases,
      Integer wayCount,
      Double busbarRatingAmps,
      DeviceKind incomerKind,
      TripCurve incomerCurve,
      Double incomerRatingAmps,
      Integer incomerPoles,
      Double incomerBreakingCapacityKiloAmps,
      Double incomerResidualMilliAmps,
      RcdType incomerRcdType,
      Long parentBoardId,
      Long fedFromCircuitId,
      Double submainLineCsa,
      Double submainCpcCsa,
      ConductorMaterial submainMaterial,
      Insulation submainInsulation,
      Double submainLengthMetres,
      InstallationMethod submainInstallationMethod,
      Double submainAmbientCelsius,
      Integer submainGroupedCircuits,
      Integer submainThermalInsulationMm,
      Double unbalanceLimitPercent,
      Double coincidenceFactor,
      String diversityMethod,
      Double measuredExternalLoopImpedanceOhms,
      Double measuredFaultCurrentKiloAmps,
      Long version) {
    this(
        reference,
        location,
        phases,
        wayCount,
        busbarRatingAmps,
        incomerKind,
        incomerCurve,
        incomerRatingAmps,
        incomerPoles,
        incomerBreakingCapacityKiloAmps,
        incomerResidualMilliAmps,
        incomerRcdType,
        parentBoardId,
        fedFromCircuitId,
        submainLineCsa,
        submainCpcCsa,
        submainMaterial,
        submainInsulation,
        submainLengthMetres,
        submainInstallationMethod,
        submainAmbientCelsius,
        submainGroupedCircuits,
        submainThermalInsulationMm,
        unbalanceLimitPercent,
        coincidenceFactor,
        diversityMethod,
        measuredExternalLoopImpedanceOhms,
        measuredFaultCurrentKiloAmps,
        version,
        null,
        null);
  }

  /**
   * The same board with its incomer's moulded-case breaker settings Ir and Ii (A; null when not
   * recorded).
   */
  public BoardForm withIncomerMccbSettings(
      Double overloadSettingAmps, Double instantaneousSettingAmps) {
    return new BoardForm(
        reference,
        location,
        phases,
        wayCount,
        busbarRatingAmps,
        incomerKind,
        incomerCurve,
        incomerRatingAmps,
        incomerPoles,
        incomerBreakingCapacityKiloAmps,
        incomerResidualMilliAmps,
        incomerRcdType,
        parentBoardId,
        fedFromCircuitId,
        submainLineCsa,
        submainCpcCsa,
        submainMaterial,
        submainInsulation,
        submainLengthMetres,
        submainInstallationMethod,
        submainAmbientCelsius,
        submainGroupedCircuits,
        submainThermalInsulationMm,
        unbalanceLimitPercent,
        coincidenceFactor,
        diversityMethod,
        measuredExternalLoopImpedanceOhms,
        measuredFaultCurrentKiloAmps,
        version,
        overloadSettingAmps,
        instantaneousSettingAmps,
        submainLineSize,
        submainCpcSize,
        submainLengthFeet,
        supplySystem);
  }

  /**
   * Default unbalance limit for a new board, %. Common practice: 10 % keeps neutral current modest.
   */
  public static final double DEFAULT_UNBALANCE_LIMIT_PERCENT = 10.0;

  public static BoardForm blank(int sitePhases) {
    return new BoardForm(
        "",
        "",
        sitePhases,
        sitePhases == 3 ? 12 : 10,
        null,
        DeviceKind.MCCB,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null,
        null, // no submain preset: a board fed from the origin has none, and a preset material
        null, // alone made every check wait for the length of a submain that does not exist
        null,
        null,
        null,
        null,
        null,
        DEFAULT_UNBALANCE_LIMIT_PERCENT,
        1.0,
        null,
        null,
        null,
        null);
  }

  public static BoardForm of(Board board) {
    DeviceDetails incomer = board.getIncomer();
    CableDetails submain = board.getSubmain();
    boolean hasIncomer = incomer != null;
    boolean hasSubmain = submain != null;
    return new BoardForm(
        board.getReference(),
        board.getLocation(),
        board.getPhases(),
        board.getWayCount(),
        board.getBusbarRatingAmps(),
        hasIncomer ? incomer.getKind() : null,
        hasIncomer ? incomer.getCurve() : null,
        hasIncomer ? incomer.getRatingAmps() : null,
        hasIncomer ? incomer.getPoles() : null,
        hasIncomer ? incomer.getBreakingCapacityKiloAmps() : null,
        hasIncomer ? incomer.getResidualMilliAmps() : null,
        hasIncomer ? incomer.getRcdType() : null,
        board.getParent() == null ? null : board.getParent().getId(),
        board.getFedFromCircuitId(),
        hasSubmain ? submain.getLineCsaSquareMillimetres() : null,
        hasSubmain ? submain.getProtectiveCsaSquareMillimetres() : null,
        hasSubmain ? submain.getMaterial() : null,
        hasSubmain ? submain.getInsulation() : null,
        hasSubmain ? submain.getLengthMetres() : null,
        hasSubmain ? submain.getInstallationMethod() : null,
        hasSubmain ? submain.getAmbientCelsius() : null,
        hasSubmain ? submain.getGroupedCircuits() : null,
        hasSubmain ? submain.getThermalInsulationMillimetres() : null,
        board.getUnbalanceLimitPercent(),
        board.getCoincidenceFactor(),
        board.getDiversityMethod(),
        board.getMeasuredExternalLoopImpedanceOhms(),
        board.getMeasuredFaultCurrentKiloAmps(),
        board.getVersion(),
        hasIncomer ? incomer.getOverloadSettingAmps() : null,
        hasIncomer ? incomer.getInstantaneousSettingAmps() : null,
        null,
        null,
        null,
        board.getSupplySystem());
  }

  DeviceDetails incomerDevice() {
    if (incomerKind == null) {
      return null;
    }
    return new DeviceDetails(
        incomerKind,
        incomerCurve,
        incomerRatingAmps,
        incomerPoles,
        incomerBreakingCapacityKiloAmps,
        incomerResidualMilliAmps,
        incomerRcdType,
        incomerOverloadSettingAmps,
        incomerInstantaneousSettingAmps);
  }

  CableDetails submainCable() {
    return new CableDetails(
        submainLineCsa,
        submainCpcCsa,
        submainMaterial,
        submainInsulation,
        submainLengthMetres,
        submainInstallationMethod,
        submainAmbientCelsius,
        submainGroupedCircuits,
        submainThermalInsulationMm);
  }
}
