package com.wayledger.engine.nec;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.CircuitLocation;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.FaultInterrupter;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.WayStatus;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import com.wayledger.engine.rules.RuleSets;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** GFCI for receptacles other than in dwelling units, NEC 210.8(B) (NFPA 70-2020, from memory). */
class OtherOccupancyGroundFaultTests {

  static CircuitSpec receptacles(
      CircuitLocation where, PhasePosition position, double amps, FaultInterrupter function) {
    return new CircuitSpec(
        5,
        5,
        position,
        "Receptacles",
        WayStatus.IN_USE,
        false,
        new DeviceSpec(DeviceKind.MCCB, null, amps, position.poles(), 10.0, null, null, function),
        null,
        List.of(
            new LoadSpec(
                "receptacles",
                LoadCategory.SOCKET_OUTLETS,
                4,
                180,
                RatingUnit.VA,
                1.0,
                null,
                null,
                false)),
        null,
        null,
        false,
        where);
  }

  static Finding onHousePanel(CircuitSpec circuit, double u0) {
    // a panelboard not recorded as a dwelling unit's
    return DwellingProtection.groundFault(circuit, u0, false);
  }

  @Test
  void everyLocationOfTheListNamesItsItem() {
    // 210.8(B)(1)–(12), NFPA 70-2020 (from memory)
    Map<CircuitLocation, String> expected =
        Map.ofEntries(
            Map.entry(CircuitLocation.BATHROOM, "210.8(B)(1)"),
            Map.entry(CircuitLocation.KITCHEN, "210.8(B)(2)"),
            Map.entry(CircuitLocation.FOOD_PREPARATION, "210.8(B)(2)"),
            Map.entry(CircuitLocation.ROOFTOP, "210.8(B)(3)"),
            Map.entry(CircuitLocation.OUTDOORS, "210.8(B)(4)"),
            Map.entry(CircuitLocation.NEAR_SINK, "210.8(B)(5)"),
            Map.entry(CircuitLocation.DAMP_OR_WET_INDOORS, "210.8(B)(6)"),
            Map.entry(CircuitLocation.LOCKER_ROOM, "210.8(B)(7)"),
            Map.entry(CircuitLocation.GARAGE, "210.8(B)(8)"),
            Map.entry(CircuitLocation.SERVICE_BAY, "210.8(B)(8)"),
            Map.entry(CircuitLocation.CRAWL_SPACE, "210.8(B)(9)"),
            Map.entry(CircuitLocation.BASEMENT, "210.8(B)(10)"),
            Map.entry(CircuitLocation.LAUNDRY, "210.8(B)(11)"),
            Map.entry(CircuitLocation.NEAR_TUB_OR_SHOWER, "210.8(B)(12)"));
    expected.forEach(
        (where, item) -> {
          Finding f = onHousePanel(receptacles(where, PhasePosition.L1, 20, null), 120);
          assertThat(f.verdict()).as(where + ": " + f.summary()).isEqualTo(Verdict.WARNING);
          assertThat(f.reference()).as(where.name()).startsWith("NEC " + item + " ");
        });
  }

  @Test
  void theTableCoversEveryLocationOfTheNecSet() {
    assertThat(OtherOccupancyGroundFault.locations())
        .containsExactlyInAnyOrderElementsOf(RuleSets.NEC.circuitLocations());
  }

  @Test
  void aRecordedGfciBreakerPassesAndNoneIsTheDwellingGrade() {
    Finding fitted =
        onHousePanel(
            receptacles(CircuitLocation.ROOFTOP, PhasePosition.L1, 20, FaultInterrupter.GFCI), 120);
    assertThat(fitted.verdict()).as(fitted.summary()).isEqualTo(Verdict.PASS);
    Finding none =
        onHousePanel(receptacles(CircuitLocation.ROOFTOP, PhasePosition.L1, 20, null), 120);
    Finding dwelling =
        DwellingProtection.groundFault(
            receptacles(CircuitLocation.OUTDOORS, PhasePosition.L1, 20, null), 120, true);
    assertThat(none.verdict()).as(none.summary()).isEqualTo(dwelling.verdict());
    assertThat(none.remedy()).contains("GFCI receptacle");
  }

  @Test
  void missingLocationIsNotAssessedNeverPassed() {
    Finding f = onHousePanel(receptacles(null, PhasePosition.L1, 20, null), 120);
    assertThat(f.verdict()).isEqualTo(Verdict.NOT_ASSESSED);
    assertThat(f.summary()).contains("location not recorded");
    assertThat(f.reference()).contains("210.8(B)");
  }

  @Test
  void missingRatingIsNotAssessedNeverPassed() {
    CircuitSpec c = receptacles(CircuitLocation.OUTDOORS, PhasePosition.L1, 20, null);
    CircuitSpec noRating =
        new CircuitSpec(
            c.id(),
            c.wayNumber(),
            c.position(),
            c.description(),
            c.status(),
            false,
            new DeviceSpec(DeviceKind.MCCB, null, null, 1, 10.0, null, null, null),
            null,
            c.loads(),
            null,
            null,
            false,
            c.location());
    Finding f = onHousePanel(noRating, 120);
    assertThat(f.verdict()).isEqualTo(Verdict.NOT_ASSESSED);
    assertThat(f.summary()).contains("device rating In");
  }

  @Test
  void singlePhaseUpTo50AmpsAndThreePhaseUpTo100Amps() {
    // 210.8(B) scope (2020, from memory): single-phase ≤ 150 V to ground ≤ 50 A; three-phase
    // ≤ 150 V to ground ≤ 100 A. 208Y/120 V: 120 V to ground
    assertThat(
            onHousePanel(receptacles(CircuitLocation.OUTDOORS, PhasePosition.L1_L2, 50, null), 120)
                .verdict())
        .isEqualTo(Verdict.WARNING);
    Finding sixty =
        onHousePanel(receptacles(CircuitLocation.OUTDOORS, PhasePosition.L1_L2, 60, null), 120);
    assertThat(sixty.verdict()).isEqualTo(Verdict.PASS);
    assertThat(sixty.summary()).startsWith("not required").contains("50 A");
    assertThat(
            onHousePanel(
                    receptacles(CircuitLocation.OUTDOORS, PhasePosition.THREE_POLE, 100, null), 120)
                .verdict())
        .isEqualTo(Verdict.WARNING);
    assertThat(
            onHousePanel(
                    receptacles(CircuitLocation.OUTDOORS, PhasePosition.THREE_POLE, 125, null), 120)
                .verdict())
        .isEqualTo(Verdict.PASS);
  }

  @Test
  void aboveOneHundredFiftyVoltsToGroundIsOutOfScope() {
    // 480Y/277 V: 277 V to ground > 150 V (210.8(B), 2020, from memory)
    Finding f =
        onHousePanel(receptacles(CircuitLocation.OUTDOORS, PhasePosition.L1, 20, null), 277);
    assertThat(f.verdict()).isEqualTo(Verdict.PASS);
    assertThat(f.summary()).contains("150 V");
  }

  @Test
  void aBasementIsTakenAsUnfinishedAndSaysSo() {
    // 210.8(B)(10) covers unfinished areas of basements only; the schedule does not say which
    Finding f =
        onHousePanel(receptacles(CircuitLocation.BASEMENT, PhasePosition.L1, 20, null), 120);
    assertThat(f.verdict()).isEqualTo(Verdict.WARNING);
    assertThat(f.summary()).contains("taken as unfinished");
  }

  @Test
  void roomsOutsideTheListNeedNoGfciButABoathouseIsNotAssessed() {
    assertThat(
            onHousePanel(receptacles(CircuitLocation.INDOORS, PhasePosition.L1, 20, null), 120)
                .verdict())
        .isEqualTo(Verdict.PASS);
    Finding boathouse =
        onHousePanel(receptacles(CircuitLocation.BOATHOUSE, PhasePosition.L1, 20, null), 120);
    assertThat(boathouse.verdict()).isEqualTo(Verdict.NOT_ASSESSED);
    assertThat(boathouse.summary()).contains("Article 555");
  }

  @Test
  void aLocationOfOtherOccupanciesOnADwellingPanelIsNotAssessed() {
    Finding f =
        DwellingProtection.groundFault(
            receptacles(CircuitLocation.LOCKER_ROOM, PhasePosition.L1, 20, null), 120, true);
    assertThat(f.verdict()).isEqualTo(Verdict.NOT_ASSESSED);
    assertThat(f.remedy()).contains("dwelling room");
    // 210.8(A)(11) indoor damp and wet locations of a dwelling (2020, from memory)
    assertThat(DwellingProtection.row(CircuitLocation.DAMP_OR_WET_INDOORS).gfciClause())
        .startsWith("210.8(A)(11)");
  }

  @Test
  void theProposalFitsAGfciBreakerWhere210_8BAsks() {
    CircuitSpec c = receptacles(CircuitLocation.LOCKER_ROOM, PhasePosition.L1, 20, null);
    assertThat(DwellingProtection.needed(c, 120, false)).isEqualTo(FaultInterrupter.GFCI);
    assertThat(
            DwellingProtection.needed(
                receptacles(CircuitLocation.BEDROOM, PhasePosition.L1, 20, null), 120, false))
        .isNull();
  }
}
